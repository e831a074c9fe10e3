/** Chart colours per theme: the night palette is dark with dim, warm accents (low glare). */
import type { Theme } from "../state/createTheme.js";
import type { SeriesRole } from "./spec.js";

export interface ChartPalette {
  text: string;
  grid: string;
  main: string;
  mainFill: string;
  second: string;
  limit: string;
  working: string;
  need: string;
  /** Notch lines from the lowest to the highest notch. */
  notchFrom: [number, number, number];
  notchTo: [number, number, number];
  /** Adhesion bands from the best to the worst rail condition. */
  bands: readonly string[];
}

export const PALETTES: Record<Theme, ChartPalette> = {
  day: {
    text: "#1f262d",
    grid: "rgba(31,38,45,0.14)",
    main: "#1c5d99",
    mainFill: "rgba(28,93,153,0.18)",
    second: "#a14d00",
    limit: "#b3261e",
    working: "#7a4a00",
    need: "#111111",
    notchFrom: [150, 170, 190],
    notchTo: [20, 40, 70],
    bands: ["#2e7d4f", "#3f7fbf", "#6a5acd", "#8a6d00", "#b35c1e", "#b3261e"],
  },
  night: {
    text: "#b9c0c7",
    grid: "rgba(185,192,199,0.14)",
    main: "#c7873a",
    mainFill: "rgba(199,135,58,0.18)",
    second: "#8fa7b8",
    limit: "#c65a50",
    working: "#b28a4a",
    need: "#d8dde2",
    notchFrom: [70, 80, 90],
    notchTo: [190, 196, 202],
    bands: ["#4f8f6a", "#5a7fa6", "#7c71b0", "#a08a3c", "#a8693c", "#a9544c"],
  },
};

/** Colour of a series by role and tone. */
export function colourOf(p: ChartPalette, role: SeriesRole, tone = 0, tones = 1): string {
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
      return p.need;
    case "notch": {
      const t = tones <= 1 ? 1 : tone / (tones - 1);
      const c = p.notchFrom.map((a, i) => Math.round(a + (p.notchTo[i]! - a) * t));
      return `rgb(${c[0]},${c[1]},${c[2]})`;
    }
    case "band":
      return p.bands[Math.min(p.bands.length - 1, Math.round((tone / Math.max(1, tones - 1)) * (p.bands.length - 1)))]!;
  }
}

/** A colour with an alpha (for band fills). */
export function withAlpha(hex: string, alpha: number): string {
  const m = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(hex);
  if (!m) return hex;
  return `rgba(${parseInt(m[1]!, 16)},${parseInt(m[2]!, 16)},${parseInt(m[3]!, 16)},${alpha})`;
}
