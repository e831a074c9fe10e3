/**
 * Fit for daily use, in the built app in Debian's Chromium: no plan while the inputs break a rule (at both
 * sizes, the Plan tab saying so); the compact verdict line in view when the full verdict has scrolled away;
 * each step's figures with their basis and the effort chart's step marks; chart colours the same by day and
 * by night with marker shapes in the legend; a case file saved and opened again; the card's profile sketch
 * at the one exaggeration. Screenshots at 1280×800 and 800×1280, day and night; axe-core, touch targets and
 * console errors checked.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { axeSeriousOrCritical, LANDSCAPE, launch, PORTRAIT, SHOTS, smallTargets } from "./browser.js";

let context: BrowserContext;
let page: Page;
let work: string;
let problems: string[] = [];
const base = inject("baseURL");

const shot = (name: string) => page.screenshot({ path: join(SHOTS, `${name}.png`) });
const openScreen = (name: string) => page.getByRole("link", { name, exact: true }).click();
const mass = () => page.locator('input[name="train.trailingMass_t"]');
async function waitForCurrentPlan(): Promise<void> {
  await page.waitForSelector(".verdict:not(.stale)", { timeout: 60_000 });
  await page.waitForFunction(() => !document.querySelector('.result[aria-busy="true"]'), undefined, { timeout: 60_000 });
}
async function setTheme(theme: "Day" | "Night"): Promise<void> {
  await openScreen("Settings");
  await page.getByRole("radio", { name: theme, exact: true }).click();
  await openScreen("Start plan");
}

beforeAll(async () => {
  work = mkdtempSync(join(tmpdir(), "taut-daily-e2e-"));
  ({ context, page, problems } = await launch(inject("chromiumPath"), join(work, "profile"), { acceptDownloads: true }));
});

afterAll(async () => {
  await context?.close();
  if (work) rmSync(work, { recursive: true, force: true });
});

describe("fit for daily use", () => {
  it("invalid inputs: no plan where the verdict stands, no Cab steps, the Plan tab says so — at both sizes, day and night", async () => {
    await page.goto(base);
    await waitForCurrentPlan();
    for (const theme of ["Day", "Night"] as const) {
      await setTheme(theme);
      const t = theme.toLowerCase();
      await page.setViewportSize(LANDSCAPE);
      await mass().fill("-100");
      await page.waitForSelector("[data-no-plan]");
      expect(await page.locator("[data-no-plan]").textContent()).toContain("Trailing mass must be from 5 to 60,000 t (got −100 t)");
      expect(await page.locator(".verdict").count()).toBe(0);
      expect(await page.getByRole("button", { name: "Open Cab steps" }).count()).toBe(0);
      await shot(`invalid-landscape-${t}`);
      problems.push(...(await axeSeriousOrCritical(page, `No plan, landscape (${t})`)));
      await page.setViewportSize(PORTRAIT);
      expect(await page.locator("#tab-plan").textContent()).toContain("no plan: fix inputs");
      await page.locator("#tab-plan").click();
      await shot(`invalid-portrait-${t}`);
      problems.push(...(await smallTargets(page, `No plan, portrait (${t})`)));
      await page.getByRole("button", { name: "Go to the inputs" }).click();
      expect(await page.evaluate(() => document.activeElement?.getAttribute("name"))).toBe("train.trailingMass_t");
      await mass().fill("1400");
      await page.locator("#tab-plan").click();
      await waitForCurrentPlan();
      await page.setViewportSize(LANDSCAPE);
    }
    // Cab steps has nothing to follow while the inputs are invalid.
    await mass().fill("0");
    await openScreen("Cab steps");
    await page.getByText("No plan: the inputs on Start plan break a rule").waitFor();
    expect(await page.locator(".cab-notch-value").count()).toBe(0);
    await page.getByRole("button", { name: "Start plan" }).first().click();
    await mass().fill("1400");
    await waitForCurrentPlan();
  }, 180_000);

  it("keeps a compact verdict in view when a changed input updates a verdict scrolled out of sight", async () => {
    await setTheme("Day");
    await page.setViewportSize(LANDSCAPE);
    await waitForCurrentPlan();
    const summary = page.locator(".verdict-summary");
    expect(await summary.evaluate((el) => getComputedStyle(el).display)).toBe("none");
    await page.locator(".pane-plan").evaluate((el) => el.scrollTo(0, el.scrollHeight));
    await summary.waitFor({ state: "visible" });
    // The full verdict is far above, out of view; the line is at the top of the pane.
    const where = await page.evaluate(() => ({ banner: document.querySelector(".verdict")!.getBoundingClientRect().bottom, line: document.querySelector(".verdict-summary")!.getBoundingClientRect(), pane: document.querySelector(".pane-plan")!.getBoundingClientRect().top }));
    expect(where.banner).toBeLessThan(where.pane);
    expect(Math.abs(where.line.top - where.pane)).toBeLessThan(2);
    // A change on the left is seen on the right: first as for the previous inputs, then the new verdict.
    await page.getByRole("button", { name: "Trailing mass: more" }).click();
    await page.waitForSelector(".verdict-summary.stale", { timeout: 5_000 }).catch(() => undefined);
    await waitForCurrentPlan();
    await page.waitForSelector(".verdict-summary.shown:not(.stale)");
    const word = await summary.locator(".summary-word").textContent();
    expect(word).toBe(await page.locator(".verdict .verdict-word").textContent());
    expect(await summary.locator(".summary-margin").textContent()).toMatch(/^margin × \d+\.\d\d$/);
    expect((await summary.locator(".summary-limit").textContent())!.length).toBeGreaterThan(2);
    await shot("verdict-line-landscape-day");
    await page.setViewportSize(PORTRAIT);
    await page.locator(".pane-plan").evaluate((el) => el.scrollTo(0, el.scrollHeight));
    await summary.waitFor({ state: "visible" });
    await shot("verdict-line-portrait-day");
    await page.setViewportSize(LANDSCAPE);
    await page.getByRole("button", { name: "Trailing mass: less" }).click();
    await waitForCurrentPlan();
  }, 120_000);

  it("gives each figure its basis, and marks the steps on the effort chart", async () => {
    await page.locator(".pane-plan").evaluate((el) => el.scrollTo(0, 0));
    const cards = page.locator(".step-card");
    expect(await cards.count()).toBeGreaterThan(0);
    const bases = await cards.evaluateAll((els) => els.map((el) => [...el.querySelectorAll(".basis")].map((b) => b.textContent)));
    for (const b of bases) {
      expect(b.some((x) => /^highest, at [\d.]+ km\/h \(\d+ kN\)$/.test(x ?? ""))).toBe(true);
      expect(b.some((x) => /^at [\d.]+ km\/h, the step's end$/.test(x ?? ""))).toBe(true);
      expect(b.some((x) => /^of \d+ kN allowed$/.test(x ?? ""))).toBe(true);
    }
    expect(await page.locator("[data-coupler-basis]").textContent()).toMatch(/^of \d+ kN allowed \(limit \d+ kN ÷ [\d.]+\)$/);
    const legend = page.locator('[data-chart="Tractive effort and adhesion"] .legend');
    expect(await legend.textContent()).toContain("S1, S2…");
    await page.locator('[data-chart="Tractive effort and adhesion"]').scrollIntoViewIfNeeded();
    await page.waitForSelector('[data-chart="Tractive effort and adhesion"] .chart-box[data-drawn="yes"]', { timeout: 20_000 });
    await page.waitForTimeout(300);
    await page.locator('[data-chart="Tractive effort and adhesion"]').screenshot({ path: join(SHOTS, "effort-chart-steps-day.png") });
  });

  it("keeps each chart series' colour by day and by night, with a marker shape per rail condition", async () => {
    const swatches = async () =>
      // The rail conditions' swatches (a band behind the marker), as drawn.
      page
        .locator('[data-chart="Tractive effort and adhesion"] .legend .swatch-marker')
        .evaluateAll((els) => els.filter((el) => el.querySelector(":scope > rect")).map((el) => [el.getAttribute("data-marker"), el.querySelector("g")!.getAttribute("fill")]));
    const day = await swatches();
    expect(day).toHaveLength(6);
    expect(new Set(day.map(([m]) => m)).size).toBe(6);
    expect(new Set(day.map(([, c]) => c)).size).toBe(6);
    await setTheme("Night");
    await waitForCurrentPlan();
    expect(await swatches()).toEqual(day);
    await page.locator('[data-chart="Tractive effort and adhesion"]').scrollIntoViewIfNeeded();
    await page.waitForSelector('[data-chart="Tractive effort and adhesion"] .chart-box[data-drawn="yes"]', { timeout: 20_000 });
    await page.waitForTimeout(300);
    await page.locator('[data-chart="Tractive effort and adhesion"]').screenshot({ path: join(SHOTS, "effort-chart-steps-night.png") });
    await setTheme("Day");
  });

  it("saves the case as a file and opens it again, planning the same case", async () => {
    await page.setViewportSize(LANDSCAPE);
    await page.locator('[data-case="demo-goods-cinderfield"]').click();
    await waitForCurrentPlan();
    const verdict = await page.locator(".verdict").getAttribute("data-verdict");
    const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: "Save case file" }).click()]);
    const path = join(work, download.suggestedFilename());
    await download.saveAs(path);
    expect(download.suggestedFilename()).toBe("demo-goods-cinderfield.json");
    const saved = JSON.parse(readFileSync(path, "utf8")) as Record<string, unknown>;
    expect(saved).toMatchObject({ schema: "taut/start-case@1", id: "demo-goods-cinderfield", location: "cinderfield-yard", conditions: { rail: "leaves", sand: true } });
    // Another case on screen, then the saved one opened from its file.
    await page.locator('[data-case="demo-ore-lantern"]').click();
    await waitForCurrentPlan();
    const edited = join(work, "edited.json");
    writeFileSync(edited, JSON.stringify({ ...saved, id: "goods-edited", label: "Goods, edited by hand" }));
    await page.getByLabel("Start-case file to open").setInputFiles(edited);
    await page.getByText("Opened edited.json.").waitFor();
    await waitForCurrentPlan();
    expect(await page.locator(".case-label strong").textContent()).toBe("Goods, edited by hand");
    expect(await page.locator(".verdict").getAttribute("data-verdict")).toBe(verdict);
    await page.locator(".pane-inputs").evaluate((el) => el.scrollTo(0, 0));
    await shot("case-file-opened-landscape-day");
    problems.push(...(await smallTargets(page, "Quick fill and case files, landscape")));
    await page.locator('[data-case="demo-aggregate-ashvale"]').click();
    await waitForCurrentPlan();
  }, 120_000);

  it("draws every note's card sketch at heights ×20, and says so", async () => {
    await openScreen("Location notes");
    for (const name of ["Ashvale Loop, up departure (illustrative)", "Cinderfield Yard, departure road 3 (illustrative)", "Lantern Dip, signal on the bank out of the dip (illustrative)"]) {
      await page.getByRole("button", { name: `Card of ${name}` }).click({ timeout: 30_000 });
      const sketch = page.locator(".notes-card-preview .notes-sketch");
      await sketch.waitFor();
      expect(await sketch.getAttribute("data-exaggeration")).toBe("20");
      expect(await sketch.textContent()).toContain("heights ×20");
      expect((await page.locator(".notes-card-preview .card-standing").textContent())!.length).toBeGreaterThan(30);
      await shot(`card-${name.split(",")[0]!.toLowerCase().replace(/\s+/g, "-")}-landscape-day`);
      await page.getByRole("button", { name: "Back to the library" }).click();
    }
  }, 180_000);

  it("logged no console errors, and axe found no serious or critical violations", () => {
    expect(problems).toEqual([]);
  });
});
