/**
 * A notes bundle's own rules as codes (issue 16): a time of export not in ISO form and a kept review whose
 * date is not YYYY-MM-DD are refused with codes (isoDateTime, dateIso) beside the English they always had,
 * so Hungarian and German say them in their words with the value given as in English.
 */
import { describe, expect, it } from "vitest";
import { readNotesText } from "../../src/profiles/notes.js";
import { builtinLocations } from "../../src/profiles/builtin.js";
import { issueMessage } from "../../src/profiles/issueText.js";
import { createTranslator } from "../../src/i18n/translator.js";
import { fieldsHu } from "../../src/i18n/hu/fields.js";
import { fieldsDe } from "../../src/i18n/de/fields.js";

const note = builtinLocations[0]!;
const review = { id: "r1", location: note.id, date: "12.10.2026", rail: "dry", train: "t", massFactor: { value: 1.1, low: 1, high: 1.2 }, plannedVerdict: "starts", replannedVerdict: "starts", thumbnail: { time_s: [0], speed_kmh: [0] } };
const bundle = JSON.stringify({ schema: "taut/notes-bundle@2", exported: "yesterday", notes: [note], reviews: [review] });

function issues() {
  const r = readNotesText(bundle);
  if (r.ok) throw new Error("the bundle should be refused");
  return r.issues;
}

describe("a notes bundle's own rules as codes", () => {
  it("en: the English it always had, now with its code", () => {
    const [exported, date] = issues();
    expect(exported).toMatchObject({ path: "exported", code: "isoDateTime", message: 'must be an ISO date and time, e.g. 2026-10-12T08:30:00Z (got "yesterday")' });
    expect(date).toMatchObject({ path: "reviews[0].date", code: "dateIso", message: 'must be a date, YYYY-MM-DD (got "12.10.2026")' });
  });

  for (const [lang, fields, form] of [
    ["hu", fieldsHu, /ÉÉÉÉ-HH-NN/],
    ["de", fieldsDe, /JJJJ-MM-TT/],
  ] as const) {
    it(`${lang}: in its words, the value given as in English`, () => {
      const tr = createTranslator(lang, { fields });
      const [exported, date] = issues().map((i) => issueMessage(tr, i));
      expect(exported).toContain("2026-10-12T08:30:00Z");
      expect(exported).toContain("yesterday");
      expect(date).toMatch(form);
      expect(date).toContain("12.10.2026");
      for (const m of [exported, date]) expect(m).not.toMatch(/\b(must|be|got|a date|e\.g\.|time)\b/);
    });
  }
});
