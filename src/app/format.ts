/**
 * SI (and file units) to display and back, metric or US customary, through the core's one table of
 * unit factors (`convert`). Every figure the app shows and every number it reads passes through here.
 */
import { convert, convertTemperature, type Quantity } from "../core/physics/units.js";
import { roundHalfAway } from "../profiles/numbers.js";
import { parseNumberIn } from "../i18n/numbers.js";
import { units } from "../i18n/en/units.js";
import { appLang, appNumber, tr } from "./i18n.js";

export type UnitSystem = "metric" | "us";

type Linear = Exclude<Quantity, "temperature">;

interface LinearMeasure {
  quantity: Linear;
  /** Unit ids of the core's table (`UNIT_FACTORS[quantity]`). */
  si: string;
  metric: string;
  us: string;
  /** Decimals shown: [metric, US]. */
  decimals: readonly [number, number];
}

/** What the app measures, and the unit each system shows it in. */
export const MEASURES = {
  mass: { quantity: "mass", si: "kg", metric: "t", us: "shortTon", decimals: [0, 0] },
  force: { quantity: "force", si: "N", metric: "kN", us: "klbf", decimals: [0, 1] },
  speed: { quantity: "speed", si: "mps", metric: "kmh", us: "mph", decimals: [1, 1] },
  distance: { quantity: "length", si: "m", metric: "m", us: "ft", decimals: [0, 0] },
  slack: { quantity: "length", si: "m", metric: "mm", us: "in", decimals: [0, 2] },
  grade: { quantity: "grade", si: "fraction", metric: "permille", us: "percent", decimals: [1, 2] },
  radius: { quantity: "length", si: "m", metric: "m", us: "ft", decimals: [0, 0] },
} as const satisfies Record<string, LinearMeasure>;

export type MeasureKey = keyof typeof MEASURES | "temperature";

/** Unit symbols as shown beside a figure (a unit without a known symbol is named in the language on screen: NAMED). */
const SYMBOLS: Record<string, string> = {
  t: "t",
  kN: "kN",
  klbf: "klbf",
  kmh: "km/h",
  mph: "mph",
  m: "m",
  ft: "ft",
  mm: "mm",
  in: "in",
  permille: "‰",
  percent: "%",
  C: "°C",
  F: "°F",
};

/** The unit (an id in the core's table) a measure is shown in. */
export function displayUnit(m: MeasureKey, system: UnitSystem): string {
  if (m === "temperature") return system === "us" ? "F" : "C";
  return MEASURES[m][system];
}

/** The symbol shown for a measure in a unit system, e.g. "km/h" or "short tons". */
export function unitSymbol(m: MeasureKey, system: UnitSystem): string {
  const u = displayUnit(m, system);
  if (u === "shortTon") return tr.ns(units)("shortTon");
  return SYMBOLS[u] ?? u;
}

/** Decimals shown for a measure. */
export function decimalsOf(m: MeasureKey, system: UnitSystem): number {
  if (m === "temperature") return 0;
  return MEASURES[m].decimals[system === "us" ? 1 : 0];
}

/** Convert a value given in `from` (a unit of the measure's quantity, e.g. a file unit) into display units. */
export function toDisplay(m: MeasureKey, value: number, from: string, system: UnitSystem): number {
  if (m === "temperature") return convertTemperature(value, from as "C" | "F", displayUnit(m, system) as "C" | "F");
  const q = MEASURES[m].quantity;
  return convert(q, value, from as never, displayUnit(m, system) as never);
}

/** Convert a value typed in display units into `to` (a unit of the measure's quantity). */
export function fromDisplay(m: MeasureKey, value: number, to: string, system: UnitSystem): number {
  if (m === "temperature") return convertTemperature(value, displayUnit(m, system) as "C" | "F", to as "C" | "F");
  const q = MEASURES[m].quantity;
  return convert(q, value, displayUnit(m, system) as never, to as never);
}

/** The SI unit of a measure. */
export function siUnit(m: MeasureKey): string {
  return m === "temperature" ? "C" : MEASURES[m].si;
}

/**
 * A number with grouping and a fixed count of decimals as the language on screen writes it (en-GB
 * "1,500.5", hu "1500,5" and "12 345", de "1.500,5"); "−" for negatives, "–" for not-a-number.
 */
export function formatNumber(x: number, decimals: number): string {
  return appNumber(x, decimals);
}

/** Display value (number only) of an SI quantity. */
export function valueOf(m: MeasureKey, si: number, system: UnitSystem, decimals = decimalsOf(m, system)): string {
  return formatNumber(toDisplay(m, si, siUnit(m), system), decimals);
}

/** Display text of an SI quantity with its unit, e.g. "1,500 t" or "1,653 short tons". */
export function show(m: MeasureKey, si: number, system: UnitSystem, decimals?: number): string {
  const v = valueOf(m, si, system, decimals);
  return `${v} ${unitSymbol(m, system)}`;
}

/**
 * Figures the command line prints too, rounded as it rounds them: once, from the SI value (its JSON carries
 * these forces and fractions unrounded; src/i18n/rounding.ts), so the app, `taut plan` and the lines of the
 * limits and why never differ by one in the last digit.
 */
export function showForce(si: number, system: UnitSystem, decimals?: number): string {
  return show("force", si, system, decimals);
}

/** A fraction as the command line rounds it (once, from the value itself), as a percentage. */
export function percentOf(fraction: number, decimals = 1): string {
  return percent(fraction, decimals);
}

/**
 * A largest-that-still-works figure (the largest trailing mass that starts): rounded down in the display
 * unit, never up, as the command line's whole tonnes are (`maxStartableMass_t`).
 */
export function showAtMost(m: MeasureKey, si: number, system: UnitSystem, decimals = decimalsOf(m, system)): string {
  if (!Number.isFinite(si)) return valueOf(m, si, system, decimals);
  const f = 10 ** decimals;
  const shown = Math.floor(toDisplay(m, si, siUnit(m), system) * f + 1e-9) / f;
  return `${formatNumber(shown, decimals)} ${unitSymbol(m, system)}`;
}

/** A fraction 0..1 as a percentage, e.g. 0.061 → "6.1 %". Values under 0.1 % read "< 0.1 %". */
export function percent(fraction: number, decimals = 1): string {
  if (!Number.isFinite(fraction)) return "–";
  const p = fraction * 100;
  // "< 1 %" only where the figure would read 0, as the command line and the why lines write it.
  if (p > 0 && p < 0.5 * 10 ** -decimals) return `< ${formatNumber(10 ** -decimals, decimals)} %`;
  return `${formatNumber(p, decimals)} %`;
}

/** A margin (available ÷ needed) as "× 1.05": from the three decimals the command line's JSON gives, as `taut` prints it. */
export function margin(x: number): string {
  if (!Number.isFinite(x)) return "–";
  if (x >= 99) return "× 99+";
  return `× ${formatNumber(roundHalfAway(x, 3), 2)}`;
}

/** Seconds as "45 s" or "2 min 05 s". */
export function duration(s: number): string {
  if (!Number.isFinite(s)) return "–";
  const whole = Math.max(0, Math.round(s));
  if (whole < 60) return `${whole} s`;
  const m = Math.floor(whole / 60);
  return `${m} min ${String(whole % 60).padStart(2, "0")} s`;
}

/** Seconds as a clock "m:ss". */
export function clock(s: number): string {
  const whole = Math.max(0, Math.floor(s));
  return `${Math.floor(whole / 60)}:${String(whole % 60).padStart(2, "0")}`;
}

/**
 * Read a number typed by a user in the language on screen: a decimal comma or point where it cannot be a
 * grouping, spaces and the language's grouping; NaN when the text is not a number.
 */
export function parseNumber(text: string): number {
  return parseNumberIn(appLang(), text);
}

const TEXT_UNITS: Record<string, { m: MeasureKey; from: string }> = {
  kN: { m: "force", from: "kN" },
  "km/h": { m: "speed", from: "kmh" },
  mm: { m: "slack", from: "mm" },
  m: { m: "distance", from: "m" },
  t: { m: "mass", from: "t" },
  "‰": { m: "grade", from: "permille" },
  "°C": { m: "temperature", from: "C" },
};
const TEXT_QUANTITY = /(−|-)?(\d{1,3}(?:,\d{3})+|\d+)(\.\d+)?\s?(kN|km\/h|mm|m|t|‰|°C)(?![\p{L}\p{N}/])/gu;

/**
 * Figures inside a sentence from the core (a step's "why" line, a caution) put into the user's units:
 * "115 kN … 414 m" reads "25.9 klbf … 1,358 ft" in US customary units. Metric text is returned as it is.
 */
export function localiseText(text: string, system: UnitSystem): string {
  if (system === "metric") return text;
  return text.replace(TEXT_QUANTITY, (_all, sign: string | undefined, whole: string, frac: string | undefined, unit: string) => {
    const u = TEXT_UNITS[unit]!;
    const value = Number(`${sign ? "-" : ""}${whole.replace(/,/g, "")}${frac ?? ""}`);
    const shown = toDisplay(u.m, value, u.from, system);
    const dec = u.m === "distance" && Math.abs(shown) < 10 ? 1 : decimalsOf(u.m, system);
    return `${formatNumber(shown, dec)} ${unitSymbol(u.m, system)}`;
  });
}
