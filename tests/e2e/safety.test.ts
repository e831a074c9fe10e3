/**
 * Data safety in the built app in Debian's Chromium: two tabs saving one note (the second asks), a large
 * notes bundle imported through the file picker (read and checked in a worker; the library paged), a
 * Start plan draft the app cannot use set aside at launch, and another tab upgrading the notes database.
 * Timings are printed as figures, never asserted (the machine is shared); `npm run bench` measures the
 * full-size library (tests/bench/notesLibrary.ts).
 */
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { launch } from "./browser.js";
import { builtinLocations } from "../../src/profiles/builtin.js";
import { makeNotesBundle } from "../../src/profiles/notes.js";

let context: BrowserContext;
let page: Page;
let work: string;
let problems: string[] = [];
const base = inject("baseURL");
const demo = builtinLocations[0]!;

async function openNotes(p: Page): Promise<void> {
  await p.goto("about:blank");
  await p.goto(`${base}#/location-notes`);
  await p.locator(".notes-item-name").first().waitFor({ timeout: 30_000 });
}

const field = (p: Page, name: string) => p.locator(`[data-field="${name}"] input, [data-field="${name}"] textarea`).first();

beforeAll(async () => {
  work = mkdtempSync(join(tmpdir(), "taut-safety-e2e-"));
  ({ context, page, problems } = await launch(inject("chromiumPath"), join(work, "profile"), { acceptDownloads: true }));
});

afterAll(async () => {
  await context?.close();
  if (work) rmSync(work, { recursive: true, force: true });
});

describe("data safety in the browser", () => {
  it("two tabs save one note: the second is asked, and 'Keep both' keeps both edits", async () => {
    const other = await context.newPage();
    await openNotes(page);
    await openNotes(other);
    for (const [p, who] of [[page, "AA"], [other, "BB"]] as const) {
      await p.getByRole("button", { name: new RegExp(`^${demo.name.replace(/[()]/g, "\\$&")}`) }).click();
      await field(p, "practice").fill(`Edited in tab ${who}.`);
      await field(p, "revision.initials").fill(who);
      await field(p, "revision.change").fill(`Tab ${who}'s change.`);
    }
    await page.getByRole("button", { name: "Save note" }).click();
    await page.getByText(`Saved "${demo.name}".`).waitFor();
    await other.getByRole("button", { name: "Save note" }).click();
    const dialog = other.getByRole("dialog", { name: "This note was saved elsewhere while you edited it" });
    await dialog.waitFor();
    expect(await dialog.textContent()).toContain("by AA: Tab AA's change.");
    await dialog.getByRole("button", { name: "Keep both" }).click();
    await other.getByText(`Saved "${demo.name} (my copy)".`).waitFor();
    await openNotes(page);
    const names = await page.locator(".notes-item-name").allTextContents();
    expect(names).toEqual(expect.arrayContaining([demo.name, `${demo.name} (my copy)`]));
    await other.close();
  }, 120_000);

  it("a large bundle is read in a worker and the library is paged (figures printed)", async () => {
    const count = 1500;
    const notes = Array.from({ length: count }, (_, k) => ({ ...demo, id: `bulk-${String(k).padStart(5, "0")}`, name: `Bulk place ${String(k).padStart(5, "0")} (test)`, practice: "p".repeat(2000) }));
    const file = join(work, "large.json");
    writeFileSync(file, JSON.stringify(makeNotesBundle(notes)));
    await openNotes(page);
    // Long tasks on the page's thread while the import runs (the Long Tasks API: 50 ms or more).
    await page.evaluate(() => {
      const w = window as unknown as { longTasks: number[] };
      w.longTasks = [];
      new PerformanceObserver((l) => l.getEntries().forEach((e) => w.longTasks.push(e.duration))).observe({ type: "longtask", buffered: false });
    });
    const t0 = Date.now();
    await page.getByLabel("Notes file to import").setInputFiles(file);
    // The count as the page writes numbers in English: thousands grouped with a comma.
    await page.getByText(`Imported large.json: ${count.toLocaleString("en")} added`).waitFor({ timeout: 60_000 });
    await page.getByText(/notes; the first 100 are shown/).waitFor();
    const importMs = Date.now() - t0;
    const longTasks = await page.evaluate(() => (window as unknown as { longTasks: number[] }).longTasks);
    expect(await page.locator(".notes-item-name").count()).toBe(100);
    const t1 = Date.now();
    await openNotes(page);
    await page.getByText(/notes; the first 100 are shown/).waitFor();
    const reopenMs = Date.now() - t1;
    console.log(
      `[notes] ${count} notes (${Math.round(JSON.stringify(notes).length / 1e5) / 10} MB): import to list ${importMs} ms; longest page task ${Math.round(Math.max(0, ...longTasks))} ms (${longTasks.length} over 50 ms); reopen to list ${reopenMs} ms`,
    );
    await page.getByRole("searchbox").fill("Bulk place 01234");
    expect(await page.locator(".notes-item-name").allTextContents()).toEqual(["Bulk place 01234 (test)"]);
  }, 180_000);

  it("a Start plan draft the app cannot use is set aside at launch: the demo opens with a notice", async () => {
    await page.goto(`${base}#/start-plan`);
    await page.locator("section[data-verdict]").waitFor({ timeout: 30_000 });
    await page.evaluate(() => {
      const d = JSON.parse(localStorage.getItem("taut.case.v1") ?? "null") as { train: { coupling: string } } | null;
      if (!d) throw new Error("no stored draft");
      d.train.coupling = "chain";
      localStorage.setItem("taut.case.v1", JSON.stringify(d));
    });
    await page.reload();
    await page.locator("section[data-verdict]").waitFor({ timeout: 30_000 });
    await page.getByText(/Your last Start plan inputs could not be read \(train\.coupling: "chain" is not allowed here\)/).waitFor();
    expect(await page.evaluate(() => localStorage.getItem("taut.case.v1.set-aside"))).toContain('"chain"');
  }, 60_000);

  it("another tab upgrading the notes database: a notice and a reload, no error, the edit kept (last test)", async () => {
    await openNotes(page);
    await page.getByRole("button", { name: "New note" }).click();
    await field(page, "name").fill("Typed before the upgrade (e2e)");
    const other = await context.newPage();
    await other.goto(`${base}#/settings`);
    await other.evaluate(
      () =>
        new Promise<void>((resolve, reject) => {
          const r = indexedDB.open("taut-notes", 99);
          r.onsuccess = () => (r.result.close(), resolve());
          r.onerror = () => reject(r.error);
        }),
    );
    await page.getByText(/upgraded by another tab or window of Taut/).waitFor();
    expect(await page.getByRole("button", { name: "Reload the page" }).count()).toBe(1);
    await expect.poll(() => page.evaluate(() => localStorage.getItem("taut.notes.draft.v1") ?? "")).toContain("Typed before the upgrade (e2e)");
    await other.close();
    expect(problems).toEqual([]);
  }, 60_000);
});
