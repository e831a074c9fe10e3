/**
 * The Start review place in the built app in Debian's Chromium: reached from a demo note's card, a CSV
 * recording (a `taut simulate` run of Start plan's demo case at that note, 15 % heavier) is reviewed in the
 * review worker, kept with the note and listed; a broken file is refused naming its line; axe-core finds no
 * serious or critical violations; no console errors.
 */
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { planSequence, planStart, scaledCase } from "../../src/core/index.js";
import { builtinCaseJson, builtinLibrary, builtinLocations } from "../../src/profiles/builtin.js";
import { locationFromNote } from "../../src/profiles/convert.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { csvText, simulatedStart } from "../tools/recordings.js";
import { axeSeriousOrCritical, launch, SHOTS } from "./browser.js";

let context: BrowserContext;
let page: Page;
let work: string;
let problems: string[] = [];
const base = inject("baseURL");

beforeAll(async () => {
  work = mkdtempSync(join(tmpdir(), "taut-review-e2e-"));
  ({ context, page, problems } = await launch(inject("chromiumPath"), join(work, "profile")));
});

afterAll(async () => {
  await context?.close();
  if (work) rmSync(work, { recursive: true, force: true });
});

describe("Start review in the browser", () => {
  it("reviews a recording from a note's card in its worker, keeps it, and refuses a broken file", async () => {
    const note = builtinLocations[0]!;
    const parsed = parseStartCase(builtinCaseJson[0], builtinLibrary());
    if (!parsed.ok) throw new Error("demo case invalid");
    const c = { ...parsed.value, location: locationFromNote(note) };
    const run = simulatedStart(scaledCase(c, { massFactor: 1.15, effortFactor: 1 }), planSequence(planStart(c, { skipMassSearch: true, skipVerification: true })), { extraS: 10 });
    writeFileSync(join(work, "start.csv"), csvText(run));
    writeFileSync(join(work, "broken.csv"), "time_s,speed_kmh\n0,0\n1,x\n");

    await page.goto(`${base}#/location-notes`);
    await page.getByRole("button", { name: `Card of ${note.name}` }).click({ timeout: 30_000 });
    await page.getByRole("button", { name: "Start review" }).click();
    await page.getByRole("heading", { name: `Start review: ${note.name}` }).waitFor({ timeout: 30_000 });

    await page.getByLabel("Recording file").setInputFiles(join(work, "broken.csv"));
    await page.getByRole("alert").filter({ hasText: "line 3: speed_kmh must be a number" }).waitFor({ timeout: 30_000 });

    await page.getByLabel("Recording file").setInputFiles(join(work, "start.csv"));
    await page.getByText(/heavier than planned: mass factor \d\.\d\d/).waitFor({ timeout: 60_000 });
    await page.getByRole("button", { name: "Keep with this note" }).click();
    await page.getByText(/Observed mass factor \d\.\d\d: the median of 1 review/).waitFor({ timeout: 30_000 });
    await page.screenshot({ path: join(SHOTS, "start-review-landscape.png") });
    expect(await axeSeriousOrCritical(page, "start review")).toEqual([]);
    expect(problems).toEqual([]);
  }, 180_000);
});
