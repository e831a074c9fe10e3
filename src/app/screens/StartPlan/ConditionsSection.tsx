/** Start plan inputs, rail and weather: the rail condition, sand and the temperature. */
import type { JSX } from "solid-js";
import { RAIL_CONDITIONS, type RailCondition } from "../../../core/physics/types.js";
import type { IconName } from "../../components/Icon.js";
import { QuantityField } from "../../components/QuantityField.js";
import { SegmentedButtons } from "../../components/SegmentedButtons.js";
import { Toggle } from "../../components/Toggle.js";
import { issueFinder, type InputSectionProps } from "./inputSection.js";

import { inputs } from "../../../i18n/en/inputs.js";
import { tr } from "../../i18n.js";

import { words } from "../../words.js";

const t = tr.ns(inputs);

const RAIL_ICON: Record<RailCondition, IconName> = { dry: "dry", damp: "damp", wet: "wet", frost: "frost", leaves: "leaves", greasy: "greasy" };

/** Rail condition with its icon, sand on or off, temperature. */
export function ConditionsSection(props: InputSectionProps): JSX.Element {
  const s = props.store;
  const d = s.draft;
  const issue = issueFinder(s);
  return (
    <section class="panel">
      <h2>{t("railWeather")}</h2>
      <SegmentedButtons<RailCondition>
        name="conditions.rail"
        label={t("railCondition")}
        tall
        value={d.conditions.rail}
        onChange={(v) => s.set("conditions", "rail", v)}
        options={RAIL_CONDITIONS.map((r) => ({ value: r, label: words.rail(r), icon: RAIL_ICON[r] }))}
        issue={issue("conditions.rail")}
      />
      <div class="row">
        <Toggle name="conditions.sand" label={t("sand")} icon="sand" on={d.conditions.sand} onChange={(v) => s.set("conditions", "sand", v)} />
        <QuantityField
          name="conditions.temperature_C"
          label={t("temperature")}
          measure="temperature"
          fileUnit="C"
          value={d.conditions.temperature_C}
          onValue={(v) => s.set("conditions", "temperature_C", v)}
          units={props.units}
          step={{ metric: 1, us: 2 }}
          issue={issue("conditions.temperature_C")}
        />
      </div>
    </section>
  );
}
