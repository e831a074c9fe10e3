/**
 * Which language: the POSIX locale variables in their order of precedence (IEEE Std 1003.1-2017, Base
 * Definitions, 8.2 "Internationalization Variables": LC_ALL overrides every LC_* variable, which overrides
 * LANG; an empty variable counts as unset), locale names "language[_territory][.codeset][@modifier]" (8.2
 * too), and BCP 47 tags from the browser (RFC 5646: the primary language subtag comes first).
 */
import { describe, expect, it } from "vitest";
import { langFromEnvironment, langFromPreferences, langOfTag } from "../../src/i18n/language.js";

describe("the language of a locale", () => {
  it("reads POSIX locale names and BCP 47 tags", () => {
    expect(langOfTag("hu_HU.UTF-8")).toBe("hu");
    expect(langOfTag("de_AT@euro")).toBe("de");
    expect(langOfTag("de-CH")).toBe("de");
    expect(langOfTag("en")).toBe("en");
    expect(langOfTag("C")).toBeNull();
    expect(langOfTag("C.UTF-8")).toBeNull();
    expect(langOfTag("POSIX")).toBeNull();
    expect(langOfTag("fr_FR.UTF-8")).toBeNull();
    expect(langOfTag("deu")).toBeNull();
  });

  it("LC_ALL over LC_MESSAGES over LANG; empty counts as unset; a locale not ours is English", () => {
    expect(langFromEnvironment({ LANG: "hu_HU.UTF-8" })).toBe("hu");
    expect(langFromEnvironment({ LC_ALL: "de_DE.UTF-8", LANG: "hu_HU.UTF-8" })).toBe("de");
    expect(langFromEnvironment({ LC_MESSAGES: "de_DE", LANG: "hu_HU" })).toBe("de");
    expect(langFromEnvironment({ LC_ALL: "", LANG: "hu_HU" })).toBe("hu");
    expect(langFromEnvironment({ LC_ALL: "C", LANG: "hu_HU" })).toBe("en");
    expect(langFromEnvironment({ LANG: "fr_FR.UTF-8" })).toBe("en");
    expect(langFromEnvironment({})).toBe("en");
  });

  it("the first of the device's preferred languages that Taut speaks", () => {
    expect(langFromPreferences(["fr-FR", "de-AT", "en-GB"])).toBe("de");
    expect(langFromPreferences(["hu"])).toBe("hu");
    expect(langFromPreferences(["fr", "it"])).toBe("en");
    expect(langFromPreferences(undefined)).toBe("en");
  });
});
