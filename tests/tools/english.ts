/** The planner's lines (codes from the core) in English, as the reports and the English command line write them. */
import type { AssistanceNote } from "../../src/core/dispatch/assistance.js";
import type { AdviceLine, LimitWhat, SlipHeadline, StepWhy } from "../../src/core/planner/lines.js";
import type { SlipGuidance } from "../../src/core/planner/types.js";
import { groupName, siQuantities, stepWhyText } from "../../src/i18n/renderLines.js";
import { adviceText, limitWhatText } from "../../src/i18n/renderAdvice.js";
import { slipGuidanceText, slipHeadlineText } from "../../src/i18n/renderSlip.js";
import { assistanceNoteText } from "../../src/i18n/renderAssistNote.js";
import { createTranslator } from "../../src/i18n/translator.js";

export const EN = createTranslator("en", null);
const Q = siQuantities(EN);

export const whyEn = (w: StepWhy): string => stepWhyText(EN, Q, w);
export const adviceEn = (a: readonly AdviceLine[]): string[] => a.map((x) => adviceText(EN, Q, x));
export const limitWhatEn = (w: LimitWhat): string => limitWhatText(EN, Q, w);
export const slipEn = (g: SlipGuidance): { driver: string[]; protection: string[]; stall: string[] } => slipGuidanceText(EN, g);
export const headlineEn = (h: SlipHeadline): { hold: string; then: string } => slipHeadlineText(EN, h);
export const noteEn = (n: AssistanceNote): string => assistanceNoteText(EN, Q, n);
export { groupName };
