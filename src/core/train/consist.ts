/**
 * The consist: locomotives and wagons placed vehicle by vehicle, head to tail, on the track profile,
 * each with its own mass, resistance coefficients and coupling to the next.
 */
import { couplingOfKind, type CouplingSpec } from "../physics/coupling.js";
import { DAVIS_DEFAULTS, breakawayResistancePermille, davisCoefficients, type DavisCoefficients } from "../physics/resistance.js";
import { GRAVITY_MPS2, M_PER_FT } from "../physics/constants.js";
import type { LocoGroup, StartCase, TrainSpec } from "./types.js";
import type { LocomotiveSpec } from "../physics/types.js";

export interface Vehicle {
  kind: "locomotive" | "wagon";
  /** Head-to-tail index. */
  index: number;
  massKg: number;
  /** Mass including the rotating-mass allowance, kg. */
  effectiveMassKg: number;
  lengthM: number;
  axles: number;
  davis: DavisCoefficients;
  /** Resistance to be overcome at rest (breakaway), N; never below the Davis constant term. */
  breakawayN: number;
  /** The locomotive's profile, for powered vehicles. */
  loco?: LocomotiveSpec;
  /** Chainage of the vehicle's centre when standing, m. */
  centreChainageM: number;
}

export interface Consist {
  vehicles: Vehicle[];
  /** couplings[j] joins vehicles j and j+1. */
  couplings: CouplingSpec[];
  /** Indices of powered vehicles. */
  locoIndices: number[];
  /** Overall length, m. */
  lengthM: number;
  /** Wagon mass each, kg. */
  wagonMassKg: number;
}

/**
 * Rotating-mass allowance γ of a wagon from its mass per axle: ≈ 0.09 empty (≤ 6 t/axle) to ≈ 0.03
 * loaded (≥ 20 t/axle), linear between [D from W. L. Webb, Railroad Construction, §120].
 */
export function wagonRotatingFraction(massKg: number, axles: number): number {
  const perAxleT = massKg / 1000 / axles;
  if (perAxleT <= 6) return 0.09;
  if (perAxleT >= 20) return 0.03;
  return 0.09 - ((perAxleT - 6) * 0.06) / 14;
}

/** Place the locomotives and wagons of a case on its track, head first. */
export function buildConsist(c: StartCase): Consist {
  const order = vehicleOrder(c.locomotives, c.train.wagons);
  const wagonMassKg = c.train.trailingMassKg / c.train.wagons;
  const wagonLengthM = c.train.lengthM / c.train.wagons;
  const vehicles: Vehicle[] = [];
  let front = c.location.frontAtM;
  for (const item of order) {
    const v = item === "wagon" ? makeWagon(c.train, wagonMassKg, wagonLengthM, c.conditions.temperatureC) : makeLoco(item, c.conditions.temperatureC);
    v.index = vehicles.length;
    v.centreChainageM = front - v.lengthM / 2;
    front -= v.lengthM;
    vehicles.push(v);
  }
  const couplings: CouplingSpec[] = [];
  for (let j = 0; j < vehicles.length - 1; j++) couplings.push(couplingOfKind(c.train.coupling, c.train.couplerSlackM));
  return {
    vehicles,
    couplings,
    locoIndices: vehicles.filter((v) => v.kind === "locomotive").map((v) => v.index),
    lengthM: c.location.frontAtM - front,
    wagonMassKg,
  };
}

/** Head-to-tail order: a locomotive spec per powered unit, "wagon" per wagon. */
export function vehicleOrder(groups: readonly LocoGroup[], wagons: number): Array<LocomotiveSpec | "wagon"> {
  const head: LocomotiveSpec[] = [];
  const rear: LocomotiveSpec[] = [];
  const mid = new Map<number, LocomotiveSpec[]>();
  for (const g of groups) {
    const units: LocomotiveSpec[] = Array.from({ length: g.count }, () => g.spec);
    if (g.position === "head") head.push(...units);
    else if (g.position === "rear") rear.push(...units);
    else {
      const after = g.position.afterWagon;
      if (!(after >= 1 && after < wagons)) throw new RangeError(`afterWagon ${after} outside 1..${wagons - 1}`);
      mid.set(after, [...(mid.get(after) ?? []), ...units]);
    }
  }
  const order: Array<LocomotiveSpec | "wagon"> = [...head];
  for (let w = 1; w <= wagons; w++) {
    order.push("wagon");
    order.push(...(mid.get(w) ?? []));
  }
  order.push(...rear);
  return order;
}

function makeWagon(train: TrainSpec, massKg: number, lengthM: number, temperatureC: number): Vehicle {
  const w = train.wagon;
  const davis = davisCoefficients({
    massKg,
    axles: w.axles,
    b: w.davisB ?? DAVIS_DEFAULTS.wagon.b,
    k: w.davisK ?? DAVIS_DEFAULTS.wagon.k,
    frontalAreaM2: w.frontalAreaM2,
  });
  const permille = w.startingResistancePermille ?? breakawayResistancePermille(train.bearing, temperatureC);
  const gamma = w.rotatingMassFraction ?? wagonRotatingFraction(massKg, w.axles);
  return {
    kind: "wagon",
    index: 0,
    massKg,
    effectiveMassKg: massKg * (1 + gamma),
    lengthM,
    axles: w.axles,
    davis,
    breakawayN: atRestN(davis, w.startingResistancePermille, permille, massKg),
    centreChainageM: 0,
  };
}

/**
 * Resistance at rest, N: a measured override (‰ of weight) is taken as given; otherwise the bearing's
 * breakaway value, never below the running resistance at rest.
 */
function atRestN(davis: DavisCoefficients, override: number | undefined, permille: number, massKg: number): number {
  if (override !== undefined) return (override / 1000) * massKg * GRAVITY_MPS2;
  return Math.max(davis.aN, (permille / 1000) * massKg * GRAVITY_MPS2);
}

function makeLoco(spec: LocomotiveSpec, temperatureC: number): Vehicle {
  const davis = davisCoefficients({
    massKg: spec.massKg,
    axles: spec.axles,
    b: DAVIS_DEFAULTS.locomotive.b,
    k: DAVIS_DEFAULTS.locomotive.k,
    frontalAreaM2: spec.frontalAreaM2,
  });
  // Locomotives run on roller bearings.
  const permille = spec.startingResistancePermille ?? breakawayResistancePermille("roller", temperatureC);
  return {
    kind: "locomotive",
    index: 0,
    massKg: spec.massKg,
    effectiveMassKg: spec.massKg * (1 + spec.rotatingMassFraction),
    lengthM: spec.lengthM,
    axles: spec.axles,
    davis,
    breakawayN: atRestN(davis, spec.startingResistancePermille, permille, spec.massKg),
    loco: spec,
    centreChainageM: 0,
  };
}

/** Default locomotive frontal area, m² (110 ft²) [M: Davis 1926]. */
export const DEFAULT_LOCO_FRONTAL_AREA_M2 = DAVIS_DEFAULTS.locomotive.frontalAreaFt2 * M_PER_FT * M_PER_FT;
/** Default wagon frontal area, m² (88 ft²) [M: Davis 1926]. */
export const DEFAULT_WAGON_FRONTAL_AREA_M2 = DAVIS_DEFAULTS.wagon.frontalAreaFt2 * M_PER_FT * M_PER_FT;
