/** A caution (a code from the core) in the language on screen. */
import type { Caution } from "../core/planner/cautions.js";
import { cautionText } from "../i18n/render.js";
import { tr } from "./i18n.js";

export function cautionWords(c: Caution): string {
  return cautionText(tr, c);
}
