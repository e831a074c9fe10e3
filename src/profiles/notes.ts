/**
 * Shareable location-note files: a single note (`taut/location@1`) or a bundle of notes
 * (`taut/notes-bundle@1`). A bundle is validated as a whole: one bad note rejects the file, and the
 * issue names the note's index and the field path, so a library is never half-updated from a file.
 */
import * as z from "zod/mini";
import { fromZodIssues, type FieldIssue, type RawIssue } from "./issues.js";
import { fileKind, kindText, parseLocationNote, parseJsonText } from "./parse.js";
import { quoted } from "./text.js";
import { locationNoteSchema, type LocationNoteFile } from "./schemas.js";

export const NOTES_BUNDLE_SCHEMA = "taut/notes-bundle@1";
export const LOCATION_NOTE_SCHEMA = "taut/location@1";

export const notesBundleSchema = z.object({
  schema: z.literal(NOTES_BUNDLE_SCHEMA),
  /** When the bundle was written, ISO 8601 date-time (UTC). */
  exported: z.iso.datetime({ offset: true, message: "must be an ISO date and time, e.g. 2026-10-12T08:30:00Z" }),
  notes: z.array(locationNoteSchema),
});
export type NotesBundleFile = z.infer<typeof notesBundleSchema>;

/** A notes file read and checked: the notes it holds, and whether it was one note or a bundle. */
export type NotesFileResult =
  | { ok: true; kind: "note" | "bundle"; notes: LocationNoteFile[]; exported?: string }
  | { ok: false; message: string; issues: FieldIssue[] };

/** Validate an already-parsed bundle: schema, every note, and ids unique within the bundle. */
export function parseNotesBundle(data: unknown): { ok: true; value: NotesBundleFile } | { ok: false; issues: FieldIssue[] } {
  const r = notesBundleSchema.safeParse(data, { reportInput: true });
  if (!r.success) return { ok: false, issues: fromZodIssues(r.error.issues as ReadonlyArray<RawIssue>) };
  const seen = new Map<string, number>();
  const issues: FieldIssue[] = [];
  r.data.notes.forEach((n, k) => {
    const first = seen.get(n.id);
    if (first !== undefined) issues.push({ path: `notes[${k}].id`, message: `repeats the id of note ${first + 1} ("${n.id}"); ids must be unique in a bundle` });
    else seen.set(n.id, k);
  });
  return issues.length > 0 ? { ok: false, issues } : { ok: true, value: r.data };
}

/**
 * Read the text of a notes file (one note or a bundle). A truncated or non-JSON file, a file of
 * another kind, and a bundle with any bad note are all refused with a headline and field issues.
 */
export function readNotesText(text: string): NotesFileResult {
  if (text.replace(/^\ufeff/, "").trim() === "") return { ok: false, message: "The file is empty.", issues: [] };
  const json = parseJsonText(text);
  if (!json.ok) {
    return {
      ok: false,
      message: "The file is not complete JSON: it may have been cut short while copying or downloading. Nothing was changed.",
      issues: json.issues,
    };
  }
  return readNotesData(json.value);
}

/** As `readNotesText`, for data already parsed from JSON. */
export function readNotesData(data: unknown): NotesFileResult {
  const kind = fileKind(data);
  if (kind === NOTES_BUNDLE_SCHEMA) {
    const r = parseNotesBundle(data);
    if (!r.ok) return { ok: false, message: bundleHeadline(r.issues, data), issues: r.issues };
    return { ok: true, kind: "bundle", notes: r.value.notes, exported: r.value.exported };
  }
  if (kind === LOCATION_NOTE_SCHEMA) {
    const r = parseLocationNote(data);
    if (!r.ok) return { ok: false, message: `The location note ${nameText(data)} is not valid. Nothing was changed.`, issues: r.issues };
    return { ok: true, kind: "note", notes: [r.value] };
  }
  if (kind === undefined) {
    return {
      ok: false,
      message: `This is not a Taut notes file: it has no "schema" field naming ${NOTES_BUNDLE_SCHEMA} or ${LOCATION_NOTE_SCHEMA}. Nothing was changed.`,
      issues: [{ path: "schema", message: `must be "${NOTES_BUNDLE_SCHEMA}" or "${LOCATION_NOTE_SCHEMA}"` }],
    };
  }
  return {
    ok: false,
    message: `This is a ${kindText(kind)} file, not location notes (${NOTES_BUNDLE_SCHEMA} or ${LOCATION_NOTE_SCHEMA}). Nothing was changed.`,
    issues: [{ path: "schema", message: `must be "${NOTES_BUNDLE_SCHEMA}" or "${LOCATION_NOTE_SCHEMA}" (got ${kindText(kind)})` }],
  };
}

/** The headline for a refused bundle: which notes are bad, by number and name. */
function bundleHeadline(issues: readonly FieldIssue[], data: unknown): string {
  const bad = new Set<number>();
  for (const i of issues) {
    const m = /^notes\[(\d+)\]/.exec(i.path);
    if (m) bad.add(Number(m[1]));
  }
  const notes = (data as { notes?: unknown }).notes;
  const count = Array.isArray(notes) ? notes.length : 0;
  if (bad.size === 0) return "The notes bundle is not valid. Nothing was changed.";
  const named = [...bad]
    .sort((a, b) => a - b)
    .map((k) => {
      const name = Array.isArray(notes) ? nameOf(notes[k]) : undefined;
      return `note ${k + 1}${name ? ` (${quoted(name)})` : ""}`;
    });
  return `The bundle holds ${count} note${count === 1 ? "" : "s"}; ${named.join(", ")} ${bad.size === 1 ? "is" : "are"} not valid, so none was imported.`;
}

/** A note's name for a message, quoted safely. */
function nameText(x: unknown): string {
  const name = nameOf(x);
  return name === undefined ? "without a name" : quoted(name);
}

function nameOf(x: unknown): string | undefined {
  if (x && typeof x === "object" && typeof (x as { name?: unknown }).name === "string") return (x as { name: string }).name;
  return undefined;
}

/** A bundle of notes written now (or at `now`). */
export function makeNotesBundle(notes: readonly LocationNoteFile[], now: Date = new Date()): NotesBundleFile {
  return { schema: NOTES_BUNDLE_SCHEMA, exported: now.toISOString(), notes: [...notes] };
}

/** The note's latest revision entry: the latest date; of equal dates, the one listed last. */
export function latestRevision(n: Pick<LocationNoteFile, "revisions">): LocationNoteFile["revisions"][number] {
  let best = n.revisions[0]!;
  for (const r of n.revisions) if (r.date >= best.date) best = r;
  return best;
}

/** Whether two notes carry the same latest revision entry (date, initials and change). */
export function sameLatestRevision(a: Pick<LocationNoteFile, "revisions">, b: Pick<LocationNoteFile, "revisions">): boolean {
  const x = latestRevision(a);
  const y = latestRevision(b);
  return x.date === y.date && x.initials === y.initials && x.change === y.change;
}

/** Canonical JSON of a note (keys sorted), for comparing two notes field by field. */
export function canonicalNote(n: LocationNoteFile): string {
  return JSON.stringify(n, (_k, v: unknown) => {
    if (v && typeof v === "object" && !Array.isArray(v)) {
      return Object.fromEntries(Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)));
    }
    return v;
  });
}

