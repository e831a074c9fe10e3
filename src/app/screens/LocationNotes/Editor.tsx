/**
 * The note editor: where the train stands, the table of segments, the live profile with the train and
 * its slack, the reference train and the note's load table, hazards, usual rail by season, practice,
 * and the revision entry for this save. Every rule broken is said in words at the field and in the
 * list above the Save button.
 */
import { words } from "../../words.js";
import { For, Match, Show, Switch, type JSX } from "solid-js";
import { RAIL_CONDITIONS } from "../../../core/physics/types.js";
import { DEFAULT_REFERENCE_TEMPERATURE_C } from "../../../profiles/referenceTrain.js";
import type { Library } from "../../../profiles/library.js";
import type { TrainPresetFile } from "../../../profiles/schemas.js";
import type { ChartPalette } from "../../charts/palette.js";
import { QuantityField } from "../../components/QuantityField.js";
import { show, type UnitSystem } from "../../format.js";
import { LoadTableResult } from "./Card.js";
import type { NoteEditor } from "./createNoteEditor.js";
import { HAZARD_KINDS, SEASONS, type HazardKind, type RailWord, type Season } from "./draft.js";
import { SelectField, TextField } from "./fields.js";
import { ProfileChart } from "./ProfileChart.js";
import { slackSentence } from "./profileModel.js";
import { SegmentsTable } from "./SegmentsTable.js";
import { issueAt } from "./validate.js";
import { hazardWord } from "./draft.js";
import { card } from "../../../i18n/en/card.js";
import { notes } from "../../../i18n/en/notes.js";
import { tr } from "../../i18n.js";

const t = tr.ns(notes);
const c = tr.ns(card);

export interface EditorProps {
  editor: NoteEditor;
  units: UnitSystem;
  palette: ChartPalette;
  presets: readonly TrainPresetFile[];
  library: Library;
  busy: boolean;
  onSave: () => void;
  onClose: () => void;
  onDelete: () => void;
  onCard: () => void;
  onExport: () => void;
}

const seasonLabel = (s: Season) => c(s);

export function Editor(props: EditorProps): JSX.Element {
  const e = () => props.editor;
  const d = () => props.editor.draft;
  const u = () => props.units;
  const dist = (m: number) => show("distance", m, u());
  const at = (...paths: string[]) => issueAt(e().issues(), ...paths)?.message;
  const isNew = () => e().saved() === undefined;
  const trainIssue = () => issueAt(e().issues(), "train")?.message;
  const summary = () => {
    const m = e().model();
    if (!m) return t("edEmptyProfile");
    const tn = m.train;
    const where = tn ? `${t("edStandsFrom", { rear: dist(tn.rearM), front: dist(tn.frontM) })} ${slackSentence(tn.runs, dist)}` : (trainIssue() ?? t("edCannotDraw"));
    return `${where} ${t("edClearAhead", { distance: dist(m.clearEndM - m.frontM) })}`;
  };
  const locoOptions = () => [
    { value: "", label: t("edAsInTrain") },
    ...[...props.library.locomotives.values()].map((l) => ({ value: l.file.id, label: l.file.label })),
  ];

  return (
    <div class="notes-editor">
      <header class="notes-editor-head">
        <h2>{isNew() ? t("edNewTitle") : t("edEditTitle", { name: e().saved()?.name ?? "" })}</h2>
        <Show when={d().illustrative}>
          <p class="notes-tag">{t("edIllustrative")}</p>
        </Show>
      </header>

      <section class="panel notes-section" aria-labelledby="notes-place-title">
        <h3 id="notes-place-title">{t("edPlace")}</h3>
        <div class="notes-grid">
          <TextField label={t("edName")} name="name" value={d().name} onValue={(v) => e().set("name", v)} issue={at("name")} maxLength={120} class="wide" />
          <TextField label={t("edLine")} name="line" value={d().line} onValue={(v) => e().set("line", v)} maxLength={120} />
          <TextField label={t("edDirection")} name="direction" value={d().direction} onValue={(v) => e().set("direction", v)} maxLength={120} />
          <TextField
            label={t("edStanding")}
            name="standing"
            value={d().standing}
            onValue={(v) => e().set("standing", v)}
            maxLength={400}
            multiline
            rows={2}
            class="wide lines"
            hint={t("edStandingHint")}
          />
        </div>
        <div class="notes-grid">
          <QuantityField label={t("edFrontAt")} name="frontAt_m" value={d().frontAt_m} units={u()} measure="distance" fileUnit="m" step={{ metric: 50, us: 100 }} onValue={(v) => e().set("frontAt_m", v)} />
          <QuantityField label={t("edClearAheadLabel")} name="clearAhead_m" value={d().clearAhead_m} units={u()} measure="distance" fileUnit="m" step={{ metric: 50, us: 100 }} min={0} onValue={(v) => e().set("clearAhead_m", v)} />
          <QuantityField
            label={t("edSpeedLimit")}
            name="speedLimit_kmh"
            value={d().speedLimit_kmh}
            units={u()}
            measure="speed"
            fileUnit="kmh"
            step={{ metric: 5, us: 5 }}
            min={0}
            decimals={0}
            onValue={(v) => e().set("speedLimit_kmh", v)}
            hint={t("edSpeedLimitHint")}
          />
        </div>
        <Show when={at("frontAt_m", "clearAhead_m", "speedLimit_kmh")}>
          <ul class="notes-issues">
            <For each={e().issues().filter((i) => ["frontAt_m", "clearAhead_m", "speedLimit_kmh"].includes(i.path))}>{(i) => <li classList={{ warning: i.severity === "warning" }}>{i.message}</li>}</For>
          </ul>
        </Show>
      </section>

      <SegmentsTable
        segments={d().segments}
        units={u()}
        issues={e().issues()}
        onChange={(k, field, v) => e().set("segments", k, field, v)}
        onAdd={() => e().addSegment()}
        onRemove={(k) => e().removeSegment(k)}
        onJoin={() => e().joinSegments()}
      />

      <section class="panel notes-section" aria-labelledby="notes-profile-title">
        <h3 id="notes-profile-title">{t("edProfileTitle")}</h3>
        <ProfileChart model={e().model()} units={u()} palette={props.palette} summary={summary()} />
        <Show when={trainIssue()}>
          <p class="notes-issue-box" role="alert">
            {trainIssue()}
          </p>
        </Show>
      </section>

      <section class="panel notes-section" aria-labelledby="notes-load-title">
        <h3 id="notes-load-title">{t("edLoadTitle")}</h3>
        <p class="notes-hint">{t("edLoadHint")}</p>
        <div class="notes-grid">
          <SelectField
            label={t("edReferenceTrain")}
            name="referenceTrain.train"
            value={d().referenceTrain.train}
            options={props.presets.map((p) => ({ value: p.id, label: p.label }))}
            onValue={(v) => e().set("referenceTrain", "train", v)}
            class="wide"
          />
          <SelectField
            label={t("edLocomotives")}
            name="referenceTrain.locomotive"
            value={d().referenceTrain.locomotive ?? ""}
            options={locoOptions()}
            onValue={(v) => e().set("referenceTrain", (r) => (v ? { ...r, locomotive: v } : (({ locomotive: _drop, ...rest }) => rest)(r)))}
          />
          <QuantityField
            label={t("edHowMany")}
            name="referenceTrain.count"
            value={d().referenceTrain.count ?? props.presets.find((p) => p.id === d().referenceTrain.train)?.locomotives[0]?.count ?? 1}
            units={u()}
            integer
            step={1}
            min={1}
            max={8}
            onValue={(v) => e().set("referenceTrain", (r) => (Number.isFinite(v) ? { ...r, count: Math.round(v) } : (({ count: _drop, ...rest }) => rest)(r)))}
          />
          <QuantityField
            label={t("edTemperature")}
            name="referenceTrain.temperature_C"
            value={d().referenceTrain.temperature_C ?? DEFAULT_REFERENCE_TEMPERATURE_C}
            units={u()}
            measure="temperature"
            fileUnit="C"
            step={{ metric: 5, us: 10 }}
            onValue={(v) => e().set("referenceTrain", (r) => ({ ...r, temperature_C: v }))}
          />
        </div>
        <p class="notes-small">{e().reference().locomotives ? t("edWith", { locomotives: e().reference().locomotives! }) : ""}</p>
        <Switch>
          <Match when={!e().placed()}>
            <p class="notes-hint">{t("edTableAppears")}</p>
          </Match>
          <Match when={e().loadTable() === undefined}>
            <p class="notes-hint" aria-live="polite">
              {t("edWorking")}
            </p>
            <div class="progress" role="progressbar" aria-label={t("edLoadTitle")} aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(e().loadTableProgress() * 100)}>
              <span style={{ width: `${Math.max(4, e().loadTableProgress() * 100)}%` }} />
            </div>
          </Match>
          <Match when={e().loadTable()}>{(t) => <LoadTableResult outcome={t()} units={u()} />}</Match>
        </Switch>
      </section>

      <section class="panel notes-section" aria-labelledby="notes-hazards-title">
        <h3 id="notes-hazards-title">{t("edHazards")}</h3>
        <For each={d().hazards} fallback={<p class="notes-hint">{t("edNoneRecorded")}</p>}>
          {(h, k) => (
            <div class="notes-list-row">
              <SelectField<HazardKind> label={t("edHazardN", { n: k() + 1 })} name={`hazards[${k()}].kind`} value={h.kind} options={HAZARD_KINDS.map((x) => ({ value: x.kind, label: hazardWord(x.kind) }))} onValue={(v) => e().set("hazards", k(), "kind", v)} />
              <QuantityField label={t("edAt")} name={`hazards[${k()}].at_m`} value={h.at_m} units={u()} measure="distance" fileUnit="m" onValue={(v) => e().set("hazards", k(), "at_m", v)} />
              <TextField label={t("edWhatToKnow")} name={`hazards[${k()}].note`} value={h.note} onValue={(v) => e().set("hazards", k(), "note", v)} issue={at(`hazards[${k()}].note`)} maxLength={400} class="wide" />
              <button type="button" class="notes-icon-button" aria-label={t("edRemoveHazard", { n: k() + 1 })} onClick={() => e().set("hazards", (hs) => hs.filter((_, i) => i !== k()))}>
                ✕
              </button>
            </div>
          )}
        </For>
        <button type="button" class="button" onClick={() => e().set("hazards", d().hazards.length, { kind: "points", at_m: d().frontAt_m + 100, note: "" })}>
          {t("edAddHazard")}
        </button>
      </section>

      <section class="panel notes-section" aria-labelledby="notes-seasons-title">
        <h3 id="notes-seasons-title">{t("edSeasons")}</h3>
        <For each={d().seasons} fallback={<p class="notes-hint">{t("edNoneRecorded")}</p>}>
          {(s, k) => (
            <div class="notes-list-row">
              <SelectField<Season> label={t("edSeason")} name={`seasons[${k()}].season`} value={s.season} options={SEASONS.map((x) => ({ value: x, label: seasonLabel(x) }))} onValue={(v) => e().set("seasons", k(), "season", v)} />
              <SelectField<RailWord> label={t("edRail")} name={`seasons[${k()}].rail`} value={s.rail} options={RAIL_CONDITIONS.map((x) => ({ value: x, label: words.rail(x) }))} onValue={(v) => e().set("seasons", k(), "rail", v)} />
              <TextField label={t("edNote")} name={`seasons[${k()}].note`} value={s.note} onValue={(v) => e().set("seasons", k(), "note", v)} maxLength={400} class="wide" />
              <button type="button" class="notes-icon-button" aria-label={t("edRemoveSeason", { n: k() + 1 })} onClick={() => e().set("seasons", (ss) => ss.filter((_, i) => i !== k()))}>
                ✕
              </button>
            </div>
          )}
        </For>
        <button type="button" class="button" onClick={() => e().set("seasons", d().seasons.length, { season: "autumn", rail: "leaves", note: "" })}>
          {t("edAddSeason")}
        </button>
      </section>

      <section class="panel notes-section" aria-labelledby="notes-practice-title">
        <h3 id="notes-practice-title">{t("edPractice")}</h3>
        <TextField label={t("edWhatWorks")} name="practice" value={d().practice} onValue={(v) => e().set("practice", v)} multiline rows={6} maxLength={4000} class="wide" />
      </section>

      <section class="panel notes-section" aria-labelledby="notes-rev-title">
        <h3 id="notes-rev-title">{t("edRevision")}</h3>
        <Show when={d().revisions.length > 0}>
          <table class="notes-revisions">
            <thead>
              <tr>
                <th scope="col">{t("edDate")}</th>
                <th scope="col">{t("edBy")}</th>
                <th scope="col">{t("edWhatChanged")}</th>
              </tr>
            </thead>
            <tbody>
              <For each={[...d().revisions].reverse()}>
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
        </Show>
        <div class="notes-grid">
          <TextField label={t("edRevisionDate")} name="revision.date" value={d().revision.date} onValue={(v) => e().set("revision", "date", v)} issue={at("revision.date")} placeholder={t("edDateFormat")} />
          <TextField label={t("edInitials")} name="revision.initials" value={d().revision.initials} onValue={(v) => e().set("revision", "initials", v)} issue={at("revision.initials")} maxLength={8} />
          <TextField label={t("edWhatChanged")} name="revision.change" value={d().revision.change} onValue={(v) => e().set("revision", "change", v)} issue={at("revision.change")} maxLength={400} class="wide" />
        </div>
      </section>

      <footer class="notes-actions">
        <Show when={e().errors().length > 0}>
          <div class="notes-issue-box" role="status">
            <p>
              <strong>
                {t("edToPutRight", { count: e().errors().length })}
              </strong>
            </p>
            <ul>
              <For each={e().errors()}>{(i) => <li>{i.message}</li>}</For>
            </ul>
          </div>
        </Show>
        <div class="notes-row-actions">
          <button type="button" class="button primary" disabled={props.busy || e().errors().length > 0 || !e().changed()} onClick={() => props.onSave()}>
            {e().changed() || isNew() ? t("edSave") : t("edSaved")}
          </button>
          <button type="button" class="button" onClick={() => props.onClose()}>
            {e().changed() && !isNew() ? t("edCloseUnsaved") : t("backToLibrary")}
          </button>
          <Show when={!isNew()}>
            <button type="button" class="button" disabled={e().changed()} title={e().changed() ? t("edSaveFirst") : undefined} onClick={() => props.onCard()}>
              {t("edCardPrint")}
            </button>
            <button type="button" class="button" disabled={e().changed()} onClick={() => props.onExport()}>
              {t("edExportNote")}
            </button>
            <button type="button" class="button danger" onClick={() => props.onDelete()}>
              {t("removeNote")}
            </button>
          </Show>
        </div>
      </footer>
    </div>
  );
}
