/**
 * The Location notes screen's view of the device's library: the notes and damaged records, the export
 * reminder, and the actions (save, remove, import with conflict questions, export, restore demos).
 * Every change tells the other screens' location pickers to read the list again.
 */
import { createSignal, type Accessor } from "solid-js";
import { readNotesText, type NotesBundleFile } from "../../../profiles/notes.js";
import type { FieldIssue } from "../../../profiles/issues.js";
import type { ConflictChoice, ImportConflict } from "../../../notes/merge.js";
import { requestPersistentStorage, type ExportReminder, type PersistResult } from "../../../notes/reminder.js";
import type { RecordProblem, SavedNote } from "../../../notes/records.js";
import type { NotesStore, PutResult } from "../../../notes/store.js";

export interface Notice {
  kind: "done" | "problem";
  text: string;
  /** Field issues behind a problem (path: message). */
  details?: string[];
}

export interface NotesLibrary {
  ready: Accessor<boolean>;
  /** Set when the store could not be opened at all (no IndexedDB, blocked by the browser). */
  failure: Accessor<string | null>;
  notes: Accessor<SavedNote[]>;
  problems: Accessor<RecordProblem[]>;
  reminder: Accessor<ExportReminder | undefined>;
  persisted: Accessor<PersistResult | undefined>;
  notice: Accessor<Notice | null>;
  setNotice(n: Notice | null): void;
  refresh(): Promise<void>;
  save(note: unknown): Promise<PutResult>;
  remove(id: string): Promise<void>;
  /** Remove every note (the trainer confirmed). */
  removeAll(): Promise<void>;
  /** Read a file's text and import it; conflicts go to `ask` (null cancels). */
  importText(text: string, fileName: string, ask: (c: ImportConflict[]) => Promise<Record<string, ConflictChoice> | null>): Promise<void>;
  /** A bundle of all notes (remembered as the last export) or of the given ones. */
  exportBundle(ids?: string[]): Promise<NotesBundleFile | undefined>;
  restoreDemos(): Promise<void>;
}

export interface NotesLibraryDeps {
  openStore: () => Promise<NotesStore>;
  /** Called after any change to the library (the pickers re-read it). */
  changed?: () => void;
  storage?: Parameters<typeof requestPersistentStorage>[0];
}

const issueLines = (issues: readonly FieldIssue[]) => issues.map((i) => (i.path ? `${i.path}: ${i.message}` : i.message));

export function createNotesLibrary(deps: NotesLibraryDeps): NotesLibrary {
  const [ready, setReady] = createSignal(false);
  const [failure, setFailure] = createSignal<string | null>(null);
  const [notes, setNotes] = createSignal<SavedNote[]>([]);
  const [problems, setProblems] = createSignal<RecordProblem[]>([]);
  const [reminder, setReminder] = createSignal<ExportReminder | undefined>();
  const [persisted, setPersisted] = createSignal<PersistResult | undefined>();
  const [notice, setNotice] = createSignal<Notice | null>(null);
  let store: NotesStore | undefined;
  let asked = false;

  const open = async (): Promise<NotesStore | undefined> => {
    if (store) return store;
    try {
      store = await deps.openStore();
      return store;
    } catch (e) {
      setFailure(`The notes library could not be opened on this device (${(e as Error).message || (e as Error).name}). Notes cannot be saved here.`);
      setReady(true);
      return undefined;
    }
  };

  const refresh = async () => {
    const s = await open();
    if (!s) return;
    const [list, rem] = await Promise.all([s.list(), s.exportReminder()]);
    setNotes(list.notes);
    setProblems(list.problems);
    setReminder(rem);
    setReady(true);
  };

  /** After the first write, ask the browser to keep the notes (asked once per session). */
  const keepSafe = async () => {
    if (asked) return;
    asked = true;
    setPersisted(await requestPersistentStorage(deps.storage));
  };

  const afterChange = async () => {
    await refresh();
    deps.changed?.();
    void keepSafe();
  };

  void refresh();

  return {
    ready,
    failure,
    notes,
    problems,
    reminder,
    persisted,
    notice,
    setNotice,
    refresh,
    async save(note) {
      const s = await open();
      if (!s) return { ok: false, issues: [{ path: "", message: failure() ?? "The notes library is not available." }] };
      const r = await s.put(note);
      if (r.ok) {
        await afterChange();
        setNotice({ kind: "done", text: `Saved "${r.saved.note.name}".` });
      }
      return r;
    },
    async remove(id) {
      const s = await open();
      if (!s) return;
      const name = notes().find((n) => n.note.id === id)?.note.name ?? id;
      await s.delete(id);
      await afterChange();
      setNotice({ kind: "done", text: `Removed "${name}".` });
    },
    async removeAll() {
      const s = await open();
      if (!s) return;
      const n = notes().length;
      await s.clear();
      await afterChange();
      setNotice({ kind: "done", text: `Removed all ${n} notes from this device.` });
    },
    async importText(text, fileName, ask) {
      const s = await open();
      if (!s) return;
      const read = readNotesText(text);
      if (!read.ok) {
        setNotice({ kind: "problem", text: `${fileName}: ${read.message}`, details: issueLines(read.issues) });
        return;
      }
      const outcome = await s.importBundle(read.notes, ask);
      if (outcome.status === "cancelled") {
        setNotice({ kind: "done", text: `Import of ${fileName} cancelled; nothing was changed.` });
        return;
      }
      if (outcome.status === "failed") {
        setNotice({ kind: "problem", text: `${fileName}: ${outcome.message}` });
        return;
      }
      await afterChange();
      const sm = outcome.summary;
      const parts = [
        sm.added.length + sm.repaired.length > 0 ? `${sm.added.length + sm.repaired.length} added` : "",
        sm.replaced.length > 0 ? `${sm.replaced.length} replaced by the file's version` : "",
        sm.keptMine.length > 0 ? `${sm.keptMine.length} kept as yours` : "",
        sm.copies.length > 0 ? `${sm.copies.length} kept both (the file's as a copy)` : "",
        sm.unchanged.length > 0 ? `${sm.unchanged.length} already the same` : "",
      ].filter(Boolean);
      setNotice({ kind: "done", text: `Imported ${fileName}: ${parts.join(", ") || "nothing to import"}.` });
    },
    async exportBundle(ids) {
      const s = await open();
      if (!s) return undefined;
      const b = await s.exportBundle(ids);
      if (!ids) setReminder(await s.exportReminder());
      return b;
    },
    async restoreDemos() {
      const s = await open();
      if (!s) return;
      const n = await s.restoreDemos();
      await afterChange();
      setNotice({ kind: "done", text: n > 0 ? `Put back ${n} demo note${n === 1 ? "" : "s"}.` : "All demo notes are already there." });
    },
  };
}

/** Offer a bundle as a file download (a JSON file named after its date). */
export function downloadBundle(b: NotesBundleFile, name?: string): void {
  const blob = new Blob([`${JSON.stringify(b, null, 2)}\n`], { type: "application/json" });
  const url = URL.createObjectURL(blob);
  const a = document.createElement("a");
  a.href = url;
  a.download = name ?? `taut-notes-${b.exported.slice(0, 10)}.json`;
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
