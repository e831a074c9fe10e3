/**
 * The trainer's library: every saved note as a large row (name, line and direction, last revision,
 * where it came from), damaged records with the reason and a way to remove them, the export reminder,
 * and the library's actions: new note, import a file, export all, put back the demo notes, remove all.
 */
import { createMemo, createSignal, For, Show, type JSX } from "solid-js";
import type { NoteRow, RecordProblem } from "../../../notes/records.js";
import type { ExportReminder, PersistResult } from "../../../notes/reminder.js";
import { flagWords, recordProblemWords, type Notice } from "./createNotesLibrary.js";
import { notes } from "../../../i18n/en/notes.js";
import { tr } from "../../i18n.js";

const t = tr.ns(notes);

export interface LibraryProps {
  ready: boolean;
  failure: string | null;
  /** The notes as rows (sorted by name). */
  rows: readonly NoteRow[];
  /** The rows are from the last listing and the library is still being read and checked. */
  checking?: boolean;
  problems: readonly RecordProblem[];
  reminder: ExportReminder | undefined;
  persisted: PersistResult | undefined;
  notice: Notice | null;
  busy: boolean;
  onDismissNotice: () => void;
  onOpen: (id: string) => void;
  onCard: (id: string) => void;
  onNew: () => void;
  onImport: (file: File) => void;
  /** Open the import from railML (absent: no button). */
  onRailml?: () => void;
  onExportAll: () => void;
  onRestoreDemos: () => void;
  /** Remove a note or a damaged record by its key as stored. */
  onRemove: (key: IDBValidKey) => void;
  onRemoveAll: () => void;
  /** Save a damaged record as it is stored, to keep or to send. */
  onExportRaw: (problem: RecordProblem) => void;
  /** Open what an older record could carry over in the editor, to put the rest right. */
  onRescue: (problem: RecordProblem) => void;
}

/** Notes shown at first, and how many more each "Show more" adds: a long library stays quick to draw. */
export const LIBRARY_PAGE = 100;

const ORIGIN_WORD = { demo: () => t("originDemo"), mine: () => t("originMine"), imported: () => t("originImported") } as const;

export function NoticeBox(props: { notice: Notice; onDismiss: () => void }): JSX.Element {
  const reload = () => location.reload();
  return (
    <div class="notes-notice" classList={{ problem: props.notice.kind === "problem" }} role={props.notice.kind === "problem" ? "alert" : "status"}>
      <p>
        <strong>{props.notice.kind === "problem" ? t("notDone") : ""}</strong>
        {props.notice.text}
      </p>
      <Show when={props.notice.details && props.notice.details.length > 0}>
        <ul>
          <For each={props.notice.details!.slice(0, 12)}>{(d) => <li>{d}</li>}</For>
        </ul>
        <Show when={props.notice.details!.length > 12}>
          <p>{t("andMore", { count: props.notice.details!.length - 12 })}</p>
        </Show>
      </Show>
      <Show when={props.notice.reload}>
        <button type="button" class="button small primary" onClick={reload}>
          {t("reload")}
        </button>
      </Show>
      <button type="button" class="button small" onClick={() => props.onDismiss()}>
        {t("ok")}
      </button>
    </div>
  );
}

export function Library(props: LibraryProps): JSX.Element {
  let fileInput!: HTMLInputElement;
  const [confirmAll, setConfirmAll] = createSignal(false);
  const [filter, setFilter] = createSignal("");
  const [limit, setLimit] = createSignal(LIBRARY_PAGE);
  /** The notes the filter keeps (name, line or direction, any case). */
  const matching = createMemo(() => {
    const f = filter().trim().toLowerCase();
    if (f === "") return props.rows;
    return props.rows.filter((r) => `${r.name} ${r.line ?? ""} ${r.direction ?? ""} ${r.id}`.toLowerCase().includes(f));
  });
  const shown = createMemo(() => matching().slice(0, limit()));
  const reminderText = () => {
    const r = props.reminder;
    if (!r?.due) return "";
    return r.lastExport === undefined
      ? t("neverExported")
      : t("lastExported", { count: r.daysSince ?? 0 });
  };

  return (
    <div class="notes-library">
      <header class="notes-library-head">
        <h2 class="visually-hidden">{t("library")}</h2>
        <p class="notes-hint">{t("libraryHint")}</p>
      </header>

      <Show when={props.failure}>
        <p class="notes-issue-box" role="alert">
          {props.failure}
        </p>
      </Show>
      <Show when={props.notice}>{(n) => <NoticeBox notice={n()} onDismiss={props.onDismissNotice} />}</Show>
      <Show when={reminderText()}>
        <div class="notes-reminder" role="status">
          <p>{reminderText()}</p>
          <button type="button" class="button primary" disabled={props.busy} onClick={() => props.onExportAll()}>
            {t("exportAllNow")}
          </button>
        </div>
      </Show>
      <Show when={props.persisted === "not-granted"}>
        <p class="notes-small">{t("notPersisted")}</p>
      </Show>

      <div class="notes-row-actions">
        <button type="button" class="button primary" onClick={() => props.onNew()}>
          {t("newNote")}
        </button>
        <button type="button" class="button" disabled={props.busy} onClick={() => fileInput.click()}>
          {t("importFile")}
        </button>
        <input
          ref={fileInput}
          class="visually-hidden"
          type="file"
          accept=".json,application/json"
          aria-label={t("importFileLabel")}
          tabIndex={-1}
          onChange={(e) => {
            const f = e.currentTarget.files?.[0];
            e.currentTarget.value = "";
            if (f) props.onImport(f);
          }}
        />
        <Show when={props.onRailml}>
          <button type="button" class="button" disabled={props.busy} onClick={() => props.onRailml?.()}>
            {t("importRailml")}
          </button>
        </Show>
        <button type="button" class="button" disabled={props.busy || props.rows.length === 0} onClick={() => props.onExportAll()}>
          {t("exportAll")}
        </button>
      </div>

      <Show when={props.ready} fallback={<p class="notes-hint">{t("opening")}</p>}>
        <Show when={props.rows.length > 0} fallback={<p class="notes-empty">{t("empty")}</p>}>
          <Show when={props.rows.length > LIBRARY_PAGE}>
            <label class="notes-filter">
              <span>{t("find")}</span>
              <input
                type="search"
                value={filter()}
                placeholder={t("findPlaceholder")}
                onInput={(e) => {
                  setFilter(e.currentTarget.value);
                  setLimit(LIBRARY_PAGE);
                }}
              />
            </label>
          </Show>
          <p class="notes-small" aria-live="polite">
            {matching().length === props.rows.length ? t("count", { count: props.rows.length }) : t("matching", { matching: matching().length, total: props.rows.length })}
            {shown().length < matching().length ? t("firstShown", { count: shown().length }) : ""}
            {props.checking ? t("checking") : ""}
          </p>
          <ul class="notes-list" aria-label={t("listLabel")}>
            <For each={shown()}>
              {(s) => (
                <li class="notes-item">
                  <button type="button" class="notes-item-open" onClick={() => props.onOpen(s.id)}>
                    <span class="notes-item-name">{s.name}</span>
                    <span class="notes-item-detail">
                      {[s.line, s.direction].filter(Boolean).join(" · ")}
                      {s.line || s.direction ? " — " : ""}
                      {t("revised", { date: s.revised.date, initials: s.revised.initials, origin: ORIGIN_WORD[s.origin]() })}
                    </span>
                    <Show when={s.illustrative}>
                      <span class="notes-tag">{t("illustrative")}</span>
                    </Show>
                    <Show when={s.flags > 0}>
                      <span class="notes-tag notes-flag">{t("toCheck", { count: s.flags })}</span>
                    </Show>
                  </button>
                  <button type="button" class="button" aria-label={t("cardOf", { name: s.name })} onClick={() => props.onCard(s.id)}>
                    {t("card")}
                  </button>
                </li>
              )}
            </For>
          </ul>
          <Show when={shown().length < matching().length}>
            <button type="button" class="button" onClick={() => setLimit((n) => n + LIBRARY_PAGE)}>
              {t("showMore", { count: Math.min(LIBRARY_PAGE, matching().length - shown().length) })}
            </button>
          </Show>
        </Show>
      </Show>

      <Show when={props.problems.length > 0}>
        <section class="notes-damaged" aria-labelledby="notes-damaged-title">
          <h3 id="notes-damaged-title">{t("damaged", { count: props.problems.length })}</h3>
          <p class="notes-hint">{t("damagedHint")}</p>
          <ul>
            <For each={props.problems}>
              {(p) => (
                <li>
                  <span>{recordProblemWords(p)}</span>
                  <Show when={p.rescue && p.rescue.flags.length > 0}>
                    <ul class="notes-small">
                      <For each={flagWords(p.rescue!.flags, p.rescue!.flagCodes)}>{(f) => <li>{f}</li>}</For>
                    </ul>
                  </Show>
                  <Show when={p.rescue}>
                    <button type="button" class="button small primary" onClick={() => props.onRescue(p)}>
                      {t("rescue")}
                    </button>
                  </Show>
                  <button type="button" class="button small" onClick={() => props.onExportRaw(p)}>
                    {t("exportRecord")}
                  </button>
                  <button type="button" class="button small" onClick={() => props.onRemove(p.rawKey)}>
                    {t("removeRecord")}
                  </button>
                </li>
              )}
            </For>
          </ul>
        </section>
      </Show>

      <div class="notes-row-actions notes-quiet">
        <button type="button" class="button" onClick={() => props.onRestoreDemos()}>
          {t("restoreDemos")}
        </button>
        <Show when={props.rows.length > 0}>
          <Show
            when={confirmAll()}
            fallback={
              <button type="button" class="button danger" onClick={() => setConfirmAll(true)}>
                {t("removeAllAsk")}
              </button>
            }
          >
            <div class="notes-confirm" role="group" aria-label={t("removeAllLabel")}>
              <p>{t("removeAllQuestion", { count: props.rows.length })}</p>
              <button
                type="button"
                class="button danger"
                onClick={() => {
                  setConfirmAll(false);
                  props.onRemoveAll();
                }}
              >
                {t("removeAll")}
              </button>
              <button type="button" class="button" onClick={() => setConfirmAll(false)}>
                {t("keep")}
              </button>
            </div>
          </Show>
        </Show>
      </div>
    </div>
  );
}
