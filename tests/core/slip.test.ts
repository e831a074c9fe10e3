/**
 * The "If wheels slip" card against what drivers are taught (PRACTICE.md "Wheel slip"): reduce the throttle
 * on continued slip and apply sand [P: US Navy NAVFAC P-301 railway operating handbook]; hold the notch and
 * sand on electronically controlled units, drop one notch on conventional ones [S: Indian Railways crew
 * guidance]; never advance while traction current is still rising [P: NAVFAC P-301; Alaska Railroad, Air
 * Brake and Train Handling Manual, 1996, p. 64-18]. The card must give these in the order they are done and
 * never tell the driver to hold and to drop in the same breath.
 */
import { describe, expect, it } from "vitest";
import { slipGuidance as slipCodes, slipHeadline as headlineCodes } from "../../src/core/planner/slip.js";
import { headlineEn, slipEn } from "../tools/english.js";

// The card and headline come from the core as codes; the checks read their English words (src/i18n/en/guidance.ts).
const slipGuidance = (x: Parameters<typeof slipCodes>[0]) => slipEn(slipCodes(x));
const slipHeadline = (notch: number, fallback: number, sanders?: boolean) => headlineEn(headlineCodes(notch, fallback, sanders));

const base = { sand: false, sanders: true, risingGrade: true, pointsAhead: true };

/** Index of the first item matching a pattern (−1 when none). */
const at = (items: readonly string[], re: RegExp) => items.findIndex((t) => re.test(t));

describe("If wheels slip: what the driver does", () => {
  it("leads with hold, then sand, then drop to the fallback if it keeps slipping, then wait for the current to settle", () => {
    const g = slipGuidance(base);
    const hold = at(g.driver, /^Hold the notch while the protection acts/);
    const sand = at(g.driver, /^Sand now/);
    const drop = at(g.driver, /keeps returning, drop to this step's fallback notch/);
    const settle = at(g.driver, /current to settle before advancing/);
    expect([hold, sand, drop, settle]).toEqual([0, 1, 2, 3]);
    // Nothing in what the driver does says to notch up.
    expect(g.driver.filter((t) => /\bnotch up\b/i.test(t) && !/do not notch up/i.test(t))).toEqual([]);
  });

  it("gives what the protection does as the reason for holding, not as steps of its own", () => {
    const g = slipGuidance(base);
    expect(Object.keys(g)).toEqual(["driver", "protection", "stall"]);
    for (const t of g.protection) expect(t).toMatch(/^(It|This locomotive) /);
    expect(g.protection.join(" ")).toMatch(/cuts power/);
  });

  it("says what it can about sand: keep sanding, sand now, or no sanders", () => {
    expect(slipGuidance({ ...base, sand: true }).driver[1]).toBe("Keep sanding.");
    expect(slipGuidance(base).driver[1]).toBe("Sand now.");
    const none = slipGuidance({ ...base, sanders: false });
    expect(none.driver[1]).toMatch(/No sanders/);
    expect(none.protection[0]).toMatch(/no sanders/);
  });

  it("on a rising grade, secures the train first and warns against bunching the slack (Alaska Railroad manual p. 64-18 [P])", () => {
    const stall = slipGuidance(base).stall;
    expect(stall[0]).toMatch(/secure the train/);
    expect(stall.join(" ")).toMatch(/Do not bunch the slack/);
    expect(slipGuidance({ ...base, risingGrade: false }).stall.join(" ")).not.toMatch(/bunch/);
  });
});

describe("the headline of a step", () => {
  it("says hold first and drop only if the slip keeps returning", () => {
    const h = slipHeadline(5, 4);
    expect(h.hold).toBe("Hold notch 5 while the protection acts, and sand.");
    expect(h.then).toBe("Still slipping: drop to notch 4.");
  });

  it("never tells the driver to drop to the notch in hand or above it: shut off instead", () => {
    expect(slipHeadline(1, 1).then).toMatch(/shut off/);
    expect(slipHeadline(3, 3).then).not.toMatch(/drop/);
  });

  it("without sanders leaves sand out, and for a step without power says what to do once power is taken", () => {
    expect(slipHeadline(5, 4, false).hold).toBe("Hold notch 5 while the protection acts.");
    expect(slipHeadline(0, 0).hold).toBe("No power in this step.");
  });
});
