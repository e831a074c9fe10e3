/** Plain-text tables for the terminal: columns padded, numbers right-aligned. */
import { cliTr } from "./lang.js";
import { cli } from "../i18n/en/cli.js";

export function textTable(header: readonly string[], rows: ReadonlyArray<ReadonlyArray<string>>): string {
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => (r[i] ?? "").length)));
  // "none" (no mass starts) in this run's language stands in a column of numbers: "nincs", "keine" too; a
  // figure may carry a marker (" *": the slip protection acts in that step), or room for one ("  ") so that the
  // figures line up.
  const none = new Set(["—", "none", cliTr().ns(cli)("none")]);
  const isNum = header.map((_, i) => rows.length > 0 && rows.every((r) => /^[-+<]?[\d.,]+\+?%?( @[\d.,]+)?( \*| {2})?$/.test(r[i] ?? "") || none.has(r[i] ?? "")));
  const line = (cells: readonly string[]) =>
    cells.map((c, i) => (isNum[i] ? c.padStart(widths[i]!) : c.padEnd(widths[i]!))).join("  ").trimEnd();
  return [line(header), widths.map((w) => "-".repeat(w)).join("  "), ...rows.map(line)].join("\n");
}

/**
 * Format with fixed decimals (rounded as the app rounds: src/profiles/numbers.ts) as this run's language
 * writes them (a decimal comma in Hungarian and German; no grouping), or a dash when absent. Text only: CSV
 * and JSON carry their numbers as they are.
 */
export function num(x: number | null | undefined, decimals = 0): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return "—";
  return cliTr().num(x, decimals);
}

/**
 * A margin (allowance ÷ demand) to two decimals. The core caps a margin at 99 (outcome.ts; 99 also when
 * nothing is demanded), so a capped one reads "99+", as the app writes it ("× 99+"): "99.00" read as an
 * exact figure where 600 m clear against 4 m of travel is 171.
 */
export function marginNum(x: number | null | undefined): string {
  if (x !== null && x !== undefined && x >= 99) return "99+";
  return num(x, 2);
}

/** A fraction as a percentage; a small one that would read 0 reads "<0.1%" (as the app shows it). */
export function pct(x: number, decimals = 0): string {
  const p = x * 100;
  if (p > 0 && p < 0.5 * 10 ** -decimals) return `<${num(10 ** -decimals, decimals)}%`;
  return `${num(p, decimals)}%`;
}

export { toCsv as csv } from "../profiles/csv.js";

/** A number as given (as many decimals as JavaScript writes), with this run's decimal sign: 39.6 → "39,6" in German. */
export function asGiven(x: number): string {
  const sign = cliTr().num(0.5, 1).charAt(1);
  return String(x).replace(".", sign);
}
