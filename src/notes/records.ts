/**
 * What the notes store keeps on the device, and the check every record passes when it is read back:
 * storage can be damaged (a half-written record, another program's data, a hand edit in developer
 * tools), so nothing read from IndexedDB is trusted until it has been validated again.
 */
import { parseLocationNote } from "../profiles/parse.js";
import { latestRevision } from "../profiles/notes.js";
import type { LocationNoteFile } from "../profiles/schemas.js";
import { migrateV1Record } from "./migrations.js";
import { noteRecordEnglish, type MigrationFlag, type RecordWhy } from "../profiles/noteRecordText.js";
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
  /** The same as codes, when the record keeps them (the app writes them in the language on screen). */
  flagCodes?: MigrationFlag[];
  note: LocationNoteFile;
}

/** A record that could not be read, and why; the record is skipped, never trusted. */
export interface RecordProblem {
  /** The key as text, for messages and for matching a note id. */
  key: string;
  /** The key as stored (a number stays a number), to remove or export the record. */
  rawKey: IDBValidKey;
  /** In English (as the library has always said it). */
  message: string;
  /** Why, as a code with its figures: the app writes it in the language on screen. */
  why: RecordWhy;
  /**
   * For a record of the older format that could not be carried over: what could be (fields the
   * trainer can put right in the editor) and what was left out.
   */
  rescue?: { note: Record<string, unknown>; flags: string[]; flagCodes: MigrationFlag[] };
}

/** The write count a raw record carries (0 when it has none or a wrong one). */
export function recordRev(raw: unknown): number {
  const rev = raw && typeof raw === "object" ? (raw as { rev?: unknown }).rev : undefined;
  return typeof rev === "number" && Number.isInteger(rev) && rev >= 0 ? rev : 0;
}

/** Validate a raw record read back from storage. */
export function checkRecord(key: IDBValidKey, raw: unknown): { ok: true; saved: SavedNote } | { ok: false; problem: RecordProblem } {
  const k = keyText(key);
  const bad = (why: RecordWhy, rescue?: RecordProblem["rescue"]) => ({
    ok: false as const,
    problem: { key: k, rawKey: key, message: noteRecordEnglish.problem(k, why), why, ...(rescue ? { rescue } : {}) },
  });
  if (!raw || typeof raw !== "object") return bad({ code: "notObject" });
  const r = raw as Partial<Record<keyof NoteRecord, unknown>>;
  if (r.note === undefined && ("title" in r || "profile" in r)) {
    // A record of the older format that the upgrade could not carry over: say why, keep what can be kept.
    const m = migrateV1Record(raw);
    if (m.ok) return bad({ code: "olderFormat" });
    return bad({ code: "olderNotCarried", why: m.why }, { note: m.partial, flags: m.flags, flagCodes: m.flagCodes });
  }
  if (!ORIGINS.includes(r.origin as NoteOrigin)) return bad({ code: "badOrigin", origin: String(JSON.stringify(r.origin)), origins: ORIGINS.join(", ") });
  if (typeof r.savedAt !== "string" || Number.isNaN(Date.parse(r.savedAt))) return bad({ code: "badSavedAt" });
  const parsed = parseLocationNote(r.note);
  if (!parsed.ok) return bad({ code: "noteInvalid", issues: parsed.issues });
  if (parsed.value.id !== k) return bad({ code: "wrongKey", key: k, id: parsed.value.id });
  const flags = Array.isArray(r.flags) ? r.flags.filter((f): f is string => typeof f === "string") : [];
  const flagCodes = flagCodesOf(r.flagCodes, flags);
  return { ok: true, saved: { origin: r.origin as NoteOrigin, savedAt: r.savedAt, rev: recordRev(raw), ...(flags.length > 0 ? { flags } : {}), ...(flagCodes ? { flagCodes } : {}), note: parsed.value } };
}

/**
 * The codes a record keeps beside its flags, when they are the codes of exactly those flags (a record
 * carried over before the codes were kept, or edited by hand, has only the English).
 */
export function flagCodesOf(raw: unknown, flags: readonly string[]): MigrationFlag[] | undefined {
  if (!Array.isArray(raw) || raw.length !== flags.length || raw.length === 0) return undefined;
  const codes: MigrationFlag[] = [];
  for (const [k, c] of (raw as unknown[]).entries()) {
    const f = migrationFlag(c);
    if (!f || noteRecordEnglish.flag(f) !== flags[k]) return undefined;
    codes.push(f);
  }
  return codes;
}

/** A flag's code read back from storage, or undefined when it is not one. */
function migrationFlag(x: unknown): MigrationFlag | undefined {
  if (!x || typeof x !== "object") return undefined;
  const c = x as Record<string, unknown>;
  const text = (v: unknown): v is string => typeof v === "string";
  if (c.code === "hazardNotText" && typeof c.number === "number" && Number.isInteger(c.number)) return { code: "hazardNotText", number: c.number };
  if (c.code === "seasonUnknown" && text(c.season)) return { code: "seasonUnknown", season: c.season };
  if (c.code === "railUnknown" && text(c.season) && text(c.word) && text(c.rails)) return { code: "railUnknown", season: c.season, word: c.word, rails: c.rails };
  return undefined;
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
