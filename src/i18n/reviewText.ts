/**
 * A Start review's sentences as data — a message key of the `review` namespace with its values — and their
 * rendering in a translator's language. The review (src/profiles/reviewReport.ts) and the recording
 * readers (src/profiles/recording.ts) say what they found this way; the JSON keeps the English rendering,
 * `taut review` and the app render it in the language chosen.
 */
import type { LimitName, Verdict } from "../core/planner/outcome.js";
import { review } from "./en/review.js";
import type { Translator } from "./translator.js";
import { wordsOf } from "./words.js";

/** A value in a sentence: text, a whole number, a figure with its decimals ("—" when there is none), a verdict or a limit (words in the language), or a sentence of its own. */
export type ReviewArg = string | number | { readonly x: number | null; readonly d: number } | { readonly verdict: Verdict } | { readonly limit: LimitName } | { readonly text: ReviewText };

export interface ReviewText {
  readonly key: keyof typeof review.en & string;
  readonly params?: Readonly<Record<string, ReviewArg>>;
}

/** A figure with `d` decimals. */
export const fig = (x: number | null | undefined, d: number): ReviewArg => ({ x: x ?? null, d });

/** The sentence in the translator's language. */
export function reviewText(tr: Translator, m: ReviewText): string {
  const w = wordsOf(tr);
  const values: Record<string, string | number> = {};
  for (const [k, v] of Object.entries(m.params ?? {})) {
    if (typeof v === "string" || typeof v === "number") values[k] = v;
    else if ("x" in v) values[k] = v.x === null || !Number.isFinite(v.x) ? "—" : tr.num(v.x, v.d);
    else if ("verdict" in v) values[k] = w.verdictInline(v.verdict);
    else if ("limit" in v) values[k] = w.limit(v.limit);
    else values[k] = reviewText(tr, v.text);
  }
  return (tr.ns(review) as unknown as (key: string, params: Record<string, string | number>) => string)(m.key, values);
}
