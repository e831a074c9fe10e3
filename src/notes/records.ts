/**
 * What the notes store keeps on the device, and the check every record passes when it is read back:
 * storage can be damaged (a half-written record, another program's data, a hand edit in developer
 * tools), so nothing read from IndexedDB is trusted until it has been validated again.
 */
import { formatIssues } from "../profiles/issues.js";
import { parseLocationNote } from "../profiles/parse.js";
import type { LocationNoteFile } from "../profiles/schemas.js";

/** Where a saved note came from: a demo note shipped with the program, the user's own, or a file. */
export type NoteOrigin = "demo" | "mine" | "imported";
const ORIGINS: readonly NoteOrigin[] = ["demo", "mine", "imported"];

/** One note as stored (schema version 2): the note file itself plus where it came from and when it was saved. */
export interface NoteRecord {
  id: string;
  origin: NoteOrigin;
  /** When it was last written on this device, ISO 8601. */
  savedAt: string;
  note: LocationNoteFile;
}

/** A saved note, validated. */
export type SavedNote = Omit<NoteRecord, "id">;

/** A record that could not be read, and why; the record is skipped, never trusted. */
export interface RecordProblem {
  key: string;
  message: string;
}

/** Validate a raw record read back from storage. */
export function checkRecord(key: IDBValidKey, raw: unknown): { ok: true; saved: SavedNote } | { ok: false; problem: RecordProblem } {
  const k = keyText(key);
  const bad = (why: string) => ({ ok: false as const, problem: { key: k, message: `The saved note "${k}" is damaged and was skipped: ${why}` } });
  if (!raw || typeof raw !== "object") return bad("the record is not an object");
  const r = raw as Partial<Record<keyof NoteRecord, unknown>>;
  if (r.note === undefined && ("title" in r || "profile" in r)) return bad("it is in an older format that could not be carried over");
  if (!ORIGINS.includes(r.origin as NoteOrigin)) return bad(`its origin is ${JSON.stringify(r.origin)}, not one of ${ORIGINS.join(", ")}`);
  if (typeof r.savedAt !== "string" || Number.isNaN(Date.parse(r.savedAt))) return bad("its save time is missing or not a date");
  const parsed = parseLocationNote(r.note);
  if (!parsed.ok) return bad(formatIssues(parsed.issues).replace(/\n/g, "; "));
  if (parsed.value.id !== k) return bad(`it is stored under "${k}" but the note inside says "${parsed.value.id}"`);
  return { ok: true, saved: { origin: r.origin as NoteOrigin, savedAt: r.savedAt, note: parsed.value } };
}

/** A record for a validated note. */
export function makeRecord(note: LocationNoteFile, origin: NoteOrigin, savedAt: Date): NoteRecord {
  return { id: note.id, origin, savedAt: savedAt.toISOString(), note };
}

function keyText(key: IDBValidKey): string {
  return typeof key === "string" ? key : JSON.stringify(key) ?? String(key);
}
