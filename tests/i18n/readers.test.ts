/**
 * The readers' messages, the work cap's refusal and the sensitivity table's changes (codes with figures:
 * src/i18n/en/readers.ts, en/sensitivity.ts) have words in every language: one example of every code,
 * written by the one renderer in English, Hungarian and German, leaves no placeholder unfilled, reads
 * differently in each language, and carries the same figures — written with the language's decimal sign.
 * The examples are typed by code, so a code added without an example here is a compile error.
 */
import { describe, expect, it } from "vitest";
import { PLAN_WORK_CAP_VEHICLE_STEPS, type PlanWorkProblem } from "../../src/core/planner/workCap.js";
import { SENSITIVITY_NUDGES } from "../../src/core/planner/sensitivity.js";
import type { SensitivityChange } from "../../src/core/planner/types.js";
import { de } from "../../src/i18n/de/index.js";
import { hu } from "../../src/i18n/hu/index.js";
import { fieldsDe } from "../../src/i18n/de/fields.js";
import { fieldsHu } from "../../src/i18n/hu/fields.js";
import { readerText, workCapText, type ReaderCoded } from "../../src/i18n/renderReaders.js";
import { sensitivityChangeText } from "../../src/i18n/renderSensitivity.js";
import { createTranslator, type Translator } from "../../src/i18n/translator.js";
import { departureProblemText, type DepartureProblem } from "../../src/profiles/departures.js";
import { readerIssue } from "../../src/profiles/readerIssues.js";
import { coded } from "../../src/profiles/issues.js";

type ByCode<T extends { code: string }> = { [K in T["code"]]: Extract<T, { code: K }> };

const EN = createTranslator("en", null);
// The command line's catalogs: the language's own and its field messages (cli/lang.ts).
const HU = createTranslator("hu", { ...hu, fields: fieldsHu });
const DE = createTranslator("de", { ...de, fields: fieldsDe });
const schemas = { bundle: "taut/notes-bundle@2", note: "taut/location@1" };

// Figures chosen to be told apart from each other and from the words.
const READERS: ByCode<ReaderCoded> = {
  nothingChanged: { code: "nothingChanged" },
  notesUnreadable: { code: "notesUnreadable", figures: { why: "NotReadableError" } },
  notesEmpty: { code: "notesEmpty" },
  notesCutShort: { code: "notesCutShort" },
  noteNotValid: { code: "noteNotValid", figures: { name: '"Upper yard (test)"' } },
  notesNoSchema: { code: "notesNoSchema", figures: schemas },
  notesOtherKind: { code: "notesOtherKind", figures: { ...schemas, kind: '"taut/start-case@1"' } },
  bundleNotValid: { code: "bundleNotValid" },
  bundleBad: { code: "bundleBad", notes: 17, named: [{ number: 3, name: '"Lower loop"' }, { number: 12 }] },
  noteIdRepeated: { code: "noteIdRepeated", figures: { first: 4, id: "north-siding" } },
  reviewNoteMissing: { code: "reviewNoteMissing", figures: { id: "south-siding" } },
  reviewIdRepeated: { code: "reviewIdRepeated", figures: { id: "r-2026-11-03" } },
  notesSchema: { code: "notesSchema", figures: schemas },
  notesSchemaGot: { code: "notesSchemaGot", figures: { ...schemas, kind: '"taut/plan@1"' } },
  unknownTrain: { code: "unknownTrain", figures: { id: "ore-99", known: "ore-40, mixed-25" } },
  referenceUnusable: { code: "referenceUnusable", figures: { id: "north-siding" } },
  departuresNotValid: { code: "departuresNotValid" },
  departuresJsonList: { code: "departuresJsonList", figures: { open: "{", close: "}" } },
  csvEmpty: { code: "csvEmpty" },
  csvNoCase: { code: "csvNoCase", figures: { line: 7, count: 3 } },
  csvUnclosed: { code: "csvUnclosed", figures: { line: 23 } },
  caseNeeded: { code: "caseNeeded" },
  sandYesNo: { code: "sandYesNo", figures: { value: '"maybe"' } },
  caseOtherKind: { code: "caseOtherKind", figures: { kind: '"taut/location@1"' } },
  caseOutside: { code: "caseOutside", figures: { folder: "/srv/day" } },
  caseNotPicked: { code: "caseNotPicked", figures: { file: "wet-0930.json", departures: "day-7.csv" } },
  importNoteInvalid: { code: "importNoteInvalid", figures: { number: 5, path: "segments[2].length_m", problem: "must be greater than 0" } },
  importIdTwice: { code: "importIdTwice", figures: { id: "east-loop" } },
  importFailed: { code: "importFailed", figures: { why: "QuotaExceededError" } },
  importRefused: { code: "importRefused", figures: { why: "AbortError" } },
  reviewInvalid: { code: "reviewInvalid", figures: { path: "massFactor.value", problem: "must be a finite number" } },
  reviewNoNote: { code: "reviewNoNote", figures: { id: "west-bank" } },
};

const CHANGES: ByCode<SensitivityChange> = SENSITIVITY_NUDGES;


/** The numbers in a text, a decimal comma read as a point (the figures, whatever the language writes). */
const numbers = (s: string) => [...s.matchAll(/\d+(?:[.,]\d+)?/g)].map((m) => Number(m[0].replace(",", "."))).sort((a, b) => a - b);

function inEach(render: (tr: Translator) => string): [string, string, string] {
  return [render(EN), render(HU), render(DE)];
}

describe("every reader's code in English, Hungarian and German", () => {
  for (const [code, c] of Object.entries(READERS)) {
    it(code, () => {
      const [en, huText, deText] = inEach((tr) => readerText(tr, c));
      for (const t of [en, huText, deText]) {
        expect(t).not.toMatch(/\{[A-Za-z]+\}/);
        expect(t.trim()).not.toBe("");
      }
      expect(huText).not.toBe(en);
      expect(deText).not.toBe(en);
      expect(huText).not.toBe(deText);
      // The same figures (line numbers, counts, note numbers) in every language.
      expect(numbers(huText)).toEqual(numbers(en));
      expect(numbers(deText)).toEqual(numbers(en));
      // Ids, file kinds and paths are quoted as the file gives them, in every language.
      for (const v of Object.values(("figures" in c ? c.figures : undefined) ?? {})) if (typeof v === "string") for (const t of [huText, deText]) expect(t).toContain(v);
    });
  }

  it("a refused bundle names its bad notes by number and name, with the plural of each count (English as it always read)", () => {
    expect(readerText(EN, READERS.bundleBad)).toBe('The bundle holds 17 notes; note 3 ("Lower loop"), note 12 are not valid, so none was imported.');
    expect(readerText(EN, { code: "bundleBad", notes: 1, named: [{ number: 1 }] })).toBe("The bundle holds 1 note; note 1 is not valid, so none was imported.");
    expect(readerText(DE, { code: "bundleBad", notes: 1, named: [{ number: 1 }] })).toBe("Das Paket enthält 1 Notiz; Notiz 1 ist ungültig, daher wurde keine übernommen.");
    expect(readerText(EN, { code: "noteNotValid" })).toBe("The location note without a name is not valid.");
  });
});

describe("the work cap's refusal", () => {
  // A train of one-gram wagons: the step the integrator needs is nanoseconds (tests/cli/hostile.test.ts).
  const w: PlanWorkProblem = { code: "work-cap", vehicles: 61, stepS: 4.2e-9, lightestKg: 0.001, vehicleSteps: 1.27e12, capVehicleSteps: PLAN_WORK_CAP_VEHICLE_STEPS };

  it("reads in English as it always has", () => {
    expect(workCapText(EN, w)).toBe(
      "one plan of this train would take 1.3 × 10^12 vehicle-steps (61 vehicles at a 4.2 ns step, which the lightest vehicle, 1 g, sets), more than the 5.0 × 10^8 a plan may take: check the masses",
    );
    expect(workCapText(EN, { ...w, stepS: 0.0021, lightestKg: 2500, vehicleSteps: Infinity })).toContain("would take without end vehicle-steps (61 vehicles at a 2.1 ms step, which the lightest vehicle, 2.5 t, sets)");
  });

  it("in Hungarian and German with the decimal comma CLDR gives each language (Intl.NumberFormat)", () => {
    const comma = (locale: string, x: number) => new Intl.NumberFormat(locale, { minimumFractionDigits: 1, maximumFractionDigits: 1 }).format(x);
    for (const [tr, locale] of [[HU, "hu-HU"], [DE, "de-DE"]] as const) {
      const t = workCapText(tr, w);
      expect(t).toContain(`${comma(locale, 1.3)} × 10^12`);
      expect(t).toContain(`${comma(locale, 5)} × 10^8`);
      expect(t).toContain(`${comma(locale, 4.2)} ns`);
      expect(t).toContain("1 g");
      expect(t).not.toMatch(/\{[A-Za-z]+\}/);
      expect(numbers(t)).toEqual(numbers(workCapText(EN, w)));
    }
  });

});

describe("the sensitivity table's changes", () => {
  it("read in English as the table always printed them", () => {
    expect(Object.values(CHANGES).map((c) => sensitivityChangeText(EN, c))).toEqual(["+10 % trailing mass", "−10 % adhesion", "+1 ‰ gradient", "+25 mm slack per coupling"]);
  });

  for (const [code, c] of Object.entries(CHANGES)) {
    it(`${code}: the same signed figure in every language, the words translated`, () => {
      const [en, huText, deText] = inEach((tr) => sensitivityChangeText(tr, c));
      const figure = /[+−]\d+/.exec(en)![0];
      for (const t of [huText, deText]) {
        expect(t).toContain(figure);
        expect(t).not.toBe(en);
        expect(t).not.toMatch(/\{[A-Za-z]+\}/);
      }
    });
  }
});

describe("a departures row's problem", () => {
  const problem: DepartureProblem = {
    line: 14,
    parts: [
      { prefix: "rail: ", issue: coded("rail", { code: "oneOf", figures: { values: "dry, wet" }, got: '"icy"' }) },
      { prefix: "sand: ", issue: readerIssue("sand", { code: "sandYesNo", figures: { value: '"maybe"' } }) },
    ],
  };

  it("reads in English as its error, in Hungarian and German with the same line and cells", () => {
    expect(departureProblemText(EN, problem)).toBe('line 14: rail: must be one of dry, wet (got "icy"); sand: must be yes or no (true/false, 1/0) (got "maybe")');
    expect(departureProblemText(HU, problem)).toMatch(/^14\. sor: rail: .*"icy".*; sand: .*"maybe"/);
    expect(departureProblemText(DE, problem)).toMatch(/^Zeile 14: rail: .*"icy".*; sand: .*"maybe"/);
  });

  it("a JSON row by its index and id; a long list cut with the count of the rest", () => {
    const many = Array.from({ length: 15 }, (_, k) => ({ prefix: `f${k}: `, issue: coded(`f${k}`, { code: "notEmpty" }) }));
    const p: DepartureProblem = { index: 3, id: "ore-1", parts: many.slice(0, 12), more: 3 };
    expect(departureProblemText(EN, p)).toMatch(/^\[3\] \(ore-1\): f0: must not be empty; .*; f11: must not be empty; …and 3 more$/);
    expect(departureProblemText(DE, p)).toMatch(/^\[3\] \(ore-1\): f0: .*; …und 3 weitere$/);
  });
});
