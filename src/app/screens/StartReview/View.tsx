/**
 * Start review (view): a recorded start held against its plan, for one location note — the recording to
 * read, what it showed (plan against recording, the observed factors, the verdict re-judged), keeping it
 * with the note, and the note's reviews with their observed factor. What the review says comes from
 * src/profiles/reviewReport.ts as data, rendered in the language on screen (`lines`); every word is in the
 * `review` namespace (src/i18n/en/review.ts).
 */
import { For, Show, type JSX } from "solid-js";
import type { ReviewReport } from "../../../profiles/reviewReport.js";
import type { StartReviewFile } from "../../../profiles/notes.js";
import { RAIL_CONDITIONS, type RailCondition } from "../../../core/physics/types.js";
import type { Verdict } from "../../../core/planner/outcome.js";
import { review } from "../../../i18n/en/review.js";
import { tr } from "../../i18n.js";
import { words } from "../../words.js";
import { Figures } from "../../components/Figures.js";
import { Icon } from "../../components/Icon.js";

const t = tr.ns(review);

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
  /** What the review says, one sentence each, in the language on screen. */
  lines: string[];
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

/** Line styles of the sketch's series: solid, dashed, dotted (each told apart without colour). */
const DASH = { dashed: "5 4", dotted: "1.5 3.5" } as const;

/** A small speed–time sketch: polylines in a fixed box, each series solid, dashed or dotted. */
export function SpeedSketch(props: { timeS: number[]; series: Array<{ label: string; kmh: number[]; line?: keyof typeof DASH }>; width?: number; height?: number }): JSX.Element {
  const w = props.width ?? 320;
  const h = props.height ?? 120;
  const t0 = Math.min(...props.timeS);
  const t1 = Math.max(...props.timeS, t0 + 1);
  const v1 = Math.max(1, ...props.series.flatMap((s) => s.kmh));
  const points = (kmh: number[]) => kmh.map((v, i) => `${(((props.timeS[i]! - t0) / (t1 - t0)) * (w - 8) + 4).toFixed(1)},${(h - 4 - (v / v1) * (h - 8)).toFixed(1)}`).join(" ");
  return (
    <svg class="review-sketch" width={w} height={h} viewBox={`0 0 ${w} ${h}`} role="img" aria-label={t("sketchLabel", { series: props.series.map((s) => s.label).join(", "), speed: Math.round(v1), time: Math.round(t1 - t0) })}>
      <rect x="0.5" y="0.5" width={w - 1} height={h - 1} fill="none" stroke="currentColor" stroke-opacity="0.3" />
      <For each={props.series}>{(s) => <polyline points={points(s.kmh)} fill="none" stroke="currentColor" stroke-width={s.line ? 1.8 : 2.5} stroke-linecap={s.line === "dotted" ? "round" : undefined} stroke-dasharray={s.line ? DASH[s.line] : undefined} />}</For>
    </svg>
  );
}

const factorText = (f: { value: number; low: number; high: number }) => t("factor", { value: tr.num(f.value, 2), low: tr.num(f.low, 2), high: tr.num(f.high, 2) });
/** A kept review's verdict code in words (a file from elsewhere may hold another word: shown as it is). */
const verdictWord = (v: string) => (["starts", "marginal", "needs-assistance"].includes(v) ? words.verdictInline(v as Verdict) : v);
const railWord = (r: string) => ((RAIL_CONDITIONS as readonly string[]).includes(r) ? words.railInline(r as RailCondition) : r);

export function StartReviewView(props: StartReviewViewProps): JSX.Element {
  let picker: HTMLInputElement | undefined;
  return (
    <section class="review-screen" aria-labelledby="review-h">
      <h2 id="review-h">{props.noteName ? t("titleNote", { note: props.noteName }) : t("title")}</h2>
      <p class="hint">{t("intro")}</p>
      <button type="button" class="button" onClick={() => props.onBack()}>
        {t("back")}
      </button>
      <Show when={props.blocked} fallback={
          <p>
            <Figures text={props.caseText} />
          </p>
        }>
        {(why) => <p class="problem" role="status">{why()}</p>}
      </Show>
      <Show when={!props.blocked}>
        {/* Our own button in the language on screen: the browser's file input would speak its own language. */}
        <div class="file-actions">
          <button type="button" class="button primary big" disabled={props.busy} onClick={() => picker?.click()}>
            <Icon name="open" /> {t("recording")}
          </button>
          <input
            ref={picker}
            class="visually-hidden"
            type="file"
            accept=".gpx,.csv"
            aria-label={t("recordingFile")}
            tabIndex={-1}
            disabled={props.busy}
            onChange={(e) => {
              const f = e.currentTarget.files?.[0];
              if (f) props.onFile(f);
              e.currentTarget.value = "";
            }}
          />
        </div>
      </Show>
      <Show when={props.busy}>
        <p role="status">{t("reviewing")}</p>
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
            <h3>{t("shows")}</h3>
            <ul>
              <For each={props.lines}>{(line) => (
                <li>
                  <Figures text={line} />
                </li>
              )}</For>
            </ul>
            <Show when={r().series}>
              {(s) => (
                <figure>
                  <SpeedSketch
                    timeS={s().time_s}
                    series={[
                      { label: t("recorded"), kmh: s().recordedSpeed_kmh },
                      { label: t("planned"), kmh: s().plannedSpeed_kmh, line: "dashed" },
                      { label: t("fitted"), kmh: s().fittedSpeed_kmh, line: "dotted" },
                    ]}
                    width={480}
                    height={180}
                  />
                  <figcaption>{t("sketchCaption")}</figcaption>
                </figure>
              )}
            </Show>
            <h3>{t("keep")}</h3>
            <div class="review-form">
              <label class="field">
                <span>{t("date")}</span>
                <input type="date" value={props.form.date} onInput={(e) => props.onForm({ date: e.currentTarget.value })} />
              </label>
              <label class="field">
                <span>{t("railOnDay")}</span>
                <select value={props.form.rail} onChange={(e) => props.onForm({ rail: e.currentTarget.value as RailCondition })}>
                  <For each={RAIL_CONDITIONS}>{(c) => <option value={c}>{words.rail(c)}</option>}</For>
                </select>
              </label>
              <label class="field">
                <span>{t("train")}</span>
                <input type="text" maxLength={200} value={props.form.train} onInput={(e) => props.onForm({ train: e.currentTarget.value })} />
              </label>
              <label class="field">
                <span>{t("initials")}</span>
                <input type="text" maxLength={10} value={props.form.initials} onInput={(e) => props.onForm({ initials: e.currentTarget.value })} />
              </label>
              <button type="button" class="button primary" disabled={props.busy || props.kept} onClick={() => props.onKeep()}>
                {props.kept ? t("kept") : t("keepButton")}
              </button>
            </div>
          </div>
        )}
      </Show>
      <h3>{t("keptReviews")}</h3>
      <Show when={props.observed}>
        {(o) => (
          <p class="observed">
            {t(o().median >= 1 ? "observedHeavier" : "observedLighter", { factor: tr.num(o().median, 2), count: o().reviews, pct: Math.abs(Math.round((o().median - 1) * 100)) })}
          </p>
        )}
      </Show>
      <Show when={props.observed}>
        <button type="button" class="button" disabled={props.table?.working === true} onClick={() => props.onTable()}>
          {t("tableButton")}
        </button>
        <Show when={props.table?.working}>
          <p role="status">{t("tableWorking")}</p>
        </Show>
        <Show when={props.table?.why}>{(why) => <p class="problem">{why()}</p>}</Show>
        <Show when={props.table?.rows}>
          {(rows) => (
            <table class="review-table">
              <caption>{t("tableCaption")}</caption>
              <thead>
                <tr>
                  <th scope="col">{t("colRail")}</th>
                  <th scope="col">{t("colSand")}</th>
                  <th scope="col">{t("colModel")}</th>
                  <th scope="col">{t("colObserved")}</th>
                </tr>
              </thead>
              <tbody>
                <For each={rows()}>
                  {(row) => (
                    <tr>
                      <td>{railWord(row.rail)}</td>
                      <td>{row.sand ? t("yes") : t("no")}</td>
                      <td>{row.modelT === null ? t("none") : tr.num(row.modelT, 0)}</td>
                      <td>{row.observedT === null ? t("none") : t("observedValue", { mass: tr.num(row.observedT, 0) })}</td>
                    </tr>
                  )}
                </For>
              </tbody>
            </table>
          )}
        </Show>
      </Show>
      <Show when={props.reviews.length > 0} fallback={<p>{t("noneYet")}</p>}>
        <ul class="review-list">
          <For each={props.reviews}>
            {(v) => (
              <li>
                <SpeedSketch timeS={v.thumbnail.time_s} series={[{ label: t("recorded"), kmh: v.thumbnail.speed_kmh }]} width={160} height={60} />
                <span>
                  {t("keptLine", {
                    date: v.date,
                    rail: railWord(v.rail),
                    train: v.train,
                    initials: v.initials ? t("keptInitials", { initials: v.initials }) : "",
                    mass: factorText(v.massFactor),
                    effort: v.effortFactor ? t("keptEffort", { effort: factorText(v.effortFactor) }) : "",
                    apart: v.separable === false ? t("keptApart") : "",
                    planned: verdictWord(v.plannedVerdict),
                    replanned: verdictWord(v.replannedVerdict),
                  })}
                </span>
                <button type="button" class="button" aria-label={t("removeLabel", { date: v.date })} onClick={() => props.onDelete(v.id)}>
                  {t("remove")}
                </button>
              </li>
            )}
          </For>
        </ul>
      </Show>
    </section>
  );
}
