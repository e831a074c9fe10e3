/**
 * Tonnage ratings of the trade, kept apart from the start check: a running rating at continuous
 * tractive effort (gross trailing load), the ruling grade a train can climb, and the starting limit
 * mass. They use the same resistance functions as the rest of the core.
 */
import { GRAVITY_MPS2, KG_PER_SHORT_TON, NEWTONS_PER_LBF } from "../physics/constants.js";

/** Locomotive's own resistance in the rating rule: 20 lb per short ton [P: US Army TR 0603 §2.18], N/kg. */
const RATING_LOCO_RESISTANCE_N_PER_KG = (20 * NEWTONS_PER_LBF) / KG_PER_SHORT_TON;

/** Drawbar pull for rating: tractive effort less 20 lb per short ton of locomotive [P: TR 0603 §2.18], N. */
export function ratingDrawbarPullN(tractiveEffortN: number, locoMassKg: number): number {
  return tractiveEffortN - RATING_LOCO_RESISTANCE_N_PER_KG * locoMassKg;
}

/**
 * Gross trailing load, kg: drawbar pull × weather factor ÷ the sum of specific resistances (each as force
 * per unit weight, N/N) [P: TR 0603 §2.10–2.11: GTL = DBP·W/(RR + GR + CR)].
 */
export function grossTrailingLoadKg(drawbarPullN: number, weatherFactor: number, specificResistances: readonly number[]): number {
  const perWeight = specificResistances.reduce((s, r) => s + r, 0);
  return (drawbarPullN * weatherFactor) / (perWeight * GRAVITY_MPS2);
}

/**
 * Steepest grade a train can hold its speed on, ‰: solve m·g·(sin(atan i) + r) = F for i, where r is the
 * rolling resistance per unit weight. Exact form of TI 850-02 Eq. 3-3 (G = TE/(20·W) − 0.15 in US units).
 */
export function rulingGradePermille(tractiveEffortN: number, totalMassKg: number, rollingPerWeight: number): number {
  const sinTheta = tractiveEffortN / (totalMassKg * GRAVITY_MPS2) - rollingPerWeight;
  if (sinTheta <= -1 || sinTheta >= 1) throw new RangeError("no grade balances this effort");
  return Math.tan(Math.asin(sinTheta)) * 1000;
}

/** Rating tons a drawbar pull handles at a given resistance per rating ton [P: W. L. Webb, Railroad Construction, §212]. */
export function ratingTons(drawbarPullN: number, resistancePerRatingTonN: number): number {
  return drawbarPullN / resistancePerRatingTonN;
}
