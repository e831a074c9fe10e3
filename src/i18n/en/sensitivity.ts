/**
 * The sensitivity table's rows (src/core/planner/sensitivity.ts): what each row changes, from its code and
 * its size ({change} is the signed figure with its unit, written by src/i18n/renderSensitivity.ts).
 */
import { namespace } from "../messages.js";

export const sensitivity = namespace("sensitivity", {
  mass: "{change} trailing mass",
  adhesion: "{change} adhesion",
  grade: "{change} gradient",
  slack: "{change} slack per coupling",
});
