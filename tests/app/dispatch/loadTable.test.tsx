/**
 * Load table: the twelve figures from the workers as a table and as bars, the cells shared out among the
 * pool's workers, the case built from the note exactly as the notes card builds it, a change of
 * locomotives asking again, units, and a train that does not fit.
 */
import { fireEvent, screen, waitFor } from "@solidjs/testing-library";
import { beforeEach, describe, expect, it } from "vitest";
import { forgetLoadTables, dealCells } from "../../../src/app/screens/LoadTable/createLoadTableRun.js";
import LoadTable from "../../../src/app/screens/LoadTable/index.js";
import { loadChart } from "../../../src/app/screens/LoadTable/loadChart.js";
import type { LoadTableRow } from "../../../src/core/dispatch/loadTable.js";
import type { StartCase } from "../../../src/core/train/types.js";
import { builtinLibrary, builtinLocations, builtinTrains } from "../../../src/profiles/builtin.js";
import { referenceCase } from "../../../src/profiles/referenceTrain.js";
import type { LoadTableCell } from "../../../src/worker/protocol.js";
import { renderWithApp } from "../harness.js";
import { fakePool, ok } from "./fakes.js";

/** Fixed figures: dry best, sand adds a third, greasy without sand nothing; scaled by the units at the head. */
function rowFor(c: StartCase, cell: LoadTableCell): LoadTableRow {
  const t: Record<string, number> = { dry: 1466, damp: 236, wet: 460, frost: 0, leaves: 0, greasy: 0 };
  const units = c.locomotives.reduce((s, g) => s + g.count, 0);
  const base = t[cell.rail]! * units;
  return { rail: cell.rail, sand: cell.sand, maxTrailingMassKg: (cell.sand ? base * 1.3 + (cell.rail === "greasy" ? 40 : 0) : base) * 1000 };
}

const cells = () => [...document.querySelectorAll(".load-table-grid td")] as HTMLElement[];
const cellText = (id: string) => document.querySelector(`td[data-cell="${id}"]`)!.textContent!;

beforeEach(() => forgetLoadTables());

describe("Load table", () => {
  it("fills twelve cells from the workers, shares the cells out among them, and marks where this train starts", async () => {
    const pool = fakePool({ loadTable: (c, asked) => ok(asked.map((cell) => rowFor(c, cell))) }, 2);
    renderWithApp(() => <LoadTable />, { pool });
    await waitFor(() => expect(cells().filter((c) => !c.classList.contains("waiting"))).toHaveLength(12));
    expect(cells()).toHaveLength(12);
    // Two requests (the pool's size), every cell asked for once.
    const asked = pool.calls.filter((c) => c.kind === "loadTable").flatMap((c) => c.opts.cells!.map((x) => `${x.rail}/${x.sand}`));
    expect(pool.calls).toHaveLength(2);
    expect(asked.sort()).toEqual(dealCells(1)[0]!.map((x) => `${x.rail}/${x.sand}`).sort());
    expect(cellText("dry-no-sand")).toContain("1,466 t");
    expect(cellText("frost-no-sand")).toBe("none");
    expect(cellText("greasy-sand")).toContain("40 t");
    // The demo case's note and its train (1,400 t): dry without sand carries it, damp does not.
    expect(cellText("dry-no-sand")).toContain("this train starts");
    expect(cellText("damp-sand")).not.toContain("this train starts");
    expect(screen.getByText(/not even a light train/)).toBeTruthy();
    expect(screen.getAllByText(/Advisory only/).length).toBeGreaterThan(0);
  });

  it("works the table out for the case the notes card uses: the note's profile, the train, the locomotives at the head", async () => {
    const pool = fakePool({ loadTable: (c, asked) => ok(asked.map((cell) => rowFor(c, cell))) }, 1);
    const { harness } = renderWithApp(() => <LoadTable />, { pool });
    await waitFor(() => expect(pool.calls).toHaveLength(1));
    const note = builtinLocations.find((n) => n.id === harness.state.draft.draft.noteId)!;
    const expected = referenceCase(note, builtinTrains, builtinLibrary(), { train: note.referenceTrain?.train ?? builtinTrains[0]!.id, ...(note.referenceTrain ?? {}) } as never);
    expect(expected.ok).toBe(true);
    if (expected.ok) expect(pool.calls[0]!.startCase.location).toEqual(expected.value.location);
    expect(pool.calls[0]!.opts.cells).toHaveLength(12);
  });

  it("asks again when the locomotives change, and stops the table that was running", async () => {
    const pool = fakePool({}, 1);
    renderWithApp(() => <LoadTable />, { pool });
    await waitFor(() => expect(pool.calls).toHaveLength(1));
    fireEvent.click(screen.getByRole("radio", { name: "2" }));
    await waitFor(() => expect(pool.calls).toHaveLength(2));
    expect(pool.calls[0]!.opts.signal?.aborted).toBe(true);
    const second = pool.calls[1]!;
    expect(second.startCase.locomotives.reduce((s, g) => s + g.count, 0)).toBe(2);
    second.opts.onRow?.(rowFor(second.startCase, { rail: "dry", sand: false }));
    await waitFor(() => expect(cellText("dry-no-sand")).toContain("2,932 t"));
    expect(screen.getByText(/1 of 12 figures/)).toBeTruthy();
  });

  it("picks another location from the list and works its table out", async () => {
    const pool = fakePool({ loadTable: (c, asked) => ok(asked.map((cell) => rowFor(c, cell))) }, 1);
    renderWithApp(() => <LoadTable />, { pool });
    await waitFor(() => expect(pool.calls).toHaveLength(1));
    const other = builtinLocations.find((n) => n.name !== document.querySelector('.choice-list [aria-checked="true"] .note-name')!.textContent)!;
    fireEvent.click(screen.getByRole("radio", { name: new RegExp(other.name.replace(/[()]/g, ".")) }));
    await waitFor(() => expect(pool.calls).toHaveLength(2));
    expect(pool.calls[1]!.startCase.location.clearAheadM).toBe(other.clearAhead_m);
  });

  it("shows masses in short tons with US units, in the table and on the bars", async () => {
    const pool = fakePool({ loadTable: (c, asked) => ok(asked.map((cell) => rowFor(c, cell))) });
    const { harness } = renderWithApp(() => <LoadTable />, { pool });
    harness.state.settings.update({ units: "us" });
    // 1,466 t = 1,615.98 short tons: the largest mass that starts is rounded down, as the command line rounds it.
    await waitFor(() => expect(cellText("dry-no-sand")).toContain("1,615 short tons"));
    const rows: LoadTableRow[] = [{ rail: "dry", sand: false, maxTrailingMassKg: 1_466_000 }];
    const spec = loadChart(rows, 1_400_000, "us")!;
    expect(spec.y.title).toBe("Largest trailing mass (short tons)");
    expect(spec.x.labels).toEqual(["Dry", "Damp", "Wet", "Frost", "Leaves", "Greasy"]);
    expect(spec.series.find((s) => s.id === "no-sand")!.points[1]!.y).toBeCloseTo(1_466_000 / 907.18474, 6);
    expect(spec.series.find((s) => s.id === "train")!.points[0]!.y).toBeCloseTo(1_400_000 / 907.18474, 6);
  });
});
