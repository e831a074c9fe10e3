/**
 * The catalogs: every language has every key of every namespace, no other, with the same placeholders and
 * the same shape (a plain message or a plural pair), and nothing empty. The types check this when the
 * catalogs compile (see the @ts-expect-error lines below, which fail to compile if the check lets a
 * missing key or a misspelt placeholder through); this test checks the same at run time, from the
 * catalog objects, so a cast cannot hide a gap.
 */
import { describe, expect, it } from "vitest";
import { cliDe } from "../../src/i18n/de/cli.js";
import { de } from "../../src/i18n/de/index.js";
import { deLater } from "../../src/i18n/de/later.js";
import { fieldsDe } from "../../src/i18n/de/fields.js";
import { fieldsHu } from "../../src/i18n/hu/fields.js";
import { deChecks } from "../../src/i18n/de/checks.js";
import { NAMESPACES } from "../../src/i18n/en/index.js";
import { words } from "../../src/i18n/en/words.js";
import { cliHu } from "../../src/i18n/hu/cli.js";
import { hu } from "../../src/i18n/hu/index.js";
import { huLater } from "../../src/i18n/hu/later.js";
import { huChecks } from "../../src/i18n/hu/checks.js";
import { huCliCommands } from "../../src/i18n/hu/cliCommands.js";
import { deCliCommands } from "../../src/i18n/de/cliCommands.js";
import { fill, namespace, placeholdersOf, translation, type Catalog, type Message } from "../../src/i18n/messages.js";
import { createTranslator } from "../../src/i18n/translator.js";

const CATALOGS: Record<"hu" | "de", Catalog> = {
  hu: { ...hu, ...huLater, ...huChecks, ...huCliCommands, cli: cliHu, fields: fieldsHu },
  de: { ...de, ...deLater, ...deChecks, ...deCliCommands, cli: cliDe, fields: fieldsDe },
};
const shape = (m: Message) => (typeof m === "string" ? "text" : "plural");
const texts = (m: Message) => (typeof m === "string" ? [m] : [m.one, m.other]);

describe("catalog parity", () => {
  for (const [lang, catalog] of Object.entries(CATALOGS)) {
    it(`${lang}: every namespace, every key, the same placeholders and shape, nothing empty`, () => {
      const problems: string[] = [];
      expect(Object.keys(catalog).sort()).toEqual(NAMESPACES.map((n) => n.name).sort());
      for (const n of NAMESPACES) {
        const t = catalog[n.name]!;
        const en: Record<string, Message> = n.en;
        for (const k of Object.keys(en)) if (!(k in t)) problems.push(`${n.name}.${k}: missing`);
        for (const k of Object.keys(t)) {
          const e = en[k];
          if (e === undefined) {
            problems.push(`${n.name}.${k}: not in English`);
            continue;
          }
          const m = t[k]!;
          if (shape(m) !== shape(e)) problems.push(`${n.name}.${k}: ${shape(m)} where English has ${shape(e)}`);
          if (placeholdersOf(m).sort().join() !== placeholdersOf(e).sort().join()) problems.push(`${n.name}.${k}: placeholders ${placeholdersOf(m)} ≠ ${placeholdersOf(e)}`);
          if (texts(m).some((x) => x.trim() === "")) problems.push(`${n.name}.${k}: empty`);
          // A stray brace (an unclosed or misspelt placeholder) would print as it is.
          if (texts(m).some((x) => /[{}]/.test(x.replace(/\{[A-Za-z]+\}/g, "")))) problems.push(`${n.name}.${k}: stray brace`);
        }
      }
      expect(problems).toEqual([]);
    });

    it(`${lang}: translated, not copied — most messages differ from the English`, () => {
      let same = 0;
      let all = 0;
      for (const n of NAMESPACES) {
        for (const [k, e] of Object.entries(n.en as Record<string, Message>)) {
          all++;
          if (JSON.stringify(e) === JSON.stringify(catalog[n.name]![k])) same++;
        }
      }
      // Unit symbols, "OK", "{title}. {caption}" and the like are the same in every language; little else.
      expect(same / all).toBeLessThan(0.1);
    });
  }

  it("a translator fills placeholders, picks the plural by count and writes numbers in its language", () => {
    const ns = namespace("demo", { n: { one: "{count} wagon", other: "{count} wagons" }, v: "about {x} t" });
    const tde = createTranslator("de", { demo: { n: { one: "{count} Wagen", other: "{count} Wagen" }, v: "etwa {x} t" } });
    expect(createTranslator("en", null).ns(ns)("n", { count: 1 })).toBe("1 wagon");
    expect(createTranslator("en", null).ns(ns)("n", { count: 3 })).toBe("3 wagons");
    expect(tde.ns(ns)("v", { x: 2.5 })).toBe("etwa 2,5 t");
    expect(fill("{a} and {b}", { a: "x" }, String)).toBe("x and {b}");
  });

  it("the types reject a missing key, an extra key and a misspelt placeholder", () => {
    const t = translation<typeof words.en>();
    const ok = { ...(CATALOGS.de.words as Record<string, string>) };
    const { verdictStarts: _dropped, ...missing } = ok;
    // @ts-expect-error verdictStarts is missing
    t(missing as { [K in Exclude<keyof typeof words.en, "verdictStarts">]: string });
    // @ts-expect-error a placeholder misspelt: {wort} for {word}
    t({ ...(ok as { [K in keyof typeof words.en]: string }), verdictLabel: "Ergebnis: {wort}" } as const);
    expect(_dropped).toBe("Fährt an");
  });
});

describe("the words for a plan's codes", () => {
  it("every verdict, reason, limit, rail condition and phase has its words in every language (no key falls through)", async () => {
    const { wordsOf } = await import("../../src/i18n/words.js");
    const { RAIL_CONDITIONS } = await import("../../src/core/physics/types.js");
    const codes = {
      verdict: ["starts", "marginal", "needs-assistance"] as const,
      reason: ["adhesion", "power", "coupler", "distance", "brake"] as const,
      limit: ["adhesion", "power", "brake-holding", "coupler-tension", "coupler-compression", "distance", "time-to-target"] as const,
      phase: ["prepare", "stretch", "build", "accelerate"] as const,
    };
    for (const [lang, catalog] of [["en", null], ["hu", CATALOGS.hu], ["de", CATALOGS.de]] as const) {
      const w = wordsOf(createTranslator(lang, catalog));
      const all = [
        ...codes.verdict.flatMap((v) => [w.verdict(v), w.verdictInline(v), w.verdictLine(v)]),
        ...codes.reason.flatMap((r) => [w.reason(r), w.reasonLine(r)]),
        ...codes.limit.map((l) => w.limit(l)),
        ...RAIL_CONDITIONS.flatMap((r) => [w.rail(r), w.railInline(r)]),
        ...codes.phase.flatMap((p) => [w.phase(p), w.phaseInline(p), w.phaseLine(p)]),
      ];
      // A key that is not in the catalog comes back as the key itself ("verdictStarts"): none may.
      expect(all.filter((x) => /^[a-z]+[A-Z]/.test(x)), lang).toEqual([]);
      expect(all.every((x) => x.length > 0)).toBe(true);
    }
  });
});

describe("the cautions, from the core's codes", () => {
  it("every caution code has its words in every language, with its figures", async () => {
    const { cautionText } = await import("../../src/i18n/render.js");
    const all = [
      ...(["advisory", "decisions", "statistical", "brief", "falling-grade", "loco-brake-cannot-hold", "sand-points", "rising-grade", "sharp-curve"] as const).map((code) => ({ code })),
      { code: "protection-acts" as const, steps: 3, standstill: true },
      { code: "heating" as const, holdS: 75.4 },
    ];
    for (const [lang, catalog] of [["en", null], ["hu", CATALOGS.hu], ["de", CATALOGS.de]] as const) {
      const tr = createTranslator(lang, catalog);
      const texts = all.map((c) => cautionText(tr, c));
      expect(new Set(texts).size, lang).toBe(texts.length);
      expect(texts.every((x) => x.length > 40 && !/[{}]/.test(x)), lang).toBe(true);
      // The figures reach the words: three steps, 75 s.
      expect(texts[9], lang).toMatch(/\b3\b/);
      expect(texts[10], lang).toMatch(/\b75\b/);
    }
  });
});
