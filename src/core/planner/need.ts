/**
 * What a start needs, worked out without the coupler dynamics: the effort that takes the whole train from
 * rest to its target at the slowest acceleration we still call a start, along the track the train covers
 * doing so. At the limit of what the locomotives can do the train does accelerate that slowly, so this path
 * is the one the train really follows at the limit (and a conservative one below it). Comparing what the
 * rails and the traction motors give along it with what is needed gives the adhesion and power margins.
 */
import { adhesionQuantile, adhesionSpeedFactor, standstillMedian } from "../physics/adhesion.js";
import { notchTargetN } from "../dynamics/runner.js";
import type { TrainModel } from "../train/trainModel.js";
import type { StartCase, Target } from "../train/types.js";
import type { LocomotiveSpec } from "../physics/types.js";
import { GRAVITY_MPS2 } from "../physics/constants.js";

/**
 * A start reaches its target from rest within this time when it keeps the slowest acceleration we still
 * call a start. Ten minutes to reach a starting target is already a train that barely creeps away [M].
 */
export const TARGET_TIME_S = 600;
/** Points along the path (one per second of it). */
const PATH_POINTS = 600;

/** The slowest steady acceleration that reaches the target within `TARGET_TIME_S`, m/s². */
export function minimumAccelerationMps2(target: Target): number {
  return target.kind === "speed" ? target.speedMps / TARGET_TIME_S : (2 * target.distanceM) / (TARGET_TIME_S * TARGET_TIME_S);
}

/** The path at the slowest acceleration and the effort needed at each point of it. */
export interface NeedPath {
  aMinMps2: number;
  timeS: Float64Array;
  speedMps: Float64Array;
  /** Travel of every vehicle from where it stood, m. */
  travelM: Float64Array;
  /** Resistance of the whole train there plus what the slowest acceleration takes, N (negative: gravity does it). */
  needN: Float64Array;
}

/** The effort needed along the slowest start of the model's train to its target. */
export function needPath(m: TrainModel, target: Target): NeedPath {
  const a = minimumAccelerationMps2(target);
  let effMass = 0;
  for (let i = 0; i < m.n; i++) effMass += m.effMassKg[i]!;
  const n = PATH_POINTS + 1;
  const path: NeedPath = { aMinMps2: a, timeS: new Float64Array(n), speedMps: new Float64Array(n), travelM: new Float64Array(n), needN: new Float64Array(n) };
  const seg = new Int32Array(m.n);
  for (let j = 0; j < n; j++) {
    const t = (j * TARGET_TIME_S) / PATH_POINTS;
    const v = a * t;
    const x = 0.5 * a * t * t;
    path.timeS[j] = t;
    path.speedMps[j] = v;
    path.travelM[j] = x;
    path.needN[j] = rigidResistanceN(m, x, v, seg) + effMass * a;
  }
  return path;
}

/** The effort needed to keep the slowest acceleration at a travel and speed, N (the policy's "is more needed?"). */
export function needAtN(m: TrainModel, aMinMps2: number, effMassKg: number, travelM: number, speedMps: number, seg: Int32Array): number {
  return rigidResistanceN(m, travelM, speedMps, seg) + effMassKg * aMinMps2;
}

/** Standstill adhesion each unit may count on at the `q` quantile of the rail condition (sand where fitted and used). */
export function unitMuAt(c: StartCase, specs: readonly LocomotiveSpec[], q: number): Float64Array {
  const cond = c.adhesion[c.conditions.rail];
  return Float64Array.from(specs.map((s) => {
    const median = standstillMedian(cond, c.conditions.sand && s.sanders);
    return q === 0.5 ? median : adhesionQuantile(median, cond.sigmaLn, q);
  }));
}

/** Full-notch effort of every unit at a speed, before adhesion (current limit and power), N. */
export function motorEffortN(m: TrainModel, speedMps: number): number {
  let f = 0;
  for (let k = 0; k < m.nl; k++) f += notchTargetN(m, k, m.notchStride - 1, speedMps);
  return f;
}

/** What the rails pass of every unit's full-notch effort at a speed with standstill adhesion `mu0`, N. */
export function railEffortN(m: TrainModel, mu0: ArrayLike<number>, speedMps: number): number {
  const factor = adhesionSpeedFactor(speedMps);
  let f = 0;
  for (let k = 0; k < m.nl; k++) f += Math.min(notchTargetN(m, k, m.notchStride - 1, speedMps), m.adhesiveWeightN[k]! * mu0[k]! * factor);
  return f;
}

/** The smallest ratio of what is available to what is needed along the path, and where it falls. */
export interface PathMargin {
  /** available ÷ needed at the worst point (`MAX_MARGIN` when gravity alone does it everywhere). */
  margin: number;
  /** Some effort is needed somewhere along the path (false: gravity alone does it). */
  needed: boolean;
  availableN: number;
  needN: number;
  speedMps: number;
  travelM: number;
}

/** Margins are capped here so that "no load" does not print as infinity. */
export const MAX_MARGIN = 99;

/** The worst point of the path for an effort that depends on speed. */
export function pathMargin(path: NeedPath, availableN: (speedMps: number) => number): PathMargin {
  let worst: PathMargin = { margin: MAX_MARGIN, needed: false, availableN: availableN(0), needN: path.needN[0]!, speedMps: 0, travelM: 0 };
  for (let j = 0; j < path.needN.length; j++) {
    const need = path.needN[j]!;
    if (need <= 0) continue;
    const v = path.speedMps[j]!;
    const avail = availableN(v);
    const r = Math.min(MAX_MARGIN, avail / need);
    if (r < worst.margin || !worst.needed) worst = { margin: r, needed: true, availableN: avail, needN: need, speedMps: v, travelM: path.travelM[j]! };
  }
  return worst;
}

/**
 * Resistance of the whole train moving as one at speed `v` with every vehicle `travelM` ahead of where it
 * stood, N: running resistance, breakaway still fading out at a crawl (as in the full model), and the grade
 * and curve under each vehicle. `seg` caches each vehicle's segment between calls (start with zeros).
 */
export function rigidResistanceN(m: TrainModel, travelM: number, v: number, seg: Int32Array): number {
  let r = 0;
  for (let i = 0; i < m.n; i++) r += rigidVehicleResistanceN(m, i, travelM, v, seg);
  return r;
}

/** The same for vehicle `i` alone, N (its entry of `seg` updated). */
export function rigidVehicleResistanceN(m: TrainModel, i: number, travelM: number, v: number, seg: Int32Array): number {
  const ch = m.chainage0M[i]! + travelM;
  let k = seg[i]!;
  while (ch >= m.segEndM[k]!) k++;
  while (ch < m.segStartM[k]!) k--;
  seg[i] = k;
  const r = m.davisA[i]! + (m.davisB[i]! + m.davisC[i]! * v) * v + m.massKg[i]! * (GRAVITY_MPS2 * m.segSin[k]! + m.segCurveNPerKg[k]!);
  return v < m.fadeSpeedMps ? r + m.breakawayExcessN[i]! * (1 - v / m.fadeSpeedMps) : r;
}

/**
 * `rigidResistanceN` as a function of speed alone, every vehicle `travelM` ahead of where it stood: the
 * speed-independent part (Davis A, grade and curve under each vehicle) and the Davis B and C terms and the
 * breakaway excess summed over the train once, so each speed after costs a few operations instead of a pass
 * over the train. The same figure to rounding (the sums taken in another order).
 */
export interface RigidResistanceCurve {
  constN: number;
  bNPerMps: number;
  cNPerMps2: number;
  excessN: number;
  fadeMps: number;
}

export function rigidResistanceCurve(m: TrainModel, travelM: number, seg: Int32Array): RigidResistanceCurve {
  let constN = 0;
  let b = 0;
  let c = 0;
  let excess = 0;
  for (let i = 0; i < m.n; i++) {
    const ch = m.chainage0M[i]! + travelM;
    let k = seg[i]!;
    while (ch >= m.segEndM[k]!) k++;
    while (ch < m.segStartM[k]!) k--;
    seg[i] = k;
    constN += m.davisA[i]! + m.massKg[i]! * (GRAVITY_MPS2 * m.segSin[k]! + m.segCurveNPerKg[k]!);
    b += m.davisB[i]!;
    c += m.davisC[i]!;
    excess += m.breakawayExcessN[i]!;
  }
  return { constN, bNPerMps: b, cNPerMps2: c, excessN: excess, fadeMps: m.fadeSpeedMps };
}

/** The resistance of a `rigidResistanceCurve` at speed v, N. */
export function rigidResistanceAt(r: RigidResistanceCurve, v: number): number {
  const n = r.constN + (r.bNPerMps + r.cNPerMps2 * v) * v;
  return v < r.fadeMps ? n + r.excessN * (1 - v / r.fadeMps) : n;
}

