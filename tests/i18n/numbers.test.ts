/**
 * Numbers per language against an independent writer: the JavaScript engine's Intl.NumberFormat (ICU's
 * CLDR data: en-GB 1,234.5; hu 1234,5 but 12 345,5 with a no-break space, minimum grouping digits 2;
 * de 1.234,5). Values are chosen away from rounding ties, where our rule (half away from zero on the
 * shortest decimal form) and ICU's (on the binary value) may differ by design.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { LANGS, LOCALE_TAGS } from "../../src/i18n/language.js";
import { formatNumberIn, parseNumberIn } from "../../src/i18n/numbers.js";

const VALUES = [0, 7, 12.34, 999.9, 1234.5, 9999.44, 12345.25, 123456.78, 1234567.1, -0.25, -1234.5, -98765.43];

describe("numbers as each language writes them", () => {
  for (const lang of LANGS) {
    it(`${lang}: as Intl.NumberFormat("${LOCALE_TAGS[lang]}") writes them, with and without grouping`, () => {
      for (const x of VALUES) {
        for (const d of [0, 1, 2]) {
          const intl = (grouping: boolean) =>
            new Intl.NumberFormat(LOCALE_TAGS[lang], { minimumFractionDigits: d, maximumFractionDigits: d, useGrouping: grouping ? "auto" : false, signDisplay: "negative" }).format(x).replace(/\u2212/g, "-");
          expect(formatNumberIn(lang, x, d, { grouping: true, minus: "-" }), `${x} ${d}`).toBe(intl(true));
          expect(formatNumberIn(lang, x, d, { grouping: false, minus: "-" }), `${x} ${d}`).toBe(intl(false));
        }
      }
    });

    it(`${lang}: what it writes reads back as the rounded number (grouped or not)`, () => {
      fc.assert(
        fc.property(fc.double({ min: -1e7, max: 1e7, noNaN: true }), fc.integer({ min: 0, max: 3 }), fc.boolean(), (x, d, grouping) => {
          const text = formatNumberIn(lang, x, d, { grouping, minus: "\u2212" });
          const back = parseNumberIn(lang, text);
          expect(Math.abs(back - x)).toBeLessThanOrEqual(0.5 * 10 ** -d + 1e-9 * Math.abs(x));
        }),
        { numRuns: 300 },
      );
    });
  }

  it("reads a decimal comma in every language and a decimal point where it cannot be a grouping", () => {
    expect(parseNumberIn("en", "2,5")).toBe(2.5);
    expect(parseNumberIn("en", "1,500")).toBe(1500);
    expect(parseNumberIn("de", "2.5")).toBe(2.5);
    expect(parseNumberIn("de", "1.500")).toBe(1500);
    expect(parseNumberIn("de", "1.500,25")).toBe(1500.25);
    expect(parseNumberIn("hu", "12 345,5")).toBe(12345.5);
    expect(parseNumberIn("hu", "12\u00a0345,5")).toBe(12345.5);
    expect(parseNumberIn("hu", "abc")).toBeNaN();
    expect(parseNumberIn("de", "")).toBeNaN();
  });
});
