/**
 * The planner's sentences as codes with their figures (SI): a step's why line, the limits' descriptions,
 * the advice, the "If wheels slip" card and its headline, a helper's call. The core stays language-free;
 * the words are in the message catalogs (src/i18n/{en,hu,de}/reasons.ts and guidance.ts) and one renderer
 * (src/i18n/renderLines.ts) writes them for the app, the command line and the English text of reports.
 * Figures are named with their SI unit (`N`, `M`, `S`, `Mps`, `Mps2`, `Kg`) so a report can name them with
 * its own units mechanically; fractions (0..1) and counts have no suffix.
 */
import type { Target } from "../train/types.js";
import type { LimitName } from "./outcome.js";
import type { BandWhat, LimitWhat } from "./limitLines.js";

export type { BandWhat, LimitWhat, VehicleRef } from "./limitLines.js";

/** Where a control group is: at the head, at the rear or after a wagon; a helper group has its own driver. */
export interface GroupPlace {
  at: "head" | "rear" | { afterWagon: number };
  helper: boolean;
}

/** A target as a why line names it: a speed, or a distance to clear. */
export type TargetRef = { kind: "speed"; speedMps: number } | { kind: "distance"; distanceM: number };

export function targetRef(t: Target): TargetRef {
  return t.kind === "speed" ? { kind: "speed", speedMps: t.speedMps } : { kind: "distance", distanceM: t.distanceM };
}

/** Why a step is what it is: one plain line of physics per phase. */
export type WhyLine =
  /** Rising grade: a holding notch with the locomotive brake holds the train while its brake releases. */
  | { code: "prepare-hold-back"; pullN: number; notch: number; notchN: number; locoBrakeN: number; lengthM: number; releaseS: number; sand: boolean }
  /** Falling grade, the locomotive brake holds the released train: easing it off starts the train. */
  | { code: "prepare-gravity-loco-brake"; pullN: number; locoBrakeN: number; lengthM: number; releaseS: number }
  /** Falling grade, the locomotive brake cannot hold: the train brake is released in stages. */
  | { code: "prepare-gravity-train-brake"; pullN: number; locoBrakeN: number; sharePercent: number; trainBrakeN: number }
  /** No power until the brakes are off; the locomotive brake holds. */
  | { code: "prepare-brakes-off"; lengthM: number; releaseS: number; sand: boolean }
  /** The stretch: the notch against the train's resistance; `stretchTravelM` null when not known; `fastOverMps` when the lowest moving notch runs too fast. */
  | { code: "stretch"; notch: number; effortN: number; resistanceN: number; stretchTravelM: number | null; peakN: number; allowanceN: number; fastOverMps: number | null }
  /** Notching up: the notch's effort at the speed of its highest adhesion use; `dwellS` for the first build step. */
  | { code: "build"; atMps: number; notch: number; asksN: number; use: number; risk: number; dwellS: number | null; peakN: number; allowanceN: number }
  /** The running notch held to the target; `higherNoMore`: a higher notch would ask more than a poor rail gives, or is not needed. */
  | { code: "accelerate"; notch: number; target: TargetRef; effortN: number; risk: number; higherNoMore: boolean }
  /** No power yet on a falling grade, power needed later to reach the target. */
  | { code: "roll-then-power"; accelMps2: number; toMps: number; travelM: number; staged: boolean; target: TargetRef }
  /** No power on a falling grade: gravity takes the train to its target within (or beyond) the clear distance. */
  | { code: "roll-to-target"; accelMps2: number; staged: boolean; target: TargetRef; travelM: number; clearM: number };

/** A step whose notch asks more than a poor rail gives: the slip protection may act. */
export interface ProtectionLine {
  asksN: number;
  givesN: number;
  risk: number;
  /** The step starts at a standstill. */
  standstill: boolean;
}

/** One control group's notch and share of the effort in a step. */
export interface GroupShare {
  place: GroupPlace;
  notch: number;
  share: number;
}

/** A step's why: its line, the slip protection where it acts, each group's notch where there are several. */
export interface StepWhy {
  line: WhyLine;
  protection: ProtectionLine | null;
  groups: GroupShare[] | null;
}

/** A helper's notch change: the head takes its notch first and calls the helper, who follows `followS` later. */
export interface HelperCall {
  headNotch: number;
  place: GroupPlace;
  act: "take" | "shut-off" | "ease";
  notch: number;
  followS: number;
  /** During the stretch: or as soon as the head reports the train moving. */
  stretch: boolean;
}

/** One thing that would change a verdict. */
export type ChangeLine =
  | { code: "sand"; margin: number }
  | { code: "better-rail"; sand: boolean; margin: number }
  /** `marginalKg` when a larger mass is at least marginal; `scaled`: a mixed train's loads scaled in proportion. */
  | { code: "less-load"; startsKg: number; marginalKg: number | null; scaled: boolean }
  | { code: "less-load-none" }
  | { code: "less-load-unsearched" }
  | { code: "assistance" };

/** A line of advice: why the verdict is what it is and what would change it. */
export type AdviceLine =
  | { code: "limited-by"; limit: LimitName; margin: number; what: LimitWhat }
  | { code: "within-band"; limits: Array<{ limit: LimitName; band: BandWhat }> }
  /** The plan shown assumes the rail at `quantile`: about one start in `oneIn` it gives less. */
  | { code: "relaxed"; quantile: number; oneIn: number }
  | { code: "changes"; changes: ChangeLine[] };

/** The "If wheels slip" card's lines: what the driver does, what the protection does, what to do on a stall. */
export type SlipDriverLine = "hold-notch" | "keep-sanding" | "sand-now" | "no-sanders-ease" | "drop-fallback" | "wait-settle" | "no-spin" | "stop-sanding-points";
export type SlipProtectionLine = "sands-itself" | "no-sanders-only-power" | "cuts-power" | "reapplies";
export type SlipStallLine =
  | "grade-secure"
  | "grade-suspect-brake"
  | "grade-restart"
  | "grade-no-bunching"
  | "ask-assistance"
  | "level-shut-off"
  | "level-suspect-brake"
  | "level-restart";

/** The slip card's headline for a step: first hold, then (if the slip keeps returning) what next. */
export interface SlipHeadline {
  hold: { code: "no-power" } | { code: "hold"; notch: number; sand: boolean };
  then: { code: "take-power"; sand: boolean } | { code: "shut-off"; notch: number } | { code: "drop"; notch: number };
}
