/**
 * The planner's lines (why, advice, a helper's call) in the language on screen and the user's units: the
 * shared renderer (src/i18n/renderLines.ts) with the app's translator and figures. The slip card's and an
 * assistance option's words are rendered by their screens (CabSteps/SlipCard.tsx, AssistanceCheck), so
 * they load with them, not before the first plan.
 */
import type { AdviceLine, GroupPlace, HelperCall, StepWhy } from "../core/planner/lines.js";
import { createSignal } from "solid-js";
import { groupName, helperCallText, helperHoldText, splitName, stepWhyText, type Quantities } from "../i18n/renderLines.js";
import { show, showAtMost, type UnitSystem } from "./format.js";
import { tr } from "./i18n.js";

/** Figures in the user's units, as the app shows them elsewhere. */
export function appQuantities(units: UnitSystem): Quantities {
  return {
    force: (n) => show("force", n, units),
    speed: (mps) => show("speed", mps, units),
    length: (m, d) => show("distance", m, units, d),
    mass: (kg) => show("mass", kg, units),
    massAtMost: (kg) => showAtMost("mass", kg, units),
  };
}

export const whyText = (w: StepWhy, units: UnitSystem): string => stepWhyText(tr, appQuantities(units), w);

/** The advice's renderer and words: loaded the first time a plan has advice (a plan that starts has none). */
const [adviceRenderer, setAdviceRenderer] = createSignal<typeof import("../i18n/renderAdvice.js") | null>(null);
let adviceLoading = false;

/** A line of advice in the language on screen (empty for the moment its words take to load). */
export function adviceWords(a: AdviceLine, units: UnitSystem): string {
  const r = adviceRenderer();
  if (r) return r.adviceText(tr, appQuantities(units), a);
  if (!adviceLoading) {
    adviceLoading = true;
    void import("../i18n/renderAdvice.js").then(
      (m) => setAdviceRenderer(() => m),
      () => (adviceLoading = false),
    );
  }
  return "";
}
export const helperCallWords = (c: HelperCall): string => helperCallText(tr, c);
export const helperHoldWords = (notch: string): string => helperHoldText(tr, notch);
export const groupWords = (p: GroupPlace): string => groupName(tr, p);
export const splitWords = (p: GroupPlace | "all"): string => splitName(tr, p);
