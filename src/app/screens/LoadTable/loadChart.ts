/** The load table as bars per rail condition (without and with sand) in the user's mass unit, with the train's own mass as a line. */
import { words } from "../../words.js";
import type { LoadTableRow } from "../../../core/dispatch/loadTable.js";
import { RAIL_CONDITIONS } from "../../../core/physics/types.js";
import type { ChartSpec } from "../../charts/spec.js";
import { formatNumber, toDisplay, unitSymbol, type UnitSystem } from "../../format.js";
import { barChart } from "../shared/bars.js";
import { dispatch } from "../../../i18n/en/dispatch.js";
import { tr } from "../../i18n.js";

const t = tr.ns(dispatch);

export function loadChart(rows: readonly LoadTableRow[], trainMassKg: number | null, units: UnitSystem): ChartSpec | null {
  if (rows.length === 0) return null;
  const shown = (kg: number) => toDisplay("mass", kg, "kg", units);
  const value = (rail: string, sand: boolean) => {
    const r = rows.find((x) => x.rail === rail && x.sand === sand);
    return r ? shown(r.maxTrailingMassKg) : Number.NaN;
  };
  const unit = unitSymbol("mass", units);
  return barChart({
    categories: RAIL_CONDITIONS.map((r) => words.rail(r)),
    groups: [
      { id: "no-sand", label: t("withoutSand"), role: "second", dashed: true, values: RAIL_CONDITIONS.map((r) => value(r, false)) },
      { id: "sand", label: t("withSand"), role: "main", values: RAIL_CONDITIONS.map((r) => value(r, true)) },
    ],
    lines: trainMassKg !== null ? [{ id: "train", label: t("thisTrain", { mass: `${formatNumber(shown(trainMassKg), 0)} ${unit}` }), y: shown(trainMassKg), role: "need", dashed: true }] : [],
    xTitle: t("railCondition"),
    yTitle: t("largestMassUnit", { unit }),
  });
}
