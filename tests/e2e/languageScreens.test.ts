/**
 * The parts of Location notes a person reaches from its list, in Hungarian and German in Chromium: a demo
 * note in the editor, its printable card, and a new note (its empty lists and its revision entry), each at
 * 1280×800 and 800×1280 (test-results/screenshots/lang-<lang>-note-*.png, looked at by a person). On each, no
 * button or labelled control has text running past its box, and the page does not scroll sideways.
 */
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { LANDSCAPE, launch, PORTRAIT, SHOTS } from "./browser.js";
import { notesHu } from "../../src/i18n/hu/notes.js";
import { notesDe } from "../../src/i18n/de/notes.js";

let context: BrowserContext;
let page: Page;
let profile: string;
let problems: string[] = [];
const base = inject("baseURL");

beforeAll(async () => {
  profile = mkdtempSync(join(tmpdir(), "taut-lang-notes-"));
  ({ context, page, problems } = await launch(inject("chromiumPath"), profile));
});

afterAll(async () => {
  await context?.close();
  if (profile) rmSync(profile, { recursive: true, force: true });
});

async function go(id: string): Promise<void> {
  await page.evaluate((h) => (location.hash = h), `#/${id}`);
  await page.waitForFunction((h) => location.hash === h, `#/${id}`);
  await page.waitForFunction(() => !document.querySelector("main .placeholder-text"), undefined, { timeout: 30_000 });
}

/** Visible buttons and labelled controls whose text runs past their box, and a page that scrolls sideways. */
async function overflowing(label: string): Promise<string[]> {
  const found = await page.evaluate(() => {
    const out: string[] = [];
    for (const el of document.querySelectorAll<HTMLElement>("button, [role=radio], label, .field-label, h1, h2, h3")) {
      const cs = getComputedStyle(el);
      if (cs.display === "inline" || cs.visibility === "hidden" || el.closest(".visually-hidden, .notes-print-root")) continue;
      const r = el.getBoundingClientRect();
      // Hidden but read aloud (a 1-pixel clip, as the segments table's labels over its columns in landscape).
      if (r.width <= 1 || r.height <= 1) continue;
      if (el.scrollWidth > el.clientWidth + 1) out.push(`${el.tagName.toLowerCase()}.${el.className} "${(el.textContent ?? "").trim().slice(0, 50)}" (${el.scrollWidth} > ${el.clientWidth})`);
    }
    if (document.documentElement.scrollWidth > window.innerWidth + 1) out.push(`the page scrolls sideways (${document.documentElement.scrollWidth} > ${window.innerWidth})`);
    return out;
  });
  return found.map((f) => `${label}: ${f}`);
}

describe("Location notes' editor, card and a new note in Hungarian and German", () => {
  it("shows each at both sizes without text past its box (screenshots)", async () => {
    await page.goto(base);
    const found: string[] = [];
    for (const [lang, name, n] of [["hu", "Magyar", notesHu], ["de", "Deutsch", notesDe]] as const) {
      await go("settings");
      await page.getByRole("radio", { name }).click();
      await page.waitForFunction((l) => document.documentElement.lang === l, lang);
      for (const [size, orient] of [[LANDSCAPE, "landscape"], [PORTRAIT, "portrait"]] as const) {
        await page.setViewportSize(size);
        await go("settings");
        await go("location-notes");
        await page.locator(".notes-item-open").first().click({ timeout: 60_000 });
        await page.locator('[data-field="revision.date"]').waitFor({ timeout: 30_000 });
        await page.locator(".notes-loadtable").first().waitFor({ timeout: 120_000 });
        found.push(...(await overflowing(`${lang} ${orient} editor`)));
        await page.screenshot({ path: join(SHOTS, `lang-${lang}-note-editor-${orient}.png`) });
        await page.locator("button", { hasText: n.edCardPrint as string }).first().click();
        await page.locator(".notes-card-view .notes-card").waitFor({ timeout: 30_000 });
        found.push(...(await overflowing(`${lang} ${orient} card`)));
        await page.screenshot({ path: join(SHOTS, `lang-${lang}-note-card-${orient}.png`) });
        await go("settings");
        await go("location-notes");
        await page.locator("button", { hasText: n.newNote as string }).first().click({ timeout: 60_000 });
        await page.locator('[data-field="revision.change"] input').waitFor({ timeout: 30_000 });
        // The revision entry is filled in with the language's words, not English.
        expect(await page.locator('[data-field="revision.change"] input').inputValue()).toBe(n.edRevNew);
        found.push(...(await overflowing(`${lang} ${orient} new note`)));
        await page.screenshot({ path: join(SHOTS, `lang-${lang}-note-new-${orient}.png`), fullPage: true });
        await page.locator("button", { hasText: n.backToLibrary as string }).first().click();
        await page.locator(".notes-item-open").first().waitFor({ timeout: 30_000 });
      }
    }
    expect(found).toEqual([]);
    expect(problems).toEqual([]);
  }, 300_000);
});
