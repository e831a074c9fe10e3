/** The notes editor's checks as a route trainer meets them: the message at the segment, in the user's units, and the fixes. */
import { fireEvent, render, screen, waitFor } from "@solidjs/testing-library";
import { createSignal } from "solid-js";
import { describe, expect, it } from "vitest";
import { PALETTES } from "../../../src/app/charts/palette.js";
import type { UnitSystem } from "../../../src/app/format.js";
import { createNoteEditor, type NoteEditor } from "../../../src/app/screens/LocationNotes/createNoteEditor.js";
import { Editor } from "../../../src/app/screens/LocationNotes/Editor.js";
import type { LoadTableOutcome } from "../../../src/app/screens/LocationNotes/loadTableRunner.js";
import { loadTable, staticCheck } from "../../../src/core/index.js";
import { referenceCase, referenceSummary } from "../../../src/profiles/referenceTrain.js";
import { builtinLibrary, builtinLocations, builtinTrains } from "../../../src/profiles/builtin.js";
import type { LocationNoteFile } from "../../../src/profiles/schemas.js";

const lib = builtinLibrary();
const note: LocationNoteFile = builtinLocations.find((n) => n.id === "ashvale-loop-up")!;

/** A fast load table for component tests: the static check as the verdict (the real one runs in a worker). */
async function quickTable(g: Parameters<typeof referenceCase>[0], ref: Parameters<typeof referenceCase>[3]): Promise<LoadTableOutcome> {
  const c = referenceCase(g, builtinTrains, lib, ref);
  if (!c.ok) return { ok: false, issues: c.issues };
  return { ok: true, rows: loadTable(c.value, (x) => staticCheck(x).verdict === "starts"), elapsedMs: 0 };
}

function setup(units: UnitSystem = "metric", start: LocationNoteFile | null = note) {
  const [u, setUnits] = createSignal<UnitSystem>(units);
  let editor!: NoteEditor;
  const calls = { saved: 0 };
  render(() => {
    editor = createNoteEditor({ units: u, presets: builtinTrains, library: () => lib, initials: () => "QA", loadTableDelayMs: 0, computeLoadTable: (g, ref) => quickTable(g, ref) });
    editor.load(start ?? undefined);
    return (
      <Editor
        editor={editor}
        units={u()}
        palette={PALETTES.day}
        presets={builtinTrains}
        library={lib}
        busy={false}
        onSave={() => calls.saved++}
        onClose={() => undefined}
        onDelete={() => undefined}
        onCard={() => undefined}
        onExport={() => undefined}
      />
    );
  });
  return { editor, setUnits, calls };
}

const field = (name: string) => document.querySelector(`[data-field="${name}"] input`) as HTMLInputElement;
const type = (name: string, value: string) => fireEvent.input(field(name), { target: { value } });
const problems = () => [...document.querySelectorAll(".notes-issues li, .notes-issue-box li, .notes-issue-box")].map((e) => e.textContent ?? "");
const saveButton = () => screen.getByRole("button", { name: /^Save note$|^Saved$/ }) as HTMLButtonElement;

describe("Location notes editor: validation messages", () => {
  it("a saved note opens clean: no problems, nothing to save", async () => {
    const { editor } = setup();
    expect(editor.errors()).toEqual([]);
    expect(saveButton().textContent).toBe("Saved");
    expect(saveButton().disabled).toBe(true);
    await waitFor(() => expect(document.querySelector(".notes-loadtable")).not.toBeNull());
  });

  it("a gradient beyond ±60 ‰ is named at its segment, and blocks saving", () => {
    setup();
    type("segments[1].gradient_permille", "75");
    expect(problems().some((p) => p === "Segment 2: a gradient of 75.0 ‰ is beyond ±60.0 ‰, steeper than adhesion railways are built. Check the figure and its sign.")).toBe(true);
    expect(field("segments[1].gradient_permille").closest("td")!.classList.contains("invalid")).toBe(true);
    expect(saveButton().disabled).toBe(true);
    type("segments[1].gradient_permille", "-60");
    expect(problems().some((p) => p.startsWith("Segment 2: a gradient"))).toBe(false);
  });

  it("a radius below 80 m says to enter 0 for straight track; 0 itself is fine", () => {
    setup();
    type("segments[0].curveRadius_m", "50");
    expect(problems()).toContain("Segment 1: a radius of 50 m is below 80 m. Enter 0 for straight track.");
    type("segments[0].curveRadius_m", "0");
    expect(problems().some((p) => p.includes("radius of"))).toBe(false);
  });

  it("a gap and an overlap between segments are measured, and Join segments lays them end to end", () => {
    const { editor } = setup();
    type("segments[2].from_m", "1050");
    expect(problems()).toContain('Gap of 50 m between segment 2 (ends at 1,000 m) and segment 3 (starts at 1,050 m). Use "Join segments" or correct the start.');
    type("segments[2].from_m", "950");
    expect(problems()).toContain('Segment 3 overlaps segment 2 by 50 m (segment 2 ends at 1,000 m, segment 3 starts at 950 m). Use "Join segments" or correct the start.');
    fireEvent.click(screen.getByRole("button", { name: "Join segments" }));
    expect(editor.draft.segments.map((s) => s.from_m)).toEqual([0, 600, 1000, 1500]);
    expect(problems().some((p) => /Gap|overlaps/.test(p))).toBe(false);
    expect(screen.queryByRole("button", { name: "Join segments" })).toBeNull();
  });

  it("the reference train not fitting on the profile says by how much, and the train is not drawn", () => {
    const { editor } = setup();
    const length = referenceSummary(editor.draft.referenceTrain, builtinTrains, lib).lengthM;
    type("frontAt_m", "200");
    const expected = `The reference train (${Math.round(length)} m with its locomotives) does not fit: its rear would stand at −${Math.round(length - 200)} m, ${Math.round(length - 200)} m before the profile begins at 0 m. Add the track behind the train, or move the front forward.`;
    expect(problems()).toContain(expected);
    expect(editor.model()?.train).toBeUndefined();
    expect(editor.placed()).toBeUndefined();
  });

  it("the same rules read in US units", async () => {
    const { setUnits } = setup("us");
    type("segments[0].curveRadius_m", "150"); // 150 ft = 45.72 m
    expect(problems()).toContain("Segment 1: a radius of 150 ft is below 262 ft. Enter 0 for straight track.");
    setUnits("metric");
    await waitFor(() => expect(problems()).toContain("Segment 1: a radius of 46 m is below 80 m. Enter 0 for straight track."));
  });

  it("an edit needs a revision entry saying what changed, with initials", () => {
    const { calls } = setup();
    type("clearAhead_m", "550");
    expect(problems()).toContain("Say in a few words what changed in this revision.");
    expect(saveButton().disabled).toBe(true);
    fireEvent.input(document.querySelector('[data-field="revision.initials"] input')!, { target: { value: "" } });
    expect(problems()).toContain("Add your initials to the revision entry.");
    fireEvent.input(document.querySelector('[data-field="revision.initials"] input')!, { target: { value: "QA" } });
    fireEvent.input(document.querySelector('[data-field="revision.change"] input')!, { target: { value: "Clear distance re-measured." } });
    expect(problems()).toEqual([]);
    expect(saveButton().disabled).toBe(false);
    fireEvent.click(saveButton());
    expect(calls.saved).toBe(1);
  });

  it("a new note asks for a name and builds a valid note with a revision entry", () => {
    const { editor } = setup("metric", null);
    expect(problems()).toContain("Give the place a name: it heads the card and the location pickers.");
    type("name", "Fernholt up goods loop (test)");
    expect(editor.errors()).toEqual([]);
    const built = editor.toNote(new Set(["fernholt-up-goods-loop-test"]));
    expect(built.id).toBe("fernholt-up-goods-loop-test-2");
    expect(built.revisions).toEqual([{ date: editor.draft.revision.date, initials: "QA", change: "New note." }]);
  });
});

describe("Location notes editor: what the profile implies", () => {
  it("stands the train on the profile with the slack the grade sets, and shows the load table", async () => {
    const { editor } = setup();
    const t = editor.model()?.train;
    expect(t).toBeDefined();
    expect(t!.frontM).toBe(note.frontAt_m);
    // A rising grade under the whole train: every coupling hangs back, stretched.
    expect(t!.runs.map((r) => r.state)).toEqual(["stretched"]);
    expect(screen.getByText(/Stretched from end to end/)).toBeTruthy();
    await waitFor(() => expect(document.querySelectorAll(".notes-loadtable tbody tr")).toHaveLength(6));
  });

  it("a sag bunches the slack around the low point", () => {
    const dip = builtinLocations.find((n) => n.id === "lantern-dip")!;
    const { editor } = setup("metric", dip);
    const runs = editor.model()!.train!.runs;
    expect(runs.some((r) => r.state === "bunched")).toBe(true);
  });
});
