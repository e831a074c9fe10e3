/**
 * Numbers as each language writes them: the decimal sign and the grouping of thousands (CLDR, as
 * `Intl.NumberFormat` writes them for en-GB, hu and de — checked against it in tests/i18n/numbers.test.ts),
 * written here rather than through Intl, whose first use loads locale data for tens of milliseconds in the
 * middle of the app's load. Rounding is the one rule of rounding.ts (half away from zero on the
 * shortest decimal form), so every language shows the same digits.
 */
import { fixedDigits } from "./rounding.js";
import type { Lang } from "./language.js";

export interface NumberStyle {
  decimal: string;
  group: string;
  /** Digits before the decimal sign from which thousands are grouped (CLDR's minimum grouping digits + 3). */
  groupFrom: number;
}

/** en-GB 1,234.5 · hu 1234,5 and 12 345,5 (no-break space) · de 1.234,5 (CLDR). */
export const NUMBER_STYLES: Readonly<Record<Lang, NumberStyle>> = {
  en: { decimal: ".", group: ",", groupFrom: 4 },
  hu: { decimal: ",", group: "\u00a0", groupFrom: 5 },
  de: { decimal: ",", group: ".", groupFrom: 4 },
};

export interface NumberOptions {
  /** Group thousands (the app); the command line does not, so its columns stay narrow and plain. */
  grouping?: boolean;
  /** The minus sign: "−" (U+2212) on screen, "-" on the command line. */
  minus?: string;
}

/** `x` with `decimals` decimals as `lang` writes it; "–" for what is not a finite number. */
export function formatNumberIn(lang: Lang, x: number, decimals: number, opts: NumberOptions = {}): string {
  if (!Number.isFinite(x)) return "–";
  const st = NUMBER_STYLES[lang];
  const s = fixedDigits(x, Math.max(0, Math.min(20, Math.trunc(decimals))));
  if (s.includes("e")) return x < 0 ? `${opts.minus ?? "\u2212"}${s}` : s;
  const dot = s.indexOf(".");
  const whole = dot < 0 ? s : s.slice(0, dot);
  const grouped = opts.grouping !== false && whole.length >= st.groupFrom ? whole.replace(/\B(?=(\d{3})+$)/g, st.group) : whole;
  const body = grouped + (dot < 0 ? "" : st.decimal + s.slice(dot + 1));
  // No "−0" after rounding.
  return x < 0 && /[1-9]/.test(s) ? `${opts.minus ?? "\u2212"}${body}` : body;
}

/**
 * Read a number typed in `lang`: spaces and the language's grouping are allowed; a decimal comma is read
 * in every language where it cannot be a grouping ("2,5"), and a decimal point where it cannot be one
 * ("2.5" in German; "1.500" there is fifteen hundred, "1,500" in English). NaN when it is not a number.
 */
export function parseNumberIn(lang: Lang, text: string): number {
  let t = text.trim().replace(/[\s\u202f\u00a0]/g, "").replace(/\u2212/g, "-");
  if (t === "") return Number.NaN;
  if (lang === "de" && /^[-+]?\d{1,3}(\.\d{3})+(,\d+)?$/.test(t)) t = t.replace(/\./g, "").replace(",", ".");
  else if (lang === "en" && /^[-+]?\d{1,3}(,\d{3})+(\.\d+)?$/.test(t)) t = t.replace(/,/g, "");
  else if (!t.includes(".") && /^[-+]?\d*,\d+$/.test(t)) t = t.replace(",", ".");
  if (!/^[-+]?(\d+\.?\d*|\.\d+)$/.test(t)) return Number.NaN;
  return Number(t);
}
