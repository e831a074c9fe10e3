/**
 * The Location notes screen's view of the device's library: the notes and damaged records, the export
 * reminder, and the actions (save, remove, import with conflict questions, export, restore demos).
 * Every change tells the other screens' location pickers to read the list again.
 */
import { batch, createSignal, onCleanup, type Accessor } from "solid-js";
import { download } from "../../download.js";
import { readNotesText, type NotesBundleFile, type NotesFileResult } from "../../../profiles/notes.js";
import type { FieldIssue } from "../../../profiles/issues.js";
import type { ConflictChoice, ImportConflict } from "../../../notes/merge.js";
import { requestPersistentStorage, type ExportReminder, type PersistResult } from "../../../notes/reminder.js";
import { rowOf, type NoteRow, type RecordProblem, type SavedNote } from "../../../notes/records.js";
import { NotesClosedError, type NotesStore, type PutResult, type SaveBase } from "../../../notes/store.js";
import { readNotesFile, type TextSource } from "./notesFile.js";
import { notes } from "../../../i18n/en/notes.js";
import { tr } from "../../i18n.js";
import { localiseIssue } from "../../fieldWords.js";
import { readerText } from "../../../i18n/renderReaders.js";
import { migrationFlagText, notesClosedText, recordProblemText, type MigrationFlag, type RecordWhy } from "../../../profiles/noteRecordText.js";
import type { ReaderCoded } from "../../../profiles/readerIssues.js";

const nt = tr.ns(notes);

export interface Notice {
  kind: "done" | "problem";
  text: string;
  /** Field issues behind a problem (path: message). */
  details?: string[];
  /** The library was closed under the page (another tab upgraded it): offer to reload. */
  reload?: boolean;
}

export interface NotesLibrary {
  ready: Accessor<boolean>;
  /** Set when the store could not be opened at all (no IndexedDB, blocked by the browser). */
  failure: Accessor<string | null>;
  notes: Accessor<SavedNote[]>;
  /** The library's rows: at once from the last listing, then from the full read. */
  rows: Accessor<NoteRow[]>;
  /** The rows shown come from the last listing; the full read (which finds damaged records) is under way. */
  checking: Accessor<boolean>;
  /** One note, validated (from the list when it has been read, else from the store). */
  note(id: string): Promise<SavedNote | undefined>;
  problems: Accessor<RecordProblem[]>;
  reminder: Accessor<ExportReminder | undefined>;
  persisted: Accessor<PersistResult | undefined>;
  notice: Accessor<Notice | null>;
  setNotice(n: Notice | null): void;
  refresh(): Promise<void>;
  /** Save a note; `base` is the stored note it started from (a conflict comes back when that changed). */
  save(note: unknown, base?: SaveBase): Promise<PutResult>;
  /** Remove a note or a damaged record by its key as stored. */
  remove(key: IDBValidKey): Promise<void>;
  /** A damaged record exactly as stored, as JSON text to keep, or undefined. */
  rawText(key: IDBValidKey): Promise<string | undefined>;
  /** Why the library was closed under the page, if it was. */
  closed: Accessor<"upgrade" | "terminated" | undefined>;
  /** Remove every note (the trainer confirmed). */
  removeAll(): Promise<void>;
  /** Read a file's text and import it; conflicts go to `ask` (null cancels). */
  importText(text: string, fileName: string, ask: (c: ImportConflict[]) => Promise<Record<string, ConflictChoice> | null>): Promise<void>;
  /** Read a file off the page's thread and import it; conflicts go to `ask` (null cancels). */
  importFile(file: TextSource, fileName: string, ask: (c: ImportConflict[]) => Promise<Record<string, ConflictChoice> | null>): Promise<void>;
  /** A bundle of all notes (remembered as the last export) or of the given ones. */
  exportBundle(ids?: string[]): Promise<NotesBundleFile | undefined>;
  restoreDemos(): Promise<void>;
}

export interface NotesLibraryDeps {
  openStore: () => Promise<NotesStore>;
  /** Called after any change to the library (the pickers re-read it). */
  changed?: () => void;
  storage?: Parameters<typeof requestPersistentStorage>[0];
  /** How a file to import is read and checked (default: in a worker, see notesFile.ts). */
  readFile?: (file: TextSource) => Promise<NotesFileResult>;
  /** Subscribe to the store being closed under the page; returns a way to stop. */
  onClosed?: (f: (reason: "upgrade" | "terminated") => void) => () => void;
}

/** A field issue's message in the language on screen, its figures in the file's own (metric) units. */
const issueWords = (i: FieldIssue) => localiseIssue(i, "metric").message;

/** A refused file's issues in the language on screen, their figures in the file's own (metric) units. */
export const issueLines = (issues: readonly FieldIssue[]) =>
  issues.map((i) => {
    const m = issueWords(i);
    return i.path ? `${i.path}: ${m}` : m;
  });

/**
 * Why the device's store could not be opened, as a code from the browser's error name (its message is the
 * browser's own words): no IndexedDB at all, storage refused (private window, a setting), the library
 * written by a newer Taut, the device's storage full, or the store damaged; any other error by its name.
 */
export type OpenFailure = { why: "noStorage" | "refused" | "newer" | "full" | "damaged" | "other"; name: string; message: string };

export function openFailureOf(e: unknown): OpenFailure {
  const name = e instanceof Error || (typeof e === "object" && e !== null && "name" in e) ? String((e as Error).name) : "Error";
  const message = e instanceof Error || (typeof e === "object" && e !== null && "message" in e) ? String((e as Error).message) : String(e);
  const why: OpenFailure["why"] =
    typeof indexedDB === "undefined" || name === "ReferenceError"
      ? "noStorage"
      : name === "SecurityError" || name === "InvalidStateError" || name === "NotAllowedError"
        ? "refused"
        : name === "VersionError"
          ? "newer"
          : name === "QuotaExceededError"
            ? "full"
            : name === "UnknownError" || name === "DataError" || name === "NotReadableError" || name === "DataCloneError"
              ? "damaged"
              : "other";
  return { why, name, message };
}

const OPEN_WHY = { noStorage: "nfWhyNoStorage", refused: "nfWhyRefused", newer: "nfWhyNewer", full: "nfWhyFull", damaged: "nfWhyDamaged", other: "nfWhyOther" } as const;

/**
 * The library's "cannot open" message in the language on screen (read when drawn: a language switch
 * redraws it). English keeps the browser's words, as it always showed them; other languages say the code.
 */
export function openFailureText(f: OpenFailure): string {
  const problem = tr.lang === "en" ? f.message || f.name : nt(OPEN_WHY[f.why], { name: f.name });
  return nt("nfCannotOpen", { problem });
}

/** A damaged record's message in the language on screen (read when drawn: a language switch redraws it). */
export function recordProblemWords(p: { key: string; why: RecordWhy }): string {
  return recordProblemText(tr, p.key, p.why, issueWords);
}

/**
 * What carrying a note over from the older format left out, in the language on screen: from the codes
 * when the record keeps them, else the English it was stored with.
 */
export function flagWords(flags: readonly string[], codes?: readonly MigrationFlag[]): string[] {
  return codes && codes.length === flags.length ? codes.map((c) => migrationFlagText(tr, c)) : [...flags];
}

/** A refused import or review in the language on screen; a refused note's field issue in the screen's words too. */
export function refusalWords(coded: ReaderCoded, issue?: FieldIssue): string {
  if (issue && coded.code === "importNoteInvalid" && coded.figures) return readerText(tr, { ...coded, figures: { ...coded.figures, problem: issueWords(issue) } });
  return readerText(tr, coded);
}

/**
 * A notice whose words are written when it is drawn, so a language switch redraws it: `text` (and
 * `details`) read the language on screen each time.
 */
export function wordsNotice(kind: Notice["kind"], text: () => string, more: { details?: () => string[]; reload?: boolean } = {}): Notice {
  const n: Notice = {
    kind,
    get text() {
      return text();
    },
  };
  if (more.details) Object.defineProperty(n, "details", { get: more.details, enumerable: true });
  if (more.reload) n.reload = true;
  return n;
}

export function createNotesLibrary(deps: NotesLibraryDeps): NotesLibrary {
  const [ready, setReady] = createSignal(false);
  const [failed, setFailed] = createSignal<OpenFailure | null>(null);
  const failure = () => {
    const f = failed();
    return f ? openFailureText(f) : null;
  };
  const [notes, setNotes] = createSignal<SavedNote[]>([]);
  const [rows, setRows] = createSignal<NoteRow[]>([]);
  const [checking, setChecking] = createSignal(false);
  const [problems, setProblems] = createSignal<RecordProblem[]>([]);
  const [reminder, setReminder] = createSignal<ExportReminder | undefined>();
  const [persisted, setPersisted] = createSignal<PersistResult | undefined>();
  const [notice, setNotice] = createSignal<Notice | null>(null);
  const [closed, setClosed] = createSignal<"upgrade" | "terminated" | undefined>();
  let store: NotesStore | undefined;
  let asked = false;

  /** The library was closed under the page: say so, with a way to reload; the editor's draft is kept. */
  const closedNotice = (e: NotesClosedError) => {
    setClosed(e.reason);
    const reason = e.reason;
    setNotice(wordsNotice("problem", () => notesClosedText(tr, reason), { reload: true }));
  };
  /** Run a library action; a closed library is reported, not thrown. */
  async function guarded<T>(f: (s: NotesStore) => Promise<T>): Promise<T | undefined> {
    const s = await open();
    if (!s) return undefined;
    try {
      return await f(s);
    } catch (e) {
      if (e instanceof NotesClosedError) {
        closedNotice(e);
        return undefined;
      }
      throw e;
    }
  }

  const open = async (): Promise<NotesStore | undefined> => {
    if (store) return store;
    try {
      store = await deps.openStore();
      const why = store.closed();
      if (why) closedNotice(new NotesClosedError(why));
      return store;
    } catch (e) {
      setFailed(openFailureOf(e));
      setReady(true);
      return undefined;
    }
  };

  const refresh = async () => {
    await guarded(async (s) => {
      // A large library shows at once from its last listing, while the full read (and check) goes on.
      const t0 = performance.now();
      if (!ready()) {
        const quick = await s.quickRows();
        if (quick && !ready()) {
          batch(() => {
            setRows(quick);
            setChecking(true);
            setReady(true);
          });
          performance.mark("taut:notes-rows", { detail: { notes: quick.length, ms: performance.now() - t0 } });
        }
      }
      // One read of the library serves the list and the export reminder.
      const list = await s.list();
      const rem = await s.exportReminder(undefined, list);
      // For the browser checks and the bench: how long the library took to read.
      performance.mark("taut:notes-listed", { detail: { notes: list.notes.length, ms: performance.now() - t0 } });
      batch(() => {
        setNotes(list.notes);
        setRows(list.notes.map(rowOf));
        setChecking(false);
        setProblems(list.problems);
        setReminder(rem);
        setReady(true);
      });
    });
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

  const importRead = async (read: NotesFileResult, fileName: string, ask: (c: ImportConflict[]) => Promise<Record<string, ConflictChoice> | null>, validated: boolean) => {
    if (!read.ok) {
      const { headline, nothingChanged, issues } = read;
      setNotice(
        wordsNotice("problem", () => `${fileName}: ${readerText(tr, headline)}${nothingChanged ? ` ${readerText(tr, { code: "nothingChanged" })}` : ""}`, {
          details: () => issueLines(issues),
        }),
      );
      return;
    }
    const outcome = await guarded((s) => s.importBundle(read.notes, ask, { validated, reviews: read.reviews }));
    if (outcome === undefined) return;
    if (outcome.status === "cancelled") {
      setNotice(wordsNotice("done", () => nt("nfImportCancelled", { file: fileName })));
      return;
    }
    if (outcome.status === "failed") {
      const { coded, issue } = outcome;
      setNotice(wordsNotice("problem", () => `${fileName}: ${refusalWords(coded, issue)}`));
      return;
    }
    await afterChange();
    const sm = outcome.summary;
    const parts = () =>
      [
        sm.added.length > 0 ? nt("nfAdded", { count: sm.added.length }) : "",
        sm.repaired.length > 0 ? nt("nfRepaired", { count: sm.repaired.length }) : "",
        sm.replaced.length > 0 ? nt("nfReplaced", { count: sm.replaced.length }) : "",
        sm.keptMine.length > 0 ? nt("nfKeptMine", { count: sm.keptMine.length }) : "",
        sm.copies.length > 0 ? nt("nfCopies", { count: sm.copies.length }) : "",
        sm.unchanged.length > 0 ? nt("nfUnchanged", { count: sm.unchanged.length }) : "",
      ].filter(Boolean);
    setNotice(wordsNotice("done", () => nt("nfImported", { file: fileName, parts: parts().join(", ") || nt("nfNothingToImport") })));
  };

  void refresh();
  const stop = deps.onClosed?.((reason) => closedNotice(new NotesClosedError(reason)));
  if (stop) onCleanup(stop);

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
    closed,
    rows,
    checking,
    async note(id) {
      const listed = notes().find((n) => n.note.id === id);
      if (listed) return listed;
      const got = await guarded((s) => s.get(id));
      return got?.status === "ok" ? got.saved : undefined;
    },
    async save(note, base) {
      const s = await open();
      if (!s) return { ok: false, issues: [{ path: "", message: failure() ?? nt("nfUnavailable") }] };
      let r: PutResult;
      try {
        r = await s.put(note, "mine", base);
      } catch (e) {
        if (!(e instanceof NotesClosedError)) throw e;
        closedNotice(e);
        return { ok: false, issues: [] };
      }
      if (r.ok) {
        await afterChange();
        const name = r.saved.note.name;
        setNotice(wordsNotice("done", () => nt("nfSaved", { name })));
      }
      return r;
    },
    async remove(key) {
      const name = notes().find((n) => n.note.id === key)?.note.name ?? (typeof key === "string" ? key : JSON.stringify(key));
      const done = await guarded((s) => s.delete(key));
      if (done === undefined) return;
      await afterChange();
      setNotice(wordsNotice("done", () => nt("nfRemoved", { name })));
    },
    async rawText(key) {
      const raw = await guarded((s) => s.rawRecord(key));
      if (raw === undefined) return undefined;
      return rawRecordText(raw);
    },
    async removeAll() {
      const n = notes().length;
      const done = await guarded(async (s) => (await s.clear(), true));
      if (!done) return;
      await afterChange();
      setNotice(wordsNotice("done", () => nt("nfRemovedAll", { count: n })));
    },
    async importText(text, fileName, ask) {
      await importRead(readNotesText(text), fileName, ask, true);
    },
    async importFile(file, fileName, ask) {
      await importRead(await (deps.readFile ?? readNotesFile)(file), fileName, ask, true);
    },
    async exportBundle(ids) {
      return guarded(async (s) => {
        const b = await s.exportBundle(ids);
        if (!ids) setReminder(await s.exportReminder());
        return b;
      });
    },
    async restoreDemos() {
      const n = await guarded((s) => s.restoreDemos());
      if (n === undefined) return;
      await afterChange();
      setNotice(wordsNotice("done", () => (n > 0 ? nt("nfPutBack", { count: n }) : nt("nfAllDemos"))));
    },
  };
}

/**
 * A record as stored, as JSON text to keep: whatever it holds (numbers that JSON cannot write, dates,
 * binary data) is written as far as it can be, never refused, so a damaged record can always be exported.
 */
export function rawRecordText(raw: unknown): string {
  const seen = new WeakSet<object>();
  return `${JSON.stringify(
    raw,
    (_k, v: unknown) => {
      if (typeof v === "bigint") return v.toString();
      if (typeof v === "number" && !Number.isFinite(v)) return String(v);
      if (v instanceof ArrayBuffer || ArrayBuffer.isView(v)) return `(binary data, ${(v as ArrayBuffer).byteLength} bytes)`;
      if (v instanceof Map) return Object.fromEntries(v);
      if (v instanceof Set) return [...v];
      if (v && typeof v === "object") {
        if (seen.has(v)) return "(repeated)";
        seen.add(v);
      }
      return v;
    },
    2,
  )}\n`;
}

/** Offer a bundle as a file download (a JSON file named after its date). */
export function downloadBundle(b: NotesBundleFile, name?: string): void {
  download(`${JSON.stringify(b, null, 2)}\n`, name ?? `taut-notes-${b.exported.slice(0, 10)}.json`, "application/json");
}
