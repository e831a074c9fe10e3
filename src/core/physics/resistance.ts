/**
 * Train resistance per vehicle: grade (exact), curve (Röckl), running (Davis 1926) and
 * starting (breakaway) resistance by bearing type and temperature. Forces in N, SI in and out.
 */
import { GRAVITY_MPS2, KG_PER_SHORT_TON, M_PER_FT, MPS_PER_MPH, NEWTONS_PER_LBF } from "./constants.js";
import { DAVIS_DEFAULTS } from "./davisDefaults.js";
import type { Bearing } from "./types.js";

/**
 * Grade force on a vehicle, N, positive opposing forward motion on a rising grade:
 * F = m·g·sin(atan(i)). Exact form; 1 ‰ ≈ 9.80665 N/t for small i.
 */
export function gradeForceN(massKg: number, gradePermille: number): number {
  return massKg * GRAVITY_MPS2 * Math.sin(Math.atan(gradePermille / 1000));
}

/** Radius at which Röckl's two branches are joined, m [S]. */
export const ROECKL_BRANCH_RADIUS_M = 300;

/**
 * Curve resistance for standard gauge, ‰ (N per kN of weight); 0 for straight track (R = 0). Röckl's
 * formula as quoted in PHYSICS.md §1 [S]: R ≥ 300 m: 650/(R − 55); R < 300 m: 500/(R − 30). Its two
 * branches do not meet (2.653 ‰ just at 300 m, 1.852 ‰ just below), so taken literally a sharper curve
 * would resist less. We use their monotone envelope [D]: Röckl's large-radius branch from 300 m up, its
 * small-radius branch where that gives more (below R = 30 + 500·245/650 ≈ 218.5 m), and between the two the
 * 300 m value held flat. Continuous, never smaller on a sharper curve, and equal to Röckl's own values
 * wherever either branch is above the join.
 */
export function curveResistancePermille(radiusM: number): number {
  if (radiusM === 0 || !Number.isFinite(radiusM)) return 0;
  if (radiusM <= 30) throw new RangeError(`curve radius ${radiusM} m is below the formula's range`);
  const large = (r: number) => 650 / (r - 55);
  if (radiusM >= ROECKL_BRANCH_RADIUS_M) return large(radiusM);
  return Math.max(500 / (radiusM - 30), large(ROECKL_BRANCH_RADIUS_M));
}

/** Curve resistance force on a vehicle, N (Röckl, monotone envelope). */
export function curveForceN(massKg: number, radiusM: number): number {
  return (curveResistancePermille(radiusM) / 1000) * massKg * GRAVITY_MPS2;
}

/** Degree of curve on a 100 ft arc, degrees: D = 5729.578 / R[ft] (exact arc definition). */
export function degreeOfCurve(radiusM: number): number {
  return (100 * 180) / (Math.PI * (radiusM / M_PER_FT));
}

/**
 * US per-degree curve resistance, ‰: 0.8 lb per short ton per degree of curve (TR 0603 §2.8).
 * 0.8 lb / 2000 lb per degree = 0.4 ‰ per degree. Used as a cross-check of Röckl.
 */
export function curveResistancePerDegreePermille(radiusM: number): number {
  if (radiusM === 0) return 0;
  return 0.4 * degreeOfCurve(radiusM);
}

/** Davis coefficients of one vehicle in SI: R(v) = a + b·v + c·v², N with v in m/s. */
export interface DavisCoefficients {
  aN: number;
  bNsPerM: number;
  cNs2PerM2: number;
}

/** Davis per-vehicle coefficients (US units in the source): R[lb] = 1.3W + 29n + bWV + KAV². */
export interface DavisInput {
  massKg: number;
  axles: number;
  /** b, lb per short ton per mph (freight car 0.045, locomotive 0.03). */
  b: number;
  /** K, lb per ft² per mph² (freight car 0.0005, locomotive 0.0024). */
  k: number;
  frontalAreaM2: number;
}

export { DAVIS_DEFAULTS };

/** Convert the Davis equation of one vehicle into SI coefficients. */
export function davisCoefficients(input: DavisInput): DavisCoefficients {
  const wShortTons = input.massKg / KG_PER_SHORT_TON;
  const areaFt2 = input.frontalAreaM2 / (M_PER_FT * M_PER_FT);
  const aLb = 1.3 * wShortTons + 29 * input.axles;
  const bLbPerMph = input.b * wShortTons;
  const cLbPerMph2 = input.k * areaFt2;
  return {
    aN: aLb * NEWTONS_PER_LBF,
    bNsPerM: (bLbPerMph * NEWTONS_PER_LBF) / MPS_PER_MPH,
    cNs2PerM2: (cLbPerMph2 * NEWTONS_PER_LBF) / (MPS_PER_MPH * MPS_PER_MPH),
  };
}

/** Running resistance of one vehicle at speed |v|, N (always ≥ 0; it opposes motion). */
export function runningResistanceN(d: DavisCoefficients, speedMps: number): number {
  const v = Math.abs(speedMps);
  return d.aN + d.bNsPerM * v + d.cNs2PerM2 * v * v;
}

/**
 * Breakaway (starting) resistance, N per kN of weight (‰), by bearing type and temperature.
 * Roller: ≈ 5 lb/ton above about −5 °C, rising to 12 lb/ton at −35 °C (severe cold: 10–15).
 * Plain: ≈ 20 lb/ton above +5 °C, 30 lb/ton below −10 °C, linear between.
 * [M: W. W. Hay, Railroad Engineering, 2nd ed. 1982]; 1 lb/ton = 0.5 ‰.
 */
export function breakawayResistancePermille(bearing: Bearing, temperatureC: number): number {
  const lbPerTon =
    bearing === "roller"
      ? interpolateClamped(temperatureC, -35, 12, -5, 5)
      : interpolateClamped(temperatureC, -10, 30, 5, 20);
  return lbPerTon / 2;
}

/** Speed over which breakaway resistance fades into running resistance, m/s (≈ 2 km/h) [M]. */
export const BREAKAWAY_FADE_SPEED_MPS = 2 / 3.6;

/**
 * Motion resistance of a vehicle (excluding grade), N: running resistance plus the excess of
 * breakaway over running resistance, fading linearly to nothing by BREAKAWAY_FADE_SPEED_MPS.
 */
export function motionResistanceN(d: DavisCoefficients, breakawayN: number, speedMps: number): number {
  const running = runningResistanceN(d, speedMps);
  const excess = Math.max(0, breakawayN - d.aN);
  const fade = Math.max(0, 1 - Math.abs(speedMps) / BREAKAWAY_FADE_SPEED_MPS);
  return running + excess * fade;
}

function interpolateClamped(x: number, x0: number, y0: number, x1: number, y1: number): number {
  if (x <= x0) return y0;
  if (x >= x1) return y1;
  return y0 + ((y1 - y0) * (x - x0)) / (x1 - x0);
}
