/**
 * Location notes → Import from railML in Hungarian and German (jsdom runs the import worker's handler on the
 * page's thread): what the reader and the stretch say about the file (here: changes without a dir, a speed
 * limit, a line without curves), where the front stands and a refusal are drawn from their codes in the
 * language on screen, redrawn when the language changes, and the note saved holds its words (standing,
 * direction, revision entry) in the language it was saved in, its figures grouped as the language groups
 * thousands (hu 21 800 with a no-break space, de 21.800; CLDR). The sentences expected are the catalog's,
 * filled by hand with the file's figures (the file is written by the test: tests/tools/railml.ts).
 */
import "fake-indexeddb/auto";
import { fireEvent, screen, waitFor } from "@solidjs/testing-library";
import { describe, expect, it } from "vitest";
import LocationNotesScreen from "../../../src/app/screens/LocationNotes/index.js";
import { appLang, setAppLanguage } from "../../../src/app/i18n.js";
import { SETTINGS_KEY } from "../../../src/app/state/createSettings.js";
import { deviceNotesStore as openNotesStore } from "../../../src/notes/index.js";
import { notesDe } from "../../../src/i18n/de/notes.js";
import { notesHu } from "../../../src/i18n/hu/notes.js";
import { railmlTextDe } from "../../../src/i18n/de/railmlText.js";
import { railmlTextHu } from "../../../src/i18n/hu/railmlText.js";
import { chain, railmlFile } from "../../tools/railml.js";
import { memoryStorage, quickTablePool, renderWithApp } from "../harness.js";

const listed = () => [...document.querySelectorAll(".notes-item-name")].map((e) => e.textContent);
const section = () => document.querySelector(".notes-railml")!;

// Two tracks of 1500 m, 5 ‰ given without a dir on both (two changes), no curves at all, 60 km/h ahead.
const [a, b] = chain([1500, 1500], 20_000);
a!.gradients = [{ pos: 0, value: 5 }];
b!.gradients = [{ pos: 0, value: 5 }];
b!.speeds = [{ pos: 0, dir: "up", value: 60 }];
b!.crossSections = [{ id: "cs", pos: 300, ocpRef: "o1" }];
const LINE = railmlFile({ tracks: [a!, b!], ocps: [{ id: "o1", name: "Kavicsbánya kitérő (invented)" }] });

describe("Import from railML in Hungarian and German", () => {
  it("says what the file and the stretch are in the language on screen, again after a switch, and saves the note's words in it", async () => {
    const storage = memoryStorage();
    storage.setItem(SETTINGS_KEY, JSON.stringify({ language: "hu" }));
    try {
      renderWithApp(() => <LocationNotesScreen />, { storage, pool: quickTablePool() });
      await waitFor(() => expect(appLang()).toBe("hu"), { timeout: 10_000 });
      await waitFor(() => expect(listed().length).toBeGreaterThan(0), { timeout: 10_000 });
      fireEvent.click(screen.getByRole("button", { name: notesHu.importRailml as string }));
      fireEvent.change(screen.getByLabelText(notesHu.rmFileLabel as string), { target: { files: [new File([LINE], "line.xml", { type: "application/xml" })] } });
      const huDir = (railmlTextHu.noDir as string).replace("{count}", "2");
      const huCurves = railmlTextHu.noRadius as string;
      await waitFor(() => expect(section().textContent).toContain(huDir), { timeout: 10_000 });
      await waitFor(() => expect(section().textContent).toContain(huCurves), { timeout: 10_000 });
      expect(section().textContent).toContain((railmlTextHu.speedLimit as string).replace("{speed}", "60"));
      expect(section().textContent).toContain('"Kavicsbánya kitérő (invented)" szolgálati hely');
      // The front's line position as Hungarian groups it (the stretch gives 21800 m).
      expect(section().textContent).toContain("21\u00a0800 m");
      expect(section().textContent).not.toContain("21800");
      // Nothing the reader says in English is left.
      expect(section().textContent).not.toMatch(/\b(the|was|were|taken|towards|applies|Speed limit|operational point)\b/);

      // The language changes: the same file's words are drawn again in German, without reading it again.
      await setAppLanguage("de");
      await waitFor(() => expect(section().textContent).toContain((railmlTextDe.noDir as string).replace("{count}", "2")), { timeout: 10_000 });
      expect(section().textContent).toContain(railmlTextDe.noRadius as string);
      expect(section().textContent).toContain('Betriebsstelle "Kavicsbánya kitérő (invented)"');
      expect(section().textContent).not.toContain(huDir);
      expect(section().textContent).toContain("21.800 m");

      // Saved in German: the note's words are German; its figures are the stretch's.
      fireEvent.click(screen.getByRole("button", { name: notesDe.rmSave as string }));
      await screen.findByText((notesDe.nfSavedRailml as string).replace("{name}", "Kavicsbánya kitérő (invented)"), {}, { timeout: 10_000 });
      const saved = (await (await openNotesStore()).list()).notes.find((n) => n.note.name === "Kavicsbánya kitérő (invented)");
      expect(saved?.note.standing).toMatch(/^Zugspitze bei Betriebsstelle "Kavicsbánya kitérő \(invented\)", Gleis "T2" bei pos 300 m, absPos 21\.800 m \(aus railML\)\.$/);
      expect(saved?.note.direction).toBe('in Richtung steigender pos (railML dir="up" auf dem Gleis der Zugspitze)');
      expect(saved?.note.revisions[0]?.change).toBe("Aus railML importiert (line.xml): 1 Abschnitt(e), 1.500 m hinter und 1.000 m vor der Zugspitze.");

      // A refusal from the reader, in German.
      fireEvent.click(screen.getByRole("button", { name: notesDe.backToLibrary as string }));
      fireEvent.click(await screen.findByRole("button", { name: notesDe.importRailml as string }));
      fireEvent.change(screen.getByLabelText(notesDe.rmFileLabel as string), { target: { files: [new File(["<railml/>"], "bad.xml", { type: "application/xml" })] } });
      const alert = await screen.findByRole("alert", {}, { timeout: 10_000 });
      expect(alert.textContent).toContain("bad.xml: ");
      expect(alert.textContent).toContain((notesDe.rmNothingSaved as string).replace("{problem} ", ""));
      expect(alert.textContent).not.toMatch(/\b(the|file|Nothing)\b/);
    } finally {
      await setAppLanguage("en");
    }
  }, 60_000);
});
