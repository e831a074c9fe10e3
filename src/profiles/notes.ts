/**
 * Shareable location-note files: a single note (`taut/location@1`) or a bundle of notes
 * (`taut/notes-bundle@2`, which also carries the notes' Start reviews; a `taut/notes-bundle@1` file, from
 * before reviews, is migrated on reading: its notes, no reviews). A bundle is validated as a whole: one bad note rejects the file, and the
 * issue names the note's index and the field path, so a library is never half-updated from a file.
 */
import * as z from "zod/mini";
import { fromZodIssues, type FieldIssue, type RawIssue } from "./issues.js";
import { fileKind, kindText, parseLocationNote, parseJsonText } from "./parse.js";
import { quoted } from "./text.js";
import { englishField } from "./issueText.js";
import type { ReaderCoded } from "../i18n/renderReaders.js";
import { readerEnglish, readerIssue } from "./readerIssues.js";
import { locationNoteSchema, railConditionSchema, type LocationNoteFile } from "./schemas.js";

export const NOTES_BUNDLE_SCHEMA = "taut/notes-bundle@2";
/** The bundle before Start reviews: notes only. Still read (migrated), no longer written. */
export const NOTES_BUNDLE_SCHEMA_V1 = "taut/notes-bundle@1";
export const LOCATION_NOTE_SCHEMA = "taut/location@1";

const DATE = /^\d{4}-\d{2}-\d{2}$/;
/** A rule of ours: its English words and its code (other languages render the code). */
const rule = (code: "dateIso" | "isoDateTime" | "finiteNumber") => ({ message: englishField({ code }), params: { code } });
const finite = z.number().check(z.refine(Number.isFinite, rule("finiteNumber")));
const ISO_DATE_TIME = z.iso.datetime({ offset: true });
/** A fitted factor and its 95 % interval. */
const factorSchema = z.object({ value: finite, low: finite, high: finite });

/**
 * A Start review kept as evidence beside a location note: when, on what rail, which train, the observed
 * factors with their intervals, and a small thumbnail of the recorded speed curve.
 */
export const startReviewSchema = z.object({
  id: z.string().check(z.minLength(1), z.maxLength(80)),
  /** The note (location id) it belongs to. */
  location: z.string().check(z.minLength(1), z.maxLength(80)),
  date: z.string().check(z.refine((d) => DATE.test(d), rule("dateIso"))),
  rail: railConditionSchema,
  /** The train, in the trainer's words (or the case's label). */
  train: z.string().check(z.minLength(1), z.maxLength(200)),
  initials: z.optional(z.string().check(z.maxLength(10))),
  massFactor: factorSchema,
  effortFactor: z.optional(factorSchema),
  /** Whether the recording told mass and effort apart (absent: only the mass was fitted). */
  separable: z.optional(z.boolean()),
  plannedVerdict: z.enum(["starts", "marginal", "needs-assistance"]),
  replannedVerdict: z.enum(["starts", "marginal", "needs-assistance"]),
  /** The recorded speed curve, a few dozen points from the moment of start. */
  thumbnail: z.object({ time_s: z.array(finite).check(z.maxLength(120)), speed_kmh: z.array(finite).check(z.maxLength(120)) }),
  comment: z.optional(z.string().check(z.maxLength(2000))),
});
export type StartReviewFile = z.infer<typeof startReviewSchema>;

export const notesBundleSchema = z.object({
  schema: z.literal(NOTES_BUNDLE_SCHEMA),
  /** When the bundle was written, ISO 8601 date-time (UTC). */
  exported: z.string().check(z.refine((s) => ISO_DATE_TIME.safeParse(s).success, rule("isoDateTime"))),
  notes: z.array(locationNoteSchema),
  reviews: z.array(startReviewSchema),
});
export type NotesBundleFile = z.infer<typeof notesBundleSchema>;

/** A notes file read and checked: the notes it holds (and their reviews), and whether it was one note or a bundle. */
export type NotesFileResult =
  | { ok: true; kind: "note" | "bundle"; notes: LocationNoteFile[]; reviews: StartReviewFile[]; exported?: string; migratedFrom?: string }
  | {
      ok: false;
      message: string;
      /** The message as a code (and whether "Nothing was changed." follows it in `message`), for other languages. */
      headline: ReaderCoded;
      nothingChanged: boolean;
      issues: FieldIssue[];
    };

/**
 * A version-1 bundle as version 2: the same notes and no reviews (version 1 had none). Anything that is
 * not a version-1 bundle is returned as it is, for the version-2 checks to judge.
 */
export function migrateNotesBundle(data: unknown): unknown {
  if (!data || typeof data !== "object" || Array.isArray(data)) return data;
  const d = data as Record<string, unknown>;
  if (d.schema !== NOTES_BUNDLE_SCHEMA_V1) return data;
  return { ...d, schema: NOTES_BUNDLE_SCHEMA, reviews: [] };
}

/** Validate an already-parsed bundle: schema, every note and review, ids unique, each review's note present. */
export function parseNotesBundle(data: unknown): { ok: true; value: NotesBundleFile } | { ok: false; issues: FieldIssue[] } {
  const r = notesBundleSchema.safeParse(migrateNotesBundle(data), { reportInput: true });
  if (!r.success) return { ok: false, issues: fromZodIssues(r.error.issues as ReadonlyArray<RawIssue>) };
  const seen = new Map<string, number>();
  const issues: FieldIssue[] = [];
  r.data.notes.forEach((n, k) => {
    const first = seen.get(n.id);
    if (first !== undefined) issues.push(readerIssue(`notes[${k}].id`, { code: "noteIdRepeated", figures: { first: first + 1, id: n.id } }));
    else seen.set(n.id, k);
  });
  const reviewIds = new Set<string>();
  r.data.reviews.forEach((v, k) => {
    if (!seen.has(v.location)) issues.push(readerIssue(`reviews[${k}].location`, { code: "reviewNoteMissing", figures: { id: v.location } }));
    if (reviewIds.has(v.id)) issues.push(readerIssue(`reviews[${k}].id`, { code: "reviewIdRepeated", figures: { id: v.id } }));
    reviewIds.add(v.id);
  });
  return issues.length > 0 ? { ok: false, issues } : { ok: true, value: r.data };
}

/**
 * Read the text of a notes file (one note or a bundle). A truncated or non-JSON file, a file of
 * another kind, and a bundle with any bad note are all refused with a headline and field issues.
 */
export function readNotesText(text: string): NotesFileResult {
  if (text.replace(/^\ufeff/, "").trim() === "") return refused({ code: "notesEmpty" }, false, []);
  const json = parseJsonText(text);
  if (!json.ok) return refused({ code: "notesCutShort" }, true, json.issues);
  return readNotesData(json.value);
}

/** As `readNotesText`, for data already parsed from JSON. */
export function readNotesData(data: unknown): NotesFileResult {
  const kind = fileKind(data);
  if (kind === NOTES_BUNDLE_SCHEMA || kind === NOTES_BUNDLE_SCHEMA_V1) {
    const r = parseNotesBundle(data);
    if (!r.ok) {
      const h = bundleHeadline(r.issues, data);
      return refused(h.headline, h.nothingChanged, r.issues);
    }
    return { ok: true, kind: "bundle", notes: r.value.notes, reviews: r.value.reviews, exported: r.value.exported, ...(kind === NOTES_BUNDLE_SCHEMA_V1 ? { migratedFrom: kind } : {}) };
  }
  if (kind === LOCATION_NOTE_SCHEMA) {
    const r = parseLocationNote(data);
    if (!r.ok) return refused(nameOf(data) === undefined ? { code: "noteNotValid" } : { code: "noteNotValid", figures: { name: quoted(nameOf(data)!) } }, true, r.issues);
    return { ok: true, kind: "note", notes: [r.value], reviews: [] };
  }
  const schemas = { bundle: NOTES_BUNDLE_SCHEMA, note: LOCATION_NOTE_SCHEMA };
  if (kind === undefined) return refused({ code: "notesNoSchema", figures: schemas }, true, [readerIssue("schema", { code: "notesSchema", figures: schemas })]);
  const k = kindText(kind);
  return refused({ code: "notesOtherKind", figures: { ...schemas, kind: k } }, true, [readerIssue("schema", { code: "notesSchemaGot", figures: { ...schemas, kind: k } })]);
}

/** A notes file refused: its headline as a code and in English (with "Nothing was changed." where it says so). */
export function refused(headline: ReaderCoded, nothingChanged: boolean, issues: FieldIssue[]): NotesFileResult {
  const english = readerEnglish(headline);
  return { ok: false, message: nothingChanged ? `${english} ${readerEnglish({ code: "nothingChanged" })}` : english, headline, nothingChanged, issues };
}

/** The headline for a refused bundle: which notes are bad, by number and name. */
function bundleHeadline(issues: readonly FieldIssue[], data: unknown): { headline: ReaderCoded; nothingChanged: boolean } {
  const bad = new Set<number>();
  for (const i of issues) {
    const m = /^notes\[(\d+)\]/.exec(i.path);
    if (m) bad.add(Number(m[1]));
  }
  const notes = (data as { notes?: unknown }).notes;
  const count = Array.isArray(notes) ? notes.length : 0;
  if (bad.size === 0) return { headline: { code: "bundleNotValid" }, nothingChanged: true };
  const named = [...bad]
    .sort((a, b) => a - b)
    .map((k) => {
      const name = Array.isArray(notes) ? nameOf(notes[k]) : undefined;
      return { number: k + 1, ...(name ? { name: quoted(name) } : {}) };
    });
  return { headline: { code: "bundleBad", notes: count, named }, nothingChanged: false };
}

function nameOf(x: unknown): string | undefined {
  if (x && typeof x === "object" && typeof (x as { name?: unknown }).name === "string") return (x as { name: string }).name;
  return undefined;
}

/** A bundle of notes (and the reviews of those notes) written now (or at `now`). */
export function makeNotesBundle(notes: readonly LocationNoteFile[], now: Date = new Date(), reviews: readonly StartReviewFile[] = []): NotesBundleFile {
  const ids = new Set(notes.map((n) => n.id));
  return { schema: NOTES_BUNDLE_SCHEMA, exported: now.toISOString(), notes: [...notes], reviews: reviews.filter((r) => ids.has(r.location)) };
}

/**
 * The observed factor of a location's reviews: the median of their mass factors (one odd start does not
 * move a median), with how many reviews it rests on. Shown as observed, beside the model; never applied
 * silently. Null without reviews.
 */
export function observedMassFactor(reviews: readonly StartReviewFile[]): { median: number; reviews: number } | null {
  if (reviews.length === 0) return null;
  const xs = reviews.map((r) => r.massFactor.value).sort((a, b) => a - b);
  const m = xs.length >> 1;
  return { median: xs.length % 2 ? xs[m]! : 0.5 * (xs[m - 1]! + xs[m]!), reviews: xs.length };
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

