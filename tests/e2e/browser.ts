/**
 * What every browser test shares: Debian's Chromium launched headless on a fresh profile, the page's
 * console errors collected, axe-core's serious and critical findings, and the 48 px touch-target check.
 */
import { mkdirSync, readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { fileURLToPath } from "node:url";
import { chromium, type BrowserContext, type Page } from "playwright-core";

const require = createRequire(import.meta.url);
const AXE = readFileSync(require.resolve("axe-core/axe.min.js"), "utf8");

/** Screenshots are test artefacts (gitignored). */
export const SHOTS = fileURLToPath(new URL("../../test-results/screenshots/", import.meta.url));
/** Chromium flags for this machine: headless, no sandbox (root), no GPU, no background network. */
export const ARGS = ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"];
export const LANDSCAPE = { width: 1280, height: 800 };
export const PORTRAIT = { width: 800, height: 1280 };

export interface Browser {
  context: BrowserContext;
  page: Page;
  /** Console errors and uncaught page errors seen so far (a test expects none). */
  problems: string[];
}

/** Launch Chromium on a fresh profile folder and open one page that records its errors. */
export async function launch(chromiumPath: string, profileDir: string, options: Parameters<typeof chromium.launchPersistentContext>[1] = {}): Promise<Browser> {
  mkdirSync(SHOTS, { recursive: true });
  const context = await chromium.launchPersistentContext(profileDir, { executablePath: chromiumPath, headless: true, args: ARGS, viewport: LANDSCAPE, ...options });
  const page = context.pages()[0] ?? (await context.newPage());
  const problems: string[] = [];
  page.on("console", (m) => {
    if (m.type() === "error") problems.push(`console: ${m.text()}`);
  });
  page.on("pageerror", (e) => problems.push(`page error: ${e.message}`));
  return { context, page, problems };
}

/** axe-core's serious and critical violations on the page as it is now, one line each. */
export async function axeSeriousOrCritical(page: Page, label: string): Promise<string[]> {
  const has = await page.evaluate(() => typeof (window as unknown as { axe?: unknown }).axe !== "undefined");
  if (!has) await page.addScriptTag({ content: AXE });
  const found = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (ctx: Document, opts: object) => Promise<{ violations: Array<{ id: string; impact: string; help: string; nodes: Array<{ target: string[] }> }> }> } }).axe;
    const r = await axe.run(document, { resultTypes: ["violations"] });
    return r.violations.filter((v) => v.impact === "serious" || v.impact === "critical").map((v) => `${v.id} (${v.impact}): ${v.help} — ${v.nodes.slice(0, 3).map((n) => n.target.join(" ")).join("; ")}`);
  });
  return found.map((f) => `${label}: ${f}`);
}

/** Visible controls smaller than 48 × 48 CSS px (file inputs hidden behind their buttons are not targets). */
export async function smallTargets(page: Page, label: string): Promise<string[]> {
  const small = await page.evaluate(() => {
    const out: string[] = [];
    for (const el of document.querySelectorAll<HTMLElement>("button, a[href], input, select, textarea, [role=radio], [role=tab]")) {
      if (el.classList.contains("visually-hidden")) continue;
      const r = el.getBoundingClientRect();
      if (r.width === 0 || r.height === 0 || getComputedStyle(el).visibility === "hidden") continue;
      if (r.width < 47.5 || r.height < 47.5) out.push(`${el.tagName.toLowerCase()} "${(el.getAttribute("aria-label") ?? el.textContent ?? "").trim().slice(0, 40)}" (${Math.round(r.width)}×${Math.round(r.height)})`);
    }
    return out;
  });
  return small.map((s) => `${label}: touch target under 48 px: ${s}`);
}
