/**
 * The reference train of a note: the train its drawing and its load table are worked out for (a
 * train preset, optionally another locomotive profile or count at the head). Built into a start case
 * on the note's own profile, resolved exactly as the command line resolves a case.
 */
import type { StartCase } from "../core/train/types.js";
import type { ParseResult } from "./issues.js";
import type { Library } from "./library.js";
import { resolveStartCase } from "./parse.js";
import { readerIssue } from "./readerIssues.js";
import type { LocationNoteFile, ReferenceTrainFile, StartCaseFile, TrainPresetFile } from "./schemas.js";

/** Air temperature a load table assumes when the note does not say, °C. */
export const DEFAULT_REFERENCE_TEMPERATURE_C = 10;
/** Target speed of the reference case, km/h: the load table asks whether the train starts, not how fast it runs. */
const REFERENCE_TARGET_KMH = 20;

/** The note's reference train, or the first preset when it names none. */
export function referenceOf(note: Pick<LocationNoteFile, "referenceTrain">, presets: readonly TrainPresetFile[]): ReferenceTrainFile {
  return note.referenceTrain ?? { train: presets[0]?.id ?? "" };
}

/** The locomotive set a reference stands for: the preset's, or the named profile × count at the head. */
export function referenceLocomotives(ref: ReferenceTrainFile, preset: TrainPresetFile): StartCaseFile["locomotives"] {
  if (ref.locomotive === undefined && ref.count === undefined) return preset.locomotives;
  const first = preset.locomotives[0]!;
  const profile = ref.locomotive ?? (typeof first.profile === "string" ? first.profile : first.profile.id);
  return [{ profile, count: ref.count ?? first.count, position: "head" }];
}

/** The start-case file for a note and its reference train (dry rail, no sand: the load table varies them). */
export function referenceCaseFile(
  note: Pick<LocationNoteFile, "segments" | "frontAt_m" | "clearAhead_m" | "speedLimit_kmh" | "referenceTrain">,
  presets: readonly TrainPresetFile[],
  ref: ReferenceTrainFile = referenceOf(note, presets),
): ParseResult<StartCaseFile> {
  const preset = presets.find((p) => p.id === ref.train);
  if (!preset) {
    return { ok: false, issues: [readerIssue("referenceTrain.train", { code: "unknownTrain", figures: { id: ref.train, known: presets.map((p) => p.id).join(", ") } })] };
  }
  return {
    ok: true,
    value: {
      schema: "taut/start-case@1",
      locomotives: referenceLocomotives(ref, preset),
      train: preset.train,
      location: { segments: note.segments, frontAt_m: note.frontAt_m, clearAhead_m: note.clearAhead_m },
      conditions: { rail: "dry", sand: false, temperature_C: ref.temperature_C ?? DEFAULT_REFERENCE_TEMPERATURE_C },
      target: { speed_kmh: Math.min(REFERENCE_TARGET_KMH, note.speedLimit_kmh ?? REFERENCE_TARGET_KMH) },
    },
  };
}

/** The reference start case in the core's form, or the issues that stop it (unknown train, train off the profile). */
export function referenceCase(
  note: Pick<LocationNoteFile, "segments" | "frontAt_m" | "clearAhead_m" | "speedLimit_kmh" | "referenceTrain">,
  presets: readonly TrainPresetFile[],
  lib: Library,
  ref?: ReferenceTrainFile,
): ParseResult<StartCase> {
  const f = referenceCaseFile(note, presets, ref);
  if (!f.ok) return f;
  return resolveStartCase(f.value, lib);
}

/** The reference train in a line: its preset's label and the locomotive set, e.g. "2 × Illustrative …". */
export interface ReferenceSummary {
  /** Whole length with the locomotives, m; NaN when the preset or a locomotive is unknown. */
  lengthM: number;
  trailingMassKg: number;
  trainLabel: string;
  locomotives: string;
}

/** Length, mass and wording of a reference train, without placing it anywhere. */
export function referenceSummary(ref: ReferenceTrainFile, presets: readonly TrainPresetFile[], lib: Library): ReferenceSummary {
  const preset = presets.find((p) => p.id === ref.train);
  if (!preset) return { lengthM: Number.NaN, trailingMassKg: Number.NaN, trainLabel: ref.train, locomotives: "" };
  let lengthM = preset.train.length_m ?? groupsLengthM(preset.train.groups ?? [], lib);
  const words: string[] = [];
  for (const g of referenceLocomotives(ref, preset)) {
    const id = typeof g.profile === "string" ? g.profile : g.profile.id;
    const loco = typeof g.profile === "string" ? lib.locomotives.get(g.profile)?.file : g.profile;
    lengthM += (loco?.length_m ?? Number.NaN) * g.count;
    const where = g.position === "head" ? "at the head" : g.position === "rear" ? "at the rear" : `after wagon ${g.position.afterWagon}`;
    words.push(`${g.count} × ${loco?.label ?? id} ${where}`);
  }
  return { lengthM, trailingMassKg: preset.train.trailingMass_t * 1000, trainLabel: preset.label, locomotives: words.join(", ") };
}

/** Length over the wagons of a grouped train from its wagon types, m (NaN where a type is unknown). */
function groupsLengthM(groups: ReadonlyArray<{ wagons: number; wagonType: string }>, lib: Library): number {
  return groups.reduce((s, g) => s + g.wagons * (lib.wagons.get(g.wagonType)?.lengthM ?? Number.NaN), 0);
}
