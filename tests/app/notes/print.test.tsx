/**
 * A printed location card is complete or says it is not: Print waits (disabled, saying why) while the
 * load table is worked out, the card carries an "incomplete" line meanwhile, a print started another way
 * (`beforeprint`) is reported on screen, and the card's foot says what it was computed from. The other
 * screens that compute after they open print a stamp with the same kind of "incomplete" line.
 */
import "fake-indexeddb/auto";
import { fireEvent, screen, waitFor } from "@solidjs/testing-library";
import { describe, expect, it } from "vitest";
import { PrintStamp } from "../../../src/app/components/PrintStamp.js";
import { INCOMPLETE_LINE } from "../../../src/app/screens/LocationNotes/Card.js";
import LocationNotesScreen from "../../../src/app/screens/LocationNotes/index.js";
import LoadTable from "../../../src/app/screens/LoadTable/index.js";
import { builtinLocations } from "../../../src/profiles/builtin.js";
import { fakePool } from "../dispatch/fakes.js";
import { quickTablePool, renderWithApp } from "../harness.js";

const printButton = () => screen.getByRole("button", { name: "Print / save as PDF" }) as HTMLButtonElement;
const printCopy = () => document.querySelector(".notes-print-root .notes-card") as HTMLElement;

describe("printing a location card", () => {
  it("waits for the load table: Print disabled saying why, the card marked incomplete until then", async () => {
    const pool = fakePool({});
    renderWithApp(() => <LocationNotesScreen />, { pool });
    const note = builtinLocations[0]!;
    fireEvent.click(await screen.findByRole("button", { name: `Card of ${note.name}` }, { timeout: 10_000 }));

    // Before the table is asked for, and while it is worked out: disabled, with the reason beside it.
    expect(printButton().disabled).toBe(true);
    const why = document.getElementById(printButton().getAttribute("aria-describedby")!)!;
    expect(why.textContent).toContain("Printing waits for the load table");
    expect(printCopy().textContent).toContain(INCOMPLETE_LINE());
    expect(printCopy().querySelector(".notes-loadtable")).toBeNull();

    // The browser's own print command, early: the screen says the copy is marked incomplete.
    window.dispatchEvent(new Event("beforeprint"));
    await waitFor(() => expect(why.textContent).toContain("The copy just printed is marked incomplete"));

    await waitFor(() => expect(pool.calls.filter((c) => c.kind === "loadTable")).toHaveLength(1), { timeout: 5_000 });
    const call = pool.calls.find((c) => c.kind === "loadTable")!;
    call.release(await quickTablePool().loadTable(call.startCase));

    await waitFor(() => expect(printButton().disabled).toBe(false));
    expect(printButton().getAttribute("aria-describedby")).toBeNull();
    expect(printCopy().textContent).not.toContain(INCOMPLETE_LINE());
    expect(printCopy().querySelectorAll(".notes-loadtable tbody td")).toHaveLength(12);
  }, 30_000);

  it("carries the note's revision, the time printed, the version and the fingerprint of its inputs", async () => {
    renderWithApp(() => <LocationNotesScreen />, { pool: quickTablePool() });
    const note = builtinLocations[1]!;
    fireEvent.click(await screen.findByRole("button", { name: `Card of ${note.name}` }, { timeout: 10_000 }));
    await waitFor(() => expect(printButton().disabled).toBe(false), { timeout: 10_000 });
    const foot = printCopy().querySelector(".card-foot")!.textContent!.replace(/\s+/g, " ");
    const latest = [...note.revisions].sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : 0)).at(-1)!;
    expect(foot).toContain(`revision ${note.revisions.length} of ${latest.date}`);
    expect(foot).toMatch(/printed \d{4}-\d{2}-\d{2} \d{2}:\d{2}/);
    // No build here, so no version from package.json: the card says so rather than inventing one.
    expect(foot).toContain("Taut dev");
    expect(foot).toMatch(/fingerprint [0-9a-f]{4}-[0-9a-f]{4}/);
    expect(foot).toContain("rail-condition defaults, adhesion at standstill without / with sand: dry 0.33 / 0.36");
  }, 30_000);
});

describe("printing another screen", () => {
  it("stamps the Load table incomplete while it is worked out, and with its inputs' fingerprint", async () => {
    const pool = fakePool({});
    renderWithApp(
      () => (
        <>
          <PrintStamp screen="Load table" />
          <LoadTable />
        </>
      ),
      { pool },
    );
    const stamp = () => document.querySelector(".print-stamp")!.textContent!;
    await waitFor(() => expect(pool.calls.some((c) => c.kind === "loadTable")).toBe(true), { timeout: 5_000 });
    expect(stamp()).toContain("Incomplete — wait for the load table.");
    expect(stamp()).toMatch(/Taut dev · Load table · printed \d{4}-\d{2}-\d{2} \d{2}:\d{2} · inputs fingerprint [0-9a-f]{4}-[0-9a-f]{4}/);
    const quick = quickTablePool();
    for (const c of pool.calls.filter((x) => x.kind === "loadTable")) c.release(await quick.loadTable(c.startCase, c.opts.cells ? { cells: c.opts.cells } : {}));
    await waitFor(() => expect(stamp()).not.toContain("Incomplete"));
  }, 30_000);
});
