/**
 * The boundary: unknown JSON in, typed SI values or field issues out. Every file kind has one
 * `parseX` function; start cases are also resolved against a library of named profiles.
 */
import { buildConsist } from "../core/train/consist.js";
import { DEFAULT_SETTINGS, type LocoGroup, type LocoPosition, type StartCase, type WagonGroup } from "../core/train/types.js";
import { groupTotals } from "../core/train/groups.js";
import type { WagonSpec } from "../core/physics/types.js";
import { kmhToMps, kNToN, tonnesToKg } from "../core/physics/units.js";
import { uniformTrack } from "../core/physics/track.js";
import { genericWagon, locationFromNote, locomotiveFromFile } from "./convert.js";
import { jsonSyntaxProblem } from "./jsonSyntax.js";
import { quoted } from "./text.js";
import { coded, fail, fromZodIssues, ok, type FieldIssue, type ParseResult, type RawIssue } from "./issues.js";
import type { Library } from "./library.js";
import {
  locationNoteSchema,
  locomotiveFileSchema,
  railConditionsFileSchema,
  startCaseSchema,
  trainPresetSchema,
  wagonFileSchema,
  type LocationNoteFile,
  type StartCaseFile,
} from "./schemas.js";

interface SafeParser<T> {
  safeParse(data: unknown, params?: { reportInput?: boolean }): { success: true; data: T } | { success: false; error: { issues: ReadonlyArray<unknown> } };
}

/** Validate `data` against a schema; issues name the field and the rule. */
export function validate<T>(schema: SafeParser<T>, data: unknown): ParseResult<T> {
  const r = schema.safeParse(data, { reportInput: true });
  if (r.success) return ok(r.data);
  return fail(fromZodIssues(r.error.issues as ReadonlyArray<RawIssue>));
}

/**
 * Parse JSON text, reporting a syntax error as an issue rather than throwing. A byte-order mark before the
 * JSON is skipped (editors on some systems write one). The message says where and what, never the text
 * itself: the file may not be the one the user meant.
 */
export function parseJsonText(text: string): ParseResult<unknown> {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  try {
    return ok(JSON.parse(body) as unknown);
  } catch {
    if (body.trim() === "") return fail([coded("", { code: "jsonEmpty" })]);
    const p = jsonSyntaxProblem(body);
    return fail([coded("", p ? { code: "jsonSyntax", figures: { problem: p.what, line: p.line, column: p.column } } : { code: "jsonInvalid" })]);
  }
}

/** A file kind for a message: quoted, with anything unsafe in it escaped. */
export function kindText(kind: string): string {
  return quoted(kind, 60);
}

/** Which kind of Taut file this is, from its `schema` field. */
export function fileKind(data: unknown): string | undefined {
  if (data && typeof data === "object" && "schema" in data && typeof (data as { schema: unknown }).schema === "string") return (data as { schema: string }).schema;
  return undefined;
}

export const parseLocomotiveFile = (d: unknown) => validate(locomotiveFileSchema, d);
export const parseWagonFile = (d: unknown) => validate(wagonFileSchema, d);
export const parseRailConditionsFile = (d: unknown) => validate(railConditionsFileSchema, d);
export const parseLocationNote = (d: unknown) => validate(locationNoteSchema, d);
export const parseTrainPreset = (d: unknown) => validate(trainPresetSchema, d);
export const parseStartCaseFile = (d: unknown) => validate(startCaseSchema, d);

/** Validate a start case and resolve it against the library into the core's SI form. */
export function parseStartCase(data: unknown, lib: Library): ParseResult<StartCase> {
  const parsed = parseStartCaseFile(data);
  if (!parsed.ok) return parsed;
  return resolveStartCase(parsed.value, lib);
}

/** Turn a validated start-case file into the core's StartCase, checking references and fit. */
export function resolveStartCase(f: StartCaseFile, lib: Library): ParseResult<StartCase> {
  const issues: FieldIssue[] = [];
  const groups: LocoGroup[] = [];
  f.locomotives.forEach((entry, k) => {
    let spec;
    if (typeof entry.profile === "string") {
      const found = lib.locomotives.get(entry.profile);
      if (!found) {
        issues.push(coded(`locomotives[${k}].profile`, { code: "unknownLocomotive", figures: { id: entry.profile, known: [...lib.locomotives.keys()].join(", ") } }));
        return;
      }
      spec = found.spec;
    } else spec = locomotiveFromFile(entry.profile);
    const position: LocoPosition = entry.position;
    if (typeof position === "object" && position.afterWagon >= f.train.wagons) {
      issues.push(coded(`locomotives[${k}].position.afterWagon`, { code: "afterWagon", figures: { wagons: f.train.wagons, value: position.afterWagon } }));
    }
    groups.push({ spec, count: entry.count, position, ...(entry.control !== undefined ? { control: entry.control } : {}) });
  });

  const wagonGroups: WagonGroup[] = [];
  (f.train.groups ?? []).forEach((g, k) => {
    const w = lib.wagons.get(g.wagonType);
    if (!w) issues.push(coded(`train.groups[${k}].wagonType`, { code: "unknownWagonType", figures: { id: g.wagonType, known: [...lib.wagons.keys()].join(", ") } }));
    else wagonGroups.push({ wagons: g.wagons, wagon: w, massKg: tonnesToKg(g.mass_t) });
  });
  const totals = f.train.groups ? groupTotals(wagonGroups) : null;
  const lengthM = totals ? totals.lengthM : (f.train.length_m ?? 0);
  let wagon: WagonSpec = wagonGroups[0]?.wagon ?? genericWagon(f.train.coupling ?? "knuckle", lengthM / f.train.wagons);
  if (f.train.wagonType !== undefined && !f.train.groups) {
    const w = lib.wagons.get(f.train.wagonType);
    if (!w) issues.push(coded("train.wagonType", { code: "unknownWagonType", figures: { id: f.train.wagonType, known: [...lib.wagons.keys()].join(", ") } }));
    else wagon = { ...w, lengthM: lengthM / f.train.wagons };
  }

  let locNote: Pick<LocationNoteFile, "segments" | "frontAt_m" | "clearAhead_m"> | undefined;
  let location: StartCase["location"] | undefined;
  if (typeof f.location === "string") {
    locNote = lib.locations.get(f.location);
    const known = [...lib.locations.keys()].join(", ");
    if (!locNote) issues.push(coded("location", known ? { code: "unknownLocation", figures: { id: f.location, known } } : { code: "unknownLocationNone", figures: { id: f.location } }));
    else location = locationFromNote(locNote);
  } else if ("segments" in f.location) {
    locNote = f.location;
    location = locationFromNote(f.location);
  } else {
    location = { track: uniformTrack(f.location.gradient_permille, f.location.curveRadius_m), frontAtM: 0, clearAheadM: f.location.clearAhead_m };
  }
  if (issues.length > 0 || !location) return fail(issues);

  const c: StartCase = {
    locomotives: groups,
    train: {
      trailingMassKg: tonnesToKg(f.train.trailingMass_t),
      wagons: f.train.wagons,
      lengthM,
      couplerSlackM: f.train.couplerSlack_mm / 1000,
      bearing: f.train.bearing,
      couplerLimitN: kNToN(f.train.couplerLimit_kN),
      coupling: f.train.coupling ?? wagon.coupling,
      wagon,
      slackState: f.train.slackState,
      ...(f.train.groups ? { groups: wagonGroups } : {}),
      ...(f.train.couplerBuffLimit_kN !== undefined ? { couplerBuffLimitN: kNToN(f.train.couplerBuffLimit_kN) } : {}),
    },
    location,
    conditions: { rail: f.conditions.rail, sand: f.conditions.sand, temperatureC: f.conditions.temperature_C },
    target: "speed_kmh" in f.target ? { kind: "speed", speedMps: kmhToMps(f.target.speed_kmh) } : { kind: "distance", distanceM: f.target.distance_m },
    adhesion: lib.adhesion,
    settings: {
      ...DEFAULT_SETTINGS,
      ...(f.settings?.couplerSafetyFactor !== undefined ? { couplerSafetyFactor: f.settings.couplerSafetyFactor } : {}),
      ...(f.settings?.slipRiskThreshold !== undefined ? { slipRiskThreshold: f.settings.slipRiskThreshold } : {}),
      ...(f.settings?.marginalSlipRisk !== undefined ? { marginalSlipRisk: f.settings.marginalSlipRisk } : {}),
      ...(f.settings?.maxDividedParts !== undefined ? { maxDividedParts: f.settings.maxDividedParts } : {}),
    },
  };
  if (locNote) {
    const fit = trainFitIssue(c, locNote);
    if (fit) return fail([fit]);
  }
  return ok(c);
}

/** The train must stand wholly on the profile it is given. */
function trainFitIssue(c: StartCase, note: Pick<LocationNoteFile, "segments" | "frontAt_m">): FieldIssue | undefined {
  const first = note.segments[0]!;
  const last = note.segments[note.segments.length - 1]!;
  const lengthM = buildConsist(c).lengthM;
  const rear = note.frontAt_m - lengthM;
  const end = last.from_m + last.length_m;
  if (rear < first.from_m - 1e-6) {
    return coded("location.frontAt_m", { code: "rearBeforeProfile", figures: { length: Math.round(lengthM), rear: Math.round(rear), start: first.from_m, unit: "m" } });
  }
  if (note.frontAt_m > end + 1e-6) {
    return coded("location.frontAt_m", { code: "beyondProfile", figures: { end, unit: "m" } });
  }
  return undefined;
}
