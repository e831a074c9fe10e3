/**
 * Drawing with a palette (palette.ts): a series' colour by its role, a colour with an alpha, and the rail
 * conditions' marker shapes. Apart from the palettes so that the page's first load, which only hands a
 * palette on to the charts, does not carry them.
 */
import type { RailCondition } from "../../core/physics/types.js";
import type { ChartPalette } from "./palette.js";
import type { SeriesRole } from "./spec.js";

/** A marker shape per rail condition (chart.js point styles), on the chart and in its legend. */
export const RAIL_MARKER: Readonly<Record<RailCondition, "circle" | "rect" | "triangle" | "rectRot" | "crossRot" | "star">> = {
  dry: "circle",
  damp: "rect",
  wet: "triangle",
  frost: "rectRot",
  leaves: "crossRot",
  greasy: "star",
};

/** Colour of a series by role and tone (a band's by its rail condition). */
export function colourOf(p: ChartPalette, role: SeriesRole, tone = 0, tones = 1, rail?: RailCondition): string {
  switch (role) {
    case "main":
      return p.main;
    case "second":
      return p.second;
    case "limit":
      return p.limit;
    case "working":
      return p.working;
    case "need":
    case "step":
      return p.need;
    case "notch": {
      const t = tones <= 1 ? 1 : tone / (tones - 1);
      const c = p.notchFrom.map((a, i) => Math.round(a + (p.notchTo[i]! - a) * t));
      return `rgb(${c[0]},${c[1]},${c[2]})`;
    }
    case "band":
      return rail ? p.rail[rail] : p.text;
  }
}

/** A colour with an alpha (for band fills). */
export function withAlpha(hex: string, alpha: number): string {
  const m = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(hex);
  if (!m) return hex;
  return `rgba(${parseInt(m[1]!, 16)},${parseInt(m[2]!, 16)},${parseInt(m[3]!, 16)},${alpha})`;
}
