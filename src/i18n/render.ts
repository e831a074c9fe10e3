/**
 * The core's codes in words: cautions (and, as they are converted, the other notes the planner gives as
 * codes with figures). One renderer for the app, the command line and the English renderings in reports.
 */
import type { Caution } from "../core/planner/cautions.js";
import { cautions } from "./en/cautions.js";
import type { Translator } from "./translator.js";

/** A caution in the translator's language. */
export function cautionText(tr: Translator, c: Caution): string {
  const t = tr.ns(cautions);
  switch (c.code) {
    case "advisory":
      return t("advisory");
    case "decisions":
      return t("decisions");
    case "statistical":
      return t("statistical");
    case "brief":
      return t("brief");
    case "falling-grade":
      return t("fallingGrade");
    case "loco-brake-cannot-hold":
      return t("locoBrakeCannotHold");
    case "sand-points":
      return t("sandPoints");
    case "rising-grade":
      return t("risingGrade");
    case "sharp-curve":
      return t("sharpCurve");
    case "protection-acts":
      return t("protectionActs", { count: c.steps }) + (c.standstill ? t("protectionStandstill") : "");
    case "heating":
      return t("heating", { time: Math.round(c.holdS) });
  }
}
