/**
 * Output shapes (INTERFACE.md "Output of taut plan"): the core's SI results expressed with units in
 * field names, rounded for people and scripts. Add fields freely; never rename.
 */
import { caseCautions, STANDARD_CAUTIONS, type Caution } from "../core/planner/cautions.js";
import { cautionText } from "../i18n/render.js";
import { groupName, helperCallText, stepWhyText } from "../i18n/renderLines.js";
import { adviceText, bandWhatText, limitWhatText, vehicleText } from "../i18n/renderAdvice.js";
import { slipGuidanceText } from "../i18n/renderSlip.js";
import { sensitivityChangeText } from "../i18n/renderSensitivity.js";
import { ENGLISH, ENGLISH_SI, lineReport } from "./lineReport.js";
import type { GroupPlace } from "../core/planner/lines.js";
import type { PlanResult, PlanStep, SlipGuidance } from "../core/planner/types.js";
import type { StaticCheck } from "../core/planner/staticCheck.js";
import type { LimitCheck, LimitName, Reason, StartKind, Verdict } from "../core/planner/outcome.js";
import type { StartCase } from "../core/train/types.js";
import { roundHalfAway } from "./numbers.js";

export type Phase = "prepare" | "stretch" | "build" | "accelerate";

export interface StepReport {
  phase: Phase;
  notch: number;
  advanceWhen: { after_s: number; moved_m: number; speed_kmh: number; primary?: "time" | "moved" | "speed" | "target" };
  speed_kmh: number;
  tractiveEffort_kN: number;
  adhesionUse: number;
  /** Where adhesionUse (the step's highest) was reached: locomotive speed and tractive effort there. */
  adhesionUseAt_kmh?: number;
  adhesionUseEffort_kN?: number;
  slipRisk: number;
  /** The notch asks for more than the rail the plan assumes gives: the slip protection is expected to act. */
  protectionActs?: boolean;
  peakCouplerForce_kN: number;
  fallbackNotch: number;
  why: string;
  /** The why line as codes with figures (src/core/planner/lines.ts StepWhy, figures named with report units). */
  whyCode?: unknown;
  /** With several control groups: each group's notch (head first; `notch` is the head's), its share of the effort, and how a helper follows (`place`, `coordinationCode`: the same as codes). */
  groups?: Array<{ name: string; place?: GroupPlace; control: "with-head" | "remote" | "helper"; notch: number; effortShare: number; coordination?: string; coordinationCode?: unknown }>;
}

/** One limit of the decision: demand against allowance, with units in the names. */
export interface LimitReport {
  name: LimitName;
  reason: Reason;
  level: "within" | "soft" | "over";
  margin: number;
  /** Demand and allowance in the unit named (kN, m or s). */
  unit: "kN" | "m" | "s" | "ratio";
  demand: number;
  allowance: number;
  /** Exceeding the allowance is marginal while the band's allowance covers its demand; absent when the limit has no band. */
  band?: { demand: number; allowance: number; what: string; whatCode?: unknown };
  what: string;
  /** `what` as a code with its figures (src/core/planner/limitLines.ts, figures named with report units). */
  whatCode?: unknown;
}

export interface AssistanceReport {
  /** What is added, e.g. "1 × illustrative-6axle-3000". */
  add: string;
  /** Where, e.g. "rear", "head", "after wagon 30", "after wagon 30 + rear". */
  position: string;
  verdict: Verdict;
  peakCouplerForce_kN: number;
  timeToTarget_s?: number | null;
  peakCompression_kN?: number;
  reasons?: Reason[];
  margin?: number;
  /** Units added. */
  units?: number;
  /** The added units as start-case entries (paste into `locomotives` to plan the option). */
  locomotives?: Array<{ profile: string; count: number; position: "head" | "rear" | { afterWagon: number }; control?: "with-head" | "remote" | "helper" }>;
  /** Coupling (1 = behind the first vehicle) of the peak compression, and how many couplings there are. */
  peakCompressionAt?: { coupling: number; of: number };
  /** Largest compression in the front quarter of the couplings. */
  headCompression_kN?: number;
  /** What to watch with this option. */
  note?: string;
  /** `note` as a code with its figures (src/core/dispatch/assistance.ts AssistanceNote, report units). */
  noteCode?: unknown;
  /** Each control group's notch and share of the effort in the option's running step. */
  effortSplit?: Array<{ name: string; place?: GroupPlace | "all"; notch: number; share: number }>;
}

/** Dividing the train: the largest first part that starts with the train's own locomotives. */
export interface DivideReport {
  firstPart: { wagons: number; trailingMass_t: number; length_m: number };
  remaining: { wagons: number; trailingMass_t: number };
  /** Trips if every trip takes a part of this size (a guide: the rest stands on other track). */
  trips: number;
  /** The most parts dividing may make (the case's setting). */
  maxParts?: number;
  /** "starts" when a full plan confirmed the first part; null when only a verdict run judged it. */
  verdict: Verdict | null;
  peakCouplerForce_kN: number | null;
  timeToTarget_s: number | null;
}

/** How far the assistance search went. */
export interface AssistanceSearchReport {
  /** Profile the options add. */
  profile: string;
  /** Planner runs used, and the cap. */
  plannerRuns: number;
  budget: number;
  /** False when the cap stopped the search before every candidate was judged. */
  complete: boolean;
  /** Options judged and ruled out, with the verdict that ruled each out. */
  ruledOut: Array<{ add: string; position: string; verdict: Verdict; reasons: Reason[]; by: "static" | "planner" }>;
}

export interface PlanReport {
  schema: "taut/plan@1";
  /** The case planned; `overrides` are the command line's changes to it (rail, sand, mass, grade). */
  case: { id?: string; label?: string; illustrative?: boolean; overrides?: { rail?: string; sand?: boolean; trailingMass_t?: number; gradient_permille?: number } };
  verdict: Verdict;
  reasons: Reason[];
  /** The binding limit's margin (allowance ÷ demand, the smallest of all); starts ⇔ margin ≥ 1. */
  margin: number;
  /** The limit the margin is of. */
  binding?: LimitName;
  /** The smallest margin of each reason (99 when not in question). */
  margins: { adhesion: number; power: number; coupler: number; distance: number; brake?: number };
  /** Every limit of the decision (How Taut decides, README). */
  limits?: LimitReport[];
  /** Power start, or a start gravity makes once the brakes are eased. */
  startKind?: StartKind;
  /** Quantile of the rail condition the steps assume. */
  planAdhesionQuantile?: number;
  /** Why the verdict is what it is and what would change it (empty when it starts). */
  advice?: string[];
  /** `advice` as codes with their figures (src/core/planner/lines.ts AdviceLine, report units). */
  adviceCodes?: unknown[];
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
  /** The train's own trailing mass, to 0.1 t (beside the largest masses: starts ⇔ it is at most `maxStartableMass_t`). */
  trailingMass_t?: number;
  maxStartableMass_t: number;
  /** Largest trailing mass that is at least marginal. */
  largestMarginalMass_t?: number;
  /** Where the mass search stops (250 t a wagon): a largest mass this high means no limit below it. */
  massSearchCeiling_t?: number;
  assistance: AssistanceReport[];
  /** When no assistance option within two added units works: dividing the train. */
  divide?: DivideReport | null;
  assistanceSearch?: AssistanceSearchReport;
  /** Verdict and margins for every rail condition, without and with sand (`taut plan --conditions`). */
  byCondition?: ConditionMarginReport[];
  /** The cautions in English (the same in every language of the command line; `cautionCodes` carries them as codes). */
  cautions: string[];
  /** The cautions as codes with their figures, in the order of `cautions`. */
  cautionCodes: CautionReport[];
  /** What to do if the wheels slip (`driver`, in order), why (`protection`: what the locomotive does) and if the train stalls. */
  ifWheelsSlip?: { driver: string[]; protection: string[]; stall: string[] };
  /** The same card as codes (src/core/planner/lines.ts). */
  ifWheelsSlipCodes?: SlipGuidance;
  /** With wagon groups: what the largest-mass search scales. */
  massSearchScales?: string;
  /** The highest wheel-climb L/V of the planned start (when units push or the train is mixed, and a coupling was in buff on a curve). */
  wheelClimb?: { ratio: number; allowance: number; nadalLimit: number; vehicle: string; vehicleCode?: unknown; buff_kN: number; curveRadius_m: number };
  /** The stretch as the dynamics run showed it. */
  stretch?: { lastVehicleMoves_s: number | null; locoTravelToStretch_m: number | null; maxRunOut_kmh: number };
  /** Which input moves the margin most, largest first. */
  sensitivity?: Array<{ input: string; change: string; marginBefore: number; marginAfter: number; stretchTravelChange_m: number }>;
  /** The verifying re-run with pessimistic adhesion. */
  verification?: { adhesionQuantile: number; slipEvents: number; peakCouplerForce_kN: number; passed: boolean } | null;
}

/** A limit with units in names. */
export function limitReport(l: LimitCheck): LimitReport {
  const k = l.unit === "N" ? 1000 : 1;
  const val = (x: number) => r(x / k, l.unit === "s" ? 0 : l.unit === "ratio" ? 2 : 1);
  return {
    name: l.name,
    reason: l.reason,
    level: l.level,
    margin: r(l.margin, 3),
    unit: l.unit === "N" ? "kN" : l.unit,
    demand: val(l.demand),
    allowance: val(l.allowance),
    ...(l.band ? { band: { demand: val(l.band.demand), allowance: val(l.band.allowance), what: bandWhatText(ENGLISH, l.band.what), whatCode: l.band.what } } : {}),
    what: limitWhatText(ENGLISH, ENGLISH_SI, l.what),
    whatCode: lineReport(l.what),
  };
}

export interface ConditionMarginReport {
  rail: string;
  sand: boolean;
  verdict: Verdict;
  reasons: Reason[];
  margin: number;
  margins: { adhesion: number; power: number; coupler: number; distance: number; brake?: number };
  limitedBy: Reason;
  /** The limit whose margin is given. */
  binding?: LimitName;
}

/** Round to a number of decimals (for output only), half away from zero as every figure is (numbers.ts). */
export const r = (x: number, decimals = 1): number => roundHalfAway(x, decimals);
const kN = (n: number, d = 1): number => r(n / 1000, d);
/**
 * A force the readable plan prints as whole kN beside the same force in a line's code (limits, why lines):
 * carried unrounded, so the text rounds it once from the SI value, as the lines do (rounding.ts), and never
 * prints 207 kN in the header against 206 kN in the limits for a 206.46 kN force.
 */
const kNExact = (n: number): number => n / 1000;

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
      starting: kNExact(s.resistance.startingN),
      grade: kNExact(s.resistance.gradeN),
      curve: kNExact(s.resistance.curveN),
      running: kNExact(s.resistance.runningN),
      total: kNExact(s.resistance.totalN),
    },
    adhesion: {
      mu: r(mu, 4),
      muDesign: r(muDesign, 4),
      slipRiskThreshold: c.settings.slipRiskThreshold,
      maxTractiveEffort_kN: kNExact(s.adhesionLimitN),
      medianTractiveEffort_kN: kNExact(s.locos.reduce((t, l) => t + l.medianLimitN, 0)),
      requiredTractiveEffort_kN: kNExact(s.requiredN),
      slipRiskAtStart: s.slipRiskAtStart,
    },
    steps: [],
    peakCouplerForce_kN: kNExact(s.peakTensionN),
    timeToTarget_s: null,
    trailingMass_t: r(c.train.trailingMassKg / 1000, 1),
    maxStartableMass_t: Number.isFinite(maxStartableMassKg) ? Math.floor(maxStartableMassKg / 1000) : 0,
    assistance: [],
    cautions: cautionsInEnglish([...STANDARD_CAUTIONS, ...caseCautions(c, s.resistance.totalN)]),
    cautionCodes: [...STANDARD_CAUTIONS, ...caseCautions(c, s.resistance.totalN)].map(cautionReport),
  };
}

const kmh = (mps: number, d = 1): number => r(mps * 3.6, d);

export function stepReport(s: PlanStep): StepReport {
  return {
    phase: s.phase,
    notch: s.notch,
    advanceWhen: { after_s: r(s.advanceWhen.afterS, 0), moved_m: r(s.advanceWhen.movedM, 1), speed_kmh: kmh(s.advanceWhen.speedMps), primary: s.advanceWhen.primary },
    speed_kmh: kmh(s.speedMps),
    tractiveEffort_kN: kN(s.tractiveEffortN, 0),
    adhesionUse: s.adhesionUse,
    adhesionUseAt_kmh: kmh(s.adhesionUseAt.speedMps),
    adhesionUseEffort_kN: kN(s.adhesionUseAt.tractiveEffortN, 0),
    slipRisk: s.slipRisk,
    protectionActs: s.protectionActs,
    peakCouplerForce_kN: kN(s.peakCouplerForceN, 0),
    fallbackNotch: s.fallbackNotch,
    why: stepWhyText(ENGLISH, ENGLISH_SI, s.why),
    whyCode: lineReport(s.why),
    ...(s.groups
      ? {
          groups: s.groups.map((g) => ({
            name: groupName(ENGLISH, g.place),
            place: g.place,
            control: g.control,
            notch: g.notch,
            effortShare: r(g.effortShare, 3),
            ...(g.coordination ? { coordination: helperCallText(ENGLISH, g.coordination), coordinationCode: lineReport(g.coordination) } : {}),
          })),
        }
      : {}),
  };
}

/** A caution as a code, with its figures named with their units. */
export interface CautionReport {
  code: Caution["code"];
  steps?: number;
  standstill?: boolean;
  hold_s?: number;
}

export function cautionReport(c: Caution): CautionReport {
  if (c.code === "protection-acts") return { code: c.code, steps: c.steps, standstill: c.standstill };
  if (c.code === "heating") return { code: c.code, hold_s: r(c.holdS, 0) };
  return { code: c.code };
}

/** A caution back from its report (the command line writes the report's cautions in its language). */
export function cautionOf(x: CautionReport): Caution {
  if (x.code === "protection-acts") return { code: x.code, steps: x.steps ?? 1, standstill: x.standstill === true };
  if (x.code === "heating") return { code: x.code, holdS: x.hold_s ?? 0 };
  return { code: x.code };
}

/** The English text of the cautions, as reports carry them. */
export function cautionsInEnglish(cs: readonly Caution[]): string[] {
  return cs.map((c) => cautionText(ENGLISH, c));
}

/** The plan report (INTERFACE.md) from the planner's result. */
export function planReport(c: StartCase, p: PlanResult, meta: PlanReport["case"] = {}): PlanReport {
  const rep = staticReport(c, p.static, p.maxStartableMassKg, meta);
  rep.verdict = p.verdict;
  rep.reasons = p.reasons;
  rep.margin = r(p.margin, 3);
  rep.binding = p.binding;
  rep.margins = { adhesion: r(p.margins.adhesion, 3), power: r(p.margins.power, 3), coupler: r(p.margins.coupler, 3), distance: r(p.margins.distance, 3), brake: r(p.margins.brake, 3) };
  rep.limits = p.limits.map(limitReport);
  rep.startKind = p.startKind;
  rep.planAdhesionQuantile = r(p.planQuantile, 3);
  rep.advice = p.advice.map((a) => adviceText(ENGLISH, ENGLISH_SI, a));
  rep.adviceCodes = p.advice.map(lineReport);
  if (Number.isFinite(p.largestMarginalMassKg)) rep.largestMarginalMass_t = Math.floor(p.largestMarginalMassKg / 1000);
  rep.massSearchCeiling_t = Math.floor(p.massSearchCeilingKg / 1000);
  if (c.train.groups) rep.massSearchScales = "the load above tare of every wagon group, in proportion";
  rep.steps = p.steps.map(stepReport);
  rep.peakCouplerForce_kN = kNExact(p.peakCouplerForceN);
  if (p.wheelClimb) {
    const w = p.wheelClimb;
    rep.wheelClimb = { ratio: r(w.ratio, 3), allowance: r(w.allowance, 3), nadalLimit: r(w.nadalLimit, 3), vehicle: vehicleText(ENGLISH, ENGLISH_SI, w.vehicle), vehicleCode: lineReport(w.vehicle), buff_kN: kNExact(w.forceN), curveRadius_m: r(w.radiusM, 0) };
  }
  rep.timeToTarget_s = p.timeToTargetS === null ? null : r(p.timeToTargetS, 0);
  rep.cautions = cautionsInEnglish(p.cautions);
  rep.cautionCodes = p.cautions.map(cautionReport);
  rep.ifWheelsSlip = slipGuidanceText(ENGLISH, p.slipGuidance);
  rep.ifWheelsSlipCodes = p.slipGuidance;
  rep.stretch = {
    lastVehicleMoves_s: p.stretch.lastVehicleMovesS === null ? null : r(p.stretch.lastVehicleMovesS, 1),
    locoTravelToStretch_m: p.stretch.locoTravelToStretchM === null ? null : r(p.stretch.locoTravelToStretchM, 2),
    maxRunOut_kmh: kmh(p.stretch.maxRunOutMps, 2),
  };
  rep.sensitivity = p.sensitivity.map((x) => ({
    input: x.input,
    // `input` is the row's code already, its nudge a constant (core/planner/sensitivity.ts SENSITIVITY_NUDGES):
    // the JSON stays as it was, `change` its English words.
    change: sensitivityChangeText(ENGLISH, x.change),
    marginBefore: r(x.marginBefore, 3),
    marginAfter: r(x.marginAfter, 3),
    stretchTravelChange_m: r(x.stretchTravelChangeM, 2),
  }));
  rep.verification = p.verification
    ? {
        adhesionQuantile: r(p.verification.adhesionQuantile, 3),
        slipEvents: p.verification.slipEpisodes,
        peakCouplerForce_kN: kN(p.verification.peakCouplerForceN),
        passed: !p.verification.slipped && !p.verification.overAllowance,
      }
    : null;
  return rep;
}
