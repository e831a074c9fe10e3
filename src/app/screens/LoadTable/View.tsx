/**
 * Load table (view): pick a location (a saved note or a built-in demo note), a train and a locomotive set;
 * read the largest trailing mass that starts for every rail condition, without and with sand, as a table and
 * as bars. Props in, JSX out.
 */
import { For, Show, type JSX } from "solid-js";
import type { LoadTableRow } from "../../../core/dispatch/loadTable.js";
import type { RailCondition } from "../../../core/physics/types.js";
import type { ChartPalette } from "../../charts/palette.js";
import { Chart } from "../../components/Chart.js";
import { Icon } from "../../components/Icon.js";
import { VerdictIcon } from "../../components/VerdictBanner.js";
import { SegmentedButtons } from "../../components/SegmentedButtons.js";
import { duration, show, showAtMost, type UnitSystem } from "../../format.js";
import type { LocationChoice } from "../../locations.js";
import { Cautions } from "../shared/Cautions.js";
import type { TableStatus } from "./createLoadTableRun.js";
import { loadChart } from "./loadChart.js";
import { RailSandTable } from "../shared/RailSandTable.js";

export interface Option {
  value: string;
  label: string;
}

export interface LoadTableViewProps {
  locations: readonly LocationChoice[];
  locationId: string;
  trains: readonly Option[];
  trainId: string;
  locomotives: readonly Option[];
  locoId: string;
  count: number;
  /** The train and locomotives the table is for, in words. */
  describe: string;
  /** The chosen train's own trailing mass, kg (the reference line). */
  trainMassKg: number | null;
  /** Why the train cannot be placed at the location, if it cannot. */
  problem: string | null;
  status: TableStatus;
  rows: LoadTableRow[];
  progress: number;
  error: string | null;
  elapsedMs: number | null;
  units: UnitSystem;
  palette: ChartPalette;
  onLocation: (id: string) => void;
  onTrain: (id: string) => void;
  onLoco: (id: string) => void;
  onCount: (n: number) => void;
  onCancel: () => void;
  onRetry: () => void;
}

export function LoadTableView(props: LoadTableViewProps): JSX.Element {
  const cell = (rail: RailCondition, sand: boolean) => {
    const r = props.rows.find((x) => x.rail === rail && x.sand === sand);
    const below = () => r !== undefined && props.trainMassKg !== null && props.trainMassKg > r.maxTrailingMassKg;
    return (
      <td data-cell={`${rail}-${sand ? "sand" : "no-sand"}`} classList={{ none: r !== undefined && r.maxTrailingMassKg < 1000, waiting: r === undefined }}>
        {r === undefined ? (props.status === "running" ? "working…" : "–") : r.maxTrailingMassKg >= 1000 ? showAtMost("mass", r.maxTrailingMassKg, props.units) : "none"}
        <Show when={r !== undefined && props.trainMassKg !== null && !below()}>
          <span class="this-train">
            <VerdictIcon verdict="starts" size={18} /> this train starts
          </span>
        </Show>
      </td>
    );
  };
  return (
    <div class="dispatch load-table">
      <p class="advisory">
        <Icon name="info" size={22} /> Advisory only: operating rules, local instructions and the locomotive's own instructions prevail. Every figure is an estimate with
        wide uncertainty.
      </p>

      <div class="dispatch-columns">
        <div class="dispatch-col">
          <section class="panel" aria-labelledby="where-h">
            <h2 id="where-h">Location</h2>
            <div class="note-list choice-list" role="radiogroup" aria-label="Location">
              <For each={props.locations} fallback={<p class="muted">No location notes.</p>}>
                {(c) => (
                  <button type="button" role="radio" aria-checked={c.id === props.locationId} class="note-choice" onClick={() => props.onLocation(c.id)}>
                    <span class="note-name">{c.name}</span>
                    <span class="note-facts">{c.origin === "device" ? "saved on this device" : "built-in demo note (illustrative)"}</span>
                  </button>
                )}
              </For>
            </div>
          </section>
          <section class="panel" aria-labelledby="train-h">
            <h2 id="train-h">Train and locomotives</h2>
            <div>
              <div class="field" data-field="train">
                <label class="field-label" for="lt-train">
                  Train (wagons and their make-up)
                </label>
                <select id="lt-train" class="select" value={props.trainId} onChange={(e) => props.onTrain(e.currentTarget.value)}>
                  <For each={props.trains}>{(t) => <option value={t.value}>{t.label}</option>}</For>
                </select>
              </div>
              <div class="field" data-field="locomotive">
                <label class="field-label" for="lt-loco">
                  Locomotive profile
                </label>
                <select id="lt-loco" class="select" value={props.locoId} onChange={(e) => props.onLoco(e.currentTarget.value)}>
                  <For each={props.locomotives}>{(l) => <option value={l.value}>{l.label}</option>}</For>
                </select>
              </div>
            </div>
            <SegmentedButtons
              name="count"
              label="Locomotives at the head"
              value={String(props.count)}
              onChange={(v) => props.onCount(Number(v))}
              options={["1", "2", "3", "4"].map((v) => ({ value: v, label: v }))}
            />
            <p class="muted">{props.describe}</p>
          </section>
        </div>

        <div class="dispatch-col">
          <section class="panel" aria-labelledby="table-h">
            <div class="panel-head">
              <h2 id="table-h">Largest trailing mass that starts</h2>
              <Show when={props.status === "running"}>
                <button type="button" class="button" onClick={() => props.onCancel()}>
                  <Icon name="close" /> Cancel
                </button>
              </Show>
              <Show when={props.status === "cancelled" || props.status === "failed"}>
                <button type="button" class="button primary" onClick={() => props.onRetry()}>
                  <Icon name="update" /> Work it out again
                </button>
              </Show>
            </div>
            <Show when={props.problem}>
              <p class="problem" role="alert">
                The table cannot be worked out: {props.problem}
              </p>
            </Show>
            <Show when={props.error}>
              <p class="problem" role="alert">
                The table could not be finished: {props.error}
              </p>
            </Show>
            <Show when={props.status === "running"}>
              <div class="progress" role="progressbar" aria-label="Load table" aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(props.progress * 100)}>
                <span style={{ width: `${Math.max(4, props.progress * 100)}%` }} />
              </div>
              <p class="muted" aria-live="polite">
                {props.rows.length} of 12 figures: each is checked in the train dynamics model, so the table takes several seconds.
              </p>
            </Show>
            <Show when={props.status === "cancelled"}>
              <p>Cancelled: {props.rows.length} of 12 figures found.</p>
            </Show>
            <Show when={!props.problem}>
              <RailSandTable
                class="dispatch-table load-table-grid"
                caption={
                  <>
                    Each figure is the Start plan's own verdict at its limit: a train just lighter starts, one just heavier does not.
                    {props.trainMassKg !== null ? ` This train (${show("mass", props.trainMassKg, props.units)}) starts where it is marked.` : ""}
                  </>
                }
                cell={cell}
              />
              <Show when={props.rows.some((r) => r.maxTrailingMassKg <= 0)}>
                <p class="muted">"none": not even a light train of these wagons is expected to start in that condition with these locomotives.</p>
              </Show>
              <Show when={props.status === "done" && props.elapsedMs !== null}>
                <p class="muted">Worked out in {duration(props.elapsedMs! / 1000)}.</p>
              </Show>
            </Show>
          </section>
          <Show when={props.rows.length > 0}>
            <Chart
              title="Load table by rail condition"
              caption="Largest trailing mass that starts, without and with sand; the dashed line is the chosen train's own mass."
              spec={loadChart(props.rows, props.trainMassKg, props.units)}
              palette={props.palette}
              empty="No figures yet."
              height={280}
            />
          </Show>
        </div>
      </div>

      <Cautions />
    </div>
  );
}
