/** Start plan inputs, train: trailing mass, wagons, coupling, slack, bearings and the slack at the start. */
import { For, type JSX } from "solid-js";
import type { Library } from "../../../profiles/library.js";
import { QuantityField } from "../../components/QuantityField.js";
import { SegmentedButtons } from "../../components/SegmentedButtons.js";
import { show, type UnitSystem } from "../../format.js";
import { COUPLING_DEFAULTS } from "../../state/caseDraft.js";
import { issueFinder, type InputSectionProps } from "./inputSection.js";

export interface TrainSectionProps extends InputSectionProps {
  library: Library;
}

/** The trailing load and its couplings. */
export function TrainSection(props: TrainSectionProps): JSX.Element {
  const s = props.store;
  const d = s.draft;
  const issue = issueFinder(s);
  return (
    <section class="panel">
      <h2>Train</h2>
      <QuantityField
        name="train.trailingMass_t"
        label="Trailing mass"
        measure="mass"
        fileUnit="t"
        value={d.train.trailingMass_t}
        onValue={(v) => s.set("train", "trailingMass_t", v)}
        units={props.units}
        step={50}
        min={0}
        issue={issue("train.trailingMass_t")}
      />
      <div class="row">
        <QuantityField
          name="train.wagons"
          label="Wagons"
          value={d.train.wagons}
          onValue={(v) => s.set("train", "wagons", v)}
          units={props.units}
          integer
          step={1}
          min={1}
          max={400}
          issue={issue("train.wagons")}
        />
        <QuantityField
          name="train.length_m"
          label="Length of the wagons"
          measure="distance"
          fileUnit="m"
          value={d.train.length_m}
          onValue={(v) => s.set("train", "length_m", v)}
          units={props.units}
          issue={issue("train.length_m")}
          hint={<>{perWagon(d.train.length_m, d.train.wagons, props.units)}</>}
        />
      </div>
      <div class="field" data-field="train.wagonType">
        <label class="field-label" for="wagon-type">
          Wagon type
        </label>
        <select id="wagon-type" class="select" value={d.train.wagonType} onChange={(e) => s.set("train", "wagonType", e.currentTarget.value)}>
          <option value="">Plain bogie wagon</option>
          <For each={[...props.library.wagons.values()]}>{(w) => <option value={w.id}>{w.label}</option>}</For>
        </select>
      </div>
      <SegmentedButtons
        name="train.coupling"
        label="Coupling"
        value={d.train.coupling}
        onChange={(v) => s.set("train", "coupling", v)}
        options={[
          { value: "knuckle", label: "Knuckle" },
          { value: "screw", label: "Screw and buffers" },
        ]}
      />
      <div class="row">
        <QuantityField
          name="train.couplerSlack_mm"
          label="Free slack per coupling"
          measure="slack"
          fileUnit="mm"
          value={d.train.couplerSlack_mm}
          onValue={(v) => s.set("train", "couplerSlack_mm", v)}
          units={props.units}
          step={{ metric: 5, us: 0.25 }}
          min={0}
          issue={issue("train.couplerSlack_mm")}
        />
        <QuantityField
          name="train.couplerLimit_kN"
          label="Coupler working limit"
          measure="force"
          fileUnit="kN"
          value={d.train.couplerLimit_kN}
          onValue={(v) => s.set("train", "couplerLimit_kN", v)}
          units={props.units}
          issue={issue("train.couplerLimit_kN")}
          hint={<>Typical: {show("force", COUPLING_DEFAULTS[d.train.coupling].couplerLimit_kN * 1000, props.units)} for this coupling.</>}
        />
      </div>
      <SegmentedButtons
        name="train.bearing"
        label="Bearings"
        value={d.train.bearing}
        onChange={(v) => s.set("train", "bearing", v)}
        options={[
          { value: "roller", label: "Roller" },
          { value: "plain", label: "Plain" },
        ]}
      />
      <SegmentedButtons
        name="train.slackState"
        label="Slack at the start"
        value={d.train.slackState}
        onChange={(v) => s.set("train", "slackState", v)}
        options={[
          { value: "from-profile", label: "From the track" },
          { value: "bunched", label: "Bunched" },
          { value: "stretched", label: "Stretched" },
        ]}
      />
    </section>
  );
}

function perWagon(lengthM: number, wagons: number, units: UnitSystem): string {
  if (!(lengthM > 0) || !(wagons >= 1)) return "";
  return `${show("distance", lengthM / wagons, units, 1)} per wagon`;
}
