/**
 * The notes library's messages in Hungarian and German: damaged records (of the older format and not
 * carried over, with an unknown origin, without a save time, stored under another id, a note that is not
 * valid), what carrying a note over left out, a refused import's note and the library closed under the page —
 * each in the language on screen with its figures (ids, the field's path, the range and the value given),
 * redrawn when the language changes, and no English sentence among them. The records themselves keep the
 * English they were written with. fake-indexeddb stands in for the browser's store.
 */
import "fake-indexeddb/auto";
import { fireEvent, screen, waitFor } from "@solidjs/testing-library";
import { openDB } from "idb";
import { afterEach, describe, expect, it } from "vitest";
import LocationNotesScreen from "../../src/app/screens/LocationNotes/index.js";
import { refusalWords } from "../../src/app/screens/LocationNotes/createNotesLibrary.js";
import { DEFAULT_NOTES_DB, migrateV1Record, openNotesStore } from "../../src/notes/index.js";
import { builtinLocations } from "../../src/profiles/builtin.js";
import { appLang, setAppLanguage } from "../../src/app/i18n.js";
import { SETTINGS_KEY } from "../../src/app/state/createSettings.js";
import { notes } from "../../src/i18n/en/notes.js";
import { createTranslator } from "../../src/i18n/translator.js";
import { de } from "../../src/i18n/de/index.js";
import { deLater } from "../../src/i18n/de/later.js";
import { hu } from "../../src/i18n/hu/index.js";
import { huLater } from "../../src/i18n/hu/later.js";
import { memoryStorage, quickTablePool, renderWithApp } from "./harness.js";

const demo = builtinLocations[0]!;
const listed = () => [...document.querySelectorAll(".notes-item-name")].map((e) => e.textContent);
const damagedText = () => document.querySelector(".notes-damaged ul")?.textContent ?? "";
const noticeText = () => document.querySelector(".notes-notice")?.textContent ?? "";

/** A record of the older format that cannot be carried over: a 90 ‰ grade, a rail word of no condition, a hazard that is not text. */
const steep = {
  id: "steep-siding",
  title: "Steep siding (test)",
  profile: { segments: [{ start_m: 0, length_m: 1500, grade_permille: 90, radius_m: 0 }], front_m: 1200, clear_m: 200 },
  hazards: ["Level crossing at 300 m", 7],
  rail: { autumn: "slimy" },
  practice: "Years of notes.",
  revised: "2024-10-01",
  by: "OLD",
};

/** Records written straight into the store, as damage or another program would leave them. */
async function writeDamage(): Promise<void> {
  (await openNotesStore()).close();
  const db = await openDB(DEFAULT_NOTES_DB);
  await db.put("notes", steep as never);
  await db.put("notes", { id: "odd-origin", origin: "elsewhere", savedAt: "2026-03-01T10:00:00.000Z", rev: 1, note: { ...demo, id: "odd-origin" } } as never);
  await db.put("notes", { id: "no-date", origin: "mine", savedAt: "yesterday", rev: 1, note: { ...demo, id: "no-date" } } as never);
  await db.put("notes", { id: "moved-note", origin: "mine", savedAt: "2026-03-01T10:00:00.000Z", rev: 1, note: demo } as never);
  await db.put("notes", { id: "half-written", origin: "mine", savedAt: "2026-03-01T10:00:00.000Z", rev: 1, note: { ...demo, id: "half-written", clearAhead_m: 250000 } } as never);
  // Carried over with something left out: the flags and their codes, as the upgrade writes them.
  const carried = migrateV1Record({ ...steep, id: "gentle-siding", title: "Gentle siding (test)", profile: { ...steep.profile, segments: [{ start_m: 0, length_m: 1500, grade_permille: 9, radius_m: 0 }] } } as unknown);
  if (!carried.ok) throw new Error(carried.message);
  await db.put("notes", carried.record as never);
  await db.put("meta", String(Number((await db.get("meta", "changes")) ?? "0") + 1), "changes");
  db.close();
}

/** English sentences of the notes library's messages; none may show in another language. */
const ENGLISH = [
  /is damaged and was skipped/,
  /could not be carried over/,
  /was left out/,
  /not one of/,
  /its origin is/,
  /save time/,
  /is stored under/,
  /\bmust be\b/,
  /was not text/,
  /\bupgraded by another tab\b/,
  /Reload this page/,
  /nothing was imported/,
  /is not valid/,
];

const LANGS = [
  ["de", { ...de, ...deLater }],
  ["hu", { ...hu, ...huLater }],
] as const;

afterEach(async () => {
  await setAppLanguage("en");
});

describe("the notes library's messages in Hungarian and German", () => {
  it("records as written keep their English (the library's messages are codes beside it)", async () => {
    await writeDamage();
    const store = await openNotesStore();
    const { problems } = await store.list();
    const steepProblem = problems.find((p) => p.key === "steep-siding")!;
    expect(steepProblem.message).toBe(
      'The saved note "steep-siding" is damaged and was skipped: it is in an older format that could not be carried over (segments[0].gradient_permille: must be from -60 to 60 ‰ (got 90))',
    );
    expect(steepProblem.rescue!.flags).toEqual(["Hazard 2 was not text and was left out.", 'The usual rail in autumn, "slimy", was left out: not one of dry, damp, wet, frost, leaves, greasy.']);
    expect(problems.find((p) => p.key === "odd-origin")!.message).toBe('The saved note "odd-origin" is damaged and was skipped: its origin is "elsewhere", not one of demo, mine, imported');
    expect(problems.find((p) => p.key === "moved-note")!.message).toBe(`The saved note "moved-note" is damaged and was skipped: it is stored under "moved-note" but the note inside says "${demo.id}"`);
    const got = await store.get("gentle-siding");
    expect(got.status === "ok" && got.saved.flags).toEqual(steepProblem.rescue!.flags);
    expect(got.status === "ok" && got.saved.flagCodes).toEqual([
      { code: "hazardNotText", number: 2 },
      { code: "railUnknown", season: "autumn", word: '"slimy"', rails: "dry, damp, wet, frost, leaves, greasy" },
    ]);
    store.close();
  });

  for (const [lang, catalog] of LANGS) {
    it(`${lang}: damaged records, what was left out, and a refused import's note, with their figures`, async () => {
      const n = createTranslator(lang, catalog).ns(notes);
      const storage = memoryStorage();
      storage.setItem(SETTINGS_KEY, JSON.stringify({ language: lang }));
      const { unmount } = renderWithApp(() => <LocationNotesScreen />, { storage, pool: quickTablePool() });
      await waitFor(() => expect(appLang()).toBe(lang), { timeout: 10_000 });
      await waitFor(() => expect(document.querySelectorAll(".notes-damaged > ul > li")).toHaveLength(5), { timeout: 10_000 });
      const text = damagedText();
      // The ids, the field's path and figures as the record holds them; the range with the app's minus.
      for (const figure of ['"steep-siding"', '"odd-origin"', '"elsewhere"', '"no-date"', '"moved-note"', `"${demo.id}"`, '"half-written"', "segments[0].gradient_permille", "60 ‰", "90 ‰", "clearAhead_m", '"slimy"', "autumn"]) expect(text).toContain(figure);
      expect(text).toContain("\u221260");
      // 100 000 m and 250 000 m, grouped as the language groups thousands.
      expect(text).toMatch(/100[.\s\u00a0\u202f]000 m/);
      expect(text).toMatch(/250[.\s\u00a0\u202f]000 m/);
      for (const e of ENGLISH) expect(text).not.toMatch(e);
      // Opening the note carried over says what was left out, in the language.
      fireEvent.click([...document.querySelectorAll(".notes-item-open")].find((b) => b.textContent!.startsWith("Gentle siding (test)"))!);
      await waitFor(() => expect(noticeText()).toContain(n("nfOlderFormat")), { timeout: 10_000 });
      expect(noticeText()).toContain('"slimy"');
      expect(noticeText()).toMatch(/\b2\b/);
      for (const e of ENGLISH) expect(noticeText()).not.toMatch(e);
      // An import handed a note that is not valid: its field message in the language, its figures kept.
      const store = await openNotesStore();
      const outcome = await store.importBundle([{ ...demo, id: "fresh-one" }, { ...demo, id: "bad-one", clearAhead_m: -5 }], () => null);
      store.close();
      if (outcome.status !== "failed") throw new Error("the import should be refused");
      const refused = refusalWords(outcome.coded, outcome.issue);
      expect(refused).toContain("clearAhead_m");
      expect(refused).toContain("2");
      for (const e of ENGLISH) expect(refused).not.toMatch(e);
      expect(outcome.message).toMatch(/^Note 2 is not valid \(clearAhead_m: /);
      unmount();
    });
  }

  it("a language switch redraws the damaged records", async () => {
    const { unmount } = renderWithApp(() => <LocationNotesScreen />, { pool: quickTablePool() });
    await waitFor(() => expect(document.querySelectorAll(".notes-damaged > ul > li")).toHaveLength(5), { timeout: 10_000 });
    expect(damagedText()).toContain('The saved note "odd-origin" is damaged and was skipped');
    await setAppLanguage("de");
    await waitFor(() => expect(damagedText()).toContain('Die gespeicherte Notiz "odd-origin" ist beschädigt'), { timeout: 10_000 });
    for (const e of ENGLISH) expect(damagedText()).not.toMatch(e);
    await setAppLanguage("en");
    await waitFor(() => expect(damagedText()).toContain("is damaged and was skipped"), { timeout: 10_000 });
    unmount();
  });

  // Last: it leaves the database at a newer version (the device's store stays closed under the page after it).
  it("the library closed under the page by another tab says so, with the reload, in German and then Hungarian", async () => {
    let newer: { close(): void } | undefined;
    for (const [lang, catalog] of LANGS) {
      const n = createTranslator(lang, catalog).ns(notes);
      const storage = memoryStorage();
      storage.setItem(SETTINGS_KEY, JSON.stringify({ language: lang }));
      const { unmount } = renderWithApp(() => <LocationNotesScreen />, { storage, pool: quickTablePool() });
      await waitFor(() => expect(appLang()).toBe(lang), { timeout: 10_000 });
      if (!newer) {
        await waitFor(() => expect(listed().length).toBeGreaterThan(0), { timeout: 10_000 });
        const version = await openDB(DEFAULT_NOTES_DB).then((db) => (db.close(), db.version));
        newer = await openDB(DEFAULT_NOTES_DB, version + 1, { upgrade: () => undefined });
      }
      await waitFor(() => expect(screen.getByRole("button", { name: n("reload") })).toBeTruthy(), { timeout: 10_000 });
      expect(noticeText()).toContain("Taut");
      for (const e of ENGLISH) expect(noticeText()).not.toMatch(e);
      unmount();
    }
    newer?.close();
  });
});
