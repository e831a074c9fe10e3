/**
 * Diesel-electric tractive effort by notch and speed: the lower of the current limit
 * (starting tractive effort × the notch's share) and the power hyperbola (rail power × the
 * notch's share ÷ speed). INTERFACE.md; PHYSICS.md §3 [S: W. J. White, How Diesel-Electric
 * Locomotives Operate, 1997, p. 3-10].
 */
import { adhesionLimitN, medianAdhesion } from "./adhesion.js";
import type { AdhesionTable, LocomotiveSpec, RailCondition } from "./types.js";

/** Speed below which the power hyperbola is not evaluated (avoids division by zero), m/s. */
const MIN_POWER_SPEED_MPS = 1e-3;

/** Tractive effort demanded in `notch` (0 = idle) at `speedMps`, before the adhesion limit, N. */
export function notchEffortN(loco: LocomotiveSpec, notch: number, speedMps: number): number {
  if (notch <= 0) return 0;
  const n = Math.min(notch, loco.notchPower.length);
  const currentLimited = loco.startingTractiveEffortN * (loco.notchStartingEffort[n - 1] ?? 1);
  const v = Math.max(Math.abs(speedMps), MIN_POWER_SPEED_MPS);
  const powerLimited = (loco.railPowerW * (loco.notchPower[n - 1] ?? 1)) / v;
  return Math.min(currentLimited, powerLimited);
}

/** Tractive effort from power at a speed, N: F = P·η / v (P engine power, η transmission efficiency). */
export function effortFromPowerN(enginePowerW: number, efficiency: number, speedMps: number): number {
  return (enginePowerW * efficiency) / speedMps;
}

/** Tractive effort in `notch` at speed, limited by the median adhesion of the rail condition, N. */
export function adhesionLimitedEffortN(
  loco: LocomotiveSpec,
  notch: number,
  speedMps: number,
  table: AdhesionTable,
  rail: RailCondition,
  sand: boolean,
): number {
  const mu = medianAdhesion(table, rail, sand && loco.sanders, speedMps);
  return Math.min(notchEffortN(loco, notch, speedMps), adhesionLimitN(loco.adhesiveMassKg, loco.adhesionUtilisation, mu));
}
