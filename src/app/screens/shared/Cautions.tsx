/** The standing cautions (advisory only, and the rest), shown on every dispatcher's screen. */
import { For, type JSX } from "solid-js";
import { STANDARD_CAUTIONS, type Caution } from "../../../core/planner/cautions.js";
import { cautionWords } from "../../cautions.js";
import { dispatch } from "../../../i18n/en/dispatch.js";
import { tr } from "../../i18n.js";
import { Figures } from "../../components/Figures.js";

const t = tr.ns(dispatch);

export function Cautions(props: { extra?: readonly Caution[] }): JSX.Element {
  return (
    <section class="panel cautions" aria-labelledby="cautions-h">
      <h2 id="cautions-h">{t("cautions")}</h2>
      <ul>
        <For each={[...STANDARD_CAUTIONS, ...(props.extra ?? [])]}>{(c) => (
            <li>
              <Figures text={cautionWords(c)} />
            </li>
          )}</For>
      </ul>
    </section>
  );
}
