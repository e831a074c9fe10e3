/**
 * The planner's lines on screen in Hungarian and German (Chromium): Start plan's step cards give their why
 * lines in the language chosen, with the figures of the English lines, and the If wheels slip card of Cab
 * steps gives its headline and what to do in that language (screenshots: test-results/screenshots/lines-*).
 */
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { LANDSCAPE, launch, SHOTS } from "./browser.js";
import { guidance } from "../../src/i18n/en/guidance.js";
import { guidanceDe } from "../../src/i18n/de/guidance.js";
import { guidanceHu } from "../../src/i18n/hu/guidance.js";
import { stepsDe } from "../../src/i18n/de/steps.js";
import { stepsHu } from "../../src/i18n/hu/steps.js";

let context: BrowserContext;
let page: Page;
let profile: string;
let problems: string[] = [];
const base = inject("baseURL");

async function go(id: string): Promise<void> {
  await page.evaluate((h) => (location.hash = h), `#/${id}`);
  await page.waitForFunction((h) => location.hash === h, `#/${id}`);
  await page.waitForFunction(() => !document.querySelector("main .placeholder-text"), undefined, { timeout: 30_000 });
  if (id === "start-plan") await page.waitForSelector(".verdict:not(.stale)", { timeout: 60_000 });
}

/** The numbers of a line as the language writes them (grouping: "," in English, "." in German, a space in Hungarian), sorted. */
function figures(text: string, lang: "en" | "hu" | "de"): number[] {
  const plain = text.replace(/\u2212/g, "-");
  const pattern = lang === "en" ? /\d{1,3}(?:,\d{3})+(?:\.\d+)?|\d+(?:\.\d+)?/g : lang === "de" ? /\d{1,3}(?:\.\d{3})+(?:,\d+)?|\d+(?:,\d+)?/g : /\d{1,3}(?:[\u00a0 ]\d{3})+(?:,\d+)?|\d+(?:,\d+)?/g;
  return [...plain.matchAll(pattern)]
    .map((m) => (lang === "en" ? m[0].replace(/,/g, "") : lang === "de" ? m[0].replace(/\./g, "").replace(",", ".") : m[0].replace(/[\u00a0 ]/g, "").replace(",", ".")))
    .map(Number)
    .sort((a, b) => a - b);
}

beforeAll(async () => {
  profile = mkdtempSync(join(tmpdir(), "taut-lines-"));
  ({ context, page, problems } = await launch(inject("chromiumPath"), profile));
});

afterAll(async () => {
  await context?.close();
  if (profile) rmSync(profile, { recursive: true, force: true });
});

describe("the planner's lines on screen in three languages", () => {
  it("Start plan's why lines and the If wheels slip card in Hungarian and German, with the English figures", async () => {
    await page.setViewportSize(LANDSCAPE);
    await page.goto(base);
    await go("start-plan");
    const whyEn = await page.locator(".step-why").allTextContents();
    expect(whyEn.length).toBeGreaterThan(2);
    for (const [lang, name, g, st, word] of [
      ["hu", "Magyar", guidanceHu, stepsHu, /fokozat/],
      ["de", "Deutsch", guidanceDe, stepsDe, /Fahrstufe/],
    ] as const) {
      await go("settings");
      await page.getByRole("radio", { name }).click();
      await expect.poll(() => page.evaluate(() => document.documentElement.lang)).toBe(lang);
      await go("start-plan");
      const why = await page.locator(".step-why").allTextContents();
      expect(why.length, lang).toBe(whyEn.length);
      why.forEach((w, k) => {
        expect(w, lang).not.toBe(whyEn[k]);
        expect(w, lang).toMatch(word);
        expect(figures(w, lang), `${lang}: ${w}`).toEqual(figures(whyEn[k]!, "en"));
      });
      await page.screenshot({ path: join(SHOTS, `lines-${lang}-start-plan.png`) });
      // Cab steps: the slip card of the first step, in the language on screen.
      await go("cab-steps");
      await page.getByRole("button", { name: st.ifWheelsSlip as string }).click();
      const dialog = page.getByRole("dialog", { name: st.ifWheelsSlip as string });
      await dialog.waitFor();
      const notch = ((await page.locator(".cab-notch-value").textContent()) ?? "").trim();
      const hold = ((await dialog.locator(".slip-hold").textContent()) ?? "").trim();
      expect(hold, lang).toMatch(notch === "0" ? new RegExp(g.headNoPower as string) : new RegExp(`${notch}\\b`));
      expect(hold, lang).not.toMatch(/Hold notch|No power/);
      const text = (await dialog.textContent()) ?? "";
      expect(text, lang).toContain(g.driverHoldNotch as string);
      expect(text, lang).toContain(g.protectionCutsPower as string);
      expect(text, lang).not.toContain(guidance.en.driverHoldNotch);
      await page.screenshot({ path: join(SHOTS, `lines-${lang}-slip-card.png`) });
      await dialog.getByRole("button", { name: st.close as string }).first().click();
      await dialog.waitFor({ state: "detached" });
    }
    await go("settings");
    await page.getByRole("radio", { name: "English" }).click();
    expect(problems).toEqual([]);
  }, 300_000);
});
