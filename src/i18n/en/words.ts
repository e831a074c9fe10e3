/**
 * The trade's and our own words for the codes of a plan, shared by the app and the command line: verdicts,
 * reasons, limits, rail conditions, plan phases.
 */
import { namespace } from "../messages.js";

export const words = namespace("words", {
  // Verdicts (NAMING.md) and what each means.
  verdictStarts: "Starts",
  verdictMarginal: "Marginal",
  verdictNeedsAssistance: "Needs assistance",
  verdictInlineStarts: "starts",
  verdictInlineMarginal: "marginal",
  verdictInlineNeedsAssistance: "needs assistance",
  verdictLineStarts: "This locomotive set should start this train here, within the safety settings.",
  verdictLineMarginal: "It may start, but a limit is exceeded within its band (or it needs a better rail than the threshold assumes): brief the start carefully.",
  verdictLineNeedsAssistance: "It is not expected to start within the safety settings without help.",
  verdictLabel: "Verdict: {word}",
  reasonsLabel: "Reasons: ",
  verdictStale: "For the previous inputs — updating…",
  // Verdict reasons (NAMING.md): a word, and a line.
  reasonAdhesion: "adhesion",
  reasonPower: "power",
  reasonCoupler: "coupler",
  reasonDistance: "distance",
  reasonBrake: "brake holding",
  reasonLineAdhesion: "Adhesion — the rails may not give the tractive effort needed without slipping.",
  reasonLinePower: "Power — the locomotives' tractive effort is barely enough, or not enough.",
  reasonLineCoupler: "Coupler — coupler forces come close to, or over, the working limit.",
  reasonLineDistance: "Distance — taking up the slack or reaching the target needs more room than is clear ahead.",
  reasonLineBrake: "Brake holding — the brakes may not hold the train while its brake releases.",
  // The limits of the decision, in a few words (beside a margin).
  limitAdhesion: "adhesion",
  limitPower: "power",
  limitBrakeHolding: "brake holding",
  limitCouplerTension: "coupler tension",
  limitCouplerCompression: "coupler compression",
  limitWheelClimb: "wheel climb",
  limitDistance: "distance",
  limitTimeToTarget: "time to target",
  // Rail conditions (NAMING.md), as a heading word and inside a sentence.
  railDry: "Dry",
  railDamp: "Damp",
  railWet: "Wet",
  railFrost: "Frost",
  railLeaves: "Leaves",
  railGreasy: "Greasy",
  railInlineDry: "dry",
  railInlineDamp: "damp",
  railInlineWet: "wet",
  railInlineFrost: "frost",
  railInlineLeaves: "leaves",
  railInlineGreasy: "greasy",
  // Plan phases (NAMING.md).
  phasePrepare: "Prepare",
  phaseStretch: "Stretch",
  phaseBuild: "Build",
  phaseAccelerate: "Accelerate",
  phaseInlinePrepare: "prepare",
  phaseInlineStretch: "stretch",
  phaseInlineBuild: "build",
  phaseInlineAccelerate: "accelerate",
  phaseLinePrepare: "Get ready: brakes, sand, holding power",
  phaseLineStretch: "Take the slack out at low effort",
  phaseLineBuild: "Notch up as adhesion and couplers allow",
  phaseLineAccelerate: "Accelerate the stretched train",

});
