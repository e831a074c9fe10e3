/** The line of the plan's verdict that puts the train's own trailing mass beside the largest masses. */
import type { PlanResult } from "../../../core/planner/types.js";
import { show, showAtMost, type UnitSystem } from "../../format.js";
import { plan } from "../../../i18n/en/plan.js";
import { tr } from "../../i18n.js";

const t = tr.ns(plan);

/**
 * The train's own trailing mass beside the largest masses, as the verdict shows them: "This train 1,400 t ·
 * starts up to 2,063 t · at least marginal up to 2,239 t" (largest masses rounded down, as everywhere).
 */
export function massesLine(res: PlanResult, units: UnitSystem, pending: boolean): string {
  const parts = [t("massesThisTrain", { mass: show("mass", res.trailingMassKg, units) })];
  const starts = res.maxStartableMassKg;
  if (!Number.isFinite(starts)) parts.push(pending ? t("workingOut") : "–");
  else parts.push(starts >= 1000 ? t("massesStartsUpTo", { mass: showAtMost("mass", starts, units) }) : t("massesStartsNone"));
  if (Number.isFinite(res.largestMarginalMassKg) && res.largestMarginalMassKg > Math.max(0, starts)) parts.push(t("massesMarginalUpTo", { mass: showAtMost("mass", res.largestMarginalMassKg, units) }));
  return parts.join(" · ");
}
