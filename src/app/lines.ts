/**
 * The planner's lines (why, advice, a helper's call, the slip card, an assistance option's note) in the
 * language on screen and the user's units: the shared renderer (src/i18n/renderLines.ts) with the app's
 * translator and figures.
 */
import type { AssistanceNote } from "../core/dispatch/assistance.js";
import type { AdviceLine, GroupPlace, HelperCall, SlipHeadline, StepWhy } from "../core/planner/lines.js";
import type { SlipGuidance } from "../core/planner/types.js";
import { adviceText, assistanceNoteText, groupName, helperCallText, helperHoldText, slipGuidanceText, slipHeadlineText, splitName, stepWhyText, type Quantities } from "../i18n/renderLines.js";
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
export const adviceWords = (a: AdviceLine, units: UnitSystem): string => adviceText(tr, appQuantities(units), a);
export const helperCallWords = (c: HelperCall): string => helperCallText(tr, c);
export const helperHoldWords = (notch: string): string => helperHoldText(tr, notch);
export const groupWords = (p: GroupPlace): string => groupName(tr, p);
export const splitWords = (p: GroupPlace | "all"): string => splitName(tr, p);
export const slipCardWords = (g: SlipGuidance): { driver: string[]; protection: string[]; stall: string[] } => slipGuidanceText(tr, g);
export const slipHeadlineWords = (h: SlipHeadline): { hold: string; then: string } => slipHeadlineText(tr, h);
export const assistanceNoteWords = (n: AssistanceNote, units: UnitSystem): string => assistanceNoteText(tr, appQuantities(units), n);
