/**
 * The Location notes screen keeps the trainer's work: an edit survives a reload, a save that finds the note
 * changed in another tab asks first, a damaged record is asked about on import and can be exported or put
 * right, a numeric key can be removed, a note from a file does not open as changed, a long library is
 * paged, and a library upgraded by another tab says so. fake-indexeddb stands in for the browser's store;
 * another tab is a second connection to it. The database-version test runs last (it leaves the database
 * at a newer version).
 */
import "fake-indexeddb/auto";
import { cleanup, fireEvent, screen, waitFor, within } from "@solidjs/testing-library";
import { openDB } from "idb";
import { describe, expect, it, vi } from "vitest";
import LocationNotesScreen, { NOTE_DRAFT_KEY } from "../../../src/app/screens/LocationNotes/index.js";
import { rawRecordText } from "../../../src/app/screens/LocationNotes/createNotesLibrary.js";
import { Library, LIBRARY_PAGE } from "../../../src/app/screens/LocationNotes/Library.js";
import { DEFAULT_NOTES_DB, openNotesStore, type NoteRow } from "../../../src/notes/index.js";
import { builtinLocations } from "../../../src/profiles/builtin.js";
import { makeNotesBundle } from "../../../src/profiles/notes.js";
import { render } from "@solidjs/testing-library";
import { quickTablePool, renderWithApp } from "../harness.js";

const listed = () => [...document.querySelectorAll(".notes-item-name")].map((e) => e.textContent);
const input = (name: string) => document.querySelector(`[data-field="${name}"] input, [data-field="${name}"] textarea`) as HTMLInputElement;
const demo = builtinLocations[0]!;

async function openScreen(): Promise<void> {
  renderWithApp(() => <LocationNotesScreen />, { pool: quickTablePool() });
  await waitFor(() => expect(listed().length).toBeGreaterThan(0), { timeout: 10_000 });
}

/** Open a note of the library in the editor. */
async function edit(name: string): Promise<void> {
  fireEvent.click(screen.getByRole("button", { name: new RegExp(`^${name.replace(/[()]/g, "\\$&")}`) }));
  await waitFor(() => expect(input("name").value).toBe(name));
}

describe("Location notes: nothing lost", () => {
  it("an unsaved edit is kept across a reload and opens again, said so", async () => {
    await openScreen();
    await edit(demo.name);
    fireEvent.input(input("practice"), { target: { value: "Kept across a reload." } });
    await waitFor(() => expect(localStorage.getItem(NOTE_DRAFT_KEY)).toContain("Kept across a reload."), { timeout: 3000 });
    cleanup(); // the page goes away
    renderWithApp(() => <LocationNotesScreen />, { pool: quickTablePool() });
    await waitFor(() => expect(input("practice")?.value).toBe("Kept across a reload."), { timeout: 10_000 });
    expect(screen.getByText(/Your unsaved edit of .* was kept/)).toBeTruthy();
    // Going back to the library drops it.
    fireEvent.click(screen.getByRole("button", { name: "Close without saving" }));
    await waitFor(() => expect(localStorage.getItem(NOTE_DRAFT_KEY)).toBeNull());
  });

  it("a save that finds the note saved in another tab asks; 'Take theirs' opens theirs", async () => {
    await openScreen();
    await edit(demo.name);
    fireEvent.input(input("practice"), { target: { value: "Mine, from this tab." } });
    fireEvent.input(input("revision.change"), { target: { value: "This tab's change." } });
    fireEvent.input(input("revision.initials"), { target: { value: "AA" } });
    // Another tab saves the same note meanwhile.
    const other = await openNotesStore();
    const got = await other.get(demo.id);
    if (got.status !== "ok") throw new Error("demo note missing");
    const theirs = { ...got.saved.note, practice: "Theirs, from the other tab.", revisions: [...got.saved.note.revisions, { date: "2027-02-01", initials: "BB", change: "Other tab's change." }] };
    expect((await other.put(theirs, "mine", { rev: got.saved.rev })).ok).toBe(true);
    other.close();
    fireEvent.click(screen.getByRole("button", { name: "Save note" }));
    const dialog = await screen.findByRole("dialog", { name: "This note was saved elsewhere while you edited it" });
    expect(dialog.textContent).toContain("2027-02-01 by BB: Other tab's change.");
    fireEvent.click(within(dialog).getByRole("button", { name: "Take theirs" }));
    await waitFor(() => expect(input("practice").value).toBe("Theirs, from the other tab."));
  });

  it("an import over a damaged record asks, and the record can be exported raw", async () => {
    const db = await openDB(DEFAULT_NOTES_DB);
    const raw = { id: "marsh-lane", origin: "mine", savedAt: "2026-01-01T00:00:00Z", note: { schema: "taut/location@1", id: "marsh-lane", practice: "Hours of work." } };
    await db.put("notes", raw);
    // Counted as any write is, as another tab of the app would.
    await db.put("meta", String(Number((await db.get("meta", "changes")) ?? "0") + 1), "changes");
    db.close();
    await openScreen();
    await waitFor(() => expect(screen.getByText("Damaged records (1)")).toBeTruthy());
    // Export first: the record exactly as stored.
    const created: Blob[] = [];
    const url = vi.spyOn(URL, "createObjectURL").mockImplementation((b) => (created.push(b as Blob), "blob:x"));
    vi.spyOn(URL, "revokeObjectURL").mockImplementation(() => undefined);
    fireEvent.click(screen.getByRole("button", { name: "Export record" }));
    await waitFor(() => expect(created).toHaveLength(1));
    expect(JSON.parse(await created[0]!.text())).toEqual(raw);
    url.mockRestore();
    const note = { ...demo, id: "marsh-lane", name: "Marsh Lane (test)" };
    fireEvent.change(screen.getByLabelText("Notes file to import"), { target: { files: [new File([JSON.stringify(makeNotesBundle([note]))], "marsh.json")] } });
    const dialog = await screen.findByRole("dialog");
    expect(dialog.textContent).toContain("a damaged record of this id that cannot be shown");
    fireEvent.click(within(dialog).getByRole("radio", { name: "Take theirs" }));
    fireEvent.click(within(dialog).getByRole("button", { name: "Import with these choices" }));
    await waitFor(() => expect(screen.getByText(/Imported marsh\.json: 1 damaged record replaced by the file's note/)).toBeTruthy(), { timeout: 10_000 });
    expect(listed()).toContain("Marsh Lane (test)");
  });

  it("an older record that could not be carried over opens in the editor with the field to put right", async () => {
    const db = await openDB(DEFAULT_NOTES_DB);
    await db.put("notes", {
      id: "steep-siding",
      title: "Steep siding (test)",
      profile: { segments: [{ start_m: 0, length_m: 1500, grade_permille: 90, radius_m: 0 }], front_m: 1200, clear_m: 200 },
      hazards: [],
      rail: { autumn: "slimy" },
      practice: "Years of notes.",
      revised: "2024-10-01",
      by: "OLD",
    });
    // Counted as any write is, as another tab of the app would.
    await db.put("meta", String(Number((await db.get("meta", "changes")) ?? "0") + 1), "changes");
    db.close();
    await openScreen();
    // The field message as the app writes every one (a true minus, the unit after the value given).
    await waitFor(() => expect(screen.getByText(/could not be carried over \(segments\[0\]\.gradient_permille: must be from −60 to 60 ‰ \(got 90 ‰\)\)/)).toBeTruthy());
    expect(screen.getByText(/The usual rail in autumn, "slimy", was left out/)).toBeTruthy();
    fireEvent.click(screen.getByRole("button", { name: "Put it right in the editor" }));
    await waitFor(() => expect(input("name").value).toBe("Steep siding (test)"));
    expect(input("practice").value).toBe("Years of notes.");
    // The editor marks the grade; once it is put right the note saves over the old record.
    await waitFor(() => expect(document.querySelector(".notes-editor")!.textContent).toMatch(/Segment 1: a gradient of 90\.0 ‰ is beyond ±60\.0 ‰/));
    expect((screen.getByRole("button", { name: "Save note" }) as HTMLButtonElement).disabled).toBe(true);
    fireEvent.input(input("segments[0].gradient_permille"), { target: { value: "9" } });
    fireEvent.input(input("revision.initials"), { target: { value: "NEW" } });
    const save = screen.getByRole("button", { name: "Save note" }) as HTMLButtonElement;
    await waitFor(() => expect(save.disabled).toBe(false));
    fireEvent.click(save);
    await waitFor(() => expect(screen.getByText('Saved "Steep siding (test)".')).toBeTruthy(), { timeout: 10_000 });
    const store = await openNotesStore();
    const saved = await store.get("steep-siding");
    expect(saved.status === "ok" && saved.saved.note.practice).toBe("Years of notes.");
    store.close();
  });

  it("'Remove record' works for a numeric key", async () => {
    const db = await openDB(DEFAULT_NOTES_DB);
    await db.put("notes", { id: 42, origin: "mine", savedAt: "2026-01-01T00:00:00Z", note: { ...demo } });
    // Counted as any write is, as another tab of the app would.
    await db.put("meta", String(Number((await db.get("meta", "changes")) ?? "0") + 1), "changes");
    db.close();
    await openScreen();
    await waitFor(() => expect(screen.getByText(/The saved note "42" is damaged/)).toBeTruthy());
    for (const b of screen.getAllByRole("button", { name: "Remove record" })) fireEvent.click(b);
    await waitFor(() => expect(screen.queryByText(/The saved note "42"/)).toBeNull());
  });

  it("a note imported with padded text and empty optional fields does not open as changed", async () => {
    await openScreen();
    const padded = { ...demo, id: "padded-note", name: "  Padded place (test)  ", line: "", direction: "", standing: "", hazards: [{ kind: "points" as const, note: "" }] };
    fireEvent.change(screen.getByLabelText("Notes file to import"), { target: { files: [new File([JSON.stringify(makeNotesBundle([padded]))], "padded.json")] } });
    await waitFor(() => expect(screen.getByText(/Imported padded\.json: 1 added/)).toBeTruthy(), { timeout: 10_000 });
    fireEvent.click(screen.getByRole("button", { name: /^\s*Padded place \(test\)/ }));
    await waitFor(() => expect(input("name").value).toBe("  Padded place (test)  "));
    expect((screen.getByRole("button", { name: "Saved" }) as HTMLButtonElement).disabled).toBe(true);
  });
});

describe("a long library", () => {
  const many: NoteRow[] = Array.from({ length: 250 }, (_, k) => ({ id: `n-${k}`, name: `Place ${String(k).padStart(3, "0")}`, illustrative: false, origin: "imported", revised: { date: "2026-01-01", initials: "T" }, flags: 0 }));
  it("shows the first page, more on request, and finds a note by name", () => {
    const noop = () => undefined;
    render(() => (
      <Library
        ready
        failure={null}
        rows={many}
        problems={[]}
        reminder={undefined}
        persisted={undefined}
        notice={null}
        busy={false}
        onDismissNotice={noop}
        onOpen={noop}
        onCard={noop}
        onNew={noop}
        onImport={noop}
        onExportAll={noop}
        onRestoreDemos={noop}
        onRemove={noop}
        onRemoveAll={noop}
        onExportRaw={noop}
        onRescue={noop}
      />
    ));
    expect(listed()).toHaveLength(LIBRARY_PAGE);
    expect(screen.getByText(/250 notes; the first 100 are shown/)).toBeTruthy();
    fireEvent.click(screen.getByRole("button", { name: "Show 100 more" }));
    expect(listed()).toHaveLength(200);
    fireEvent.click(screen.getByRole("button", { name: "Show 50 more" }));
    expect(listed()).toHaveLength(250);
    fireEvent.input(screen.getByRole("searchbox"), { target: { value: "place 24" } });
    expect(listed()).toEqual(Array.from({ length: 10 }, (_, k) => `Place ${240 + k}`));
    expect(screen.getByText("10 of 250 notes match")).toBeTruthy();
  });
});

describe("a record exported raw", () => {
  it("writes whatever it holds, never refusing", () => {
    const odd = { id: 7, when: new Date("2026-01-02T03:04:05Z"), bytes: new Uint8Array(3), n: Number.NaN, big: 12n, self: undefined as unknown };
    (odd as { self: unknown }).self = odd;
    const text = rawRecordText(odd);
    expect(JSON.parse(text)).toEqual({ id: 7, when: "2026-01-02T03:04:05.000Z", bytes: "(binary data, 3 bytes)", n: "NaN", big: "12", self: "(repeated)" });
  });
});

describe("another tab upgrades the database (last: it leaves a newer version behind)", () => {
  it("the screen says so and offers a reload; the edit is kept", async () => {
    await openScreen();
    await edit(demo.name);
    fireEvent.input(input("practice"), { target: { value: "Typed before the upgrade." } });
    const newer = await openDB(DEFAULT_NOTES_DB, 99, { upgrade: () => undefined });
    await waitFor(() => expect(screen.getByText(/upgraded by another tab or window of Taut/)).toBeTruthy());
    expect(screen.getByRole("button", { name: "Reload the page" })).toBeTruthy();
    // Saving now is refused with the same notice, not an error, and the edit stays kept on the device.
    fireEvent.input(input("revision.initials"), { target: { value: "CC" } });
    fireEvent.input(input("revision.change"), { target: { value: "After the upgrade." } });
    fireEvent.click(screen.getByRole("button", { name: "Save note" }));
    await waitFor(() => expect(localStorage.getItem(NOTE_DRAFT_KEY)).toContain("Typed before the upgrade."), { timeout: 3000 });
    expect(screen.queryByText(/Something went wrong/)).toBeNull();
    newer.close();
  });
});
