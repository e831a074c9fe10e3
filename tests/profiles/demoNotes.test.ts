/**
 * The demo location notes agree with themselves: what a note says in words — where the train stands, its
 * practice, its hazards — is what its own profile gives for its own reference train, and each demo case
 * stands on its note with that note's reference train. (Illustrative data; the checks are the profile's
 * geometry read back with the core's track functions.)
 */
import { describe, expect, it } from "vitest";
import { curveRadiusAt, gradeAt } from "../../src/core/physics/track.js";
import { builtinCases, builtinLibrary, builtinLocations, builtinTrains } from "../../src/profiles/builtin.js";
import { trackFromSegments } from "../../src/profiles/convert.js";
import { referenceCase, referenceSummary } from "../../src/profiles/referenceTrain.js";
import type { LocationNoteFile } from "../../src/profiles/schemas.js";

const lib = builtinLibrary();
const note = (id: string) => builtinLocations.find((n) => n.id === id)!;

/** The standing train of a note's reference train: the chainages under it, 1 m apart, front first. */
function under(n: LocationNoteFile): { at: number[]; grade: number[]; radius: number[]; lengthM: number } {
  const lengthM = referenceSummary(n.referenceTrain!, builtinTrains, lib).lengthM;
  const track = trackFromSegments(n.segments);
  const at = Array.from({ length: Math.floor(lengthM) }, (_, k) => n.frontAt_m - 0.5 - k);
  return { at, grade: at.map((x) => gradeAt(track, x)), radius: at.map((x) => curveRadiusAt(track, x)), lengthM };
}

const hazard = (n: LocationNoteFile, kind: string) => n.hazards.find((h) => h.kind === kind)!;
const ahead = (n: LocationNoteFile, kind: string) => hazard(n, kind).at_m! - n.frontAt_m;

describe("demo location notes", () => {
  it("each says where the train stands and names its reference train, which fits on its profile", () => {
    for (const n of builtinLocations) {
      expect(n.standing?.length, n.id).toBeGreaterThan(20);
      expect(n.referenceTrain, n.id).toBeDefined();
      expect(referenceCase(n, builtinTrains, lib).ok, n.id).toBe(true);
    }
  });

  it("each demo case stands on its note with the note's reference train (the mixed train: on a demo note, with a train of its own)", () => {
    for (const c of builtinCases) {
      const n = note(c.location as string);
      // The mixed demo is another train at a demo place: empties at the head, a loaded block at the rear.
      if (c.train.groups) {
        expect(n, c.id).toBeDefined();
        continue;
      }
      const preset = builtinTrains.find((t) => t.id === n.referenceTrain!.train)!;
      expect(c.train, c.id).toMatchObject(preset.train);
      expect(c.locomotives, c.id).toEqual(preset.locomotives);
    }
  });

  it("Ashvale Loop: the whole train on the 8 ‰ rise inside the 400 m curve, 10 ‰ beyond; points 150 m and signal 600 m ahead", () => {
    const n = note("ashvale-loop-up");
    const u = under(n);
    expect(new Set(u.radius)).toEqual(new Set([400]));
    expect(new Set(u.grade)).toEqual(new Set([8]));
    expect(gradeAt(trackFromSegments(n.segments), n.frontAt_m + 1)).toBe(10);
    expect(n.practice).toContain("whole train in the 400 m curve");
    expect(n.standing).toContain("inside the 400 m curve");
    expect(ahead(n, "points")).toBe(150);
    expect(ahead(n, "signal")).toBe(600);
    expect(n.clearAhead_m).toBe(600);
  });

  it("Cinderfield Yard: the whole train on the level, 2 ‰ up beyond the throat points 150 m ahead", () => {
    const n = note("cinderfield-yard");
    const u = under(n);
    expect(new Set(u.grade)).toEqual(new Set([0]));
    expect(new Set(u.radius)).toEqual(new Set([0]));
    expect(gradeAt(trackFromSegments(n.segments), n.frontAt_m + 100)).toBe(2);
    expect(ahead(n, "points")).toBe(150);
    expect(hazard(n, "points").note).toContain("150 m ahead");
  });

  it("Lantern Dip: across the sag, the front 300 m up the 7 ‰ bank, the rear on the 6 ‰ fall, mostly in the 600 m curve; the signal 350 m ahead", () => {
    const n = note("lantern-dip");
    const u = under(n);
    const track = trackFromSegments(n.segments);
    // The low point: where the gradient turns from falling to rising.
    const low = n.segments.find((s, k) => k > 0 && s.gradient_permille > 0 && n.segments[k - 1]!.gradient_permille < 0)!.from_m;
    expect(n.frontAt_m - low).toBe(300);
    expect(gradeAt(track, n.frontAt_m - 1)).toBe(7);
    expect(u.grade.at(-1)).toBe(-6);
    expect(u.radius.filter((r) => r === 600).length / u.at.length).toBeGreaterThan(0.5);
    expect(n.practice).toContain("front 300 m up the bank");
    expect(n.practice).toContain("600 m curve");
    expect(n.standing).toContain("300 m up the 7 ‰ bank");
    expect(ahead(n, "signal")).toBe(350);
    expect(n.clearAhead_m).toBe(350);
    expect(n.practice).toContain("350 m ahead");
  });
});
