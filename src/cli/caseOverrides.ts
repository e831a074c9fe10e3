/**
 * What changes between departures, given on the command line instead of in a copy of the case file:
 * `--rail R`, `--sand` / `--no-sand`, `--mass T` (trailing mass, tonnes) and `--grade PERMILLE` (the
 * gradient of a uniform location). They are written into the case's JSON before it is validated, so a value
 * out of range gets the same message, with the field's path, as it would in the file.
 */
import { RAIL_CONDITIONS, type RailCondition } from "../core/physics/types.js";
import { cli } from "../i18n/en/cli.js";
import { cliTr, cliWords } from "./lang.js";
import { asGiven } from "./table.js";
import { errorWords, InputError } from "./errors.js";

export interface CaseOverrides {
  rail?: string;
  sand?: boolean;
  trailingMass_t?: number;
  gradient_permille?: number;
}

/** The option declarations (node:util parseArgs) for the overrides. */
export const OVERRIDE_OPTIONS = {
  rail: { type: "string" },
  sand: { type: "boolean" },
  "no-sand": { type: "boolean" },
  mass: { type: "string" },
  grade: { type: "string" },
} as const;

/** Help lines for the overrides. */
export const OVERRIDE_HELP = [
  "Overrides (what changes between departures; the case file is left as it is):",
  `  --rail R            rail condition: ${RAIL_CONDITIONS.join(", ")}`,
  "  --sand, --no-sand   sand on or off",
  "  --mass T            trailing mass, tonnes",
  "  --grade PERMILLE    gradient under the whole train, per mille (positive rises ahead); a case that",
  "                      stands on a track profile or a location note becomes a uniform grade with the",
  "                      profile's sharpest curve under the train and its distance clear ahead",
];

function numberOption(v: unknown, what: "massNeeded" | "gradeNeeded"): number | undefined {
  if (v === undefined) return undefined;
  const text = String(v).trim();
  const n = text === "" ? Number.NaN : Number(text);
  if (!Number.isFinite(n)) throw new InputError(errorWords()(what, { value: `"${String(v)}"` }));
  return n;
}

/** Read the overrides from parsed options; bad input for a value that cannot be one. */
export function overridesFrom(values: Record<string, unknown>): CaseOverrides {
  const o: CaseOverrides = {};
  if (values.rail !== undefined) {
    const rail = String(values.rail);
    if (!(RAIL_CONDITIONS as readonly string[]).includes(rail)) throw new InputError(errorWords()("railValue", { list: RAIL_CONDITIONS.join(", "), value: `"${rail}"` }));
    o.rail = rail;
  }
  if (values.sand && values["no-sand"]) throw new InputError(errorWords()("sandBoth"));
  if (values.sand) o.sand = true;
  if (values["no-sand"]) o.sand = false;
  const mass = numberOption(values.mass, "massNeeded");
  if (mass !== undefined) o.trailingMass_t = mass;
  const grade = numberOption(values.grade, "gradeNeeded");
  if (grade !== undefined) o.gradient_permille = grade;
  return o;
}

export function hasOverrides(o: CaseOverrides): boolean {
  return Object.keys(o).length > 0;
}

const isObject = (x: unknown): x is Record<string, unknown> => x !== null && typeof x === "object" && !Array.isArray(x);

/** A track profile as a case or a note gives it. */
export interface ProfileLocation {
  segments: ReadonlyArray<{ from_m: number; length_m: number; gradient_permille: number; curveRadius_m: number }>;
  frontAt_m: number;
  clearAhead_m: number;
}

/**
 * A uniform location in place of a profile: the given gradient, the sharpest curve of the segments under
 * the standing train (from its front back over its length; the curve resistance is then at least what the
 * profile gives), and the profile's distance clear ahead.
 */
export function uniformFromProfile(p: ProfileLocation, trainLengthM: number, gradient_permille: number): { gradient_permille: number; curveRadius_m: number; clearAhead_m: number } {
  const rear = p.frontAt_m - Math.max(0, trainLengthM);
  let sharpest = 0;
  for (const s of p.segments) {
    const under = s.from_m < p.frontAt_m && s.from_m + s.length_m > rear;
    if (under && s.curveRadius_m > 0 && (sharpest === 0 || s.curveRadius_m < sharpest)) sharpest = s.curveRadius_m;
  }
  return { gradient_permille, curveRadius_m: sharpest, clearAhead_m: p.clearAhead_m };
}

/**
 * A copy of the case's JSON with the overrides written in (the input is not changed). A field the case
 * lacks is added, so validation names what else is missing. `note` finds a location note by id (for
 * --grade on a case that names one).
 */
export function applyOverrides(
  raw: unknown,
  o: CaseOverrides,
  note: (id: string) => ProfileLocation | undefined = () => undefined,
  wagonType: (id: string) => { tare_t: number; length_m: number } | undefined = () => undefined,
): unknown {
  if (!hasOverrides(o) || !isObject(raw)) return raw;
  const out: Record<string, unknown> = { ...raw };
  if (o.rail !== undefined || o.sand !== undefined) {
    const conditions = isObject(raw.conditions) ? { ...raw.conditions } : {};
    if (o.rail !== undefined) conditions.rail = o.rail;
    if (o.sand !== undefined) conditions.sand = o.sand;
    out.conditions = conditions;
  }
  if (o.trailingMass_t !== undefined) {
    const train = isObject(raw.train) ? raw.train : {};
    const groups = Array.isArray(train.groups) ? (train.groups as unknown[]).filter(isObject) : null;
    // A mixed train: every group's load above tare scaled in proportion, as the largest-mass search does.
    out.train = groups ? { ...train, groups: scaledGroups(groups, o.trailingMass_t, wagonType) } : { ...train, trailingMass_t: o.trailingMass_t };
  }
  if (o.gradient_permille !== undefined) {
    const loc = raw.location;
    const lengthM = isObject(out.train) ? trainLengthM(out.train, wagonType) : 0;
    if (typeof loc === "string") {
      const n = note(loc);
      if (!n) throw new InputError(errorWords()("gradeNoNote", { id: `"${loc}"` }));
      out.location = uniformFromProfile(n, lengthM, o.gradient_permille);
    } else if (isObject(loc) && Array.isArray(loc.segments)) {
      out.location = uniformFromProfile(loc as unknown as ProfileLocation, lengthM, o.gradient_permille);
    } else {
      out.location = { ...(isObject(loc) ? loc : {}), gradient_permille: o.gradient_permille };
    }
  }
  return out;
}

/** The groups' masses scaled to `totalT`: the load above tare in proportion (below the tare, all in proportion). */
function scaledGroups(groups: Array<Record<string, unknown>>, totalT: number, wagonType: (id: string) => { tare_t: number } | undefined): Array<Record<string, unknown>> {
  const mass = groups.map((g) => (typeof g.mass_t === "number" ? g.mass_t : 0));
  const tare = groups.map((g, k) => Math.min(mass[k]!, (typeof g.wagonType === "string" ? (wagonType(g.wagonType)?.tare_t ?? 0) : 0) * (typeof g.wagons === "number" ? g.wagons : 0)));
  const given = mass.reduce((a, x) => a + x, 0);
  const tareSum = tare.reduce((a, x) => a + x, 0);
  const load = given - tareSum;
  const scaled =
    totalT >= tareSum && load > 0
      ? mass.map((m, k) => tare[k]! + ((totalT - tareSum) / load) * (m - tare[k]!))
      : mass.map((m) => (given > 0 ? (m * totalT) / given : 0));
  return groups.map((g, k) => ({ ...g, mass_t: scaled[k]! }));
}

/** Length over the wagons of a train in a file: its `length_m`, or its groups' wagons × their types' lengths, m. */
function trainLengthM(train: Record<string, unknown>, wagonType: (id: string) => { length_m: number } | undefined): number {
  if (typeof train.length_m === "number") return train.length_m;
  if (!Array.isArray(train.groups)) return 0;
  return (train.groups as unknown[]).filter(isObject).reduce((a, g) => a + (typeof g.wagons === "number" ? g.wagons : 0) * (typeof g.wagonType === "string" ? (wagonType(g.wagonType)?.length_m ?? 0) : 0), 0);
}

/** The overrides in words, for the readable output: "rail wet, no sand, 1,500 t, grade 8 ‰". */
export function describeOverrides(o: CaseOverrides): string {
  const t = cliTr().ns(cli);
  const parts: string[] = [];
  if (o.rail !== undefined) parts.push(t("overrideRail", { rail: (RAIL_CONDITIONS as readonly string[]).includes(o.rail) ? cliWords().railInline(o.rail as RailCondition) : o.rail }));
  if (o.sand !== undefined) parts.push(t(o.sand ? "overrideSand" : "overrideNoSand"));
  if (o.trailingMass_t !== undefined) parts.push(t("overrideMass", { mass: asGiven(o.trailingMass_t) }));
  if (o.gradient_permille !== undefined) parts.push(t("overrideGrade", { grade: asGiven(o.gradient_permille) }));
  return parts.join(", ");
}
