/**
 * The chart.js configuration for a `ChartSpec`: plain data, so it can cross to the chart worker. Part of the
 * charts' drawing half (ChartCanvas.tsx), loaded once the first verdict is painted.
 */
import type { ChartConfiguration, ChartDataset } from "chart.js";
import { colourOf, withAlpha } from "../charts/colours.js";
import type { ChartPalette } from "../charts/palette.js";
import type { ChartSpec } from "../charts/spec.js";
import { tr } from "../i18n.js";
import { LOCALE_TAGS, type Lang } from "../../i18n/language.js";

export type LineConfig = ChartConfiguration<"line", Array<{ x: number; y: number }>>;

/**
 * The chart.js configuration for a spec: plain data (it crosses to the chart worker), no animation, no
 * pointer events. The tick numbers are written in `lang` (chart.js formats them with Intl for `locale`:
 * a decimal comma in Hungarian and German), in the chart worker, after the verdict is on screen.
 */
export function toChartConfig(spec: ChartSpec, p: ChartPalette, lang: Lang = tr.lang): LineConfig {
  const datasets: Array<ChartDataset<"line", Array<{ x: number; y: number }>>> = spec.series.map((s) => {
    const colour = colourOf(p, s.role, s.tone, s.tones, s.rail);
    const band = s.role === "band";
    // Filled to the axis: bars. Dashed bars (without sand) are filled more lightly than solid ones.
    const bars = s.bars === true;
    const marks = s.marker ? new Set(s.markAt ?? s.points.map((_, i) => i)) : null;
    return {
      label: s.label,
      data: s.points,
      borderColor: band && !s.strong ? withAlpha(colour, 0.55) : colour,
      backgroundColor: band ? withAlpha(colour, s.strong ? 0.32 : 0.12) : bars ? withAlpha(colour, s.dashed ? 0.22 : 0.55) : s.role === "main" ? p.mainFill : colour,
      borderWidth: s.strong ? 3 : band ? 1 : s.role === "notch" ? 2 : 3,
      borderDash: s.dashed ? [8, 6] : [],
      // Markers (a shape per rail condition, the plan's steps) where the series asks for them.
      pointRadius: marks ? s.points.map((_, i) => (marks.has(i) ? (s.role === "step" ? 6 : 5) : 0)) : 0,
      pointStyle: s.marker ?? "circle",
      pointBorderColor: colour,
      pointBackgroundColor: s.role === "step" ? colour : withAlpha(colour, 0.85),
      pointBorderWidth: 2,
      showLine: !s.noLine,
      stepped: s.stepped ? "before" : false,
      fill: s.fill === "previous" ? "-1" : s.fill === "origin" ? "origin" : false,
      yAxisID: s.axis ?? "y",
      tension: 0,
      ...(s.endLabel ? { endLabel: s.endLabel } : {}),
    };
  });
  const labelled = spec.series.some((s) => s.endLabel);
  const axisStyle = { color: p.text, font: { size: 14 } };
  const scales: NonNullable<LineConfig["options"]>["scales"] = {
    x: {
      type: "linear",
      min: spec.x.min,
      max: spec.x.max,
      title: { display: true, text: spec.x.title, ...axisStyle },
      ticks: { ...axisStyle, ...(spec.x.labels ? { autoSkip: false } : {}) },
      grid: { color: p.grid },
      // Plain data for the chart worker, which turns it into the tick callback (a function cannot cross).
      ...(spec.x.labels ? { tautLabels: [...spec.x.labels] } : {}),
    },
    y: { type: "linear", min: spec.y.min, max: spec.y.max, title: { display: true, text: spec.y.title, ...axisStyle }, ticks: { ...axisStyle }, grid: { color: p.grid } },
  };
  if (spec.y2) {
    scales.y2 = {
      type: "linear",
      position: "right",
      min: spec.y2.min,
      max: spec.y2.max,
      title: { display: true, text: spec.y2.title, ...axisStyle },
      ticks: { ...axisStyle, ...(spec.y2.stepSize ? { stepSize: spec.y2.stepSize } : {}) },
      grid: { drawOnChartArea: false },
    };
  }
  return {
    type: "line",
    data: { datasets },
    options: {
      animation: false,
      locale: LOCALE_TAGS[lang],
      responsive: true,
      maintainAspectRatio: false,
      parsing: false,
      normalized: true,
      events: [],
      layout: { padding: { right: labelled ? 22 : 8 } },
      plugins: { legend: { display: false }, tooltip: { enabled: false } },
      scales,
    },
  };
}
