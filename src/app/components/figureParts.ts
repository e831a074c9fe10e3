/**
 * Where a line of text holds figures with their units, which components/Figures.tsx keeps each on one line:
 * the rule in plain TypeScript, so that the browser tests (tests/e2e/figuresWrap.test.ts) measure the page
 * with the rule the app applies.
 *
 * The units the app writes after a figure, metric and US customary (format.ts), longest first. The written-out
 * US mass unit comes from the units catalog in each language (en/hu/de units.ts); its words are repeated here
 * so this first-chunk module need not load the other languages' catalogs — tests/app/figures.test.tsx checks
 * every figure format.ts writes in every language against this list.
 */
const UNITS = ["short tons", "rövid tonna", "US-Tonnen", "km/h", "klbf", "mph", "kN", "kW", "mm", "ft", "in", "min", "°C", "°F", "‰", "%", "m", "t", "s", "h"];
const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\/]/g, "\\$&");
const UNIT = `(?:${UNITS.map(escape).join("|")})`;
/**
 * A figure: an optional sign or comparison ("× ", "< ", "≤ ", "~"), digits with the languages' grouping and
 * decimal signs (",", ".", no-break and narrow no-break spaces), then a space and a unit (a duration's
 * "2 min 05 s" as one), not followed by a letter (so "5 min" is a figure and "5 mins" is not).
 */
const NUMBER = "[−-]?\\d(?:\\d|[.,\\u00a0\\u202f](?=\\d))*";
const FIGURE = new RegExp(`(?:[×<>≤≥≈~] ?)?${NUMBER}(?: min \\d+)? ${UNIT}(?![\\p{L}\\p{N}])|[×<>≤≥≈] ${NUMBER}`, "gu");

export type Part = string | { figure: string };

/** The text cut into plain words and figures with their units. */
export function figureParts(text: string): Part[] {
  const out: Part[] = [];
  let at = 0;
  for (const m of text.matchAll(FIGURE)) {
    if (m.index > at) out.push(text.slice(at, m.index));
    out.push({ figure: m[0] });
    at = m.index + m[0].length;
  }
  if (at < text.length) out.push(text.slice(at));
  return out;
}
