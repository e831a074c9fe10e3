/**
 * Output shapes (INTERFACE.md "Output of taut plan"): the core's SI results expressed with units in
 * field names, rounded for people and scripts. Add fields freely; never rename.
 */
import { caseCautions, STANDARD_CAUTIONS } from "../core/cautions.js";
import type { StaticCheck } from "../core/staticCheck.js";
import type { Reason, StartCase, Verdict } from "../core/types.js";

export type Phase = "prepare" | "stretch" | "build" | "accelerate";

export interface StepReport {
  phase: Phase;
  notch: number;
  advanceWhen: { after_s: number; moved_m: number; speed_kmh: number; primary?: "time" | "moved" | "speed" | "target" };
  speed_kmh: number;
  tractiveEffort_kN: number;
  adhesionUse: number;
  slipRisk: number;
  peakCouplerForce_kN: number;
  fallbackNotch: number;
  why: string;
}

export interface AssistanceReport {
  add: string;
  position: string;
  verdict: Verdict;
  peakCouplerForce_kN: number;
  timeToTarget_s?: number | null;
  peakCompression_kN?: number;
}

export interface PlanReport {
  schema: "taut/plan@1";
  case: { id?: string; label?: string; illustrative?: boolean };
  verdict: Verdict;
  reasons: Reason[];
  /** Smallest of the margins (available ÷ needed). */
  margin: number;
  margins: { adhesion: number; power: number; coupler: number; distance: number };
  resistance_kN: { starting: number; grade: number; curve: number; running: number; total: number };
  adhesion: {
    mu: number;
    muDesign: number;
    slipRiskThreshold: number;
    maxTractiveEffort_kN: number;
    medianTractiveEffort_kN: number;
    requiredTractiveEffort_kN: number;
    slipRiskAtStart: number;
  };
  steps: StepReport[];
  peakCouplerForce_kN: number;
  timeToTarget_s: number | null;
  maxStartableMass_t: number;
  assistance: AssistanceReport[];
  cautions: string[];
}

/** Round to a number of decimals (for output only). */
export const r = (x: number, decimals = 1): number => {
  const f = 10 ** decimals;
  return Math.round(x * f) / f;
};
const kN = (n: number, d = 1): number => r(n / 1000, d);

/** The plan report from the static check alone (no steps). */
export function staticReport(c: StartCase, s: StaticCheck, maxStartableMassKg: number, meta: PlanReport["case"] = {}): PlanReport {
  const mu = s.locos[0]?.muMedian ?? 0;
  const muDesign = s.locos[0]?.muDesign ?? 0;
  return {
    schema: "taut/plan@1",
    case: meta,
    verdict: s.verdict,
    reasons: s.reasons,
    margin: r(s.margin, 3),
    margins: { adhesion: r(s.margins.adhesion, 3), power: r(s.margins.power, 3), coupler: r(s.margins.coupler, 3), distance: r(s.margins.distance, 3) },
    resistance_kN: {
      starting: kN(s.resistance.startingN),
      grade: kN(s.resistance.gradeN),
      curve: kN(s.resistance.curveN),
      running: kN(s.resistance.runningN),
      total: kN(s.resistance.totalN),
    },
    adhesion: {
      mu: r(mu, 4),
      muDesign: r(muDesign, 4),
      slipRiskThreshold: c.settings.slipRiskThreshold,
      maxTractiveEffort_kN: kN(s.adhesionLimitN),
      medianTractiveEffort_kN: kN(s.locos.reduce((t, l) => t + l.medianLimitN, 0)),
      requiredTractiveEffort_kN: kN(s.requiredN),
      slipRiskAtStart: r(s.slipRiskAtStart, 4),
    },
    steps: [],
    peakCouplerForce_kN: kN(s.peakTensionN),
    timeToTarget_s: null,
    maxStartableMass_t: Math.floor(maxStartableMassKg / 1000),
    assistance: [],
    cautions: [...STANDARD_CAUTIONS, ...caseCautions(c, s.resistance.totalN)],
  };
}
