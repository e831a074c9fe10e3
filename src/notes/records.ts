/**
 * What the notes store keeps on the device, and the check every record passes when it is read back:
 * storage can be damaged (a half-written record, another program's data, a hand edit in developer
 * tools), so nothing read from IndexedDB is trusted until it has been validated again.
 */
import { formatIssues } from "../profiles/issues.js";
import { parseLocationNote } from "../profiles/parse.js";
import { latestRevision } from "../profiles/notes.js";
import type { LocationNoteFile } from "../profiles/schemas.js";
import { migrateV1Record } from "./migrations.js";
import type { NoteOrigin, NoteRecord } from "./recordTypes.js";

export type { NoteOrigin, NoteRecord } from "./recordTypes.js";

const ORIGINS: readonly NoteOrigin[] = ["demo", "mine", "imported"];

/** A saved note, validated. */
export interface SavedNote {
  origin: NoteOrigin;
  savedAt: string;
  /** The record's write count (0 for a record written before it was kept). */
  rev: number;
  /** Things a migration could not carry over (none for a note saved since). */
  flags?: string[];
  note: LocationNoteFile;
}

/** A record that could not be read, and why; the record is skipped, never trusted. */
export interface RecordProblem {
  /** The key as text, for messages and for matching a note id. */
  key: string;
  /** The key as stored (a number stays a number), to remove or export the record. */
  rawKey: IDBValidKey;
  message: string;
  /**
   * For a record of the older format that could not be carried over: what could be (fields the
   * trainer can put right in the editor) and what was left out.
   */
  rescue?: { note: Record<string, unknown>; flags: string[] };
}

/** The write count a raw record carries (0 when it has none or a wrong one). */
export function recordRev(raw: unknown): number {
  const rev = raw && typeof raw === "object" ? (raw as { rev?: unknown }).rev : undefined;
  return typeof rev === "number" && Number.isInteger(rev) && rev >= 0 ? rev : 0;
}

/** Validate a raw record read back from storage. */
export function checkRecord(key: IDBValidKey, raw: unknown): { ok: true; saved: SavedNote } | { ok: false; problem: RecordProblem } {
  const k = keyText(key);
  const bad = (why: string, rescue?: RecordProblem["rescue"]) => ({
    ok: false as const,
    problem: { key: k, rawKey: key, message: `The saved note "${k}" is damaged and was skipped: ${why}`, ...(rescue ? { rescue } : {}) },
  });
  if (!raw || typeof raw !== "object") return bad("the record is not an object");
  const r = raw as Partial<Record<keyof NoteRecord, unknown>>;
  if (r.note === undefined && ("title" in r || "profile" in r)) {
    // A record of the older format that the upgrade could not carry over: say why, keep what can be kept.
    const m = migrateV1Record(raw);
    if (m.ok) return bad("it is in the older format; reopen the app to carry it over");
    return bad(`it is in an older format that could not be carried over (${m.message})`, { note: m.partial, flags: m.flags });
  }
  if (!ORIGINS.includes(r.origin as NoteOrigin)) return bad(`its origin is ${JSON.stringify(r.origin)}, not one of ${ORIGINS.join(", ")}`);
  if (typeof r.savedAt !== "string" || Number.isNaN(Date.parse(r.savedAt))) return bad("its save time is missing or not a date");
  const parsed = parseLocationNote(r.note);
  if (!parsed.ok) return bad(formatIssues(parsed.issues).replace(/\n/g, "; "));
  if (parsed.value.id !== k) return bad(`it is stored under "${k}" but the note inside says "${parsed.value.id}"`);
  const flags = Array.isArray(r.flags) ? r.flags.filter((f): f is string => typeof f === "string") : [];
  return { ok: true, saved: { origin: r.origin as NoteOrigin, savedAt: r.savedAt, rev: recordRev(raw), ...(flags.length > 0 ? { flags } : {}), note: parsed.value } };
}

/** A record for a validated note. */
export function makeRecord(note: LocationNoteFile, origin: NoteOrigin, savedAt: Date, rev = 1, flags: readonly string[] = []): NoteRecord {
  return { id: note.id, origin, savedAt: savedAt.toISOString(), rev, ...(flags.length > 0 ? { flags: [...flags] } : {}), note };
}

/** A key as text: a string as it is, anything else (a number, a date, a list) as JSON. */
export function keyText(key: IDBValidKey): string {
  if (typeof key === "string") return key;
  if (key instanceof Date) return key.toISOString();
  try {
    return JSON.stringify(key) ?? String(key);
  } catch {
    return String(key);
  }
}

/** A note as the library lists it: enough to show its row and open it, without the note itself. */
export interface NoteRow {
  id: string;
  name: string;
  line?: string;
  direction?: string;
  illustrative: boolean;
  origin: NoteOrigin;
  /** The latest revision's date and initials. */
  revised: { date: string; initials: string };
  /** How many things a migration could not carry over (0 for most notes). */
  flags: number;
}

/** The row of a saved note. */
export function rowOf(s: SavedNote): NoteRow {
  const r = latestRevision(s.note);
  return {
    id: s.note.id,
    name: s.note.name,
    ...(s.note.line ? { line: s.note.line } : {}),
    ...(s.note.direction ? { direction: s.note.direction } : {}),
    illustrative: s.note.illustrative === true,
    origin: s.origin,
    revised: { date: r.date, initials: r.initials },
    flags: s.flags?.length ?? 0,
  };
}

/** Rows read back from the stored list, or undefined when any is not a row (the list is then rebuilt). */
export function checkRows(x: unknown): NoteRow[] | undefined {
  if (!Array.isArray(x)) return undefined;
  const text = (v: unknown) => typeof v === "string";
  for (const r of x as Array<Partial<NoteRow> | null>) {
    if (!r || typeof r !== "object" || !text(r.id) || !text(r.name) || !ORIGINS.includes(r.origin as NoteOrigin) || typeof r.illustrative !== "boolean") return undefined;
    if (!r.revised || !text(r.revised.date) || !text(r.revised.initials) || typeof r.flags !== "number") return undefined;
    if ((r.line !== undefined && !text(r.line)) || (r.direction !== undefined && !text(r.direction))) return undefined;
  }
  return x as NoteRow[];
}
