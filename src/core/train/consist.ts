/**
 * The consist: locomotives and wagons placed vehicle by vehicle, head to tail, on the track profile,
 * each with its own mass, resistance coefficients and coupling to the next.
 */
import { couplingOfKind, type CouplingSpec } from "../physics/coupling.js";
import { DAVIS_DEFAULTS, breakawayResistancePermille, davisCoefficients, type DavisCoefficients } from "../physics/resistance.js";
import { GRAVITY_MPS2 } from "../physics/constants.js";
import { controlOf, type LocoGroup, type StartCase, type TrainSpec } from "./types.js";
import type { LocomotiveSpec, WagonSpec } from "../physics/types.js";
import { placedWagons } from "./groups.js";
import { lumpedConsist, lumpedWagons } from "./lumped.js";

export type { Consist, ControlGroup, Vehicle } from "./consistTypes.js";
import type { Consist, ControlGroup, Vehicle } from "./consistTypes.js";

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

/** Place the locomotives and wagons of a case on its track, head first (as lumped wagons inside `withLumpedWagons`). */
export function buildConsist(c: StartCase): Consist {
  const k = lumpedWagons();
  return k > 1 ? lumpedConsist(placedConsist(c), k) : placedConsist(c);
}

function placedConsist(c: StartCase): Consist {
  const order = placedOrder(c.locomotives, c.train.wagons);
  const wagons = placedWagons(c.train);
  const vehicles: Vehicle[] = [];
  const unitEntry: number[] = [];
  let front = c.location.frontAtM;
  let wagonNo = 0;
  for (const item of order) {
    let v: Vehicle;
    if (item === "wagon") {
      const w = wagons[wagonNo++]!;
      v = makeWagon(c.train, w.wagon, w.massKg, w.lengthM, c.conditions.temperatureC);
      v.wagonNumber = wagonNo;
      v.wagon = w.wagon;
    } else {
      v = makeLoco(item.spec, c.conditions.temperatureC);
      unitEntry.push(item.entry);
    }
    v.index = vehicles.length;
    v.centreChainageM = front - v.lengthM / 2;
    front -= v.lengthM;
    vehicles.push(v);
  }
  const couplings: CouplingSpec[] = [];
  for (let j = 0; j < vehicles.length - 1; j++) couplings.push(couplingOfKind(c.train.coupling, c.train.couplerSlackM));
  const { controlGroups, unitGroup } = controlGroupsOf(c.locomotives, unitEntry);
  return {
    vehicles,
    couplings,
    locoIndices: vehicles.filter((v) => v.kind === "locomotive").map((v) => v.index),
    lengthM: c.location.frontAtM - front,
    wagonMassKg: c.train.trailingMassKg / c.train.wagons,
    controlGroups,
    unitGroup,
  };
}

/**
 * The control groups of the units, given the case entry each unit (head to tail) comes from. The lead
 * unit's entry and every `with-head` entry form the head's group, whatever their own setting: the head
 * cab's notch is theirs. Every other entry is a group of its own, in the order the case lists them.
 */
function controlGroupsOf(entries: readonly LocoGroup[], unitEntry: readonly number[]): { controlGroups: ControlGroup[]; unitGroup: number[] } {
  const lead = unitEntry[0] ?? 0;
  const groupOfEntry: number[] = entries.map((g, e) => (e === lead || controlOf(g) === "with-head" ? 0 : -1));
  const controlGroups: ControlGroup[] = [{ control: "with-head", position: entries[lead]?.position ?? "head", units: [] }];
  entries.forEach((g, e) => {
    if (groupOfEntry[e] === 0) return;
    groupOfEntry[e] = controlGroups.length;
    controlGroups.push({ control: controlOf(g), position: g.position, units: [] });
  });
  const unitGroup = unitEntry.map((e) => groupOfEntry[e]!);
  unitGroup.forEach((g, k) => controlGroups[g]!.units.push(k));
  return { controlGroups, unitGroup };
}

/** Head-to-tail order: a locomotive spec per powered unit, "wagon" per wagon. */
export function vehicleOrder(groups: readonly LocoGroup[], wagons: number): Array<LocomotiveSpec | "wagon"> {
  return placedOrder(groups, wagons).map((x) => (x === "wagon" ? x : x.spec));
}

/** Head-to-tail order with the case entry of each unit. */
function placedOrder(groups: readonly LocoGroup[], wagons: number): Array<{ spec: LocomotiveSpec; entry: number } | "wagon"> {
  type Unit = { spec: LocomotiveSpec; entry: number };
  const head: Unit[] = [];
  const rear: Unit[] = [];
  const mid = new Map<number, Unit[]>();
  groups.forEach((g, entry) => {
    const units: Unit[] = Array.from({ length: g.count }, () => ({ spec: g.spec, entry }));
    if (g.position === "head") head.push(...units);
    else if (g.position === "rear") rear.push(...units);
    else {
      const after = g.position.afterWagon;
      if (!(after >= 1 && after < wagons)) throw new RangeError(`afterWagon ${after} outside 1..${wagons - 1}`);
      mid.set(after, [...(mid.get(after) ?? []), ...units]);
    }
  });
  const order: Array<Unit | "wagon"> = [...head];
  for (let w = 1; w <= wagons; w++) {
    order.push("wagon");
    order.push(...(mid.get(w) ?? []));
  }
  order.push(...rear);
  return order;
}

function makeWagon(train: TrainSpec, w: WagonSpec, massKg: number, lengthM: number, temperatureC: number): Vehicle {
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

/** The default frontal areas (kept with the Davis defaults, physics/davisDefaults.ts). */
export { DEFAULT_LOCO_FRONTAL_AREA_M2, DEFAULT_WAGON_FRONTAL_AREA_M2 } from "../physics/davisDefaults.js";
