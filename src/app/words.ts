/** The words for a plan's codes (verdicts, reasons, limits, rail conditions, phases) in the language on screen. */
import { wordsOf } from "../i18n/words.js";
import { tr } from "./i18n.js";

export const words = wordsOf(tr);
