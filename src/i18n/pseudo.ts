/**
 * Pseudo-localisation, for layout checks: every message about 40 % longer (letters repeated, spread over
 * its words, so lines still wrap where they would) and written with accented letters, placeholders kept.
 * A layout that holds it holds Hungarian and German, whose sentences run longer than English. The app
 * uses it when localStorage "taut.pseudo" is "1" (the browser checks, tests/e2e/languages.test.ts).
 */
import type { Message } from "./messages.js";

const ACCENTED: Readonly<Record<string, string>> = {
  a: "á", e: "é", i: "í", o: "ö", u: "ü", y: "ý", c: "ç", n: "ñ", s: "š", z: "ž",
  A: "Á", E: "É", I: "Í", O: "Ö", U: "Ü", Y: "Ý", C: "Ç", N: "Ñ", S: "Š", Z: "Ž",
};

/** One template, pseudo-localised; `{name}` placeholders are left as they are. */
export function pseudoText(text: string): string {
  const letters = text.replace(/\{[^{}]*\}/g, "").replace(/[^A-Za-z]/g, "").length;
  const chars = text.replace(/\{[^{}]*\}/g, "").length;
  // 40 % of the text's length, added as repeated letters spread evenly: the k-th letter is repeated
  // floor(k·extra/letters) − floor((k−1)·extra/letters) times.
  const extra = letters > 0 ? Math.ceil(0.4 * chars) : 0;
  let k = 0;
  return text.replace(/\{[^{}]*\}|[A-Za-z]/g, (m) => {
    if (m.length > 1) return m;
    const a = ACCENTED[m] ?? m;
    k++;
    const times = Math.floor((k * extra) / letters) - Math.floor(((k - 1) * extra) / letters);
    return a + a.toLowerCase().repeat(times);
  });
}

export function pseudoMessage(m: Message): Message {
  return typeof m === "string" ? pseudoText(m) : { one: pseudoText(m.one), other: pseudoText(m.other) };
}
