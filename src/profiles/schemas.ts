/**
 * File schemas (zod/mini, so the browser bundle stays small). Field names carry their units; values
 * are converted to SI in `convert.ts`. Shapes are a stable contract (INTERFACE.md): add, never rename.
 */
import * as z from "zod/mini";
import { RAIL_CONDITIONS } from "../core/physics/types.js";

const finite = () => z.number();
const positive = () => z.number().check(z.gt(0));
const nonNegative = () => z.number().check(z.gte(0));
const fraction = () => z.number().check(z.gt(0), z.lte(1));
const id = () => z.string().check(z.minLength(1), z.maxLength(80), z.regex(/^[a-z0-9][a-z0-9._-]*$/, { message: "must be lower-case letters, digits, '.', '_' or '-'" }));
const text = (max = 200) => z.string().check(z.minLength(1), z.maxLength(max));

export const railConditionSchema = z.enum(RAIL_CONDITIONS);

/** Curve radius: 0 for straight track, otherwise at least 80 m. */
const curveRadius = () =>
  z.number().check(z.refine((r) => r === 0 || r >= 80, { message: "must be 0 (straight) or at least 80 m" }));

/** Gradient within what adhesion railways operate: ±60 ‰. */
const gradient = () => z.number().check(z.gte(-60), z.lte(60));

// ---------------------------------------------------------------- locomotive profile
const notchFractions = () =>
  z.array(fraction()).check(
    z.minLength(1),
    z.refine((a) => a.every((x, i) => i === 0 || x >= a[i - 1]!), { message: "must not decrease from one notch to the next" }),
    z.refine((a) => a[a.length - 1] === 1, { message: "must end with 1 (full notch)" }),
  );

export const locomotiveFileSchema = z
  .object({
    schema: z.literal("taut/locomotive@1"),
    id: id(),
    label: text(),
    mass_t: positive(),
    adhesiveMass_t: positive(),
    length_m: positive(),
    axles: z.optional(z.int().check(z.gte(2), z.lte(16))),
    railPower_kW: positive(),
    notches: z.int().check(z.gte(1), z.lte(32)),
    notchPower: notchFractions(),
    notchStartingEffort: notchFractions(),
    startingTractiveEffort_kN: positive(),
    continuousTractiveEffort_kN: positive(),
    continuousSpeed_kmh: positive(),
    maxSpeed_kmh: positive(),
    sanders: z.boolean(),
    adhesionUtilisation: z.optional(fraction()),
    rotatingMassFraction: z.optional(z.number().check(z.gte(0), z.lte(1))),
    frontalArea_m2: z.optional(positive()),
    startingResistance_permille: z.optional(nonNegative()),
  })
  .check(
    z.refine((l) => l.adhesiveMass_t <= l.mass_t, { message: "must not exceed mass_t", path: ["adhesiveMass_t"] }),
    z.refine((l) => l.notchPower.length === l.notches, { message: "must have one entry per notch", path: ["notchPower"] }),
    z.refine((l) => l.notchStartingEffort.length === l.notches, { message: "must have one entry per notch", path: ["notchStartingEffort"] }),
    z.refine((l) => l.continuousTractiveEffort_kN <= l.startingTractiveEffort_kN, {
      message: "must not exceed startingTractiveEffort_kN",
      path: ["continuousTractiveEffort_kN"],
    }),
  );
export type LocomotiveFile = z.infer<typeof locomotiveFileSchema>;

// ---------------------------------------------------------------- wagon type
export const wagonFileSchema = z.object({
  schema: z.literal("taut/wagon@1"),
  id: id(),
  label: text(),
  axles: z.int().check(z.gte(2), z.lte(12)),
  length_m: positive(),
  tare_t: positive(),
  maxGross_t: positive(),
  frontalArea_m2: positive(),
  coupling: z.enum(["knuckle", "screw"]),
  defaultSlack_mm: nonNegative(),
  rotatingMassFraction: z.optional(z.number().check(z.gte(0), z.lte(1))),
  davisB: z.optional(nonNegative()),
  davisK: z.optional(nonNegative()),
  startingResistance_permille: z.optional(nonNegative()),
});
export type WagonFile = z.infer<typeof wagonFileSchema>;

// ---------------------------------------------------------------- rail conditions
const conditionEntry = z
  .object({
    median: fraction(),
    sanded: fraction(),
    sigmaLn: z.number().check(z.gt(0), z.lte(2)),
    source: text(400),
  })
  .check(z.refine((c) => c.sanded >= c.median, { message: "sand must not lower adhesion", path: ["sanded"] }));

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
  from_m: finite(),
  length_m: positive(),
  gradient_permille: gradient(),
  curveRadius_m: curveRadius(),
});
export type SegmentFile = z.infer<typeof segmentSchema>;

/** Segments must follow one another without gaps or overlaps. */
const contiguousSegments = () =>
  z.array(segmentSchema).check(
    z.minLength(1),
    z.superRefine((segs, ctx) => {
      for (let k = 1; k < segs.length; k++) {
        const prev = segs[k - 1]!;
        const end = prev.from_m + prev.length_m;
        const gap = segs[k]!.from_m - end;
        if (Math.abs(gap) > 1e-6) {
          ctx.issues.push({
            code: "custom",
            input: segs[k]!.from_m,
            path: [k, "from_m"],
            message: gap > 0 ? `leaves a gap of ${round(gap)} m after the previous segment (which ends at ${round(end)} m)` : `overlaps the previous segment by ${round(-gap)} m (it ends at ${round(end)} m)`,
          });
        }
      }
    }),
  );

const round = (x: number): number => Math.round(x * 100) / 100;

export const uniformLocationSchema = z.object({
  gradient_permille: gradient(),
  curveRadius_m: curveRadius(),
  clearAhead_m: nonNegative(),
});

export const profileLocationSchema = z.object({
  segments: contiguousSegments(),
  frontAt_m: finite(),
  clearAhead_m: nonNegative(),
});

export const hazardSchema = z.object({
  kind: z.enum(["points", "level-crossing", "tunnel", "signal", "bridge", "platform", "other"]),
  at_m: z.optional(finite()),
  note: z.optional(z.string().check(z.maxLength(400))),
});

export const seasonSchema = z.object({
  season: z.enum(["spring", "summer", "autumn", "winter"]),
  rail: railConditionSchema,
  note: z.optional(z.string().check(z.maxLength(400))),
});

export const revisionSchema = z.object({
  date: z.string().check(z.regex(/^\d{4}-\d{2}-\d{2}$/, { message: "must be a date as YYYY-MM-DD" })),
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
  temperature_C: z.optional(z.number().check(z.gte(-60), z.lte(60))),
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
  frontAt_m: finite(),
  clearAhead_m: nonNegative(),
  speedLimit_kmh: z.optional(positive()),
  hazards: z._default(z.array(hazardSchema), []),
  seasons: z._default(z.array(seasonSchema), []),
  practice: z._default(z.string().check(z.maxLength(4000)), ""),
  revisions: z.array(revisionSchema).check(z.minLength(1)),
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
});

export const trainSchema = z.object({
  trailingMass_t: positive(),
  wagons: z.int().check(z.gte(1), z.lte(400)),
  length_m: positive(),
  couplerSlack_mm: z.number().check(z.gte(0), z.lte(200)),
  bearing: z.enum(["roller", "plain"]),
  couplerLimit_kN: positive(),
  coupling: z.optional(z.enum(["knuckle", "screw"])),
  wagonType: z.optional(id()),
  slackState: z._default(z.enum(["bunched", "stretched", "from-profile"]), "from-profile"),
});
export type TrainFile = z.infer<typeof trainSchema>;

export const conditionsSchema = z.object({
  rail: railConditionSchema,
  sand: z.boolean(),
  temperature_C: z.number().check(z.gte(-60), z.lte(60)),
});

export const targetSchema = z.union([
  z.object({ speed_kmh: z.number().check(z.gt(0), z.lte(200)) }),
  z.object({ distance_m: z.number().check(z.gt(0), z.lte(20000)) }),
]);

export const settingsSchema = z.object({
  couplerSafetyFactor: z.optional(z.number().check(z.gte(1), z.lte(3))),
  slipRiskThreshold: z.optional(z.number().check(z.gt(0), z.lte(0.5))),
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
