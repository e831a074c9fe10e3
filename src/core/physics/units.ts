/**
 * Units: one closed table of factors to SI, the only place the core converts.
 * Display code and file boundaries convert through `convert`; physics code works in SI.
 */
import { KG_PER_SHORT_TON, M_PER_FT, MPS_PER_KMH, MPS_PER_MPH, NEWTONS_PER_LBF, W_PER_HP } from "./constants.js";

/** Every unit the program reads or shows, grouped by the quantity it measures. */
export const UNIT_FACTORS = {
  force: { N: 1, kN: 1000, lbf: NEWTONS_PER_LBF, klbf: 1000 * NEWTONS_PER_LBF },
  mass: { kg: 1, t: 1000, shortTon: KG_PER_SHORT_TON },
  speed: { mps: 1, kmh: MPS_PER_KMH, mph: MPS_PER_MPH },
  length: { m: 1, mm: 0.001, km: 1000, ft: M_PER_FT, in: M_PER_FT / 12, mi: 5280 * M_PER_FT },
  power: { W: 1, kW: 1000, hp: W_PER_HP },
  // Grade as rise over run: per mille and per cent are both dimensionless fractions.
  grade: { fraction: 1, permille: 0.001, percent: 0.01 },
  // Specific resistance: force per unit mass (N/kg inside).
  specificForce: { NPerKg: 1, NPerT: 0.001, lbfPerShortTon: NEWTONS_PER_LBF / KG_PER_SHORT_TON },
  temperature: { C: 1, F: 1 }, // affine: handled by convertTemperature
  area: { m2: 1, ft2: M_PER_FT * M_PER_FT },
  time: { s: 1, min: 60, h: 3600 },
} as const;

export type Quantity = keyof typeof UNIT_FACTORS;
export type UnitOf<Q extends Quantity> = keyof (typeof UNIT_FACTORS)[Q] & string;

/** Convert `value` from one unit to another of the same quantity (factors above). */
export function convert<Q extends Exclude<Quantity, "temperature">>(
  quantity: Q,
  value: number,
  from: UnitOf<Q>,
  to: UnitOf<Q>,
): number {
  const table = UNIT_FACTORS[quantity] as Record<string, number>;
  const f = table[from];
  const t = table[to];
  if (f === undefined || t === undefined) throw new RangeError(`unknown ${quantity} unit ${String(from)} or ${String(to)}`);
  return (value * f) / t;
}

/** Convert a temperature between °C and °F (affine, exact). */
export function convertTemperature(value: number, from: "C" | "F", to: "C" | "F"): number {
  if (from === to) return value;
  return from === "C" ? (value * 9) / 5 + 32 : ((value - 32) * 5) / 9;
}

/** Shorthands used throughout the core for the common edge conversions. */
export const kmhToMps = (kmh: number): number => kmh * MPS_PER_KMH;
export const mpsToKmh = (mps: number): number => mps / MPS_PER_KMH;
export const tonnesToKg = (t: number): number => t * 1000;
export const kgToTonnes = (kg: number): number => kg / 1000;
export const kNToN = (kN: number): number => kN * 1000;
export const nToKN = (n: number): number => n / 1000;
