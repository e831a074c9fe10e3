/**
 * The Departures screen's own errors in Hungarian and German: a row the planner refuses (a train beyond the
 * work cap, with its figures), a row that failed inside the program, a planner that stopped, a case file not
 * picked with its CSV, and picked files that hold no departures file — each in the language on screen with
 * the same figures as in English (the decimal comma CLDR gives the language), redrawn when the language
 * changes, and no English sentence among them. The CSV export keeps the English, as `taut check` writes it.
 */
import { fireEvent, screen, waitFor } from "@solidjs/testing-library";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import Departures from "../../src/app/screens/Departures/index.js";
import type { StartCase } from "../../src/core/train/types.js";
import { PLAN_WORK_CAP_VEHICLE_STEPS, type PlanWorkProblem } from "../../src/core/planner/workCap.js";
import type { Outcome } from "../../src/worker/client.js";
import type { CheckAnswer } from "../../src/worker/protocol.js";
import { memoryStorage, renderWithApp } from "./harness.js";
import { fakePool } from "./dispatch/fakes.js";
import { appLang, setAppLanguage } from "../../src/app/i18n.js";
import { SETTINGS_KEY } from "../../src/app/state/createSettings.js";
import { departures } from "../../src/i18n/en/departures.js";
import { createTranslator } from "../../src/i18n/translator.js";
import { de } from "../../src/i18n/de/index.js";
import { deLater } from "../../src/i18n/de/later.js";
import { hu } from "../../src/i18n/hu/index.js";
import { huLater } from "../../src/i18n/hu/later.js";

const read = (p: string) => readFileSync(join(process.cwd(), "profiles", p), "utf8");
const demoDay = JSON.parse(read("departures/demo-day.json")) as Array<Record<string, unknown>>;

// A train of one-gram wagons: the integrator's step is nanoseconds (the figures of tests/i18n/readers.test.ts).
const WORK: PlanWorkProblem = { code: "work-cap", vehicles: 61, stepS: 4.2e-9, lightestKg: 0.001, vehicleSteps: 1.27e12, capVehicleSteps: PLAN_WORK_CAP_VEHICLE_STEPS };

/** The worker's answer by rail condition: refused beyond the work cap, failed inside, or stopped. */
function outcome(c: StartCase): Outcome<CheckAnswer> {
  if (c.conditions.rail === "wet") return { ok: false, kind: "invalid", issues: [{ path: "train", message: "work-cap", reader: WORK }], message: "The start case is malformed." };
  if (c.conditions.rail === "frost") return { ok: false, kind: "internal", issues: [], message: "RangeError: offset 7 is out of bounds" };
  return { ok: false, kind: "crashed", issues: [], message: "The planner stopped unexpectedly." };
}

function dayFile(): File {
  const pick = (rail: string, id: string) => ({ ...demoDay[0]!, id, conditions: { rail, sand: false, temperature_C: 12 } });
  return new File([JSON.stringify([pick("wet", "d-heavy"), pick("frost", "d-fault"), pick("leaves", "d-stop")])], "day.json", { type: "application/json" });
}

/** English sentences of this screen's errors; none may show in another language. */
const ENGLISH = [/cannot be checked/, /internal error/, /the planner stopped/i, /not among the picked files/, /pick one departures file/, /no departures file among/, /no file picked/, /vehicle-steps/, /The start case is malformed/, /\bline \d/];

const LANGS = [
  ["de", { ...de, ...deLater }, "de-DE"],
  ["hu", { ...hu, ...huLater }, "hu-HU"],
] as const;

/** One decimal as CLDR writes it in the locale (4,2). */
const oneDecimal = (locale: string, x: number) => new Intl.NumberFormat(locale, { minimumFractionDigits: 1, maximumFractionDigits: 1 }).format(x);

let saved: string[];
beforeEach(() => {
  saved = [];
  URL.createObjectURL = vi.fn((b: Blob) => {
    void b.text().then((t) => saved.push(t));
    return "blob:test";
  }) as typeof URL.createObjectURL;
  URL.revokeObjectURL = vi.fn();
});
afterEach(async () => {
  vi.restoreAllMocks();
  await setAppLanguage("en");
});

const badText = () => document.querySelector(".bad-rows ul")?.textContent ?? "";
const inLanguage = (lang: string) => {
  const storage = memoryStorage();
  storage.setItem(SETTINGS_KEY, JSON.stringify({ language: lang }));
  return storage;
};

describe("the Departures screen's own errors in Hungarian and German", () => {
  for (const [lang, catalog, locale] of LANGS) {
    it(`${lang}: rows the planner did not answer, with the work cap's figures and the program's own detail`, async () => {
      const d = createTranslator(lang, catalog).ns(departures);
      const { unmount } = renderWithApp(() => <Departures />, { storage: inLanguage(lang), pool: fakePool({ check: outcome }) });
      await waitFor(() => expect(appLang()).toBe(lang), { timeout: 10_000 });
      fireEvent.change(screen.getByLabelText(d("pickLabel")), { target: { files: [dayFile()] } });
      await waitFor(() => expect(document.querySelector(".bad-rows h2")?.textContent).toBe(d("badHeading", { count: 3 })), { timeout: 10_000 });
      const items = [...document.querySelectorAll(".bad-rows li")].map((li) => li.textContent!);
      expect(items).toHaveLength(3);
      const [heavy, fault, stop] = ["[0]", "[1]", "[2]"].map((w) => items.find((t) => t.startsWith(`${w}: `)) ?? "") as [string, string, string];
      // The work cap's figures as in English (1.3 × 10^12, 61 vehicles, 4.2 ns, 1 g, 5.0 × 10^8), with the language's decimal sign.
      expect(heavy).toContain(`${oneDecimal(locale, 1.3)} × 10^12`);
      expect(heavy).toContain(`${oneDecimal(locale, 4.2)} ns`);
      expect(heavy).toContain(`${oneDecimal(locale, 5)} × 10^8`);
      expect(heavy).toContain("61");
      expect(heavy).toContain("1 g");
      expect(heavy).toContain("(train: ");
      // A programming error's own detail is shown as it is, after the language's words.
      expect(fault).toContain("RangeError: offset 7 is out of bounds");
      expect(fault.replace("RangeError: offset 7 is out of bounds", "")).toMatch(lang === "de" ? /interner Fehler/ : /belső hiba/);
      expect(stop).toMatch(lang === "de" ? /Planer/ : /tervező/);
      const shown = items.join("\n").replace("RangeError: offset 7 is out of bounds", "");
      for (const e of ENGLISH) expect(shown).not.toMatch(e);
      // The export keeps the English `taut check` writes.
      fireEvent.click(screen.getByRole("button", { name: new RegExp(d("exportCsv")) }));
      await waitFor(() => expect(saved).toHaveLength(1), { timeout: 10_000 });
      expect(saved[0]).toContain("[0]: cannot be checked: The start case is malformed. (train: one plan of this train would take 1.3 × 10^12 vehicle-steps");
      expect(saved[0]).toContain("[1]: internal error: RangeError: offset 7 is out of bounds");
      unmount();
    });

    it(`${lang}: a case file not picked with its CSV, and picked files without a departures file`, async () => {
      const d = createTranslator(lang, catalog).ns(departures);
      const { unmount } = renderWithApp(() => <Departures />, { storage: inLanguage(lang), pool: fakePool({ check: outcome }) });
      await waitFor(() => expect(appLang()).toBe(lang), { timeout: 10_000 });
      const csv = new File(["id,case,rail,sand\nx-1,cases/far-away.json,dry,no\n"], "day-7.csv", { type: "text/csv" });
      fireEvent.change(screen.getByLabelText(d("pickLabel")), { target: { files: [csv] } });
      await waitFor(() => expect(badText()).not.toBe(""), { timeout: 10_000 });
      // "line 2" in the language's words, the file names as given.
      expect(badText()).toContain(lang === "de" ? "Zeile 2" : "2. sor");
      expect(badText()).toContain("cases/far-away.json: ");
      expect(badText()).toContain("far-away.json");
      expect(badText()).toContain("day-7.csv");
      for (const e of ENGLISH) expect(badText()).not.toMatch(e);
      // Two CSVs at once, then nothing that is a departures file: the alert names the files, in the language.
      const twin = new File(["id,case\n"], "day-8.csv", { type: "text/csv" });
      fireEvent.change(screen.getByLabelText(d("pickLabel")), { target: { files: [csv, twin] } });
      await waitFor(() => expect(document.querySelector("p.problem")?.textContent).toContain("day-8.csv"), { timeout: 10_000 });
      const two = document.querySelector("p.problem")!.textContent!;
      expect(two).toContain("day-7.csv, day-8.csv");
      for (const e of ENGLISH) expect(two).not.toMatch(e);
      const caseFile = new File([read("cases/demo-ore-lantern.json")], "demo-ore-lantern.json");
      fireEvent.change(screen.getByLabelText(d("pickLabel")), { target: { files: [caseFile] } });
      await waitFor(() => expect(document.querySelector("p.problem")?.textContent).not.toBe(two), { timeout: 10_000 });
      const none = document.querySelector("p.problem")!.textContent!;
      expect(none).toContain("demo-ore-lantern.json");
      expect(none).toContain("id,case,rail,sand");
      for (const e of ENGLISH) expect(none).not.toMatch(e);
      unmount();
    });
  }

  it("a language switch redraws the errors already on screen", async () => {
    const { unmount } = renderWithApp(() => <Departures />, { pool: fakePool({ check: outcome }) });
    fireEvent.change(screen.getByLabelText(departures.en.pickLabel), { target: { files: [dayFile()] } });
    await waitFor(() => expect(document.querySelectorAll(".bad-rows li")).toHaveLength(3), { timeout: 10_000 });
    expect(badText()).toContain("[0]: cannot be checked (train: one plan of this train would take 1.3 × 10^12 vehicle-steps");
    expect(badText()).toContain("[2]: internal error: the planner stopped unexpectedly");
    await setAppLanguage("de");
    await waitFor(() => expect(badText()).toContain("1,3 × 10^12"), { timeout: 10_000 });
    for (const e of ENGLISH) expect(badText().replace("RangeError: offset 7 is out of bounds", "")).not.toMatch(e);
    await setAppLanguage("en");
    await waitFor(() => expect(badText()).toContain("[0]: cannot be checked"), { timeout: 10_000 });
    unmount();
  });
});
