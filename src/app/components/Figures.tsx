/**
 * A line of text whose figures never part from their units: "414 m", "1.400 t", "× 1,40", "< 0,1 %",
 * "2 min 05 s" each sit in a span that does not wrap, so a line never ends between a number and its unit
 * (a driver reading "414" at the end of one line and "m" on the next reads a different figure). The text
 * itself is unchanged (same characters, same textContent): only where a line may end changes.
 */
import { For, type JSX } from "solid-js";

/**
 * The units the app writes after a figure, metric and US customary (format.ts), longest first. The written-out
 * US mass unit comes from the units catalog in each language (en/hu/de units.ts); its words are repeated here
 * so this first-chunk module need not load the other languages' catalogs — tests/app/figures.test.tsx checks
 * every figure format.ts writes in every language against this list.
 */
const UNITS = ["short tons", "rövid tonna", "US-Tonnen", "km/h", "klbf", "mph", "kN", "kW", "mm", "ft", "in", "min", "°C", "°F", "‰", "%", "m", "t", "s", "h"];
const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\/]/g, "\\$&");
const UNIT = `(?:${UNITS.map(escape).join("|")})`;
/**
 * A figure: an optional sign or comparison ("× ", "< ", "≤ ", "~"), digits with the languages' grouping and
 * decimal signs (",", ".", no-break and narrow no-break spaces), then a space and a unit (a duration's
 * "2 min 05 s" as one), not followed by a letter (so "5 min" is a figure and "5 mins" is not).
 */
const NUMBER = "[−-]?\\d(?:\\d|[.,\\u00a0\\u202f](?=\\d))*";
const FIGURE = new RegExp(`(?:[×<>≤≥≈~] ?)?${NUMBER}(?: min \\d+)? ${UNIT}(?![\\p{L}\\p{N}])|[×<>≤≥≈] ${NUMBER}`, "gu");

export type Part = string | { figure: string };

/** The text cut into plain words and figures with their units. */
export function figureParts(text: string): Part[] {
  const out: Part[] = [];
  let at = 0;
  for (const m of text.matchAll(FIGURE)) {
    if (m.index > at) out.push(text.slice(at, m.index));
    out.push({ figure: m[0] });
    at = m.index + m[0].length;
  }
  if (at < text.length) out.push(text.slice(at));
  return out;
}

/** `text` with every figure and its unit kept on one line. */
export function Figures(props: { text: string }): JSX.Element {
  return <For each={figureParts(props.text)}>{(p) => (typeof p === "string" ? p : <span class="figure">{p.figure}</span>)}</For>;
}
