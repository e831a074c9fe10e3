/** What the profile drawing and the card's key figures are made of: pure functions, checked by hand. */
import { describe, expect, it } from "vitest";
import { noteFigures, stretchFigures } from "../../../src/app/screens/LocationNotes/figures.js";
import { idFromName, joinSegments, nextSegment } from "../../../src/app/screens/LocationNotes/draft.js";
import { alongGround, profileModel, slackSentence } from "../../../src/app/screens/LocationNotes/profileModel.js";
import { referenceCase } from "../../../src/profiles/referenceTrain.js";
import { builtinLibrary, builtinLocations, builtinTrains } from "../../../src/profiles/builtin.js";

const lib = builtinLibrary();
const segs = [
  { from_m: 0, length_m: 1000, gradient_permille: -5, curveRadius_m: 0 },
  { from_m: 1000, length_m: 1000, gradient_permille: 10, curveRadius_m: 300 },
];

describe("profile model", () => {
  it("integrates the elevation from the gradients (h = Σ L·sin(atan(i)))", () => {
    const m = profileModel({ segments: segs, frontAt_m: 1500, clearAhead_m: 200, hazards: [] }, undefined)!;
    expect(m.ground.map((p) => p.x)).toEqual([0, 1000, 2000]);
    expect(m.ground[1]!.h).toBeCloseTo(-1000 * Math.sin(Math.atan(0.005)), 9);
    expect(m.ground[2]!.h).toBeCloseTo(-1000 * Math.sin(Math.atan(0.005)) + 1000 * Math.sin(Math.atan(0.01)), 9);
    expect(alongGround(m.ground, 500, 500)[0]!.h).toBeCloseTo(m.ground[1]!.h / 2, 9);
  });

  it("numbers hazards by chainage and extends the drawing to the end of the clear distance", () => {
    const m = profileModel(
      {
        segments: segs,
        frontAt_m: 1900,
        clearAhead_m: 400,
        hazards: [
          { kind: "signal", at_m: 2250 },
          { kind: "points", at_m: 1950 },
          { kind: "other", note: "no place given" },
        ],
      },
      undefined,
    )!;
    expect(m.hazards.map((h) => h.kind)).toEqual(["points", "signal"]);
    expect(m.endM).toBe(2300);
    expect(m.clearEndM).toBe(2300);
  });

  it("splits the train into slack runs that cover it from front to rear", () => {
    const note = { segments: segs, frontAt_m: 1300, clearAhead_m: 300, hazards: [] };
    const c = referenceCase({ ...note, referenceTrain: { train: builtinTrains[0]!.id } }, builtinTrains, lib);
    expect(c.ok).toBe(true);
    if (!c.ok) return;
    const t = profileModel(note, c.value)!.train!;
    expect(t.runs[0]!.frontM).toBe(1300);
    expect(t.runs[t.runs.length - 1]!.rearM).toBeCloseTo(t.rearM, 9);
    for (let k = 1; k < t.runs.length; k++) expect(t.runs[k]!.frontM).toBe(t.runs[k - 1]!.rearM);
    expect(t.runs.reduce((n, r) => n + r.couplings, 0)).toBe(t.vehicles - 1);
    // Standing across the low point at 1000 m: bunched there.
    expect(t.runs.some((r) => r.state === "bunched" && r.frontM > 1000 && r.rearM < 1000)).toBe(true);
  });

  it("says the slack state in plain words, front to rear", () => {
    const dist = (m: number) => `${Math.round(m)} m`;
    expect(slackSentence([{ state: "stretched", frontM: 500, rearM: 0, couplings: 9 }], dist)).toMatch(/^Stretched from end to end/);
    expect(slackSentence([{ state: "bunched", frontM: 500, rearM: 0, couplings: 9 }], dist)).toMatch(/^Bunched from end to end/);
    expect(
      slackSentence(
        [
          { state: "stretched", frontM: 500, rearM: 300, couplings: 3 },
          { state: "bunched", frontM: 300, rearM: 100, couplings: 3 },
          { state: "stretched", frontM: 100, rearM: 0, couplings: 2 },
        ],
        dist,
      ),
    ).toBe("Stretched over the front 200 m, bunched over the next 200 m, stretched over the rear 100 m.");
  });
});

describe("key figures", () => {
  it("weights the gradient under the train by length and finds the sharpest curve", () => {
    const f = noteFigures(segs, 1300, 600, 400);
    // Rear at 700: 300 m at −5 ‰ and 300 m at +10 ‰.
    expect(f.under!.meanGradient).toBeCloseTo(2.5, 12);
    expect([f.under!.minGradient, f.under!.maxGradient, f.under!.sharpestRadius]).toEqual([-5, 10, 300]);
    expect(f.ahead).toEqual({ meanGradient: 10, minGradient: 10, maxGradient: 10, sharpestRadius: 300 });
  });
  it("takes the end segments as continuing beyond the profile, as the physics does", () => {
    expect(stretchFigures(segs, 1900, 2600)!.meanGradient).toBe(10);
    expect(stretchFigures(segs, -300, 100)!.meanGradient).toBe(-5);
    expect(stretchFigures(segs, 100, 100)).toBeUndefined();
  });
});

describe("draft helpers", () => {
  it("makes a unique id from a name", () => {
    expect(idFromName("Ashvale Loop, up departure!", new Set())).toBe("ashvale-loop-up-departure");
    expect(idFromName("Ashvale Loop, up departure!", new Set(["ashvale-loop-up-departure"]))).toBe("ashvale-loop-up-departure-2");
    expect(idFromName("   ", new Set())).toBe("note");
    expect(idFromName("Élan côte", new Set())).toBe("elan-cote");
  });
  it("joins segments end to end and continues the last one", () => {
    const gapped = [segs[0]!, { ...segs[1]!, from_m: 1100 }];
    expect(joinSegments(gapped).map((s) => s.from_m)).toEqual([0, 1000]);
    expect(nextSegment(segs)).toEqual({ from_m: 2000, length_m: 500, gradient_permille: 10, curveRadius_m: 300 });
  });
  it("builds the built-in demo notes' profiles without error", () => {
    for (const n of builtinLocations) expect(profileModel({ ...n } as Parameters<typeof profileModel>[0], undefined)?.ground.length).toBeGreaterThan(1);
  });
});
