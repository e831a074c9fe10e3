/**
 * Margins per rail condition as bars: for each condition the smallest margin (available ÷ needed) without
 * and with sand, against × 1 (as much needed as available). The axis stops at × 3: beyond that the bar is
 * cut and the table beside gives the figure.
 */
import { words } from "../../words.js";
import type { ConditionMargin } from "../../../core/dispatch/conditionMargins.js";
import { RAIL_CONDITIONS } from "../../../core/physics/types.js";
import type { ChartSpec } from "../../charts/spec.js";
import { barChart } from "../shared/bars.js";
import { assist } from "../../../i18n/en/assist.js";
import { tr } from "../../i18n.js";

const t = tr.ns(assist);

export const MARGIN_AXIS_TOP = 3;

export function marginChart(rows: readonly ConditionMargin[]): ChartSpec | null {
  if (rows.length === 0) return null;
  const value = (rail: string, sand: boolean) => rows.find((r) => r.rail === rail && r.sand === sand)?.margin ?? Number.NaN;
  return barChart({
    categories: RAIL_CONDITIONS.map((r) => words.rail(r)),
    groups: [
      { id: "no-sand", label: t("chartWithoutSand"), role: "second", dashed: true, values: RAIL_CONDITIONS.map((r) => value(r, false)) },
      { id: "sand", label: t("chartWithSand"), role: "main", values: RAIL_CONDITIONS.map((r) => value(r, true)) },
    ],
    lines: [{ id: "one", label: t("chartOne"), y: 1, role: "limit", dashed: true }],
    xTitle: t("chartRail"),
    yTitle: t("chartMargin"),
    yCap: MARGIN_AXIS_TOP,
  });
}
