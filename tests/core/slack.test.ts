/**
 * Initial slack state from the profile (PHYSICS.md §4–§5; PRACTICE.md "Sag", "Crest"): bunched on a
 * falling grade and in a sag, stretched on a rising grade and over a crest; and the coupling law's
 * pre-loaded buffers (EN 15551 [S] for the stroke; the preload value is from memory [M]).
 */
import { describe, expect, it } from "vitest";
import { buildConsist } from "../../src/core/train/consist.js";
import { gearDeflectionM, gearLoadingForceN, PRELOAD_RAMP_M, screwCoupling, knuckleCoupling } from "../../src/core/physics/coupling.js";
import { initialSlack } from "../../src/core/train/slack.js";
import type { StartCase } from "../../src/core/train/types.js";
import type { TrackProfile } from "../../src/core/physics/types.js";
import { uniformCase } from "../tools/cases.js";

function withTrack(track: TrackProfile, frontAtM: number): StartCase {
  const c = uniformCase({ wagons: 30 });
  return { ...c, location: { track, frontAtM, clearAheadM: 500 } };
}
const seg = (startM: number, lengthM: number, gradePermille: number) => ({ startM, lengthM, gradePermille, curveRadiusM: 0 });
const slackOf = (c: StartCase) => Array.from(initialSlack(buildConsist(c), c.location.track, "from-profile"));

describe("slack state from the profile", () => {
  it("stretched on a rising grade, bunched on a falling one, bunched on the level (stopped on its brakes)", () => {
    expect(slackOf(withTrack({ segments: [seg(-5000, 10000, 8)] }, 0)).every((s) => s === 1)).toBe(true);
    expect(slackOf(withTrack({ segments: [seg(-5000, 10000, -8)] }, 0)).every((s) => s === -1)).toBe(true);
    expect(slackOf(withTrack({ segments: [seg(-5000, 10000, 0)] }, 0)).every((s) => s === -1)).toBe(true);
  });
  it("bunched in a sag: the front climbs, the rear falls", () => {
    // The train (about 470 m) stands with its front 200 m past the low point at 1000 m.
    const sag = { segments: [seg(0, 1000, -8), seg(1000, 2000, 8)] };
    expect(slackOf(withTrack(sag, 1200)).every((s) => s === -1)).toBe(true);
  });
  it("stretched over a crest: the front falls away, the rear still climbs", () => {
    const crest = { segments: [seg(0, 1000, 8), seg(1000, 2000, -8)] };
    expect(slackOf(withTrack(crest, 1200)).every((s) => s === 1)).toBe(true);
  });
  it("the chosen state overrides the profile", () => {
    const c = withTrack({ segments: [seg(-5000, 10000, 8)] }, 0);
    expect(Array.from(initialSlack(buildConsist(c), c.location.track, "bunched")).every((s) => s === -1)).toBe(true);
  });
});

describe("coupling law", () => {
  it("screw-coupling buffers push back with their preload as soon as they are touched", () => {
    const buff = screwCoupling(0).buff;
    expect(gearLoadingForceN(buff, PRELOAD_RAMP_M)).toBeGreaterThanOrEqual(30_000);
    expect(gearLoadingForceN(buff, 0)).toBe(0);
    // Inverse of the loading curve, preload included.
    for (const f of [10_000, 30_000, 200_000, 800_000]) expect(gearLoadingForceN(buff, gearDeflectionM(buff, f))).toBeCloseTo(f, 3);
  });
  it("knuckle draft gear: 2.52 MN at 148 mm, two 74 mm gears in series (maker's datasheet [P])", () => {
    const d = knuckleCoupling(0.05).draft;
    expect(gearLoadingForceN(d, 0.148)).toBeCloseTo(2.52e6, 6);
    expect(gearDeflectionM(d, 2.52e6)).toBeCloseTo(0.148, 9);
  });
});
