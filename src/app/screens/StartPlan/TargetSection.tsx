/** Start plan inputs, target: plan until a speed, or until a distance is cleared. */
import { Show, type JSX } from "solid-js";
import { QuantityField } from "../../components/QuantityField.js";
import { SegmentedButtons } from "../../components/SegmentedButtons.js";
import { issueFinder, type InputSectionProps } from "./inputSection.js";

import { inputs } from "../../../i18n/en/inputs.js";
import { tr } from "../../i18n.js";

const t = tr.ns(inputs);

/** The end of the plan: a speed or a distance cleared. */
export function TargetSection(props: InputSectionProps): JSX.Element {
  const s = props.store;
  const d = s.draft;
  const issue = issueFinder(s);
  return (
    <section class="panel">
      <h2>{t("target")}</h2>
      <SegmentedButtons
        name="targetKind"
        label={t("planUntil")}
        value={d.targetKind}
        onChange={(v) => s.set("targetKind", v)}
        options={[
          { value: "speed", label: t("aSpeed") },
          { value: "distance", label: t("aDistance") },
        ]}
      />
      <Show
        when={d.targetKind === "speed"}
        fallback={
          <QuantityField
            name="target.distance_m"
            label={t("targetDistance")}
            measure="distance"
            fileUnit="m"
            value={d.target.distance_m}
            onValue={(v) => s.set("target", "distance_m", v)}
            units={props.units}
            step={{ metric: 50, us: 100 }}
            min={0}
            issue={issue("target.distance_m")}
          />
        }
      >
        <QuantityField
          name="target.speed_kmh"
          label={t("targetSpeed")}
          measure="speed"
          fileUnit="kmh"
          value={d.target.speed_kmh}
          onValue={(v) => s.set("target", "speed_kmh", v)}
          units={props.units}
          step={{ metric: 5, us: 5 }}
          min={0}
          decimals={0}
          issue={issue("target.speed_kmh")}
        />
      </Show>
    </section>
  );
}
