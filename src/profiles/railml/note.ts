/**
 * A location note (`taut/location@1`) from a stretch of railML line: its segments, where the front
 * stands, the distance taken ahead as the clear distance, the speed limit, and (when asked) the signals,
 * points and other places met as hazards. Checked with the note schema, so a radius or gradient the
 * notes do not accept (a yard curve under 80 m, a rack section) comes back as a field issue. The words the
 * import writes into the note (where the front stands, the direction, the hazards' notes, the revision
 * entry) are in the translator's language, the trainer's: the note is read in it. English by default.
 */
import { parseLocationNote } from "../parse.js";
import type { ParseResult } from "../issues.js";
import type { LocationNoteFile, ReferenceTrainFile } from "../schemas.js";
import type { Translator } from "../../i18n/translator.js";
import type { Stretch, TravelDirection } from "./stretch.js";
import { counted, given, railmlEnglishTranslator, railmlWords, say } from "./text.js";

export interface RailmlNoteMeta {
  id: string;
  name: string;
  line?: string;
  /** The direction of travel in the trainer's words (`railmlDirection` words the railML one). */
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

/** The direction of travel as a note says it, with the railML dir it stands for. */
export function railmlDirection(dir: TravelDirection, tr: Translator = railmlEnglishTranslator): string {
  return railmlWords(tr, say("noteDirection", { way: say(dir === "up" ? "wayUp" : "wayDown"), dir }));
}

/** Where the front stands, as the note's "standing" says it. */
export function railmlStanding(s: Stretch, tr: Translator = railmlEnglishTranslator): string {
  return railmlWords(tr, say("noteStanding", { front: s.frontText })).slice(0, 400);
}

/** The stretch's hazards as the note lists them, their notes in the translator's language. */
export function railmlHazards(s: Stretch, tr: Translator = railmlEnglishTranslator): Array<{ kind: Stretch["hazards"][number]["kind"]; at_m: number; note: string }> {
  return s.hazards.map((h) => ({ kind: h.kind, at_m: h.at_m, note: railmlWords(tr, h.text).slice(0, 400) }));
}

/** The note, in the file form, before the schema checks it. */
export function noteFromStretch(s: Stretch, meta: RailmlNoteMeta, tr: Translator = railmlEnglishTranslator): Record<string, unknown> {
  const note: Record<string, unknown> = {
    schema: "taut/location@1",
    id: meta.id,
    name: meta.name,
  };
  if (meta.line) note.line = meta.line;
  if (meta.direction) note.direction = meta.direction;
  note.standing = meta.standing ?? railmlStanding(s, tr);
  if (meta.referenceTrain) note.referenceTrain = meta.referenceTrain;
  note.segments = s.segments.map((g) => ({ ...g }));
  note.frontAt_m = s.frontAt_m;
  note.clearAhead_m = s.aheadM;
  if (s.speedLimit_kmh !== undefined) note.speedLimit_kmh = s.speedLimit_kmh;
  note.hazards = meta.hazards ? railmlHazards(s, tr) : [];
  note.seasons = [];
  note.practice = "";
  const change = railmlWords(tr, say("noteChange", { file: meta.source, count: counted(s.segments.length), behind: given(s.behindM), ahead: given(s.aheadM) }));
  note.revisions = [{ date: meta.date, initials: meta.initials, change: change.slice(0, 400) }];
  return note;
}

/** The note, checked by the note schema. */
export function railmlNote(s: Stretch, meta: RailmlNoteMeta, tr: Translator = railmlEnglishTranslator): ParseResult<LocationNoteFile> {
  return parseLocationNote(noteFromStretch(s, meta, tr));
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
