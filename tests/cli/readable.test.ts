/**
 * The readable plan as a driver reads it at night: a figure it gives twice reads alike, a capped margin is not
 * printed as if exact, and the "still slipping" column never tells a driver in notch 1 to drop to notch 1 —
 * it says what the app's step cards and Cab steps say there (shut off, start again: the core's slipHeadline).
 * Over the demo cases (profiles/cases). Expected figures are worked out here from the planner's SI values
 * (rounding half away from zero, once: common practice for figures read by people).
 */
import { readdirSync, readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { afterEach, describe, expect, it } from "vitest";
import { planStart, type PlanResult, type StartCase } from "../../src/core/index.js";
import { renderPlan } from "../../src/cli/render/plan.js";
import { marginNum, textTable } from "../../src/cli/table.js";
import { setCliLanguage } from "../../src/cli/lang.js";
import { parseSequence, renderSimulation, simulateCase } from "../../src/cli/commands/simulate.js";
import { tableCommand } from "../../src/cli/commands/table.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { planReport } from "../../src/profiles/report.js";

const casesDir = fileURLToPath(new URL("../../profiles/cases/", import.meta.url));
const lib = builtinLibrary();
const demos: Array<{ name: string; c: StartCase; p: PlanResult; text: string }> = readdirSync(casesDir)
  .filter((f) => f.endsWith(".json"))
  .map((f) => {
    const r = parseStartCase(JSON.parse(readFileSync(casesDir + f, "utf8")), lib);
    if (!r.ok) throw new Error(f);
    const p = planStart(r.value, { skipMassSearch: true });
    return { name: f, c: r.value, p, text: renderPlan(planReport(r.value, p)) };
  });

/** Half away from zero, to `d` decimals, once. */
const once = (x: number, d: number): string => (Math.sign(x) * Math.floor(Math.abs(x) * 10 ** d + 0.5) / 10 ** d).toFixed(d);

describe("the readable plan, as a driver reads it", () => {
  it("the demo cases hold a step with no lower notch to drop to, and one with a fallback (both cells are exercised)", () => {
    const steps = demos.flatMap((d) => d.p.steps.filter((s) => s.notch > 0));
    expect(steps.some((s) => s.fallbackNotch >= s.notch)).toBe(true);
    expect(steps.some((s) => s.fallbackNotch > 0 && s.fallbackNotch < s.notch)).toBe(true);
  });

  for (const d of demos) {
    it(`${d.name}: "still slipping" drops to a lower notch, or says shut off and start again`, () => {
      const rows = d.text.split("\n").filter((l) => /^\d+ {2}/.test(l));
      expect(rows).toHaveLength(d.p.steps.length);
      d.p.steps.forEach((s, i) => {
        const cell = rows[i]!.split(/ {2,}/).at(-1);
        if (s.notch <= 0) expect(cell).toBe("—");
        else if (s.fallbackNotch > 0 && s.fallbackNotch < s.notch) expect(cell).toBe(`notch ${s.fallbackNotch}`);
        else expect(cell).toBe("shut off, start again");
      });
    });

    it(`${d.name}: the stretch line gives the last vehicle's move as the plan has it, and agrees with the stretch step's why`, () => {
      const st = d.p.stretch;
      const line = /Stretch: last vehicle moves ([\d.]+) s after taking power, after ([\d.]+) m of locomotive travel/.exec(d.text);
      if (st.lastVehicleMovesS === null || st.locoTravelToStretchM === null) return;
      expect(line?.slice(1)).toEqual([once(st.lastVehicleMovesS, 1), once(st.locoTravelToStretchM, 2)]);
      // The why line of the stretch step says "after about X m" to 0.1 m: the two may differ by its rounding only.
      const about = /last vehicle moves after about ([\d.]+) m of locomotive travel/.exec(d.text.replace(/\s+/g, " "))?.[1];
      if (about !== undefined) expect(Math.abs(Number(about) - Number(line![2]))).toBeLessThanOrEqual(0.05 + 1e-9);
    });
  }

  it("a margin the core caps at 99 reads 99+, not 99.00, and stays in its right-aligned column", () => {
    expect(marginNum(99)).toBe("99+");
    expect(marginNum(98.994)).toBe("98.99");
    expect(marginNum(1.4)).toBe("1.40");
    expect(textTable(["margin"], [["1.40"], ["99+"]]).split("\n").slice(2)).toEqual(["  1.40", "   99+"]);
    const capped = demos.filter((d) => d.p.limits.some((l) => l.margin >= 99));
    expect(capped.length).toBeGreaterThan(0);
    for (const d of capped) {
      expect(d.text).not.toMatch(/\b99\.00\b/);
      for (const l of d.p.limits.filter((x) => x.margin >= 99)) expect(d.text).toMatch(new RegExp(`\\n {2}${l.name.replace("-", " ")}\\s+99\\+ {2}`));
    }
  });
});

describe("a column of masses keeps its figures right-aligned in every language", () => {
  afterEach(() => setCliLanguage("en"));
  // The load table's "none" (not even a light train starts) in English, Hungarian and German: a column holding it
  // fell back to left alignment in hu/de ("nincs", "keine"), so 683 stood under 2063's first digits.
  for (const [lang, none] of [["en", "none"], ["hu", "nincs"], ["de", "keine"]] as const) {
    it(lang, () => {
      setCliLanguage(lang);
      const rows = textTable(["rail", "no sand"], [["dry", "2063"], ["damp", "683"], ["leaves", none]]).split("\n").slice(2);
      const ends = rows.map((r) => r.length);
      expect(new Set(ends).size, rows.join("\n")).toBe(1);
      expect(rows[1]!.endsWith(" 683")).toBe(true);
    });
  }
});

describe("taut simulate, read after a run that did not start", () => {
  // The covered-goods demo on its leaf-fall rail, power taken well before the plan's moment for the locomotive
  // brake to come off (the train brake's release along the train: about 45 s).
  const goods = demos.find((d) => d.name === "demo-goods-cinderfield.json")!;
  const early = simulateCase(goods.c, parseSequence("1@0,4@5,8@10", 8), {});
  const text = renderSimulation(early);

  it("the exercised run ends before the locomotive brake comes off, with a slip", () => {
    expect(early.final.time_s).toBeLessThan(early.locoBrakeRelease_s);
    expect(early.slipEvents.length).toBeGreaterThan(0);
    expect(String(early.locoBrakeRelease_s)).toMatch(/\.\d{4,}/); // worked out, not given
  });

  it("gives the worked-out release to 0.1 s, as the run's other times", () => {
    expect(text).toContain(`locomotive brake off at ${once(early.locoBrakeRelease_s, 1)} s`);
    expect(text).not.toMatch(/brake off at \d+\.\d{2,} s/);
    // One given on the command line reads as given.
    expect(renderSimulation(simulateCase(goods.c, parseSequence("1@0,4@5,8@10", 8), { releaseAtS: 7.25, durationS: 8 }))).toContain("locomotive brake off at 7.25 s");
  });

  it("says the locomotive brake was still applied when the run ended, beside the slip and the stall", () => {
    const flat = text.replace(/\s+/g, " ");
    expect(flat).toContain(`WARNING: The locomotive brake was still applied when the run ended at ${once(early.final.time_s, 1)} s; it comes off at ${once(early.locoBrakeRelease_s, 1)} s`);
    expect(early.warnings.some((w) => w.startsWith("The locomotive brake was still applied"))).toBe(true);
    // A run that lasts past the release says nothing of it.
    const late = simulateCase(goods.c, parseSequence("1@0", 8), { durationS: Math.ceil(early.locoBrakeRelease_s) + 2 });
    expect(late.warnings.some((w) => w.includes("locomotive brake was still applied"))).toBe(false);
  });

  it("counts a slip's power cuts in words that agree with the count (1 power cut, not 1 cuts)", () => {
    expect(text).toMatch(/\(1 power cut\)|\(\d+ power cuts\)/);
    expect(text).not.toMatch(/\(\d+ cuts\)/);
  });
});

describe("usage lines mark as optional what has a default", () => {
  it("taut table: --loco has a default (the reference train's locomotives), so it stands in brackets", () => {
    expect(tableCommand.usage).toContain("[--loco ID]");
    expect(tableCommand.usage).not.toMatch(/(^|\s)--loco ID/);
  });
});

describe("the step table's slip risk column lines up its figures", () => {
  it("a plan with steps the slip protection acts in (marked *): every row's % stands in one place", () => {
    const marked = demos.filter((d) => d.p.steps.some((s) => s.protectionActs) && d.p.steps.some((s) => !s.protectionActs && s.notch > 0));
    expect(marked.length).toBeGreaterThan(0);
    for (const d of marked) {
      const lines = d.text.split("\n");
      const head = lines.findIndex((l) => l.startsWith("#  phase"));
      const spans = [...lines[head + 1]!.matchAll(/-+/g)].map((m) => [m.index, m.index + m[0].length] as const);
      const col = lines[head]!.indexOf("slip risk");
      const [from, to] = spans.find(([a, b]) => col >= a && col < b)!;
      const rows = lines.slice(head + 2, head + 2 + d.p.steps.length);
      const at = rows.map((r) => r.slice(from, to).indexOf("%"));
      expect(new Set(at).size, `${d.name}\n${rows.join("\n")}`).toBe(1);
    }
  });
});
