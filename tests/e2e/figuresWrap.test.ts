/**
 * No figure parts from its unit at the end of a line, on the screens a driver and a dispatcher read (Start plan,
 * Assistance check, Departures with the demo day, Load table), in English, Hungarian and German, at 1280×800, 800×1280 and
 * 600×960 (the narrowest width the app supports). A driver reading "3" at the end of one line and "min 22 s" on
 * the next, or "1,400" and "t)", reads another figure; the app keeps each figure in a span that does not wrap
 * (components/Figures.tsx), and this measures where the lines really end. The figures are found with the
 * app's own rule (figureParts); each is measured as a text range in the page: one line, or parted.
 */
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { launch, LANDSCAPE, PORTRAIT } from "./browser.js";
import { figureParts } from "../../src/app/components/figureParts.js";

let context: BrowserContext;
let page: Page;
let profile: string;
let problems: string[] = [];
const base = inject("baseURL");
const NARROW = { width: 600, height: 960 };
const DEMO_DAY = fileURLToPath(new URL("../../profiles/departures/demo-day.csv", import.meta.url));

async function go(id: string): Promise<void> {
  await page.evaluate((h) => (location.hash = h), `#/${id}`);
  await page.waitForFunction((id) => document.querySelector(`main[data-screen="${id}"]`) && !document.querySelector("main .placeholder-text"), id, { timeout: 30_000 });
}

/** Each screen's own figures, once they are worked out. */
async function ready(id: string): Promise<void> {
  if (id === "start-plan") await page.waitForSelector(".verdict:not(.stale)", { timeout: 120_000 });
  if (id === "assistance-check") await page.waitForSelector(".starts-already, .option-card, .nothing-works", { timeout: 120_000 });
  if (id === "departures") await page.waitForFunction(() => document.querySelectorAll(".departures-table tbody tr").length > 0 && !document.querySelector('.departures [role="progressbar"]'), undefined, { timeout: 300_000 });
  if (id === "load-table") await page.waitForFunction(() => document.querySelectorAll(".load-table-grid td:not(.waiting)").length === 12, undefined, { timeout: 120_000 });
}

/** Figures of the page's visible text that a line end parts, with where they stand. */
async function partedFigures(label: string): Promise<string[]> {
  // The text of every visible text node outside a figure span and outside text that never wraps.
  const texts = await page.evaluate(() => {
    const w = window as unknown as { __nodes: Text[] };
    w.__nodes = [];
    const out: string[] = [];
    const walker = document.createTreeWalker(document.body, NodeFilter.SHOW_TEXT);
    for (let n = walker.nextNode() as Text | null; n; n = walker.nextNode() as Text | null) {
      const el = n.parentElement;
      if (!el || el.closest(".figure, svg, script, style, .visually-hidden, option, select, [aria-hidden=true], [hidden]")) continue;
      const ws = getComputedStyle(el).whiteSpace;
      if (ws === "nowrap" || ws === "pre") continue;
      w.__nodes.push(n);
      out.push(n.textContent ?? "");
    }
    return out;
  });
  // Where the app's rule finds a figure in each.
  const hits: Array<[number, number, number]> = [];
  texts.forEach((t, i) => {
    let at = 0;
    for (const p of figureParts(t)) {
      if (typeof p !== "string") hits.push([i, at, at + p.figure.length]);
      at += typeof p === "string" ? p.length : p.figure.length;
    }
  });
  const parted = await page.evaluate((hits) => {
    const nodes = (window as unknown as { __nodes: Text[] }).__nodes;
    const out: string[] = [];
    for (const [i, from, to] of hits) {
      const n = nodes[i]!;
      const range = document.createRange();
      range.setStart(n, from);
      range.setEnd(n, to);
      const lines = new Set([...range.getClientRects()].filter((r) => r.width > 0).map((r) => Math.round(r.top)));
      if (lines.size > 1) out.push(`"${(n.textContent ?? "").slice(from, to)}" in ${n.parentElement!.tagName.toLowerCase()}.${[...n.parentElement!.classList].join(".")} "${(n.textContent ?? "").trim().slice(0, 50)}"`);
    }
    return out;
  }, hits);
  return parted.map((p) => `${label}: ${p}`);
}

beforeAll(async () => {
  profile = mkdtempSync(join(tmpdir(), "taut-figures-wrap-"));
  ({ context, page, problems } = await launch(inject("chromiumPath"), profile));
  await page.goto(base);
  await go("start-plan");
  await ready("start-plan");
  await go("departures");
  await page.locator(".departures input[type=file]").first().setInputFiles(DEMO_DAY);
  await ready("departures");
}, 400_000);

afterAll(async () => {
  await context?.close();
  if (profile) rmSync(profile, { recursive: true, force: true });
});

describe("a figure and its unit stay on one line", () => {
  for (const [lang, radio] of [["en", "English"], ["hu", "Magyar"], ["de", "Deutsch"]] as const) {
    it(`${lang}: Start plan, Assistance check, Departures and Load table at 1280×800, 800×1280 and 600×960`, async () => {
      await page.setViewportSize(LANDSCAPE);
      await go("settings");
      await page.getByRole("radio", { name: radio }).click();
      await expect.poll(() => page.evaluate(() => document.documentElement.lang)).toBe(lang);
      const found: string[] = [];
      for (const id of ["start-plan", "assistance-check", "departures", "load-table"]) {
        await go(id);
        await ready(id);
        for (const [size, name] of [[LANDSCAPE, "1280×800"], [PORTRAIT, "800×1280"], [NARROW, "600×960"]] as const) {
          await page.setViewportSize(size);
          await page.waitForFunction(() => new Promise((r) => requestAnimationFrame(() => r(true))));
          found.push(...(await partedFigures(`${lang} ${name} ${id}`)));
          if (id === "start-plan" && (await page.locator("#tab-inputs").isVisible())) {
            await page.locator("#tab-inputs").click();
            await page.locator("#pane-inputs").waitFor({ state: "visible" });
            found.push(...(await partedFigures(`${lang} ${name} ${id} inputs`)));
            await page.locator("#tab-plan").click();
          }
        }
      }
      await page.setViewportSize(LANDSCAPE);
      expect(found).toEqual([]);
    }, 600_000);
  }

  it("logged no console errors", () => {
    expect(problems).toEqual([]);
  });
});
