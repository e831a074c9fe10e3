/**
 * Start review (view): a recorded start held against its plan, for one location note — the recording to
 * read, what it showed (plan against recording, the observed factors, the verdict re-judged), keeping it
 * with the note, and the note's reviews with their observed factor. The words of the review itself come
 * from src/profiles/reviewReport.ts; this view's own labels are here.
 */
import { For, Show, type JSX } from "solid-js";
import type { ReviewReport } from "../../../profiles/reviewReport.js";
import type { StartReviewFile } from "../../../profiles/notes.js";
import { RAIL_CONDITIONS, type RailCondition } from "../../../core/physics/types.js";

/** The note's load table, the model's masses and the same with the observed factor, in tonnes (null: none starts). */
export interface ObservedTable {
  working: boolean;
  rows?: Array<{ rail: string; sand: boolean; modelT: number | null; observedT: number | null }>;
  why?: string;
}

export interface KeepForm {
  date: string;
  rail: RailCondition;
  train: string;
  initials: string;
}

export interface StartReviewViewProps {
  noteName: string | null;
  /** Why no review can be made yet (no note chosen, no valid start case), or null. */
  blocked: string | null;
  caseText: string;
  busy: boolean;
  problem: string | null;
  report: ReviewReport | null;
  form: KeepForm;
  kept: boolean;
  reviews: StartReviewFile[];
  observed: { median: number; reviews: number } | null;
  onFile: (file: File) => void;
  onForm: (f: Partial<KeepForm>) => void;
  onKeep: () => void;
  onDelete: (id: string) => void;
  onBack: () => void;
  /** The note's load table beside the same masses with the observed factor applied; null until asked. */
  table: ObservedTable | null;
  onTable: () => void;
}

/** A small speed–time sketch: polylines in a fixed box, the first series solid, the others dashed. */
export function SpeedSketch(props: { timeS: number[]; series: Array<{ label: string; kmh: number[]; dashed?: boolean }>; width?: number; height?: number }): JSX.Element {
  const w = props.width ?? 320;
  const h = props.height ?? 120;
  const t0 = Math.min(...props.timeS);
  const t1 = Math.max(...props.timeS, t0 + 1);
  const v1 = Math.max(1, ...props.series.flatMap((s) => s.kmh));
  const points = (kmh: number[]) => kmh.map((v, i) => `${(((props.timeS[i]! - t0) / (t1 - t0)) * (w - 8) + 4).toFixed(1)},${(h - 4 - (v / v1) * (h - 8)).toFixed(1)}`).join(" ");
  return (
    <svg class="review-sketch" width={w} height={h} viewBox={`0 0 ${w} ${h}`} role="img" aria-label={`Speed against time: ${props.series.map((s) => s.label).join(", ")}; up to ${Math.round(v1)} km/h over ${Math.round(t1 - t0)} s`}>
      <rect x="0.5" y="0.5" width={w - 1} height={h - 1} fill="none" stroke="currentColor" stroke-opacity="0.3" />
      <For each={props.series}>{(s) => <polyline points={points(s.kmh)} fill="none" stroke="currentColor" stroke-width={s.dashed ? 1.5 : 2.5} stroke-dasharray={s.dashed ? "5 4" : undefined} />}</For>
    </svg>
  );
}

const factorText = (f: { value: number; low: number; high: number }) => `${f.value.toFixed(2)} (${f.low.toFixed(2)}–${f.high.toFixed(2)})`;

export function StartReviewView(props: StartReviewViewProps): JSX.Element {
  return (
    <section class="review-screen" aria-labelledby="review-h">
      <h2 id="review-h">Start review{props.noteName ? `: ${props.noteName}` : ""}</h2>
      <p class="hint">Hold a recorded start against its plan. The recording is a file made before or after the trip (a GPX track, or a CSV log with time_s and speed_kmh), never typed in while moving.</p>
      <button type="button" class="button" onClick={() => props.onBack()}>
        Back to the location notes
      </button>
      <Show when={props.blocked} fallback={<p>{props.caseText}</p>}>
        {(why) => <p class="problem" role="status">{why()}</p>}
      </Show>
      <Show when={!props.blocked}>
        <label class="field">
          <span>Recording (.gpx or .csv)</span>
          <input
            type="file"
            accept=".gpx,.csv"
            aria-label="Recording file"
            disabled={props.busy}
            onChange={(e) => {
              const f = e.currentTarget.files?.[0];
              if (f) props.onFile(f);
              e.currentTarget.value = "";
            }}
          />
        </label>
      </Show>
      <Show when={props.busy}>
        <p role="status">Reviewing: re-running the start with trial factors…</p>
      </Show>
      <Show when={props.problem}>
        {(p) => (
          <p class="problem" role="alert" style={{ "white-space": "pre-line" }}>
            {p()}
          </p>
        )}
      </Show>
      <Show when={props.report}>
        {(r) => (
          <div class="review-result">
            <h3>What the recording shows</h3>
            <ul>
              <For each={r().summary}>{(line) => <li>{line}</li>}</For>
            </ul>
            <Show when={r().series}>
              {(s) => (
                <figure>
                  <SpeedSketch
                    timeS={s().time_s}
                    series={[
                      { label: "recorded", kmh: s().recordedSpeed_kmh },
                      { label: "planned", kmh: s().plannedSpeed_kmh, dashed: true },
                      { label: "re-run with the fitted factor", kmh: s().fittedSpeed_kmh, dashed: true },
                    ]}
                    width={480}
                    height={180}
                  />
                  <figcaption>Speed from the moment of start: recorded (solid), planned and re-run with the fitted factor (dashed).</figcaption>
                </figure>
              )}
            </Show>
            <h3>Keep it with the note</h3>
            <div class="review-form">
              <label class="field">
                <span>Date</span>
                <input type="date" value={props.form.date} onInput={(e) => props.onForm({ date: e.currentTarget.value })} />
              </label>
              <label class="field">
                <span>Rail on the day</span>
                <select value={props.form.rail} onChange={(e) => props.onForm({ rail: e.currentTarget.value as RailCondition })}>
                  <For each={RAIL_CONDITIONS}>{(c) => <option value={c}>{c}</option>}</For>
                </select>
              </label>
              <label class="field">
                <span>Train</span>
                <input type="text" maxLength={200} value={props.form.train} onInput={(e) => props.onForm({ train: e.currentTarget.value })} />
              </label>
              <label class="field">
                <span>Initials</span>
                <input type="text" maxLength={10} value={props.form.initials} onInput={(e) => props.onForm({ initials: e.currentTarget.value })} />
              </label>
              <button type="button" class="button primary" disabled={props.busy || props.kept} onClick={() => props.onKeep()}>
                {props.kept ? "Kept with the note" : "Keep with this note"}
              </button>
            </div>
          </div>
        )}
      </Show>
      <h3>Reviews kept with this note</h3>
      <Show when={props.observed}>
        {(o) => (
          <p class="observed">
            Observed mass factor {o().median.toFixed(2)}: the median of {o().reviews} review{o().reviews === 1 ? "" : "s"}. Trains here have started as if{" "}
            {Math.abs(Math.round((o().median - 1) * 100))} % {o().median >= 1 ? "heavier" : "lighter"} than planned; read the note's load table with it as observed
            (each largest mass ÷ {o().median.toFixed(2)}), beside the model, never in its place.
          </p>
        )}
      </Show>
      <Show when={props.observed}>
        <button type="button" class="button" disabled={props.table?.working === true} onClick={() => props.onTable()}>
          Load table with the observed factor
        </button>
        <Show when={props.table?.working}>
          <p role="status">Working out the note's load table…</p>
        </Show>
        <Show when={props.table?.why}>{(why) => <p class="problem">{why()}</p>}</Show>
        <Show when={props.table?.rows}>
          {(rows) => (
            <table class="review-table">
              <caption>The note's load table (its reference train): the model's largest trailing mass, and the same ÷ the observed factor — observed, not the model.</caption>
              <thead>
                <tr>
                  <th scope="col">Rail</th>
                  <th scope="col">Sand</th>
                  <th scope="col">Model, t</th>
                  <th scope="col">Observed, t</th>
                </tr>
              </thead>
              <tbody>
                <For each={rows()}>
                  {(row) => (
                    <tr>
                      <td>{row.rail}</td>
                      <td>{row.sand ? "yes" : "no"}</td>
                      <td>{row.modelT === null ? "none" : row.modelT}</td>
                      <td>{row.observedT === null ? "none" : `${row.observedT} (observed)`}</td>
                    </tr>
                  )}
                </For>
              </tbody>
            </table>
          )}
        </Show>
      </Show>
      <Show when={props.reviews.length > 0} fallback={<p>None yet.</p>}>
        <ul class="review-list">
          <For each={props.reviews}>
            {(v) => (
              <li>
                <SpeedSketch timeS={v.thumbnail.time_s} series={[{ label: "recorded", kmh: v.thumbnail.speed_kmh }]} width={160} height={60} />
                <span>
                  {v.date}, {v.rail}, {v.train}
                  {v.initials ? ` (${v.initials})` : ""}: mass factor {factorText(v.massFactor)}
                  {v.effortFactor ? `, effort factor ${factorText(v.effortFactor)}` : ""}
                  {v.separable === false ? " (not told apart)" : ""}; planned {v.plannedVerdict}, re-judged {v.replannedVerdict}.
                </span>
                <button type="button" class="button" aria-label={`Remove the review of ${v.date}`} onClick={() => props.onDelete(v.id)}>
                  Remove
                </button>
              </li>
            )}
          </For>
        </ul>
      </Show>
    </section>
  );
}
