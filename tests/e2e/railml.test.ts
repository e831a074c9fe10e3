/**
 * Import from railML in the built app in Debian's Chromium, through the real import worker: a 50 MB railML
 * 2.2 file written by the test (element names and their sources: tests/profiles/railml.test.ts) is read
 * while the page keeps drawing its progress, a stretch is chosen by line position, previewed and saved;
 * a 50 MB file that breaks into junk after 2 MB, and a file with entity declarations, are refused with their
 * reason and nothing is saved. axe-core finds no serious or critical violations on the import view.
 */
import { createWriteStream, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { axeSeriousOrCritical, launch, SHOTS } from "./browser.js";
import { chain, railmlHead, railmlTail, trackXml } from "../tools/railml.js";

let context: BrowserContext;
let page: Page;
let work: string;
let problems: string[] = [];
const base = inject("baseURL");

/**
 * Tracks of 500 m laid end to end from mileage 0, each rising (k mod 5) ‰; about `mb` megabytes. With
 * `junkAfterMb`, text that is not XML is written once that much is written (the file still grows to `mb`).
 */
async function writeLine(path: string, mb: number, junkAfterMb?: number): Promise<number> {
  const out = createWriteStream(path);
  const write = (s: string) => new Promise<void>((resolve) => (out.write(s) ? resolve() : out.once("drain", () => resolve())));
  await write(railmlHead({}));
  let bytes = 0;
  let k = 0;
  const batch = 500;
  while (bytes < mb * 1e6) {
    const tracks = chain(Array.from({ length: batch }, () => 500), k * 500).map((t, j) => {
      const id = k + j;
      // Renumber so that connections join across batches: T<id> joins T<id+1>.
      t.id = `T${id + 1}`;
      if (id > 0) t.beginConn = { id: `T${id + 1}_in`, ref: `T${id}_out` };
      t.endConn = { id: `T${id + 1}_out`, ref: `T${id + 2}_in` };
      t.gradients = Array.from({ length: 20 }, (_, g) => ({ pos: g * 25, dir: "up" as const, value: id % 5 }));
      t.radii = [{ pos: 0, dir: "up" as const, value: 0 }];
      return t;
    });
    const text = tracks.map(trackXml).join("");
    if (junkAfterMb !== undefined && bytes < junkAfterMb * 1e6 && bytes + text.length >= junkAfterMb * 1e6) await write("    </tracks>\n  <<< not XML >>>\n");
    bytes += text.length;
    await write(text);
    k += batch;
  }
  await write(railmlTail());
  await new Promise<void>((resolve) => out.end(resolve));
  return k;
}

async function openImport(): Promise<void> {
  await page.goto("about:blank");
  await page.goto(`${base}#/location-notes`);
  await page.locator(".notes-item-name").first().waitFor({ timeout: 30_000 });
  await page.getByRole("button", { name: "Import from railML" }).click();
}

const names = () => page.locator(".notes-item-name").allTextContents();

beforeAll(async () => {
  work = mkdtempSync(join(tmpdir(), "taut-railml-e2e-"));
  ({ context, page, problems } = await launch(inject("chromiumPath"), join(work, "profile")));
});

afterAll(async () => {
  await context?.close();
  if (work) rmSync(work, { recursive: true, force: true });
});

describe("Import from railML in the browser", () => {
  it("reads a 50 MB file in the worker while the page draws its progress, and saves the chosen stretch", async () => {
    const file = join(work, "long-line.xml");
    const tracks = await writeLine(file, 50);
    await openImport();
    expect(await axeSeriousOrCritical(page, "railML import")).toEqual([]);
    await page.getByLabel("railML file to import").setInputFiles(file);
    // The page is free while the worker reads: it shows the read growing, part of the way through.
    const bar = page.getByRole("progressbar", { name: "railML file read" });
    await expect.poll(async () => Number((await bar.getAttribute("aria-valuenow").catch(() => null)) ?? -1), { timeout: 120_000 }).toBeGreaterThan(0);
    expect(Number(await bar.getAttribute("aria-valuenow"))).toBeLessThan(100);
    await page.getByText(new RegExp(`long-line\\.xml: railML 2\\.2, ${tracks.toLocaleString("en")} track\\(s\\)`)).waitFor({ timeout: 180_000 });

    // Front at mileage 10 250 m (middle of track 21, which rises 0 ‰; track 22 rises 1 ‰), up, 250 m behind, 500 m ahead.
    await page.getByRole("radio", { name: "Line position" }).click();
    await page.locator('[data-field="railml.absPos"] input').fill("10250");
    await page.locator('[data-field="railml.behind"] input').fill("250");
    await page.locator('[data-field="railml.ahead"] input').fill("500");
    await page.locator('[data-field="railml.name"] input').fill("Long line at 10.25 km (e2e)");
    const rows = page.getByRole("table", { name: "Segments, from the rear end of the stretch" }).locator("tbody tr");
    await expect.poll(() => rows.allTextContents(), { timeout: 60_000 }).toEqual(["0 m500 m0.0 ‰straight", "500 m250 m1.0 ‰straight"]);
    await page.screenshot({ path: join(SHOTS, "notes-railml-landscape.png") });
    expect(await axeSeriousOrCritical(page, "railML preview")).toEqual([]);
    await page.getByRole("button", { name: "Save as a new note" }).click();
    await page.getByText('Saved "Long line at 10.25 km (e2e)" from railML.').waitFor({ timeout: 30_000 });
    await page.getByRole("button", { name: "Back to the library" }).first().click();
    expect(await names()).toContain("Long line at 10.25 km (e2e)");
  }, 400_000);

  it("refuses a 50 MB file that breaks into junk, and one that declares entities; nothing is saved", async () => {
    const junk = join(work, "broken.xml");
    await writeLine(junk, 50, 2);
    const lol = join(work, "lol.xml");
    writeFileSync(lol, '<?xml version="1.0"?>\n<!DOCTYPE railml [<!ENTITY a "aaaaaaaaaa"><!ENTITY b "&a;&a;&a;&a;&a;&a;&a;&a;&a;&a;">]>\n<railml xmlns="http://www.railml.org/schemas/2013">&b;</railml>');
    await openImport();
    await page.getByLabel("railML file to import").setInputFiles(junk);
    await page.getByRole("alert").filter({ hasText: "broken.xml: The file is not well-formed XML" }).waitFor({ timeout: 180_000 });
    expect(await page.getByRole("alert").textContent()).toContain("Nothing was saved.");
    await page.getByLabel("railML file to import").setInputFiles(lol);
    await page.getByRole("alert").filter({ hasText: "lol.xml: The file's document type declares XML entities" }).waitFor({ timeout: 30_000 });
    await page.getByRole("button", { name: "Back to the library" }).first().click();
    const list = await names();
    expect(list.filter((n) => /broken|lol/.test(n))).toEqual([]);
  }, 400_000);

  it("logged no console errors", () => {
    expect(problems).toEqual([]);
  });
});
