/**
 * Chart colours: one colour per series in both themes, readable on both surfaces, apart for colour-blind
 * readers, and never the only cue.
 * - Colour-vision deficiency: Machado, Oliveira & Fernandes, "A physiologically-based model for simulation of
 *   color vision deficiency", IEEE TVCG 15(6), 2009 — the severity-1.0 matrices for protanopia, deuteranopia
 *   and tritanopia, applied to linear sRGB [S: the matrices as reproduced by several open colour libraries].
 * - Colour difference: CIEDE2000 (CIE 142-2001) as implemented by Sharma, Wu & Dalal, "The CIEDE2000
 *   color-difference formula: implementation notes, supplementary test data, and mathematical observations",
 *   Color Res. Appl. 30(1), 2005 — checked here against pairs 1, 2, 3, 7 and 17 of their Table 1 [S].
 * - sRGB to CIELAB (D65): IEC 61966-2-1 and CIE 15:2004. Contrast: WCAG 2.1 relative luminance and contrast
 *   ratio, with 3:1 for graphical objects (success criterion 1.4.11).
 */
import { describe, expect, it } from "vitest";
import { RAIL_MARKER } from "../../src/app/charts/colours.js";
import { PALETTES, RAIL_COLOUR, SERIES } from "../../src/app/charts/palette.js";
import { effortChart } from "../../src/app/charts/effortSpeed.js";
import { loadChart } from "../../src/app/screens/LoadTable/loadChart.js";
import { RAIL_CONDITIONS } from "../../src/core/physics/types.js";
import { demoCase } from "./fixtures.js";

type Vec = [number, number, number];
const MACHADO: Record<"protanopia" | "deuteranopia" | "tritanopia", [Vec, Vec, Vec]> = {
  protanopia: [
    [0.152286, 1.052583, -0.204868],
    [0.114503, 0.786281, 0.099216],
    [-0.003882, -0.048116, 1.051998],
  ],
  deuteranopia: [
    [0.367322, 0.860646, -0.227968],
    [0.280085, 0.672501, 0.047413],
    [-0.01182, 0.04294, 0.968881],
  ],
  tritanopia: [
    [1.255528, -0.076749, -0.178779],
    [-0.078411, 0.930809, 0.147602],
    [0.004733, 0.691367, 0.3039],
  ],
};

const hex = (h: string): Vec => [1, 3, 5].map((i) => parseInt(h.slice(i, i + 2), 16) / 255) as Vec;
/** sRGB (0..1) to linear light (IEC 61966-2-1). */
const linear = (c: number) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4);
const lin = (h: string): Vec => hex(h).map(linear) as Vec;
const simulate = (l: Vec, m: [Vec, Vec, Vec]): Vec => m.map((row) => Math.min(1, Math.max(0, row[0] * l[0] + row[1] * l[1] + row[2] * l[2]))) as Vec;

/** Linear sRGB to CIELAB, D65 white (CIE 15:2004). */
function lab(l: Vec): Vec {
  const X = (0.4124564 * l[0] + 0.3575761 * l[1] + 0.1804375 * l[2]) / 0.95047;
  const Y = 0.2126729 * l[0] + 0.7151522 * l[1] + 0.072175 * l[2];
  const Z = (0.0193339 * l[0] + 0.119192 * l[1] + 0.9503041 * l[2]) / 1.08883;
  const f = (t: number) => (t > 216 / 24389 ? Math.cbrt(t) : (24389 / 27 * t + 16) / 116);
  return [116 * f(Y) - 16, 500 * (f(X) - f(Y)), 200 * (f(Y) - f(Z))];
}

/** CIEDE2000, following Sharma, Wu & Dalal (2005) step by step. */
function de2000([L1, a1, b1]: Vec, [L2, a2, b2]: Vec): number {
  const rad = Math.PI / 180;
  const Cb = (Math.hypot(a1, b1) + Math.hypot(a2, b2)) / 2;
  const G = 0.5 * (1 - Math.sqrt(Cb ** 7 / (Cb ** 7 + 25 ** 7)));
  const a1p = (1 + G) * a1;
  const a2p = (1 + G) * a2;
  const C1p = Math.hypot(a1p, b1);
  const C2p = Math.hypot(a2p, b2);
  const hue = (b: number, a: number) => (b === 0 && a === 0 ? 0 : ((Math.atan2(b, a) / rad) % 360 + 360) % 360);
  const h1p = hue(b1, a1p);
  const h2p = hue(b2, a2p);
  const dLp = L2 - L1;
  const dCp = C2p - C1p;
  let dhp = 0;
  if (C1p * C2p !== 0) {
    dhp = h2p - h1p;
    if (dhp > 180) dhp -= 360;
    else if (dhp < -180) dhp += 360;
  }
  const dHp = 2 * Math.sqrt(C1p * C2p) * Math.sin((dhp / 2) * rad);
  const Lbp = (L1 + L2) / 2;
  const Cbp = (C1p + C2p) / 2;
  let hbp = h1p + h2p;
  if (C1p * C2p !== 0) hbp = Math.abs(h1p - h2p) <= 180 ? (h1p + h2p) / 2 : h1p + h2p < 360 ? (h1p + h2p + 360) / 2 : (h1p + h2p - 360) / 2;
  const T = 1 - 0.17 * Math.cos((hbp - 30) * rad) + 0.24 * Math.cos(2 * hbp * rad) + 0.32 * Math.cos((3 * hbp + 6) * rad) - 0.2 * Math.cos((4 * hbp - 63) * rad);
  const dTheta = 30 * Math.exp(-(((hbp - 275) / 25) ** 2));
  const Rc = 2 * Math.sqrt(Cbp ** 7 / (Cbp ** 7 + 25 ** 7));
  const Sl = 1 + (0.015 * (Lbp - 50) ** 2) / Math.sqrt(20 + (Lbp - 50) ** 2);
  const Sc = 1 + 0.045 * Cbp;
  const Sh = 1 + 0.015 * Cbp * T;
  const Rt = -Math.sin(2 * dTheta * rad) * Rc;
  return Math.sqrt((dLp / Sl) ** 2 + (dCp / Sc) ** 2 + (dHp / Sh) ** 2 + Rt * (dCp / Sc) * (dHp / Sh));
}

/** WCAG 2.1 contrast ratio of two colours. */
function contrast(a: string, b: string): number {
  const Y = (h: string) => {
    const l = lin(h);
    return 0.2126 * l[0] + 0.7152 * l[1] + 0.0722 * l[2];
  };
  const [hi, lo] = [Y(a), Y(b)].sort((x, y) => y - x) as [number, number];
  return (hi + 0.05) / (lo + 0.05);
}

/** The smallest CIEDE2000 difference between any two of the colours, for normal vision and each simulated deficiency. */
function worstDifference(colours: readonly string[]): Record<string, number> {
  const out: Record<string, number> = {};
  for (const [name, m] of [["normal", null], ...Object.entries(MACHADO)] as Array<[string, [Vec, Vec, Vec] | null]>) {
    const labs = colours.map((c) => lab(m ? simulate(lin(c), m) : lin(c)));
    let worst = Infinity;
    for (let i = 0; i < labs.length; i++) for (let j = i + 1; j < labs.length; j++) worst = Math.min(worst, de2000(labs[i]!, labs[j]!));
    out[name] = worst;
  }
  return out;
}

/** The chart surfaces of the two themes (the panel colour, src/app/styles.css --surface). */
const SURFACE = { day: "#ffffff", night: "#151a1f" };

describe("the colour arithmetic", () => {
  it("CIEDE2000 gives Sharma, Wu & Dalal's values (Table 1, pairs 1, 2, 3, 7, 17)", () => {
    const pairs: Array<[Vec, Vec, number]> = [
      [[50, 2.6772, -79.7751], [50, 0, -82.7485], 2.0425],
      [[50, 3.1571, -77.2803], [50, 0, -82.7485], 2.8615],
      [[50, 2.8361, -74.02], [50, 0, -82.7485], 3.4412],
      [[50, 0, 0], [50, -1, 2], 2.3669],
      [[50, 2.5, 0], [73, 25, -18], 27.1492],
    ];
    for (const [a, b, d] of pairs) expect(de2000(a, b)).toBeCloseTo(d, 4);
  });

  it("sRGB white is L* 100 and the deficiency matrices leave greys grey (each row sums to 1)", () => {
    expect(lab(lin("#ffffff"))[0]).toBeCloseTo(100, 3);
    for (const m of Object.values(MACHADO)) for (const row of m) expect(row[0] + row[1] + row[2]).toBeCloseTo(1, 3);
    expect(contrast("#ffffff", "#000000")).toBeCloseTo(21, 9);
  });
});

describe("chart series colours", () => {
  it("are the same in the day and the night theme", () => {
    expect(PALETTES.night.rail).toEqual(PALETTES.day.rail);
    for (const k of ["main", "second", "limit", "working"] as const) expect(PALETTES.night[k]).toBe(PALETTES.day[k]);
  });

  it("keep 3:1 against both themes' chart surface (WCAG 2.1, 1.4.11)", () => {
    for (const c of [...Object.values(RAIL_COLOUR), SERIES.main, SERIES.second, SERIES.limit, SERIES.working]) {
      expect(contrast(c, SURFACE.day), `${c} by day`).toBeGreaterThanOrEqual(3);
      expect(contrast(c, SURFACE.night), `${c} at night`).toBeGreaterThanOrEqual(3);
    }
  });

  it("with and without sand stay far apart for every kind of colour vision (ΔE2000 ≥ 40)", () => {
    const d = worstDifference([SERIES.main, SERIES.second]);
    for (const [vision, v] of Object.entries(d)) expect(v, vision).toBeGreaterThanOrEqual(40);
  });

  it("the six rail conditions stay apart for every kind of colour vision (ΔE2000 ≥ 15 for every pair)", () => {
    const d = worstDifference(RAIL_CONDITIONS.map((r) => RAIL_COLOUR[r]));
    for (const [vision, v] of Object.entries(d)) expect(v, vision).toBeGreaterThanOrEqual(15);
  });

  it("a deficiency check that can fail: the old day bands' red and green fall together for deuteranopia", () => {
    // #2e7d4f (green) and #b3261e (red), two of the previous day palette's band colours.
    expect(worstDifference(["#2e7d4f", "#b3261e"]).deuteranopia).toBeLessThan(15);
  });
});

describe("colour is never the only cue", () => {
  it("each rail condition has its own marker shape, on the chart and in its legend, whatever the sand", () => {
    expect(new Set(Object.values(RAIL_MARKER)).size).toBe(RAIL_CONDITIONS.length);
    const c = demoCase();
    for (const sand of [false, true]) {
      const spec = effortChart({ ...c, conditions: { ...c.conditions, sand } }, "metric", 150_000);
      for (const rail of RAIL_CONDITIONS) {
        const high = spec.series.find((s) => s.id === `band-${rail}-high`)!;
        expect(high.rail).toBe(rail);
        expect(high.marker).toBe(RAIL_MARKER[rail]);
        expect(high.markAt!.length).toBeGreaterThan(2);
        expect(spec.legend.find((e) => e.rail === rail)!.marker).toBe(RAIL_MARKER[rail]);
      }
    }
  });

  it("the bars without sand are outlined dashed, in the chart and in its legend", () => {
    const rows = RAIL_CONDITIONS.flatMap((rail) => [false, true].map((sand) => ({ rail, sand, maxTrailingMassKg: 1_000_000 })));
    const spec = loadChart(rows, 1_400_000, "metric")!;
    expect(spec.series.find((s) => s.id === "no-sand")).toMatchObject({ dashed: true, bars: true, role: "second" });
    expect(spec.series.find((s) => s.id === "sand")!.dashed).toBeUndefined();
    expect(spec.legend.find((e) => e.label === "Without sand")).toMatchObject({ dashed: true, box: true });
  });
});
