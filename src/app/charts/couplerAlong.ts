/**
 * Peak coupler force along the train, head to tail, against the coupling's working limit and the limit
 * divided by the safety factor. Null while the plan has no per-coupling peaks.
 */
import type { PlanResult } from "../../core/planner/types.js";
import { show, toDisplay, unitSymbol, type UnitSystem } from "../format.js";
import { maxOf, niceCeil, type ChartSpec, type Point } from "./spec.js";

export function couplerChart(r: PlanResult, limitN: number, safetyFactor: number, units: UnitSystem): ChartSpec | null {
  const peaks = r.couplerPeaksN;
  if (peaks.length === 0) return null;
  const f = (n: number) => toDisplay("force", n, "N", units);
  const pts: Point[] = Array.from(peaks, (v, j) => ({ x: j + 1, y: f(Math.max(0, v)) }));
  const last = peaks.length;
  const flat = (y: number): Point[] => [
    { x: 1, y },
    { x: last, y },
  ];
  const unit = unitSymbol("force", units);
  const top = niceCeil(Math.max(f(limitN), maxOf(pts.map((p) => p.y))) * 1.1);
  return {
    series: [
      { id: "peak", label: `Peak tension (${unit})`, points: pts, role: "main", fill: "origin" },
      { id: "working", label: `Allowed: limit ÷ ${safetyFactor} (${unit})`, points: flat(f(limitN / safetyFactor)), role: "working", dashed: true },
      { id: "limit", label: `Working limit (${unit})`, points: flat(f(limitN)), role: "limit" },
    ],
    x: { title: "Coupling, from the head (1) to the tail", min: 1, max: last },
    y: { title: `Force (${unit})`, min: 0, max: top },
    legend: [
      { label: "Peak tension in each coupling", role: "main" },
      { label: `Allowed: ${show("force", limitN / safetyFactor, units)} (limit ÷ safety factor ${safetyFactor}), what the plan keeps to`, role: "working", dashed: true },
      { label: `Coupler working limit: ${show("force", limitN, units)}`, role: "limit" },
    ],
  };
}
