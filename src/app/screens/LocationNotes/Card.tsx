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
import { cautionWords } from "../../cautions.js";
import type { LoadTableRow } from "../../../core/dispatch/loadTable.js";
import { RAIL_CONDITIONS, type RailCondition } from "../../../core/physics/types.js";
import { latestRevision } from "../../../profiles/notes.js";
import type { LocationNoteFile } from "../../../profiles/schemas.js";
import type { CardProvenance } from "../../../profiles/provenance.js";
import { DEFAULT_REFERENCE_TEMPERATURE_C, type ReferenceSummary } from "../../../profiles/referenceTrain.js";
import { show, showAtMost, type UnitSystem } from "../../format.js";
import { HAZARD_KINDS, hazardWord, type HazardKind } from "./draft.js";
import type { NoteFigures } from "./figures.js";
import type { LoadTableOutcome } from "./loadTableRunner.js";
import { slackSentence, type ProfileModel } from "./profileModel.js";
import { ProfileSketch } from "./ProfileSketch.js";
import { RailSandTable } from "../shared/RailSandTable.js";
import { card } from "../../../i18n/en/card.js";
import { tr } from "../../i18n.js";
import { localiseIssue } from "../../fieldWords.js";

const t = tr.ns(card);
const SEASON_WORD = { spring: () => t("spring"), summer: () => t("summer"), autumn: () => t("autumn"), winter: () => t("winter") } as const;

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
export const INCOMPLETE_LINE = (): string => t("incomplete");

/** Whether every figure of the card is worked out (a table that cannot be worked out says why, so counts). */
export function cardComplete(loadTable: LoadTableOutcome | undefined): boolean {
  return loadTable !== undefined;
}

/** A mass cell of the load table: "none" when even a light train would not start; rounded down, as `taut table` gives it. */
export function massCell(row: LoadTableRow | undefined, units: UnitSystem): string {
  if (!row) return "–";
  if (row.maxTrailingMassKg < 1000) return t("none");
  return showAtMost("mass", row.maxTrailingMassKg, units);
}

export function LoadTableGrid(props: { rows: readonly LoadTableRow[]; units: UnitSystem; caption: string }): JSX.Element {
  const find = (rail: RailCondition, sand: boolean) => props.rows.find((r) => r.rail === rail && r.sand === sand);
  return <RailSandTable class="notes-loadtable" caption={props.caption} cell={(rail, sand) => <td>{massCell(find(rail, sand), props.units)}</td>} />;
}

/** A worked-out load table, or why it could not be worked out. */
export function LoadTableResult(props: { outcome: LoadTableOutcome; units: UnitSystem }): JSX.Element {
  const rows = () => (props.outcome.ok ? props.outcome.rows : undefined);
  // A coded issue (the reference train off the profile, an unknown train, the work cap) in the language on
  // screen; an editor's check arrives already in words.
  const why = () => (props.outcome.ok ? "" : props.outcome.issues.map((i) => (i.code || i.reader ? localiseIssue(i, props.units).message : i.message)).join("; "));
  return (
    <Show when={rows()} fallback={<p class="notes-issue-box">{t("cannotWorkOut", { why: why() })}</p>}>
      {(r) => (
        <>
          <LoadTableGrid rows={r()} units={props.units} caption={t("largestMass")} />
          <Show when={r().some((x) => x.maxTrailingMassKg <= 0)}>
            <p class="card-small">{t("noneNote")}</p>
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
    const g =
      Math.abs(f.maxGradient - f.minGradient) < 1e-9
        ? t("gradeThroughout", { grade: grade(f.meanGradient) })
        : t("gradeRange", { min: grade(f.minGradient), max: grade(f.maxGradient), mean: grade(f.meanGradient) });
    return `${g}; ${f.sharpestRadius > 0 ? t("sharpestCurve", { radius: show("radius", f.sharpestRadius, u()) }) : t("straight")}`;
  };
  const hazardsNumbered = () => {
    // Hazards with a place are numbered in the sketch's order (by chainage), the rest follow.
    const placed = n().hazards.filter((h) => h.at_m !== undefined).sort((a, b) => a.at_m! - b.at_m!);
    return [...placed, ...n().hazards.filter((h) => h.at_m === undefined)];
  };
  const kind = (k: string) => (HAZARD_KINDS.some((h) => h.kind === k) ? hazardWord(k as HazardKind) : k);

  return (
    <article class="notes-card" aria-label={t("label", { name: n().name })}>
      <header class="card-head">
        <div>
          <h2 class="card-title">{n().name}</h2>
          <Show when={lineDir()}>
            <p class="card-sub">{lineDir()}</p>
          </Show>
        </div>
        <div class="card-rev">
          <span>{t("revised", { date: last().date })}</span>
          <span>{t("by", { initials: last().initials })}</span>
          <Show when={n().illustrative}>
            <span class="card-tag">{t("illustrative")}</span>
          </Show>
        </div>
      </header>

      <Show when={!cardComplete(props.loadTable)}>
        <p class="card-incomplete" role="status">
          <strong>{INCOMPLETE_LINE()}</strong>
          {t("incompleteText")}
        </p>
      </Show>

      <Show when={n().standing}>
        <p class="card-standing">
          <strong>{t("standing")}</strong>
          {n().standing}
        </p>
      </Show>

      <section class="card-sketch">
        <Show when={props.model} fallback={<p class="card-missing">{t("noProfile")}</p>}>
          {(m) => <ProfileSketch model={m()} units={u()} />}
        </Show>
        <Show when={props.placementIssue}>
          <p class="card-missing">{props.placementIssue}</p>
        </Show>
      </section>

      <div class="card-columns">
        <section class="card-figures">
          <h3>{t("keyFigures")}</h3>
          <dl>
            <dt>{t("frontOfTrain")}</dt>
            <dd>{t("frontAt", { distance: dist(n().frontAt_m) })}</dd>
            <dt>{t("clearAhead")}</dt>
            <dd>{dist(n().clearAhead_m)}</dd>
            <Show when={n().speedLimit_kmh !== undefined}>
              <dt>{t("speedLimit")}</dt>
              <dd>{show("speed", (n().speedLimit_kmh ?? 0) / 3.6, u(), 0)}</dd>
            </Show>
            <dt>{t("underTrain")}</dt>
            <dd>{stretch(props.figures.under)}</dd>
            <dt>{t("ahead")}</dt>
            <dd>{stretch(props.figures.ahead)}</dd>
            <Show when={props.model?.train}>
              {(train) => (
                <>
                  <dt>{t("slackAtRest")}</dt>
                  <dd>{slackSentence(train().runs, dist)}</dd>
                </>
              )}
            </Show>
          </dl>
        </section>

        <section class="card-load">
          <h3>{t("loadTable")}</h3>
          <Show when={props.loadTable} fallback={<p>{t("workingOut")}</p>}>
            {(table) => <LoadTableResult outcome={table()} units={u()} />}
          </Show>
          <p class="card-small">
            {t("forTrain", {
              locomotives: props.reference.locomotives || t("referenceLocos"),
              train: props.reference.trainLabel,
              temperature: show("temperature", n().referenceTrain?.temperature_C ?? DEFAULT_REFERENCE_TEMPERATURE_C, u()),
            })}
          </p>
        </section>
      </div>

      <div class="card-columns">
        <section class="card-practice">
          <h3>{t("practice")}</h3>
          <p class="card-text">{n().practice || t("noneRecorded")}</p>
        </section>
        <section class="card-hazards">
          <h3>{t("hazards")}</h3>
          <Show when={hazardsNumbered().length > 0} fallback={<p>{t("noneRecorded")}</p>}>
            <ol>
              <For each={hazardsNumbered()}>
                {(h) => (
                  <li>
                    <strong>{kind(h.kind)}</strong>
                    {h.at_m !== undefined ? t("hazardAt", { distance: dist(h.at_m) }) : ""}
                    {h.note ? ` — ${h.note}` : ""}
                  </li>
                )}
              </For>
            </ol>
          </Show>
          <Show when={n().seasons.length > 0}>
            <h3>{t("seasons")}</h3>
            <ul>
              <For each={n().seasons}>
                {(s) => (
                  <li>
                    <strong>{SEASON_WORD[s.season]()}:</strong> {words.railInline(s.rail)}
                    {s.note ? ` — ${s.note}` : ""}
                  </li>
                )}
              </For>
            </ul>
          </Show>
        </section>
      </div>

      <section class="card-cautions">
        <h3>{t("cautions")}</h3>
        <ul>
          <For each={STANDARD_CAUTIONS}>{(c) => <li>{cautionWords(c)}</li>}</For>
        </ul>
      </section>

      <section class="card-revisions">
        <h3>{t("revisions")}</h3>
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
          <p class="card-small">{t("earlierRevisions", { count: n().revisions.length - 3 })}</p>
        </Show>
      </section>
      <footer class="card-foot">
        <p>
          {t("foot", {
            id: n().id,
            revision: String(props.provenance.revision),
            date: props.provenance.revisionDate,
            at: props.printedAt,
            version: props.provenance.version,
            fingerprint: props.provenance.fingerprint,
          })}
        </p>
        <p class="card-computed">
          {t("computedFrom", {
            locomotives: props.reference.locomotives || t("referenceLocos"),
            train: props.reference.trainLabel,
            temperature: show("temperature", n().referenceTrain?.temperature_C ?? DEFAULT_REFERENCE_TEMPERATURE_C, u()),
            rail: t("railDefaults", { list: RAIL_CONDITIONS.map((r) => `${words.railInline(r)} ${tr.num(props.provenance.adhesion[r].median, 2)} / ${tr.num(props.provenance.adhesion[r].sanded, 2)}`).join(", ") }),
          })}
        </p>
      </footer>
    </article>
  );
}
