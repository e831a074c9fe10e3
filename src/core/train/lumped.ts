/**
 * Lumped wagons: a cheap stand-in for the train, for guiding a search only. Each run of wagons between
 * locomotives is cut into blocks of about `k` wagons, and each block becomes one body: masses, lengths, axles,
 * resistance (the Davis terms and the breakaway force, all absolute per vehicle) summed, so the whole train's
 * mass and resistance are the same. The couplings the block stands for act in series: the free slack and the
 * gears' travel add up (k times), the stiffnesses and the damping fall to 1/k at the same force, so the train's
 * stretch and its steady coupler forces are kept while the number of bodies falls about k-fold. (Common
 * practice in longitudinal train dynamics: a "lumped" or "reduced" model of a long train, with the caveat that
 * slack run-in peaks are not reproduced exactly — so such a model only says where to look; every answer Taut
 * gives comes from the full model.)
 *
 * Scoped: `withLumpedWagons(k, work)` makes every consist built during `work` a lumped one.
 */
import type { CouplingSpec, GearSide } from "../physics/coupling.js";
import type { Consist, Vehicle } from "./consistTypes.js";

let active = 1;

/** The wagons per body consists are built with now (1: every wagon its own body). */
export function lumpedWagons(): number {
  return active;
}

/** Run `work` with every consist built as lumped wagons, about `k` a body (k ≤ 1: as it is). */
export function withLumpedWagons<T>(k: number, work: () => T): T {
  const before = active;
  active = Math.max(1, Math.floor(k));
  try {
    return work();
  } finally {
    active = before;
  }
}

/** Couplings in series: `s` of them (s may be fractional: a block's inner couplings shared by its two ends). */
function inSeries(cpl: CouplingSpec, s: number): CouplingSpec {
  if (s === 1) return cpl;
  const side = (g: GearSide): GearSide => ({ ...g, travelM: g.travelM * s });
  return {
    ...cpl,
    freeSlackM: cpl.freeSlackM * s,
    draft: side(cpl.draft),
    buff: side(cpl.buff),
    transitionStiffnessNPerM: cpl.transitionStiffnessNPerM / s,
    endStopStiffnessNPerM: cpl.endStopStiffnessNPerM / s,
    dampingNsPerM: cpl.dampingNsPerM / s,
  };
}

function block(vs: readonly Vehicle[]): Vehicle {
  const first = vs[0]!;
  if (vs.length === 1) return { ...first };
  const sum = (f: (v: Vehicle) => number) => vs.reduce((s, v) => s + f(v), 0);
  const lengthM = sum((v) => v.lengthM);
  const front = first.centreChainageM + first.lengthM / 2;
  return {
    ...first,
    massKg: sum((v) => v.massKg),
    effectiveMassKg: sum((v) => v.effectiveMassKg),
    lengthM,
    axles: sum((v) => v.axles),
    davis: { aN: sum((v) => v.davis.aN), bNsPerM: sum((v) => v.davis.bNsPerM), cNs2PerM2: sum((v) => v.davis.cNs2PerM2) },
    breakawayN: sum((v) => v.breakawayN),
    centreChainageM: front - lengthM / 2,
  };
}

/** The consist with its wagons lumped about `k` a body (see the module's note); locomotives stay as they are. */
export function lumpedConsist(c: Consist, k: number): Consist {
  if (k <= 1) return c;
  const groups: Vehicle[][] = [];
  let run: Vehicle[] = [];
  const flush = () => {
    if (run.length === 0) return;
    const blocks = Math.ceil(run.length / k);
    let from = 0;
    for (let b = 0; b < blocks; b++) {
      const to = Math.round(((b + 1) * run.length) / blocks);
      groups.push(run.slice(from, to));
      from = to;
    }
    run = [];
  };
  for (const v of c.vehicles) {
    if (v.kind === "wagon") run.push(v);
    else {
      flush();
      groups.push([v]);
    }
  }
  flush();
  const vehicles = groups.map((g, i) => ({ ...block(g), index: i }));
  const couplings: CouplingSpec[] = [];
  for (let j = 0; j < vehicles.length - 1; j++) {
    // The link between two bodies and half the inner couplings of each.
    const s = 1 + (groups[j]!.length - 1) / 2 + (groups[j + 1]!.length - 1) / 2;
    couplings.push(inSeries(c.couplings[0]!, s));
  }
  return { ...c, vehicles, couplings, locoIndices: vehicles.filter((v) => v.kind === "locomotive").map((v) => v.index) };
}
