/**
 * Location notes → Import from railML, on the screen (jsdom runs the import worker's handler on the page's
 * thread; the browser test runs the real worker): a railML 2.2 file written by the test (names and their
 * sources: tests/profiles/railml.test.ts) is read, the front is chosen at an operational point, the
 * stretch is shown with its segments, and saved as a note; a hostile file is refused and nothing is saved.
 */
import "fake-indexeddb/auto";
import { fireEvent, screen, waitFor, within } from "@solidjs/testing-library";
import { describe, expect, it } from "vitest";
import LocationNotesScreen from "../../../src/app/screens/LocationNotes/index.js";
import { deviceNotesStore as openNotesStore } from "../../../src/notes/index.js";
import { chain, railmlFile } from "../../tools/railml.js";
import { quickTablePool, renderWithApp } from "../harness.js";

const listed = () => [...document.querySelectorAll(".notes-item-name")].map((e) => e.textContent);

// Two tracks of 1500 m: 3 ‰ rising, then 7 ‰ from pos 500 of the second; a 500 m curve on the first.
const [a, b] = chain([1500, 1500], 20_000);
a!.gradients = [{ pos: 0, dir: "up", value: 3 }];
a!.radii = [
  { pos: 0, dir: "up", value: 0 },
  { pos: 1000, dir: "up", value: 500 },
];
b!.gradients = [
  { pos: 0, dir: "up", value: 3 },
  { pos: 500, dir: "up", value: 7 },
];
b!.radii = [{ pos: 0, dir: "up", value: 0 }];
b!.crossSections = [{ id: "cs", pos: 300, ocpRef: "o1" }];
const LINE = railmlFile({ tracks: [a!, b!], ocps: [{ id: "o1", name: "Ferrow Sidings exit (invented)" }] });

async function openImport(): Promise<void> {
  renderWithApp(() => <LocationNotesScreen />, { pool: quickTablePool() });
  await waitFor(() => expect(listed().length).toBeGreaterThan(0), { timeout: 10_000 });
  fireEvent.click(screen.getByRole("button", { name: "Import from railML" }));
}

const pick = (name: string, text: string) => fireEvent.change(screen.getByLabelText("railML file to import"), { target: { files: [new File([text], name, { type: "application/xml" })] } });

describe("Import from railML", () => {
  it("reads the file, shows the stretch at an operational point, and saves it as a note", async () => {
    await openImport();
    pick("line.xml", LINE);
    await screen.findByText(/line\.xml: railML 2\.2, 2 track\(s\), 3 gradient and 3 radius changes/, {}, { timeout: 10_000 });
    // The operational point is offered and chosen; 1000 m behind, 600 m ahead.
    fireEvent.input(document.querySelector('[data-field="railml.behind"] input')!, { target: { value: "1000" } });
    fireEvent.input(document.querySelector('[data-field="railml.ahead"] input')!, { target: { value: "600" } });
    const table = await screen.findByRole("table", { name: "Segments, from the rear end of the stretch" }, { timeout: 10_000 });
    // Front at pos 300 of the second track: behind back to pos 800 of the first (500 m curve from pos 1000
    // to its end), ahead to pos 900 of the second (7 ‰ from pos 500).
    await waitFor(() =>
      expect(within(table).getAllByRole("row").slice(1).map((r) => r.textContent)).toEqual([
        "0 m200 m3.0 ‰straight",
        "200 m500 m3.0 ‰500 m",
        "700 m500 m3.0 ‰straight",
        "1,200 m400 m7.0 ‰straight",
      ]),
    );
    expect(document.querySelector(".notes-railml-preview svg")).not.toBeNull();
    fireEvent.click(screen.getByRole("button", { name: "Save as a new note" }));
    await screen.findByText('Saved "Ferrow Sidings exit (invented)" from railML.', {}, { timeout: 10_000 });
    const store = await openNotesStore();
    const saved = (await store.list()).notes.find((n) => n.note.name === "Ferrow Sidings exit (invented)");
    expect(saved?.note.segments).toEqual([
      { from_m: 0, length_m: 200, gradient_permille: 3, curveRadius_m: 0 },
      { from_m: 200, length_m: 500, gradient_permille: 3, curveRadius_m: 500 },
      { from_m: 700, length_m: 500, gradient_permille: 3, curveRadius_m: 0 },
      { from_m: 1200, length_m: 400, gradient_permille: 7, curveRadius_m: 0 },
    ]);
    expect(saved?.note.frontAt_m).toBe(1000);
    expect(saved?.note.clearAhead_m).toBe(600);
  }, 60_000);

  it("opens the stretch in the editor before saving, with its segments, front, hazards and a revision entry", async () => {
    await openImport();
    pick("line.xml", LINE);
    await screen.findByRole("table", { name: "Segments, from the rear end of the stretch" }, { timeout: 10_000 });
    fireEvent.click(await screen.findByRole("button", { name: "Open in the editor first" }));
    const field = (name: string) => document.querySelector(`[data-field="${name}"] input, [data-field="${name}"] textarea`) as HTMLInputElement;
    await waitFor(() => expect(field("name").value).toBe("Ferrow Sidings exit (invented)"));
    // The default stretch: 1500 m behind the front (pos 300 of the second track back to pos 300 of the first), 1000 m ahead.
    expect(document.querySelectorAll(".notes-seg tbody tr")).toHaveLength(4);
    expect(field("frontAt_m").value).toBe("1500");
    expect(field("clearAhead_m").value).toBe("1000");
    expect(field("revision.change").value).toBe("Imported from railML (line.xml).");
  }, 30_000);

  it("refuses a file with entity declarations, says why, and saves nothing", async () => {
    await openImport();
    const before = (await (await openNotesStore()).list()).notes.length;
    const lol = LINE.replace('<?xml version="1.0" encoding="UTF-8"?>\n', '<?xml version="1.0" encoding="UTF-8"?>\n<!DOCTYPE railml [<!ENTITY a "aaaaaaaaaa"><!ENTITY b "&a;&a;&a;&a;&a;&a;&a;&a;">]>\n');
    pick("lol.xml", lol);
    const alert = await screen.findByRole("alert", {}, { timeout: 10_000 });
    expect(alert.textContent).toContain("lol.xml: The file's document type declares XML entities");
    expect(alert.textContent).toContain("Nothing was saved.");
    expect((await (await openNotesStore()).list()).notes.length).toBe(before);
  }, 30_000);
});
