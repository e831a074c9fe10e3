/** Chart figures come from the core's physics (traction: INTERFACE.md; adhesion: PHYSICS.md §2). */
import { describe, expect, it } from "vitest";
import { couplerChart } from "../../src/app/charts/couplerAlong.js";
import { effortChart, speedRangeMps, totalAdhesionN, totalNotchEffortN } from "../../src/app/charts/effortSpeed.js";
import { speedNotchChart } from "../../src/app/charts/speedNotch.js";
import { niceCeil } from "../../src/app/charts/spec.js";
import { GRAVITY_MPS2 } from "../../src/core/physics/constants.js";
import { normalQuantile } from "../../src/core/physics/normal.js";
import { demoCase, fixturePlan } from "./fixtures.js";
import { Ticks } from "chart.js";
import { toChartConfig } from "../../src/app/components/chartConfig.js";
import { PALETTES } from "../../src/app/charts/palette.js";
import { setAppLanguage } from "../../src/app/i18n.js";
import { chartDe } from "../../src/i18n/de/chart.js";
import { chartHu } from "../../src/i18n/hu/chart.js";
import { wordsDe } from "../../src/i18n/de/words.js";
import { formatNumberIn } from "../../src/i18n/numbers.js";

describe("tractive effort against speed", () => {
  const c = demoCase();
  const spec = c.locomotives[0]!.spec;
  const n = spec.notchPower.length;

  it("gives each notch min(current limit, power ÷ speed), summed over the units", () => {
    const count = c.locomotives[0]!.count;
    expect(totalNotchEffortN(c, n, 0)).toBeCloseTo(count * spec.startingTractiveEffortN, 6);
    expect(totalNotchEffortN(c, 1, 0)).toBeCloseTo(count * spec.startingTractiveEffortN * spec.notchStartingEffort[0]!, 6);
    const v = 20 / 3.6;
    expect(totalNotchEffortN(c, n, v)).toBeCloseTo(count * Math.min(spec.startingTractiveEffortN, spec.railPowerW / v), 6);
    const doubled = { ...c, locomotives: [{ ...c.locomotives[0]!, count: 2 * count }] };
    expect(totalNotchEffortN(doubled, n, v)).toBeCloseTo(2 * totalNotchEffortN(c, n, v), 6);
    // A notch beyond a unit's last counts as its full notch.
    expect(totalNotchEffortN(c, n + 3, v)).toBeCloseTo(totalNotchEffortN(c, n, v), 9);
  });

  it("bands each rail condition from the slip-threshold quantile to the median", () => {
    const count = c.locomotives[0]!.count;
    const cond = c.adhesion.wet;
    const mu0 = c.conditions.sand && spec.sanders ? cond.sanded : cond.median;
    const median = count * spec.adhesionUtilisation * mu0 * spec.adhesiveMassKg * GRAVITY_MPS2;
    expect(totalAdhesionN(c, "wet", 0, 0.5)).toBeCloseTo(median, 6);
    expect(totalAdhesionN(c, "wet", 0, 0.1)).toBeCloseTo(median * Math.exp(cond.sigmaLn * normalQuantile(0.1)), 6);
    // Curtius–Kniffler shape: at 20 km/h the median falls by μ(20)/μ(0) = 0.2782/0.3315 [S: PHYSICS.md §2 checks].
    expect(totalAdhesionN(c, "wet", 20 / 3.6, 0.5) / median).toBeCloseTo(0.27819 / 0.33145, 3);
  });

  it("draws six bands, one line per notch, and the effort needed to start, in the display units", () => {
    const full = totalNotchEffortN(c, n, 0);
    const chart = effortChart(c, "metric", 197_000);
    expect(chart.series.filter((s) => s.role === "band")).toHaveLength(12);
    expect(chart.series.filter((s) => s.role === "notch")).toHaveLength(n);
    const need = chart.series.find((s) => s.role === "need")!;
    expect(need.points[0]!.y).toBeCloseTo(197, 9);
    const top = chart.series.find((s) => s.id === `notch-${n}`)!;
    expect(top.points[0]).toEqual({ x: 0, y: full / 1000 });
    expect(chart.series.find((s) => s.id === `band-${c.conditions.rail}-low`)!.strong).toBe(true);
    expect(chart.series.filter((s) => s.strong)).toHaveLength(2);
    const us = effortChart(c, "us", 197_000);
    expect(us.series.find((s) => s.id === `notch-${n}`)!.points[0]!.y).toBeCloseTo(full / 4448.2216152605, 9);
    expect(us.x.max).toBeCloseTo(chart.x.max! / 1.609344, 9);
  });

  it("shows at least 30 km/h and no more than the locomotives' top speed", () => {
    expect(speedRangeMps({ ...c, target: { kind: "distance", distanceM: 400 } })).toBeCloseTo(30 / 3.6, 12);
    expect(speedRangeMps({ ...c, target: { kind: "speed", speedMps: 200 / 3.6 } })).toBeCloseTo(spec.maxSpeedMps, 12);
  });
});

describe("axis ends", () => {
  it("round up to a short list of round multiples of a power of ten", () => {
    expect([0.7, 1, 1.2, 2.2, 3, 7, 552, 935.0000000000001, 1000, 1001, 0.031].map(niceCeil)).toEqual([0.8, 1, 1.2, 2.5, 3, 8, 600, 1000, 1000, 1200, 0.04]);
  });
});

describe("plan charts", () => {
  it("are absent while the plan has no series", () => {
    const e = new Float64Array(0);
    const p = fixturePlan({ couplerPeaksN: e, series: { timeS: e, speedMps: e, notch: e, locoTravelM: e, maxTensionN: e } });
    expect(speedNotchChart(p, "metric")).toBeNull();
    expect(couplerChart(p, 850_000, 1.2, "metric")).toBeNull();
  });

  it("put speed and notch on their own scales, and coupler peaks against the limit and limit ÷ factor", () => {
    const p = fixturePlan();
    const s = speedNotchChart(p, "us")!;
    expect(s.series.map((x) => x.axis)).toEqual(["y", "y2"]);
    expect(s.series[0]!.points.at(-1)!.y).toBeCloseTo(20 / 3.6 / 0.44704, 9);
    expect(s.y2).toMatchObject({ min: 0, max: 8, stepSize: 1 });
    expect(s.x).toMatchObject({ min: 0, max: 100 }); // last sample at 98 s, to the next 10 s
    const k = couplerChart(p, 850_000, 1.2, "metric")!;
    expect(k.series[0]!.points).toHaveLength(30);
    expect(k.series[0]!.points[0]).toEqual({ x: 1, y: 200 });
    expect(k.series.find((x) => x.id === "working")!.points[0]!.y).toBeCloseTo(850 / 1.2, 9);
    expect(k.series.find((x) => x.id === "limit")!.points[1]).toEqual({ x: 30, y: 850 });
  });
});

describe("charts in Hungarian and German", () => {
  it("name their series and axes in the language on screen", async () => {
    try {
      await setAppLanguage("de");
      const p = fixturePlan();
      const s = speedNotchChart(p, "metric")!;
      expect(s.y2!.title).toBe(chartDe.notch);
      expect(s.x.title).toBe(chartDe.timeFromPower);
      expect(s.legend.map((l) => l.label)).toEqual([(chartDe.speed as string).replace("{unit}", "km/h"), chartDe.notchRight]);
      const e = effortChart(demoCase(), "metric", 400_000);
      expect(e.y.title).toBe((chartDe.effort as string).replace("{unit}", "kN"));
      // The rail conditions in German, inside the legend's words.
      expect(e.legend.some((l) => l.label.startsWith(wordsDe.railInlineDry as string))).toBe(true);
      expect(e.legend.at(-1)!.label).toBe(chartDe.neededLegend);
      // A safety factor as set (1.25, not rounded), with a decimal comma.
      expect(couplerChart(p, 850_000, 1.25, "metric")!.series.find((x) => x.id === "working")!.label).toBe((chartDe.allowedShort as string).replace("{factor}", "1,25").replace("{unit}", "kN"));
      await setAppLanguage("hu");
      expect(speedNotchChart(p, "metric")!.y2!.title).toBe(chartHu.notch);
    } finally {
      await setAppLanguage("en");
    }
  });

  it("write their tick numbers as the language does: a decimal comma in hu and de (chart.js's tick formatter with the chart's locale; CLDR through Intl)", () => {
    const spec = speedNotchChart(fixturePlan(), "metric")!;
    const ticks = [0, 2.5, 5, 7.5].map((value) => ({ value }));
    const big = [0, 5000, 10000, 15000].map((value) => ({ value }));
    const tick = (lang: "en" | "hu" | "de", value: number, all: Array<{ value: number }>) => {
      const config = toChartConfig(spec, PALETTES.day, lang);
      const scale = { chart: { options: config.options }, options: { ticks: {} } };
      return (Ticks.formatters.numeric as (this: unknown, v: number, i: number, t: Array<{ value: number }>) => string).call(scale, value, 1, all);
    };
    expect(tick("en", 2.5, ticks)).toBe("2.5");
    expect(tick("de", 2.5, ticks)).toBe("2,5");
    expect(tick("hu", 2.5, ticks)).toBe("2,5");
    // Thousands as CLDR groups them: en 15,000; de 15.000; hu 15 000 (no-break space, from five digits).
    expect(tick("en", 15000, big)).toBe("15,000");
    expect(tick("de", 15000, big)).toBe("15.000");
    expect(tick("hu", 15000, big)).toBe("15\u00a0000");
    expect(tick("hu", 5000, big)).toBe("5000");
    // The same as the app writes its own figures.
    for (const lang of ["en", "hu", "de"] as const) {
      expect(tick(lang, 2.5, ticks)).toBe(formatNumberIn(lang, 2.5, 1, { grouping: true }));
      expect(tick(lang, 15000, big)).toBe(formatNumberIn(lang, 15000, 0, { grouping: true }));
    }
  });
});
