/**
 * The app's language: English in the first chunk; Hungarian and German catalogs loaded on demand (a chunk
 * each, kept offline by the service worker). `tr` is the app's translator: its messages and numbers read
 * the current language, so whatever shows them redraws when Settings changes it. The language follows the
 * device's preferred languages unless Settings names one.
 */
import { batch, createSignal } from "solid-js";
import { isLang, langFromPreferences, LOCALE_TAGS, type Lang } from "../i18n/language.js";
import { fill, type Catalog, type Message, type Messages, type Namespace } from "../i18n/messages.js";
import { formatNumberIn } from "../i18n/numbers.js";
import { messageOf, type MessageFn, type Translator } from "../i18n/translator.js";

/** The language setting: a language, or "auto" (the device's). */
export type LanguageChoice = Lang | "auto";

export function isLanguageChoice(x: unknown): x is LanguageChoice {
  return x === "auto" || isLang(x);
}

const [lang, setLang] = createSignal<Lang>("en");
const [catalog, setCatalog] = createSignal<Catalog | null>(null);

/** The language on screen. */
export const appLang = lang;

/** A number as the language on screen writes it, with grouping and a true minus sign. */
export function appNumber(x: number, decimals: number): string {
  return formatNumberIn(lang(), x, decimals, { grouping: true, minus: "\u2212" });
}

/** A number for an input field: the language's decimal sign, no grouping and a plain "-", so it reads back unambiguously. */
export function fieldNumber(x: number, decimals: number): string {
  return formatNumberIn(lang(), x, decimals, { grouping: false, minus: "-" });
}

const whole = (x: number) => appNumber(x, Number.isInteger(x) ? 0 : 1);

/** Pseudo-localised English (layout checks): localStorage "taut.pseudo" = "1"; its code loads only then. */
const [pseudo, setPseudo] = createSignal<((m: Message) => Message) | null>(null);
try {
  if (typeof localStorage !== "undefined" && localStorage.getItem("taut.pseudo") === "1") void import("../i18n/pseudo.js").then((m) => setPseudo(() => m.pseudoMessage));
} catch {
  // No storage: no pseudo-localisation.
}

/** The app's translator (reactive: it reads the language on screen at each call). */
export const tr: Translator = {
  get lang() {
    return lang();
  },
  ns<M extends Messages>(n: Namespace<string, M>): MessageFn<M> {
    return ((key: string, params?: Readonly<Record<string, string | number>>) => {
      const m = messageOf(n, key, lang() === "en" ? null : catalog());
      const p = lang() === "en" ? pseudo() : null;
      return fill(p ? p(m) : m, params, whole);
    }) as MessageFn<M>;
  },
  num: appNumber,
};

/** Load a language's catalog (a chunk of its own); English has none to load. */
export async function loadCatalog(l: Lang): Promise<Catalog | null> {
  if (l === "hu") return (await import("../i18n/hu/index.js")).hu;
  if (l === "de") return (await import("../i18n/de/index.js")).de;
  return null;
}

let wanted: Lang = "en";
/**
 * The loaders of words that come later (app/laterWords.ts with the screens opened later, app/fieldWords.ts
 * with the draft's checker), each once its module has loaded.
 */
const parts: ((l: Lang) => Promise<Catalog | null>)[] = [];

/** The words of the parts from `from` to `to` (not included) in `l`, as one catalog (null when none has any). */
async function partsIn(l: Lang, from: number, to: number): Promise<Catalog | null> {
  const got = await Promise.all(parts.slice(from, to).map((p) => p(l)));
  return got.some((c) => c) ? Object.assign({}, ...got.filter((c) => c)) : null;
}

/**
 * Words that come with a later screen or module: loaded now for the language on screen and with every
 * language chosen afterwards (before it switches), so a screen never shows half in English.
 */
export async function addCatalogPart(load: (l: Lang) => Promise<Catalog | null>): Promise<void> {
  if (parts.includes(load)) return;
  parts.push(load);
  const l = lang();
  try {
    const p = await load(l);
    if (p && lang() === l && wanted === l) setCatalog({ ...(catalog() ?? {}), ...p });
  } catch {
    // Offline before the chunk was ever saved: those screens stay in English.
  }
}

/**
 * Show the app in `l`: its catalog is loaded first, then the language switches at once (never half in one
 * language). A catalog that cannot be loaded (offline before it was ever saved) leaves the language as it was.
 */
export async function setAppLanguage(l: Lang): Promise<boolean> {
  wanted = l;
  let c: Catalog | null;
  try {
    c = await loadCatalog(l);
    // Every part added so far, also those added while this was loading (a later screen's module fetched in
    // the background adds its words while the language is still the old one, and loads them in that one):
    // loop until none is missing. The check and the switch below run with no wait between them, so no part
    // can come in unseen.
    let covered = 0;
    while (c && covered < parts.length) {
      const upTo = parts.length;
      const more = await partsIn(l, covered, upTo);
      if (more) c = { ...c, ...more };
      covered = upTo;
    }
  } catch {
    return false;
  }
  // A later choice made while this catalog was loading wins.
  if (wanted !== l) return false;
  batch(() => {
    setCatalog(c);
    setLang(l);
  });
  if (typeof document !== "undefined") document.documentElement.lang = LOCALE_TAGS[l].slice(0, 2);
  return true;
}

/** The language a choice means on this device. */
export function resolveLanguage(choice: LanguageChoice, preferred: readonly string[] | undefined = typeof navigator !== "undefined" ? navigator.languages : undefined): Lang {
  return choice === "auto" ? langFromPreferences(preferred) : choice;
}
