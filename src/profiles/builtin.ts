/**
 * The built-in profiles shipped in `profiles/`: illustrative locomotives, wagon types, the rail-condition
 * table, demo location notes, trains and start cases. Bundled into the app and read by the CLI.
 */
import loco4 from "../../profiles/locomotives/illustrative-4axle-1100.json" with { type: "json" };
import loco6a from "../../profiles/locomotives/illustrative-6axle-1800.json" with { type: "json" };
import loco6b from "../../profiles/locomotives/illustrative-6axle-3000.json" with { type: "json" };
import wagonLoaded from "../../profiles/wagons/bogie-hopper-loaded.json" with { type: "json" };
import wagonEmpty from "../../profiles/wagons/bogie-hopper-empty.json" with { type: "json" };
import wagonVan from "../../profiles/wagons/bogie-van-buffered.json" with { type: "json" };
import railConditions from "../../profiles/conditions/rail-conditions.json" with { type: "json" };
import locAshvale from "../../profiles/locations/ashvale-loop-up.json" with { type: "json" };
import locCinderfield from "../../profiles/locations/cinderfield-yard.json" with { type: "json" };
import locLantern from "../../profiles/locations/lantern-dip.json" with { type: "json" };
import trainAggregate from "../../profiles/trains/aggregate-1400.json" with { type: "json" };
import trainOre from "../../profiles/trains/ore-5200.json" with { type: "json" };
import trainGoods from "../../profiles/trains/goods-1100.json" with { type: "json" };
import caseAggregate from "../../profiles/cases/demo-aggregate-ashvale.json" with { type: "json" };
import caseOre from "../../profiles/cases/demo-ore-lantern.json" with { type: "json" };
import caseGoods from "../../profiles/cases/demo-goods-cinderfield.json" with { type: "json" };
import caseMixed from "../../profiles/cases/demo-mixed-ashvale.json" with { type: "json" };
import { DEMO_CASE_ID, libraryOf, type BuiltinFiles } from "./builtinSet.js";
import { formatIssues, type ParseResult } from "./issues.js";
import type { Library } from "./library.js";
import {
  parseLocationNote,
  parseLocomotiveFile,
  parseRailConditionsFile,
  parseStartCaseFile,
  parseTrainPreset,
  parseWagonFile,
} from "./parse.js";
import type { LocationNoteFile, RailConditionsFile, StartCaseFile, TrainPresetFile } from "./schemas.js";

export { DEMO_CASE_ID };

/** The built-in files are part of the program: an invalid one is a programming error. */
function must<T>(r: ParseResult<T>, what: string): T {
  if (!r.ok) throw new Error(`built-in ${what} is invalid:\n${formatIssues(r.issues)}`);
  return r.value;
}

const caseJson: unknown[] = [caseAggregate, caseOre, caseGoods, caseMixed];

/**
 * Every built-in file read with its schema. The app's build embeds this object as it is (src/app/
 * builtinProfiles.ts) instead of running the schemas at load.
 */
export const builtinFiles: BuiltinFiles = {
  locomotives: [loco4, loco6a, loco6b].map((f) => must(parseLocomotiveFile(f), `locomotive ${String(f.id)}`)),
  wagons: [wagonLoaded, wagonEmpty, wagonVan].map((f) => must(parseWagonFile(f), `wagon ${String(f.id)}`)),
  railConditions: must(parseRailConditionsFile(railConditions), "rail-condition table"),
  locations: [locAshvale, locCinderfield, locLantern].map((f) => must(parseLocationNote(f), `location ${String(f.id)}`)),
  trains: [trainAggregate, trainOre, trainGoods].map((f) => must(parseTrainPreset(f), `train ${String(f.id)}`)),
  cases: caseJson.map((f) => must(parseStartCaseFile(f), `case ${String((f as { id?: unknown }).id)}`)),
  caseJson,
};

/** The rail-condition table with its sources. */
export const builtinRailConditions: RailConditionsFile = builtinFiles.railConditions;
/** Demo location notes (illustrative). */
export const builtinLocations: LocationNoteFile[] = builtinFiles.locations;
/** Demo trains (illustrative). */
export const builtinTrains: TrainPresetFile[] = builtinFiles.trains;
/** Demo start cases (illustrative); the first is the built-in demo. */
export const builtinCases: StartCaseFile[] = builtinFiles.cases;
/** Raw demo case files, as a user would write them. */
export const builtinCaseJson: unknown[] = builtinFiles.caseJson;

/** The library of built-in profiles. */
export function builtinLibrary(): Library {
  return libraryOf(builtinFiles);
}
