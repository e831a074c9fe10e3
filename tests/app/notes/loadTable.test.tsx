/**
 * The note's load table on the app's planner workers (no worker of its own): the request carries the
 * note's reference case, progress shows while it runs, each edit cancels the running table, and a table
 * already worked out comes from the cache.
 */
import "fake-indexeddb/auto";
import { fireEvent, screen, waitFor } from "@solidjs/testing-library";
import { describe, expect, it } from "vitest";
import LocationNotesScreen from "../../../src/app/screens/LocationNotes/index.js";
import { builtinLibrary, builtinLocations, builtinTrains } from "../../../src/profiles/builtin.js";
import { referenceCase } from "../../../src/profiles/referenceTrain.js";
import { fakePool, ok } from "../dispatch/fakes.js";
import { quickTablePool, renderWithApp } from "../harness.js";

const input = (name: string) => document.querySelector(`[data-field="${name}"] input`) as HTMLInputElement;

describe("the note's load table", () => {
  it("is one loadTable request for the note's reference case, shown in twelve cells, and cached", async () => {
    const quick = quickTablePool();
    const asked: string[] = [];
    const pool = { ...quick, loadTable: ((c, o) => (asked.push(JSON.stringify(c.location)), quick.loadTable(c, o))) as typeof quick.loadTable };
    const note = builtinLocations[1]!;
    const first = renderWithApp(() => <LocationNotesScreen />, { pool });
    fireEvent.click(await screen.findByRole("button", { name: `Card of ${note.name}` }, { timeout: 10_000 }));
    await waitFor(() => expect(document.querySelectorAll(".notes-card-preview .notes-loadtable tbody td")).toHaveLength(12), { timeout: 10_000 });
    const expected = referenceCase(note, builtinTrains, builtinLibrary());
    expect(expected.ok).toBe(true);
    expect(asked).toEqual([JSON.stringify(expected.ok ? expected.value.location : null)]);
    first.unmount();
    // Opened again: the table is on screen without asking the workers.
    renderWithApp(() => <LocationNotesScreen />, { pool });
    fireEvent.click(await screen.findByRole("button", { name: `Card of ${note.name}` }, { timeout: 10_000 }));
    await waitFor(() => expect(document.querySelectorAll(".notes-card-preview .notes-loadtable tbody td")).toHaveLength(12));
    expect(asked).toHaveLength(1);
  });

  it("shows progress while it is worked out, and cancels it on each edit", async () => {
    const pool = fakePool({});
    renderWithApp(() => <LocationNotesScreen />, { pool });
    const note = builtinLocations[2]!;
    await screen.findByRole("button", { name: `Card of ${note.name}` }, { timeout: 10_000 });
    const open = [...document.querySelectorAll<HTMLButtonElement>(".notes-item-open")].find((b) => b.querySelector(".notes-item-name")!.textContent === note.name)!;
    fireEvent.click(open);
    await waitFor(() => expect(pool.calls).toHaveLength(1), { timeout: 5_000 });
    expect(screen.getByRole("progressbar", { name: "Load table" })).toBeTruthy();
    pool.calls[0]!.opts.onProgress?.(0.5);
    await waitFor(() => expect(screen.getByRole("progressbar", { name: "Load table" }).getAttribute("aria-valuenow")).toBe("50"));
    fireEvent.input(input("clearAhead_m"), { target: { value: String(note.clearAhead_m + 50) } });
    await waitFor(() => expect(pool.calls).toHaveLength(2), { timeout: 5_000 });
    expect(pool.calls[0]!.opts.signal?.aborted).toBe(true);
    expect(pool.calls[1]!.startCase.location.clearAheadM).toBe(note.clearAhead_m + 50);
  });
});
