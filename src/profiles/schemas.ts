/**
 * File schemas (zod/mini, so the browser bundle stays small). Field names carry their units; values
 * are converted to SI in `convert.ts`. Shapes are a stable contract (INTERFACE.md): add, never rename.
 *
 * Every number has a physical range, said with its unit in the message: a value outside what any train,
 * locomotive or track has is a typing slip, and left through it makes the dynamics run for ever (a wagon
 * of a gram shrinks the integrator's step a millionfold) or overflow. The ranges are wide on purpose:
 * they hold every train the trade runs and refuse only what cannot be one (each range's reasoning is
 * beside it; "common practice" where no single source gives it).
 */
import * as z from "zod/mini";
import { RAIL_CONDITIONS } from "../core/physics/types.js";
import type { FieldCode } from "../i18n/en/fields.js";
import { englishField, type FieldFigures } from "./issueText.js";

/** A rule's message: its code and figures (rendered per language) with the English words they make. */
const rule = (code: FieldCode, figures?: FieldFigures) => ({ message: englishField({ code, ...(figures ? { figures } : {}) }), params: { code, ...(figures ? { figures } : {}) } });

const fraction = () => z.number().check(z.gt(0), z.lte(1));

/** A number from `min` to `max` (both allowed); the message gives the range and its unit. */
export const within = (min: number, max: number, unit = "") =>
  z.number().check(z.refine((x) => x >= min && x <= max, unit ? rule("rangeIn", { min, max, unit }) : rule("range", { min, max })));

/** What an id may hold, in words (the same rule for every kind of file). */
export const ID_RULE = englishField({ code: "idForm" });
const ID_FORM = /^[a-z0-9][a-z0-9._-]*$/;
const id = () => z.string().check(z.minLength(1), z.maxLength(80), z.refine((s) => ID_FORM.test(s), rule("idForm")));
const text = (max = 200) => z.string().check(z.minLength(1), z.maxLength(max));

/** Chainages and distances along the line: within 1000 km of the profile's origin (common practice: a line's kilometre posts). */
const chainage = () => within(-1_000_000, 1_000_000, "m");
/** Clear track ahead worth counting for a start: up to 100 km. */
const clearAhead = () => within(0, 100_000, "m");

/**
 * One wagon's gross mass, t: an empty two-axle wagon is near 8 t, the heaviest four-axle ore wagons carry
 * 40 t per axle (common practice). 5–150 t takes in both with room to spare.
 */
export const WAGON_MASS_T = { min: 5, max: 150 } as const;
/** One wagon's length over couplers, m: a short two-axle wagon is near 7 m, long car carriers some 35 m (common practice). */
export const WAGON_LENGTH_M = { min: 5, max: 40 } as const;
/** The most wagons a start case may have (the longest trains run to some 300). */
export const MAX_WAGONS = 400;
/** The most segments a track profile may have: one every 50 m over 100 km. */
export const MAX_SEGMENTS = 2000;

/** Three significant figures, for a figure quoted back in a message. */
const roundTo3 = (x: number): number => Number(x.toPrecision(3));

export const railConditionSchema = z.enum(RAIL_CONDITIONS);

/** Curve radius: 0 for straight track, otherwise at least 80 m. */
const curveRadius = () =>
  // No upper bound: a larger radius only comes nearer straight track, which is harmless.
  z.number().check(z.refine((r) => r === 0 || r >= 80, rule("straightOrRadius", { min: 80, unit: "m" })));

/** Gradient within what adhesion railways operate: ±60 ‰. */
const gradient = () => within(-60, 60, "‰");

// ---------------------------------------------------------------- locomotive profile
const notchFractions = () =>
  z.array(fraction()).check(
    z.minLength(1),
    z.refine((a) => a.every((x, i) => i === 0 || x >= a[i - 1]!), rule("notchOrder")),
    z.refine((a) => a[a.length - 1] === 1, rule("notchEnd")),
  );

export const locomotiveFileSchema = z
  .object({
    schema: z.literal("taut/locomotive@1"),
    id: id(),
    label: text(),
    // One unit: a light shunter of some 10 t to the heaviest eight-axle units (common practice).
    mass_t: within(10, 300, "t"),
    adhesiveMass_t: within(10, 300, "t"),
    length_m: within(5, 50, "m"),
    axles: z.optional(z.int().check(z.gte(2), z.lte(16))),
    railPower_kW: within(50, 20_000, "kW"),
    notches: z.int().check(z.gte(1), z.lte(32)),
    notchPower: notchFractions(),
    notchStartingEffort: notchFractions(),
    // Up to 40 t per axle at μ 0.5 on sixteen axles is some 3000 kN (common practice: no unit comes near).
    startingTractiveEffort_kN: within(10, 3000, "kN"),
    continuousTractiveEffort_kN: within(5, 3000, "kN"),
    continuousSpeed_kmh: within(1, 200, "km/h"),
    maxSpeed_kmh: within(10, 400, "km/h"),
    sanders: z.boolean(),
    adhesionUtilisation: z.optional(fraction()),
    rotatingMassFraction: z.optional(z.number().check(z.gte(0), z.lte(1))),
    frontalArea_m2: z.optional(within(1, 30, "m²")),
    startingResistance_permille: z.optional(within(0, 30, "‰")),
    /** What the locomotive (independent) brake holds, kN; default 15 % of the unit's weight [M]. */
    locomotiveBrakeHolding_kN: z.optional(within(1, 2000, "kN")),
  })
  .check(
    z.refine((l) => l.adhesiveMass_t <= l.mass_t, { ...rule("notExceed", { field: "mass_t" }), path: ["adhesiveMass_t"] }),
    z.refine((l) => l.notchPower.length === l.notches, { ...rule("perNotch"), path: ["notchPower"] }),
    z.refine((l) => l.notchStartingEffort.length === l.notches, { ...rule("perNotch"), path: ["notchStartingEffort"] }),
    z.refine((l) => l.continuousTractiveEffort_kN <= l.startingTractiveEffort_kN, { ...rule("notExceed", { field: "startingTractiveEffort_kN" }), path: ["continuousTractiveEffort_kN"] }),
  );
export type LocomotiveFile = z.infer<typeof locomotiveFileSchema>;

// ---------------------------------------------------------------- wagon type
export const wagonFileSchema = z.object({
  schema: z.literal("taut/wagon@1"),
  id: id(),
  label: text(),
  axles: z.int().check(z.gte(2), z.lte(12)),
  length_m: within(WAGON_LENGTH_M.min, WAGON_LENGTH_M.max, "m"),
  tare_t: within(2, WAGON_MASS_T.max, "t"),
  maxGross_t: within(WAGON_MASS_T.min, WAGON_MASS_T.max, "t"),
  frontalArea_m2: within(1, 30, "m²"),
  coupling: z.enum(["knuckle", "screw"]),
  defaultSlack_mm: within(0, 200, "mm"),
  rotatingMassFraction: z.optional(z.number().check(z.gte(0), z.lte(1))),
  // Davis b (lb per short ton per mph) and K (lb per ft² per mph²): the published values are near 0.045 and
  // 0.0005–0.0024 (W. J. Davis Jr., General Electric Review 29, 1926 [M]); ten times that is the bound.
  davisB: z.optional(within(0, 0.5)),
  davisK: z.optional(within(0, 0.025)),
  startingResistance_permille: z.optional(within(0, 30, "‰")),
}).check(z.refine((w) => w.tare_t <= w.maxGross_t, { ...rule("notExceed", { field: "maxGross_t" }), path: ["tare_t"] }));
export type WagonFile = z.infer<typeof wagonFileSchema>;

// ---------------------------------------------------------------- rail conditions
const conditionEntry = z
  .object({
    median: fraction(),
    sanded: fraction(),
    sigmaLn: z.number().check(z.gt(0), z.lte(2)),
    source: text(400),
  })
  .check(z.refine((c) => c.sanded >= c.median, { ...rule("sandLowers"), path: ["sanded"] }));

export const railConditionsFileSchema = z.object({
  schema: z.literal("taut/rail-conditions@1"),
  label: text(),
  conditions: z.object({
    dry: conditionEntry,
    damp: conditionEntry,
    wet: conditionEntry,
    frost: conditionEntry,
    leaves: conditionEntry,
    greasy: conditionEntry,
  }),
  sources: z.array(text(400)),
});
export type RailConditionsFile = z.infer<typeof railConditionsFileSchema>;

// ---------------------------------------------------------------- track profile and location note
export const segmentSchema = z.object({
  from_m: chainage(),
  length_m: within(1, 100_000, "m"),
  gradient_permille: gradient(),
  curveRadius_m: curveRadius(),
});
export type SegmentFile = z.infer<typeof segmentSchema>;

/** Segments must follow one another without gaps or overlaps. */
const contiguousSegments = () =>
  z.array(segmentSchema).check(
    z.minLength(1),
    z.maxLength(MAX_SEGMENTS),
    z.superRefine((segs, ctx) => {
      // Figures out of their own range have their own message: the join is judged between sound ones only.
      const sound = (s: unknown) => {
        const x = s as Partial<SegmentFile> | null | undefined;
        return !!x && typeof x.from_m === "number" && typeof x.length_m === "number" && Math.abs(x.from_m) <= 1_000_000 && x.length_m >= 1 && x.length_m <= 100_000;
      };
      for (let k = 1; k < segs.length; k++) {
        if (!sound(segs[k - 1]) || !sound(segs[k])) continue;
        const prev = segs[k - 1]!;
        const end = prev.from_m + prev.length_m;
        const gap = segs[k]!.from_m - end;
        if (Math.abs(gap) > 1e-6) {
          const r = gap > 0 ? rule("segmentGap", { gap: round(gap), end: round(end), unit: "m" }) : rule("segmentOverlap", { overlap: round(-gap), end: round(end), unit: "m" });
          ctx.issues.push({ code: "custom", input: segs[k]!.from_m, path: [k, "from_m"], ...r });
        }
      }
    }),
  );

const round = (x: number): number => Math.round(x * 100) / 100;

export const uniformLocationSchema = z.object({
  gradient_permille: gradient(),
  curveRadius_m: curveRadius(),
  clearAhead_m: clearAhead(),
});

export const profileLocationSchema = z.object({
  segments: contiguousSegments(),
  frontAt_m: chainage(),
  clearAhead_m: clearAhead(),
});

export const hazardSchema = z.object({
  kind: z.enum(["points", "level-crossing", "tunnel", "signal", "bridge", "platform", "other"]),
  at_m: z.optional(chainage()),
  note: z.optional(z.string().check(z.maxLength(400))),
});

export const seasonSchema = z.object({
  season: z.enum(["spring", "summer", "autumn", "winter"]),
  rail: railConditionSchema,
  note: z.optional(z.string().check(z.maxLength(400))),
});

export const revisionSchema = z.object({
  date: z.string().check(z.refine((d) => /^\d{4}-\d{2}-\d{2}$/.test(d), rule("dateForm"))),
  initials: z.string().check(z.minLength(1), z.maxLength(8)),
  change: z.string().check(z.minLength(1), z.maxLength(400)),
});

/**
 * The train a note's drawing and load table are worked out for: a train preset (its wagons, length,
 * slack), optionally with another locomotive profile or count at the head, and the air temperature.
 */
export const referenceTrainSchema = z.object({
  train: id(),
  locomotive: z.optional(id()),
  count: z.optional(z.int().check(z.gte(1), z.lte(8))),
  temperature_C: z.optional(within(-60, 60, "°C")),
});
export type ReferenceTrainFile = z.infer<typeof referenceTrainSchema>;

export const locationNoteSchema = z.object({
  schema: z.literal("taut/location@1"),
  id: id(),
  name: text(120),
  line: z.optional(z.string().check(z.maxLength(120))),
  direction: z.optional(z.string().check(z.maxLength(120))),
  illustrative: z.optional(z.boolean()),
  /** Where the train stands, in the trainer's words (e.g. "front at the loop exit signal"). */
  standing: z.optional(z.string().check(z.maxLength(400))),
  referenceTrain: z.optional(referenceTrainSchema),
  segments: contiguousSegments(),
  frontAt_m: chainage(),
  clearAhead_m: clearAhead(),
  speedLimit_kmh: z.optional(within(5, 400, "km/h")),
  hazards: z._default(z.array(hazardSchema).check(z.maxLength(500)), []),
  seasons: z._default(z.array(seasonSchema).check(z.maxLength(40)), []),
  practice: z._default(z.string().check(z.maxLength(4000)), ""),
  revisions: z.array(revisionSchema).check(z.minLength(1), z.maxLength(5000)),
});
export type LocationNoteFile = z.infer<typeof locationNoteSchema>;

// ---------------------------------------------------------------- start case
export const positionSchema = z.union([
  z.enum(["head", "rear"]),
  z.object({ afterWagon: z.int().check(z.gte(1)) }),
]);

export const locoEntrySchema = z.object({
  profile: z.union([id(), locomotiveFileSchema]),
  count: z._default(z.int().check(z.gte(1), z.lte(8)), 1),
  position: z._default(positionSchema, "head"),
  /** with-head (the head's notch), remote (own notch from the head cab), helper (own driver); default by position. */
  control: z.optional(z.enum(["with-head", "remote", "helper"])),
});

/** One wagon group of a mixed train: its wagons, their type and the group's total mass. */
export const wagonGroupSchema = z
  .object({
    wagons: z.int().check(z.gte(1), z.lte(MAX_WAGONS)),
    wagonType: id(),
    mass_t: within(WAGON_MASS_T.min, MAX_WAGONS * WAGON_MASS_T.max, "t"),
  })
  .check(
    z.superRefine((g, ctx) => {
      if (!(Number.isInteger(g.wagons) && g.wagons >= 1 && g.wagons <= MAX_WAGONS) || !(g.mass_t >= WAGON_MASS_T.min)) return;
      const x = g.mass_t / g.wagons;
      if (x >= WAGON_MASS_T.min && x <= WAGON_MASS_T.max) return;
      ctx.issues.push({ code: "custom", input: g.mass_t, path: ["mass_t"], ...rule("perWagon", { min: WAGON_MASS_T.min, max: WAGON_MASS_T.max, unit: "t", value: roundTo3(x), count: g.wagons }) });
    }),
  );
export type WagonGroupFile = z.infer<typeof wagonGroupSchema>;

const trainObject = z.object({
  // With `groups` these three may be left out: they are derived from the groups and their wagon types.
  trailingMass_t: z.optional(within(WAGON_MASS_T.min, MAX_WAGONS * WAGON_MASS_T.max, "t")),
  wagons: z.optional(z.int().check(z.gte(1), z.lte(MAX_WAGONS))),
  length_m: z.optional(within(WAGON_LENGTH_M.min, MAX_WAGONS * WAGON_LENGTH_M.max, "m")),
  /** A mixed train: wagon groups in order from the head. */
  groups: z.optional(z.array(wagonGroupSchema).check(z.minLength(1), z.maxLength(MAX_WAGONS))),
  couplerSlack_mm: within(0, 200, "mm"),
  bearing: z.enum(["roller", "plain"]),
  // Working limits run from some 300 kN (old screw couplings) to some 2000 kN (heavy-haul knuckles);
  // the bound leaves room either side (common practice).
  couplerLimit_kN: within(100, 5000, "kN"),
  /** Working limit in buff (compression), kN; default the working limit in draft. */
  couplerBuffLimit_kN: z.optional(within(100, 5000, "kN")),
  coupling: z.optional(z.enum(["knuckle", "screw"])),
  wagonType: z.optional(id()),
  slackState: z._default(z.enum(["bunched", "stretched", "from-profile"]), "from-profile"),
}).check(
  // Per wagon: the whole train's mass and length are checked against what one wagon can be.
  z.superRefine((t, ctx) => {
    if (t.groups === undefined) {
      for (const what of ["trailingMass_t", "wagons", "length_m"] as const) {
        if (t[what] === undefined) ctx.issues.push({ code: "custom", input: t, path: [what], ...rule("trainNeeded") });
      }
    } else {
      const wagons = t.groups.reduce((s, g) => s + g.wagons, 0);
      const mass = t.groups.reduce((s, g) => s + g.mass_t, 0);
      if (wagons > MAX_WAGONS) ctx.issues.push({ code: "custom", input: t.groups, path: ["groups"], ...rule("groupsMaxWagons", { max: MAX_WAGONS, wagons }) });
      if (t.wagons !== undefined && t.wagons !== wagons) ctx.issues.push({ code: "custom", input: t.wagons, path: ["wagons"], ...rule("groupsWagons", { wagons, value: t.wagons }) });
      if (t.trailingMass_t !== undefined && Math.abs(t.trailingMass_t - mass) > 0.5) ctx.issues.push({ code: "custom", input: t.trailingMass_t, path: ["trailingMass_t"], ...rule("groupsMass", { mass: roundTo3(mass), value: t.trailingMass_t, unit: "t" }) });
    }
    const perWagon = (what: "trailingMass_t" | "length_m", r: { min: number; max: number }, unit: string) => {
      const total = t[what];
      // Only when the whole-train figure is itself in range (otherwise that is the one message).
      if (t.wagons === undefined || total === undefined || !(total >= r.min && total <= MAX_WAGONS * r.max) || !(Number.isInteger(t.wagons) && t.wagons >= 1 && t.wagons <= MAX_WAGONS)) return;
      const x = total / t.wagons;
      if (x >= r.min && x <= r.max) return;
      ctx.issues.push({
        code: "custom",
        input: total,
        path: [what],
        ...rule("perWagon", { min: r.min, max: r.max, unit, value: roundTo3(x), count: t.wagons }),
      });
    };
    perWagon("trailingMass_t", WAGON_MASS_T, "t");
    perWagon("length_m", WAGON_LENGTH_M, "m");
  }),
);

/**
 * The train of a case: given whole (trailing mass, wagons, length) or as wagon groups. The wagon count and
 * trailing mass of a grouped train are filled in from its groups here; its length needs the wagon types
 * and is filled in when the case is resolved against the library (`length_m` may then be absent).
 */
export const trainSchema = z.pipe(
  trainObject,
  z.transform((t) => ({
    ...t,
    trailingMass_t: t.trailingMass_t ?? (t.groups ?? []).reduce((s, g) => s + g.mass_t, 0),
    wagons: t.wagons ?? (t.groups ?? []).reduce((s, g) => s + g.wagons, 0),
  })),
);
export type TrainFile = z.infer<typeof trainSchema>;

export const conditionsSchema = z.object({
  rail: railConditionSchema,
  sand: z.boolean(),
  temperature_C: within(-60, 60, "°C"),
});

export const targetSchema = z.union([
  z.object({ speed_kmh: z.number().check(z.gt(0), z.lte(200)) }),
  z.object({ distance_m: z.number().check(z.gt(0), z.lte(20000)) }),
]);

export const settingsSchema = z.object({
  couplerSafetyFactor: z.optional(z.number().check(z.gte(1), z.lte(3))),
  slipRiskThreshold: z.optional(z.number().check(z.gt(0), z.lte(0.5))),
  /** Highest slip risk of the needed effort still judged marginal (taken as at least the threshold). */
  marginalSlipRisk: z.optional(z.number().check(z.gt(0), z.lte(0.5))),
  /** Most parts dividing the train may make. */
  maxDividedParts: z.optional(z.int().check(z.gte(2), z.lte(10))),
});

export const startCaseSchema = z.object({
  schema: z.literal("taut/start-case@1"),
  id: z.optional(z.string().check(z.maxLength(80))),
  label: z.optional(z.string().check(z.maxLength(200))),
  illustrative: z.optional(z.boolean()),
  locomotives: z.array(locoEntrySchema).check(z.minLength(1), z.maxLength(8)),
  train: trainSchema,
  location: z.union([id(), profileLocationSchema, uniformLocationSchema]),
  conditions: conditionsSchema,
  target: targetSchema,
  settings: z.optional(settingsSchema),
});
export type StartCaseFile = z.infer<typeof startCaseSchema>;
export type StartCaseInput = z.input<typeof startCaseSchema>;

// ---------------------------------------------------------------- train preset
export const trainPresetSchema = z.object({
  schema: z.literal("taut/train@1"),
  id: id(),
  label: text(),
  illustrative: z.optional(z.boolean()),
  locomotives: z.array(locoEntrySchema).check(z.minLength(1), z.maxLength(8)),
  train: trainSchema,
});
export type TrainPresetFile = z.infer<typeof trainPresetSchema>;
