/**
 * Mixed trains: wagon groups of their own type and load, in order from the head. A train of one type is
 * one group. When the trailing mass differs from the groups' sum (the largest-mass search, a sensitivity
 * nudge), the load above tare of every group is scaled in the same proportion: the empties stay empty and
 * the loaded wagons carry more or less.
 */
import type { WagonSpec } from "../physics/types.js";
import type { TrainSpec, WagonGroup } from "./types.js";

/** One wagon of the train: its type and mass, kg. */
export interface PlacedWagon {
  wagon: WagonSpec;
  massKg: number;
  lengthM: number;
}

/** The train's groups as given, or the one group of a train of one type. */
export function wagonGroups(train: TrainSpec): readonly WagonGroup[] {
  return train.groups ?? [{ wagons: train.wagons, wagon: train.wagon, massKg: train.trailingMassKg }];
}

/**
 * Each group's mass for the train's trailing mass, kg: the load above tare scaled in proportion so that the
 * sum is the trailing mass; below the groups' total tare, every group in proportion to its tare.
 */
export function groupMassesKg(train: TrainSpec): number[] {
  const groups = wagonGroups(train);
  const given = groups.reduce((s, g) => s + g.massKg, 0);
  const target = train.trailingMassKg;
  if (!train.groups || Math.abs(target - given) <= 1e-6 * Math.max(1, given)) return groups.map((g) => g.massKg);
  const tare = groups.map((g) => Math.min(g.massKg, (g.wagon.tareKg ?? 0) * g.wagons));
  const tareSum = tare.reduce((s, x) => s + x, 0);
  const load = given - tareSum;
  if (target >= tareSum && load > 0) {
    const k = (target - tareSum) / load;
    return groups.map((g, i) => tare[i]! + k * (g.massKg - tare[i]!));
  }
  const base = tareSum > 0 ? tare : groups.map((g) => g.massKg);
  const baseSum = base.reduce((s, x) => s + x, 0);
  return base.map((x) => (x * target) / baseSum);
}

/** The wagons head to tail, each with its type, mass and length over couplers. */
export function placedWagons(train: TrainSpec): PlacedWagon[] {
  if (!train.groups) {
    const massKg = train.trailingMassKg / train.wagons;
    const lengthM = train.lengthM / train.wagons;
    return Array.from({ length: train.wagons }, () => ({ wagon: train.wagon, massKg, lengthM }));
  }
  const masses = groupMassesKg(train);
  const out: PlacedWagon[] = [];
  train.groups.forEach((g, k) => {
    for (let w = 0; w < g.wagons; w++) out.push({ wagon: g.wagon, massKg: masses[k]! / g.wagons, lengthM: g.wagon.lengthM });
  });
  // A train divided into parts keeps its first `wagons` wagons (dividing cuts from the head).
  return out.slice(0, train.wagons);
}

/** The train's totals from its groups: wagons, trailing mass and length. */
export function groupTotals(groups: readonly WagonGroup[]): { wagons: number; trailingMassKg: number; lengthM: number } {
  let wagons = 0;
  let mass = 0;
  let length = 0;
  for (const g of groups) {
    wagons += g.wagons;
    mass += g.massKg;
    length += g.wagons * g.wagon.lengthM;
  }
  return { wagons, trailingMassKg: mass, lengthM: length };
}

/**
 * The first `wagons` wagons of a train as a train of their own (dividing a train): a mixed train keeps
 * the groups that fall in that part, each at its own mass per wagon.
 */
export function headPart(train: TrainSpec, wagons: number): TrainSpec {
  if (!train.groups) {
    const share = wagons / train.wagons;
    return { ...train, wagons, trailingMassKg: train.trailingMassKg * share, lengthM: train.lengthM * share };
  }
  const masses = groupMassesKg(train);
  const groups: WagonGroup[] = [];
  let left = wagons;
  train.groups.forEach((g, k) => {
    if (left <= 0) return;
    const take = Math.min(left, g.wagons);
    groups.push({ wagons: take, wagon: g.wagon, massKg: (masses[k]! * take) / g.wagons });
    left -= take;
  });
  return { ...train, groups, wagon: groups[0]!.wagon, ...groupTotals(groups) };
}
