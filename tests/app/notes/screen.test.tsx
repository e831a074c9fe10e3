/**
 * The Location notes screen over the device store (fake-indexeddb): the demo notes on first open, a new
 * note saved and offered to the location pickers, an import that asks about a conflict, a damaged record
 * reported. The tests run in order on one library, as a trainer's session would.
 */
import "fake-indexeddb/auto";
import { fireEvent, screen, waitFor, within } from "@solidjs/testing-library";
import { openDB } from "idb";
import { describe, expect, it } from "vitest";
import LocationNotesScreen from "../../../src/app/screens/LocationNotes/index.js";
import { DEFAULT_NOTES_DB, listNotesForPicker } from "../../../src/notes/index.js";
import { builtinLocations } from "../../../src/profiles/builtin.js";
import { makeNotesBundle } from "../../../src/profiles/notes.js";
import { memoryStorage, quickTablePool, renderWithApp } from "../harness.js";
import { appLang, setAppLanguage } from "../../../src/app/i18n.js";
import { SETTINGS_KEY } from "../../../src/app/state/createSettings.js";
import { notes } from "../../../src/i18n/en/notes.js";
import { de } from "../../../src/i18n/de/index.js";
import { deLater } from "../../../src/i18n/de/later.js";
import { hu } from "../../../src/i18n/hu/index.js";
import { huLater } from "../../../src/i18n/hu/later.js";
import { createTranslator } from "../../../src/i18n/translator.js";

const listed = () => [...document.querySelectorAll(".notes-item-name")].map((e) => e.textContent);
const input = (name: string) => document.querySelector(`[data-field="${name}"] input, [data-field="${name}"] textarea`) as HTMLInputElement;

describe("Location notes screen", () => {
  it("opens with the demo notes, labelled illustrative", async () => {
    renderWithApp(() => <LocationNotesScreen />, { pool: quickTablePool() });
    await waitFor(() => expect(listed()).toHaveLength(builtinLocations.length), { timeout: 10_000 });
    expect(screen.getAllByText("Illustrative")).toHaveLength(builtinLocations.length);
  });

  it("shows the library in German and Hungarian: its actions, tags and each note's card button in the language's words", async () => {
    for (const [lang, catalog] of [["de", { ...de, ...deLater }], ["hu", { ...hu, ...huLater }]] as const) {
      const n = createTranslator(lang, catalog).ns(notes);
      expect(n("newNote")).not.toBe(notes.en.newNote);
      const storage = memoryStorage();
      storage.setItem(SETTINGS_KEY, JSON.stringify({ language: lang }));
      try {
        const { unmount } = renderWithApp(() => <LocationNotesScreen />, { storage, pool: quickTablePool() });
        await waitFor(() => expect(appLang()).toBe(lang));
        await waitFor(() => expect(listed()).toHaveLength(builtinLocations.length), { timeout: 10_000 });
        expect(screen.getByRole("button", { name: n("newNote") })).toBeTruthy();
        expect(screen.getByRole("button", { name: n("exportAll") })).toBeTruthy();
        expect(screen.getAllByText(n("illustrative"))).toHaveLength(builtinLocations.length);
        const first = listed()[0]!;
        expect(screen.getByRole("button", { name: n("cardOf", { name: first }) })).toBeTruthy();
        expect(document.querySelector(".notes-library p[aria-live]")!.textContent).toContain(n("count", { count: builtinLocations.length }));
        // The editor: its title, its sections and its fields' labels.
        fireEvent.click(screen.getByRole("button", { name: n("newNote") }));
        expect(screen.getByRole("heading", { level: 2, name: n("edNewTitle") })).toBeTruthy();
        expect(screen.getByRole("heading", { level: 3, name: n("segTitle") })).toBeTruthy();
        expect(screen.getByLabelText(n("edInitials"))).toBeTruthy();
        expect(screen.getByRole("button", { name: n("segAdd") })).toBeTruthy();
        fireEvent.click(screen.getByRole("button", { name: n("backToLibrary") }));
        unmount();
      } finally {
        await setAppLanguage("en");
      }
    }
  });

  it("saves a new note, lists it, and offers it to the location pickers", async () => {
    renderWithApp(() => <LocationNotesScreen />, { pool: quickTablePool() });
    await waitFor(() => expect(listed().length).toBeGreaterThan(0), { timeout: 10_000 });
    fireEvent.click(screen.getByRole("button", { name: "New note" }));
    fireEvent.input(input("name"), { target: { value: "Wrenfield up loop (test)" } });
    fireEvent.input(input("revision.initials"), { target: { value: "QA" } });
    const save = screen.getByRole("button", { name: "Save note" }) as HTMLButtonElement;
    await waitFor(() => expect(save.disabled).toBe(false), { timeout: 10_000 });
    fireEvent.click(save);
    // A save runs several store transactions (fake-indexeddb is slow on a busy machine): a generous wait.
    await waitFor(() => expect(screen.getByText('Saved "Wrenfield up loop (test)".')).toBeTruthy(), { timeout: 10_000 });
    fireEvent.click(screen.getByRole("button", { name: "Back to the library" }));
    await waitFor(() => expect(listed()).toContain("Wrenfield up loop (test)"), { timeout: 10_000 });
    const picker = await listNotesForPicker();
    expect(picker.map((p) => p.id)).toContain("wrenfield-up-loop-test");
  }, 60_000);

  it("asks about a note whose revision differs, and 'Keep both' adds the file's copy", async () => {
    renderWithApp(() => <LocationNotesScreen />, { pool: quickTablePool() });
    await waitFor(() => expect(listed().length).toBeGreaterThan(0), { timeout: 10_000 });
    const demo = builtinLocations[0]!;
    const theirs = { ...demo, clearAhead_m: demo.clearAhead_m - 100, revisions: [...demo.revisions, { date: "2027-01-15", initials: "ZX", change: "Signal moved back 100 m." }] };
    const file = new File([JSON.stringify(makeNotesBundle([theirs]))], "from-colleague.json", { type: "application/json" });
    fireEvent.change(screen.getByLabelText("Notes file to import"), { target: { files: [file] } });
    const dialog = await screen.findByRole("dialog");
    expect(within(dialog).getByText(/In the file:/).parentElement!.textContent).toContain("revised 2027-01-15 by ZX: Signal moved back 100 m.");
    fireEvent.click(within(dialog).getByRole("button", { name: "Import with these choices" }));
    expect(within(dialog).getByText("Choose for 1 more note first.")).toBeTruthy();
    fireEvent.click(within(dialog).getByRole("radio", { name: "Keep both" }));
    fireEvent.click(within(dialog).getByRole("button", { name: "Import with these choices" }));
    await waitFor(() => expect(screen.getByText(/Imported from-colleague\.json: 1 kept both/)).toBeTruthy(), { timeout: 10_000 });
    expect(listed()).toContain(`${demo.name} (imported copy)`);
    expect(listed()).toContain(demo.name);
  });

  it("refuses a truncated file with its message and changes nothing", async () => {
    renderWithApp(() => <LocationNotesScreen />, { pool: quickTablePool() });
    await waitFor(() => expect(listed().length).toBeGreaterThan(0), { timeout: 10_000 });
    const before = listed();
    const text = JSON.stringify(makeNotesBundle(builtinLocations)).slice(0, 400);
    fireEvent.change(screen.getByLabelText("Notes file to import"), { target: { files: [new File([text], "cut.json")] } });
    await waitFor(() => expect(screen.getByRole("alert").textContent).toContain("cut.json: The file is not complete JSON"));
    expect(listed()).toEqual(before);
  });

  it("reports a damaged record and lets the trainer remove it", async () => {
    const db = await openDB(DEFAULT_NOTES_DB);
    await db.put("notes", { id: "scrambled", origin: "mine", savedAt: "2026-01-01T00:00:00Z", note: { schema: "taut/location@1", id: "scrambled" } });
    // Counted as any write is, as another tab of the app would.
    await db.put("meta", String(Number((await db.get("meta", "changes")) ?? "0") + 1), "changes");
    db.close();
    renderWithApp(() => <LocationNotesScreen />, { pool: quickTablePool() });
    await waitFor(() => expect(screen.getByText("Damaged records (1)")).toBeTruthy());
    expect(screen.getByText(/The saved note "scrambled" is damaged and was skipped: name: is required/)).toBeTruthy();
    expect(listed().length).toBeGreaterThan(0);
    fireEvent.click(screen.getByRole("button", { name: "Remove record" }));
    await waitFor(() => expect(screen.queryByText(/Damaged records/)).toBeNull());
  });
});
