/**
 * The printable card of one note: fits one A4 or Letter page. Profile sketch with the train, key
 * figures, load table, recommended practice, hazards, usual rail conditions, cautions and the revision
 * record. The same component is the on-screen preview and the printed page.
 *
 * A card is complete or says it is not: while the load table is still being worked out, a line at its top
 * says so ("Incomplete — wait for the load table"), on screen and on paper. Its foot says what the figures
 * were computed from (the note's revision, the program version, the reference train, the rail-condition
 * defaults and a fingerprint of all of them) and when it was printed, so an old printout can be told from
 * a current one.
 */
import { words } from "../../words.js";
import { For, Show, type JSX } from "solid-js";
import { STANDARD_CAUTIONS } from "../../../core/planner/cautions.js";
import type { LoadTableRow } from "../../../core/dispatch/loadTable.js";
import type { RailCondition } from "../../../core/physics/types.js";
import { latestRevision } from "../../../profiles/notes.js";
import type { LocationNoteFile } from "../../../profiles/schemas.js";
import type { CardProvenance } from "../../../profiles/provenance.js";
import { DEFAULT_REFERENCE_TEMPERATURE_C, type ReferenceSummary } from "../../../profiles/referenceTrain.js";
import { show, showAtMost, type UnitSystem } from "../../format.js";
import { HAZARD_KINDS } from "./draft.js";
import type { NoteFigures } from "./figures.js";
import type { LoadTableOutcome } from "./loadTableRunner.js";
import { slackSentence, type ProfileModel } from "./profileModel.js";
import { ProfileSketch } from "./ProfileSketch.js";
import { RailSandTable } from "../shared/RailSandTable.js";

const SEASON_WORD = { spring: "Spring", summer: "Summer", autumn: "Autumn", winter: "Winter" } as const;

export interface CardProps {
  note: LocationNoteFile;
  units: UnitSystem;
  model: ProfileModel | undefined;
  figures: NoteFigures;
  reference: ReferenceSummary;
  /** undefined while it is being worked out. */
  loadTable: LoadTableOutcome | undefined;
  /** Why the train cannot be drawn, if it cannot. */
  placementIssue?: string | undefined;
  /** When the card is (being) printed, "YYYY-MM-DD HH:MM" in the device's time zone. */
  printedAt: string;
  provenance: CardProvenance;
}

/** The line an unfinished card carries at its top, on screen and on paper. */
export const INCOMPLETE_LINE = "Incomplete — wait for the load table.";

/** Whether every figure of the card is worked out (a table that cannot be worked out says why, so counts). */
export function cardComplete(loadTable: LoadTableOutcome | undefined): boolean {
  return loadTable !== undefined;
}

/** A mass cell of the load table: "none" when even a light train would not start; rounded down, as `taut table` gives it. */
export function massCell(row: LoadTableRow | undefined, units: UnitSystem): string {
  if (!row) return "–";
  if (row.maxTrailingMassKg < 1000) return "none";
  return showAtMost("mass", row.maxTrailingMassKg, units);
}

export function LoadTableGrid(props: { rows: readonly LoadTableRow[]; units: UnitSystem; caption: string }): JSX.Element {
  const find = (rail: RailCondition, sand: boolean) => props.rows.find((r) => r.rail === rail && r.sand === sand);
  return <RailSandTable class="notes-loadtable" caption={props.caption} cell={(rail, sand) => <td>{massCell(find(rail, sand), props.units)}</td>} />;
}

/** A worked-out load table, or why it could not be worked out. */
export function LoadTableResult(props: { outcome: LoadTableOutcome; units: UnitSystem }): JSX.Element {
  const rows = () => (props.outcome.ok ? props.outcome.rows : undefined);
  const why = () => (props.outcome.ok ? "" : props.outcome.issues.map((i) => i.message).join("; "));
  return (
    <Show when={rows()} fallback={<p class="notes-issue-box">The load table cannot be worked out: {why()}</p>}>
      {(r) => (
        <>
          <LoadTableGrid rows={r()} units={props.units} caption="Largest trailing mass that starts" />
          <Show when={r().some((x) => x.maxTrailingMassKg <= 0)}>
            <p class="card-small">"none": not even a light train of these wagons is expected to start in that condition with these locomotives.</p>
          </Show>
        </>
      )}
    </Show>
  );
}

export function Card(props: CardProps): JSX.Element {
  const u = () => props.units;
  const dist = (m: number) => show("distance", m, u());
  const grade = (pm: number) => show("grade", pm / 1000, u());
  const n = () => props.note;
  const lineDir = () => [n().line, n().direction].filter(Boolean).join(" · ");
  const last = () => latestRevision(n());
  const stretch = (f: NoteFigures["under"]) => {
    if (!f) return "–";
    const g = Math.abs(f.maxGradient - f.minGradient) < 1e-9 ? `${grade(f.meanGradient)} throughout` : `${grade(f.minGradient)} to ${grade(f.maxGradient)}, ${grade(f.meanGradient)} on average`;
    return `${g}; ${f.sharpestRadius > 0 ? `sharpest curve ${show("radius", f.sharpestRadius, u())}` : "straight"}`;
  };
  const hazardsNumbered = () => {
    // Hazards with a place are numbered in the sketch's order (by chainage), the rest follow.
    const placed = n().hazards.filter((h) => h.at_m !== undefined).sort((a, b) => a.at_m! - b.at_m!);
    return [...placed, ...n().hazards.filter((h) => h.at_m === undefined)];
  };
  const kind = (k: string) => HAZARD_KINDS.find((h) => h.kind === k)?.label ?? k;

  return (
    <article class="notes-card" aria-label={`Location card: ${n().name}`}>
      <header class="card-head">
        <div>
          <h2 class="card-title">{n().name}</h2>
          <Show when={lineDir()}>
            <p class="card-sub">{lineDir()}</p>
          </Show>
        </div>
        <div class="card-rev">
          <span>Revised {last().date}</span>
          <span>by {last().initials}</span>
          <Show when={n().illustrative}>
            <span class="card-tag">Illustrative demo note</span>
          </Show>
        </div>
      </header>

      <Show when={!cardComplete(props.loadTable)}>
        <p class="card-incomplete" role="status">
          <strong>{INCOMPLETE_LINE}</strong> The load table was still being worked out: this copy lacks the card's main figures. Do not use
          it; print again once the load table is shown.
        </p>
      </Show>

      <Show when={n().standing}>
        <p class="card-standing">
          <strong>Standing: </strong>
          {n().standing}
        </p>
      </Show>

      <section class="card-sketch">
        <Show when={props.model} fallback={<p class="card-missing">No profile to draw.</p>}>
          {(m) => <ProfileSketch model={m()} units={u()} />}
        </Show>
        <Show when={props.placementIssue}>
          <p class="card-missing">{props.placementIssue}</p>
        </Show>
      </section>

      <div class="card-columns">
        <section class="card-figures">
          <h3>Key figures</h3>
          <dl>
            <dt>Front of train</dt>
            <dd>at {dist(n().frontAt_m)}</dd>
            <dt>Clear ahead</dt>
            <dd>{dist(n().clearAhead_m)}</dd>
            <Show when={n().speedLimit_kmh !== undefined}>
              <dt>Speed limit</dt>
              <dd>{show("speed", (n().speedLimit_kmh ?? 0) / 3.6, u(), 0)}</dd>
            </Show>
            <dt>Under the train</dt>
            <dd>{stretch(props.figures.under)}</dd>
            <dt>Ahead</dt>
            <dd>{stretch(props.figures.ahead)}</dd>
            <Show when={props.model?.train}>
              {(t) => (
                <>
                  <dt>Slack at rest</dt>
                  <dd>{slackSentence(t().runs, dist)}</dd>
                </>
              )}
            </Show>
          </dl>
        </section>

        <section class="card-load">
          <h3>Load table</h3>
          <Show when={props.loadTable} fallback={<p>Working out…</p>}>
            {(t) => <LoadTableResult outcome={t()} units={u()} />}
          </Show>
          <p class="card-small">
            For {props.reference.locomotives || "the reference locomotives"}; train make-up of "{props.reference.trainLabel}" (its
            wagons, length and slack), {show("temperature", n().referenceTrain?.temperature_C ?? DEFAULT_REFERENCE_TEMPERATURE_C, u())}. Computed from the physics; an estimate, not a
            rating.
          </p>
        </section>
      </div>

      <div class="card-columns">
        <section class="card-practice">
          <h3>Recommended practice</h3>
          <p class="card-text">{n().practice || "None recorded."}</p>
        </section>
        <section class="card-hazards">
          <h3>Hazards</h3>
          <Show when={hazardsNumbered().length > 0} fallback={<p>None recorded.</p>}>
            <ol>
              <For each={hazardsNumbered()}>
                {(h) => (
                  <li>
                    <strong>{kind(h.kind)}</strong>
                    {h.at_m !== undefined ? ` at ${dist(h.at_m)}` : ""}
                    {h.note ? ` — ${h.note}` : ""}
                  </li>
                )}
              </For>
            </ol>
          </Show>
          <Show when={n().seasons.length > 0}>
            <h3>Usual rail by season</h3>
            <ul>
              <For each={n().seasons}>
                {(s) => (
                  <li>
                    <strong>{SEASON_WORD[s.season]}:</strong> {words.railInline(s.rail)}
                    {s.note ? ` — ${s.note}` : ""}
                  </li>
                )}
              </For>
            </ul>
          </Show>
        </section>
      </div>

      <section class="card-cautions">
        <h3>Cautions</h3>
        <ul>
          <For each={STANDARD_CAUTIONS}>{(c) => <li>{c}</li>}</For>
        </ul>
      </section>

      <section class="card-revisions">
        <h3>Revisions</h3>
        <table>
          <tbody>
            <For each={[...n().revisions].reverse().slice(0, 3)}>
              {(r) => (
                <tr>
                  <td>{r.date}</td>
                  <td>{r.initials}</td>
                  <td>{r.change}</td>
                </tr>
              )}
            </For>
          </tbody>
        </table>
        <Show when={n().revisions.length > 3}>
          <p class="card-small">{n().revisions.length - 3} earlier revision(s) are kept in the note file.</p>
        </Show>
      </section>
      <footer class="card-foot">
        <p>
          Taut location card · {n().id} · revision {props.provenance.revision} of {props.provenance.revisionDate} · printed {props.printedAt} · Taut{" "}
          {props.provenance.version} · fingerprint {props.provenance.fingerprint} · advisory only
        </p>
        <p class="card-computed">
          Computed from: {props.reference.locomotives || "the reference locomotives"} with "{props.reference.trainLabel}",{" "}
          {show("temperature", n().referenceTrain?.temperature_C ?? DEFAULT_REFERENCE_TEMPERATURE_C, u())}; rail-condition defaults, {props.provenance.rail}.
        </p>
      </footer>
    </article>
  );
}
