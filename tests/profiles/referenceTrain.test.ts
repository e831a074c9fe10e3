/** A note's reference train: the start case its drawing and load table are worked out for. */
import { describe, expect, it } from "vitest";
import { loadTable, plannerStarts, staticCheck, withTrailingMass, type StartCase } from "../../src/core/index.js";
import { referenceCase, referenceCaseFile, referenceLocomotives, referenceSummary } from "../../src/profiles/referenceTrain.js";
import { builtinLibrary, builtinTrains } from "../../src/profiles/builtin.js";
import type { ReferenceTrainFile } from "../../src/profiles/schemas.js";
import { sampleNote } from "../notes/helpers.js";

const lib = builtinLibrary();
/** A demo train hauled by one locomotive at the head, whichever the demo set names so. */
const single = builtinTrains.find((t) => t.locomotives.length === 1 && t.locomotives[0]!.count === 1 && t.locomotives[0]!.position === "head")!;
const singleLoco = single.locomotives[0]!.profile as string;
const otherLoco = [...lib.locomotives.keys()].find((id) => id !== singleLoco)!;
/** The static check as the verdict: fast, and monotonic in mass, grade and tractive effort. */
const staticStarts = (c: StartCase) => staticCheck(c).verdict === "starts";

describe("referenceCase", () => {
  it("puts the preset train on the note's own profile, front where the note says", () => {
    const r = referenceCase(sampleNote({ referenceTrain: { train: single.id } }), builtinTrains, lib);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.location.frontAtM).toBe(1200);
    expect(r.value.location.clearAheadM).toBe(500);
    expect(r.value.location.track.segments.map((s) => s.gradePermille)).toEqual([4, 9]);
    expect(r.value.train.trailingMassKg).toBe(single.train.trailingMass_t * 1000);
    expect(r.value.train.wagons).toBe(single.train.wagons);
    expect(r.value.conditions.temperatureC).toBe(10);
  });

  it("uses another locomotive profile and count at the head when the note names them", () => {
    expect(referenceLocomotives({ train: single.id, locomotive: otherLoco, count: 2 }, single)).toEqual([{ profile: otherLoco, count: 2, position: "head" }]);
    expect(referenceLocomotives({ train: single.id }, single)).toBe(single.locomotives);
    expect(referenceLocomotives({ train: single.id, count: 3 }, single)).toEqual([{ profile: singleLoco, count: 3, position: "head" }]);
    const r = referenceCase(sampleNote(), builtinTrains, lib, { train: single.id, locomotive: otherLoco, count: 2 });
    expect(r.ok && r.value.locomotives.map((g) => [g.spec.id, g.count])).toEqual([[otherLoco, 2]]);
  });

  it("sums the train's length with its locomotives", () => {
    const s = referenceSummary({ train: single.id, count: 2 }, builtinTrains, lib);
    expect(s.lengthM).toBeCloseTo(single.train.length_m! + 2 * lib.locomotives.get(singleLoco)!.file.length_m, 9);
    expect(s.locomotives).toContain("2 × ");
    expect(s.locomotives).toContain("at the head");
    expect(Number.isNaN(referenceSummary({ train: "no-such-train" }, builtinTrains, lib).lengthM)).toBe(true);
  });

  it("names an unknown train preset", () => {
    const r = referenceCaseFile(sampleNote({ referenceTrain: { train: "no-such-train" } }), builtinTrains);
    expect(r.ok).toBe(false);
    expect(!r.ok && r.issues[0]!.path).toBe("referenceTrain.train");
  });

  it("says when the train does not fit on the profile", () => {
    const r = referenceCase(sampleNote({ frontAt_m: 300, referenceTrain: { train: single.id } }), builtinTrains, lib);
    expect(r.ok).toBe(false);
    expect(!r.ok && r.issues[0]!.message).toMatch(/puts the rear of the \d+ m train at -\d+ m, before the profile starts/);
  });
});

describe("a note's load table", () => {
  const caseFor = (over: Parameters<typeof sampleNote>[0], ref: ReferenceTrainFile = { train: single.id }) => {
    const r = referenceCase(sampleNote({ ...over, referenceTrain: ref }), builtinTrains, lib);
    if (!r.ok) throw new Error(JSON.stringify(r.issues));
    return r.value;
  };

  it("falls on a steeper note and rises with a second locomotive", () => {
    const base = loadTable(caseFor({}), staticStarts);
    const steep = loadTable(caseFor({ segments: sampleNote().segments.map((s) => ({ ...s, gradient_permille: s.gradient_permille + 6 })) }), staticStarts);
    const twin = loadTable(caseFor({}, { train: single.id, count: 2 }), staticStarts);
    base.forEach((row, k) => {
      expect(row.maxTrailingMassKg).toBeGreaterThan(0);
      expect(steep[k]!.maxTrailingMassKg).toBeLessThan(row.maxTrailingMassKg);
      expect(twin[k]!.maxTrailingMassKg).toBeGreaterThan(row.maxTrailingMassKg);
    });
  });

  it("agrees with the planner just below and just above its own figure (dry rail, no sand)", () => {
    const dry = { ...caseFor({}), conditions: { rail: "dry" as const, sand: false, temperatureC: 10 } };
    const rows = loadTable(dry, plannerStarts);
    const row = rows.find((x) => x.rail === "dry" && !x.sand)!;
    expect(row.maxTrailingMassKg).toBeGreaterThan(0);
    expect(plannerStarts(withTrailingMass(dry, row.maxTrailingMassKg))).toBe(true);
    expect(plannerStarts(withTrailingMass(dry, row.maxTrailingMassKg + 1000))).toBe(false);
  }, 300_000);
});
