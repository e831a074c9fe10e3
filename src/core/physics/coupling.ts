/**
 * Couplings between vehicles: free slack (a dead band), draft gear or buffers on each side
 * with loading/unloading hysteresis, an end stop once the travel is used, and light damping.
 * PHYSICS.md §4; connection law after C. Cole, ch. 9 in Iwnicki (ed.), Handbook of Railway
 * Vehicle Dynamics, 2006 [M].
 */
import type { CouplingKind } from "./types.js";

/**
 * One side of the connection (draft = tension, buff = compression). Loading curve with ξ = e/travel:
 * F_load(e) = F_rated·ξ·(a + (1 − a)·ξ): a = 1 is a linear spring, smaller a stiffens with travel the way
 * friction gears and buffers do (and costs no power function in the inner loop).
 */
export interface GearSide {
  /** Travel of the gear(s) in series before the end stop, m. */
  travelM: number;
  /** Loading force at full travel, N. */
  forceAtTravelN: number;
  /** Share of the linear term in the loading curve, 0..1 (1 = linear). */
  linearShare: number;
  /** Built-in spring preload, N: the side gives this force as soon as it is touched (over PRELOAD_RAMP_M). */
  preloadN?: number;
}

/**
 * A preload is taken up over this much deflection, m: a steep but finite rise, so the explicit integrator
 * stays stable (30 kN over 2 mm is 15 MN/m, below the gear change-over stiffness).
 */
export const PRELOAD_RAMP_M = 0.002;

export interface CouplingSpec {
  kind: CouplingKind;
  /** Free slack between fully bunched and fully stretched, m. */
  freeSlackM: number;
  draft: GearSide;
  buff: GearSide;
  /** Unloading force ÷ loading force at the same deflection (energy absorbed ≈ 1 − ratio per cycle). */
  unloadingRatio: number;
  /** Stiffness of the change-over between loading and unloading curves, N/m. */
  transitionStiffnessNPerM: number;
  /** Stiffness of the solid end stop beyond full travel, N/m. */
  endStopStiffnessNPerM: number;
  /** Viscous damping while the gear is engaged, N·s/m. */
  dampingNsPerM: number;
}

/**
 * Knuckle coupler with a friction draft gear in each vehicle (two in series per coupling): one certified
 * gear reaches 2.52 MN at 74 mm rated travel [P: maker's datasheet for an M-901E gear], so the pair reaches
 * 2.52 MN at 148 mm. Friction gears absorb ≈ 50–70 % of the energy per cycle [M]: unloading ratio 0.4.
 */
export function knuckleCoupling(freeSlackM: number): CouplingSpec {
  const side: GearSide = { travelM: 0.148, forceAtTravelN: 2.52e6, linearShare: 0.3 };
  return {
    kind: "knuckle",
    freeSlackM,
    draft: side,
    buff: side,
    unloadingRatio: 0.4,
    transitionStiffnessNPerM: 8e7,
    endStopStiffnessNPerM: 2e8,
    dampingNsPerM: 5e4,
  };
}

/**
 * Screw coupling with side buffers: almost no free slack once tightened (common practice); draw gear in
 * tension (category 1.0 MN, EN 15566 [S]); two buffer pairs in series in compression, 105 mm stroke each
 * (EN 15551 [S]), their springs pre-loaded so they push back at once when touched (30 kN [M]); buffers
 * return about half the energy [M].
 */
export function screwCoupling(freeSlackM: number): CouplingSpec {
  return {
    kind: "screw",
    freeSlackM,
    draft: { travelM: 0.1, forceAtTravelN: 1.0e6, linearShare: 0.6 },
    buff: { travelM: 0.21, forceAtTravelN: 1.0e6, linearShare: 0.1, preloadN: 30_000 },
    unloadingRatio: 0.5,
    transitionStiffnessNPerM: 8e7,
    endStopStiffnessNPerM: 2e8,
    dampingNsPerM: 5e4,
  };
}

/** Default coupling of a kind with the given free slack. */
export function couplingOfKind(kind: CouplingKind, freeSlackM: number): CouplingSpec {
  return kind === "knuckle" ? knuckleCoupling(freeSlackM) : screwCoupling(freeSlackM);
}

/** Loading force of one gear side at deflection e ≥ 0 (end stop not included), N. */
export function gearLoadingForceN(side: GearSide, deflectionM: number): number {
  const e = Math.max(deflectionM, 0);
  const xi = Math.min(e / side.travelM, 1);
  const preload = (side.preloadN ?? 0) * Math.min(e / PRELOAD_RAMP_M, 1);
  return preload + side.forceAtTravelN * xi * (side.linearShare + (1 - side.linearShare) * xi);
}

/** Deflection of one gear side under a steady loading force, m: the inverse of the (monotonic) loading curve. */
export function gearDeflectionM(side: GearSide, forceN: number): number {
  if (forceN <= 0) return 0;
  if (forceN >= gearLoadingForceN(side, side.travelM)) return side.travelM;
  let lo = 0;
  let hi = side.travelM;
  for (let k = 0; k < 60; k++) {
    const mid = 0.5 * (lo + hi);
    if (gearLoadingForceN(side, mid) < forceN) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}
