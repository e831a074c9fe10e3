/**
 * Peak coupler force along the train, head to tail, against the coupling's working limit and the limit
 * divided by the safety factor. Null while the plan has no per-coupling peaks.
 */
import type { PlanResult } from "../../core/planner/types.js";
import { show, toDisplay, unitSymbol, type UnitSystem } from "../format.js";
import { maxOf, niceCeil, type ChartSpec, type Point } from "./spec.js";
import { chart } from "../../i18n/en/chart.js";
import { tr } from "../i18n.js";

const t = tr.ns(chart);

/** A setting as written (1.25 stays 1.25), in the language on screen. */
const settingText = (x: number) => tr.num(x, Math.min(3, (String(x).split(".")[1] ?? "").length));

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
      { id: "peak", label: t("peakTension", { unit }), points: pts, role: "main", fill: "origin" },
      { id: "working", label: t("allowedShort", { factor: settingText(safetyFactor), unit }), points: flat(f(limitN / safetyFactor)), role: "working", dashed: true },
      { id: "limit", label: t("workingLimit", { unit }), points: flat(f(limitN)), role: "limit" },
    ],
    x: { title: t("couplingAxis"), min: 1, max: last },
    y: { title: t("force", { unit }), min: 0, max: top },
    legend: [
      { label: t("peakEach"), role: "main" },
      { label: t("allowedLong", { force: show("force", limitN / safetyFactor, units), factor: settingText(safetyFactor) }), role: "working", dashed: true },
      { label: t("limitLong", { force: show("force", limitN, units) }), role: "limit" },
    ],
  };
}
