/**
 * How a figure is rounded for people: the rule lives with the number formats of each language
 * (src/i18n/rounding.ts); files and reports use it from here.
 */
export { fixedDigits, fixedText, roundHalfAway } from "../i18n/rounding.js";
