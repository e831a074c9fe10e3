/**
 * What the railML reader and the stretch say, as data: a code of the railmlText messages with its values
 * (a figure as given, or another text nested in it). The reader and the stretch keep their English sentences
 * (`railmlEnglish`, the app shows them) and carry these beside them, so the command line can write them in
 * its language.
 */
import { railmlText } from "../../i18n/en/railmlText.js";
import { createTranslator, type Translator } from "../../i18n/translator.js";

export type RailmlCode = keyof typeof railmlText.en;
/** A value in a text: words as they are (names from the file), a figure as JavaScript writes it, a count, or a text. */
export type RailmlParam = string | { readonly given: number } | { readonly counted: number } | RailmlText;
export interface RailmlText {
  readonly code: RailmlCode;
  readonly params?: Readonly<Record<string, RailmlParam>>;
}

/** A text of the railML reader. */
export function say(code: RailmlCode, params?: Record<string, RailmlParam>): RailmlText {
  return params ? { code, params } : { code };
}

/** A figure with the decimals it was given (String(x)), written as the translator writes numbers. */
export const given = (x: number): { given: number } => ({ given: x });

/** A count (tracks, changes, elements), written as the translator writes whole numbers. */
export const counted = (x: number): { counted: number } => ({ counted: x });

/**
 * A figure as given in the translator's digits: its decimal sign, and its thousands grouped where the
 * translator groups them (the app does, as the language does; the command line's translators do not, so
 * its printout is String(x) with the language's decimal sign, as it always was).
 */
function givenIn(tr: Translator, x: number): string {
  const s = String(x);
  if (/e/i.test(s) || !Number.isFinite(x)) return s.replace(".", tr.num(0.5, 1).charAt(1));
  return tr.num(x, s.split(".")[1]?.length ?? 0);
}

/** A text in the translator's language. */
export function railmlWords(tr: Translator, t: RailmlText): string {
  const params: Record<string, string | number> = {};
  for (const [k, v] of Object.entries(t.params ?? {})) {
    params[k] = typeof v === "string" ? v : "given" in v ? givenIn(tr, v.given) : "counted" in v ? v.counted : railmlWords(tr, v);
  }
  return (tr.ns(railmlText) as (key: string, p: Record<string, string | number>) => string)(t.code, params);
}

/** English, the reader's own language. */
export const railmlEnglishTranslator: Translator = createTranslator("en", null);

/** A text in English (the reader's own sentences). */
export function railmlEnglish(t: RailmlText): string {
  return railmlWords(railmlEnglishTranslator, t);
}
