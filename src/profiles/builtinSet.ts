/**
 * The built-in profiles once read: the files as their schemas give them back, and the library made from
 * them. Kept apart from the reading (builtin.ts, which checks the shipped JSON with the schemas) so the app
 * can take the files already checked at build time and leave the schema code out of its first load.
 */
import { adhesionFromFile, locomotiveFromFile, wagonFromFile } from "./convert.js";
import type { Library } from "./library.js";
import type { LocationNoteFile, LocomotiveFile, RailConditionsFile, StartCaseFile, TrainPresetFile, WagonFile } from "./schemas.js";

/** The id of the case `taut plan --demo` and the app open with. */
export const DEMO_CASE_ID = "demo-aggregate-ashvale";

export interface BuiltinFiles {
  locomotives: LocomotiveFile[];
  wagons: WagonFile[];
  railConditions: RailConditionsFile;
  locations: LocationNoteFile[];
  trains: TrainPresetFile[];
  cases: StartCaseFile[];
  /** The demo case files as written (before their schema filled defaults), as a user would write them. */
  caseJson: unknown[];
}

/** The library of built-in profiles. */
export function libraryOf(f: BuiltinFiles): Library {
  return {
    locomotives: new Map(f.locomotives.map((l) => [l.id, { spec: locomotiveFromFile(l), file: l }])),
    wagons: new Map(f.wagons.map((w) => [w.id, wagonFromFile(w)])),
    locations: new Map(f.locations.map((n) => [n.id, n])),
    adhesion: adhesionFromFile(f.railConditions),
    cases: new Map(f.cases.map((c, k) => [c.id ?? DEMO_CASE_ID, f.caseJson[k]])),
  };
}
