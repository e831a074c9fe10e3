/**
 * The planner's lines (codes with figures from the core: src/core/planner/lines.ts, limitLines.ts, the
 * assistance note) have words in every language: one example of every code, written by the one renderer
 * (src/i18n/renderLines.ts) in English, Hungarian and German, leaves no placeholder unfilled, reads
 * differently in each language, and carries its figures — the same numbers in every language, written with
 * the language's decimal sign. The examples are typed by code, so a code added to the core without an
 * example here is a compile error.
 */
import { describe, expect, it } from "vitest";
import type { AssistanceNote } from "../../src/core/dispatch/assistance.js";
import type { AdviceLine, BandWhat, ChangeLine, HelperCall, LimitWhat, SlipDriverLine, SlipHeadline, SlipProtectionLine, SlipStallLine, StepWhy, WhyLine } from "../../src/core/planner/lines.js";
import { de } from "../../src/i18n/de/index.js";
import { hu } from "../../src/i18n/hu/index.js";
import { helperCallText, siQuantities, stepWhyText, whyLineText } from "../../src/i18n/renderLines.js";
import { adviceText, bandWhatText, limitWhatText } from "../../src/i18n/renderAdvice.js";
import { slipGuidanceText, slipHeadlineText } from "../../src/i18n/renderSlip.js";
import { assistanceNoteText } from "../../src/i18n/renderAssistNote.js";
import { createTranslator, type Translator } from "../../src/i18n/translator.js";

type ByCode<T extends { code: string }> = { [K in T["code"]]: Extract<T, { code: K }> };

const speed = { kind: "speed", speedMps: 20 / 3.6 } as const;
const distance = { kind: "distance", distanceM: 750 } as const;
// Figures chosen to be told apart: forces in N (shown in kN), lengths in m, times in s.
const WHY: ByCode<WhyLine> = {
  "prepare-hold-back": { code: "prepare-hold-back", pullN: 55_400, notch: 1, notchN: 61_200, locoBrakeN: 203_000, lengthM: 414, releaseS: 38, sand: true },
  "prepare-gravity-loco-brake": { code: "prepare-gravity-loco-brake", pullN: 118_000, locoBrakeN: 203_000, lengthM: 414, releaseS: 38 },
  "prepare-gravity-train-brake": { code: "prepare-gravity-train-brake", pullN: 318_000, locoBrakeN: 203_000, sharePercent: 23, trainBrakeN: 1_373_000 },
  "prepare-brakes-off": { code: "prepare-brakes-off", lengthM: 414, releaseS: 38, sand: false },
  stretch: { code: "stretch", notch: 3, effortN: 175_000, resistanceN: 187_000, stretchTravelM: 0.2, peakN: 160_000, allowanceN: 708_000, fastOverMps: 1.6 / 3.6 },
  build: { code: "build", atMps: 0.8 / 3.6, notch: 5, asksN: 285_000, use: 0.76, risk: 0.011, dwellS: 3, peakN: 253_000, allowanceN: 708_000 },
  accelerate: { code: "accelerate", notch: 6, target: speed, effortN: 284_000, risk: 0.677, higherNoMore: true },
  "roll-then-power": { code: "roll-then-power", accelMps2: 0.07, toMps: 12 / 3.6, travelM: 80, staged: true, target: distance },
  "roll-to-target": { code: "roll-to-target", accelMps2: 0.12, staged: false, target: speed, travelM: 129, clearM: 600 },
};
const WHAT: ByCode<LimitWhat> = {
  gravity: { code: "gravity" },
  "adhesion-path": { code: "adhesion-path", quantile: 0.1, availableN: 273_000, needN: 196_000, speedMps: 20 / 3.6, travelM: 1667 },
  "power-path": { code: "power-path", availableN: 443_000, needN: 196_000, speedMps: 20 / 3.6, travelM: 1667 },
  "hold-rising": { code: "hold-rising", locoBrakeN: 203_000, powerN: 325_000, pullN: 55_000 },
  "hold-falling": { code: "hold-falling", trainBrakeN: 1_373_000, locoBrakeN: 203_000, pullN: 318_000 },
  "coupler-tension": { code: "coupler-tension", peakN: 295_000, limitN: 850_000, factor: 1.2 },
  "coupler-compression": { code: "coupler-compression", peakN: 38_000, limitN: 850_000, factor: 1.2 },
  "wheel-climb": { code: "wheel-climb", ratio: 0.93, vehicle: { kind: "wagon", number: 12, massKg: 24_000 }, forceN: 412_000, radiusM: 150, allowance: 0.83, nadal: 1, nadalMargin: 1.2 },
  "wheel-climb-none": { code: "wheel-climb-none" },
  distance: { code: "distance", travelM: 14, power: true, orTarget: true, clearM: 600 },
  "target-reached": { code: "target-reached", afterS: 86 },
  "target-not-reached": { code: "target-not-reached", share: 0.64 },
};
const BAND: ByCode<BandWhat> = {
  "rail-quantile": { code: "rail-quantile", quantile: 0.25 },
  "no-reserve": { code: "no-reserve" },
  "no-reserve-bound": { code: "no-reserve-bound" },
  "working-limit": { code: "working-limit" },
  "stretch-within-clear": { code: "stretch-within-clear" },
  "nadal-itself": { code: "nadal-itself" },
};
const CHANGES: ByCode<ChangeLine> = {
  sand: { code: "sand", margin: 1.02 },
  "better-rail": { code: "better-rail", sand: true, margin: 1.89 },
  "less-load": { code: "less-load", startsKg: 2_419_000, marginalKg: 2_555_000, scaled: true },
  "less-load-none": { code: "less-load-none" },
  "less-load-unsearched": { code: "less-load-unsearched" },
  assistance: { code: "assistance" },
};
const ADVICE: ByCode<AdviceLine> = {
  "limited-by": { code: "limited-by", limit: "adhesion", margin: 0.78, what: WHAT["adhesion-path"] },
  "within-band": { code: "within-band", limits: [{ limit: "adhesion", band: BAND["rail-quantile"] }] },
  relaxed: { code: "relaxed", quantile: 0.25, oneIn: 4 },
  changes: { code: "changes", changes: Object.values(CHANGES) },
};
const NOTES: ByCode<AssistanceNote> = {
  "all-at-head": { code: "all-at-head" },
  pushing: { code: "pushing", added: [{ count: 1, position: { afterWagon: 9 } }, { count: 1, position: "rear" }], control: "helper", where: "rear", peakN: 188_000, coupling: 26, couplings: 29, rear: true },
};
const DRIVER: SlipDriverLine[] = ["hold-notch", "keep-sanding", "sand-now", "no-sanders-ease", "drop-fallback", "wait-settle", "no-spin", "stop-sanding-points"];
const PROTECTION: SlipProtectionLine[] = ["sands-itself", "no-sanders-only-power", "cuts-power", "reapplies"];
const STALL: SlipStallLine[] = ["grade-secure", "grade-suspect-brake", "grade-restart", "grade-no-bunching", "ask-assistance", "level-shut-off", "level-suspect-brake", "level-restart"];
const HEADLINES: SlipHeadline[] = [
  { hold: { code: "no-power" }, then: { code: "take-power", sand: true } },
  { hold: { code: "hold", notch: 5, sand: false }, then: { code: "drop", notch: 4 } },
  { hold: { code: "hold", notch: 2, sand: true }, then: { code: "shut-off", notch: 2 } },
];
const CALLS: HelperCall[] = (["take", "shut-off", "ease"] as const).map((act, k) => ({ headNotch: 4, place: { at: "rear", helper: true }, act, notch: k === 1 ? 0 : 3, followS: 3, stretch: k === 0 }));

/** The numbers in a text, a decimal comma read as a point (grouping: none in these figures). */
const figures = (text: string) => [...text.matchAll(/\d+(?:[.,]\d+)?/g)].map((m) => Number(m[0].replace(",", "."))).sort((a, b) => a - b);

const LANGS: Array<[string, Translator]> = [
  ["en", createTranslator("en", null)],
  ["hu", createTranslator("hu", hu)],
  ["de", createTranslator("de", de)],
];

/** Every example of every kind, rendered by `tr`. */
function rendered(tr: Translator): string[] {
  const q = siQuantities(tr);
  const why = (line: WhyLine): StepWhy => ({ line, protection: null, groups: null });
  return [
    ...Object.values(WHY).map((w) => whyLineText(tr, q, w)),
    stepWhyText(tr, q, {
      ...why(WHY.build),
      protection: { asksN: 345_000, givesN: 322_000, risk: 0.68, standstill: true },
      groups: [
        { place: { at: "head", helper: false }, notch: 5, share: 0.52 },
        { place: { at: { afterWagon: 30 }, helper: true }, notch: 3, share: 0.48 },
      ],
    }),
    ...Object.values(WHAT).map((w) => limitWhatText(tr, q, w)),
    ...Object.values(BAND).map((b) => bandWhatText(tr, b)),
    ...Object.values(ADVICE).map((a) => adviceText(tr, q, a)),
    ...Object.values(NOTES).map((n) => assistanceNoteText(tr, q, n)),
    ...Object.values(slipGuidanceText(tr, { driver: DRIVER, protection: PROTECTION, stall: STALL })).flat(),
    ...HEADLINES.flatMap((h) => Object.values(slipHeadlineText(tr, h))),
    ...CALLS.map((c) => helperCallText(tr, c)),
  ];
}

describe("the planner's lines in every language", () => {
  const byLang = LANGS.map(([lang, tr]) => [lang, rendered(tr)] as const);
  const [, en] = byLang[0]!;

  it("every code has words: no placeholder left, nothing empty, each line its own", () => {
    for (const [lang, texts] of byLang) {
      for (const t of texts) {
        expect(t, lang).not.toMatch(/[{}]/);
        expect(t.trim().length, lang).toBeGreaterThan(1);
      }
      // Different codes never read the same (a missing key would fall back to a neighbour's words).
      const distinct = new Set(texts);
      expect(distinct.size, lang).toBe(texts.length);
    }
  });

  it("Hungarian and German are translated, not the English copied", () => {
    for (const [lang, texts] of byLang.slice(1)) {
      const same = texts.filter((t, k) => t === en[k]);
      // Only lines made of figures and symbols alone may read the same (none of these are).
      expect(same, lang).toEqual([]);
    }
  });

  it("the figures reach the words: the same numbers in every language, the decimal sign per language", () => {
    for (const [lang, texts] of byLang.slice(1)) {
      texts.forEach((t, k) => {
        // Hungarian and German write the ordinal "5." or words around the figures; the numbers are the same.
        expect(figures(t), `${lang}: ${t}`).toEqual(figures(en[k]!));
      });
      expect(texts.join(" "), lang).toMatch(/\d,\d/);
      expect(texts.join(" "), lang).not.toMatch(/\d\.\d/);
    }
    // Some figures as English writes them: 55,400 N → 55 kN; 20 km/h; 0.07 m/s²; 2,419,000 kg → 2419 t.
    const all = en.join(" ");
    for (const x of ["55 kN", "20.0 km/h", "0.07 m/s²", "2419 t", "1373 kN", "L/V 0.93 at wagon 12 (24 t)", "÷ 1.2"]) expect(all).toContain(x);
  });
});
