/**
 * A location note (`taut/location@1`) from a stretch of railML line: its segments, where the front
 * stands, the distance taken ahead as the clear distance, the speed limit, and (when asked) the signals,
 * points and other places met as hazards. Checked with the note schema, so a radius or gradient the
 * notes do not accept (a yard curve under 80 m, a rack section) comes back as a field issue.
 */
import { parseLocationNote } from "../parse.js";
import type { ParseResult } from "../issues.js";
import type { LocationNoteFile, ReferenceTrainFile } from "../schemas.js";
import type { Stretch } from "./stretch.js";

export interface RailmlNoteMeta {
  id: string;
  name: string;
  line?: string;
  /** The direction of travel in the trainer's words (e.g. "up, towards increasing pos"). */
  direction?: string;
  standing?: string;
  referenceTrain?: ReferenceTrainFile;
  /** The revision entry: date YYYY-MM-DD and initials. */
  date: string;
  initials: string;
  /** The file's name, for the revision entry. */
  source: string;
  /** Offer the stretch's signals, points and other places as hazards. */
  hazards: boolean;
}

/** The note, in the file form, before the schema checks it. */
export function noteFromStretch(s: Stretch, meta: RailmlNoteMeta): Record<string, unknown> {
  const note: Record<string, unknown> = {
    schema: "taut/location@1",
    id: meta.id,
    name: meta.name,
  };
  if (meta.line) note.line = meta.line;
  if (meta.direction) note.direction = meta.direction;
  note.standing = meta.standing ?? `Front at ${s.frontWords} (from railML).`.slice(0, 400);
  if (meta.referenceTrain) note.referenceTrain = meta.referenceTrain;
  note.segments = s.segments.map((g) => ({ ...g }));
  note.frontAt_m = s.frontAt_m;
  note.clearAhead_m = s.aheadM;
  if (s.speedLimit_kmh !== undefined) note.speedLimit_kmh = s.speedLimit_kmh;
  note.hazards = meta.hazards ? s.hazards.map((h) => ({ kind: h.kind, at_m: h.at_m, note: h.note.slice(0, 400) })) : [];
  note.seasons = [];
  note.practice = "";
  const change = `Imported from railML (${meta.source}): ${s.segments.length} segment(s), ${s.behindM} m behind and ${s.aheadM} m ahead of the front.`;
  note.revisions = [{ date: meta.date, initials: meta.initials, change: change.slice(0, 400) }];
  return note;
}

/** The note, checked by the note schema. */
export function railmlNote(s: Stretch, meta: RailmlNoteMeta): ParseResult<LocationNoteFile> {
  return parseLocationNote(noteFromStretch(s, meta));
}

/** A note id (lower-case letters, digits, "-") made from a name. */
export function noteIdFrom(name: string): string {
  return (
    name
      .normalize("NFKD")
      .replace(/[\u0300-\u036f]/g, "")
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, "-")
      .replace(/^-+|-+$/g, "")
      .slice(0, 60)
      .replace(/-+$/, "") || "railml-note"
  );
}
