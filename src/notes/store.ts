/**
 * The location-notes library on the device: IndexedDB through `idb`. Every record is validated when
 * read (a damaged one is reported and skipped), every write is validated first, and an import is
 * applied in one transaction so the library is never half-updated.
 */
import { openDB, type DBSchema, type IDBPDatabase, type IDBPTransaction } from "idb";
import type { FieldIssue } from "../profiles/issues.js";
import { makeNotesBundle, type NotesBundleFile } from "../profiles/notes.js";
import { parseLocationNote } from "../profiles/parse.js";
import type { LocationNoteFile } from "../profiles/schemas.js";
import { mergeWrites, previewMerge, type ConflictChoice, type ImportConflict, type MergeWrites } from "./merge.js";
import { migrateV1Record, NOTES_DB_VERSION } from "./migrations.js";
import { checkRecord, makeRecord, type NoteOrigin, type NoteRecord, type RecordProblem, type SavedNote } from "./records.js";
import { exportReminder, type ExportReminder } from "./reminder.js";

export const DEFAULT_NOTES_DB = "taut-notes";

interface MetaValues {
  /** ISO date-time of the last export of the whole library. */
  lastExport: string;
  /** ISO date-time the demo notes were first added. */
  demosAdded: string;
}
type MetaKey = keyof MetaValues;

interface NotesDB extends DBSchema {
  notes: { key: string; value: NoteRecord };
  meta: { key: MetaKey; value: string };
}

/** Validated notes and the records that could not be read. */
export interface NoteList {
  /** Sorted by name. */
  notes: SavedNote[];
  problems: RecordProblem[];
}

export type ReadResult = { status: "ok"; saved: SavedNote } | { status: "missing" } | { status: "damaged"; problem: RecordProblem };

export type PutResult = { ok: true; saved: SavedNote } | { ok: false; issues: FieldIssue[] };

/** Called with the conflicts of an import; returns a choice per conflicting id, or null to cancel. */
export type ChooseConflicts = (conflicts: ImportConflict[]) => Promise<Record<string, ConflictChoice> | null> | Record<string, ConflictChoice> | null;

export type ImportOutcome = { status: "applied"; summary: MergeWrites["summary"] } | { status: "cancelled" } | { status: "failed"; message: string };

export interface NotesStore {
  /** Every readable note (sorted by name) and a problem for each damaged record. */
  list(): Promise<NoteList>;
  get(id: string): Promise<ReadResult>;
  /** Validate and save a note (new or edited); nothing is written when it is invalid. */
  put(note: unknown, origin?: NoteOrigin): Promise<PutResult>;
  /** Remove a note (or a damaged record) by id; true when something was removed. */
  delete(id: string): Promise<boolean>;
  /** Remove every note. */
  clear(): Promise<void>;
  /** Import validated notes: settle conflicts through `choose`, then write all in one transaction. */
  importBundle(notes: readonly LocationNoteFile[], choose: ChooseConflicts): Promise<ImportOutcome>;
  /** A bundle of all notes (or those with the given ids); exporting all is remembered as the last export. */
  exportBundle(ids?: readonly string[], now?: Date): Promise<NotesBundleFile>;
  /** ISO date-time of the last export of the whole library. */
  lastExport(): Promise<string | undefined>;
  exportReminder(now?: Date): Promise<ExportReminder>;
  /** Put back the demo notes that are missing; returns how many were added. */
  restoreDemos(): Promise<number>;
  close(): void;
}

export interface OpenOptions {
  /** Database name (tests use a fresh one each). */
  name?: string;
  /** Demo notes added when the database is first created. */
  demos?: readonly LocationNoteFile[];
  /** The clock, for tests. */
  now?: () => Date;
}

/** Open (creating or migrating as needed) the notes database. */
export async function openNotesStore(opts: OpenOptions = {}): Promise<NotesStore> {
  const demos = opts.demos ?? [];
  const now = opts.now ?? (() => new Date());
  const db = await openDB<NotesDB>(opts.name ?? DEFAULT_NOTES_DB, NOTES_DB_VERSION, {
    upgrade(database, oldVersion, _newVersion, tx) {
      upgradeNotesDb(database, oldVersion, tx, demos, now());
    },
    blocking() {
      // A newer version of the app wants to upgrade the database: let it.
      db.close();
    },
  });
  return makeStore(db, demos, now);
}

/** Create or migrate the stores, step by step from `oldVersion` (0 = new database). */
function upgradeNotesDb(db: IDBPDatabase<NotesDB>, oldVersion: number, tx: IDBPTransaction<NotesDB, ("notes" | "meta")[], "versionchange">, demos: readonly LocationNoteFile[], now: Date): void {
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
}

/** Rewrite every version-1 record in place; one that cannot be carried over stays as it was and is reported when read. */
async function migrateFromV1(tx: IDBPTransaction<NotesDB, ("notes" | "meta")[], "versionchange">): Promise<void> {
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

function makeStore(db: IDBPDatabase<NotesDB>, demos: readonly LocationNoteFile[], now: () => Date): NotesStore {
  async function readAll(): Promise<{ valid: Map<string, SavedNote>; problems: RecordProblem[]; keys: Set<string> }> {
    const tx = db.transaction("notes", "readonly");
    const valid = new Map<string, SavedNote>();
    const problems: RecordProblem[] = [];
    const keys = new Set<string>();
    let cursor = await tx.store.openCursor();
    while (cursor) {
      keys.add(String(cursor.key));
      const r = checkRecord(cursor.key, cursor.value);
      if (r.ok) valid.set(r.saved.note.id, r.saved);
      else problems.push(r.problem);
      cursor = await cursor.continue();
    }
    await tx.done;
    return { valid, problems, keys };
  }

  const byName = (a: SavedNote, b: SavedNote) => a.note.name.localeCompare(b.note.name) || a.note.id.localeCompare(b.note.id);

  return {
    async list() {
      const { valid, problems } = await readAll();
      return { notes: [...valid.values()].sort(byName), problems };
    },

    async get(id) {
      const raw = await db.get("notes", id);
      if (raw === undefined) return { status: "missing" };
      const r = checkRecord(id, raw);
      return r.ok ? { status: "ok", saved: r.saved } : { status: "damaged", problem: r.problem };
    },

    async put(note, origin = "mine") {
      const parsed = parseLocationNote(note);
      if (!parsed.ok) return { ok: false, issues: parsed.issues };
      const rec = makeRecord(parsed.value, origin, now());
      await db.put("notes", rec);
      return { ok: true, saved: { origin: rec.origin, savedAt: rec.savedAt, note: rec.note } };
    },

    async delete(id) {
      const tx = db.transaction("notes", "readwrite");
      const had = (await tx.store.getKey(id)) !== undefined;
      if (had) await tx.store.delete(id);
      await tx.done;
      return had;
    },

    async clear() {
      await db.clear("notes");
    },

    async importBundle(notes, choose) {
      // Validate again: the caller may hand in notes that did not come through readNotesText.
      for (const [k, n] of notes.entries()) {
        const p = parseLocationNote(n);
        if (!p.ok) return { status: "failed", message: `Note ${k + 1} is not valid (${p.issues[0]?.path}: ${p.issues[0]?.message}); nothing was imported.` };
      }
      const ids = new Set<string>();
      for (const n of notes) {
        if (ids.has(n.id)) return { status: "failed", message: `The id "${n.id}" appears twice in the file; nothing was imported.` };
        ids.add(n.id);
      }
      const { valid, problems, keys } = await readAll();
      const mine = new Map([...valid].map(([id, s]) => [id, s.note]));
      const preview = previewMerge(notes, mine, new Set(problems.map((p) => p.key)));
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
        return { status: "failed", message: `${(e as Error).message}; nothing was imported.` };
      }
      const at = now();
      // One transaction for every write: if any write fails, the transaction aborts and none is kept.
      const tx = db.transaction("notes", "readwrite");
      const pending: Promise<unknown>[] = [observed(tx.done)];
      try {
        for (const n of writes.put) pending.push(observed(tx.store.put(makeRecord(n, "imported", at))));
        await Promise.all(pending);
      } catch (e) {
        try {
          tx.abort();
        } catch {
          // already finished or aborted
        }
        await Promise.allSettled(pending);
        return { status: "failed", message: `The device refused to save the notes (${(e as Error).message || (e as Error).name}); nothing was imported.` };
      }
      return { status: "applied", summary: writes.summary };
    },

    async exportBundle(ids, at = now()) {
      const { notes } = await this.list();
      const wanted = ids ? notes.filter((s) => ids.includes(s.note.id)) : notes;
      const bundle = makeNotesBundle(
        wanted.map((s) => s.note),
        at,
      );
      if (!ids) await db.put("meta", bundle.exported, "lastExport");
      return bundle;
    },

    async lastExport() {
      return db.get("meta", "lastExport");
    },

    async exportReminder(at = now()) {
      const [last, { notes }] = await Promise.all([db.get("meta", "lastExport"), this.list()]);
      return exportReminder(last, at, notes.some((s) => s.origin !== "demo"));
    },

    async restoreDemos() {
      const tx = db.transaction("notes", "readwrite");
      let added = 0;
      for (const d of demos) {
        if ((await tx.store.getKey(d.id)) === undefined) {
          await tx.store.put(makeRecord(d, "demo", now()));
          added++;
        }
      }
      await tx.done;
      return added;
    },

    close() {
      db.close();
    },
  };
}
