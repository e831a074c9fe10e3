/**
 * Hand-built dynamics models for tests: a chain of vehicles with chosen masses, couplings and forces,
 * independent of the case builder, so analytic solutions can be matched exactly.
 */
import type { TrainModel } from "../../../src/core/train/trainModel.js";

export interface ChainSpec {
  masses: number[];
  /** Effective masses (rotating allowance); default = masses. */
  effMasses?: number[];
  halfSlackM?: number;
  ext0M?: number[];
  travelM?: number;
  ratedN?: number;
  linearShare?: number;
  unloadRatio?: number;
  transitionK?: number;
  endStopK?: number;
  dampingC?: number;
  davisA?: number[];
  davisB?: number[];
  davisC?: number[];
  breakawayExcessN?: number[];
  gradePermille?: number;
  /** Index of the one powered vehicle (-1 for none). */
  loco?: number;
  /** Current-limited effort (every notch) and rail power, for the powered vehicle. */
  effortN?: number;
  powerW?: number;
  effortRiseS?: number;
  mu0?: number;
}

export function chainModel(p: ChainSpec): TrainModel {
  const n = p.masses.length;
  const nc = n - 1;
  const fill = (len: number, v: number) => new Float64Array(len).fill(v);
  const arr = (a: number[] | undefined, len: number, v: number) => (a ? Float64Array.from(a) : fill(len, v));
  const eff = arr(p.effMasses, n, 0);
  if (!p.effMasses) eff.set(p.masses);
  const chain0 = new Float64Array(n);
  for (let i = 0; i < n; i++) chain0[i] = -15 * i;
  const loco = p.loco ?? 0;
  const hasLoco = loco >= 0;
  const stride = 9;
  const notchCurrent = new Float64Array(stride);
  const notchPower = new Float64Array(stride);
  for (let k = 1; k < stride; k++) {
    notchCurrent[k] = p.effortN ?? 0;
    notchPower[k] = p.powerW ?? 1e12;
  }
  const sinT = Math.sin(Math.atan((p.gradePermille ?? 0) / 1000));
  return {
    n,
    massKg: Float64Array.from(p.masses),
    effMassKg: eff,
    invEffMass: eff.map((m) => 1 / m),
    davisA: arr(p.davisA, n, 0),
    davisB: arr(p.davisB, n, 0),
    davisC: arr(p.davisC, n, 0),
    breakawayExcessN: arr(p.breakawayExcessN, n, 0),
    fadeSpeedMps: 2 / 3.6,
    chainage0M: chain0,
    lengthM: fill(n, 15),
    halfSlackM: fill(nc, p.halfSlackM ?? 0),
    ext0M: p.ext0M ? Float64Array.from(p.ext0M) : fill(nc, 0),
    draftTravelM: fill(nc, p.travelM ?? 0.15),
    draftRatedN: fill(nc, p.ratedN ?? 2.5e6),
    draftLinear: fill(nc, p.linearShare ?? 1),
    draftPreloadN: fill(nc, 0),
    buffTravelM: fill(nc, p.travelM ?? 0.15),
    buffRatedN: fill(nc, p.ratedN ?? 2.5e6),
    buffLinear: fill(nc, p.linearShare ?? 1),
    buffPreloadN: fill(nc, 0),
    unloadRatio: fill(nc, p.unloadRatio ?? 1),
    transitionK: fill(nc, p.transitionK ?? 8e7),
    endStopK: fill(nc, p.endStopK ?? 2e8),
    dampingC: fill(nc, p.dampingC ?? 0),
    nl: hasLoco ? 1 : 0,
    locoVehicle: hasLoco ? Int32Array.of(loco) : new Int32Array(0),
    locoSpecs: [],
    locoNotches: hasLoco ? Int32Array.of(8) : new Int32Array(0),
    unitGroup: hasLoco ? Int32Array.of(0) : new Int32Array(0),
    groupCount: 1,
    notchCurrentN: hasLoco ? notchCurrent : new Float64Array(0),
    notchPowerW: hasLoco ? notchPower : new Float64Array(0),
    notchStride: stride,
    adhesiveWeightN: hasLoco ? Float64Array.of(1e12) : new Float64Array(0),
    mu0: hasLoco ? Float64Array.of(p.mu0 ?? 1) : new Float64Array(0),
    effortRiseS: p.effortRiseS ?? 1.5,
    effortFallS: 0.5,
    slipCutFraction: 0.7,
    trainBrakeN: fill(n, 0),
    locoBrakeN: fill(n, 0),
    brakeReleaseDelayS: fill(n, 0),
    brakeReleaseRampS: 8,
    segStartM: Float64Array.of(-Infinity),
    segEndM: Float64Array.of(Infinity),
    segSin: Float64Array.of(sinT),
    segCurveNPerKg: Float64Array.of(0),
  };
}
