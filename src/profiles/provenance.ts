/**
 * What a printed or exported set of figures was computed from, so that an old printout can be told from
 * a current one: the program version, the inputs in words, and a short fingerprint of every input that
 * changes a figure. Pure (no clock, no DOM): the caller passes the version and the date.
 *
 * The fingerprint itself is in fingerprint.ts.
 */
export { canonicalJson, fingerprint, fnv1a32 } from "./fingerprint.js";
import { fingerprint } from "./fingerprint.js";
import type { AdhesionTable, RailCondition } from "../core/physics/types.js";
import { RAIL_CONDITIONS } from "../core/physics/types.js";
import type { Library } from "./library.js";
import { latestRevision } from "./notes.js";
import { referenceCaseFile, referenceOf } from "./referenceTrain.js";
import type { LocationNoteFile, ReferenceTrainFile, TrainPresetFile } from "./schemas.js";

/** The rail-condition table in a line: median adhesion at standstill without / with sand, per condition. */
export function railDefaultsLine(table: AdhesionTable): string {
  const two = (x: number) => x.toFixed(2);
  return `adhesion at standstill without / with sand: ${RAIL_CONDITIONS.map((r: RailCondition) => `${r} ${two(table[r].median)} / ${two(table[r].sanded)}`).join(", ")}`;
}

/**
 * Everything a note's card figures depend on: the profile and where the train stands, the speed limit,
 * the reference train resolved to its start case (preset train, locomotive set, temperature), the
 * locomotive profiles it names, the rail-condition table and the program version. Not the note's name,
 * hazards, practice or revisions: they change no figure (the revision is printed beside the fingerprint).
 */
export function noteFigureInputs(
  note: Pick<LocationNoteFile, "segments" | "frontAt_m" | "clearAhead_m" | "speedLimit_kmh" | "referenceTrain">,
  presets: readonly TrainPresetFile[],
  lib: Library,
  version: string,
  ref: ReferenceTrainFile = referenceOf(note, presets),
): unknown {
  const file = referenceCaseFile(note, presets, ref);
  const locos = file.ok ? file.value.locomotives.map((l) => (typeof l.profile === "string" ? (lib.locomotives.get(l.profile)?.file ?? l.profile) : l.profile)) : [];
  return {
    version,
    segments: note.segments.map((s) => [s.from_m, s.length_m, s.gradient_permille, s.curveRadius_m]),
    frontAt_m: note.frontAt_m,
    clearAhead_m: note.clearAhead_m,
    speedLimit_kmh: note.speedLimit_kmh ?? null,
    reference: ref,
    referenceCase: file.ok ? file.value : null,
    locomotives: locos,
    rail: lib.adhesion,
  };
}

/** The provenance a printed card carries. */
export interface CardProvenance {
  /** How many revisions the note has (its revision number). */
  revision: number;
  /** Date of its latest revision, YYYY-MM-DD. */
  revisionDate: string;
  version: string;
  /** The rail-condition defaults in a line (English, as the command line prints it). */
  rail: string;
  /** The rail-condition table itself, for a line in another language. */
  adhesion: AdhesionTable;
  /** Fingerprint of every input of the card's figures ("xxxx-xxxx"). */
  fingerprint: string;
}

export function cardProvenance(note: LocationNoteFile, presets: readonly TrainPresetFile[], lib: Library, version: string): CardProvenance {
  return {
    revision: note.revisions.length,
    revisionDate: latestRevision(note).date,
    version,
    rail: railDefaultsLine(lib.adhesion),
    adhesion: lib.adhesion,
    fingerprint: fingerprint(noteFigureInputs(note, presets, lib, version)),
  };
}
