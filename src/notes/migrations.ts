/**
 * Schema versions of the notes database and the steps between them.
 *
 * Version 1 kept one record per place in the `notes` store with the profile nested under `profile`,
 * hazards as plain lines of text, the usual rail condition as a map from season to condition, and a
 * single "last revised" date and initials instead of a revision history.
 *
 * Version 2 keeps each note as a whole `taut/location@1` file inside a record that says where it came
 * from and when it was saved, and adds a `meta` store (last export, demo notes added).
 *
 * Version 3 (current) adds a `reviews` store: Start reviews kept beside the notes, by id, indexed by the
 * note they belong to. Notes are not touched by the step.
 */
import { parseLocationNote } from "../profiles/parse.js";
import { noteRecordEnglish, type MigrationFailure, type MigrationFlag } from "../profiles/noteRecordText.js";
import type { NoteRecord } from "./recordTypes.js";
import { RAIL_CONDITIONS } from "../core/physics/types.js";

export const NOTES_DB_VERSION = 3;

/** A version-1 record, as version 1 wrote it. */
export interface NoteRecordV1 {
  id: string;
  title: string;
  line?: string;
  direction?: string;
  profile: {
    segments: Array<{ start_m: number; length_m: number; grade_permille: number; radius_m: number }>;
    front_m: number;
    clear_m: number;
  };
  speedLimit_kmh?: number;
  /** One line of text per hazard. */
  hazards: string[];
  /** Usual rail condition by season. */
  rail?: Partial<Record<"spring" | "summer" | "autumn" | "winter", string>>;
  practice: string;
  /** Date of the last revision, YYYY-MM-DD. */
  revised: string;
  /** Initials of whoever revised it. */
  by: string;
  /** True for the demo notes version 1 shipped with. */
  demo?: boolean;
}

/** The change entry written into a migrated note's revision record. */
export const V1_CARRIED_OVER = "Carried over from the earlier notes format, which kept only the last revision.";

const SEASON_ORDER = ["spring", "summer", "autumn", "winter"] as const;

/** The rail words a season may name (the rail conditions of the program). */
const RAIL_WORDS: readonly string[] = RAIL_CONDITIONS;

/**
 * A migration's result. `flags` and `message` are in English (as the library has always said them; the
 * flags are stored with the note); `flagCodes` and `why` are the same as codes, for the language on screen.
 */
export type V1Migration =
  | { ok: true; record: NoteRecord; flags: string[]; flagCodes: MigrationFlag[] }
  | { ok: false; message: string; why: MigrationFailure; partial: Record<string, unknown>; flags: string[]; flagCodes: MigrationFlag[] };

/**
 * Turn a version-1 record into a version-2 record. What is valid is carried over; a season or hazard
 * that cannot be (an unknown season or rail word, a hazard that is not text) is left out and named in
 * `flags`, for the trainer to look at, rather than losing the whole note. A record that still cannot
 * be carried over (a missing name, a 90 ‰ grade) is a failure with the reason, the note as far as it
 * could be carried over (`partial`, for the trainer to put right in the editor) and the flags; it is
 * left in place and reported when read.
 */
export function migrateV1Record(raw: unknown): V1Migration {
  if (!raw || typeof raw !== "object") {
    const why: MigrationFailure = { code: "migrationNotObject" };
    return { ok: false, message: noteRecordEnglish.migration(why), why, partial: {}, flags: [], flagCodes: [] };
  }
  const v1 = raw as Partial<NoteRecordV1>;
  const p = v1.profile;
  const flagCodes: MigrationFlag[] = [];
  const hazards = Array.isArray(v1.hazards) ? v1.hazards : [];
  hazards.forEach((h, k) => {
    if (typeof h !== "string") flagCodes.push({ code: "hazardNotText", number: k + 1 });
  });
  const rail = v1.rail && typeof v1.rail === "object" ? (v1.rail as Record<string, unknown>) : {};
  for (const [season, word] of Object.entries(rail)) {
    if (!(SEASON_ORDER as readonly string[]).includes(season)) flagCodes.push({ code: "seasonUnknown", season: JSON.stringify(season) });
    else if (typeof word !== "string" || !RAIL_WORDS.includes(word)) flagCodes.push({ code: "railUnknown", season, word: String(JSON.stringify(word)), rails: RAIL_WORDS.join(", ") });
  }
  const flags = flagCodes.map(noteRecordEnglish.flag);
  const candidate = {
    schema: "taut/location@1",
    id: v1.id,
    name: v1.title,
    ...(v1.line ? { line: v1.line } : {}),
    ...(v1.direction ? { direction: v1.direction } : {}),
    ...(v1.demo ? { illustrative: true } : {}),
    segments: Array.isArray(p?.segments)
      ? p.segments.map((s) => ({ from_m: s?.start_m, length_m: s?.length_m, gradient_permille: s?.grade_permille, curveRadius_m: s?.radius_m }))
      : undefined,
    frontAt_m: p?.front_m,
    clearAhead_m: p?.clear_m,
    ...(v1.speedLimit_kmh !== undefined ? { speedLimit_kmh: v1.speedLimit_kmh } : {}),
    hazards: hazards.filter((h): h is string => typeof h === "string" && h.trim() !== "").map((h) => ({ kind: "other", note: h.trim() })),
    seasons: SEASON_ORDER.filter((s) => typeof rail[s] === "string" && RAIL_WORDS.includes(rail[s] as string)).map((s) => ({ season: s, rail: rail[s] })),
    practice: typeof v1.practice === "string" ? v1.practice : "",
    revisions: [{ date: v1.revised, initials: v1.by, change: V1_CARRIED_OVER }],
  };
  const parsed = parseLocationNote(candidate);
  if (!parsed.ok) {
    const why: MigrationFailure = { code: "noteInvalid", issues: parsed.issues };
    return { ok: false, message: noteRecordEnglish.migration(why), why, partial: candidate, flags, flagCodes };
  }
  const savedAt = typeof v1.revised === "string" ? `${v1.revised}T00:00:00.000Z` : new Date(0).toISOString();
  return { ok: true, record: { id: parsed.value.id, origin: v1.demo ? "demo" : "mine", savedAt, rev: 1, ...(flags.length > 0 ? { flags, flagCodes } : {}), note: parsed.value }, flags, flagCodes };
}
