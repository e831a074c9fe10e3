/**
 * The location-notes library on the device: IndexedDB through `idb`. Every record is validated when
 * read (a damaged one is reported and skipped), every write is validated first, and an import is
 * applied in one transaction so the library is never half-updated.
 */
import { openDB, type DBSchema, type IDBPDatabase, type IDBPTransaction } from "idb";
import { fromZodIssues, type FieldIssue, type RawIssue } from "../profiles/issues.js";
import { makeNotesBundle, startReviewSchema, type NotesBundleFile, type StartReviewFile } from "../profiles/notes.js";
import { parseLocationNote } from "../profiles/parse.js";
import type { LocationNoteFile } from "../profiles/schemas.js";
import { mergeWrites, previewMerge, type ConflictChoice, type ImportConflict, type MergeWrites } from "./merge.js";
import { migrateV1Record, NOTES_DB_VERSION } from "./migrations.js";
import { checkRecord, checkRows, keyText, makeRecord, recordRev, rowOf, type NoteOrigin, type NoteRecord, type NoteRow, type RecordProblem, type SavedNote } from "./records.js";
import { exportReminder, type ExportReminder } from "./reminder.js";
import type { ReaderCoded } from "../profiles/readerIssues.js";
import { readerEnglish } from "../profiles/readerIssues.js";
import { noteRecordEnglish } from "../profiles/noteRecordText.js";

export const DEFAULT_NOTES_DB = "taut-notes";

interface MetaValues {
  /** ISO date-time of the last export of the whole library. */
  lastExport: string;
  /** ISO date-time the demo notes were first added. */
  demosAdded: string;
  /** How many writes the notes have had, as a decimal count: a read knows whether anything changed since the last. */
  changes: string;
  /** The library's rows as last listed (JSON of `StoredRows`), so a large library shows before it is read in full. */
  rows: string;
}

/** The rows of the library at a write count. */
interface StoredRows {
  changes: string;
  rows: NoteRow[];
}

/** Records read per request when the whole library is read: each a short task, the page drawn between. */
const READ_CHUNK = 400;
/** Records written per request batch in an import, for the same reason. */
const WRITE_CHUNK = 400;
/** The longest the checking of records runs before it lets the page draw, ms. */
const CHECK_SLICE_MS = 16;

/** Let the page draw and answer input before going on. */
const yieldToPage = () => new Promise<void>((resolve) => setTimeout(resolve, 0));
type MetaKey = keyof MetaValues;

interface NotesDB extends DBSchema {
  notes: { key: string; value: NoteRecord };
  meta: { key: MetaKey; value: string };
  /** Start reviews kept as evidence beside the notes (schema version 3), by review id. */
  reviews: { key: string; value: StartReviewFile; indexes: { location: string } };
}

/** Validated notes and the records that could not be read. */
export interface NoteList {
  /** Sorted by name. */
  notes: SavedNote[];
  problems: RecordProblem[];
}

export type ReadResult = { status: "ok"; saved: SavedNote } | { status: "missing" } | { status: "damaged"; problem: RecordProblem };

/**
 * What a save found instead of the note it started from: the stored note changed since it was opened
 * (another tab or window saved it: `theirs`), was removed (`theirs` absent), or a note of that id now
 * exists where a new one was to be made. The trainer chooses: keep mine, take theirs, keep both.
 */
export interface SaveConflict {
  id: string;
  theirs?: SavedNote;
  /** The stored record is damaged (it cannot be shown; keeping mine replaces it). */
  damaged?: RecordProblem;
}

/** A save: done, refused with field issues, or stopped by a conflict (`issues` then empty). */
export type PutResult = { ok: true; saved: SavedNote } | { ok: false; issues: FieldIssue[]; conflict?: SaveConflict };

/**
 * Which stored note a save starts from: `{ rev }` of the note as it was opened, "new" for a note not yet
 * saved (no record of its id may exist), "replace" to write whatever is there (after the trainer chose
 * to keep theirs out, or to put a damaged record right).
 */
export type SaveBase = { rev: number } | "new" | "replace";

/** Called with the conflicts of an import; returns a choice per conflicting id, or null to cancel. */
export type ChooseConflicts = (conflicts: ImportConflict[]) => Promise<Record<string, ConflictChoice> | null> | Record<string, ConflictChoice> | null;

/**
 * A failed import or review: the message in English, and as a code with its figures for the language on
 * screen; a refused note also gives its first field issue (`issue`), whose English is the
 * code's `problem` figure, for the screen to write in its language.
 */
export type ImportOutcome = { status: "applied"; summary: MergeWrites["summary"] } | { status: "cancelled" } | { status: "failed"; message: string; coded: ReaderCoded; issue?: FieldIssue };

/** A refusal as the store returns it: its English words and its code. */
function refusal(coded: ReaderCoded): { message: string; coded: ReaderCoded } {
  return { message: readerEnglish(coded), coded };
}

/**
 * The store's connection was closed under it: another tab or window of a newer Taut upgraded the
 * database, or the browser ended the connection. Nothing more can be read or written until the page is
 * reloaded; the note being edited is kept as a draft (the Location notes screen keeps one).
 */
export class NotesClosedError extends Error {
  constructor(readonly reason: "upgrade" | "terminated") {
    super(noteRecordEnglish.closed(reason));
    this.name = "NotesClosedError";
  }
}

export interface NotesStore {
  /** Every readable note (sorted by name) and a problem for each damaged record. */
  list(): Promise<NoteList>;
  /**
   * The library's rows as last listed, when nothing has been written since: at once, without reading
   * every note (undefined when they are not up to date; `list` then gives them). Damaged records are
   * found only by `list`.
   */
  quickRows(): Promise<NoteRow[] | undefined>;
  get(id: string): Promise<ReadResult>;
  /**
   * Validate and save a note (new or edited); nothing is written when it is invalid, or when the stored
   * note is no longer the one the save started from (`base`; without it the save overwrites blindly).
   */
  put(note: unknown, origin?: NoteOrigin, base?: SaveBase): Promise<PutResult>;
  /** Remove a note or a damaged record by its key (a number stays a number); true when something was removed. */
  delete(key: IDBValidKey): Promise<boolean>;
  /** A record exactly as stored (for exporting a damaged record before anything is done to it). */
  rawRecord(key: IDBValidKey): Promise<unknown>;
  /** Remove every note. */
  clear(): Promise<void>;
  /**
   * Import notes: settle conflicts through `choose`, then write all in one transaction. Notes that come
   * straight from `readNotesText` (validated already, e.g. in a worker) may say so to skip a second check.
   */
  importBundle(notes: readonly LocationNoteFile[], choose: ChooseConflicts, opts?: { validated?: boolean; reviews?: readonly StartReviewFile[] }): Promise<ImportOutcome>;
  /** A bundle of all notes (or those with the given ids) with their reviews; exporting all is remembered as the last export. */
  exportBundle(ids?: readonly string[], now?: Date): Promise<NotesBundleFile>;
  /** The Start reviews kept for a note, oldest first; damaged records are left out. */
  reviews(location: string): Promise<StartReviewFile[]>;
  /** Keep a review beside its note (which must exist); false with the reason when it cannot be. */
  addReview(review: StartReviewFile): Promise<{ ok: true } | { ok: false; message: string; coded: ReaderCoded; issue?: FieldIssue }>;
  /** Remove a review; true when there was one. */
  deleteReview(id: string): Promise<boolean>;
  /** ISO date-time of the last export of the whole library. */
  lastExport(): Promise<string | undefined>;
  /** The export reminder; give the list when it has just been read, to spare reading it again. */
  exportReminder(now?: Date, list?: NoteList): Promise<ExportReminder>;
  /** Put back the demo notes that are missing; returns how many were added. */
  restoreDemos(): Promise<number>;
  /** Why the connection was closed under the store, if it was. */
  closed(): "upgrade" | "terminated" | undefined;
  close(): void;
}

export interface OpenOptions {
  /** Database name (tests use a fresh one each). */
  name?: string;
  /** Demo notes added when the database is first created. */
  demos?: readonly LocationNoteFile[];
  /** The clock, for tests. */
  now?: () => Date;
  /** Told when the connection is closed under the store (another tab upgrades the database). */
  onClosed?: (reason: "upgrade" | "terminated") => void;
}

/** Open (creating or migrating as needed) the notes database. */
export async function openNotesStore(opts: OpenOptions = {}): Promise<NotesStore> {
  const demos = opts.demos ?? [];
  const now = opts.now ?? (() => new Date());
  const state: { closed?: "upgrade" | "terminated" } = {};
  const closeUnder = (reason: "upgrade" | "terminated") => {
    if (state.closed) return;
    state.closed = reason;
    opts.onClosed?.(reason);
  };
  const db = await openDB<NotesDB>(opts.name ?? DEFAULT_NOTES_DB, NOTES_DB_VERSION, {
    upgrade(database, oldVersion, _newVersion, tx) {
      upgradeNotesDb(database, oldVersion, tx, demos, now());
    },
    blocking() {
      // A newer version of the app wants to upgrade the database: let it, and stop using this connection
      // (every call after this says so, rather than failing with "the database connection is closing").
      db.close();
      closeUnder("upgrade");
    },
    terminated() {
      closeUnder("terminated");
    },
  });
  return makeStore(db, demos, now, state);
}

/** Create or migrate the stores, step by step from `oldVersion` (0 = new database). */
function upgradeNotesDb(db: IDBPDatabase<NotesDB>, oldVersion: number, tx: IDBPTransaction<NotesDB, ("notes" | "meta" | "reviews")[], "versionchange">, demos: readonly LocationNoteFile[], now: Date): void {
  if (oldVersion < 1) db.createObjectStore("notes", { keyPath: "id" });
  if (oldVersion < 2) {
    db.createObjectStore("meta");
    if (oldVersion >= 1) void migrateFromV1(tx);
    else {
      const notes = tx.objectStore("notes");
      for (const d of demos) void notes.put(makeRecord(d, "demo", now));
      void tx.objectStore("meta").put(now.toISOString(), "demosAdded");
    }
  }
  // Version 3 adds the reviews beside the notes; the notes themselves are unchanged.
  if (oldVersion < 3) db.createObjectStore("reviews", { keyPath: "id" }).createIndex("location", "location");
}

/** Rewrite every version-1 record in place; one that cannot be carried over stays as it was and is reported when read. */
async function migrateFromV1(tx: IDBPTransaction<NotesDB, ("notes" | "meta" | "reviews")[], "versionchange">): Promise<void> {
  let cursor = await tx.objectStore("notes").openCursor();
  while (cursor) {
    const m = migrateV1Record(cursor.value as unknown);
    if (m.ok && m.record.id === cursor.key) await cursor.update(m.record);
    cursor = await cursor.continue();
  }
}

/** The same promise, with its rejection marked as handled (it is still awaited where it matters). */
function observed<T>(p: Promise<T>): Promise<T> {
  p.catch(() => undefined);
  return p;
}

function makeStore(db: IDBPDatabase<NotesDB>, demos: readonly LocationNoteFile[], now: () => Date, state: { closed?: "upgrade" | "terminated" }): NotesStore {
  /** Refuse at once when the connection was closed under us. */
  const open = () => {
    if (state.closed) throw new NotesClosedError(state.closed);
  };
  /**
   * Notes this store validated or wrote, by key with the record's save time and write count: a record
   * read back unchanged is not validated again (a large library would otherwise be checked in full at
   * every refresh). Any write from elsewhere changes the save time, so it is validated afresh.
   */
  const checked = new Map<string, { stamp: string; saved: SavedNote }>();
  const stampOf = (raw: unknown) => {
    const r = raw as Partial<NoteRecord> | null;
    return r && typeof r === "object" ? `${String(r.savedAt)}|${recordRev(raw)}|${String(r.origin)}` : "";
  };
  const remember = (rec: NoteRecord): SavedNote => {
    const saved: SavedNote = { origin: rec.origin, savedAt: rec.savedAt, rev: rec.rev ?? 0, ...(rec.flags ? { flags: rec.flags } : {}), ...(rec.flagCodes ? { flagCodes: rec.flagCodes } : {}), note: rec.note };
    checked.set(rec.id, { stamp: stampOf(rec), saved });
    return saved;
  };
  const check = (key: IDBValidKey, raw: unknown) => {
    if (typeof key === "string") {
      const hit = checked.get(key);
      if (hit && hit.stamp === stampOf(raw) && raw && typeof raw === "object" && (raw as NoteRecord).note?.id === key) return { ok: true as const, saved: hit.saved };
    }
    const r = checkRecord(key, raw);
    if (r.ok && typeof key === "string") checked.set(key, { stamp: stampOf(raw), saved: r.saved });
    return r;
  };

  /**
   * The library as last read and checked, with the write count it was read at. Every write here counts
   * itself (meta "changes", in the same transaction) and updates the snapshot; a write from another tab
   * moves the count on, so the next read reads the library again. A large library is then read once per
   * page, not at every refresh.
   */
  interface Snapshot {
    changes: string;
    valid: Map<string, SavedNote>;
    problems: RecordProblem[];
    keys: Set<string>;
    sorted?: SavedNote[] | undefined;
  }
  let snapshot: Snapshot | undefined;
  let reading: Promise<Snapshot> | undefined;

  async function readAll(): Promise<Snapshot> {
    open();
    // A read under way serves every caller (the library and the location pickers ask at the same moment).
    reading ??= (async () => {
      const tx = db.transaction(["notes", "meta"], "readonly");
      const changes = (await tx.objectStore("meta").get("changes")) ?? "0";
      if (snapshot && snapshot.changes === changes) {
        await tx.done;
        return snapshot;
      }
      // Keys and values a few hundred at a time: each request is a short task, and the page draws between.
      const store = tx.objectStore("notes");
      const keys: IDBValidKey[] = [];
      const values: unknown[] = [];
      let range: IDBKeyRange | undefined;
      for (;;) {
        const [ks, vs] = await Promise.all([store.getAllKeys(range, READ_CHUNK), store.getAll(range, READ_CHUNK)]);
        keys.push(...ks);
        values.push(...vs);
        if (ks.length < READ_CHUNK) break;
        range = IDBKeyRange.lowerBound(ks[ks.length - 1]!, true);
      }
      await tx.done;
      const valid = new Map<string, SavedNote>();
      const problems: RecordProblem[] = [];
      let slice = performance.now();
      for (const [k, key] of keys.entries()) {
        const r = check(key, values[k]);
        if (r.ok) valid.set(r.saved.note.id, r.saved);
        else problems.push(r.problem);
        if (performance.now() - slice > CHECK_SLICE_MS) {
          await yieldToPage();
          slice = performance.now();
        }
      }
      snapshot = { changes, valid, problems, keys: new Set(keys.map(keyText)) };
      keepRows();
      return snapshot;
    })().finally(() => {
      reading = undefined;
    });
    return reading;
  }

  /** Count a write in its transaction; returns the counts before and after. */
  async function countWrite(tx: IDBPTransaction<NotesDB, ("notes" | "meta")[], "readwrite">): Promise<{ before: string; after: string }> {
    const before = (await tx.objectStore("meta").get("changes")) ?? "0";
    const after = String(Number(before) + 1);
    await tx.objectStore("meta").put(after, "changes");
    return { before, after };
  }

  /** Bring the snapshot up to a write just made, or drop it when it was already behind. */
  function applied(count: { before: string; after: string }, change: (s: Snapshot) => void): void {
    if (!snapshot || snapshot.changes !== count.before) {
      snapshot = undefined;
      return;
    }
    change(snapshot);
    snapshot.changes = count.after;
    snapshot.sorted = undefined;
    keepRows();
  }
  const written = (s: Snapshot, saved: SavedNote) => {
    s.valid.set(saved.note.id, saved);
    s.keys.add(saved.note.id);
    s.problems = s.problems.filter((p) => p.key !== saved.note.id);
  };
  const sortedOf = (snap: Snapshot) => (snap.sorted ??= [...snap.valid.values()].sort(byName));

  /**
   * Store the rows of the snapshot with its write count, for the next page to show at once. Only when no
   * write came between; a failure only means the next page reads the library in full.
   */
  function keepRows(): void {
    const snap = snapshot;
    if (!snap) return;
    const rows: StoredRows = { changes: snap.changes, rows: sortedOf(snap).map(rowOf) };
    void (async () => {
      const tx = db.transaction("meta", "readwrite");
      if (((await tx.store.get("changes")) ?? "0") === rows.changes) await tx.store.put(JSON.stringify(rows), "rows");
      await tx.done;
    })().catch(() => undefined);
  }

  // One collator for every comparison: String.prototype.localeCompare builds one per call, which is slow
  // over the hundred thousand comparisons a large library's sort makes.
  const collator = new Intl.Collator();
  const byName = (a: SavedNote, b: SavedNote) => collator.compare(a.note.name, b.note.name) || collator.compare(a.note.id, b.note.id);

  return {
    async list() {
      const snap = await readAll();
      return { notes: [...sortedOf(snap)], problems: [...snap.problems] };
    },

    async quickRows() {
      open();
      const tx = db.transaction("meta", "readonly");
      const [changes, text] = await Promise.all([tx.store.get("changes"), tx.store.get("rows")]);
      await tx.done;
      const current = changes ?? "0";
      if (snapshot && snapshot.changes === current) return sortedOf(snapshot).map(rowOf);
      if (text === undefined) return undefined;
      try {
        const stored = JSON.parse(text) as Partial<StoredRows>;
        return stored.changes === current ? checkRows(stored.rows) : undefined;
      } catch {
        return undefined;
      }
    },

    async get(id) {
      open();
      const raw = await db.get("notes", id);
      if (raw === undefined) return { status: "missing" };
      const r = check(id, raw);
      return r.ok ? { status: "ok", saved: r.saved } : { status: "damaged", problem: r.problem };
    },

    async put(note, origin = "mine", base) {
      open();
      const parsed = parseLocationNote(note);
      if (!parsed.ok) return { ok: false, issues: parsed.issues };
      const id = parsed.value.id;
      // Read and write in one transaction, so no other save can come between the check and the write.
      const tx = db.transaction(["notes", "meta"], "readwrite");
      const notesStore = tx.objectStore("notes");
      const raw = (await notesStore.get(id)) as unknown;
      const stored = raw === undefined ? undefined : checkRecord(id, raw);
      let conflict: SaveConflict | undefined;
      if (base === "new" && stored) conflict = { id, ...(stored.ok ? { theirs: stored.saved } : { damaged: stored.problem }) };
      else if (base !== undefined && base !== "new" && base !== "replace") {
        if (!stored) conflict = { id };
        else if (!stored.ok) conflict = { id, damaged: stored.problem };
        else if (stored.saved.rev !== base.rev) conflict = { id, theirs: stored.saved };
      }
      if (conflict) {
        await tx.done;
        return { ok: false, issues: [], conflict };
      }
      const rec = makeRecord(parsed.value, origin, now(), recordRev(raw) + 1);
      const count = await countWrite(tx);
      await notesStore.put(rec);
      await tx.done;
      const saved = remember(rec);
      applied(count, (snap) => written(snap, saved));
      return { ok: true, saved };
    },

    async delete(key) {
      open();
      const tx = db.transaction(["notes", "meta"], "readwrite");
      const notesStore = tx.objectStore("notes");
      const had = (await notesStore.getKey(key as string)) !== undefined;
      const count = had ? await countWrite(tx) : undefined;
      if (had) await notesStore.delete(key as string);
      await tx.done;
      if (typeof key === "string") checked.delete(key);
      const k = keyText(key);
      if (count)
        applied(count, (snap) => {
          if (typeof key === "string") snap.valid.delete(key);
          snap.keys.delete(k);
          snap.problems = snap.problems.filter((p) => p.key !== k);
        });
      return had;
    },

    async rawRecord(key) {
      open();
      return (await db.get("notes", key as string)) as unknown;
    },

    async clear() {
      open();
      const tx = db.transaction(["notes", "meta"], "readwrite");
      const count = await countWrite(tx);
      await tx.objectStore("notes").clear();
      await tx.done;
      checked.clear();
      applied(count, (snap) => {
        snap.valid.clear();
        snap.keys.clear();
        snap.problems = [];
      });
    },

    async importBundle(notes, choose, opts = {}) {
      // Validate again unless the caller vouches for it: it may hand in notes that did not come through readNotesText.
      if (!opts.validated) {
        for (const [k, n] of notes.entries()) {
          const p = parseLocationNote(n);
          if (!p.ok) return { status: "failed", ...refusal({ code: "importNoteInvalid", figures: { number: k + 1, path: String(p.issues[0]?.path), problem: String(p.issues[0]?.message) } }), ...(p.issues[0] ? { issue: p.issues[0] } : {}) };
        }
      }
      const ids = new Set<string>();
      for (const n of notes) {
        if (ids.has(n.id)) return { status: "failed", ...refusal({ code: "importIdTwice", figures: { id: n.id } }) };
        ids.add(n.id);
      }
      const { valid, problems, keys } = await readAll();
      const mine = new Map([...valid].map(([id, s]) => [id, s.note]));
      const preview = previewMerge(notes, mine, new Map(problems.map((p) => [p.key, { message: p.message, why: p.why }])));
      let choices: Record<string, ConflictChoice> = {};
      if (preview.conflicts.length > 0) {
        const chosen = await choose(preview.conflicts);
        if (chosen === null) return { status: "cancelled" };
        choices = chosen;
      }
      let writes: MergeWrites;
      try {
        writes = mergeWrites(preview, choices, keys);
      } catch (e) {
        return { status: "failed", ...refusal({ code: "importFailed", figures: { why: (e as Error).message } }) };
      }
      open();
      const at = now();
      const records = writes.put.map((n) => makeRecord(n, "imported", at, (valid.get(n.id)?.rev ?? 0) + 1));
      // Reviews come with the notes they belong to: those of notes written now, or of notes the library
      // already holds unchanged (the same note, or mine kept); never of a note that is not there.
      const present = new Set([...writes.put.map((n) => n.id), ...valid.keys()]);
      const reviews = (opts.reviews ?? []).filter((r) => present.has(r.location) && startReviewSchema.safeParse(r).success);
      // One transaction for every write: if any write fails, the transaction aborts and none is kept.
      const tx = db.transaction(["notes", "meta", "reviews"], "readwrite") as unknown as IDBPTransaction<NotesDB, ("notes" | "meta")[], "readwrite">;
      const reviewStore = (tx as unknown as IDBPTransaction<NotesDB, ("notes" | "meta" | "reviews")[], "readwrite">).objectStore("reviews");
      const pending: Promise<unknown>[] = [observed(tx.done)];
      let count: { before: string; after: string } | undefined;
      try {
        const counting = observed(countWrite(tx));
        pending.push(counting);
        // A few hundred writes at a time: the next batch is asked for when the last of this one is done
        // (the transaction stays open), so the page draws between batches instead of freezing.
        for (let k = 0; k < records.length; k += WRITE_CHUNK) {
          const batch = records.slice(k, k + WRITE_CHUNK).map((rec) => observed(tx.objectStore("notes").put(rec)));
          pending.push(...batch);
          await batch[batch.length - 1];
        }
        for (const r of reviews) pending.push(observed(reviewStore.put(r)));
        await Promise.all(pending);
        count = await counting;
      } catch (e) {
        try {
          tx.abort();
        } catch {
          // already finished or aborted
        }
        await Promise.allSettled(pending);
        return { status: "failed", ...refusal({ code: "importRefused", figures: { why: (e as Error).message || (e as Error).name } }) };
      }
      const saved = records.map(remember);
      if (count) applied(count, (snap) => saved.forEach((x) => written(snap, x)));
      return { status: "applied", summary: writes.summary };
    },

    async exportBundle(ids, at = now()) {
      const { notes } = await this.list();
      const wanted = ids ? notes.filter((s) => ids.includes(s.note.id)) : notes;
      const all = await db.getAll("reviews");
      const bundle = makeNotesBundle(
        wanted.map((s) => s.note),
        at,
        all.filter((r) => startReviewSchema.safeParse(r).success).sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : 0)),
      );
      if (!ids) await db.put("meta", bundle.exported, "lastExport");
      return bundle;
    },

    async reviews(location) {
      open();
      const raw = await db.getAllFromIndex("reviews", "location", location);
      return raw.filter((r) => startReviewSchema.safeParse(r).success).sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : 0));
    },

    async addReview(review) {
      open();
      const parsed = startReviewSchema.safeParse(review);
      if (!parsed.success) {
        const first = parsed.error.issues[0];
        // The field's problem as a code with its figures (a date in the wrong form, a value not one of the
        // list), for other languages; its English stays the words the schema gave it.
        const coded = first ? fromZodIssues([first as unknown as RawIssue])[0] : undefined;
        const issue = coded ? { ...coded, message: String(first?.message) } : undefined;
        return { ok: false, ...refusal({ code: "reviewInvalid", figures: { path: String(first?.path.join(".")), problem: String(first?.message) } }), ...(issue ? { issue } : {}) };
      }
      const tx = db.transaction(["notes", "reviews"], "readwrite");
      if ((await tx.objectStore("notes").getKey(review.location)) === undefined) {
        await tx.done;
        return { ok: false, ...refusal({ code: "reviewNoNote", figures: { id: review.location } }) };
      }
      await tx.objectStore("reviews").put(parsed.data);
      await tx.done;
      return { ok: true };
    },

    async deleteReview(id) {
      open();
      const tx = db.transaction("reviews", "readwrite");
      const had = (await tx.store.getKey(id)) !== undefined;
      if (had) await tx.store.delete(id);
      await tx.done;
      return had;
    },

    async lastExport() {
      open();
      return db.get("meta", "lastExport");
    },

    async exportReminder(at = now(), list) {
      open();
      const [last, { notes }] = await Promise.all([db.get("meta", "lastExport"), list ?? this.list()]);
      return exportReminder(last, at, notes.some((s) => s.origin !== "demo"));
    },

    async restoreDemos() {
      open();
      const tx = db.transaction(["notes", "meta"], "readwrite");
      const notesStore = tx.objectStore("notes");
      const added: NoteRecord[] = [];
      for (const d of demos) {
        if ((await notesStore.getKey(d.id)) === undefined) {
          const rec = makeRecord(d, "demo", now());
          await notesStore.put(rec);
          added.push(rec);
        }
      }
      const count = added.length > 0 ? await countWrite(tx) : undefined;
      await tx.done;
      const saved = added.map(remember);
      if (count) applied(count, (snap) => saved.forEach((x) => written(snap, x)));
      return added.length;
    },

    closed() {
      return state.closed;
    },

    close() {
      db.close();
    },
  };
}
