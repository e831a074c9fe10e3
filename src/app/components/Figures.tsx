/**
 * A line of text whose figures never part from their units: "414 m", "1.400 t", "× 1,40", "< 0,1 %",
 * "2 min 05 s" each sit in a span that does not wrap, so a line never ends between a number and its unit
 * (a driver reading "414" at the end of one line and "m" on the next reads a different figure). The text
 * itself is unchanged (same characters, same textContent): only where a line may end changes.
 */
import { For, type JSX } from "solid-js";
import { figureParts } from "./figureParts.js";

export { figureParts, type Part } from "./figureParts.js";

/** `text` with every figure and its unit kept on one line. */
export function Figures(props: { text: string }): JSX.Element {
  return <For each={figureParts(props.text)}>{(p) => (typeof p === "string" ? p : <span class="figure">{p.figure}</span>)}</For>;
}
