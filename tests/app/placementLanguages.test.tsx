/**
 * Placement refusals in Hungarian and German (issue 16): a load table the workers refuse for its work (the
 * work cap, a code with its figures), a note card whose reference train stands off the profile (a field
 * code with the profile's end), and a card whose train cannot be placed with no check saying why — each
 * said in the language on screen with the same figures as English, no English sentence left, redrawn when
 * the language changes; English is the readers' and fields' own English.
 */
import { render, waitFor } from "@solidjs/testing-library";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { forgetLoadTables } from "../../src/app/screens/LoadTable/createLoadTableRun.js";
import LoadTable from "../../src/app/screens/LoadTable/index.js";
import { LoadTableResult } from "../../src/app/screens/LocationNotes/Card.js";
import { cardLoadTable } from "../../src/app/screens/LocationNotes/View.js";
import { appLang, setAppLanguage } from "../../src/app/i18n.js";
import { fieldWords } from "../../src/app/fieldWords.js";
import { SETTINGS_KEY } from "../../src/app/state/createSettings.js";
import type { PlanWorkProblem } from "../../src/core/planner/workCap.js";
import { coded } from "../../src/profiles/issues.js";
import { readerEnglish } from "../../src/profiles/readerIssues.js";
import { memoryStorage, renderWithApp } from "./harness.js";
import { fakePool } from "./dispatch/fakes.js";

/** The figures of a text in `lang`, as numbers (its thousands' separator dropped, its decimal comma read as a point), sorted. */
function figures(text: string, lang: "en" | "hu" | "de"): number[] {
  const group = lang === "en" ? "," : lang === "de" ? "\\." : "[\\s\\u00a0\\u202f]";
  const t = text.replace(new RegExp(`(\\d)${group}(\\d{3})(?!\\d)`, "g"), "$1$2");
  return [...t.matchAll(/\d+(?:[.,]\d+)?/g)].map((m) => Number(m[0].replace(",", "."))).sort((a, b) => a - b);
}

const ENGLISH = [/\bthe\b/i, /\bcannot\b/, /\bbeyond\b/, /\bprofile\b/, /\bwork\b/, /\bsteps?\b/, /\bvehicles?\b/, /\bmore than\b/, /\bwork-cap\b/, /\bplaced\b/];

/** The work cap's refusal, as the worker sends it: the code and its figures in SI. */
const work: PlanWorkProblem = { code: "work-cap", vehicles: 42, stepS: 4.2e-9, lightestKg: 1, vehicleSteps: 5e12, capVehicleSteps: 5e8 };

afterEach(async () => {
  await setAppLanguage("en");
});
beforeEach(() => forgetLoadTables());

const alerts = () => [...document.querySelectorAll("[role=alert]")].map((e) => e.textContent ?? "").join("\n");

describe("a load table the workers refuse for its work", () => {
  const refusing = () => fakePool({ loadTable: () => ({ ok: false, kind: "invalid", issues: [{ path: "train", message: work.code, reader: work }], message: "The start case is malformed." }) }, 1);

  it("en: the work cap's own English, not its code", async () => {
    const { unmount } = renderWithApp(() => <LoadTable />, { pool: refusing() });
    await waitFor(() => expect(alerts()).toContain(`train: ${readerEnglish(work)}`), { timeout: 10_000 });
    unmount();
  });

  for (const lang of ["hu", "de"] as const) {
    it(`${lang}: in its words with English's figures, redrawn on a language switch`, async () => {
      const storage = memoryStorage();
      storage.setItem(SETTINGS_KEY, JSON.stringify({ language: lang }));
      const { unmount } = renderWithApp(() => <LoadTable />, { storage, pool: refusing() });
      await waitFor(() => expect(appLang()).toBe(lang), { timeout: 10_000 });
      await waitFor(() => expect(alerts()).toContain("10^"), { timeout: 10_000 });
      const text = alerts();
      const said = text.slice(text.indexOf("train: "));
      expect(figures(said, lang)).toEqual(figures(`train: ${readerEnglish(work)}`, "en"));
      for (const e of ENGLISH) expect(said).not.toMatch(e);
      await setAppLanguage("en");
      await waitFor(() => expect(alerts()).toContain(readerEnglish(work)), { timeout: 10_000 });
      unmount();
    });
  }
});

describe("a note card whose reference train cannot be placed", () => {
  const offProfile = coded("location.frontAt_m", { code: "beyondProfile", figures: { end: 2400, unit: "m" } });
  const box = () => document.querySelector(".notes-issue-box")?.textContent ?? "";

  it("en: the field's English", async () => {
    await fieldWords;
    const { unmount } = render(() => <LoadTableResult outcome={{ ok: false, issues: [offProfile] }} units="metric" />);
    // In the app's units and digits, as the Load table screen says it.
    expect(box()).toBe("The load table cannot be worked out: is beyond the end of the profile (2,400 m)");
    unmount();
    const stub = render(() => <LoadTableResult outcome={cardLoadTable({ placed: () => undefined, errors: () => [], loadTable: () => undefined })!} units="metric" />);
    expect(box()).toBe("The load table cannot be worked out: the reference train cannot be placed on the profile.");
    stub.unmount();
  });

  for (const lang of ["hu", "de"] as const) {
    it(`${lang}: the profile's end and the missing placement in its words, redrawn on a switch`, async () => {
      await setAppLanguage(lang);
      await fieldWords;
      const { unmount } = render(() => <LoadTableResult outcome={{ ok: false, issues: [offProfile] }} units="metric" />);
      await waitFor(() => expect(box()).toMatch(/2[\s\u00a0\u202f.]?400 m/), { timeout: 10_000 });
      expect(figures(box(), lang)).toEqual([2400]);
      for (const e of ENGLISH) expect(box()).not.toMatch(e);
      await setAppLanguage("en");
      await waitFor(() => expect(box()).toContain("is beyond the end of the profile"), { timeout: 10_000 });
      unmount();

      await setAppLanguage(lang);
      const stub = render(() => <LoadTableResult outcome={cardLoadTable({ placed: () => undefined, errors: () => [], loadTable: () => undefined })!} units="metric" />);
      expect(box().length).toBeGreaterThan(20);
      for (const e of ENGLISH) expect(box()).not.toMatch(e);
      stub.unmount();
    });
  }
});
