/**
 * A field issue's words in a language: its code and figures rendered from the `fields` catalog. The
 * English renderings made here with plain figures (`String(x)`) are the messages issues carry (and the
 * command line prints byte for byte); a translator renders the same code in Hungarian or German, and the
 * app puts the figures in the user's units first (app/fieldWords.ts). No zod here: the app's first load
 * and the command line's printouts import this without the schemas.
 */
import { fields, type FieldCode } from "../i18n/en/fields.js";
import { createTranslator, type MessageFn, type Translator } from "../i18n/translator.js";

/** A figure of a field message: a number (written in the language's digits), or text shown as it is. */
export type FieldFigures = Readonly<Record<string, string | number>>;

/** The value a field was given, as a message quotes it: a figure, a text (already quoted), or a word. */
export type GotValue = number | string | { readonly word: "nothing" | "list" | "object" | "tooLarge" | "tooSmall" };

/** What a coded issue carries besides its English message. */
export interface FieldCoded {
  code: FieldCode;
  figures?: FieldFigures;
  /** The value given, said after the rule ("(got 250)"); absent when the rule quotes it itself. */
  got?: GotValue;
}

type FieldsFn = MessageFn<typeof fields.en>;

const EXPECTED: Readonly<Record<string, keyof typeof fields.en>> = {
  number: "expectNumber",
  int: "expectInt",
  string: "expectString",
  boolean: "expectBoolean",
  array: "expectArray",
  datetime: "expectDatetime",
  object: "expectObject",
  "": "expectValue",
};
const GOT_WORDS = { nothing: "gotNothing", list: "gotList", object: "gotObject", tooLarge: "gotTooLarge", tooSmall: "gotTooSmall" } as const;

/**
 * The message of a code: `num` writes each figure (but `count`, which picks the plural); `expected` names
 * a kind of value by its code ("number" → "a number"); the value given follows in brackets.
 */
export function renderField(t: FieldsFn, num: (x: number) => string, c: FieldCoded): string {
  const params: Record<string, string | number> = {};
  for (const [k, v] of Object.entries(c.figures ?? {})) {
    if (k === "count") params[k] = v;
    else if (k === "problem") params[k] = (t as (k: string, p: Record<string, string>) => string)(String(v), { open: "{", close: "}" });
    else if (k === "expected") params[k] = typeof v === "string" && EXPECTED[v] ? t(EXPECTED[v] as never) : String(v);
    else params[k] = typeof v === "number" ? num(v) : v;
  }
  const text = (t as (k: string, p?: Record<string, string | number>) => string)(c.code, params);
  if (c.got === undefined) return text;
  const got = typeof c.got === "number" ? num(c.got) : typeof c.got === "string" ? c.got : t(GOT_WORDS[c.got.word]);
  return `${text} ${t("got", { value: got })}`;
}

const english = createTranslator("en", null).ns(fields);

/** The English message of a code with its figures as JavaScript writes them (the text issues carry). */
export function englishField(c: FieldCoded): string {
  return renderField(english, String, c);
}

/** The decimals a figure was given with (so 0.025 keeps its three in every language). */
function decimalsOf(x: number): number {
  const s = String(x);
  const e = /e-(\d+)$/.exec(s);
  if (e) return Math.min(20, Number(e[1]) + (s.split("e")[0]!.split(".")[1]?.length ?? 0));
  return s.split(".")[1]?.length ?? 0;
}

/** A figure in `tr`'s language with the decimals it was given. */
export function figureIn(tr: Translator, x: number): string {
  return tr.num(x, decimalsOf(x));
}

/**
 * An issue's message in `tr`'s language: rendered from its code, else the message it carries. English is
 * the message itself (the very bytes the checks wrote).
 */
export function issueMessage(tr: Translator, issue: { message: string } & Partial<FieldCoded>): string {
  if (!issue.code || tr.lang === "en") return issue.message;
  return renderField(tr.ns(fields), (x) => figureIn(tr, x), issue as FieldCoded);
}
