/**
 * Slip episodes in a recording with notch and traction current: the current falls while the notch holds.
 * With the notch unchanged the excitation is unchanged, so a sudden fall of motor current means the wheels
 * have let go and the slip protection is cutting the effort (PHYSICS.md, wheel-slip protection; common
 * practice: a slipping unit shows as a dip on the ammeter). A slow fall is the power curve (current falls
 * as speed rises) and is not counted.
 */
import { demandedAdhesion } from "../physics/adhesion.js";
import { notchEffortN } from "../physics/traction.js";
import type { LocoGroup } from "../train/types.js";
import type { RecordingSample } from "./recording.js";

/** A fall of at least this fraction of the current… */
export const SLIP_DROP_FRACTION = 0.15;
/** …within this many seconds counts as a slip. */
export const SLIP_DROP_WITHIN_S = 3;

export interface SlipFromCurrent {
  startS: number;
  endS: number;
  notch: number;
  speedMps: number;
  /** Current before the fall and its lowest during the episode, A. */
  currentBeforeA: number;
  currentLowestA: number;
  /** Σ effort the notch asked for at that speed (model, with the effort factor), N. */
  effortN: number;
  /**
   * The adhesion the notch asked of the rail when the wheels let go: the rail gave less than this then. A
   * lower bound on the demand at that moment, and an upper bound on what the rail gave.
   */
  adhesionDemand: number;
}

/**
 * Find the slip episodes. An episode starts at a sample whose current is at least SLIP_DROP_FRACTION below
 * the highest current of the previous SLIP_DROP_WITHIN_S seconds at the same notch, and ends when the current
 * is back within that fraction of it, the notch changes, or the recording ends.
 */
export function slipsFromCurrent(samples: readonly RecordingSample[], locomotives: readonly LocoGroup[], effortFactor = 1): SlipFromCurrent[] {
  const out: SlipFromCurrent[] = [];
  let i = 1;
  while (i < samples.length) {
    const s = samples[i]!;
    const notch = s.notch ?? 0;
    if (notch <= 0 || s.currentA === undefined) {
      i++;
      continue;
    }
    let before = -Infinity;
    let beforeK = -1;
    for (let k = i - 1; k >= 0; k--) {
      const p = samples[k]!;
      if (s.timeS - p.timeS > SLIP_DROP_WITHIN_S || p.notch !== notch || p.currentA === undefined) break;
      if (p.currentA > before) {
        before = p.currentA;
        beforeK = k;
      }
    }
    if (beforeK < 0 || !(s.currentA <= (1 - SLIP_DROP_FRACTION) * before)) {
      i++;
      continue;
    }
    const onset = samples[beforeK]!;
    let lowest = s.currentA;
    let j = i;
    while (j + 1 < samples.length) {
      const q = samples[j + 1]!;
      if (q.notch !== notch || q.currentA === undefined || q.currentA > (1 - SLIP_DROP_FRACTION) * before) break;
      lowest = Math.min(lowest, q.currentA);
      j++;
    }
    const effortN = locomotives.reduce((sum, g) => sum + g.count * notchEffortN(g.spec, notch, onset.speedMps) * effortFactor, 0);
    const adhesiveKg = locomotives.reduce((sum, g) => sum + g.count * g.spec.adhesiveMassKg * g.spec.adhesionUtilisation, 0);
    out.push({
      startS: onset.timeS,
      endS: samples[Math.min(j + 1, samples.length - 1)]!.timeS,
      notch,
      speedMps: onset.speedMps,
      currentBeforeA: before,
      currentLowestA: lowest,
      effortN,
      // The units share the effort in proportion to their usable adhesive weight (they work in step).
      adhesionDemand: demandedAdhesion(effortN, adhesiveKg, 1),
    });
    i = j + 2;
  }
  return out;
}
