/**
 * The Assistance check's failures and Settings' list of sources in Hungarian and German: a case the planner
 * refuses (beyond the work cap: its figures with the language's decimal sign) and a planner that stopped, in
 * the language on screen and redrawn when it changes; the sources' subjects in the language, the works cited
 * as they were published, and the rail table's figures with the language's decimal sign; and the print
 * stamp of a screen printed before its figures are in says what it waits for in the language.
 */
import { screen, waitFor } from "@solidjs/testing-library";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import AssistanceCheck from "../../src/app/screens/AssistanceCheck/index.js";
import { forgetAssistanceChecks } from "../../src/app/screens/AssistanceCheck/createAssistanceCheck.js";
import Settings from "../../src/app/screens/Settings/index.js";
import Departures from "../../src/app/screens/Departures/index.js";
import { PrintStamp } from "../../src/app/components/PrintStamp.js";
import { fireEvent } from "@solidjs/testing-library";
import { PLAN_WORK_CAP_VEHICLE_STEPS, type PlanWorkProblem } from "../../src/core/planner/workCap.js";
import { appLang, setAppLanguage } from "../../src/app/i18n.js";
import { SETTINGS_KEY } from "../../src/app/state/createSettings.js";
import { builtinRailConditions } from "../../src/profiles/builtin.js";
import { readFileSync } from "node:fs";
import { join } from "node:path";

/** A demo start case as a file holds it. */
const builtinCase = () => JSON.parse(readFileSync(join(process.cwd(), "profiles", "cases", "demo-ore-lantern.json"), "utf8")) as unknown;
import { memoryStorage, renderWithApp } from "./harness.js";
import { fakePool } from "./dispatch/fakes.js";
import { wordsHu } from "../../src/i18n/hu/words.js";
import { wordsDe } from "../../src/i18n/de/words.js";

const WORK: PlanWorkProblem = { code: "work-cap", vehicles: 61, stepS: 4.2e-9, lightestKg: 0.001, vehicleSteps: 1.27e12, capVehicleSteps: PLAN_WORK_CAP_VEHICLE_STEPS };
const oneDecimal = (locale: string, x: number) => new Intl.NumberFormat(locale, { minimumFractionDigits: 1, maximumFractionDigits: 1 }).format(x);
const failing = () =>
  fakePool({
    assistance: () => ({ ok: false, kind: "invalid", issues: [{ path: "train", message: "work-cap", reader: WORK }], message: "The start case is malformed." }),
    conditionMargins: () => ({ ok: false, kind: "crashed", issues: [], message: "The planner stopped unexpectedly." }),
  });
const inLanguage = (lang: string) => {
  const storage = memoryStorage();
  storage.setItem(SETTINGS_KEY, JSON.stringify({ language: lang }));
  return storage;
};
const ENGLISH = [/Assistance search/, /Margins per rail condition/, /the planner/i, /malformed/, /vehicle-steps/, /cannot check/, /Rail condition/, /with sand/, /Adhesion against speed/, /Running resistance/, /Curve resistance/];

beforeEach(() => forgetAssistanceChecks());
afterEach(async () => {
  await setAppLanguage("en");
});

describe("the Assistance check's failures in Hungarian and German", () => {
  for (const [lang, locale, search, margins] of [
    ["de", "de-DE", "Suche nach Zusatzloks", "Reserven je Schienenzustand"],
    ["hu", "hu-HU", "Rásegítés keresése", "Tartalékok sínállapotonként"],
  ] as const) {
    it(`${lang}: a refused case with the work cap's figures, and a stopped planner`, async () => {
      const { unmount } = renderWithApp(() => <AssistanceCheck />, { storage: inLanguage(lang), pool: failing() });
      await waitFor(() => expect(appLang()).toBe(lang), { timeout: 10_000 });
      await waitFor(() => expect(document.body.textContent).toContain(search), { timeout: 10_000 });
      const text = document.body.textContent!;
      // The refused search with its figures (the screen says the failure it heard last: the search, here).
      expect(text).toContain(`${oneDecimal(locale, 1.3)} × 10^12`);
      expect(text).toContain(`${oneDecimal(locale, 4.2)} ns`);
      void margins;
      for (const e of ENGLISH) expect(text).not.toMatch(e);
      unmount();
    });
  }

  it("a language switch redraws the failure", async () => {
    const { unmount } = renderWithApp(() => <AssistanceCheck />, { pool: failing() });
    await waitFor(() => expect(document.body.textContent).toMatch(/Assistance search: the planner cannot check this case \(train: one plan of this train would take 1\.3 × 10\^12 vehicle-steps/), { timeout: 10_000 });
    await setAppLanguage("de");
    await waitFor(() => expect(document.body.textContent).toContain("Suche nach Zusatzloks: der Planer kann diesen Fall nicht prüfen (train: "));
    expect(document.body.textContent).toContain("1,3 × 10^12");
    unmount();
  });
});

describe("Settings' list of sources in Hungarian and German", () => {
  for (const [lang, locale] of [["de", "de-DE"], ["hu", "hu-HU"]] as const) {
    it(`${lang}: the subjects in the language, the works as published, the rail table's coefficients with the decimal comma`, async () => {
      const { unmount } = renderWithApp(() => <Settings />, { storage: inLanguage(lang) });
      await waitFor(() => expect(appLang()).toBe(lang), { timeout: 10_000 });
      const items = () => [...document.querySelectorAll(".sources li")].map((li) => li.textContent!);
      await waitFor(() => expect(items().length).toBe(7 + Object.keys(builtinRailConditions.conditions).length));
      const text = items().join("\n");
      expect(text).toContain("E. W. Curtius and A. Kniffler, Elektrische Bahnen 20 (1950).");
      expect(text).toContain("Röckl");
      const dry = builtinRailConditions.conditions.dry!;
      const comma = (x: number) => new Intl.NumberFormat(locale, { maximumFractionDigits: 4 }).format(x);
      // The condition in the language's own word, and the table's note on its source in the language too.
      const dryItem = items().find((t) => t.includes(` ${(lang === "de" ? wordsDe : wordsHu).railInlineDry} (`));
      expect(dryItem).toContain(`μ ${comma(dry.median)}`);
      expect(dryItem).toContain(comma(dry.sanded));
      expect(dryItem).toContain(`Curtius–Kniffler μ(0) = ${comma(0.3315)}`);
      expect(dryItem).toContain("(Elektrische Bahnen 20, 1950)");
      expect(text).not.toContain('"dry"');
      expect(text).not.toContain("From memory");
      for (const e of ENGLISH) expect(text).not.toMatch(e);
      unmount();
    });
  }
  void screen;
});

describe("the print stamp of a screen printed too early, in Hungarian and German", () => {
  for (const [lang, waiting] of [["de", "Unvollständig — warten auf: die Prüfung aller Abfahrten."], ["hu", "Hiányos — várjon: minden indulás ellenőrzésére."]] as const) {
    it(`${lang}: Departures while its rows are checked`, async () => {
      const pool = fakePool({});
      const { unmount } = renderWithApp(
        () => (
          <>
            <PrintStamp screen="Departures" />
            <Departures />
          </>
        ),
        { storage: inLanguage(lang), pool },
      );
      await waitFor(() => expect(appLang()).toBe(lang), { timeout: 10_000 });
      const day = new File([JSON.stringify([JSON.parse(JSON.stringify(builtinCase()))])], "day.json");
      fireEvent.change(document.querySelector('input[type="file"]')!, { target: { files: [day] } });
      await waitFor(() => expect(pool.calls.some((c) => c.kind === "check")).toBe(true), { timeout: 5_000 });
      expect(document.querySelector(".print-incomplete strong")!.textContent).toBe(waiting);
      unmount();
    });
  }
});
