/**
 * What the start planner returns, in SI. The CLI turns it into the INTERFACE.md JSON; the app formats
 * it for display in the chosen units.
 */
import type { Caution } from "./cautions.js";
import type { AdviceLine, GroupPlace, HelperCall, SlipDriverLine, SlipProtectionLine, SlipStallLine, StepWhy, VehicleRef } from "./lines.js";
import type { StaticCheck } from "./staticCheck.js";
import type { UnitControl } from "../train/types.js";
import type { LimitCheck, LimitName, Reason, StartKind, Verdict } from "./outcome.js";

export type Phase = "prepare" | "stretch" | "build" | "accelerate";

export type SensitivityInput = "mass" | "adhesion" | "grade" | "slack";

/**
 * A nudge as data, its size in SI (a fraction of the mass or of the adhesion, a gradient as a fraction, a
 * length per coupling in m): src/i18n/renderSensitivity.ts says it in words, in any language.
 */
export type SensitivityChange =
  | { code: "mass"; fraction: number }
  | { code: "adhesion"; fraction: number }
  | { code: "grade"; gradient: number }
  | { code: "slack"; perCouplingM: number };

/** One nudged input and what it does to the margin (sensitivity.ts). */
export interface SensitivityRow {
  input: SensitivityInput;
  /** The nudge, as a code with its size. */
  change: SensitivityChange;
  marginBefore: number;
  marginAfter: number;
  /** Change in locomotive travel needed to stretch the train, m (slack matters there, not in the margin). */
  stretchTravelChangeM: number;
}

/** What the driver watches for before moving to the next step. */
export type Trigger = "time" | "moved" | "speed" | "target";

export interface PlanStep {
  phase: Phase;
  notch: number;
  /** Observable conditions at which to advance; `primary` says which one leads. */
  advanceWhen: { afterS: number; movedM: number; speedMps: number; primary: Trigger };
  /** Seconds from the start of the plan at which the step begins. */
  startS: number;
  /** Locomotive speed expected when the step ends, m/s. */
  speedMps: number;
  /** Tractive effort demanded during the step (all powered units), N. */
  tractiveEffortN: number;
  /** Demanded ÷ median available adhesion (worst unit), 0..1: the highest during the step. */
  adhesionUse: number;
  /**
   * Where `adhesionUse` was reached: the locomotive speed and Σ effort the notch asked for there. Effort falls
   * with speed on the power curve and adhesion falls too, so the highest use need not be at the step's end,
   * where `tractiveEffortN` and `speedMps` are taken.
   */
  adhesionUseAt: { speedMps: number; tractiveEffortN: number };
  /** Probability that the rails give less than the notch asks (the slip protection acts), 0..1. */
  slipRisk: number;
  /** The notch asks more than the rail the plan assumes gives: the slip protection is expected to act. */
  protectionActs: boolean;
  /** Largest coupler force (tension) during the step, N. */
  peakCouplerForceN: number;
  /** Notch to drop to if the wheels slip in this step. */
  fallbackNotch: number;
  /** One plain line of physics saying why, as codes with figures (lines.ts; the words are in src/i18n). */
  why: StepWhy;
  /**
   * With several control groups: each group's notch, head first (the step's `notch` is the head's), the
   * share of the effort it gives, and for a helper how its driver follows the head's call.
   */
  groups?: GroupStep[];
}

/** One control group's part in a step. */
export interface GroupStep {
  /** Where the group is (the head, the rear, after a wagon) and whether it is a helper. */
  place: GroupPlace;
  control: UnitControl;
  notch: number;
  /** Share of the train's effort this group gives at the step's end, 0..1. */
  effortShare: number;
  /** For a helper whose notch changes in this step: who acts first and when the helper follows. */
  coordination?: HelperCall;
}

/**
 * The "If wheels slip" card: what the driver does, in order (read first); what the protection does (the
 * reason for holding the notch); what to do on a stall.
 */
export interface SlipGuidance {
  driver: SlipDriverLine[];
  protection: SlipProtectionLine[];
  stall: SlipStallLine[];
}

/** Time series of the verifying dynamics run, decimated for charts. */
export interface PlanSeries {
  timeS: Float64Array;
  speedMps: Float64Array;
  notch: Float64Array;
  locoTravelM: Float64Array;
  /** Largest coupler tension anywhere in the train at each sample, N. */
  maxTensionN: Float64Array;
}

export interface PlanResult {
  verdict: Verdict;
  reasons: Reason[];
  /** The binding limit's margin (allowance ÷ demand, the smallest of all); starts ⇔ margin ≥ 1. */
  margin: number;
  /** The limit whose margin is printed. */
  binding: LimitName;
  /** Every limit with its demand, allowance, margin and level (decision.ts). */
  limits: LimitCheck[];
  /** The smallest margin of each reason (99 when it is not in question). */
  margins: { adhesion: number; power: number; coupler: number; distance: number; brake: number };
  /** Power start, or a start gravity makes once the brakes are eased (falling grade). */
  startKind: StartKind;
  /** Quantile of the rail condition the shown plan assumes (the threshold, or the marginal bound). */
  planQuantile: number;
  /** Why the verdict is what it is and what would change it, as codes with figures (empty when it starts). */
  advice: AdviceLine[];
  static: StaticCheck;
  steps: PlanStep[];
  peakCouplerForceN: number;
  peakCompressionN: number;
  /** Peak tension of each coupling, head to tail, N. */
  couplerPeaksN: Float64Array;
  /** Peak compression of each coupling, head to tail, N. */
  couplerCompressionPeaksN: Float64Array;
  /** The highest wheel-climb L/V of the planned start (when the check is made and a coupling was in buff on a curve). */
  wheelClimb: { ratio: number; allowance: number; nadalLimit: number; vehicle: VehicleRef; forceN: number; radiusM: number } | null;
  /** Seconds from taking power to reaching the target; null when it is not reached. */
  timeToTargetS: number | null;
  /** Largest trailing mass (this train's wagons) that starts; NaN when not searched. */
  /** The train's own trailing mass, kg (beside the largest masses: starts ⇔ trailing ≤ largest startable). */
  trailingMassKg: number;
  maxStartableMassKg: number;
  /** Largest trailing mass that is at least marginal; NaN when not searched. */
  largestMarginalMassKg: number;
  /** The masses' search ceiling (250 t a wagon): a largest mass equal to it means no limit below it. */
  massSearchCeilingKg: number;
  slipGuidance: SlipGuidance;
  /** Codes with their figures; the words are in the message catalogs (src/i18n). */
  cautions: Caution[];
  series: PlanSeries;
  /**
   * The plan's notch timing re-run on the median rail (a better rail than the plan assumes passes more of
   * each notch into the couplers); null when there is no plan to verify or it was skipped.
   */
  verification: {
    adhesionQuantile: number;
    slipped: boolean;
    slipEpisodes: number;
    peakCouplerForceN: number;
    overAllowance: boolean;
    finalSpeedMps: number;
  } | null;
  /** Which input moves the margin most, largest effect first. */
  sensitivity: SensitivityRow[];
  /** How the stretch went in the planned run (times from taking power). */
  stretch: { lastVehicleMovesS: number | null; locoTravelToStretchM: number | null; maxRunOutMps: number };
}

/** Progress and cancellation hooks; the caller owns the clock. */
export interface PlanOptions {
  onProgress?: (fraction: number) => void;
  shouldStop?: () => boolean;
  /** Skip the largest-startable-mass search (used inside that search and by batch screens). */
  skipMassSearch?: boolean;
  /** Skip the verifying re-run on the median rail. */
  skipVerification?: boolean;
  /** Skip the sensitivity table (an empty one is returned): for callers that never show it (the departures check). */
  skipSensitivity?: boolean;
  /** Verdicts of the mass search already found elsewhere (startableMass.ts, `StartableMassOptions.verdictAt`). */
  massVerdictAt?: (need: "starts" | "goes", massKg: number) => boolean | undefined;
}
