/**
 * The printable location card's foot in Hungarian and German (issue 16): the rail-condition defaults it
 * was computed from are written in the language on screen — the conditions' words and the adhesion
 * figures with the language's decimal sign, the same figures as English — not the English line.
 */
import "fake-indexeddb/auto";
import { fireEvent, screen, waitFor } from "@solidjs/testing-library";
import { afterEach, describe, expect, it } from "vitest";
import LocationNotesScreen from "../../../src/app/screens/LocationNotes/index.js";
import { appLang, setAppLanguage } from "../../../src/app/i18n.js";
import { SETTINGS_KEY } from "../../../src/app/state/createSettings.js";
import { builtinLocations } from "../../../src/profiles/builtin.js";
import { memoryStorage, quickTablePool, renderWithApp } from "../harness.js";

const foot = () => (document.querySelector(".notes-print-root .notes-card .card-computed")?.textContent ?? "").replace(/\s+/g, " ");
const figures = (t: string) => [...t.matchAll(/\d+[.,]\d+/g)].map((m) => m[0].replace(",", "."));

afterEach(async () => {
  await setAppLanguage("en");
});

describe("the card's rail-condition defaults in the language on screen", () => {
  it("en as it was; hu and de in their words with English's figures", async () => {
    const storage = memoryStorage();
    const note = builtinLocations[1]!;
    renderWithApp(() => <LocationNotesScreen />, { storage, pool: quickTablePool() });
    fireEvent.click(await screen.findByRole("button", { name: `Card of ${note.name}` }, { timeout: 10_000 }));
    await waitFor(() => expect(foot()).toContain("adhesion at standstill without / with sand: dry 0.33 / 0.36"), { timeout: 10_000 });
    const english = figures(foot().slice(foot().indexOf("adhesion")));
    expect(english.length).toBe(12);
    for (const [lang, dry] of [
      ["hu", "száraz 0,33 / 0,36"],
      ["de", "trocken 0,33 / 0,36"],
    ] as const) {
      await setAppLanguage(lang);
      await waitFor(() => expect(appLang()).toBe(lang));
      await waitFor(() => expect(foot()).toContain(dry), { timeout: 10_000 });
      expect(foot()).not.toMatch(/\b(adhesion|standstill|without|with|sand|dry|damp|wet|greasy)\b/);
      expect(figures(foot().slice(foot().indexOf(dry.split(" ")[0]!)))).toEqual(english);
    }
  }, 30_000);
});
