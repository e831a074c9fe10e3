/**
 * A figure and its unit stay on one line (components/Figures.tsx). The rule is typographic practice in all
 * three languages (a space that does not break between a number and its unit symbol: common practice, as
 * in the BIPM's SI Brochure, 9th edition, 2019, §5.4.3, which puts a space between them, from memory).
 * Checked against the figures the app itself writes: every measure in both unit systems, in English,
 * Hungarian and German (format.ts `show`, `percent`, `margin`, `duration`), inside a sentence.
 */
import { render } from "@solidjs/testing-library";
import { afterAll, describe, expect, it } from "vitest";
import { figureParts, Figures } from "../../src/app/components/Figures.js";
import { duration, margin, MEASURES, percent, show, type MeasureKey, type UnitSystem } from "../../src/app/format.js";
import { setAppLanguage } from "../../src/app/i18n.js";

const figuresOf = (text: string) => figureParts(text).flatMap((p) => (typeof p === "string" ? [] : [p.figure]));

afterAll(() => setAppLanguage("en"));

describe("figures keep their units", () => {
  for (const lang of ["en", "hu", "de"] as const) {
    it(`${lang}: every figure the app writes is one unbreakable part, and the text is unchanged`, async () => {
      await setAppLanguage(lang);
      const written: string[] = [];
      for (const units of ["metric", "us"] as UnitSystem[]) {
        for (const m of [...Object.keys(MEASURES), "temperature"] as MeasureKey[]) {
          for (const si of [0.004, 1.5, 414, 12_345.6, 2_000_000]) written.push(show(m, si, units));
        }
      }
      written.push(percent(0.061), percent(0.0001), margin(1.4), margin(0.333), duration(38), duration(202));
      for (const fig of written) {
        const text = `Vor ${fig} und nach ${fig}.`;
        expect(figuresOf(text), text).toEqual([fig, fig]);
        expect(figureParts(text).map((p) => (typeof p === "string" ? p : p.figure)).join("")).toBe(text);
      }
    });
  }

  it("words that only sit beside a number are not figures", () => {
    for (const text of ["Fahrstufe 1 halten", "Schritt 1 von 4", "a(z) 1. fokozat", "notch 2 holds it", "2 mal", "3 times", "agg-0610", "1 × Illustrative unit"]) expect(figuresOf(text), text).toEqual([]);
    expect(figuresOf("über 414 m in etwa 38 s löst")).toEqual(["414 m", "38 s"]);
    expect(figuresOf("Reserve × 1,40, begrenzt")).toEqual(["× 1,40"]);
    expect(figuresOf("Ziel nach 3 min 22 s erreicht")).toEqual(["3 min 22 s"]);
  });

  it("renders the same text, each figure in a span that does not wrap", () => {
    const text = "die Zugbremse über 414 m in etwa 38 s löst (Reserve × 1,40)";
    const { container } = render(() => (
      <p>
        <Figures text={text} />
      </p>
    ));
    expect(container.textContent).toBe(text);
    expect([...container.querySelectorAll("span.figure")].map((s) => s.textContent)).toEqual(["414 m", "38 s", "× 1,40"]);
  });
});
