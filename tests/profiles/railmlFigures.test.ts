/**
 * railML figures in the reader's and the stretch's sentences (issue 16): the app's translator writes them
 * as the language does — thousands grouped (en 21,800.5 · hu 21 800,5 · de 21.800,5; CLDR, as
 * src/i18n/numbers.ts) and counts likewise — while the command line's translators (no grouping) print
 * String(x) with the language's decimal sign, as they always did.
 */
import { describe, expect, it } from "vitest";
import { counted, given, railmlWords, say } from "../../src/profiles/railml/text.js";
import { createTranslator } from "../../src/i18n/translator.js";
import { railmlTextDe } from "../../src/i18n/de/railmlText.js";
import { railmlTextHu } from "../../src/i18n/hu/railmlText.js";

const APP = { grouping: true, minus: "\u2212" } as const;
const front = say("frontTrackAbs", { track: '"T2"', pos: given(1234.25), absPos: given(21800.5) });
const several = say("absPosOnSeveral", { absPos: given(12000), count: counted(1200), list: "a, b" });

describe("railML figures per language", () => {
  it("the command line: as String(x) with the decimal sign, no grouping (unchanged)", () => {
    const en = createTranslator("en", null);
    const de = createTranslator("de", { railmlText: railmlTextDe });
    expect(railmlWords(en, front)).toContain("1234.25");
    expect(railmlWords(en, front)).toContain("21800.5");
    expect(railmlWords(de, front)).toContain("21800,5");
    expect(railmlWords(de, several)).toContain("1200");
    expect(railmlWords(de, several)).toContain("12000");
  });

  it("the app: grouped as each language groups thousands, the same figures", () => {
    const en = createTranslator("en", null, APP);
    const hu = createTranslator("hu", { railmlText: railmlTextHu }, APP);
    const de = createTranslator("de", { railmlText: railmlTextDe }, APP);
    expect(railmlWords(en, front)).toContain("21,800.5");
    expect(railmlWords(en, front)).toContain("1,234.25");
    expect(railmlWords(hu, front)).toContain("21\u00a0800,5");
    // Hungarian groups from five digits (CLDR): 1234,25 stays whole.
    expect(railmlWords(hu, front)).toContain("1234,25");
    expect(railmlWords(de, front)).toContain("21.800,5");
    expect(railmlWords(de, front)).toContain("1.234,25");
    expect(railmlWords(de, several)).toContain("1.200");
    expect(railmlWords(hu, several)).toContain("12\u00a0000");
    // A figure JavaScript writes with an exponent keeps it (no digits invented).
    expect(railmlWords(de, say("frontTrack", { track: '"T1"', pos: given(1e-7) }))).toContain("1e-7");
  });
});
