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
import { dispatch } from "../../../i18n/en/dispatch.js";
import { tr } from "../../i18n.js";
import { Figures } from "../../components/Figures.js";

const t = tr.ns(dispatch);

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
        {r === undefined ? (props.status === "running" ? t("working") : "–") : r.maxTrailingMassKg >= 1000 ? showAtMost("mass", r.maxTrailingMassKg, props.units) : t("none")}
        <Show when={r !== undefined && props.trainMassKg !== null && !below()}>
          <span class="this-train">
            <VerdictIcon verdict="starts" size={18} /> {t("thisTrainStarts")}
          </span>
        </Show>
      </td>
    );
  };
  return (
    <div class="dispatch load-table">
      <p class="advisory">
        <Icon name="info" size={22} /> {t("advisory")}
      </p>

      <div class="dispatch-columns">
        <div class="dispatch-col">
          <section class="panel" aria-labelledby="where-h">
            <h2 id="where-h">{t("location")}</h2>
            <div class="note-list choice-list" role="radiogroup" aria-label={t("location")}>
              <For each={props.locations} fallback={<p class="muted">{t("noNotes")}</p>}>
                {(c) => (
                  <button type="button" role="radio" aria-checked={c.id === props.locationId} class="note-choice" onClick={() => props.onLocation(c.id)}>
                    <span class="note-name">{c.name}</span>
                    <span class="note-facts">{c.origin === "device" ? t("onDevice") : t("builtIn")}</span>
                  </button>
                )}
              </For>
            </div>
          </section>
          <section class="panel" aria-labelledby="train-h">
            <h2 id="train-h">{t("trainLocos")}</h2>
            <div>
              <div class="field" data-field="train">
                <label class="field-label" for="lt-train">
                  {t("trainMakeUp")}
                </label>
                <select id="lt-train" class="select" value={props.trainId} onChange={(e) => props.onTrain(e.currentTarget.value)}>
                  <For each={props.trains}>{(t) => <option value={t.value}>{t.label}</option>}</For>
                </select>
              </div>
              <div class="field" data-field="locomotive">
                <label class="field-label" for="lt-loco">
                  {t("locoProfile")}
                </label>
                <select id="lt-loco" class="select" value={props.locoId} onChange={(e) => props.onLoco(e.currentTarget.value)}>
                  <For each={props.locomotives}>{(l) => <option value={l.value}>{l.label}</option>}</For>
                </select>
              </div>
            </div>
            <SegmentedButtons
              name="count"
              label={t("locosAtHead")}
              value={String(props.count)}
              onChange={(v) => props.onCount(Number(v))}
              options={["1", "2", "3", "4"].map((v) => ({ value: v, label: v }))}
            />
            <p class="muted">
              <Figures text={props.describe} />
            </p>
          </section>
        </div>

        <div class="dispatch-col">
          <section class="panel" aria-labelledby="table-h">
            <div class="panel-head">
              <h2 id="table-h">{t("largestMass")}</h2>
              <Show when={props.status === "running"}>
                <button type="button" class="button" onClick={() => props.onCancel()}>
                  <Icon name="close" /> {t("cancel")}
                </button>
              </Show>
              <Show when={props.status === "cancelled" || props.status === "failed"}>
                <button type="button" class="button primary" onClick={() => props.onRetry()}>
                  <Icon name="update" /> {t("again")}
                </button>
              </Show>
            </div>
            <Show when={props.problem}>
              <p class="problem" role="alert">
                {t("cannot", { problem: props.problem ?? "" })}
              </p>
            </Show>
            <Show when={props.error}>
              <p class="problem" role="alert">
                {t("notFinished", { error: props.error ?? "" })}
              </p>
            </Show>
            <Show when={props.status === "running"}>
              <div class="progress" role="progressbar" aria-label={t("progressLabel")} aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(props.progress * 100)}>
                <span style={{ width: `${Math.max(4, props.progress * 100)}%` }} />
              </div>
              <p class="muted" aria-live="polite">
                {t("progress", { done: props.rows.length })}
              </p>
            </Show>
            <Show when={props.status === "cancelled"}>
              <p>{t("cancelled", { done: props.rows.length })}</p>
            </Show>
            <Show when={!props.problem}>
              <RailSandTable
                class="dispatch-table load-table-grid"
                caption={
                  <>
                    {t("tableCaption")}
                    {props.trainMassKg !== null ? <Figures text={t("thisTrainMarked", { mass: show("mass", props.trainMassKg, props.units) })} /> : ""}
                  </>
                }
                cell={cell}
              />
              <Show when={props.rows.some((r) => r.maxTrailingMassKg <= 0)}>
                <p class="muted">{t("noneNote")}</p>
              </Show>
              <Show when={props.status === "done" && props.elapsedMs !== null}>
                <p class="muted">{t("workedOut", { time: duration(props.elapsedMs! / 1000) })}</p>
              </Show>
            </Show>
          </section>
          <Show when={props.rows.length > 0}>
            <Chart
              title={t("chartTitle")}
              caption={t("chartCaption")}
              spec={loadChart(props.rows, props.trainMassKg, props.units)}
              palette={props.palette}
              empty={t("chartEmpty")}
              height={280}
            />
          </Show>
        </div>
      </div>

      <Cautions />
    </div>
  );
}
