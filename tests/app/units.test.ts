/**
 * Units at the edge of the app: every figure through the core's one table of factors (NIST SP 811:
 * 1 short ton = 907.18474 kg, 1 mph = 0.44704 m/s, 1 lbf = 4.4482216152605 N, 1 ft = 0.3048 m).
 */
import { describe, expect, it } from "vitest";
import { fieldWords, localiseIssue } from "../../src/app/fieldWords.js";
import { setAppLanguage } from "../../src/app/i18n.js";
import type { FieldIssue } from "../../src/profiles/issues.js";
import { formatNumber, fromDisplay, localiseText, parseNumber, percent, show, toDisplay, unitSymbol } from "../../src/app/format.js";

describe("display units both ways", () => {
  it("2000 t is 2204.62 short tons, and back", () => {
    expect(toDisplay("mass", 2000, "t", "us")).toBeCloseTo(2_000_000 / 907.18474, 9);
    expect(toDisplay("mass", 2000, "t", "us")).toBeCloseTo(2204.623, 3);
    expect(fromDisplay("mass", 2204.6226218487757, "t", "us")).toBeCloseTo(2000, 9);
    expect(show("mass", 2_000_000, "us")).toBe("2,205 short tons");
    expect(show("mass", 2_000_000, "metric")).toBe("2,000 t");
  });

  it("km/h and mph", () => {
    expect(toDisplay("speed", 20, "kmh", "us")).toBeCloseTo(20 / 3.6 / 0.44704, 9); // 12.427 mph
    expect(fromDisplay("speed", 10, "kmh", "us")).toBeCloseTo((10 * 0.44704 * 3600) / 1000, 9); // 16.093 km/h
    expect(show("speed", 20 / 3.6, "us")).toBe("12.4 mph");
    expect(show("speed", 20 / 3.6, "metric")).toBe("20.0 km/h");
  });

  it("forces, lengths, slack, grades and temperatures", () => {
    expect(show("force", 850_000, "us")).toBe(`${formatNumber(850_000 / 4.4482216152605 / 1000, 1)} klbf`); // 191.1 klbf
    expect(show("force", 850_000, "metric")).toBe("850 kN");
    expect(toDisplay("distance", 600, "m", "us")).toBeCloseTo(600 / 0.3048, 9);
    expect(toDisplay("slack", 60, "mm", "us")).toBeCloseTo(60 / 25.4, 9);
    expect(toDisplay("grade", 8, "permille", "us")).toBeCloseTo(0.8, 12);
    expect(fromDisplay("grade", 1.5, "permille", "us")).toBeCloseTo(15, 12);
    expect(toDisplay("temperature", -40, "C", "us")).toBeCloseTo(-40, 12);
    expect(fromDisplay("temperature", 41, "C", "us")).toBeCloseTo(5, 12);
    expect(unitSymbol("grade", "metric")).toBe("‰");
    expect(unitSymbol("grade", "us")).toBe("%");
  });

  it("a value typed in US units becomes the right SI value", () => {
    // 1653.47 short tons typed → trailing mass in tonnes (file unit) → kg (SI)
    const tonnes = fromDisplay("mass", parseNumber("1653.47"), "t", "us");
    expect(tonnes * 1000).toBeCloseTo(1653.47 * 907.18474, 6);
    expect(fromDisplay("slack", parseNumber("2,5"), "mm", "us")).toBeCloseTo(63.5, 9);
  });
});

describe("figures inside sentences", () => {
  it("converts the core's metric figures in a why line for US units, and leaves metric text alone", () => {
    const why = "notch 2 (115 kN) holds it while the train brake releases along 414 m; 0.3 m of travel; 1,400 t on 8 ‰ at 20.0 km/h, −5 °C, 60 mm slack; 38 s; 3 min";
    expect(localiseText(why, "metric")).toBe(why);
    expect(localiseText(why, "us")).toBe(
      `notch 2 (${formatNumber(115 / 4.4482216152605, 1)} klbf) holds it while the train brake releases along ${formatNumber(414 / 0.3048, 0)} ft; 1.0 ft of travel; ` +
        `${formatNumber(1_400_000 / 907.18474, 0)} short tons on 0.80 % at 12.4 mph, 23 °F, 2.36 in slack; 38 s; 3 min`,
    );
  });

  it("does not touch words that merely start with a unit letter", () => {
    expect(localiseText("5 trains, 3 mins, 2 months, 4 tonnes", "us")).toBe("5 trains, 3 mins, 2 months, 4 tonnes");
  });
});

describe("reading typed numbers", () => {
  it("accepts decimal commas, grouping and a minus sign; rejects words", () => {
    expect(parseNumber("1500")).toBe(1500);
    expect(parseNumber(" 1,500 ")).toBe(1500);
    expect(parseNumber("2,5")).toBe(2.5);
    expect(parseNumber("−8")).toBe(-8);
    expect(parseNumber(".5")).toBe(0.5);
    expect(parseNumber("12.")).toBe(12);
    expect(parseNumber("")).toBeNaN();
    expect(parseNumber("abc")).toBeNaN();
    expect(parseNumber("1.2.3")).toBeNaN();
    expect(parseNumber("5e3")).toBeNaN();
  });

  it("formats percentages and tiny risks", () => {
    expect(percent(0.061)).toBe("6.1 %");
    expect(percent(0.0001)).toBe("< 0.1 %");
    expect(percent(0)).toBe("0.0 %");
    expect(formatNumber(-0.0001, 1)).toBe("0.0");
    expect(formatNumber(-12.34, 1)).toBe("−12.3");
  });
});

describe("rules broken, in the user's units", () => {
  it("rewrites bounds and the value given into the field's display unit", () => {
    const i = { path: "train.couplerSlack_mm", message: "must be at most 200 (got 250)" };
    expect(localiseIssue(i, "metric").message).toBe("must be at most 200 mm (got 250 mm)");
    expect(localiseIssue(i, "us").message).toBe("must be at most 7.87 in (got 9.84 in)");
    const g = { path: "location.gradient_permille", message: "must be at least -60 (got -70)" };
    expect(localiseIssue(g, "us").message).toBe("must be at least −6 % (got −7 %)");
    expect(localiseIssue(g, "metric").message).toBe("must be at least −60 ‰ (got −70 ‰)");
    const r = { path: "location.curveRadius_m", message: "must be 0 (straight) or at least 80 m" };
    expect(localiseIssue(r, "us").message).toBe("must be 0 (straight) or at least 262 ft");
    expect(localiseIssue(r, "metric").message).toBe("must be 0 (straight) or at least 80 m");
  });

  it("rewrites a range and a figure per wagon (the schema's physical ranges)", () => {
    const t = { path: "train.trailingMass_t", message: "must be from 5 to 60000 t (got 2)" };
    expect(localiseIssue(t, "metric").message).toBe("must be from 5 to 60,000 t (got 2 t)");
    // 1 short ton = 907.18474 kg (NIST SP 811, appendix B.8): 5 t = 5.51, 60 000 t = 66 138.7, 2 t = 2.20 short tons.
    expect(localiseIssue(t, "us").message).toBe("must be from 5.51 to 66,139 short tons (got 2 short tons)");
    const w = { path: "train.trailingMass_t", message: "must give from 5 to 150 t per wagon (got 0.2 t per wagon over 30 wagons)" };
    // 0.2 t = 0.220 short tons, to three significant figures.
    expect(localiseIssue(w, "us").message).toBe("must give from 5.51 to 165 short tons per wagon (got 0.22 short tons per wagon over 30 wagons)");
  });

  it("says 'must be a number' for text that is not one, and leaves fields without units alone", () => {
    expect(localiseIssue({ path: "train.trailingMass_t", message: "must be a number (got NaN)" }, "us").message).toBe("must be a number");
    const w = { path: "train.wagons", message: "must be at most 400 (got 500)" };
    expect(localiseIssue(w, "us")).toEqual({ ...w, label: "Wagons" });
  });
});

describe("coded rules broken, in the language on screen and the user's units", () => {
  // As the schema gives it for a trailing mass of 2 t (tests/i18n/fields.test.ts checks the schema's side).
  const mass: FieldIssue = { path: "train.trailingMass_t", message: "must be from 5 to 60000 t (got 2)", code: "rangeIn", figures: { min: 5, max: 60000, unit: "t" }, got: 2 };
  const gap: FieldIssue = { path: "location.segments[1].from_m", message: "", code: "segmentGap", figures: { gap: 20, end: 500, unit: "m" }, got: 520 };

  it("English reads as before; German and Hungarian with their words, decimal comma and grouping", async () => {
    await fieldWords;
    try {
      expect(localiseIssue(mass, "metric")).toMatchObject({ message: "must be from 5 to 60,000 t (got 2 t)", label: "Trailing mass" });
      // 1 short ton = 907.18474 kg (NIST SP 811, appendix B.8): 5 t = 5.51, 60 000 t = 66 138.7 short tons.
      expect(localiseIssue(mass, "us").message).toBe("must be from 5.51 to 66,139 short tons (got 2 short tons)");
      expect(await setAppLanguage("de")).toBe(true);
      expect(localiseIssue(mass, "us")).toMatchObject({ message: "muss zwischen 5,51 und 66.139 US-Tonnen liegen (angegeben: 2 US-Tonnen)", label: "Anhängelast" });
      // 20 m = 65.6 ft, 500 m = 1640 ft (1 ft = 0.3048 m exactly).
      expect(localiseIssue(gap, "us").message).toBe("lässt eine Lücke von 66 ft nach dem vorigen Abschnitt (der bei 1.640 ft endet) (angegeben: 1.706 ft)");
      expect(await setAppLanguage("hu")).toBe(true);
      expect(localiseIssue(mass, "metric")).toMatchObject({ message: "5 és 60\u00a0000 t között kell legyen (megadva: 2 t)", label: "Vontatott tömeg" });
      expect(localiseIssue({ path: "train.trailingMass_t", message: "", code: "mustBe", figures: { expected: "number" }, got: "NaN" }, "us").message).toBe("szám kell legyen");
    } finally {
      await setAppLanguage("en");
    }
  });
});
