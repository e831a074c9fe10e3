/**
 * A railML (or GPX) file that is not well-formed XML is refused with what is wrong as a code of ours and where, so the
 * refusal reads whole in Hungarian and German rather than carrying the XML parser's English. The broken
 * documents below each break one well-formedness rule of W3C, "Extensible Markup Language (XML) 1.0 (Fifth
 * Edition)", 2008: §2.1 (one root element, nothing but markup and white space outside it), §3 (every start-tag
 * closed by an end-tag of the same name: the Element Type Match constraint), §3.1 (attribute values quoted),
 * §2.2 (allowed characters).
 */
import { describe, expect, it } from "vitest";
import { createTranslator } from "../../src/i18n/translator.js";
import { railmlTextDe } from "../../src/i18n/de/railmlText.js";
import { railmlTextHu } from "../../src/i18n/hu/railmlText.js";
import { RailmlError, readRailmlText } from "../../src/profiles/railml/reader.js";
import { railmlEnglish, railmlWords, type RailmlText } from "../../src/profiles/railml/text.js";
import { readGpx, RecordingFileError } from "../../src/profiles/recording.js";
import { reviewText } from "../../src/i18n/reviewText.js";
import { reviewDe } from "../../src/i18n/de/review.js";
import { reviewHu } from "../../src/i18n/hu/review.js";

const HU = createTranslator("hu", { railmlText: railmlTextHu });
const DE = createTranslator("de", { railmlText: railmlTextDe });

function refusal(xml: string): RailmlText {
  try {
    readRailmlText(xml);
  } catch (e) {
    if (e instanceof RailmlError) return e.text;
    throw e;
  }
  throw new Error("read without complaint");
}

const cases: Array<[string, string, string, Record<string, string>]> = [
  ["an end-tag with no element open (§3)", "<railml><infrastructure></infrastructure></railml></railml>", "xmlUnmatchedTag", { tag: "railml" }],
  ["an end-tag of another name (§3, Element Type Match)", "<railml><infrastructure></tracks></railml>", "xmlCloseTag", {}],
  ["a file cut short (§3)", "<railml><infrastructure>", "xmlUnclosedTag", { tag: "infrastructure" }],
  ["an unquoted attribute value (§3.1)", "<railml><track id=T1/></railml>", "xmlAttribute", {}],
  ["text before the root element (§2.1)", '{"schema":"taut/location@1"}', "xmlOutsideRoot", {}],
  ["a character XML does not allow (§2.2)", "<railml>\u0001</railml>", "xmlCharacter", {}],
];

describe("a railML file that is not well-formed XML", () => {
  it.each(cases)("%s: its code, line and column", (_what, xml, code, params) => {
    const t = refusal(xml);
    expect(t.code).toBe("notWellFormed");
    const detail = t.params?.detail as RailmlText;
    expect(detail.code).toBe(code);
    expect(detail.params ?? {}).toEqual(params);
    expect(Number(t.params?.line)).toBeGreaterThanOrEqual(1);
    expect(Number(t.params?.column)).toBeGreaterThanOrEqual(0);
  });

  it("reads whole in Hungarian and German: no word of the parser's English, the same place", () => {
    for (const [, xml] of cases) {
      const t = refusal(xml);
      const en = railmlEnglish(t);
      expect(en).toMatch(/^The file is not well-formed XML \(.+ at line \d+, column \d+\)\.$/);
      for (const tr of [HU, DE]) {
        const text = railmlWords(tr, t);
        expect(text).not.toMatch(/unexpected|unclosed|unmatched|disallowed|outside of root|attribute without|unquoted|close tag/i);
        expect(text).toContain(String(t.params?.line));
        expect(text).toContain(String(t.params?.column));
      }
    }
  });
});

describe("a GPX recording that is not well-formed XML", () => {
  const huReview = createTranslator("hu", { review: reviewHu });
  const deReview = createTranslator("de", { review: reviewDe });
  it("names what is wrong as the railML reader does, in every language", () => {
    let err: unknown;
    try {
      readGpx('<gpx version="1.1"><trk><trkseg>');
    } catch (e) {
      err = e;
    }
    if (!(err instanceof RecordingFileError)) throw new Error("read without complaint");
    const t = err.texts[0]!;
    expect(t.key).toBe("gpxNotXml");
    expect(t.params?.detail).toEqual({ text: { key: "xmlUnclosedTag", params: { tag: "trkseg" } } });
    expect(err.message).toMatch(/^The file is not well-formed XML \(line 1, column \d+\): the element <trkseg> is never closed$/);
    expect(reviewText(huReview, t)).toContain("<trkseg> elem nincs lezárva");
    expect(reviewText(deReview, t)).toContain("Element <trkseg> wird nie geschlossen");
  });
});
