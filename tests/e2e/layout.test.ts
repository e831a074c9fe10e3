/**
 * Every screen in Hungarian, German and pseudo-localised English (every message 40 % longer, accented)
 * at 800×1280 and 1280×800 — with Cab steps' slip card, a location note opened in the editor, the railML
 * import form with a file read and its stretch shown, a location card and Start review — as the user sees it: no text running past its box (a button, a tab, a card, a
 * table cell, a heading, a line of text: scrollWidth over clientWidth), the page never scrolling sideways,
 * and no word broken inside itself on a tab or a button (a line may end inside a word only at a soft hyphen
 * or after a hyphen the word carries). The tab bar also at 600×960, the narrowest width the app supports
 * (a 7-inch tablet in portrait). One browser, one page, the screens' own content waited for.
 * Screenshots: test-results/screenshots/layout-* (the note editor and the railML form also scrolled down,
 * layout-*-2.png, -3.png…, for a person to look at).
 */
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { LANDSCAPE, launch, PORTRAIT, SHOTS } from "./browser.js";
import { notes } from "../../src/i18n/en/notes.js";
import { notesDe } from "../../src/i18n/de/notes.js";
import { notesHu } from "../../src/i18n/hu/notes.js";
import { pseudoText } from "../../src/i18n/pseudo.js";
import { chain, railmlFile } from "../tools/railml.js";

let context: BrowserContext;
let page: Page;
let profile: string;
let work: string;
let railml: string;
let problems: string[] = [];
const base = inject("baseURL");
/** The narrowest screen the app supports: a 7-inch tablet in portrait (600 CSS px). */
const NARROW = { width: 600, height: 960 };
const RECORDING = fileURLToPath(new URL("../../profiles/recordings/demo-aggregate-ashvale-heavier.gpx", import.meta.url));
const DEMO_DAY = fileURLToPath(new URL("../../profiles/departures/demo-day.csv", import.meta.url));

/** The Location notes words the test clicks by, in the language on screen. */
interface NotesWords {
  startReview: string;
  backToLibrary: string;
  importRailml: string;
}
const wordsOf = (m: Record<string, unknown>, f: (x: string) => string = (x) => x): NotesWords => ({
  startReview: f(m.startReview as string),
  backToLibrary: f(m.backToLibrary as string),
  importRailml: f(m.importRailml as string),
});

/**
 * A railML line written by the test (tests/tools/railml.ts) whose import says much: an operational point
 * with a long name, changes without a dir (a warning), curves, a speed limit and signals (hazards offered).
 */
function railmlLine(): string {
  const [a, b, c] = chain([1200, 1500, 1300], 31_000);
  a!.name = "Lower through line";
  a!.gradients = [{ pos: 0, value: 4 }];
  a!.radii = [{ pos: 0, dir: "up", value: 0 }, { pos: 700, dir: "up", value: 650 }];
  b!.gradients = [{ pos: 0, dir: "up", value: 4 }, { pos: 600, dir: "up", value: 11.5 }];
  b!.radii = [{ pos: 0, dir: "up", value: 0 }, { pos: 900, dir: "up", value: -420 }, { pos: 1300, dir: "up", value: 0 }];
  b!.speeds = [{ pos: 0, dir: "up", value: 40 }];
  b!.signals = [{ id: "sig-b1", pos: 450, dir: "up", name: "Exit signal B1" }];
  b!.levelCrossings = [{ id: "lc-b", pos: 1100 }];
  b!.crossSections = [{ id: "cs1", pos: 300, ocpRef: "ocp1" }];
  c!.gradients = [{ pos: 0, dir: "up", value: 11.5 }, { pos: 500, dir: "up", value: 2 }];
  c!.radii = [{ pos: 0, dir: "up", value: 0 }];
  return railmlFile({ tracks: [a!, b!, c!], ocps: [{ id: "ocp1", name: "Thistlemoor freight loop north exit (invented)" }] });
}

async function go(id: string): Promise<void> {
  await page.evaluate((h) => (location.hash = h), `#/${id}`);
  await page.waitForFunction((id) => document.querySelector(`main[data-screen="${id}"]`) && !document.querySelector("main .placeholder-text"), id, { timeout: 30_000 });
}

/** The screen's own content, once it is there (the figures it works out, not a timer). */
const READY: Record<string, string> = {
  "start-plan": ".verdict:not(.stale)",
  "cab-steps": ".cab",
  "assistance-check": ".margins-table tbody td",
  departures: ".departures-table tbody tr",
  "load-table": ".load-table-grid td",
  "location-notes": ".notes-list .notes-item",
  settings: ".settings",
};

/**
 * What runs past its box on the page as it is now: every visible element with text or a box of its own
 * (inline text is measured by its block), and the page's width; plus words broken inside themselves on the
 * tabs and buttons.
 */
async function layoutProblems(label: string): Promise<string[]> {
  const found = await page.evaluate(() => {
    const out: string[] = [];
    const name = (el: Element) => `${el.tagName.toLowerCase()}${el.classList.length ? "." + [...el.classList].join(".") : ""} "${(el.textContent ?? "").replace(/\u00ad/g, "").trim().slice(0, 40)}"`;
    const visible = (el: HTMLElement) => {
      if (el.closest(".visually-hidden, .notes-print-root, [hidden], canvas, svg")) return false;
      const cs = getComputedStyle(el);
      if (cs.display === "none" || cs.display === "inline" || cs.display === "contents" || cs.visibility === "hidden") return false;
      const r = el.getBoundingClientRect();
      if (r.width === 0 || r.height === 0) return false;
      // Inside a box clipped to a pixel (a table's header hidden for the eye, kept for screen readers).
      for (let a: HTMLElement | null = el; a; a = a.parentElement) {
        const ar = a.getBoundingClientRect();
        if ((ar.width <= 1 || ar.height <= 1) && getComputedStyle(a).overflow !== "visible") return false;
      }
      return true;
    };
    for (const el of document.querySelectorAll<HTMLElement>("body *")) {
      if (!visible(el) || el.tagName === "INPUT" || el.tagName === "SELECT" || el.tagName === "TEXTAREA" || el.tagName === "CANVAS") continue;
      const cs = getComputedStyle(el);
      // A container meant to scroll (a wide table in its scroller) scrolls; what is inside it must still fit its own box.
      if (cs.overflowX === "auto" || cs.overflowX === "scroll") continue;
      if (el.scrollWidth > el.clientWidth + 1) out.push(`runs past its box: ${name(el)} (${el.scrollWidth} > ${el.clientWidth})`);
    }
    if (document.documentElement.scrollWidth > window.innerWidth + 1) out.push(`the page scrolls sideways (${document.documentElement.scrollWidth} > ${window.innerWidth})`);
    // Words broken inside themselves on tabs and buttons: walk each word's letters; a new line may start
    // only after a soft hyphen or a hyphen the word carries.
    for (const el of document.querySelectorAll<HTMLElement>("a.tab, button, [role=radio], [role=tab]")) {
      if (!visible(el)) continue;
      const walker = document.createTreeWalker(el, NodeFilter.SHOW_TEXT);
      for (let n = walker.nextNode(); n; n = walker.nextNode()) {
        const text = n.textContent ?? "";
        for (const m of text.matchAll(/[^\s]+/g)) {
          let lastTop: number | null = null;
          let prev = "";
          for (let k = m.index; k < m.index + m[0].length; k++) {
            const ch = text[k]!;
            const range = document.createRange();
            range.setStart(n, k);
            range.setEnd(n, k + 1);
            // A letter after a soft hyphen that ends a line also reports the hyphen's box: its own is the last.
            const r = [...range.getClientRects()].filter((x) => x.width > 0).pop();
            if (!r) {
              prev = ch;
              continue;
            }
            if (lastTop !== null && r.top > lastTop + 2 && prev !== "\u00ad" && prev !== "-" && prev !== "/" && prev !== "–") {
              out.push(`word broken inside itself: ${name(el)} at "${m[0].replace(/\u00ad/g, "")}"`);
              break;
            }
            lastTop = r.top;
            prev = ch;
          }
        }
      }
    }
    return out;
  });
  return found.map((f) => `${label}: ${f}`);
}

async function look(label: string, file: string, pages = 1): Promise<string[]> {
  const screenBox = page.locator(".screen");
  await screenBox.evaluate((el) => el.scrollTo(0, 0));
  await page.screenshot({ path: join(SHOTS, `layout-${file}.png`) });
  // A long form, also a screenful further down each time (for a person to look at; the checks measure the whole page).
  for (let k = 2; k <= pages; k++) {
    const moved = await screenBox.evaluate((el) => {
      const before = el.scrollTop;
      el.scrollBy(0, el.clientHeight - 80);
      return el.scrollTop > before;
    });
    if (!moved) break;
    await page.screenshot({ path: join(SHOTS, `layout-${file}-${k}.png`) });
  }
  await screenBox.evaluate((el) => el.scrollTo(0, 0));
  return layoutProblems(label);
}

/** Every screen at the size the page has now, in the language on screen. */
async function everyScreen(lang: string, size: string, w: NotesWords): Promise<string[]> {
  const found: string[] = [];
  const at = (id: string) => `${lang} ${size} ${id}`;
  for (const id of ["start-plan", "cab-steps", "assistance-check", "departures", "load-table", "location-notes", "settings"]) {
    await go(id);
    await page.waitForSelector(READY[id]!, { timeout: 120_000 });
    if (id === "load-table") await page.waitForFunction(() => document.querySelectorAll(".load-table-grid td:not(.waiting)").length === 12, undefined, { timeout: 120_000 });
    if (id === "assistance-check") await page.waitForSelector(".starts-already, .option-card, .nothing-works", { timeout: 120_000 });
    found.push(...(await look(at(id), `${lang}-${id}-${size}`)));
    if (id === "start-plan" && (await page.locator("#tab-inputs").isVisible())) {
      // In portrait the inputs are a pane of their own.
      await page.locator("#tab-inputs").click();
      await page.locator("#pane-inputs").waitFor({ state: "visible" });
      found.push(...(await look(at("start-plan inputs"), `${lang}-start-plan-inputs-${size}`)));
      await page.locator("#tab-plan").click();
    }
    if (id === "cab-steps") {
      // The If wheels slip card over the step.
      await page.locator(".cab-top .slip-button").click();
      const dialog = page.locator(".slip-card[role=dialog]");
      await dialog.waitFor();
      found.push(...(await look(at("slip card"), `${lang}-slip-card-${size}`)));
      await dialog.locator("button").last().click();
      await dialog.waitFor({ state: "detached" });
    }
    if (id === "location-notes") {
      // The first note opened in the editor (its load table worked out).
      await page.locator(".notes-list .notes-item .notes-item-open").first().click();
      await page.locator(".notes-editor .notes-loadtable").waitFor({ timeout: 120_000 });
      found.push(...(await look(at("note editor"), `${lang}-note-editor-${size}`, 8)));
      await page.locator(".notes-editor button", { hasText: w.backToLibrary }).first().click();
      await page.locator(".notes-list .notes-item").first().waitFor({ timeout: 30_000 });
      // The railML import form: a file read, the front at its operational point, the stretch shown.
      await page.locator(".notes-library button", { hasText: w.importRailml }).click();
      await page.locator(".notes-railml input[type=file]").setInputFiles(railml);
      await page.locator(".notes-railml-segs tbody tr").first().waitFor({ timeout: 60_000 });
      await page.locator(".notes-railml-preview svg").first().waitFor({ timeout: 60_000 });
      found.push(...(await look(at("railML import"), `${lang}-railml-import-${size}`, 5)));
      await page.locator(".notes-railml button", { hasText: w.backToLibrary }).first().click();
      await page.locator(".notes-list .notes-item").first().waitFor({ timeout: 30_000 });
      // The first note's card (its load table worked out), then Start review of a recording from it.
      await page.locator(".notes-list .notes-item").first().locator("button.button").click();
      await page.locator(".notes-card-preview .notes-loadtable").waitFor({ timeout: 120_000 });
      found.push(...(await look(at("location card"), `${lang}-location-card-${size}`)));
      await page.locator(".notes-card-view button", { hasText: w.startReview }).click();
      await page.locator("#review-h").waitFor({ timeout: 30_000 });
      await page.locator(".review-screen input[type=file]").setInputFiles(RECORDING);
      await page.locator(".review-result li").first().waitFor({ timeout: 120_000 });
      found.push(...(await look(at("start-review"), `${lang}-start-review-${size}`)));
    }
  }
  return found;
}

/** The tab bar at the narrowest width the app supports. */
async function narrowTabs(lang: string): Promise<string[]> {
  await page.setViewportSize(NARROW);
  await go("start-plan");
  await page.waitForSelector(READY["start-plan"]!, { timeout: 60_000 });
  await page.locator("nav.tabs").screenshot({ path: join(SHOTS, `layout-${lang}-tabs-600.png`) });
  const found = await layoutProblems(`${lang} 600×960 tabs`);
  // The tabs stay large enough for a gloved finger.
  const small = await page.locator("a.tab").evaluateAll((els) => els.map((e) => e.getBoundingClientRect()).filter((r) => r.width < 48 || r.height < 48).length);
  if (small > 0) found.push(`${lang} 600×960: ${small} tabs under 48 px`);
  return found.filter((f) => f.includes("a.tab") || f.includes("span.tab-label") || f.includes("nav.tabs") || f.includes("under 48 px") || f.includes("sideways"));
}

beforeAll(async () => {
  profile = mkdtempSync(join(tmpdir(), "taut-layout-"));
  work = mkdtempSync(join(tmpdir(), "taut-layout-files-"));
  railml = join(work, "thistlemoor-line.xml");
  writeFileSync(railml, railmlLine());
  ({ context, page, problems } = await launch(inject("chromiumPath"), profile));
  await page.goto(base);
  await go("start-plan");
  await page.waitForSelector(READY["start-plan"]!, { timeout: 60_000 });
  // The demo day, checked once: its table is kept while the language changes.
  await go("departures");
  await page.locator(".departures input[type=file]").first().setInputFiles(DEMO_DAY);
  await page.waitForSelector(".departures-table tbody tr", { timeout: 30_000 });
  await page.waitForFunction(() => !document.querySelector('.departures [role="progressbar"]'), undefined, { timeout: 300_000 });
}, 400_000);

afterAll(async () => {
  await context?.close();
  if (profile) rmSync(profile, { recursive: true, force: true });
  if (work) rmSync(work, { recursive: true, force: true });
});

describe("every screen holds Hungarian, German and pseudo-localised text", () => {
  for (const [lang, radio, review] of [
    ["hu", "Magyar", wordsOf(notesHu)],
    ["de", "Deutsch", wordsOf(notesDe)],
  ] as const) {
    it(`${lang}: nothing runs past its box and no word breaks inside itself at 800×1280 and 1280×800, tabs also at 600×960`, async () => {
      await page.setViewportSize(LANDSCAPE);
      await go("settings");
      await page.getByRole("radio", { name: radio }).click();
      await expect.poll(() => page.evaluate(() => document.documentElement.lang)).toBe(lang);
      const found: string[] = [];
      for (const [size, name] of [[PORTRAIT, "800x1280"], [LANDSCAPE, "1280x800"]] as const) {
        await page.setViewportSize(size);
        found.push(...(await everyScreen(lang, name, review)));
      }
      found.push(...(await narrowTabs(lang)));
      await page.setViewportSize(LANDSCAPE);
      expect(found).toEqual([]);
    }, 600_000);
  }

  it("pseudo-localised English (40 % longer, accented): the same at both sizes", async () => {
    await go("settings");
    await page.getByRole("radio", { name: "English" }).click();
    await page.evaluate(() => localStorage.setItem("taut.pseudo", "1"));
    await page.reload();
    await go("start-plan");
    await page.waitForSelector(READY["start-plan"]!, { timeout: 60_000 });
    await go("departures");
    await page.locator(".departures input[type=file]").first().setInputFiles(DEMO_DAY);
    await page.waitForSelector(".departures-table tbody tr", { timeout: 30_000 });
    await page.waitForFunction(() => !document.querySelector('.departures [role="progressbar"]'), undefined, { timeout: 300_000 });
    const found: string[] = [];
    for (const [size, name] of [[PORTRAIT, "800x1280"], [LANDSCAPE, "1280x800"]] as const) {
      await page.setViewportSize(size);
      found.push(...(await everyScreen("pseudo", name, wordsOf(notes.en, pseudoText))));
    }
    await page.evaluate(() => localStorage.removeItem("taut.pseudo"));
    expect(found).toEqual([]);
  }, 900_000);

  it("logged no console errors", () => {
    expect(problems).toEqual([]);
  });
});
