/**
 * What the railML reader and the stretch say, as data: a code of the railmlText messages with its values
 * (a figure as given, or another text nested in it). The reader and the stretch keep their English sentences
 * (`railmlEnglish`, the app shows them) and carry these beside them, so the command line can write them in
 * its language.
 */
import { railmlText } from "../../i18n/en/railmlText.js";
import { createTranslator, type Translator } from "../../i18n/translator.js";

export type RailmlCode = keyof typeof railmlText.en;
/** A value in a text: words as they are (names from the file), a figure as JavaScript writes it, or a text. */
export type RailmlParam = string | { readonly given: number } | RailmlText;
export interface RailmlText {
  readonly code: RailmlCode;
  readonly params?: Readonly<Record<string, RailmlParam>>;
}

/** A text of the railML reader. */
export function say(code: RailmlCode, params?: Record<string, RailmlParam>): RailmlText {
  return params ? { code, params } : { code };
}

/** A figure as given (String(x)), written with the language's decimal sign. */
export const given = (x: number): { given: number } => ({ given: x });

/** A text in the translator's language. */
export function railmlWords(tr: Translator, t: RailmlText): string {
  const sign = tr.num(0.5, 1).charAt(1);
  const params: Record<string, string> = {};
  for (const [k, v] of Object.entries(t.params ?? {})) {
    params[k] = typeof v === "string" ? v : "given" in v ? String(v.given).replace(".", sign) : railmlWords(tr, v);
  }
  return (tr.ns(railmlText) as (key: string, p: Record<string, string>) => string)(t.code, params);
}

/** English, the reader's own language. */
export const railmlEnglishTranslator: Translator = createTranslator("en", null);

/** A text in English (the reader's own sentences). */
export function railmlEnglish(t: RailmlText): string {
  return railmlWords(railmlEnglishTranslator, t);
}
