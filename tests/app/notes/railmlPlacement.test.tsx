/**
 * Location notes → Import from railML, a stretch too short behind the front for the reference train
 * (issue 16): why the train cannot be placed is the field's code (rearBeforeProfile) drawn in the language
 * on screen — German here, then Hungarian after a switch — with the stretch's figures, no English left.
 */
import "fake-indexeddb/auto";
import { fireEvent, screen, waitFor } from "@solidjs/testing-library";
import { describe, expect, it } from "vitest";
import LocationNotesScreen from "../../../src/app/screens/LocationNotes/index.js";
import { appLang, setAppLanguage } from "../../../src/app/i18n.js";
import { SETTINGS_KEY } from "../../../src/app/state/createSettings.js";
import { notesDe } from "../../../src/i18n/de/notes.js";
import { chain, railmlFile } from "../../tools/railml.js";
import { memoryStorage, quickTablePool, renderWithApp } from "../harness.js";

const listed = () => [...document.querySelectorAll(".notes-item-name")].map((e) => e.textContent);
const placement = () => document.querySelector(".notes-railml-preview .notes-issue-box")?.textContent ?? "";

// Two tracks of 1500 m at 5 ‰ (our own test line, tests/tools/railml.ts), the front on the second.
const [a, b] = chain([1500, 1500], 20_000);
a!.gradients = [{ pos: 0, dir: "up", value: 5 }];
b!.gradients = [{ pos: 0, dir: "up", value: 5 }];
b!.crossSections = [{ id: "cs", pos: 300, ocpRef: "o1" }];
const LINE = railmlFile({ tracks: [a!, b!], ocps: [{ id: "o1", name: "Test siding (invented)" }] });

describe("Import from railML: a train that cannot be placed, in the language on screen", () => {
  it("de, then hu after a switch", async () => {
    const storage = memoryStorage();
    storage.setItem(SETTINGS_KEY, JSON.stringify({ language: "de" }));
    try {
      renderWithApp(() => <LocationNotesScreen />, { storage, pool: quickTablePool() });
      await waitFor(() => expect(appLang()).toBe("de"), { timeout: 10_000 });
      await waitFor(() => expect(listed().length).toBeGreaterThan(0), { timeout: 10_000 });
      fireEvent.click(screen.getByRole("button", { name: notesDe.importRailml as string }));
      fireEvent.change(screen.getByLabelText(notesDe.rmFileLabel as string), { target: { files: [new File([LINE], "line.xml", { type: "application/xml" })] } });
      const behind = await waitFor(
        () => {
          const el = document.querySelector<HTMLInputElement>('input[name="railml.behind"]');
          expect(el).toBeTruthy();
          return el!;
        },
        { timeout: 10_000 },
      );
      // 20 m behind the front: no train fits.
      fireEvent.input(behind, { target: { value: "20" } });
      await waitFor(() => expect(placement()).not.toBe(""), { timeout: 10_000 });
      const de = placement();
      // The train's length, where its rear would stand and where the profile starts: English's figures.
      const figures = (t: string) => [...t.matchAll(/\u2212?\d+/g)].map((m) => m[0]);
      expect(figures(de)).toEqual(["414", "\u2212394", "0"]);
      expect(de).not.toMatch(/\b(the|train|before|profile|starts|puts|rear|at)\b/);
      await setAppLanguage("hu");
      await waitFor(() => expect(placement()).not.toBe(de), { timeout: 10_000 });
      expect(figures(placement()).sort()).toEqual(["414", "\u2212394", "0"].sort());
      expect(placement()).not.toMatch(/\b(the|train|before|profile|starts|puts|rear|at)\b/);
      await setAppLanguage("en");
      await waitFor(() => expect(placement()).toMatch(/before the profile starts/), { timeout: 10_000 });
      expect(figures(placement())).toEqual(["414", "\u2212394", "0"]);
    } finally {
      await setAppLanguage("en");
    }
  }, 60_000);
});
