/**
 * The built app in Debian's Chromium: first plan on load, Cab steps and If wheels slip, units and theme,
 * accessibility (axe-core), screenshots at 1280×800 and 800×1280, offline reload through the service
 * worker, and no console errors. Timing figures are printed, not asserted.
 */
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { axeSeriousOrCritical, LANDSCAPE, launch, PORTRAIT, SHOTS, smallTargets } from "./browser.js";


let context: BrowserContext;
let page: Page;
let profile: string;
let problems: string[] = [];
const base = inject("baseURL");

/** Records long main-thread tasks (≥ 50 ms) with their start times, from the first byte on. */
const LONG_TASKS = `
  window.__longTasks = [];
  try {
    new PerformanceObserver((list) => {
      for (const e of list.getEntries()) window.__longTasks.push({ start: e.startTime, duration: e.duration });
    }).observe({ type: "longtask", buffered: true });
  } catch (e) {}
`;

async function shot(name: string): Promise<void> {
  await page.screenshot({ path: join(SHOTS, `${name}.png`) });
}

async function openScreen(name: string): Promise<void> {
  const tab = page.getByRole("link", { name, exact: true });
  await tab.click();
}

async function waitForCurrentPlan(): Promise<void> {
  await page.waitForSelector(".verdict:not(.stale)", { timeout: 30_000 });
  await page.waitForFunction(() => !document.querySelector('.result[aria-busy="true"]'), undefined, { timeout: 30_000 });
}

beforeAll(async () => {
  profile = mkdtempSync(join(tmpdir(), "taut-chromium-"));
  ({ context, page, problems } = await launch(inject("chromiumPath"), profile, { serviceWorkers: "allow" }));
  await context.addInitScript({ content: LONG_TASKS });
});

afterAll(async () => {
  await context?.close();
  if (profile) rmSync(profile, { recursive: true, force: true });
});

describe("Taut in Chromium", () => {
  it("shows a plan for the demo case right after load", async () => {
    await page.goto(base);
    await waitForCurrentPlan();
    const word = await page.locator(".verdict .verdict-word").textContent();
    expect(["Starts", "Marginal", "Needs assistance"]).toContain(word);
    expect(await page.locator(".verdict svg.verdict-icon").getAttribute("data-shape")).toMatch(/circle|triangle|square/);
    await page.waitForFunction(() => performance.getEntriesByName("taut:first-live-plan").length > 0, undefined, { timeout: 30_000 });
    const first = await page.evaluate(() => {
      const m = performance.getEntriesByName("taut:first-plan")[0] as PerformanceMark | undefined;
      const live = performance.getEntriesByName("taut:first-live-plan")[0] as PerformanceMark | undefined;
      const at = (name: string) => performance.getEntriesByName(name)[0]?.startTime ?? Number.NaN;
      return {
        at: m?.startTime ?? Number.NaN,
        fromBuild: (m?.detail as { fromBuild?: boolean } | undefined)?.fromBuild === true,
        liveAt: live?.startTime ?? Number.NaN,
        workerMs: (live?.detail as { workerMs?: number } | undefined)?.workerMs ?? Number.NaN,
        workerAt: at("taut:worker-created"),
      };
    });
    console.log(
      `[measure] load to first plan on screen: ${first.at.toFixed(0)} ms (${first.fromBuild ? "the demo plan worked out at build time" : "from the worker"}); live plan from the worker at ${first.liveAt.toFixed(0)} ms (worker started at ${first.workerAt.toFixed(0)} ms, planner in the worker ${first.workerMs.toFixed(0)} ms); first visit, cold caches, browser just started`,
    );
    // A first visit opens on the demo: its plan is there from the first render.
    expect(first.fromBuild).toBe(true);
    expect(first.at).toBeGreaterThan(0);
    expect(first.liveAt).toBeGreaterThanOrEqual(first.at);
    await page.getByText("Illustrative demo data", { exact: false }).waitFor();
  });

  it("keeps the main thread free while planning", async () => {
    await page.evaluate(() => ((window as unknown as { __longTasks: unknown[] }).__longTasks.length = 0));
    // Tapped from inside the page, so the test tool's own element lookup is not counted as the app's work.
    const t0 = await page.evaluate(() => {
      const now = performance.now();
      (document.querySelector('[aria-label="Trailing mass: more"]') as HTMLButtonElement).click();
      return now;
    });
    await page.waitForSelector(".verdict.stale", { timeout: 5_000 }).catch(() => undefined);
    await waitForCurrentPlan();
    const t1 = await page.evaluate(() => performance.now());
    const tasks = await page.evaluate(() => (window as unknown as { __longTasks: Array<{ start: number; duration: number }> }).__longTasks);
    const during = tasks.filter((t) => t.start >= t0 && t.start <= t1);
    const longest = during.reduce((m, t) => Math.max(m, t.duration), 0);
    console.log(`[measure] replan after an edit: ${(t1 - t0).toFixed(0)} ms; long tasks while planning: ${during.length}, longest ${longest.toFixed(0)} ms (none ≥ 50 ms reads 0)`);
    await page.getByRole("button", { name: "Trailing mass: less" }).click();
    await waitForCurrentPlan();
  });

  it("steps through Cab steps and opens If wheels slip from every step", async () => {
    const cards = await page.locator(".step-card").count();
    const notches = await page.locator(".step-card .notch-value").allTextContents();
    const fallbacks = await page.locator(".step-card").evaluateAll((els) => els.map((el) => /drop to notch (\d+)/.exec([...el.querySelectorAll(".figures div")].find((d) => d.textContent?.startsWith("Slip keeps returning"))?.textContent ?? "")?.[1] ?? ""));
    await page.getByRole("button", { name: "Open Cab steps" }).click();
    await page.waitForSelector(".cab");
    expect(await page.locator(".tabs").count()).toBe(0);
    if (cards === 0) {
      // A plan without steps says so, and still offers the slip guidance.
      await page.getByText("This plan has no notch steps to show.").waitFor();
    }
    for (let i = 0; i < cards; i++) {
      await expect.poll(() => page.locator(".cab-count").textContent()).toMatch(new RegExp(`^Step ${i + 1} of ${cards}`));
      expect(await page.locator(".cab-notch-value").textContent()).toBe(notches[i]);
      await page.getByRole("button", { name: "If wheels slip" }).click();
      const dialog = page.getByRole("dialog", { name: "If wheels slip" });
      await dialog.waitFor();
      // Hold first; the fallback notch only when there is a lower one to drop to.
      expect(await dialog.locator(".slip-hold").textContent()).toMatch(new RegExp(`Hold notch ${notches[i]}|No power`));
      expect(fallbacks[i] === "" ? await dialog.locator(".fallback-notch").count() : await dialog.locator(".fallback-notch").textContent()).toBe(fallbacks[i] === "" ? 0 : fallbacks[i]);
      if (i === 1) {
        await page.setViewportSize(LANDSCAPE);
        await shot("slip-card-landscape-day");
        await page.setViewportSize(PORTRAIT);
        await shot("slip-card-portrait-day");
        problems.push(...(await axeSeriousOrCritical(page, "If wheels slip")));
        await page.setViewportSize(LANDSCAPE);
      }
      await dialog.getByRole("button", { name: "Close" }).click();
      await dialog.waitFor({ state: "detached" });
      if (i === Math.min(1, cards - 1)) {
        await shot("cab-steps-landscape-day");
        await page.setViewportSize(PORTRAIT);
        await shot("cab-steps-portrait-day");
        problems.push(...(await axeSeriousOrCritical(page, "Cab steps")));
        await page.setViewportSize(LANDSCAPE);
      }
      if (i < cards - 1) await page.getByRole("button", { name: "Next" }).click();
    }
    const clock = await page.locator(".cab-clock span").first().textContent();
    expect(clock).toMatch(/^\d+:\d\d$/);
    await page.getByRole("button", { name: cards > 0 ? "Done" : "Start plan" }).first().click();
    await page.waitForSelector('[data-screen="start-plan"]');
  });

  it("takes screenshots of Start plan and Settings in both orientations and themes, with no serious accessibility violations", async () => {
    for (const theme of ["Day", "Night"] as const) {
      await openScreen("Settings");
      await page.getByRole("radio", { name: theme, exact: true }).click();
      const t = theme.toLowerCase();
      await page.setViewportSize(LANDSCAPE);
      await shot(`settings-landscape-${t}`);
      problems.push(...(await axeSeriousOrCritical(page, `Settings (${t})`)));
      problems.push(...(await smallTargets(page, `Settings, landscape (${t})`)));
      await openScreen("Start plan");
      await waitForCurrentPlan();
      await shot(`start-plan-landscape-${t}`);
      problems.push(...(await axeSeriousOrCritical(page, `Start plan (${t})`)));
      problems.push(...(await smallTargets(page, `Start plan, landscape (${t})`)));
      await page.locator(".pane-plan").evaluate((el) => el.scrollTo(0, el.scrollHeight));
      await page.waitForFunction(() => [...document.querySelectorAll(".chart-box")].every((b) => (b as HTMLElement).dataset.drawn === "yes"), undefined, { timeout: 15_000 });
      await page.waitForTimeout(300); // the worker's last frame reaches the screen
      await shot(`start-plan-charts-landscape-${t}`);
      const figures = page.locator("figure.chart");
      for (let k = 0; k < (await figures.count()); k++) {
        await figures.nth(k).scrollIntoViewIfNeeded();
        await page.waitForTimeout(150);
        await figures.nth(k).screenshot({ path: join(SHOTS, `chart-${k + 1}-${t}.png`) });
      }
      await page.locator(".pane-plan").evaluate((el) => el.scrollTo(0, 0));
      await page.setViewportSize(PORTRAIT);
      await shot(`start-plan-portrait-${t}`);
      await page.getByRole("tab", { name: /Inputs/ }).click();
      await shot(`start-plan-inputs-portrait-${t}`);
      problems.push(...(await axeSeriousOrCritical(page, `Start plan inputs, portrait (${t})`)));
      problems.push(...(await smallTargets(page, `Start plan inputs, portrait (${t})`)));
      await page.locator(".pane-inputs").evaluate((el) => el.scrollTo(0, el.scrollHeight));
      await shot(`start-plan-inputs-end-portrait-${t}`);
      await page.getByRole("tab", { name: /Plan/ }).click();
      await page.getByRole("button", { name: "Open Cab steps" }).click();
      await shot(`cab-steps-portrait-${t}`);
      problems.push(...(await smallTargets(page, `Cab steps, portrait (${t})`)));
      await page.setViewportSize(LANDSCAPE);
      await shot(`cab-steps-landscape-${t}`);
      await page.getByRole("button", { name: "Start plan" }).first().click();
    }
    expect(await page.evaluate(() => document.documentElement.dataset.theme)).toBe("night");
    const bg = await page.evaluate(() => getComputedStyle(document.body).backgroundColor);
    const [r, g, b] = (bg.match(/\d+/g) ?? []).map(Number);
    expect((r! + g! + b!) / 3).toBeLessThan(40);
  });

  it("switches every figure and input to US customary units and back", async () => {
    await openScreen("Start plan");
    await waitForCurrentPlan();
    const massInput = page.getByLabel(/^Trailing mass/).and(page.locator("input"));
    const tonnes = Number(await massInput.inputValue());
    await openScreen("Settings");
    await page.getByRole("radio", { name: /US customary/ }).click();
    await openScreen("Start plan");
    await waitForCurrentPlan();
    expect(Number(await massInput.inputValue())).toBe(Math.round((tonnes * 1000) / 907.18474));
    const plan = (await page.locator(".pane-plan").textContent()) ?? "";
    expect(plan).toContain("klbf");
    expect(plan).toContain("short tons");
    expect(plan).not.toMatch(/\d kN\b/);
    await shot("start-plan-landscape-night-us");
    // Typed in US units: 2000 short tons is 1814.37 t in the case.
    await massInput.fill("2000");
    await waitForCurrentPlan();
    await openScreen("Settings");
    await page.getByRole("radio", { name: /Metric/ }).click();
    await openScreen("Start plan");
    expect(await massInput.inputValue()).toBe("1814");
    await massInput.fill(String(tonnes));
    await waitForCurrentPlan();
  });

  it("works offline after the first visit: reloads from the service worker and still plans", async () => {
    await page.evaluate(async () => {
      await navigator.serviceWorker.ready;
    });
    // The page is controlled from the next navigation on.
    await page.reload();
    await page.waitForFunction(() => navigator.serviceWorker.controller !== null, undefined, { timeout: 20_000 });
    const status = page.locator(".offline-status");
    await status.getByText("Ready offline", { exact: true }).waitFor({ timeout: 20_000 });
    // The network goes away: every request that reaches it fails as with a lost connection. Requests the
    // service worker answers from its copy never reach it. (Not the browser's "offline" emulation: whether it
    // also sets navigator.onLine differs between versions, and the app must not rest on that flag anyway.)
    const failed: string[] = [];
    const problemsBefore = problems.length;
    await context.route("**/*", (route) => {
      failed.push(`${route.request().method()} ${route.request().url()}`);
      return route.abort("internetdisconnected");
    });
    const mass = page.getByLabel(/^Trailing mass/).and(page.locator("input"));
    try {
      await page.reload();
      await waitForCurrentPlan();
      // The app saw for itself that its server did not answer, and says so.
      await page.waitForSelector('.offline-status[title^="No answer from the server at"]', { timeout: 30_000 });
      expect(await status.textContent()).toBe("Offline — working from the saved copy");
      expect(failed.some((f) => f.startsWith("HEAD "))).toBe(true);
      // A fresh plan, computed offline by a worker loaded from the cache, for a changed input.
      const before = Number(await mass.inputValue());
      const planBefore = await page.locator(".pane-plan").textContent();
      await page.getByRole("button", { name: "Trailing mass: more" }).click();
      expect(Number(await mass.inputValue())).toBeGreaterThan(before);
      await page.waitForFunction(
        (old) => {
          const done = document.querySelector(".verdict:not(.stale)") && !document.querySelector('.result[aria-busy="true"]');
          return done && document.querySelector(".pane-plan")?.textContent !== old;
        },
        planBefore,
        { timeout: 30_000 },
      );
      await shot("start-plan-offline-landscape");
      // The charts (their chunk, loaded after the verdict, and the chart worker) and a job beyond the plan (the
      // planner worker's jobs chunk, loaded on first use) come from the saved copy too.
      await page.locator("figure.chart").first().scrollIntoViewIfNeeded();
      await page.waitForFunction(() => [...document.querySelectorAll(".chart-box")].every((b) => (b as HTMLElement).dataset.drawn === "yes"), undefined, { timeout: 30_000 });
      await page.getByRole("link", { name: "Assistance check", exact: true }).click();
      await page.waitForSelector(".starts-already, .option-card, .nothing-works", { timeout: 90_000 });
      await page.getByRole("link", { name: "Start plan", exact: true }).click();
      await waitForCurrentPlan();
      // Nothing the app is made of had to come from the network (only the app's checks, and the browser's own
      // check for a new service worker, may have tried).
      expect(failed.filter((f) => !f.startsWith("HEAD ") && !/\/sw\.js$/.test(f))).toEqual([]);
    } finally {
      await context.unroute("**/*");
      // The browser logs each failed request as an error; the app's checks of a network that is gone are expected to fail.
      const lost = "console: Failed to load resource: net::ERR_INTERNET_DISCONNECTED";
      problems.splice(problemsBefore, problems.length - problemsBefore, ...problems.slice(problemsBefore).filter((p) => p !== lost));
    }
    // The network is back: the check at load gets an answer.
    await page.reload();
    await waitForCurrentPlan();
    await page.waitForSelector('.offline-status[title^="The server answered at"]', { timeout: 30_000 });
    expect(await status.textContent()).toBe("Ready offline");
  });

  it("loads again from the caches quickly (repeat visit)", async () => {
    await page.reload();
    await waitForCurrentPlan();
    const at = await page.evaluate(() => performance.getEntriesByName("taut:first-plan")[0]?.startTime ?? Number.NaN);
    console.log(`[measure] repeat visit, load to first plan on screen: ${at.toFixed(0)} ms`);
    expect(at).toBeGreaterThan(0);
  });

  it("logged no console errors, and axe found no serious or critical violations", () => {
    expect(problems).toEqual([]);
  });
});
