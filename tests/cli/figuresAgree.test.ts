/**
 * Every figure the readable plan prints twice reads the same in both places, on the demo cases and on the
 * bench's seeded departures (fixed seed, tests/tools/departures.ts): the header's rail figure and the limits'
 * lines, the steps table's slip risk and the step's why line, and — where the plan shown was made on another
 * rail than the limits judge (a marginal plan) — a line saying so, else the time to target and the peak
 * coupler force equal their limits' figures.
 *
 * The expected figures are worked out here from the planner's SI values with the rounding rule of the
 * printout (half away from zero, once: common practice for figures read by people), not read back from the
 * renderer; a figure rounded twice (206.46 kN → 206.5 → 207) fails the first check.
 */
import { readdirSync, readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { planStart, type PlanResult, type StartCase } from "../../src/core/index.js";
import { renderPlan } from "../../src/cli/render/plan.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { planReport } from "../../src/profiles/report.js";
import { seededDepartures } from "../tools/departures.js";

const casesDir = fileURLToPath(new URL("../../profiles/cases/", import.meta.url));
const lib = builtinLibrary();
const demos: Array<{ name: string; c: StartCase }> = readdirSync(casesDir)
  .filter((f) => f.endsWith(".json"))
  .map((f) => {
    const r = parseStartCase(JSON.parse(readFileSync(casesDir + f, "utf8")), lib);
    if (!r.ok) throw new Error(f);
    return { name: f, c: r.value };
  });
const seeded = seededDepartures(10, 30).map((c, i) => ({ name: `seeded departure ${i + 1}`, c }));

/** Whole kN, half away from zero, from newtons — worked out here, apart from src/i18n/rounding.ts. */
const kNText = (n: number): string => { const k = Math.floor(Math.abs(n) / 1000 + 0.5); return k === 0 ? "0" : `${n < 0 ? "-" : ""}${k}`; };
/** Whole percent as the printout writes it: "<1%"/"< 1 %" above zero where it would read 0. */
const pctText = (x: number): string => (x > 0 && x * 100 < 0.5 ? "<1" : String(Math.floor(x * 100 + 0.5)));

function disagreements(c: StartCase, p: PlanResult): string[] {
  const out: string[] = [];
  const text = renderPlan(planReport(c, p));
  const lines = text.split("\n");
  // 1. The header names the resistance at start as such, and does not call it "needed" (the limits' "needed" is
  //    resistance plus the slowest acceptable acceleration): one word, one quantity.
  const adhesionLine = lines.find((l) => l.startsWith("Adhesion:"))!;
  if (/needed/.test(adhesionLine)) out.push(`header says needed: ${adhesionLine}`);
  const resistance = /Resistance at start: (-?\d+) kN/.exec(text)?.[1];
  const total = kNText(p.static.resistance.totalN);
  if (resistance !== total) out.push(`resistance ${resistance} against ${total}`);
  if (!adhesionLine.includes(`against a resistance at start of ${total} kN`)) out.push(`header resistance: ${adhesionLine}`);
  // 1b. Its breakdown adds up to the total printed (a sum a driver can check by hand), each part within one kN
  //     of its exact value — the largest-remainder rounding (Balinski & Young, "Fair Representation", 1982).
  const parts = /\(breakaway (-?\d+) \+ running (-?\d+) \+ grade (-?\d+) \+ curve (-?\d+)\)/.exec(text)?.slice(1).map(Number);
  const exact = [p.static.resistance.startingN, p.static.resistance.runningN, p.static.resistance.gradeN, p.static.resistance.curveN].map((n) => n / 1000);
  if (!parts || parts.reduce((a, b) => a + b, 0) !== Number(total)) out.push(`resistance parts ${parts?.join(" + ")} do not add up to ${total}`);
  else parts.forEach((x, i) => { if (Math.abs(x - exact[i]!) >= 1) out.push(`resistance part ${i}: ${x} against ${exact[i]}`); });
  // 2. The header's rail figure, rounded once from newtons.
  if (!adhesionLine.includes(`→ ${kNText(p.static.adhesionLimitN)} kN at standstill`)) out.push(`header rail ${adhesionLine} against ${kNText(p.static.adhesionLimitN)} kN`);
  // 3. Each step's slip risk: the table's cell and the why line's figure.
  const table = lines.filter((l) => /^\d+ {2}/.test(l));
  const why = text.split("\nWhy:\n")[1] ?? "";
  p.steps.forEach((s, i) => {
    const row = table[i];
    const expected = pctText(s.slipRisk);
    if (!row || !row.includes(` ${expected}%`)) out.push(`step ${i + 1}: table ${row} against slip risk ${expected}%`);
    const w = s.why.line;
    if (w.code === "build" || w.code === "accelerate") {
      const own = why.split(new RegExp(`(?:^|\\n)${i + 1}\\. `))[1]?.split(/\n\d+\. /)[0]?.replace(/\s+/g, " ") ?? "";
      const said = /slip risk (< 1|\d+) %/.exec(own)?.[1]?.replace("< 1", "<1");
      if (said !== expected) out.push(`step ${i + 1}: why line slip risk ${said} against the table's ${expected}`);
    }
  });
  // 4. Which rail each figure belongs to.
  const q = p.planQuantile;
  const threshold = c.settings.slipRiskThreshold;
  const labelled = /the marginal plan, made on the rail at its (\d+) % quantile; the limits above are judged on the rail at its (\d+) % quantile/.exec(text.replace(/\s+/g, " "));
  if (p.steps.length > 0 && q !== threshold) {
    if (!labelled || labelled[1] !== String(Math.round(q * 100)) || labelled[2] !== String(Math.round(threshold * 100))) out.push(`marginal plan on ${q} not labelled`);
  } else {
    if (labelled) out.push("plan on the threshold's rail labelled as marginal");
    const time = /Time to target: (\d+) s from taking power {3}peak coupler force (\d+) kN/.exec(text);
    const limitTime = /target reached (\d+) s after taking power/.exec(text);
    if (time && limitTime && time[1] !== limitTime[1]) out.push(`time to target ${time[1]} s against its limit's ${limitTime[1]} s`);
    const pull = /peak pull (\d+) kN against/.exec(text);
    if (time && pull && time[2] !== pull[1]) out.push(`peak coupler force ${time[2]} kN against the tension limit's ${pull[1]} kN`);
  }
  return out;
}

describe("every figure the plan printout gives twice agrees", () => {
  const onOtherRail: string[] = [];
  for (const { name, c } of [...demos, ...seeded]) {
    it(name, () => {
      const p = planStart(c, { skipMassSearch: true });
      if (p.steps.length > 0 && p.planQuantile !== c.settings.slipRiskThreshold) onOtherRail.push(name);
      expect(disagreements(c, p)).toEqual([]);
    }, 240_000);
  }
  it("the sample holds a plan made on the marginal bound's rail (the labelling is exercised)", () => {
    expect(seeded.length).toBe(10);
    expect(onOtherRail.length).toBeGreaterThan(0);
  });
});
