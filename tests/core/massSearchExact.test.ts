/**
 * The notch rule's look-ahead (`fallsShort`, src/core/planner/search.ts) takes two exact short cuts: it skips
 * the rail's risk at each speed when the risk at the target already exceeds the quantile (the risk ahead is at
 * least that one at every speed below the target), and it ends its walk as soon as the start is behind the
 * slowest start's time at the target (the time only grows on the way). The claim is exactness, so the reference
 * is the same code with the short cuts off (`setFallsShortTopRisk(false)`: the walk as it was): every plan,
 * every judgement of a mass search (mass, verdict, score, why) and every answer to the kilogram identical.
 *
 * Cases: the departures among the first 100 seeded all-different ones (tests/bench/departures.ts) whose mass
 * searches judge the most masses (0-based 24, 63, 64, 67, 84, 93; in 84 the train creeps at its limit and the
 * look-ahead runs at every control interval; 93's verdict is not monotone in mass: it holds at 739 t, fails at
 * 740.6 t and holds again at 748.6–758.2 t), and 30 smaller seeded departures (tests/tools/departures.ts).
 */
import { isDeepStrictEqual } from "node:util";
import { afterEach, describe, expect, it } from "vitest";
import { goesJudgement, judge, planStart, startableMasses, withTrailingMass, type JudgementReason, type StartCase } from "../../src/core/index.js";
import { fallsShortTopRiskWalks, setFallsShortTopRisk } from "../../src/core/planner/search.js";
import { withLumpedWagons } from "../../src/core/train/lumped.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { allDifferentDepartures } from "../bench/departures.js";
import { seededDepartures } from "../tools/departures.js";

afterEach(() => setFallsShortTopRisk(true));

const lib = builtinLibrary();
const first100 = allDifferentDepartures(100);
function departure(k: number): StartCase {
  const r = parseStartCase(first100[k], lib);
  if (!r.ok) throw new Error(`seeded departure ${k} does not parse`);
  return r.value;
}

interface Judged {
  need: "starts" | "goes";
  massKg: number;
  holds: boolean;
  score: number;
  why: JudgementReason;
}

/** Both searches with the short cuts on or off: the answers, every judgement, and the short-cut walks taken. */
function search(c: StartCase, on: boolean) {
  setFallsShortTopRisk(on);
  const own = judge(c, { depth: "marginal" }).verdict;
  const judged: Judged[] = [];
  const walks = fallsShortTopRiskWalks();
  const m = startableMasses(c, { own, onJudgement: (need, massKg, holds, score, why) => judged.push({ need, massKg, holds, score, why }) });
  return { m, judged, walks: fallsShortTopRiskWalks() - walks };
}

function expectSameSearch(c: StartCase, what: string): void {
  const before = search(c, false);
  const after = search(c, true);
  expect(before.walks, `${what}: no short cut with the switch off`).toBe(0);
  expect(after.m, what).toEqual(before.m);
  expect(after.judged, what).toEqual(before.judged);
}

describe("the look-ahead's short cuts change no plan and no mass search", () => {
  it("a train creeping at its limit (departure 84 at its largest marginal mass): the same plan, with the short cuts taken", () => {
    const c = withTrailingMass(departure(84), 4_496_503);
    setFallsShortTopRisk(false);
    const w0 = fallsShortTopRiskWalks();
    const before = planStart(c, { skipMassSearch: true, skipSensitivity: true });
    expect(fallsShortTopRiskWalks()).toBe(w0);
    setFallsShortTopRisk(true);
    const after = planStart(c, { skipMassSearch: true, skipSensitivity: true });
    // Every figure, the series and the steps included (-0 and +0 told apart).
    expect(after.verdict).toBe(before.verdict);
    expect(isDeepStrictEqual(after, before)).toBe(true);
    // The short cut is what this test is about: it must have been taken, at many control intervals.
    expect(fallsShortTopRiskWalks() - w0).toBeGreaterThan(1000);
  });

  it("the same train on lumped wagons (the mass search's guide): the same judgement", () => {
    const c = withTrailingMass(departure(84), 4_514_509);
    const judged = (on: boolean) => {
      setFallsShortTopRisk(on);
      return withLumpedWagons(9, () => goesJudgement(c, undefined, { stopWhenFailed: true }));
    };
    const w0 = fallsShortTopRiskWalks();
    const before = judged(false);
    expect(fallsShortTopRiskWalks()).toBe(w0);
    expect(judged(true)).toEqual(before);
    expect(fallsShortTopRiskWalks() - w0).toBeGreaterThan(1000);
  });

  for (const k of [84, 64, 63, 24, 67, 93]) {
    it(`departure ${k} (0-based): every judgement and both answers identical`, () => {
      expectSameSearch(departure(k), `departure ${k}`);
    });
  }

  it("30 smaller seeded departures: every judgement and both answers identical", () => {
    const cases = seededDepartures(30, 40);
    expect(cases.length).toBe(30);
    for (const [k, c] of cases.entries()) expectSameSearch(c, `small departure ${k + 1}`);
  });
});
