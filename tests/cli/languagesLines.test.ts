/**
 * The planner's own lines on the command line in three languages: `LANG=hu_HU.UTF-8 taut plan --demo` and
 * `--lang de` write the why lines, the limits' descriptions, the If wheels slip card and (for a train that
 * does not start) the advice in Hungarian and German, with the same figures as English, line by line.
 */
import { describe, expect, it } from "vitest";
import { tautWithEnv } from "../tools/cli.js";
import { guidance } from "../../src/i18n/en/guidance.js";
import { guidanceDe } from "../../src/i18n/de/guidance.js";
import { guidanceHu } from "../../src/i18n/hu/guidance.js";

/** The numbers of a text, a decimal comma read as a point, sorted (word order may move them within a line). */
const figures = (text: string) => [...text.matchAll(/\d+(?:[.,]\d+)?/g)].map((m) => Number(m[0].replace(",", "."))).sort((a, b) => a - b);

/** The numbered items of the section under `heading` (continuation lines joined). */
function items(text: string, heading: RegExp): string[] {
  const lines = text.split("\n");
  const start = lines.findIndex((l) => heading.test(l));
  if (start < 0) return [];
  const out: string[] = [];
  for (const l of lines.slice(start + 1)) {
    if (l.trim() === "") break;
    if (/^\d+\. /.test(l)) out.push(l);
    else if (out.length > 0) out[out.length - 1] += ` ${l.trim()}`;
  }
  return out;
}

/** The lines of the limits table (after its rule line). */
function limitRows(text: string): string[] {
  const lines = text.split("\n");
  const rule = lines.findIndex((l) => /^\s+-{5,}\s+-{5,}/.test(l));
  const out: string[] = [];
  for (const l of lines.slice(rule + 1)) {
    if (!/^\s{2}\S/.test(l)) break;
    out.push(l);
  }
  return out;
}

/** The paragraph(s) of advice: between the "why" items' end and the slip card (the first line after a blank one that is not a heading). */
function advice(text: string, first: RegExp): string {
  const at = text.search(first);
  return at < 0 ? "" : text.slice(at).split("\n\n")[0]!;
}

const runs = new Map<string, Promise<{ en: string; hu: string; de: string }>>();
/** The plan printout in the three languages (each case planned once for the tests that read it). */
function plan(...args: string[]) {
  const key = args.join(" ");
  if (!runs.has(key)) runs.set(key, planIn(args));
  return runs.get(key)!;
}

async function planIn(args: string[]) {
  const run = (env: Record<string, string>, ...more: string[]) => tautWithEnv(env, "plan", ...args, ...more);
  // One after the other: a run sets the command line's language for the process.
  const en = await run({ LANG: "C" });
  const hu = await run({ LANG: "hu_HU.UTF-8" });
  const de = await run({ LANG: "C" }, "--lang", "de");
  for (const r of [en, hu, de]) expect(r.code).toBe(0);
  return { en: en.stdout, hu: hu.stdout, de: de.stdout };
}

describe("the planner's lines on the command line", () => {
  it("why lines and limits in Hungarian and German with the same figures as English, line by line", async () => {
    const { en, hu, de } = await plan("--demo");
    const why = { en: items(en, /^Why:$/), hu: items(hu, /^Miért:$/), de: items(de, /^Warum:$/) };
    expect(why.en.length).toBeGreaterThan(2);
    for (const lang of ["hu", "de"] as const) {
      expect(why[lang].length, lang).toBe(why.en.length);
      why[lang].forEach((line, k) => {
        expect(line, lang).not.toBe(why.en[k]);
        expect(figures(line), `${lang}: ${line}`).toEqual(figures(why.en[k]!));
      });
      // The limits' descriptions: translated, with the figures of the English rows.
      const rows = { en: limitRows(en), other: limitRows(lang === "hu" ? hu : de) };
      expect(rows.other.length, lang).toBe(rows.en.length);
      rows.other.forEach((row, k) => expect(figures(row), `${lang}: ${row}`).toEqual(figures(rows.en[k]!)));
    }
    // Words of the trade, not the English: the notch and the train brake.
    expect(why.hu.join(" ")).toMatch(/fokozat/);
    expect(why.hu.join(" ")).toMatch(/vonatfék/);
    expect(why.de.join(" ")).toMatch(/Fahrstufe/);
    expect(why.de.join(" ")).toMatch(/Zugbremse/);
    expect(why.hu.join(" ") + why.de.join(" ")).not.toMatch(/\bnotch\b|train brake/);
  });

  it("the If wheels slip card in each language", async () => {
    const { en, hu, de } = await plan("--demo");
    expect(en).toContain(guidance.en.driverHoldNotch.slice(0, 40));
    expect(hu).toContain((guidanceHu.driverHoldNotch as string).slice(0, 40));
    expect(de).toContain((guidanceDe.driverHoldNotch as string).slice(0, 40));
    for (const t of [hu, de]) expect(t).not.toContain(guidance.en.driverHoldNotch.slice(0, 30));
  });

  it("the advice of a train that does not start, translated with the same figures", async () => {
    const { en, hu, de } = await plan("--demo", "--rail", "wet");
    const a = { en: advice(en, /^Limited by /m), hu: advice(hu, /^Korlát: /m), de: advice(de, /^Begrenzt durch /m) };
    expect(a.en).toMatch(/What would change it: sand/);
    for (const lang of ["hu", "de"] as const) {
      expect(a[lang], lang).not.toBe("");
      expect(figures(a[lang]), lang).toEqual(figures(a.en));
    }
  });
});
