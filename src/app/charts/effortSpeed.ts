/**
 * Tractive effort against speed for every notch of the chosen locomotives, with the adhesion band of
 * each rail condition: from the adhesion exceeded with probability 1 − threshold (below it the slip risk
 * stays under the setting) up to the median (slip risk 50 %). Computed from the core's traction and
 * adhesion functions for the case on screen; needs no plan.
 */
import { adhesionLimitN, adhesionQuantile, medianAdhesion } from "../../core/physics/adhesion.js";
import { notchEffortN } from "../../core/physics/traction.js";
import { RAIL_CONDITIONS, type RailCondition } from "../../core/physics/types.js";
import type { StartCase } from "../../core/train/types.js";
import { percent, toDisplay, unitSymbol, type UnitSystem } from "../format.js";
import { RAIL_MARKER } from "./colours.js";
import { niceCeil, type ChartSpec, type LegendEntry, type LineSeries, type Point } from "./spec.js";
import { chart } from "../../i18n/en/chart.js";
import { tr } from "../i18n.js";

const t = tr.ns(chart);
import { words } from "../words.js";

/** A plan step on the chart: where its adhesion use was highest (speed, and the effort its notch asks there). */
export interface StepMark {
  /** Step number, from 1. */
  number: number;
  speedMps: number;
  effortN: number;
}

/** Samples of a band's median line that carry its marker. */
const MARK_EVERY = 6;

/** Sample points along the speed axis. */
const SAMPLES = 31;

/** The speed range shown: to 1.5 × the target speed, at least 30 km/h, at most the slowest locomotive's top speed, m/s. */
export function speedRangeMps(c: StartCase): number {
  const top = Math.min(...c.locomotives.map((g) => g.spec.maxSpeedMps));
  const target = c.target.kind === "speed" ? c.target.speedMps * 1.5 : 0;
  return Math.min(top, Math.max(30 / 3.6, target));
}

/** Total tractive effort of all locomotives in `notch` at a speed, N (a unit with fewer notches gives its top notch). */
export function totalNotchEffortN(c: StartCase, notch: number, speedMps: number): number {
  return c.locomotives.reduce((s, g) => s + g.count * notchEffortN(g.spec, Math.min(notch, g.spec.notchPower.length), speedMps), 0);
}

/** What the rails transmit under all locomotives at a speed for a condition, at probability `p` of slipping, N. */
export function totalAdhesionN(c: StartCase, rail: RailCondition, speedMps: number, p: number): number {
  const cond = c.adhesion[rail];
  return c.locomotives.reduce((s, g) => {
    const median = medianAdhesion(c.adhesion, rail, c.conditions.sand && g.spec.sanders, speedMps);
    const mu = p === 0.5 ? median : adhesionQuantile(median, cond.sigmaLn, p);
    return s + g.count * adhesionLimitN(g.spec.adhesiveMassKg, g.spec.adhesionUtilisation, mu);
  }, 0);
}

export function effortChart(c: StartCase, units: UnitSystem, requiredN?: number, steps: readonly StepMark[] = []): ChartSpec {
  const vMax = speedRangeMps(c);
  const speeds = Array.from({ length: SAMPLES }, (_, i) => (vMax * i) / (SAMPLES - 1));
  const x = (v: number) => toDisplay("speed", v, "mps", units);
  const f = (n: number) => toDisplay("force", n, "N", units);
  const notches = Math.max(...c.locomotives.map((g) => g.spec.notchPower.length));
  const p = c.settings.slipRiskThreshold;
  const series: LineSeries[] = [];
  const conditions = [...RAIL_CONDITIONS].sort((a, b) => c.adhesion[b].median - c.adhesion[a].median);
  conditions.forEach((rail, k) => {
    const strong = rail === c.conditions.rail;
    const low: Point[] = speeds.map((v) => ({ x: x(v), y: f(totalAdhesionN(c, rail, v, p)) }));
    const high: Point[] = speeds.map((v) => ({ x: x(v), y: f(totalAdhesionN(c, rail, v, 0.5)) }));
    const marks = high.map((_, i) => i).filter((i) => (i + k) % MARK_EVERY === 0);
    series.push({ id: `band-${rail}-low`, label: t("bandLow", { rail: words.railInline(rail), risk: percent(p, 0) }), points: low, role: "band", tone: k, tones: conditions.length, strong, rail });
    series.push({
      id: `band-${rail}-high`,
      label: t("bandHigh", { rail: words.railInline(rail) }),
      points: high,
      role: "band",
      tone: k,
      tones: conditions.length,
      fill: "previous",
      strong,
      rail,
      marker: RAIL_MARKER[rail],
      markAt: marks,
    });
  });
  for (let n = 1; n <= notches; n++) {
    series.push({
      id: `notch-${n}`,
      label: t("notchN", { n }),
      points: speeds.map((v) => ({ x: x(v), y: f(totalNotchEffortN(c, n, v)) })),
      role: "notch",
      tone: n - 1,
      tones: notches,
      endLabel: String(n),
    });
  }
  for (const st of steps) {
    if (!(st.effortN > 0) || st.speedMps > vMax) continue;
    series.push({ id: `step-${st.number}`, label: t("stepN", { n: st.number }), points: [{ x: x(st.speedMps), y: f(st.effortN) }], role: "step", marker: "circle", noLine: true, endLabel: t("stepMark", { n: st.number }) });
  }
  const fullAtRest = totalNotchEffortN(c, notches, 0);
  if (requiredN !== undefined && Number.isFinite(requiredN) && requiredN > 0) {
    series.push({ id: "need", label: t("needed"), points: [{ x: 0, y: f(requiredN) }, { x: x(vMax), y: f(requiredN) }], role: "need", dashed: true });
  }
  const top = niceCeil(f(Math.max(fullAtRest, requiredN ?? 0) * 1.2));
  const unit = unitSymbol("force", units);
  const legend: LegendEntry[] = [
    { label: t("notchesLegend", { n: notches }), role: "notch", tone: notches - 1, tones: notches },
    ...conditions.map((rail, k) => ({
      label: t("band", { rail: words.railInline(rail), sand: c.conditions.sand ? t("withSand") : "", chosen: rail === c.conditions.rail ? t("chosen") : "" }),
      role: "band" as const,
      tone: k,
      tones: conditions.length,
      rail,
      marker: RAIL_MARKER[rail],
    })),
  ];
  if (steps.some((st) => st.effortN > 0 && st.speedMps <= vMax)) {
    legend.push({ label: t("stepsLegend"), role: "step", marker: "circle" });
  }
  if (requiredN !== undefined && requiredN > 0) legend.push({ label: t("neededLegend"), role: "need", dashed: true });
  return {
    series,
    x: { title: t("speed", { unit: unitSymbol("speed", units) }), min: 0, max: x(vMax) },
    y: { title: t("effort", { unit }), min: 0, max: top },
    legend,
  };
}
