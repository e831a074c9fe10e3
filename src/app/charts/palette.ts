/**
 * Chart colours. A series keeps its colour in both themes — with sand is the same blue by day and by night,
 * each rail condition has one colour of its own whatever the order or the sand — so what a driver learns by
 * day still holds at night. The series colours are mid-tones that keep 3:1 against the day surface and the
 * night surface alike (WCAG 2.1, 1.4.11 non-text contrast), and stay apart for protan, deutan and tritan
 * vision (tests/app/palette.test.ts simulates them). Colour is never the only cue: rail conditions carry a
 * marker shape each, and the bars without sand a dashed outline. Only the axes, the grid, the "needed" line
 * (text colours) and the notch ramp (light to dark by day, dark to light at night, numbered at the right)
 * follow the theme.
 * The page's first load needs only the palettes (this module); what draws with them (`colours.ts`: a series'
 * colour, a fill, the rail markers) loads with the charts.
 */
import type { RailCondition } from "../../core/physics/types.js";
import type { Theme } from "../state/createTheme.js";

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
  /** One colour per rail condition. */
  rail: Readonly<Record<RailCondition, string>>;
}

/** Colours that are the same in both themes. */
export const SERIES = {
  /** The main series (speed; with sand). */
  main: "#3f6fd6",
  /** The second series (notch; without sand). */
  second: "#c96f0c",
  limit: "#c65a50",
  working: "#b28a4a",
} as const;

/** One colour per rail condition, in both themes. */
export const RAIL_COLOUR: Readonly<Record<RailCondition, string>> = {
  dry: "#8a9c1b",
  damp: "#1ca3aa",
  wet: "#804efa",
  frost: "#73646b",
  leaves: "#a98378",
  greasy: "#3f7132",
};

export const PALETTES: Record<Theme, ChartPalette> = {
  day: {
    text: "#1f262d",
    grid: "rgba(31,38,45,0.14)",
    main: SERIES.main,
    mainFill: "rgba(63,111,214,0.18)",
    second: SERIES.second,
    limit: SERIES.limit,
    working: SERIES.working,
    need: "#111111",
    notchFrom: [150, 170, 190],
    notchTo: [20, 40, 70],
    rail: RAIL_COLOUR,
  },
  night: {
    text: "#b9c0c7",
    grid: "rgba(185,192,199,0.14)",
    main: SERIES.main,
    mainFill: "rgba(63,111,214,0.18)",
    second: SERIES.second,
    limit: SERIES.limit,
    working: SERIES.working,
    need: "#d8dde2",
    notchFrom: [70, 80, 90],
    notchTo: [190, 196, 202],
    rail: RAIL_COLOUR,
  },
};
