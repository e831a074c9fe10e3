/**
 * The languages Taut speaks and how one is chosen: from the device's preferred languages (the app), from
 * the POSIX locale variables (the command line), or named outright (`--lang`, Settings).
 */

export const LANGS = ["en", "hu", "de"] as const;
export type Lang = (typeof LANGS)[number];

/** Each language's name in itself, as a language picker shows it. */
export const LANGUAGE_NAMES: Readonly<Record<Lang, string>> = { en: "English", hu: "Magyar", de: "Deutsch" };

/** BCP 47 tags for Intl (dates); English is written the British way, as the figures are. */
export const LOCALE_TAGS: Readonly<Record<Lang, string>> = { en: "en-GB", hu: "hu-HU", de: "de-DE" };

export function isLang(x: unknown): x is Lang {
  return typeof x === "string" && (LANGS as readonly string[]).includes(x);
}

/**
 * The language of a locale name or language tag: "hu_HU.UTF-8", "de-AT", "de_CH@euro", "en" → hu, de, de,
 * en; anything else (including "C" and "POSIX") → null.
 */
export function langOfTag(tag: string | undefined | null): Lang | null {
  if (!tag) return null;
  const primary = /^([A-Za-z]{2,3})(?:[-_.@]|$)/.exec(tag.trim())?.[1]?.toLowerCase();
  return isLang(primary) ? primary : null;
}

/** The first of the device's preferred languages Taut speaks; English when none is. */
export function langFromPreferences(tags: readonly string[] | undefined): Lang {
  for (const t of tags ?? []) {
    const l = langOfTag(t);
    if (l) return l;
  }
  return "en";
}

/**
 * The language of the POSIX locale: the first of LC_ALL, LC_MESSAGES and LANG that is set and not empty
 * decides (the order in which POSIX lets them override each other); English when it names none of ours.
 */
export function langFromEnvironment(env: Readonly<Record<string, string | undefined>>): Lang {
  for (const name of ["LC_ALL", "LC_MESSAGES", "LANG"]) {
    const v = env[name];
    if (v !== undefined && v !== "") return langOfTag(v) ?? "en";
  }
  return "en";
}
