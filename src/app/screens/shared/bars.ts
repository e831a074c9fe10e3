/**
 * A bar chart over categories (rail conditions) as a `ChartSpec`, drawn by the shared Chart component:
 * each group of bars (e.g. without sand, with sand) is one line series tracing its bars' outlines along the
 * axis and filled down to it, side by side within a category; horizontal lines mark references (× 1, a
 * train's own mass). Values above the axis top are drawn at the top (the table gives the figure).
 */
import { niceCeil, type ChartSpec, type LegendEntry, type LineSeries, type Point, type SeriesRole } from "../../charts/spec.js";

export interface BarGroup {
  id: string;
  label: string;
  role: SeriesRole;
  /** One value per category (NaN: no bar). */
  values: readonly number[];
  /** Outline the bars dashed (and fill them lightly), so the group reads without colour. */
  dashed?: boolean;
}

export interface RefLine {
  id: string;
  label: string;
  y: number;
  role: SeriesRole;
  dashed?: boolean;
}

export interface BarChartInput {
  categories: readonly string[];
  groups: readonly BarGroup[];
  yTitle: string;
  xTitle: string;
  lines?: readonly RefLine[];
  /** Highest value the axis shows (taller bars are cut there). */
  yCap?: number;
}

/** Half the width taken by a category's bars, in category units. */
const HALF = 0.4;
const GAP = 0.04;

export function barChart(input: BarChartInput): ChartSpec {
  const n = input.categories.length;
  const g = input.groups.length;
  const lineYs = (input.lines ?? []).map((l) => l.y);
  const finite = input.groups.flatMap((x) => x.values.filter((v) => Number.isFinite(v)));
  let top = niceCeil(Math.max(1e-9, ...finite, ...lineYs) * 1.08);
  if (input.yCap !== undefined) top = Math.min(top, input.yCap);
  const width = (2 * HALF) / g;
  const series: LineSeries[] = input.groups.map((grp, k) => {
    const pts: Point[] = [];
    for (let c = 0; c < n; c++) {
      const v = grp.values[c];
      const x0 = c - HALF + k * width + GAP / 2;
      const x1 = x0 + width - GAP;
      const y = v !== undefined && Number.isFinite(v) ? Math.max(0, Math.min(top, v)) : 0;
      pts.push({ x: x0, y: 0 }, { x: x0, y }, { x: x1, y }, { x: x1, y: 0 });
    }
    return { id: grp.id, label: grp.label, points: pts, role: grp.role, fill: "origin", bars: true, ...(grp.dashed ? { dashed: true } : {}) };
  });
  for (const l of input.lines ?? []) {
    series.push({ id: l.id, label: l.label, role: l.role, points: [{ x: -0.5, y: Math.min(top, l.y) }, { x: n - 0.5, y: Math.min(top, l.y) }], ...(l.dashed ? { dashed: true } : {}) });
  }
  const legend: LegendEntry[] = [
    ...input.groups.map((grp) => ({ label: grp.label, role: grp.role, box: true, ...(grp.dashed ? { dashed: true } : {}) })),
    ...(input.lines ?? []).map((l) => ({ label: l.label, role: l.role, ...(l.dashed ? { dashed: true } : {}) })),
  ];
  return {
    series,
    x: { title: input.xTitle, min: -0.5, max: n - 0.5, labels: [...input.categories] },
    y: { title: input.yTitle, min: 0, max: top },
    legend,
  };
}
