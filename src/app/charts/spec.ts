/**
 * A chart described as data (series of points in display units, axes, legend), independent of the
 * drawing library, so the figures can be tested without a canvas. `components/Chart.tsx` draws it.
 */

export interface Point {
  x: number;
  y: number;
}

import type { RailCondition } from "../../core/physics/types.js";

export type SeriesRole = "main" | "second" | "limit" | "working" | "notch" | "band" | "need" | "step";

/** A marker shape (chart.js point styles). */
export type MarkerShape = "circle" | "rect" | "triangle" | "rectRot" | "crossRot" | "star";

export interface LineSeries {
  id: string;
  label: string;
  points: Point[];
  role: SeriesRole;
  /** Index into the palette's series colours (for notches and bands). */
  tone?: number;
  /** Tones in the set (to spread colours). */
  tones?: number;
  axis?: "y" | "y2";
  dashed?: boolean;
  stepped?: boolean;
  /** Fill down to the previous series (bands) or to the axis. */
  fill?: "previous" | "origin";
  /** Emphasised (the chosen rail condition). */
  strong?: boolean;
  /** A short label written at the line's right-hand end (a notch number). */
  endLabel?: string;
  /** The rail condition a band stands for (its colour). */
  rail?: RailCondition;
  /** Markers of this shape at the points of `markAt` (every point when absent), so the series reads without colour. */
  marker?: MarkerShape;
  /** Indices of the points that carry a marker. */
  markAt?: readonly number[];
  /** Markers only, no line (the plan's steps on the effort chart). */
  noLine?: boolean;
  /** The outline of bars (filled to the axis; lighter when dashed). */
  bars?: boolean;
}

export interface Axis {
  title: string;
  min?: number;
  max?: number;
  stepSize?: number;
  /** Words written at the whole-number positions 0, 1, 2… instead of numbers (a category axis, e.g. rail conditions). */
  labels?: readonly string[];
}

export interface LegendEntry {
  label: string;
  role: SeriesRole;
  tone?: number;
  tones?: number;
  dashed?: boolean;
  rail?: RailCondition;
  marker?: MarkerShape;
  /** A filled box (bars), outlined dashed when `dashed`. */
  box?: boolean;
}

export interface ChartSpec {
  series: LineSeries[];
  x: Axis;
  y: Axis;
  y2?: Axis;
  legend: LegendEntry[];
}

/** Largest finite value of a list (0 for none). */
export function maxOf(xs: Iterable<number>): number {
  let m = 0;
  for (const x of xs) if (Number.isFinite(x) && x > m) m = x;
  return m;
}

/** The smallest "round" number (1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6 or 8 × a power of ten) at or above x, for axis ends. */
export function niceCeil(x: number): number {
  if (!(x > 0) || !Number.isFinite(x)) return 1;
  const p = 10 ** Math.floor(Math.log10(x));
  for (const m of [1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6, 8, 10]) if (m * p >= x - 1e-9 * p) return m * p;
  return 10 * p;
}
