/**
 * The dispatcher's screens in the built app in Debian's Chromium: Assistance check for the demo case (a clear
 * "starts already", then option cards once the rail is wet), Departures with the shipped demo day (every row
 * answered by the worker pool, sorted by risk, exported as CSV), and the Load table (twelve figures). Screenshots
 * at 1280×800 and 800×1280 in the day and night themes, axe-core with no serious or critical violations, touch
 * targets of at least 48 px, and no console errors.
 */
import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { axeSeriousOrCritical, LANDSCAPE, launch, PORTRAIT, SHOTS, smallTargets } from "./browser.js";

const DEMO_DAY = fileURLToPath(new URL("../../profiles/departures/demo-day.json", import.meta.url));

let context: BrowserContext;
let page: Page;
let work: string;
let problems: string[] = [];
const base = inject("baseURL");

const shot = (name: string) => page.screenshot({ path: join(SHOTS, `${name}.png`) });
const openScreen = (name: string) => page.getByRole("link", { name, exact: true }).click();
const toTop = () => page.locator(".screen").evaluate((el) => el.scrollTo(0, 0));

/** Screenshots of the screen at the top in both orientations (and one further down), with the checks. */
async function inBothOrientations(name: string, theme: string, further = 0): Promise<void> {
  await page.setViewportSize(LANDSCAPE);
  await toTop();
  await shot(`${name}-landscape-${theme}`);
  problems.push(...(await axeSeriousOrCritical(page, `${name}, landscape (${theme})`)));
  problems.push(...(await smallTargets(page, `${name}, landscape (${theme})`)));
  if (further > 0) {
    await page.locator(".screen").evaluate((el, y) => el.scrollTo(0, y), further);
    await shot(`${name}-landscape-${theme}-2`);
  }
  await page.setViewportSize(PORTRAIT);
  await toTop();
  await shot(`${name}-portrait-${theme}`);
  problems.push(...(await smallTargets(page, `${name}, portrait (${theme})`)));
  expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth + 1)).toBe(true);
  if (further > 0) {
    await page.locator(".screen").evaluate((el, y) => el.scrollTo(0, y), further * 1.5);
    await shot(`${name}-portrait-${theme}-2`);
  }
  await page.setViewportSize(LANDSCAPE);
}

async function waitForCharts(): Promise<void> {
  await page.locator("figure.chart").first().scrollIntoViewIfNeeded();
  await page.waitForFunction(() => [...document.querySelectorAll(".chart-box")].every((b) => (b as HTMLElement).dataset.drawn === "yes"), undefined, { timeout: 20_000 });
  await page.waitForTimeout(300);
}

beforeAll(async () => {
  work = mkdtempSync(join(tmpdir(), "taut-dispatch-e2e-"));
  ({ context, page, problems } = await launch(inject("chromiumPath"), join(work, "profile"), { acceptDownloads: true }));
});

afterAll(async () => {
  await context?.close();
  if (work) rmSync(work, { recursive: true, force: true });
});

describe("dispatcher's screens in the browser", () => {
  it("Assistance check: the demo train starts already; on wet rail it gets option cards", async () => {
    await page.goto(base);
    await page.waitForSelector(".verdict:not(.stale)", { timeout: 30_000 });
    await openScreen("Assistance check");
    await page.waitForSelector(".starts-already, .option-card, .nothing-works", { timeout: 60_000 });
    await page.waitForSelector(".margins-table tbody td", { timeout: 60_000 });
    expect(await page.locator(".margins-table tbody td").count()).toBe(12);
    // The demo case (dry rail) starts as it stands: said plainly.
    await page.getByText("Starts already: no assistance needed").waitFor();
    await waitForCharts();
    await inBothOrientations("assistance-check-starts", "day");

    await openScreen("Start plan");
    await page.getByRole("radio", { name: "Wet" }).click();
    await openScreen("Assistance check");
    await page.waitForSelector(".option-card, .nothing-works", { timeout: 90_000 });
    await page.waitForFunction(() => !document.querySelector('.assistance-check [role="progressbar"]'), undefined, { timeout: 90_000 });
    const cards = page.locator(".option-card");
    if ((await cards.count()) > 0) {
      const first = cards.first();
      expect(await first.locator("h3").textContent()).toMatch(/Add \d more units?/);
      expect(await first.locator(".option-verdict svg").getAttribute("data-shape")).toBe("circle");
      expect(await first.locator(".option-figures").textContent()).toMatch(/Peak pull[\d,.]+ kN.*Peak push[\d,.]+ kN/);
    } else {
      await page.getByText(/No option with one or two more units/).waitFor();
    }
    expect(await page.locator('[data-verdict="needs-assistance"], [data-verdict="marginal"]').count()).toBeGreaterThan(0);
    await waitForCharts();
    await inBothOrientations("assistance-check-options", "day", 650);
  }, 240_000);

  it("Departures: the shipped demo day is answered by the worker pool, sorted by risk, and exported as CSV", async () => {
    await openScreen("Departures");
    await page.getByLabel("Departures file, and the case files a CSV names").setInputFiles(DEMO_DAY);
    await page.waitForSelector(".departures-table tbody tr", { timeout: 30_000 });
    expect(await page.locator(".departures-table tbody tr").count()).toBe(12);
    await page.getByRole("progressbar", { name: "Checking departures" }).waitFor();
    await shot("departures-running-landscape-day");
    await page.waitForFunction(() => !document.querySelector('.departures [role="progressbar"]'), undefined, { timeout: 240_000 });
    const verdicts = await page.locator(".departures-table tbody tr").evaluateAll((rows) => rows.map((r) => r.getAttribute("data-verdict")));
    const rank = { "needs-assistance": 0, marginal: 1, starts: 2 } as Record<string, number>;
    expect(verdicts.every((v) => v !== null && v in rank)).toBe(true);
    for (let k = 1; k < verdicts.length; k++) expect(rank[verdicts[k]!]!).toBeGreaterThanOrEqual(rank[verdicts[k - 1]!]!);
    expect(new Set(verdicts).size).toBeGreaterThan(1);
    const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: "Export CSV" }).click()]);
    const path = join(work, "check.csv");
    await download.saveAs(path);
    const lines = readFileSync(path, "utf8").trimEnd().split("\n");
    expect(lines[0]).toBe("id,line,index,rail,sand,trailingMass_t,verdict,reasons,margin,maxStartableMass_t,peakCouplerForce_kN,timeToTarget_s,assistance,assistanceVerdict,assistancePeakCouplerForce_kN,divideFirstWagons,divideFirstMass_t,error,binding,largestMarginalMass_t");
    expect(lines).toHaveLength(13);
    expect(lines[1]).toMatch(/^agg-0610,,0,damp,true,1400,/);
    await inBothOrientations("departures", "day", 500);

    // Portrait: the day of twelve is compact cards, under two screens of the screen area.
    await page.setViewportSize(PORTRAIT);
    const heights = await page.evaluate(() => ({ table: document.querySelector(".departures-table")!.getBoundingClientRect().height, screen: document.querySelector(".screen")!.clientHeight }));
    console.log(`[measure] Departures in portrait: 12 trains take ${Math.round(heights.table)} px, ${(heights.table / heights.screen).toFixed(2)} screens`);
    expect(heights.table).toBeLessThan(2 * heights.screen);
    await page.setViewportSize(LANDSCAPE);

    // One verdict at a time, and the file's order on request.
    const showOnly = page.getByRole("radiogroup", { name: "Show" });
    await showOnly.getByRole("radio", { name: /^Needs assistance/ }).click();
    const shown = await page.locator(".departures-table tbody tr").evaluateAll((rows) => rows.map((r) => r.getAttribute("data-verdict")));
    expect(shown.length).toBeGreaterThan(0);
    expect(new Set(shown)).toEqual(new Set(["needs-assistance"]));
    await showOnly.getByRole("radio", { name: /^All/ }).click();
    await page.getByRole("radio", { name: "File order" }).click();
    expect(await page.locator(".departures-table tbody tr").first().getAttribute("data-row")).toBe("agg-0610");
    await page.getByRole("radio", { name: "Most at risk first" }).click();

    // A row opens its train: the full plan in Start plan, then its assistance in Assistance check.
    const row = (await page.locator('.departures-table tbody tr[data-verdict="needs-assistance"]').first().getAttribute("data-row"))!;
    await page.getByRole("button", { name: `Open ${row} in Start plan` }).click();
    await page.waitForSelector('[data-screen="start-plan"] .verdict:not(.stale)', { timeout: 60_000 });
    expect(await page.locator(".case-label strong").textContent()).toMatch(new RegExp(`^${row}: `));
    expect(await page.locator(".verdict").getAttribute("data-verdict")).toBe("needs-assistance");
    await shot("departure-opened-plan-landscape-day");
    await openScreen("Departures");
    await page.getByRole("button", { name: `Open ${row} in Assistance check` }).click();
    await page.waitForSelector(".option-card, .nothing-works", { timeout: 120_000 });
    expect(await page.locator(".assistance-check").textContent()).toContain(`${row}: `);
    await shot("departure-opened-assistance-landscape-day");
  }, 420_000);

  it("Load table: twelve figures for the demo note, as a table and as bars", async () => {
    await openScreen("Load table");
    await page.waitForFunction(() => document.querySelectorAll(".load-table-grid td:not(.waiting)").length === 12, undefined, { timeout: 120_000 });
    const cells = await page.locator(".load-table-grid td").allTextContents();
    expect(cells).toHaveLength(12);
    for (const c of cells) expect(c).toMatch(/^([\d,]+ t|none)/);
    await waitForCharts();
    await inBothOrientations("load-table", "day", 500);
  }, 180_000);

  it("reads in the night theme too (screenshots of the three screens, answers kept)", async () => {
    await openScreen("Settings");
    await page.getByRole("radio", { name: "Night", exact: true }).click();
    for (const [tab, name, ready] of [
      ["Assistance check", "assistance-check-options", ".option-card, .nothing-works"],
      ["Departures", "departures", ".departures-table"],
      ["Load table", "load-table", ".load-table-grid td:not(.waiting)"],
    ] as const) {
      await openScreen(tab);
      await page.waitForSelector(ready, { timeout: 60_000 });
      if ((await page.locator("figure.chart").count()) > 0) await waitForCharts();
      await inBothOrientations(name, "night");
    }
    expect(await page.evaluate(() => document.documentElement.dataset.theme)).toBe("night");
  }, 180_000);

  it("logged no console errors, and axe found no serious or critical violations", () => {
    expect(problems).toEqual([]);
  });
});
