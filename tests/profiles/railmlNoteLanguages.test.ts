/**
 * The words a railML import writes into a note (where the front stands, the direction, each hazard's note,
 * the revision entry) in the importer's language: the note is read by the driver in it. English stays as
 * the import wrote it before the words became codes (the sentences below are typed out, not taken from the
 * program); Hungarian and German hold none of those English words and the same figures, with the
 * language's decimal comma. The track and its things are written by the test (tests/tools/railml.ts).
 */
import { describe, expect, it } from "vitest";
import { createTranslator } from "../../src/i18n/translator.js";
import { railmlTextDe } from "../../src/i18n/de/railmlText.js";
import { railmlTextHu } from "../../src/i18n/hu/railmlText.js";
import { railmlDirection, railmlNote, railmlStretch, readRailmlText, type Stretch } from "../../src/profiles/railml/index.js";
import { railmlFile, type TestTrack } from "../tools/railml.js";

const track: TestTrack = {
  id: "T1",
  endPos: 3000,
  beginAbs: 10_000,
  endAbs: 13_000,
  gradients: [{ pos: 0, dir: "up", value: 6 }],
  radii: [{ pos: 0, dir: "up", value: 0 }],
  signals: [{ id: "s1", pos: 1500, dir: "up", name: "B7" }],
  levelCrossings: [{ id: "lc1", pos: 1800 }],
};
const meta = { id: "railml-words", name: "Words test (invented)", date: "2030-04-05", initials: "QA", source: "line.xml", hazards: true };
const HU = createTranslator("hu", { railmlText: railmlTextHu });
const DE = createTranslator("de", { railmlText: railmlTextDe });

function stretch(): Stretch {
  const r = railmlStretch(readRailmlText(railmlFile({ tracks: [track] })), { front: { kind: "absPos", absPos: 11_200.5 }, direction: "up", behindM: 1200.5, aheadM: 900 });
  if (!r.ok) throw new Error(r.message);
  return r.value;
}

/** The note's words: standing, direction, hazards' notes, the revision entry. */
function words(tr?: typeof HU): string[] {
  const s = stretch();
  const n = railmlNote(s, { ...meta, direction: railmlDirection("up", tr) }, tr);
  if (!n.ok) throw new Error(n.issues.map((i) => i.message).join("; "));
  return [n.value.standing ?? "", n.value.direction ?? "", ...n.value.hazards.map((h) => h.note ?? ""), ...n.value.revisions.map((r) => r.change)];
}

const figures = (text: string) => [...text.matchAll(/\d+(?:[.,]\d+)?/g)].map((m) => Number(m[0].replace(",", "."))).sort((a, b) => a - b);
/** English words none of our Hungarian or German sentences use. */
const ENGLISH = /\b(Front|front|from|From|the|of|on|at|and|Imported|ahead|behind|signal|level|crossing|segment|long)\b/g;

describe("the words a railML import writes into a note", () => {
  it("English: the sentences the import has always written", () => {
    expect(words()).toEqual([
      `Front at track "T1" at pos 1200.5 m, absPos 11200.5 m (from railML).`,
      `up (railML dir="up" on the front's track)`,
      `From railML: signal "B7" (T1, s1).`,
      `From railML: level crossing (T1, lc1).`,
      `Imported from railML (line.xml): 1 segment(s), 1200.5 m behind and 900 m ahead of the front.`,
    ]);
  });

  for (const [lang, tr, expected] of [
    ["hu", HU, ["A vonat eleje", "jelző", "útátjáró", "railML-ből importálva"]],
    ["de", DE, ["Zugspitze bei", "Signal", "Bahnübergang", "Aus railML importiert"]],
  ] as const) {
    it(`${lang}: in the language, no English words, the same figures with a decimal comma`, () => {
      const said = words(tr);
      const text = said.join("\n");
      expect([...text.matchAll(ENGLISH)].map((m) => m[0]), text).toEqual([]);
      for (const w of expected) expect(text).toContain(w);
      expect(text).toContain("1200,5 m");
      expect(said.map(figures)).toEqual(words().map(figures));
      // The railML names (the file's ids, its dir value) stay as the file has them.
      expect(text).toContain('dir="up"');
      expect(text).toContain('"B7"');
    });
  }
});
