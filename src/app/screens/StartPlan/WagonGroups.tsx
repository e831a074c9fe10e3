/** Start plan inputs, train: a mixed train's wagon groups from the head (wagons, type and mass of each) and their totals. */
import { For, Index, type JSX } from "solid-js";
import { Icon } from "../../components/Icon.js";
import { QuantityField } from "../../components/QuantityField.js";
import { show } from "../../format.js";
import type { Library } from "../../../profiles/library.js";
import { issueFinder, type InputSectionProps } from "./inputSection.js";
import { groups } from "../../../i18n/en/groups.js";
import { train } from "../../../i18n/en/train.js";
import { tr } from "../../i18n.js";
import { Figures } from "../../components/Figures.js";

const tt = tr.ns(train);
const t = tr.ns(groups);

export interface WagonGroupsProps extends InputSectionProps {
  library: Library;
}

/** A mixed train: its wagon groups from the head, each with its wagons, type and total mass; the totals below. */
export default function WagonGroups(props: WagonGroupsProps): JSX.Element {
  const s = props.store;
  const d = s.draft;
  const issue = issueFinder(s);
  const groups = () => d.train.groups ?? [];
  const totals = () => {
    let wagons = 0;
    let mass = 0;
    let length = 0;
    for (const g of groups()) {
      wagons += g.wagons;
      mass += g.mass_t;
      length += g.wagons * (props.library.wagons.get(g.wagonType)?.lengthM ?? Number.NaN);
    }
    return { wagons, mass, length };
  };
  return (
    <div class="wagon-groups" data-field="train.groups">
      <p class="field-label">{t("wagonGroups")}</p>
      <Index each={groups()}>
        {(g, k) => (
          <div class="loco-group" data-group={k}>
            <div class="row">
              <QuantityField
                name={`train.groups[${k}].wagons`}
                label={tt("wagons")}
                value={g().wagons}
                onValue={(v) => s.set("train", "groups", k, "wagons", v)}
                units={props.units}
                integer
                step={1}
                min={1}
                max={400}
                issue={issue(`train.groups[${k}].wagons`)}
              />
              <QuantityField
                name={`train.groups[${k}].mass_t`}
                label={t("groupMass")}
                measure="mass"
                fileUnit="t"
                value={g().mass_t}
                onValue={(v) => s.set("train", "groups", k, "mass_t", v)}
                units={props.units}
                step={50}
                min={0}
                issue={issue(`train.groups[${k}].mass_t`)}
                hint={<Figures text={g().wagons >= 1 && g().mass_t > 0 ? tt("perWagon", { value: show("mass", (g().mass_t * 1000) / g().wagons, props.units) }) : ""} />}
              />
            </div>
            <div class="field" data-field={`train.groups[${k}].wagonType`}>
              <label class="field-label" for={`group-type-${k}`}>
                {tt("wagonType")}
              </label>
              <select id={`group-type-${k}`} class="select" value={g().wagonType} onChange={(e) => s.set("train", "groups", k, "wagonType", e.currentTarget.value)}>
                <For each={[...props.library.wagons.values()]}>{(w) => <option value={w.id}>{w.label}</option>}</For>
              </select>
            </div>
            <button type="button" class="button subtle" onClick={() => s.removeWagonGroup(k)}>
              <Icon name="remove" /> {tt("removeGroup")}
            </button>
          </div>
        )}
      </Index>
      <button type="button" class="button" data-action="add-wagon-group" onClick={() => s.addWagonGroup()}>
        <Icon name="add" /> {t("addWagonGroup")}
      </button>
      <p class="hint" data-testid="group-totals">
        {t("totals", { count: totals().wagons, mass: show("mass", totals().mass * 1000, props.units) })}
        {Number.isFinite(totals().length) ? t("totalsLength", { length: show("distance", totals().length, props.units, 0) }) : ""}
        {t("totalsNote")}
      </p>
    </div>
  );
}

