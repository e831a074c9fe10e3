/**
 * Field messages in Chromium in Hungarian and German: a trailing mass out of range is refused at its field
 * in the language chosen (figures with the language's grouping), and in the Location notes editor a gap
 * between segments is said in that language and still offers "Join segments", which closes it — the offer
 * follows the check's code, whatever the words.
 */
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { fieldsDe } from "../../src/i18n/de/fields.js";
import { fieldsHu } from "../../src/i18n/hu/fields.js";
import { noteChecksDe } from "../../src/i18n/de/noteChecks.js";
import { noteChecksHu } from "../../src/i18n/hu/noteChecks.js";
import { notesDe } from "../../src/i18n/de/notes.js";
import { notesHu } from "../../src/i18n/hu/notes.js";
import { launch, SHOTS } from "./browser.js";

let context: BrowserContext;
let page: Page;
let profile: string;
let problems: string[] = [];
const base = inject("baseURL");

async function go(id: string): Promise<void> {
  await page.evaluate((h) => (location.hash = h), `#/${id}`);
  await page.waitForFunction((h) => location.hash === h, `#/${id}`);
  await page.waitForFunction(() => !document.querySelector("main .placeholder-text"), undefined, { timeout: 30_000 });
}

const input = (name: string) => page.locator(`[data-field="${name}"] input`).first();
/** The longest run of a message's own words between its placeholders (in every rendering of it). */
const lead = (m: string) => m.split(/\{[A-Za-z]+\}/).sort((a, b) => b.length - a.length)[0]!;

beforeAll(async () => {
  profile = mkdtempSync(join(tmpdir(), "taut-fieldlang-"));
  ({ context, page, problems } = await launch(inject("chromiumPath"), profile));
  // Leaving a new note unsaved may ask first: yes.
  page.on("dialog", (d) => void d.accept());
  await page.goto(base);
});

afterAll(async () => {
  await context?.close();
  if (profile) rmSync(profile, { recursive: true, force: true });
});

describe("field messages in Hungarian and German", () => {
  for (const [lang, name, f, nc, n] of [
    ["hu", "Magyar", fieldsHu, noteChecksHu, notesHu],
    ["de", "Deutsch", fieldsDe, noteChecksDe, notesDe],
  ] as const) {
    it(`${lang}: a mass out of range at its field, and a gap the editor joins`, async () => {
      await go("settings");
      await page.getByRole("radio", { name }).click();
      await page.waitForFunction((l) => document.documentElement.lang === l, lang);

      await go("start-plan");
      const mass = input("train.trailingMass_t");
      await mass.waitFor({ timeout: 60_000 });
      const before = await mass.inputValue();
      await mass.fill("2");
      const issue = page.locator('[data-field="train.trailingMass_t"] .field-issue');
      // 5 to 60 000 t, the value given 2 t: the language's words and grouping (hu: no-break space; de: a point).
      const want = lang === "hu" ? "5 és 60\u00a0000 t között kell legyen (megadva: 2 t)" : "muss zwischen 5 und 60.000 t liegen (angegeben: 2 t)";
      expect(want).toContain(lead(f.rangeIn as string).trim());
      await expect.poll(() => issue.textContent(), { timeout: 30_000 }).toContain(want);
      await page.screenshot({ path: join(SHOTS, `fields-${lang}-mass.png`) });
      await mass.fill(before);
      await expect.poll(() => issue.count()).toBe(0);

      await go("location-notes");
      await page.getByRole("button", { name: n.newNote as string }).click();
      await page.getByRole("button", { name: n.segAdd as string }).click();
      const second = input("segments[1].from_m");
      const start = Number((await second.inputValue()).replace(/\s|\./g, "").replace(",", "."));
      expect(start).toBeGreaterThan(0);
      await second.fill(String(start + 20));
      const list = page.locator(".notes-issues");
      await expect.poll(() => list.textContent(), { timeout: 30_000 }).toContain(lead(nc.segGap as string));
      expect(await list.textContent()).toContain(n.segJoin as string);
      await page.screenshot({ path: join(SHOTS, `fields-${lang}-gap.png`) });
      await page.getByRole("button", { name: n.segJoin as string }).click();
      await expect.poll(async () => ((await list.count()) === 0 ? "" : await list.textContent())).not.toContain(lead(nc.segGap as string));
      expect(await page.getByRole("button", { name: n.segJoin as string }).count()).toBe(0);
      expect(Number((await second.inputValue()).replace(/\s|\./g, "").replace(",", "."))).toBe(start);
      // Back to the library, the new note left unsaved.
      await page.getByRole("button", { name: n.backToLibrary as string }).click();
      await page.getByRole("button", { name: n.newNote as string }).waitFor({ timeout: 30_000 });
    }, 180_000);
  }

  it("nothing went wrong in the page", () => {
    expect(problems).toEqual([]);
  });
});
