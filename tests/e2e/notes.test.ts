/**
 * Location notes in the built app in Debian's Chromium: create a note and find it again after a reload;
 * export the library, clear it, import the file and get the same notes back; print the card to PDF and
 * find the note's name and its load table in the PDF's text (pdfjs-dist, legacy build for Node), or, when
 * printed before the load table is worked out, the "incomplete" line; the card's fingerprint changes with
 * its profile; one page
 * on A4 and on Letter; axe-core finds no serious or critical violations; screenshots at 1280×800 and
 * 800×1280 saved as test artefacts; no console errors.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { axeSeriousOrCritical, LANDSCAPE, launch, PORTRAIT, SHOTS } from "./browser.js";
import { readNotesText, type NotesBundleFile } from "../../src/profiles/notes.js";

const NAME = "Thornbury up loop, exit signal (e2e)";

let context: BrowserContext;
let page: Page;
let work: string;
let problems: string[] = [];
const base = inject("baseURL");

const shot = (name: string) => page.screenshot({ path: join(SHOTS, `${name}.png`) });
const names = () => page.locator(".notes-item-name").allTextContents();

/** Load the app afresh on the Location notes screen (its library view). */
async function openNotes(): Promise<void> {
  await page.goto("about:blank");
  await page.goto(`${base}#/location-notes`);
  await page.locator(".notes-item-name").first().waitFor({ timeout: 30_000 });
}

async function field(name: string): Promise<ReturnType<Page["locator"]>> {
  return page.locator(`[data-field="${name}"] input, [data-field="${name}"] textarea`).first();
}

/** Export the whole library through the button and read the downloaded file. */
async function exportAll(): Promise<{ text: string; bundle: NotesBundleFile }> {
  const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: "Export all notes", exact: true }).click()]);
  const path = join(work, `export-${Date.now()}.json`);
  await download.saveAs(path);
  const text = readFileSync(path, "utf8");
  const read = readNotesText(text);
  if (!read.ok) throw new Error(`exported file does not read back: ${read.message}`);
  return { text, bundle: JSON.parse(text) as NotesBundleFile };
}

/** All text of a PDF, page by page (pdfjs-dist legacy build runs in Node). */
async function pdfText(data: Uint8Array): Promise<string[]> {
  // pdfjs-dist expects Promise.withResolvers, which Node 20 lacks.
  const P = Promise as unknown as { withResolvers?: () => unknown };
  P.withResolvers ??= () => {
    let resolve!: (v: unknown) => void;
    let reject!: (e: unknown) => void;
    const promise = new Promise((a, b) => {
      resolve = a;
      reject = b;
    });
    return { promise, resolve, reject };
  };
  const pdfjs = await import("pdfjs-dist/legacy/build/pdf.mjs");
  const task = pdfjs.getDocument({ data, useSystemFonts: false });
  const doc = await task.promise;
  const pages: string[] = [];
  for (let k = 1; k <= doc.numPages; k++) {
    const p = await doc.getPage(k);
    const tc = await p.getTextContent();
    pages.push(tc.items.map((i) => ("str" in i ? i.str : "")).join(" ").replace(/\s+/g, " "));
  }
  await task.destroy();
  return pages;
}

beforeAll(async () => {
  work = mkdtempSync(join(tmpdir(), "taut-notes-e2e-"));
  ({ context, page, problems } = await launch(inject("chromiumPath"), join(work, "profile"), { acceptDownloads: true }));
});

afterAll(async () => {
  await context?.close();
  if (work) rmSync(work, { recursive: true, force: true });
});

describe("Location notes in the browser", () => {
  it("shows the demo notes, and creates a note that is still there after a reload", async () => {
    await openNotes();
    expect(await names()).toEqual(expect.arrayContaining([expect.stringContaining("(illustrative)")]));
    await shot("notes-library-landscape");
    expect(await axeSeriousOrCritical(page, "library")).toEqual([]);

    await page.getByRole("button", { name: "New note" }).click();
    await (await field("name")).fill(NAME);
    await (await field("line")).fill("Test line");
    await (await field("direction")).fill("Up");
    // A rising first segment with the steppers (+0.5 ‰ a press), and a second segment added.
    for (let k = 0; k < 12; k++) await page.getByRole("button", { name: "Segment 1 gradient: more" }).click();
    await page.getByRole("button", { name: "Add segment" }).click();
    await (await field("segments[1].curveRadius_m")).fill("450");
    await (await field("frontAt_m")).fill("1100");
    await (await field("clearAhead_m")).fill("300");
    await (await field("revision.initials")).fill("EE");
    await (await field("revision.change")).fill("First survey of the loop.");
    expect(await page.locator(".notes-seg tbody tr").count()).toBe(2);
    expect(await (await field("segments[0].gradient_permille")).inputValue()).toBe("6.0");
    // The train stands on the profile, stretched on the rising grade.
    await expect.poll(() => page.locator(".notes-chart .chart-caption").textContent()).toContain("Stretched from end to end");
    await page.locator(".notes-editor .notes-loadtable").waitFor({ timeout: 120_000 });
    await shot("notes-editor-landscape");
    expect(await axeSeriousOrCritical(page, "editor")).toEqual([]);
    await page.getByRole("button", { name: "Save note" }).click();
    await page.getByText(`Saved "${NAME}".`).waitFor();

    await page.reload();
    await openNotes();
    expect(await names()).toContain(NAME);
  }, 180_000);

  it("exports, clears, imports, and gets the same notes back", async () => {
    await openNotes();
    const before = await exportAll();
    expect(before.bundle.schema).toBe("taut/notes-bundle@2");
    const mine = before.bundle.notes.find((n) => n.name === NAME);
    expect(mine?.segments).toEqual([
      { from_m: 0, length_m: 1000, gradient_permille: 6, curveRadius_m: 0 },
      { from_m: 1000, length_m: 500, gradient_permille: 6, curveRadius_m: 450 },
    ]);
    expect(mine?.revisions).toEqual([{ date: expect.stringMatching(/^\d{4}-\d{2}-\d{2}$/), initials: "EE", change: "First survey of the loop." }]);

    await page.getByRole("button", { name: "Remove all notes…" }).click();
    await page.getByRole("button", { name: "Remove all", exact: true }).click();
    await page.getByText("No notes yet.", { exact: false }).waitFor();
    expect(await names()).toEqual([]);

    const file = join(work, "to-import.json");
    writeFileSync(file, before.text);
    await page.getByLabel("Notes file to import").setInputFiles(file);
    await page.getByText(`Imported to-import.json: ${before.bundle.notes.length} added.`).waitFor();
    expect((await names()).sort()).toEqual(before.bundle.notes.map((n) => n.name).sort());

    const after = await exportAll();
    expect(after.bundle.notes).toEqual(before.bundle.notes);
  }, 120_000);

  it("holds Print until the load table is worked out; a print forced early says it is incomplete", async () => {
    // Hold the planner's load-table requests in the page until the test lets them go, so the card is
    // certainly incomplete when it is printed early (no race with the workers).
    await page.addInitScript(() => {
      const w = window as unknown as { __holdTables: (on: boolean) => void };
      const post = Worker.prototype.postMessage;
      const held: Array<[Worker, unknown, unknown[]]> = [];
      let hold = false;
      Worker.prototype.postMessage = function (this: Worker, msg: unknown, ...rest: unknown[]) {
        if (hold && (msg as { type?: unknown } | null)?.type === "loadTable") return void held.push([this, msg, rest]);
        return (post as (...a: unknown[]) => void).call(this, msg, ...rest);
      } as Worker["postMessage"];
      w.__holdTables = (on) => {
        hold = on;
        if (!on) for (const [wk, m, r] of held.splice(0)) (post as (...a: unknown[]) => void).call(wk, m, ...r);
      };
    });
    await openNotes();
    await page.evaluate(() => (window as unknown as { __holdTables: (on: boolean) => void }).__holdTables(true));
    await page.getByRole("button", { name: `Card of ${NAME}` }).click();
    const print = page.getByRole("button", { name: "Print / save as PDF" });
    expect(await print.isDisabled()).toBe(true);
    expect(await page.locator("#notes-print-wait").textContent()).toContain("Printing waits for the load table");

    const early = (await pdfText(new Uint8Array(await page.pdf({ format: "A4" }))))[0]!;
    expect(early).toContain(NAME);
    expect(early).toContain("Incomplete — wait for the load table.");
    expect(early).not.toContain("Largest trailing mass that starts");
    // The browser's own print command, early: the page says the copy is marked incomplete.
    await page.evaluate(() => window.dispatchEvent(new Event("beforeprint")));
    await expect.poll(() => page.locator("#notes-print-wait").textContent()).toContain("The copy just printed is marked incomplete");
    await page.evaluate(() => (window as unknown as { __holdTables: (on: boolean) => void }).__holdTables(false));
    await page.locator(".notes-card-preview .notes-loadtable").waitFor({ timeout: 120_000 });
    expect(await print.isDisabled()).toBe(false);
  }, 180_000);

  it("prints the card to one PDF page with the note's name, load table and what it was computed from", async () => {
    await openNotes();
    // What the printed card is computed from includes the program version, from package.json.
    const version = (JSON.parse(readFileSync(new URL("../../package.json", import.meta.url), "utf8")) as { version: string }).version;
    // Print is clicked the instant the card opens: the click waits while the button is disabled, so
    // the print starts only once the load table is on the card.
    await page.evaluate(() => {
      const w = window as unknown as { __printed: Array<{ table: boolean; incomplete: boolean }> };
      w.__printed = [];
      window.print = () =>
        void w.__printed.push({
          table: document.querySelector(".notes-print-root .notes-loadtable") !== null,
          incomplete: (document.querySelector(".notes-print-root")?.textContent ?? "").includes("Incomplete"),
        });
    });
    await page.getByRole("button", { name: `Card of ${NAME}` }).click();
    await page.getByRole("button", { name: "Print / save as PDF" }).click({ timeout: 120_000 });
    expect(await page.evaluate(() => (window as unknown as { __printed: unknown[] }).__printed)).toEqual([{ table: true, incomplete: false }]);
    const preview = page.locator(".notes-card-preview");
    await shot("notes-card-landscape");

    const dryRow = preview.locator(".notes-loadtable tbody tr").first();
    const [dryWithout, dryWith] = await dryRow.locator("td").allTextContents();
    const a4 = await pdfText(new Uint8Array(await page.pdf({ format: "A4" })));
    const letter = await pdfText(new Uint8Array(await page.pdf({ format: "Letter" })));
    writeFileSync(join(SHOTS, "notes-card.pdf"), await page.pdf({ format: "A4" }));
    expect(a4).toHaveLength(1);
    expect(letter).toHaveLength(1);
    const text = a4[0]!;
    expect(text).toContain(NAME);
    expect(text).toContain("Load table");
    expect(text).toContain("Largest trailing mass that starts");
    expect(text).toMatch(/Rail Without sand With sand Dry /);
    expect(text).toContain(`Dry ${dryWithout} ${dryWith}`);
    expect(text).not.toContain("Incomplete");
    expect(text).toContain("Recommended practice");
    expect(text).toContain("Advisory only.");
    expect(text).toContain("First survey of the loop.");
    // What it was computed from: revision, time printed, program version, reference train, rail defaults.
    expect(text).toMatch(/revision 1 of \d{4}-\d{2}-\d{2}/);
    expect(text).toMatch(/printed \d{4}-\d{2}-\d{2} \d{2}:\d{2}/);
    expect(text).toContain(`Taut ${version}`);
    expect(text).toContain("Computed from:");
    expect(text).toContain("rail-condition defaults");
    // (The PDF's text may split the "fi" ligature: "fi ngerprint".)
    const fp = /fi ?ngerprint ([0-9a-f]{4}-[0-9a-f]{4})/.exec(text)?.[1];
    expect(fp).toBeDefined();
    // Only the card is printed: none of the app's controls.
    expect(text).not.toContain("Print / save as PDF");
    expect(text).not.toContain("Start plan");

    // A changed profile prints a different fingerprint, with the next revision.
    await page.getByRole("button", { name: "Edit note" }).click();
    await page.getByRole("button", { name: "Segment 1 gradient: more" }).click();
    await (await field("revision.initials")).fill("EE");
    await (await field("revision.change")).fill("Gradient of the first segment resurveyed.");
    await page.getByRole("button", { name: "Save note" }).click();
    await page.getByText(`Saved "${NAME}".`).waitFor();
    await page.getByRole("button", { name: "Card / print" }).click();
    await page.getByRole("button", { name: "Print / save as PDF" }).click({ timeout: 120_000 });
    const again = (await pdfText(new Uint8Array(await page.pdf({ format: "A4" }))))[0]!;
    expect(again).toMatch(/revision 2 of \d{4}-\d{2}-\d{2}/);
    const fp2 = /fi ?ngerprint ([0-9a-f]{4}-[0-9a-f]{4})/.exec(again)?.[1];
    expect(fp2).toBeDefined();
    expect(fp2).not.toBe(fp);
  }, 240_000);

  it("reads well in portrait: library, editor and card (screenshots)", async () => {
    await page.setViewportSize(PORTRAIT);
    await openNotes();
    await shot("notes-library-portrait");
    await page.getByRole("button", { name: NAME, exact: false }).first().click();
    await page.locator(".notes-editor .notes-loadtable").waitFor({ timeout: 120_000 });
    // No sideways scrolling of the screen in portrait.
    expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth + 1)).toBe(true);
    await shot("notes-editor-portrait");
    expect(await axeSeriousOrCritical(page, "editor portrait")).toEqual([]);
    await page.getByRole("button", { name: "Card / print" }).click();
    await page.locator(".notes-card-preview .notes-loadtable").waitFor({ timeout: 120_000 });
    await shot("notes-card-portrait");
    await page.setViewportSize(LANDSCAPE);
  }, 180_000);

  it("logged no console errors", () => {
    expect(problems).toEqual([]);
  });
});
