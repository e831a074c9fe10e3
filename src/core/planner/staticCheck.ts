/**
 * Static start check: the train's resistance at rest against the tractive effort the locomotives can
 * give (current limit and adhesion at the accepted slip risk), the quasi-static coupler loads, the
 * slack to take up against the distance clear ahead; margins, verdict and reasons.
 */
import { adhesionLimitN, adhesionQuantile, demandedAdhesion, slipRisk, standstillMedian } from "../physics/adhesion.js";
import { buildConsist, type Consist } from "../train/consist.js";
import { gearDeflectionM } from "../physics/coupling.js";
import { initialSlack } from "../train/slack.js";
import { resistanceAtStart, standingForces, type ResistanceAtStart, type StandingForces } from "../train/standing.js";
import { notchEffortN } from "../physics/traction.js";
import type { Reason, Verdict } from "./outcome.js";
import type { StartCase } from "../train/types.js";

/** Power reserve below which a start counts as marginal: resistance scatters by this much [M]. */
export const POWER_RESERVE = 1.1;

export interface LocoAdhesion {
  vehicleIndex: number;
  muMedian: number;
  /** Adhesion exceeded with probability 1 − slip-risk threshold. */
  muDesign: number;
  /** Full-notch starting tractive effort (current limit), N. */
  currentLimitN: number;
  /** What the rails transmit at μ_design, N. */
  designLimitN: number;
  medianLimitN: number;
}

export interface StaticCheck {
  resistance: ResistanceAtStart;
  locos: LocoAdhesion[];
  /** Tractive effort needed to start (total resistance at rest, ≥ 0), N. */
  requiredN: number;
  /** Σ min(current limit, adhesion at μ_design), N. */
  availableN: number;
  /** Σ full-notch current limits, N. */
  currentLimitN: number;
  /** Σ adhesion limits at μ_design, N. */
  adhesionLimitN: number;
  /** Slip risk when delivering the required effort (worst locomotive). */
  slipRiskAtStart: number;
  peakTensionN: number;
  peakCompressionN: number;
  /** Coupling index (0 = behind the first vehicle) of the peak tension. */
  peakTensionAt: number;
  /** Estimated locomotive travel until the last vehicle moves, m. */
  stretchTravelM: number;
  margins: { adhesion: number; power: number; coupler: number; distance: number };
  /** Smallest of the adhesion, power and coupler margins (available ÷ needed). */
  margin: number;
  verdict: Verdict;
  reasons: Reason[];
}

/** Margins are capped here so that "no load" does not print as infinity. */
const MAX_MARGIN = 99;

/** Run the static check on a start case. */
export function staticCheck(c: StartCase): StaticCheck {
  const consist = buildConsist(c);
  const forces = standingForces(consist, c.location.track);
  return staticCheckOf(c, consist, forces);
}

export function staticCheckOf(c: StartCase, consist: Consist, forces: StandingForces): StaticCheck {
  const resistance = resistanceAtStart(forces);
  const threshold = c.settings.slipRiskThreshold;
  const locos = consist.locoIndices.map((i) => locoAdhesion(c, consist, i, threshold));
  const requiredN = Math.max(0, resistance.totalN);
  const available = locos.map((l) => Math.min(l.currentLimitN, l.designLimitN));
  const availableN = sum(available);
  const currentLimitN = sum(locos.map((l) => l.currentLimitN));
  const adhesionLimit = sum(locos.map((l) => l.designLimitN));

  // Each unit takes its share of the required effort in proportion to what it can give.
  const shares = available.map((a) => (availableN > 0 ? (requiredN * a) / availableN : 0));
  const slipRiskAtStart = Math.max(
    0,
    ...locos.map((l, k) => {
      const v = consist.vehicles[l.vehicleIndex]!;
      const spec = v.loco!;
      return slipRisk(demandedAdhesion(shares[k]!, spec.adhesiveMassKg, spec.adhesionUtilisation), l.muMedian, sigmaOf(c));
    }),
  );

  const effort = new Float64Array(consist.vehicles.length);
  locos.forEach((l, k) => (effort[l.vehicleIndex] = shares[k]!));
  const coupler = quasiStaticCouplerForces(forces, effort);
  const slack = initialSlack(consist, c.location.track, c.train.slackState);
  let stretchTravelM = 0;
  consist.couplings.forEach((cp, j) => {
    if (slack[j]! < 0) stretchTravelM += cp.freeSlackM;
    stretchTravelM += gearDeflectionM(cp.draft, coupler.tensionN[j]!);
  });

  const limit = c.train.couplerLimitN;
  const working = limit / c.settings.couplerSafetyFactor;
  const margins = {
    adhesion: ratio(adhesionLimit, requiredN),
    power: ratio(currentLimitN, requiredN),
    coupler: ratio(working, coupler.peakTensionN),
    distance: ratio(c.location.clearAheadM, stretchTravelM),
  };
  const levels: Array<[Reason, 0 | 1 | 2]> = [
    ["adhesion", slipRiskAtStart > 0.5 ? 2 : slipRiskAtStart > threshold ? 1 : 0],
    ["power", margins.power < 1 ? 2 : margins.power < POWER_RESERVE ? 1 : 0],
    ["coupler", coupler.peakTensionN > limit ? 2 : coupler.peakTensionN > working ? 1 : 0],
    ["distance", stretchTravelM > c.location.clearAheadM ? 2 : targetBeyondClear(c) ? 1 : 0],
  ];
  const worst = Math.max(...levels.map(([, l]) => l));
  const verdict: Verdict = worst === 2 ? "needs-assistance" : worst === 1 ? "marginal" : "starts";
  return {
    resistance,
    locos,
    requiredN,
    availableN,
    currentLimitN,
    adhesionLimitN: adhesionLimit,
    slipRiskAtStart,
    peakTensionN: coupler.peakTensionN,
    peakCompressionN: coupler.peakCompressionN,
    peakTensionAt: coupler.peakTensionAt,
    stretchTravelM,
    margins,
    margin: Math.min(margins.adhesion, margins.power, margins.coupler),
    verdict,
    reasons: levels.filter(([, l]) => l > 0 && l === worst).map(([r]) => r),
  };
}

function targetBeyondClear(c: StartCase): boolean {
  return c.target.kind === "distance" && c.target.distanceM > c.location.clearAheadM;
}

function sigmaOf(c: StartCase): number {
  return c.adhesion[c.conditions.rail].sigmaLn;
}

function locoAdhesion(c: StartCase, consist: Consist, vehicleIndex: number, threshold: number): LocoAdhesion {
  const spec = consist.vehicles[vehicleIndex]!.loco!;
  const cond = c.adhesion[c.conditions.rail];
  const muMedian = standstillMedian(cond, c.conditions.sand && spec.sanders);
  const muDesign = adhesionQuantile(muMedian, cond.sigmaLn, threshold);
  return {
    vehicleIndex,
    muMedian,
    muDesign,
    currentLimitN: notchEffortN(spec, spec.notchPower.length, 0),
    designLimitN: adhesionLimitN(spec.adhesiveMassKg, spec.adhesionUtilisation, muDesign),
    medianLimitN: adhesionLimitN(spec.adhesiveMassKg, spec.adhesionUtilisation, muMedian),
  };
}

/**
 * Coupler forces when every vehicle is at the point of moving: T_j = Σ_{i≤j} (F_i − R_i), where R_i is the
 * vehicle's breakaway, grade and curve resistance and F_i its tractive effort. Tension positive.
 */
export function quasiStaticCouplerForces(f: StandingForces, effortN: Float64Array) {
  const n = f.gradeN.length;
  const tensionN = new Float64Array(Math.max(0, n - 1));
  // Vehicles share the acceleration of the whole: with net force zero at breakaway, a = 0.
  let acc = 0;
  let peakTensionN = 0;
  let peakCompressionN = 0;
  let peakTensionAt = 0;
  for (let j = 0; j < n - 1; j++) {
    acc += effortN[j]! - f.breakawayN[j]! - f.gradeN[j]! - f.curveN[j]!;
    tensionN[j] = acc;
    if (acc > peakTensionN) {
      peakTensionN = acc;
      peakTensionAt = j;
    }
    if (-acc > peakCompressionN) peakCompressionN = -acc;
  }
  return { tensionN, peakTensionN, peakCompressionN, peakTensionAt };
}

function ratio(available: number, needed: number): number {
  if (needed <= 0) return MAX_MARGIN;
  return Math.min(MAX_MARGIN, available / needed);
}

function sum(a: readonly number[]): number {
  return a.reduce((s, x) => s + x, 0);
}
