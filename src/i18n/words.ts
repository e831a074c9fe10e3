/** The word for each code of a plan (verdict, reason, limit, rail condition, phase) in the translator's language. */
import type { RailCondition } from "../core/physics/types.js";
import type { LimitName, Reason, Verdict } from "../core/planner/outcome.js";
import type { Phase } from "../core/planner/types.js";
import { words } from "./en/words.js";
import type { Translator } from "./translator.js";

type Key = keyof typeof words.en;

const VERDICT: Record<Verdict, Key> = { starts: "verdictStarts", marginal: "verdictMarginal", "needs-assistance": "verdictNeedsAssistance" };
const VERDICT_INLINE: Record<Verdict, Key> = { starts: "verdictInlineStarts", marginal: "verdictInlineMarginal", "needs-assistance": "verdictInlineNeedsAssistance" };
const VERDICT_LINE: Record<Verdict, Key> = { starts: "verdictLineStarts", marginal: "verdictLineMarginal", "needs-assistance": "verdictLineNeedsAssistance" };
const REASON: Record<Reason, Key> = { adhesion: "reasonAdhesion", power: "reasonPower", coupler: "reasonCoupler", distance: "reasonDistance", brake: "reasonBrake" };
const REASON_LINE: Record<Reason, Key> = {
  adhesion: "reasonLineAdhesion",
  power: "reasonLinePower",
  coupler: "reasonLineCoupler",
  distance: "reasonLineDistance",
  brake: "reasonLineBrake",
};
const LIMIT: Record<LimitName, Key> = {
  adhesion: "limitAdhesion",
  power: "limitPower",
  "brake-holding": "limitBrakeHolding",
  "coupler-tension": "limitCouplerTension",
  "coupler-compression": "limitCouplerCompression",
  distance: "limitDistance",
  "time-to-target": "limitTimeToTarget",
};
const RAIL: Record<RailCondition, Key> = { dry: "railDry", damp: "railDamp", wet: "railWet", frost: "railFrost", leaves: "railLeaves", greasy: "railGreasy" };
const RAIL_INLINE: Record<RailCondition, Key> = {
  dry: "railInlineDry",
  damp: "railInlineDamp",
  wet: "railInlineWet",
  frost: "railInlineFrost",
  leaves: "railInlineLeaves",
  greasy: "railInlineGreasy",
};
const PHASE: Record<Phase, Key> = { prepare: "phasePrepare", stretch: "phaseStretch", build: "phaseBuild", accelerate: "phaseAccelerate" };
const PHASE_INLINE: Record<Phase, Key> = { prepare: "phaseInlinePrepare", stretch: "phaseInlineStretch", build: "phaseInlineBuild", accelerate: "phaseInlineAccelerate" };
const PHASE_LINE: Record<Phase, Key> = { prepare: "phaseLinePrepare", stretch: "phaseLineStretch", build: "phaseLineBuild", accelerate: "phaseLineAccelerate" };

/** Words of a translator for the codes of a plan. */
export function wordsOf(tr: Translator) {
  const t = tr.ns(words);
  const say = (k: Key) => t(k as never);
  return {
    /** "Starts", "Marginal", "Needs assistance". */
    verdict: (v: Verdict) => say(VERDICT[v]),
    /** "starts", "needs assistance" (inside a sentence). */
    verdictInline: (v: Verdict) => say(VERDICT_INLINE[v]),
    /** What a verdict means, in a line. */
    verdictLine: (v: Verdict) => say(VERDICT_LINE[v]),
    /** "adhesion", "brake holding". */
    reason: (r: Reason) => say(REASON[r]),
    reasonLine: (r: Reason) => say(REASON_LINE[r]),
    /** A limit in a few words: "coupler tension". */
    limit: (l: LimitName) => say(LIMIT[l]),
    /** "Dry" (a heading or a button). */
    rail: (r: RailCondition) => say(RAIL[r]),
    /** "dry" (inside a sentence). */
    railInline: (r: RailCondition) => say(RAIL_INLINE[r]),
    phase: (p: Phase) => say(PHASE[p]),
    phaseInline: (p: Phase) => say(PHASE_INLINE[p]),
    phaseLine: (p: Phase) => say(PHASE_LINE[p]),
  };
}
