/** Speed and notch against time, from the plan's verifying dynamics run. Null while there is no series. */
import type { PlanResult } from "../../core/planner/types.js";
import { toDisplay, unitSymbol, type UnitSystem } from "../format.js";
import { maxOf, niceCeil, type ChartSpec, type Point } from "./spec.js";
import { chart } from "../../i18n/en/chart.js";
import { tr } from "../i18n.js";

const t = tr.ns(chart);

export function speedNotchChart(r: PlanResult, units: UnitSystem): ChartSpec | null {
  const s = r.series;
  const n = Math.min(s.timeS.length, s.speedMps.length, s.notch.length);
  if (n === 0) return null;
  const speed: Point[] = [];
  const notch: Point[] = [];
  for (let i = 0; i < n; i++) {
    const t = s.timeS[i]!;
    speed.push({ x: t, y: toDisplay("speed", s.speedMps[i]!, "mps", units) });
    notch.push({ x: t, y: s.notch[i]! });
  }
  const topNotch = Math.max(1, maxOf(s.notch));
  return {
    series: [
      { id: "speed", label: t("speed", { unit: unitSymbol("speed", units) }), points: speed, role: "main", axis: "y" },
      { id: "notch", label: t("notch"), points: notch, role: "second", axis: "y2", stepped: true },
    ],
    x: { title: t("timeFromPower"), min: 0, max: Math.ceil(s.timeS[n - 1]! / 10) * 10 },
    y: { title: t("speed", { unit: unitSymbol("speed", units) }), min: 0, max: niceCeil(Math.max(1, maxOf(speed.map((p) => p.y)) * 1.1)) },
    y2: { title: t("notch"), min: 0, max: topNotch, stepSize: 1 },
    legend: [
      { label: t("speed", { unit: unitSymbol("speed", units) }), role: "main" },
      { label: t("notchRight"), role: "second" },
    ],
  };
}
