/**
 * The planner's lines (src/core/planner/lines.ts) in reports: the English text a report has always carried,
 * and beside it the same line as a code with its figures named with report units (`pull_kN`, `speed_kmh`,
 * `travel_m`, `release_s`, `starts_t`), so a script reads them without words and the command line writes them
 * in its language (`lineOf` turns a code back into the core's SI form for the one renderer, src/i18n).
 */
import { createTranslator } from "../i18n/translator.js";
import { siQuantities } from "../i18n/renderLines.js";

/** SI suffix of a figure's name → its report suffix and the factor from SI. Fractions and counts have none. */
const UNITS: ReadonlyArray<{ si: string; report: string; factor: number }> = [
  { si: "Mps2", report: "_ms2", factor: 1 },
  { si: "Mps", report: "_kmh", factor: 3.6 },
  { si: "Kg", report: "_t", factor: 1e-3 },
  { si: "N", report: "_kN", factor: 1e-3 },
  { si: "M", report: "_m", factor: 1 },
  { si: "S", report: "_s", factor: 1 },
];

function mapKeys(x: unknown, key: (k: string, v: unknown) => [string, unknown]): unknown {
  if (Array.isArray(x)) return x.map((v) => mapKeys(v, key));
  if (x === null || typeof x !== "object") return x;
  return Object.fromEntries(Object.entries(x as Record<string, unknown>).map(([k, v]) => key(k, mapKeys(v, key))));
}

/** A line of the core (SI figure names) as a report carries it: each figure named with its report unit. */
export function lineReport<T>(x: T): unknown {
  return mapKeys(x, (k, v) => {
    const u = UNITS.find((u) => k.length > u.si.length && k.endsWith(u.si) && /[a-z]/.test(k[k.length - u.si.length - 1]!));
    if (!u) return [k, v];
    return [k.slice(0, -u.si.length) + u.report, typeof v === "number" ? v * u.factor : v];
  });
}

/** A line back from its report form (the inverse of `lineReport`). */
export function lineOf<T>(x: unknown): T {
  return mapKeys(x, (k, v) => {
    const u = UNITS.find((u) => k.endsWith(u.report));
    if (!u) return [k, v];
    return [k.slice(0, -u.report.length) + u.si, typeof v === "number" ? v / u.factor : v];
  }) as T;
}

/** The translator and figures of the English text reports carry. */
export const ENGLISH = createTranslator("en", null);
export const ENGLISH_SI = siQuantities(ENGLISH);
