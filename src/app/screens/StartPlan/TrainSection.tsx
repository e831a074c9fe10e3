/**
 * Start plan inputs, train: trailing mass, wagons, coupling, slack, bearings and the slack at the start — or,
 * for a mixed train, its wagon groups from the head (wagons, type and mass of each).
 */
import { For, Index, Show, type JSX } from "solid-js";
import { Icon } from "../../components/Icon.js";
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
      <Show
        when={(d.train.groups ?? []).length > 0}
        fallback={
          <>
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
            <button type="button" class="button subtle" data-action="add-wagon-group" onClick={() => s.addWagonGroup()}>
              <Icon name="add" /> Enter as wagon groups (mixed loads or types)
            </button>
          </>
        }
      >
        <WagonGroups {...props} />
      </Show>
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

/** A mixed train: its wagon groups from the head, each with its wagons, type and total mass; the totals below. */
function WagonGroups(props: TrainSectionProps): JSX.Element {
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
      <p class="field-label">Wagon groups, from the head</p>
      <Index each={groups()}>
        {(g, k) => (
          <div class="loco-group" data-group={k}>
            <div class="row">
              <QuantityField
                name={`train.groups[${k}].wagons`}
                label="Wagons"
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
                label="Mass of the group"
                measure="mass"
                fileUnit="t"
                value={g().mass_t}
                onValue={(v) => s.set("train", "groups", k, "mass_t", v)}
                units={props.units}
                step={50}
                min={0}
                issue={issue(`train.groups[${k}].mass_t`)}
                hint={<>{g().wagons >= 1 && g().mass_t > 0 ? `${show("mass", (g().mass_t * 1000) / g().wagons, props.units)} per wagon` : ""}</>}
              />
            </div>
            <div class="field" data-field={`train.groups[${k}].wagonType`}>
              <label class="field-label" for={`group-type-${k}`}>
                Wagon type
              </label>
              <select id={`group-type-${k}`} class="select" value={g().wagonType} onChange={(e) => s.set("train", "groups", k, "wagonType", e.currentTarget.value)}>
                <For each={[...props.library.wagons.values()]}>{(w) => <option value={w.id}>{w.label}</option>}</For>
              </select>
            </div>
            <button type="button" class="button subtle" onClick={() => s.removeWagonGroup(k)}>
              <Icon name="remove" /> Remove this group
            </button>
          </div>
        )}
      </Index>
      <button type="button" class="button" data-action="add-wagon-group" onClick={() => s.addWagonGroup()}>
        <Icon name="add" /> Add a wagon group
      </button>
      <p class="hint" data-testid="group-totals">
        In all: {totals().wagons} wagons, {show("mass", totals().mass * 1000, props.units)}
        {Number.isFinite(totals().length) ? `, ${show("distance", totals().length, props.units, 0)} long` : ""}. The largest-mass figures scale every group's load above tare in proportion.
      </p>
    </div>
  );
}

function perWagon(lengthM: number, wagons: number, units: UnitSystem): string {
  if (!(lengthM > 0) || !(wagons >= 1)) return "";
  return `${show("distance", lengthM / wagons, units, 1)} per wagon`;
}
