/**
 * Start review's refusals in Hungarian and German (issue 16): a recording whose quoted field is never
 * closed, and a review the store refuses for a field (a date not as YYYY-MM-DD, a rail word not one of the
 * list), are said from codes in the language on screen — the line number, the field's path and the value
 * given as in English — with no English sentence left; English is what it always was. fake-indexeddb
 * stands in for the browser's store.
 */
import "fake-indexeddb/auto";
import { fireEvent, waitFor } from "@solidjs/testing-library";
import { afterEach, describe, expect, it } from "vitest";
import StartReview, { refusedWords } from "../../src/app/screens/StartReview/index.js";
import { setReviewTarget } from "../../src/app/state/reviewTarget.js";
import { appLang, setAppLanguage } from "../../src/app/i18n.js";
import { SETTINGS_KEY } from "../../src/app/state/createSettings.js";
import { deviceNotesStore } from "../../src/notes/index.js";
import type { StartReviewFile } from "../../src/profiles/notes.js";
import { builtinLocations } from "../../src/profiles/builtin.js";
import { reviewDe } from "../../src/i18n/de/review.js";
import { memoryStorage, quickTablePool, renderWithApp } from "./harness.js";

const note = builtinLocations[0]!;
/** The screen's file input, once the screen shows it. */
async function fileInput(): Promise<HTMLInputElement> {
  let input: HTMLInputElement | null = null;
  await waitFor(
    () => {
      input = document.querySelector<HTMLInputElement>(".review-screen input[type=file]");
      expect(input).toBeTruthy();
    },
    { timeout: 10_000 },
  );
  return input!;
}
const alertText = () => document.querySelector(".review-screen [role=alert]")?.textContent ?? "";

/** English words of these refusals; none may show in another language. */
const ENGLISH = [/\bnot readable\b/, /\bquoted field\b/, /\bis not closed\b/, /\bmust be\b/, /\bis not valid\b/, /\bnothing was saved\b/, /\bone of\b/, /\ba date\b/, /\bgot\b/];

/** A review as the screen keeps it, with one field as given. */
function reviewWith(over: Partial<Record<keyof StartReviewFile, unknown>>): StartReviewFile {
  return {
    id: `${note.id}-test`,
    location: note.id,
    date: "2026-03-01",
    rail: "dry",
    train: "1400 t, 28 wagons",
    massFactor: { value: 1.1, low: 1.05, high: 1.15 },
    plannedVerdict: "starts",
    replannedVerdict: "starts",
    thumbnail: { time_s: [0, 1], speed_kmh: [0, 1] },
    ...over,
  } as StartReviewFile;
}

afterEach(async () => {
  await setAppLanguage("en");
});

describe("Start review's refusals in the language on screen", () => {
  it("en: a refused review and an unclosed quote say what they always said", async () => {
    const store = await deviceNotesStore();
    const out = await store.addReview(reviewWith({ date: "1.3.2026" }));
    if (out.ok) throw new Error("the review should be refused");
    expect(out.message).toBe("The review is not valid (date: must be a date, YYYY-MM-DD); nothing was saved.");
    expect(refusedWords(out.coded, out.issue)).toBe(out.message);
    expect(out.issue).toMatchObject({ path: "date", code: "dateIso" });

    setReviewTarget(note.id);
    const { unmount } = renderWithApp(() => <StartReview />, { pool: quickTablePool() });
    const input = await fileInput();
    fireEvent.change(input, { target: { files: [new File(['time_s,speed_kmh\n0,0\n1,"2\n3,4\n'], "open.csv")] } });
    await waitFor(() => expect(alertText()).toBe("open.csv: The file is not readable CSV: line 3: a quoted field is not closed."), { timeout: 10_000 });
    unmount();
  });

  for (const lang of ["hu", "de"] as const) {
    it(`${lang}: a recording with an unclosed quote, and reviews refused for their date and their rail`, async () => {
      const storage = memoryStorage();
      storage.setItem(SETTINGS_KEY, JSON.stringify({ language: lang }));
      setReviewTarget(note.id);
      const { unmount } = renderWithApp(() => <StartReview />, { storage, pool: quickTablePool() });
      await waitFor(() => expect(appLang()).toBe(lang), { timeout: 10_000 });
      const input = await fileInput();
      fireEvent.change(input, { target: { files: [new File(['time_s,speed_kmh\n0,0\n1,"2\n3,4\n'], "open.csv")] } });
      await waitFor(() => expect(alertText()).toMatch(/^open\.csv: /), { timeout: 10_000 });
      // The line of the open quote, as in English.
      expect(alertText()).toMatch(/\b3\b/);
      expect(alertText()).toContain("CSV");
      for (const e of ENGLISH) expect(alertText()).not.toMatch(e);

      const store = await deviceNotesStore();
      const date = await store.addReview(reviewWith({ date: "1.3.2026" }));
      if (date.ok) throw new Error("the review should be refused");
      const dateWords = refusedWords(date.coded, date.issue);
      expect(dateWords).toContain("date");
      // The form asked for, in the language's letters (ÉÉÉÉ-HH-NN, JJJJ-MM-TT).
      expect(dateWords).toMatch(lang === "hu" ? /ÉÉÉÉ-HH-NN/ : /JJJJ-MM-TT/);
      for (const e of ENGLISH) expect(dateWords).not.toMatch(e);

      const rail = await store.addReview(reviewWith({ rail: "slimy" }));
      if (rail.ok) throw new Error("the review should be refused");
      expect(rail.message).toMatch(/^The review is not valid \(rail: /);
      expect(rail.issue).toMatchObject({ path: "rail", code: "oneOf" });
      const railWords = refusedWords(rail.coded, rail.issue);
      for (const figure of ["rail", '"dry"', '"greasy"']) expect(railWords).toContain(figure);
      for (const e of ENGLISH) expect(railWords).not.toMatch(e);
      unmount();
    });
  }

  it("a language switch redraws a refused recording", async () => {
    setReviewTarget(note.id);
    const { unmount } = renderWithApp(() => <StartReview />, { pool: quickTablePool() });
    const input = await fileInput();
    fireEvent.change(input, { target: { files: [new File(['time_s,speed_kmh\n0,0\n1,"2\n'], "open.csv")] } });
    await waitFor(() => expect(alertText()).toContain("a quoted field is not closed"), { timeout: 10_000 });
    await setAppLanguage("de");
    await waitFor(() => expect(alertText()).toContain("Zeile 3"), { timeout: 10_000 });
    for (const e of ENGLISH) expect(alertText()).not.toMatch(e);
    unmount();
  });

  it("de: the observed table's reason (a reference train no preset has) in field words, its id as given", async () => {
    const store = await deviceNotesStore();
    const odd = { ...note, id: "odd-train", name: "Odd train (test)", referenceTrain: { train: "no-such-train" } };
    const put = await store.put(odd, "mine", "new");
    expect(put.ok).toBe(true);
    const kept = await store.addReview(reviewWith({ id: "odd-train-r1", location: "odd-train" }));
    expect(kept.ok).toBe(true);
    const storage = memoryStorage();
    storage.setItem(SETTINGS_KEY, JSON.stringify({ language: "de" }));
    setReviewTarget("odd-train");
    const { unmount } = renderWithApp(() => <StartReview />, { storage, pool: quickTablePool() });
    await waitFor(() => expect(appLang()).toBe("de"), { timeout: 10_000 });
    const button = await waitFor(
      () => {
        const b = [...document.querySelectorAll<HTMLButtonElement>(".review-screen button")].find((x) => x.textContent === reviewDe.tableButton);
        expect(b).toBeTruthy();
        return b!;
      },
      { timeout: 10_000 },
    );
    fireEvent.click(button);
    const why = () => document.querySelector(".review-screen p.problem")?.textContent ?? "";
    await waitFor(() => expect(why()).toContain('"no-such-train"'), { timeout: 10_000 });
    // Without the ids, which are as the note gives them: no English word.
    expect(why().replace(/"[^"]*"/g, "").replace(/[a-z]+-\d+/g, "")).not.toMatch(/\b(names|no known|known|train)\b/);
    await setAppLanguage("en");
    await waitFor(() => expect(why()).toContain('names no known train ("no-such-train"'), { timeout: 10_000 });
    unmount();
  });
});
