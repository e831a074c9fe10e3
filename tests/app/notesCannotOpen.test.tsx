/**
 * The Location notes library that cannot be opened (issue 16): here the device's library was saved by a
 * newer Taut (its database is at a later version, so the browser refuses to open it at ours). The message
 * is kept as a code and worded when drawn: Hungarian and German say why in their words, a language switch
 * after it appeared redraws it, and English shows what it always did (the browser's own words). The codes
 * of other failures follow the browser's error names (IndexedDB's DOMException names: common practice).
 */
import "fake-indexeddb/auto";
import { screen, waitFor } from "@solidjs/testing-library";
import { openDB } from "idb";
import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";
import LocationNotesScreen from "../../src/app/screens/LocationNotes/index.js";
import { openFailureOf } from "../../src/app/screens/LocationNotes/createNotesLibrary.js";
import { DEFAULT_NOTES_DB, NOTES_DB_VERSION } from "../../src/notes/index.js";
import { appLang, setAppLanguage } from "../../src/app/i18n.js";
import { SETTINGS_KEY } from "../../src/app/state/createSettings.js";
import { notes } from "../../src/i18n/en/notes.js";
import { createTranslator } from "../../src/i18n/translator.js";
import { de } from "../../src/i18n/de/index.js";
import { deLater } from "../../src/i18n/de/later.js";
import { hu } from "../../src/i18n/hu/index.js";
import { huLater } from "../../src/i18n/hu/later.js";
import { memoryStorage, quickTablePool, renderWithApp } from "./harness.js";

const CATALOGS = { de: { ...de, ...deLater }, hu: { ...hu, ...huLater } } as const;
const words = (lang: "hu" | "de") => createTranslator(lang, CATALOGS[lang]).ns(notes);
const alertText = () => document.querySelector(".notes-issue-box[role=alert]")?.textContent ?? "";
const ENGLISH = [/could not be opened/, /cannot be saved/, /\bnewer\b/, /\bversion\b/, /\bthe\b/];

let newer: { close(): void } | undefined;
beforeAll(async () => {
  newer = await openDB(DEFAULT_NOTES_DB, NOTES_DB_VERSION + 1, { upgrade: () => undefined });
  newer.close();
});
afterAll(() => newer?.close());
afterEach(async () => {
  await setAppLanguage("en");
});

describe("the notes library that cannot be opened, in the language on screen", () => {
  it("en: the browser's words, as always", async () => {
    const { unmount } = renderWithApp(() => <LocationNotesScreen />, { pool: quickTablePool() });
    await waitFor(() => expect(alertText()).toMatch(/^The notes library could not be opened on this device \(.+\)\. Notes cannot be saved here\.$/), { timeout: 10_000 });
    unmount();
  });

  for (const lang of ["hu", "de"] as const) {
    it(`${lang}: why, in its words; then redrawn in the other language`, async () => {
      const storage = memoryStorage();
      storage.setItem(SETTINGS_KEY, JSON.stringify({ language: lang }));
      const { unmount } = renderWithApp(() => <LocationNotesScreen />, { storage, pool: quickTablePool() });
      await waitFor(() => expect(appLang()).toBe(lang), { timeout: 10_000 });
      const n = words(lang);
      await waitFor(() => expect(alertText()).toBe(n("nfCannotOpen", { problem: n("nfWhyNewer") })), { timeout: 10_000 });
      for (const e of ENGLISH) expect(alertText()).not.toMatch(e);
      const other = lang === "hu" ? "de" : "hu";
      await setAppLanguage(other);
      await waitFor(() => expect(alertText()).toBe(words(other)("nfCannotOpen", { problem: words(other)("nfWhyNewer") })), { timeout: 10_000 });
      await setAppLanguage("en");
      await waitFor(() => expect(alertText()).toMatch(/^The notes library could not be opened/), { timeout: 10_000 });
      expect(screen.queryByText(n("nfWhyNewer"), { exact: false })).toBeNull();
      unmount();
    });
  }

  it("other failures by the browser's error name", () => {
    const named = (name: string) => openFailureOf(new DOMException("words of the browser", name)).why;
    expect(named("VersionError")).toBe("newer");
    expect(named("InvalidStateError")).toBe("refused");
    expect(named("SecurityError")).toBe("refused");
    expect(named("QuotaExceededError")).toBe("full");
    expect(named("UnknownError")).toBe("damaged");
    expect(named("AbortError")).toBe("other");
    expect(openFailureOf(new DOMException("words", "AbortError"))).toEqual({ why: "other", name: "AbortError", message: "words" });
  });
});
