/**
 * Why a run of the planner failed, kept as data and worded when shown, so a language switch redraws it: a
 * planner that stopped (its worker crashed) is said in the language on screen, with the browser's own words on
 * why when it gave any; a failure inside the program keeps its own words.
 */
import { plan } from "../../i18n/en/plan.js";
import { PLANNER_STOPPED } from "../../worker/client.js";
import { tr } from "../i18n.js";

export interface RunFailure {
  message: string;
  /** The worker stopped (crashed), rather than the program failing inside it. */
  stopped?: boolean;
}

/** The failure in words, in the language on screen. */
export function failureWords(f: RunFailure): string {
  if (!f.stopped) return f.message;
  const t = tr.ns(plan);
  return f.message && f.message !== PLANNER_STOPPED ? t("plannerStoppedBecause", { detail: f.message }) : t("plannerStopped");
}
