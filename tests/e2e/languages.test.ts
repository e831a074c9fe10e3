/**
 * Taut in Hungarian and German in Chromium: the language chosen in Settings (and kept over a reload), a
 * screenshot of every screen in each language at 1280×800 and 800×1280 (test-results/screenshots/lang-*,
 * looked at by a person), the location card printed in each language with the note's name and its load
 * table (PDF text, pdfjs-dist), and pseudo-localised English — every message 40 % longer, with accented
 * letters — with no text overflowing a button or a labelled control at either size.
 */
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { LANDSCAPE, launch, PORTRAIT, SHOTS } from "./browser.js";
import { shell } from "../../src/i18n/en/shell.js";
import { shellDe } from "../../src/i18n/de/shell.js";
import { shellHu } from "../../src/i18n/hu/shell.js";
import { cardDe } from "../../src/i18n/de/card.js";
import { cardHu } from "../../src/i18n/hu/card.js";
import { card } from "../../src/i18n/en/card.js";
import { wordsDe } from "../../src/i18n/de/words.js";
import { wordsHu } from "../../src/i18n/hu/words.js";
import { departuresDe } from "../../src/i18n/de/departures.js";
import { departuresHu } from "../../src/i18n/hu/departures.js";
import { notesDe } from "../../src/i18n/de/notes.js";
import { notesHu } from "../../src/i18n/hu/notes.js";
import { trainDe } from "../../src/i18n/de/train.js";
import { assistDe } from "../../src/i18n/de/assist.js";
import { assistHu } from "../../src/i18n/hu/assist.js";
import { reviewDe } from "../../src/i18n/de/review.js";
import { reviewHu } from "../../src/i18n/hu/review.js";
import { notes } from "../../src/i18n/en/notes.js";
import { pseudoText } from "../../src/i18n/pseudo.js";
import { fileURLToPath } from "node:url";
import { trainHu } from "../../src/i18n/hu/train.js";
import { groupsDe } from "../../src/i18n/de/groups.js";
import { groupsHu } from "../../src/i18n/hu/groups.js";
import { cabDe } from "../../src/i18n/de/cab.js";
import { cabHu } from "../../src/i18n/hu/cab.js";
import { sketch } from "../../src/i18n/en/sketch.js";
import { sketchDe } from "../../src/i18n/de/sketch.js";
import { sketchHu } from "../../src/i18n/hu/sketch.js";
import { dispatch } from "../../src/i18n/en/dispatch.js";
import { dispatchDe } from "../../src/i18n/de/dispatch.js";
import { dispatchHu } from "../../src/i18n/hu/dispatch.js";

let context: BrowserContext;
let page: Page;
let profile: string;
let problems: string[] = [];
const base = inject("baseURL");

const SCREENS = ["start-plan", "cab-steps", "assistance-check", "departures", "load-table", "location-notes", "start-review", "settings"] as const;
/** A recorded start of the demo (illustrative), for Start review to show what it says. */
const RECORDING = fileURLToPath(new URL("../../profiles/recordings/demo-aggregate-ashvale-heavier.gpx", import.meta.url));
const TITLES = {
  en: [shell.en.screenStartPlan, shell.en.screenSettings],
  hu: [shellHu.screenStartPlan, shellHu.screenSettings],
  de: [shellDe.screenStartPlan, shellDe.screenSettings],
} as const;

async function go(id: string): Promise<void> {
  await page.evaluate((h) => (location.hash = h), `#/${id}`);
  await page.waitForFunction((h) => location.hash === h, `#/${id}`);
  // Lazy screens: wait for the loading line to go, then for the current plan where there is one.
  await page.waitForFunction(() => !document.querySelector("main .placeholder-text"), undefined, { timeout: 30_000 });
  if (id === "start-plan") await page.waitForSelector(".verdict:not(.stale)", { timeout: 60_000 });
  await page.waitForTimeout(300);
}

/** Visible buttons and labelled controls whose text runs past their box (scrollWidth over clientWidth). */
async function overflowing(label: string): Promise<string[]> {
  const found = await page.evaluate(() => {
    const out: string[] = [];
    const sel = "button, a.tab, [role=radio], [role=tab], label, .field-label, .chip, .toggle-label, .toggle-state, .verdict-word, .summary-word, h1, h2, h3";
    for (const el of document.querySelectorAll<HTMLElement>(sel)) {
      const cs = getComputedStyle(el);
      if (cs.display === "inline" || cs.visibility === "hidden" || el.closest(".visually-hidden, .notes-print-root")) continue;
      const r = el.getBoundingClientRect();
      if (r.width === 0 || r.height === 0) continue;
      if (el.scrollWidth > el.clientWidth + 1) out.push(`${el.tagName.toLowerCase()}.${el.className} "${(el.textContent ?? "").trim().slice(0, 50)}" (${el.scrollWidth} > ${el.clientWidth})`);
    }
    if (document.documentElement.scrollWidth > window.innerWidth + 1) out.push(`the page scrolls sideways (${document.documentElement.scrollWidth} > ${window.innerWidth})`);
    return out;
  });
  return found.map((f) => `${label}: ${f}`);
}

/**
 * Start review, reached from the first note's card (its button is `button`, the words of the language on
 * screen), with the demo recording reviewed, and kept with the note when `keep`.
 */
async function openReview(button: string, keep = false): Promise<void> {
  await go("location-notes");
  await page.locator(".notes-list .notes-item").first().locator("button.button").click({ timeout: 60_000 });
  await page.locator(".notes-card-view button", { hasText: button }).click();
  await page.locator("#review-h").waitFor({ timeout: 30_000 });
  await page.locator(".review-screen input[type=file]").setInputFiles(RECORDING);
  await page.locator(".review-result li").first().waitFor({ timeout: 120_000 });
  if (keep) {
    await page.locator(".review-form button.primary").click();
    await page.locator(".review-list li").first().waitFor({ timeout: 30_000 });
  }
  await page.waitForTimeout(300);
}

/** Start plan's inputs on screen (in portrait they are a pane behind a tab). */
async function showInputs(): Promise<void> {
  if (await page.locator("#tab-inputs").isVisible()) await page.locator("#tab-inputs").click();
  await page.locator("#pane-inputs").waitFor({ state: "visible" });
}

/** Screenshots of Start plan's locomotives and train sections (with the wagon groups), then back to the plan. */
async function inputsShot(file: string): Promise<void> {
  await showInputs();
  await page.locator('#pane-inputs .panel:has([data-field="locomotives[0].profile"])').screenshot({ path: join(SHOTS, file.replace("inputs", "locomotives")) });
  await page.locator('#pane-inputs .panel:has([data-field="train.coupling"])').screenshot({ path: join(SHOTS, file.replace("inputs", "train")) });
  if (await page.locator("#tab-plan").isVisible()) await page.locator("#tab-plan").click();
}

/** All text of a PDF, page by page (pdfjs-dist, legacy build for Node). */
async function pdfText(data: Uint8Array): Promise<string[]> {
  const P = Promise as unknown as { withResolvers?: unknown };
  if (!P.withResolvers)
    P.withResolvers = () => {
      let resolve!: (v: unknown) => void;
      let reject!: (e: unknown) => void;
      const promise = new Promise((a, b) => ((resolve = a), (reject = b)));
      return { promise, resolve, reject };
    };
  const pdfjs = await import("pdfjs-dist/legacy/build/pdf.mjs");
  const task = pdfjs.getDocument({ data, useSystemFonts: false });
  const doc = await task.promise;
  const pages: string[] = [];
  for (let k = 1; k <= doc.numPages; k++) {
    const tc = await (await doc.getPage(k)).getTextContent();
    pages.push(tc.items.map((i) => ("str" in i ? i.str : "")).join(" ").replace(/\s+/g, " "));
  }
  await task.destroy();
  return pages;
}

beforeAll(async () => {
  profile = mkdtempSync(join(tmpdir(), "taut-lang-"));
  ({ context, page, problems } = await launch(inject("chromiumPath"), profile));
});

afterAll(async () => {
  await context?.close();
  if (profile) rmSync(profile, { recursive: true, force: true });
});

describe("Taut in three languages", () => {
  it("switches to Hungarian and German in Settings, keeps the choice over a reload, and shows every screen (screenshots)", async () => {
    await page.goto(base);
    await go("start-plan");
    expect(await page.locator("a.tab").evaluateAll((els) => els.map((e) => e.querySelector(".visually-hidden")?.textContent ?? ""))).toEqual(expect.arrayContaining([...TITLES.en]));
    // A mixed train with a helper at the rear, so the wagon-groups form, a second locomotive group and Cab
    // steps' choice of driver are on screen in every language below (the draft is kept over reloads).
    await page.locator('[data-action="add-wagon-group"]').first().click();
    await page.locator(".panel", { has: page.locator('[data-field="locomotives[0].profile"]') }).locator("button.button:not(.subtle)").last().click();
    await page.locator('[data-field="locomotives[1].control"] [role=radio]').nth(2).click();
    await page.waitForSelector(".verdict:not(.stale)", { timeout: 60_000 });
    for (const [lang, name] of [["hu", "Magyar"], ["de", "Deutsch"]] as const) {
      await go("settings");
      await page.getByRole("radio", { name }).click();
      await expect.poll(() => page.locator("a.tab").evaluateAll((els) => els.map((e) => e.querySelector(".visually-hidden")?.textContent ?? ""))).toEqual(expect.arrayContaining([...TITLES[lang]]));
      expect(await page.evaluate(() => document.documentElement.lang)).toBe(lang);
      await page.reload();
      await go("start-plan");
      expect(await page.locator("a.tab").evaluateAll((els) => els.map((e) => e.querySelector(".visually-hidden")?.textContent ?? ""))).toEqual(expect.arrayContaining([...TITLES[lang]]));
      const verdict = (await page.locator(".verdict .verdict-word").textContent()) ?? "";
      const w = lang === "hu" ? wordsHu : wordsDe;
      expect([w.verdictStarts, w.verdictMarginal, w.verdictNeedsAssistance]).toContain(verdict);
      for (const [size, name2] of [[LANDSCAPE, "landscape"], [PORTRAIT, "portrait"]] as const) {
        await page.setViewportSize(size);
        for (const id of SCREENS) {
          if (id === "start-review") await openReview((lang === "hu" ? notesHu : notesDe).startReview as string, lang === "hu" && name2 === "landscape");
          else await go(id);
          if (id === "start-review") {
            const tv = lang === "hu" ? reviewHu : reviewDe;
            expect(await page.locator("#review-h").textContent()).toMatch(new RegExp(`^${tv.title}: `));
            expect(await page.locator(".review-result h3").first().textContent()).toBe(tv.shows);
            const said = (await page.locator(".review-result li").first().textContent()) ?? "";
            const opening = (m: unknown) => (m as string).split(" ").slice(0, 4).join(" ");
            expect([opening(tv.heavier), opening(tv.lighter)]).toContain(said.split(" ").slice(0, 4).join(" "));
            expect(await page.locator(".review-list li button").first().textContent()).toBe(tv.remove);
          }
          const tw = lang === "hu" ? trainHu : trainDe;
          if (id === "start-plan") {
            expect(await page.locator('[data-field="train.groups"] > .field-label').textContent()).toBe((lang === "hu" ? groupsHu : groupsDe).wagonGroups);
            expect(await page.locator('[data-field="locomotives[1].control"] [role=radio]').nth(2).textContent()).toContain(tw.helper);
            expect(await page.locator('[data-field="locomotives[1].position"] [role=radio]').nth(2).textContent()).toContain(tw.rear);
          }
          if (id === "assistance-check") {
            const ta = lang === "hu" ? assistHu : assistDe;
            expect(await page.locator("#margins-h").textContent()).toBe(ta.margins);
            expect(await page.locator('[data-field="added-unit"] .field-label').first().textContent()).toBe(ta.unitToAdd);
          }
          if (id === "cab-steps") expect(await page.locator(".cab-driver button").first().textContent()).toBe((lang === "hu" ? cabHu : cabDe).headDriver);
          if (id === "departures") expect(await page.locator("#load-h").textContent()).toBe((lang === "hu" ? departuresHu : departuresDe).loadHeading);
          if (id === "location-notes") expect(await page.locator(".notes-library .notes-row-actions button").first().textContent()).toBe((lang === "hu" ? notesHu : notesDe).newNote);
          await page.screenshot({ path: join(SHOTS, `lang-${lang}-${id}-${name2}.png`) });
          if (id === "start-plan") await inputsShot(`lang-${lang}-start-plan-inputs-${name2}.png`);
        }
      }
      await page.setViewportSize(LANDSCAPE);
    }
    expect(problems).toEqual([]);
  }, 300_000);

  it("prints the location card in each language with the note's name and its load table (PDF text)", async () => {
    for (const [lang, c, name, sk, place] of [
      ["en", card.en, "English", sketch.en, dispatch.en.atHead],
      ["hu", cardHu, "Magyar", sketchHu, dispatchHu.atHead],
      ["de", cardDe, "Deutsch", sketchDe, dispatchDe.atHead],
    ] as const) {
      await go("location-notes");
      // The first note's card button (its label is in the language on screen), and the note's name beside it.
      const item = page.locator(".notes-list .notes-item").first();
      const open = item.locator("button.button");
      await open.waitFor({ timeout: 60_000 });
      const note = ((await item.locator(".notes-item-name").textContent()) ?? "").trim();
      expect(note).not.toBe("");
      await open.click();
      await page.getByRole("radio", { name }).click();
      await page.locator(".notes-card-preview .notes-loadtable").waitFor({ timeout: 120_000 });
      const cells = await page.locator(".notes-card-preview .notes-loadtable tbody tr").first().locator("td").allTextContents();
      const text = (await pdfText(new Uint8Array(await page.pdf({ format: "A4" }))))[0]!;
      expect(text, lang).toContain(note);
      expect(text, lang).toContain(c.loadTable);
      expect(text, lang).toContain(c.largestMass);
      expect(text, lang).toContain(`${c.rail} ${c.withoutSand} ${c.withSand}`);
      // The first row: the dry rail's word in the language, then its two masses as the screen shows them.
      const dry = lang === "en" ? "Dry" : lang === "hu" ? wordsHu.railDry : wordsDe.railDry;
      expect(text, lang).toContain(`${dry} ${cells[0]} ${cells[1]}`);
      expect(cells[0]).toMatch(/\d/);
      // The profile's legend and the reference train's locomotives in the card's language too.
      expect(text, lang).toContain(sk.stretched as string);
      expect(text, lang).toContain(sk.hazard as string);
      expect(text, lang).toContain(` ${place as string}`);
      // Back to the library (the card view's last button).
      await page.locator(".notes-card-view .notes-row-actions button").last().click();
    }
    // Back to the device's language for the next test.
    await go("settings");
    await page.getByRole("radio", { name: "English" }).click();
  }, 300_000);

  it("pseudo-localised (40 % longer, accented): no text runs past a button or a labelled control at 1280×800 or 800×1280", async () => {
    await page.evaluate(() => localStorage.setItem("taut.pseudo", "1"));
    await page.reload();
    const found: string[] = [];
    for (const [size, name] of [[LANDSCAPE, "landscape"], [PORTRAIT, "portrait"]] as const) {
      await page.setViewportSize(size);
      for (const id of SCREENS) {
        if (id === "start-review") await openReview(pseudoText(notes.en.startReview));
        else await go(id);
        found.push(...(await overflowing(`${id} ${name}`)));
        await page.screenshot({ path: join(SHOTS, `lang-pseudo-${id}-${name}.png`) });
        if (id === "start-plan") {
          // In portrait the inputs are a pane of their own: measure them there too.
          await showInputs();
          found.push(...(await overflowing(`${id} inputs ${name}`)));
          await inputsShot(`lang-pseudo-start-plan-inputs-${name}.png`);
        }
      }
    }
    await page.evaluate(() => localStorage.removeItem("taut.pseudo"));
    expect(found).toEqual([]);
  }, 300_000);
});
