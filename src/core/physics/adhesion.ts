/**
 * Wheel–rail adhesion: the Curtius–Kniffler speed dependence, rail conditions with sand,
 * the lognormal spread of real adhesion, and slip risk as a probability.
 */
import { GRAVITY_MPS2 } from "./constants.js";
import { normalCdf, normalQuantile } from "./normal.js";
import type { AdhesionCondition, AdhesionTable, RailCondition } from "./types.js";

/**
 * Curtius–Kniffler dry-rail adhesion μ(v) = 7.5/(v + 44) + 0.161, v in km/h
 * [S: E. W. Curtius & A. Kniffler, Elektrische Bahnen 20 (1950) 201–210].
 */
export function curtiusKniffler(speedKmh: number): number {
  return 7.5 / (Math.abs(speedKmh) + 44) + 0.161;
}

/** Curtius–Kniffler μ(v)/μ(0): the shape applied to every rail condition's standstill value. */
export function adhesionSpeedFactor(speedMps: number): number {
  return curtiusKniffler(speedMps * 3.6) / curtiusKniffler(0);
}

/** The condition's adhesion at standstill, without or with sand. */
export function standstillMedian(cond: AdhesionCondition, sand: boolean): number {
  return sand ? cond.sanded : cond.median;
}

/** Median adhesion coefficient for a rail condition at a speed, m/s, with or without sand. */
export function medianAdhesion(table: AdhesionTable, rail: RailCondition, sand: boolean, speedMps: number): number {
  return standstillMedian(table[rail], sand) * adhesionSpeedFactor(speedMps);
}

/**
 * Probability that real adhesion μ (lognormal: median, σ of ln μ) is below the demanded μ_d:
 * Φ((ln μ_d − ln μ_median)/σ) [P: S. Johnsson, "Adhesion as a statistical problem", IMechE 1963].
 */
export function slipRisk(muDemand: number, muMedian: number, sigmaLn: number): number {
  if (muDemand <= 0) return 0;
  return normalCdf((Math.log(muDemand) - Math.log(muMedian)) / sigmaLn);
}

/** Adhesion coefficient exceeded with probability 1 − p (the p-quantile of the lognormal spread). */
export function adhesionQuantile(muMedian: number, sigmaLn: number, p: number): number {
  return muMedian * Math.exp(sigmaLn * normalQuantile(p));
}

/** Tractive effort a locomotive transmits at adhesion μ, N: u·μ·m_adh·g (u: adhesion utilisation). */
export function adhesionLimitN(adhesiveMassKg: number, utilisation: number, mu: number): number {
  return utilisation * mu * adhesiveMassKg * GRAVITY_MPS2;
}

/** The adhesion coefficient a locomotive demands to deliver `forceN`. */
export function demandedAdhesion(forceN: number, adhesiveMassKg: number, utilisation: number): number {
  return forceN / (utilisation * adhesiveMassKg * GRAVITY_MPS2);
}

/**
 * Slip risk after a slip has happened at demand μ_slip, for a lower demand μ_d: adhesion is then known
 * to be below μ_slip, so P(μ < μ_d | μ < μ_slip) = Φ(z_d)/Φ(z_slip). Used to choose the fallback notch.
 */
export function slipRiskAfterSlip(muDemand: number, muAtSlip: number, muMedian: number, sigmaLn: number): number {
  const atSlip = slipRisk(muAtSlip, muMedian, sigmaLn);
  if (atSlip <= 0) return 0;
  return Math.min(1, slipRisk(Math.min(muDemand, muAtSlip), muMedian, sigmaLn) / atSlip);
}
