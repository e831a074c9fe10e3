/**
 * Where added locomotives can go: the case with units added at the head, the rear or after a wagon, and
 * the mid-train point that splits the train's resistance in proportion to the units' effort (so that each
 * group of powered units pulls about its own share of the train and the couplings between carry least).
 */
import { adhesionLimitN, adhesionQuantile, standstillMedian } from "../physics/adhesion.js";
import { buildConsist } from "../train/consist.js";
import { standingForces } from "../train/standing.js";
import { notchEffortN } from "../physics/traction.js";
import type { LocoGroup, LocoPosition, StartCase, UnitControl } from "../train/types.js";
import type { LocomotiveSpec } from "../physics/types.js";

/** Units of one profile added at one place. */
export interface AddedUnits {
  count: number;
  position: LocoPosition;
}

/**
 * The case with the given units of `spec` added to its locomotives: at the head in multiple with the head's
 * units; mid-train and at the rear under `control` (default remote: their own notch, set from the head cab).
 */
export function withAddedUnits(c: StartCase, spec: LocomotiveSpec, adds: readonly AddedUnits[], control: UnitControl = "remote"): StartCase {
  const groups: LocoGroup[] = adds.map((a) => ({ spec, count: a.count, position: a.position, control: a.position === "head" ? "with-head" : control }));
  return { ...c, locomotives: [...c.locomotives, ...groups] };
}

/** The profile assistance adds by default: the lead unit's (the first unit at the head, else the first listed). */
export function leadSpec(c: StartCase): LocomotiveSpec {
  const head = c.locomotives.find((g) => g.position === "head") ?? c.locomotives[0];
  if (!head) throw new RangeError("a start case has at least one locomotive");
  return head.spec;
}

/** The wagon in the middle of the train (units go after it). */
export function middleWagon(c: StartCase): number {
  return Math.max(1, Math.min(c.train.wagons - 1, Math.round(c.train.wagons / 2)));
}

/**
 * Tractive effort a unit can give at standstill in full notch, N: the current limit, or adhesion at the
 * accepted slip risk if lower — the share rule of the static check (units in step share the load in
 * proportion to what each can give).
 */
export function unitEffortN(c: StartCase, spec: LocomotiveSpec): number {
  const cond = c.adhesion[c.conditions.rail];
  const median = standstillMedian(cond, c.conditions.sand && spec.sanders);
  const design = adhesionQuantile(median, cond.sigmaLn, c.settings.slipRiskThreshold);
  return Math.min(notchEffortN(spec, spec.notchPower.length, 0), adhesionLimitN(spec.adhesiveMassKg, spec.adhesionUtilisation, design));
}

/**
 * The wagon after which `count` units of `spec` best go mid-train: the point that splits the train's
 * resistance in proportion to the units' effort. Every vehicle at the point of moving, every unit pulling
 * its share of the total resistance (units in step), the coupling just ahead of the inserted units then
 * carries least: the units ahead pull exactly the wagons ahead, the inserted units the rest. Ties go to the
 * wagon nearer the head. Returns 0 for a one-wagon train.
 */
export function proportionalSplitWagon(c: StartCase, spec: LocomotiveSpec, count: number): number {
  const wagons = c.train.wagons;
  if (wagons < 2) return 0;
  const consist = buildConsist(c);
  const f = standingForces(consist, c.location.track);
  const n = consist.vehicles.length;
  const res = new Float64Array(n);
  let total = 0;
  for (let i = 0; i < n; i++) {
    res[i] = f.breakawayN[i]! + f.gradeN[i]! + f.curveN[i]!;
    total += res[i]!;
  }
  // An added unit resists as the lead unit does, per kilogram.
  const lead = consist.locoIndices[0] ?? 0;
  total += (count * spec.massKg * res[lead]!) / consist.vehicles[lead]!.massKg;
  const efforts = consist.locoIndices.map((i) => unitEffortN(c, consist.vehicles[i]!.loco!));
  const available = efforts.reduce((s, x) => s + x, 0) + count * unitEffortN(c, spec);
  const share = Math.max(0, total) / available;
  const effort = new Float64Array(n);
  consist.locoIndices.forEach((i, k) => (effort[i] = share * efforts[k]!));
  let best = middleWagon(c);
  let bestForce = Infinity;
  let wagon = 0;
  let t = 0;
  for (let i = 0; i < n - 1; i++) {
    // Quasi-static force in the coupling behind vehicle i: Σ (effort − resistance) ahead of it.
    t += effort[i]! - res[i]!;
    if (consist.vehicles[i]!.kind !== "wagon") continue;
    wagon++;
    if (wagon >= wagons) break;
    if (Math.abs(t) < bestForce - 1e-6) {
      bestForce = Math.abs(t);
      best = wagon;
    }
  }
  return best;
}
