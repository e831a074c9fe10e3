/**
 * A Start plan draft in local storage that the screen cannot use (another version's, or damaged) must not
 * blank the app at every launch, where the only way out, clearing the site's data, would delete the
 * notes too: it is set aside (kept for export) and the app opens on the demo case with a notice. And a
 * screen that fails to draw for any other reason offers a way out instead of a blank page.
 */
import { fireEvent, screen, waitFor } from "@solidjs/testing-library";
import { describe, expect, it } from "vitest";
import { storedDraft } from "../../src/app/state/caseDraft.js";
import { demoCaseFile, DRAFT_KEY, SET_ASIDE_KEY } from "../../src/app/state/createCaseDraft.js";
import { draftFromFile } from "../../src/app/state/caseDraft.js";
import { SCREENS } from "../../src/app/screens/registry.js";
import { memoryStorage, renderWithApp } from "./harness.js";

const good = () => JSON.parse(JSON.stringify(draftFromFile(demoCaseFile()))) as Record<string, unknown> & { train: Record<string, unknown>; locomotives: Array<Record<string, unknown>> };

describe("a stored Start plan draft is checked field by field", () => {
  it("accepts the demo's draft and an empty number field (stored as null), refuses unknown words and wrong kinds", () => {
    expect(storedDraft(good()).ok).toBe(true);
    const blank = good();
    blank.train.trailingMass_t = null;
    const r = storedDraft(blank);
    expect(r.ok && Number.isNaN(r.draft.train.trailingMass_t)).toBe(true);
    const cases: Array<[(d: ReturnType<typeof good>) => void, string]> = [
      [(d) => (d.train.coupling = "chain"), 'train.coupling: "chain" is not allowed here'],
      [(d) => (d.conditions = { rail: "icy", sand: false, temperature_C: 5 }), 'conditions.rail: "icy" is not allowed here'],
      [(d) => (d.locomotives[0]!.position = "middle"), 'locomotives[0].position: "middle" is not allowed here'],
      [(d) => (d.locomotives = []), "locomotives: none listed"],
      [(d) => delete d.target, "target: not an object"],
      [(d) => (d.train.wagons = "40"), 'train.wagons: "40" is not allowed here'],
    ];
    for (const [spoil, reason] of cases) {
      const d = good();
      spoil(d);
      expect(storedDraft(d)).toEqual({ ok: false, reason });
    }
  });
});

describe("the app at launch with a draft it cannot use", () => {
  it("opens on the demo case with a notice; the draft is set aside, not lost", async () => {
    const spoiled = good();
    spoiled.train.coupling = "chain";
    const text = JSON.stringify(spoiled);
    const storage = memoryStorage({ [DRAFT_KEY]: text });
    const { harness } = renderWithApp(undefined, { storage });
    await waitFor(() => expect(document.querySelector("[data-verdict]")).not.toBeNull(), { timeout: 10_000 });
    expect(harness.state.draft.draft.train.coupling).toBe(draftFromFile(demoCaseFile()).train.coupling);
    expect(screen.getByRole("alert").textContent).toContain('Your last Start plan inputs could not be read (train.coupling: "chain" is not allowed here), so the demo case is open.');
    expect(storage.getItem(SET_ASIDE_KEY)).toBe(text);
    fireEvent.click(screen.getByRole("button", { name: "OK" }));
    expect(screen.queryByText(/could not be read/)).toBeNull();
  });

  it("a stored draft that is not JSON at all is set aside the same way", async () => {
    const storage = memoryStorage({ [DRAFT_KEY]: '{"locomotives": [' });
    renderWithApp(undefined, { storage });
    await waitFor(() => expect(screen.getByText(/the stored text is not complete JSON/)).toBeTruthy());
    expect(storage.getItem(SET_ASIDE_KEY)).toBe('{"locomotives": [');
  });

  it("a screen that throws while drawing shows a way out, and the other screens still work", async () => {
    const Broken = () => {
      throw new Error("Cannot read properties of undefined (reading 'couplerLimit_kN')");
    };
    const screens = [{ id: "start-plan", title: "Start plan", icon: "plan" as const, component: Broken }, ...SCREENS.filter((s) => s.id === "settings")];
    renderWithApp(undefined, { screens });
    await waitFor(() => expect(screen.getByText(/This screen could not be drawn/)).toBeTruthy());
    expect(screen.getByText(/reading 'couplerLimit_kN'/)).toBeTruthy();
    expect(screen.getByRole("button", { name: "Set the inputs aside and reload" })).toBeTruthy();
    fireEvent.click(screen.getByRole("link", { name: "Settings" }));
    await waitFor(() => expect(screen.queryByText(/This screen could not be drawn/)).toBeNull());
  });
});
