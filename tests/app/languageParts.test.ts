/**
 * A later screen's words added while the language is switching: the screens opened later are fetched in the
 * background once the first plan shows, and each adds its words (`addCatalogPart`) when its module loads —
 * possibly while Settings' switch to Hungarian is still loading its catalog, when the language on screen is
 * still English and the part loads nothing for it. The switch must still bring those words: the Location
 * notes editor once showed wholly in English under a Hungarian tab bar after such a race (seen in Chromium
 * under load). Here the race is made certain: an earlier part holds the switch until the later part is added.
 */
import { describe, expect, it } from "vitest";
import { addCatalogPart, appLang, setAppLanguage, tr } from "../../src/app/i18n.js";
import type { Catalog } from "../../src/i18n/messages.js";
import { notes } from "../../src/i18n/en/notes.js";
import { notesHu } from "../../src/i18n/hu/notes.js";

describe("words of a screen added while the language switches", () => {
  it("are in the new language once the switch is done", async () => {
    let release: () => void = () => undefined;
    const held = new Promise<void>((r) => (release = r));
    let reached: () => void = () => undefined;
    const partsReached = new Promise<void>((r) => (reached = r));
    // An earlier part: loads at once in English, and holds the switch to Hungarian until released.
    await addCatalogPart(async (l) => {
      if (l === "hu") {
        reached();
        await held;
      }
      return null;
    });
    const switching = setAppLanguage("hu");
    // The switch has loaded its catalog and is loading the parts' words.
    await partsReached;
    expect(appLang()).toBe("en");
    // The later screen's words come in now, while the screen is still English: they load nothing for English.
    let englishAsked = 0;
    const added = addCatalogPart(async (l): Promise<Catalog | null> => {
      if (l === "en") englishAsked++;
      return l === "hu" ? { notes: notesHu } : null;
    });
    await added;
    expect(englishAsked).toBe(1);
    release();
    expect(await switching).toBe(true);
    expect(appLang()).toBe("hu");
    expect(tr.ns(notes)("edCardPrint")).toBe(notesHu.edCardPrint);
    expect(tr.ns(notes)("edCardPrint")).not.toBe("Card / print");
  });
});
