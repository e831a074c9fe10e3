/** The word for each code of a plan (verdict, reason, limit, rail condition, phase) in the translator's language. */
import type { RailCondition } from "../core/physics/types.js";
import type { LimitName, Reason, Verdict } from "../core/planner/outcome.js";
import type { Phase } from "../core/planner/types.js";
import { words } from "./en/words.js";
import type { Translator } from "./translator.js";

type Key = keyof typeof words.en;

/** "needs-assistance" → "NeedsAssistance": the catalog's keys are the kind and the code, e.g. "verdictNeedsAssistance". */
const pascal = (code: string) => code.replace(/(^|-)([a-z])/g, (_m, _d: string, c: string) => c.toUpperCase());
/** The key of a code of a kind; the types of the callers below make every (kind, code) pair a real key. */
const keyOf = (kind: string, code: string) => `${kind}${pascal(code)}` as Key;
/** Words of a translator for the codes of a plan. */
export function wordsOf(tr: Translator) {
  const t = tr.ns(words);
  const say = (k: Key) => t(k as never);
  return {
    /** "Starts", "Marginal", "Needs assistance". */
    verdict: (v: Verdict) => say(keyOf("verdict", v)),
    /** "starts", "needs assistance" (inside a sentence). */
    verdictInline: (v: Verdict) => say(keyOf("verdictInline", v)),
    /** What a verdict means, in a line. */
    verdictLine: (v: Verdict) => say(keyOf("verdictLine", v)),
    /** "adhesion", "brake holding". */
    reason: (r: Reason) => say(keyOf("reason", r)),
    reasonLine: (r: Reason) => say(keyOf("reasonLine", r)),
    /** A limit in a few words: "coupler tension". */
    limit: (l: LimitName) => say(keyOf("limit", l)),
    /** "Dry" (a heading or a button). */
    rail: (r: RailCondition) => say(keyOf("rail", r)),
    /** "dry" (inside a sentence). */
    railInline: (r: RailCondition) => say(keyOf("railInline", r)),
    phase: (p: Phase) => say(keyOf("phase", p)),
    phaseInline: (p: Phase) => say(keyOf("phaseInline", p)),
    phaseLine: (p: Phase) => say(keyOf("phaseLine", p)),
  };
}
