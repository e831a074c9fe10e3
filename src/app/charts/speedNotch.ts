/** Speed and notch against time, from the plan's verifying dynamics run. Null while there is no series. */
import type { PlanResult } from "../../core/planner/types.js";
import { toDisplay, unitSymbol, type UnitSystem } from "../format.js";
import { maxOf, niceCeil, type ChartSpec, type Point } from "./spec.js";

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
      { id: "speed", label: `Speed (${unitSymbol("speed", units)})`, points: speed, role: "main", axis: "y" },
      { id: "notch", label: "Notch", points: notch, role: "second", axis: "y2", stepped: true },
    ],
    x: { title: "Time from taking power (s)", min: 0, max: Math.ceil(s.timeS[n - 1]! / 10) * 10 },
    y: { title: `Speed (${unitSymbol("speed", units)})`, min: 0, max: niceCeil(Math.max(1, maxOf(speed.map((p) => p.y)) * 1.1)) },
    y2: { title: "Notch", min: 0, max: topNotch, stepSize: 1 },
    legend: [
      { label: `Speed (${unitSymbol("speed", units)})`, role: "main" },
      { label: "Notch (right scale)", role: "second" },
    ],
  };
}
