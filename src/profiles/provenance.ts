/**
 * What a printed or exported set of figures was computed from, so that an old printout can be told from
 * a current one: the program version, the inputs in words, and a short fingerprint of every input that
 * changes a figure. Pure (no clock, no DOM): the caller passes the version and the date.
 *
 * The fingerprint is FNV-1a (32 bit) over canonical JSON of the inputs (keys sorted), written as two groups
 * of four hex digits. It is not a security measure — anyone can make a card with any fingerprint — only a
 * quick way for two people to see that two cards were worked out from the same things.
 */
import type { AdhesionTable, RailCondition } from "../core/physics/types.js";
import { RAIL_CONDITIONS } from "../core/physics/types.js";
import type { Library } from "./library.js";
import { latestRevision } from "./notes.js";
import { referenceCaseFile, referenceOf } from "./referenceTrain.js";
import type { LocationNoteFile, ReferenceTrainFile, TrainPresetFile } from "./schemas.js";

const FNV_OFFSET_BASIS_32 = 0x811c9dc5;
const FNV_PRIME_32 = 0x01000193;

/** The UTF-8 bytes of a string (TextEncoder is not in the core's ES2022 library, so by hand). */
function utf8(text: string): number[] {
  const out: number[] = [];
  for (const ch of text) {
    const c = ch.codePointAt(0)!;
    if (c < 0x80) out.push(c);
    else if (c < 0x800) out.push(0xc0 | (c >> 6), 0x80 | (c & 63));
    else if (c < 0x10000) out.push(0xe0 | (c >> 12), 0x80 | ((c >> 6) & 63), 0x80 | (c & 63));
    else out.push(0xf0 | (c >> 18), 0x80 | ((c >> 12) & 63), 0x80 | ((c >> 6) & 63), 0x80 | (c & 63));
  }
  return out;
}

/**
 * FNV-1a, 32 bit, over the UTF-8 bytes of `text`: for each byte, xor then multiply by the FNV prime
 * (Fowler, Noll, Vo; the algorithm and its offset basis and prime as in Eastlake et al., "The FNV
 * Non-Cryptographic Hash Algorithm", IETF draft-eastlake-fnv).
 */
export function fnv1a32(text: string): number {
  let h = FNV_OFFSET_BASIS_32;
  for (const b of utf8(text)) {
    h ^= b;
    h = Math.imul(h, FNV_PRIME_32) >>> 0;
  }
  return h >>> 0;
}

/** JSON with every object's keys sorted, so equal inputs give equal text whatever order they were built in. */
export function canonicalJson(value: unknown): string {
  return JSON.stringify(value, (_k, v: unknown) => {
    if (v && typeof v === "object" && !Array.isArray(v)) {
      return Object.fromEntries(Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)));
    }
    return v;
  });
}

/** A short fingerprint of any inputs: eight hex digits as "xxxx-xxxx". */
export function fingerprint(inputs: unknown): string {
  const hex = fnv1a32(canonicalJson(inputs)).toString(16).padStart(8, "0");
  return `${hex.slice(0, 4)}-${hex.slice(4)}`;
}

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
  /** The rail-condition defaults in a line. */
  rail: string;
  /** Fingerprint of every input of the card's figures ("xxxx-xxxx"). */
  fingerprint: string;
}

export function cardProvenance(note: LocationNoteFile, presets: readonly TrainPresetFile[], lib: Library, version: string): CardProvenance {
  return {
    revision: note.revisions.length,
    revisionDate: latestRevision(note).date,
    version,
    rail: railDefaultsLine(lib.adhesion),
    fingerprint: fingerprint(noteFigureInputs(note, presets, lib, version)),
  };
}
