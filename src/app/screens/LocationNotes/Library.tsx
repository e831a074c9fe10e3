/**
 * The trainer's library: every saved note as a large row (name, line and direction, last revision,
 * where it came from), damaged records with the reason and a way to remove them, the export reminder,
 * and the library's actions: new note, import a file, export all, put back the demo notes, remove all.
 */
import { createMemo, createSignal, For, Show, type JSX } from "solid-js";
import type { NoteRow, RecordProblem } from "../../../notes/records.js";
import type { ExportReminder, PersistResult } from "../../../notes/reminder.js";
import type { Notice } from "./createNotesLibrary.js";

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

const ORIGIN_WORD = { demo: "demo note", mine: "yours", imported: "imported" } as const;

export function NoticeBox(props: { notice: Notice; onDismiss: () => void }): JSX.Element {
  const reload = () => location.reload();
  return (
    <div class="notes-notice" classList={{ problem: props.notice.kind === "problem" }} role={props.notice.kind === "problem" ? "alert" : "status"}>
      <p>
        <strong>{props.notice.kind === "problem" ? "Not done. " : ""}</strong>
        {props.notice.text}
      </p>
      <Show when={props.notice.details && props.notice.details.length > 0}>
        <ul>
          <For each={props.notice.details!.slice(0, 12)}>{(d) => <li>{d}</li>}</For>
        </ul>
        <Show when={props.notice.details!.length > 12}>
          <p>…and {props.notice.details!.length - 12} more.</p>
        </Show>
      </Show>
      <Show when={props.notice.reload}>
        <button type="button" class="button small primary" onClick={reload}>
          Reload the page
        </button>
      </Show>
      <button type="button" class="button small" onClick={() => props.onDismiss()}>
        OK
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
      ? "Your notes have never been exported. They live only in this browser until you export a copy: keep the file somewhere safe and share it with drivers."
      : `Your notes were last exported ${r.daysSince} days ago. Export a fresh copy so recent changes are not lost with the device.`;
  };

  return (
    <div class="notes-library">
      <header class="notes-library-head">
        <h2 class="visually-hidden">Library</h2>
        <p class="notes-hint">What a driver must know to start at a place: the track under and ahead of the train, hazards, the usual rail, and the practice that works. Saved on this device.</p>
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
            Export all notes now
          </button>
        </div>
      </Show>
      <Show when={props.persisted === "not-granted"}>
        <p class="notes-small">This browser has not promised to keep stored data when space runs low: export your notes regularly.</p>
      </Show>

      <div class="notes-row-actions">
        <button type="button" class="button primary" onClick={() => props.onNew()}>
          New note
        </button>
        <button type="button" class="button" disabled={props.busy} onClick={() => fileInput.click()}>
          Import notes file
        </button>
        <input
          ref={fileInput}
          class="visually-hidden"
          type="file"
          accept=".json,application/json"
          aria-label="Notes file to import"
          tabIndex={-1}
          onChange={(e) => {
            const f = e.currentTarget.files?.[0];
            e.currentTarget.value = "";
            if (f) props.onImport(f);
          }}
        />
        <Show when={props.onRailml}>
          <button type="button" class="button" disabled={props.busy} onClick={() => props.onRailml?.()}>
            Import from railML
          </button>
        </Show>
        <button type="button" class="button" disabled={props.busy || props.rows.length === 0} onClick={() => props.onExportAll()}>
          Export all notes
        </button>
      </div>

      <Show when={props.ready} fallback={<p class="notes-hint">Opening the library…</p>}>
        <Show when={props.rows.length > 0} fallback={<p class="notes-empty">No notes yet. Make one with "New note", or import a notes file.</p>}>
          <Show when={props.rows.length > LIBRARY_PAGE}>
            <label class="notes-filter">
              <span>Find a note</span>
              <input
                type="search"
                value={filter()}
                placeholder="Name, line or direction"
                onInput={(e) => {
                  setFilter(e.currentTarget.value);
                  setLimit(LIBRARY_PAGE);
                }}
              />
            </label>
          </Show>
          <p class="notes-small" aria-live="polite">
            {matching().length === props.rows.length ? `${props.rows.length} notes` : `${matching().length} of ${props.rows.length} notes match`}
            {shown().length < matching().length ? `; the first ${shown().length} are shown` : ""}
            {props.checking ? ". Checking the whole library…" : ""}
          </p>
          <ul class="notes-list" aria-label="Saved location notes">
            <For each={shown()}>
              {(s) => (
                <li class="notes-item">
                  <button type="button" class="notes-item-open" onClick={() => props.onOpen(s.id)}>
                    <span class="notes-item-name">{s.name}</span>
                    <span class="notes-item-detail">
                      {[s.line, s.direction].filter(Boolean).join(" · ")}
                      {s.line || s.direction ? " — " : ""}revised {s.revised.date} by {s.revised.initials} · {ORIGIN_WORD[s.origin]}
                    </span>
                    <Show when={s.illustrative}>
                      <span class="notes-tag">Illustrative</span>
                    </Show>
                    <Show when={s.flags > 0}>
                      <span class="notes-tag notes-flag">To check: {s.flags} thing{s.flags === 1 ? "" : "s"} not carried over</span>
                    </Show>
                  </button>
                  <button type="button" class="button" aria-label={`Card of ${s.name}`} onClick={() => props.onCard(s.id)}>
                    Card
                  </button>
                </li>
              )}
            </For>
          </ul>
          <Show when={shown().length < matching().length}>
            <button type="button" class="button" onClick={() => setLimit((n) => n + LIBRARY_PAGE)}>
              Show {Math.min(LIBRARY_PAGE, matching().length - shown().length)} more
            </button>
          </Show>
        </Show>
      </Show>

      <Show when={props.problems.length > 0}>
        <section class="notes-damaged" aria-labelledby="notes-damaged-title">
          <h3 id="notes-damaged-title">Damaged records ({props.problems.length})</h3>
          <p class="notes-hint">
            These records could not be read and are left out of the library and the pickers. The rest of the library is unaffected. Export a record before removing it: it keeps
            everything it holds.
          </p>
          <ul>
            <For each={props.problems}>
              {(p) => (
                <li>
                  <span>{p.message}</span>
                  <Show when={p.rescue && p.rescue.flags.length > 0}>
                    <ul class="notes-small">
                      <For each={p.rescue!.flags}>{(f) => <li>{f}</li>}</For>
                    </ul>
                  </Show>
                  <Show when={p.rescue}>
                    <button type="button" class="button small primary" onClick={() => props.onRescue(p)}>
                      Put it right in the editor
                    </button>
                  </Show>
                  <button type="button" class="button small" onClick={() => props.onExportRaw(p)}>
                    Export record
                  </button>
                  <button type="button" class="button small" onClick={() => props.onRemove(p.rawKey)}>
                    Remove record
                  </button>
                </li>
              )}
            </For>
          </ul>
        </section>
      </Show>

      <div class="notes-row-actions notes-quiet">
        <button type="button" class="button" onClick={() => props.onRestoreDemos()}>
          Put back the demo notes
        </button>
        <Show when={props.rows.length > 0}>
          <Show
            when={confirmAll()}
            fallback={
              <button type="button" class="button danger" onClick={() => setConfirmAll(true)}>
                Remove all notes…
              </button>
            }
          >
            <div class="notes-confirm" role="group" aria-label="Confirm removing all notes">
              <p>Remove all {props.rows.length} notes from this device? Export them first if you may want them again.</p>
              <button
                type="button"
                class="button danger"
                onClick={() => {
                  setConfirmAll(false);
                  props.onRemoveAll();
                }}
              >
                Remove all
              </button>
              <button type="button" class="button" onClick={() => setConfirmAll(false)}>
                Keep them
              </button>
            </div>
          </Show>
        </Show>
      </div>
    </div>
  );
}
