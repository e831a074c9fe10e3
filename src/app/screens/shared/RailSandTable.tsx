/** The rail condition × sand grid the load table, the margins per condition and the note's card all use. */
import { words } from "../../words.js";
import { card } from "../../../i18n/en/card.js";
import { tr } from "../../i18n.js";

const t = tr.ns(card);
import { For, type JSX } from "solid-js";
import { RAIL_CONDITIONS, type RailCondition } from "../../../core/physics/types.js";

export function RailSandTable(props: {
  class: string;
  caption: JSX.Element;
  /** The `<td>` for one rail condition, without or with sand. */
  cell: (rail: RailCondition, sand: boolean) => JSX.Element;
}): JSX.Element {
  return (
    <table class={props.class}>
      <caption>{props.caption}</caption>
      <thead>
        <tr>
          <th scope="col">{t("rail")}</th>
          <th scope="col">{t("withoutSand")}</th>
          <th scope="col">{t("withSand")}</th>
        </tr>
      </thead>
      <tbody>
        <For each={RAIL_CONDITIONS}>
          {(rail) => (
            <tr>
              <th scope="row">{words.rail(rail)}</th>
              {props.cell(rail, false)}
              {props.cell(rail, true)}
            </tr>
          )}
        </For>
      </tbody>
    </table>
  );
}
