/** Start plan inputs: presets, locomotives, train, location, rail condition and sand, target. */
import { For, Index, Show, type JSX } from "solid-js";
import { RAIL_CONDITIONS, type RailCondition } from "../../../core/physics/types.js";
import { gradeAt } from "../../../core/physics/track.js";
import type { Library } from "../../../profiles/library.js";
import { trackFromSegments } from "../../../profiles/convert.js";
import type { LocationNoteFile, TrainPresetFile } from "../../../profiles/schemas.js";
import { ErrorList } from "../../components/ErrorList.js";
import { Icon, type IconName } from "../../components/Icon.js";
import { QuantityField } from "../../components/QuantityField.js";
import { SegmentedButtons } from "../../components/SegmentedButtons.js";
import { Toggle } from "../../components/Toggle.js";
import { show, type UnitSystem } from "../../format.js";
import type { LocationChoice } from "../../locations.js";
import { COUPLING_DEFAULTS, type DraftPosition } from "../../state/caseDraft.js";
import type { CaseDraftStore } from "../../state/createCaseDraft.js";

export interface InputsViewProps {
  store: CaseDraftStore;
  units: UnitSystem;
  library: Library;
  locations: readonly LocationChoice[];
  /** Why the saved notes could not be read, if they could not. */
  locationsError?: string | null;
  presets: readonly TrainPresetFile[];
}

const RAIL_ICON: Record<RailCondition, IconName> = { dry: "dry", damp: "damp", wet: "wet", frost: "frost", leaves: "leaves", greasy: "greasy" };
const RAIL_LABEL: Record<RailCondition, string> = { dry: "Dry", damp: "Damp", wet: "Wet", frost: "Frost", leaves: "Leaves", greasy: "Greasy" };

export function InputsView(props: InputsViewProps): JSX.Element {
  const s = props.store;
  const d = s.draft;
  const issue = (...paths: string[]) => s.issueAt(...paths)?.message;
  return (
    <form class="inputs" onSubmit={(e) => e.preventDefault()} aria-label="Start plan inputs">
      <ErrorList issues={s.issues()} />

      <section class="panel">
        <h2>Quick fill</h2>
        <p class="muted">One tap fills the locomotives and the train. Demo trains are illustrative.</p>
        <div class="preset-row">
          <button type="button" class="button preset" onClick={() => s.loadDemo()}>
            <span class="preset-name">
              Demo case<span class="visually-hidden">:</span>
            </span>{" "}
            <span class="preset-detail">train, place, rail and target</span>
          </button>
          <For each={props.presets}>
            {(p) => (
              <button type="button" class="button preset" onClick={() => s.applyPreset(p)}>
                <span class="preset-name">
                  {presetName(p.label)}
                  <span class="visually-hidden">,</span>
                </span>{" "}
                <span class="preset-detail">{presetDetail(p.label)}</span>
              </button>
            )}
          </For>
        </div>
        <Show when={d.label}>
          <p class="case-label">
            <strong>{d.label}</strong>
            <Show when={s.edited()}> — edited</Show>
          </p>
        </Show>
      </section>

      <section class="panel">
        <h2>Locomotives</h2>
        <Index each={d.locomotives}>
          {(loco, k) => (
            <div class="loco-group">
              <div class="field" data-field={`locomotives[${k}].profile`}>
                <label class="field-label" for={`loco-${k}`}>
                  Locomotive profile
                </label>
                <select id={`loco-${k}`} class="select" value={loco().profile} onChange={(e) => s.set("locomotives", k, "profile", e.currentTarget.value)}>
                  <For each={[...props.library.locomotives.values()]}>{(l) => <option value={l.spec.id}>{l.spec.label}</option>}</For>
                </select>
                <Show when={issue(`locomotives[${k}].profile`)}>
                  <p class="field-issue" role="alert">
                    Locomotive profile {issue(`locomotives[${k}].profile`)}
                  </p>
                </Show>
              </div>
              <div class="row">
                <QuantityField
                  name={`locomotives[${k}].count`}
                  label="How many"
                  value={loco().count}
                  onValue={(v) => s.set("locomotives", k, "count", v)}
                  units={props.units}
                  integer
                  step={1}
                  min={1}
                  max={8}
                  issue={issue(`locomotives[${k}].count`)}
                />
                <SegmentedButtons<DraftPosition>
                  name={`locomotives[${k}].position`}
                  label="Position"
                  value={loco().position}
                  onChange={(v) => s.set("locomotives", k, "position", v)}
                  options={[
                    { value: "head", label: "Head" },
                    { value: "after", label: "Mid-train" },
                    { value: "rear", label: "Rear" },
                  ]}
                />
              </div>
              <Show when={loco().position === "after"}>
                <QuantityField
                  name={`locomotives[${k}].position.afterWagon`}
                  label="After wagon"
                  value={loco().afterWagon}
                  onValue={(v) => s.set("locomotives", k, "afterWagon", v)}
                  units={props.units}
                  integer
                  step={1}
                  min={1}
                  issue={issue(`locomotives[${k}].position.afterWagon`, `locomotives[${k}].position`)}
                />
              </Show>
              <Show when={d.locomotives.length > 1}>
                <button type="button" class="button subtle" onClick={() => s.removeLocomotive(k)}>
                  <Icon name="remove" /> Remove this group
                </button>
              </Show>
            </div>
          )}
        </Index>
        <Show when={d.locomotives.length < 8}>
          <button type="button" class="button" onClick={() => s.addLocomotive()}>
            <Icon name="add" /> Add locomotives (head, mid-train or rear)
          </button>
        </Show>
      </section>

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

      <section class="panel">
        <h2>Location</h2>
        <SegmentedButtons
          name="locationMode"
          label="Location from"
          hideLabel
          value={d.locationMode}
          onChange={(v) => s.set("locationMode", v)}
          options={[
            { value: "note", label: "Saved note", icon: "notes" },
            { value: "quick", label: "Quick entry", icon: "plan" },
          ]}
        />
        <Show when={d.locationMode === "note"}>
          <div class="field" data-field="location">
            <div class="note-list" role="radiogroup" aria-label="Location note">
              <For each={props.locations} fallback={<p class="muted">No saved location notes. Use quick entry, or add notes under Location notes.</p>}>
                {(c) => (
                  <button type="button" role="radio" aria-checked={d.noteId === c.id} class="note-choice" onClick={() => s.set("noteId", c.id)}>
                    <span class="note-name">{c.name}</span>
                    <span class="note-facts">{noteFacts(c.note, props.units)}</span>
                  </button>
                )}
              </For>
            </div>
            <Show when={props.locationsError}>
              <p class="field-issue" role="alert">
                The saved notes could not be read ({props.locationsError}). The built-in notes and quick entry still work.
              </p>
            </Show>
            <Show when={issue("location", "location.frontAt_m")}>
              <p class="field-issue" role="alert">
                Location {issue("location", "location.frontAt_m")}
              </p>
            </Show>
          </div>
        </Show>
        <Show when={d.locationMode === "quick"}>
          <QuantityField
            name="location.gradient_permille"
            label="Gradient under the train (rising +)"
            measure="grade"
            fileUnit="permille"
            value={d.quick.gradient_permille}
            onValue={(v) => s.set("quick", "gradient_permille", v)}
            units={props.units}
            step={{ metric: 1, us: 0.1 }}
            min={props.units === "us" ? -6 : -60}
            max={props.units === "us" ? 6 : 60}
            issue={issue("location.gradient_permille")}
          />
          <div class="row">
            <QuantityField
              name="location.curveRadius_m"
              label="Curve radius (0 = straight)"
              measure="radius"
              fileUnit="m"
              value={d.quick.curveRadius_m}
              onValue={(v) => s.set("quick", "curveRadius_m", v)}
              units={props.units}
              issue={issue("location.curveRadius_m")}
            />
            <QuantityField
              name="location.clearAhead_m"
              label="Clear ahead"
              measure="distance"
              fileUnit="m"
              value={d.quick.clearAhead_m}
              onValue={(v) => s.set("quick", "clearAhead_m", v)}
              units={props.units}
              issue={issue("location.clearAhead_m")}
            />
          </div>
        </Show>
      </section>

      <section class="panel">
        <h2>Rail and weather</h2>
        <SegmentedButtons<RailCondition>
          name="conditions.rail"
          label="Rail condition"
          tall
          value={d.conditions.rail}
          onChange={(v) => s.set("conditions", "rail", v)}
          options={RAIL_CONDITIONS.map((r) => ({ value: r, label: RAIL_LABEL[r], icon: RAIL_ICON[r] }))}
          issue={issue("conditions.rail")}
        />
        <div class="row">
          <Toggle name="conditions.sand" label="Sand" icon="sand" on={d.conditions.sand} onChange={(v) => s.set("conditions", "sand", v)} onText="On" offText="Off" />
          <QuantityField
            name="conditions.temperature_C"
            label="Temperature"
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

      <section class="panel">
        <h2>Target</h2>
        <SegmentedButtons
          name="targetKind"
          label="Plan until"
          value={d.targetKind}
          onChange={(v) => s.set("targetKind", v)}
          options={[
            { value: "speed", label: "A speed" },
            { value: "distance", label: "A distance cleared" },
          ]}
        />
        <Show
          when={d.targetKind === "speed"}
          fallback={
            <QuantityField
              name="target.distance_m"
              label="Target distance"
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
            label="Target speed"
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
    </form>
  );
}

/** "Ore block, 5200 t, …" → "Ore block" and the rest. */
const presetName = (label: string) => label.split(",")[0]!.trim();
const presetDetail = (label: string) => label.split(",").slice(1).join(",").trim();

function perWagon(lengthM: number, wagons: number, units: UnitSystem): string {
  if (!(lengthM > 0) || !(wagons >= 1)) return "";
  return `${show("distance", lengthM / wagons, units, 1)} per wagon`;
}

/** One line about a note: gradient at the front, clear ahead, hazards. */
export function noteFacts(n: LocationNoteFile, units: UnitSystem): string {
  const track = trackFromSegments(n.segments);
  const g = gradeAt(track, n.frontAt_m - 1);
  const parts = [`${show("grade", g / 1000, units)} at the front`, `${show("distance", n.clearAhead_m, units)} clear ahead`];
  if (n.hazards.length > 0) parts.push(`${n.hazards.length} hazard${n.hazards.length === 1 ? "" : "s"}`);
  if (n.illustrative) parts.push("illustrative");
  return parts.join(" · ");
}

