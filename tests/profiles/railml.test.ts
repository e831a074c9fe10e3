/**
 * railML 2.x infrastructure into a location note. The files are written by the tests (tests/tools/railml.ts)
 * with known gradients and radii, so each expected profile below is worked out by hand from the file, not
 * taken from the program.
 *
 * Element and attribute names, and how values are read — the railML version and the public source of
 * each assumption:
 * - Root `railml` with `version`, namespace http://www.railml.org/schemas/2013 for railML 2.2 (and 2.3),
 *   https://www.railml.org/schemas/2018 for 2.4 and https://www.railml.org/schemas/2021 for 2.5: public
 *   railML 2.2 examples (e.g. finnishtransportagency/infra2railml marshallers/railml.js, version "2.2" with
 *   schemaLocation railML-2.2) and public 2.4 / 2.5 writers' headers [S].
 * - `infrastructure/tracks/track/trackTopology/trackBegin|trackEnd` with `pos`, `absPos` and a child
 *   `connection id= ref=` (or `openEnd`, `bufferStop`); `connections/switch` with `pos`: railML 2.2 file
 *   finnishtransportagency/infra2railml Track-007_28-47.railml.xml and marshallers/track.js [P: read].
 * - `trackElements/gradientChanges/gradientChange` with `pos`, `absPos`, `dir`, `slope` (‰): the same
 *   repository's marshallers/gradient-change.js (railML 2.2, after the railML wiki IS:gradientChange) [P].
 *   That writer gives each change twice: dir="up" with the slope as risen towards increasing position, and
 *   dir="down" with the negated slope placed at the upper end (utils/gradient-utils.js) [P] — hence: a
 *   slope rises positive as seen travelling in its `dir`, and holds from its `pos` on in that direction.
 * - `speedChange` with `pos`, `absPos`, `dir`, `vMax` (km/h); `ocsElements/signals/signal` with `pos`,
 *   `dir`, `name`, `type`: infra2railml Track-007_28-47.railml.xml (railML 2.2) [P].
 * - `dir` of speedChange, gradientChange and radiusChange is the "strict direction", "up" or "down", from
 *   railML 2.2 on: railML 2 wiki, Dev:changes/2.2, "Direction types" [P].
 * - `radiusChange/@radius` in m, "valid exactly at this point or from here until the next radiusChange":
 *   railML 2.3 schema documentation, attribute group aRadiusChange [P]. Radius 0 for straight track and a
 *   negative radius for a curve to the left: stated for railML 3's horizontalCurve/@radius (railML 3 wiki,
 *   IS:horizontalCurve) [P]; that railML 2 uses the same encoding is from memory [M].
 * - `trackElements/crossSections/crossSection` with `pos` and `ocpRef`, and
 *   `operationControlPoints/ocp` with `id`, `name`: a public railML 2 writer's output (crossSection
 *   id/pos/ocpRef, ocp id/name/code) [S]. `levelCrossings/levelCrossing` with `pos`: from memory [M].
 * - railML 3.x files (namespace https://www.railml.org/schemas/3.x) are recognised and refused with a
 *   message: no public railML 3 example found places gradientCurve / horizontalCurve on the topology, so
 *   their reading is left undone rather than guessed.
 */
import { describe, expect, it } from "vitest";
import { planStart } from "../../src/core/planner/plan.js";
import { builtinLibrary, builtinTrains } from "../../src/profiles/builtin.js";
import { createRailmlReader, RailmlError, railmlNote, railmlStretch, readRailmlText, summarise, type StretchRequest } from "../../src/profiles/railml/index.js";
import { referenceCase } from "../../src/profiles/referenceTrain.js";
import type { LocationNoteFile, SegmentFile } from "../../src/profiles/schemas.js";
import { chain, railmlFile, railmlHead, railmlTail, RAILML_24_NS, RAILML_25_NS, trackXml, type TestTrack } from "../tools/railml.js";

const seg = (from_m: number, length_m: number, gradient_permille: number, curveRadius_m: number): SegmentFile => ({ from_m, length_m, gradient_permille, curveRadius_m });

/** Turn a profile round: the same track seen from the other end (rises become falls, radii stay). */
function reversed(segs: readonly SegmentFile[]): SegmentFile[] {
  const total = segs.reduce((s, x) => s + x.length_m, 0);
  return [...segs].reverse().map((s) => seg(total - s.from_m - s.length_m, s.length_m, s.gradient_permille === 0 ? 0 : -s.gradient_permille, s.curveRadius_m));
}

function stretchOf(xml: string, req: StretchRequest) {
  const r = railmlStretch(readRailmlText(xml), req);
  if (!r.ok) throw new Error(r.message);
  return r.value;
}

/** One track, 3000 m, mileage 10 000 to 13 000 m, every change given towards increasing pos. */
const oneTrack: TestTrack = {
  id: "T1",
  name: "Down main",
  endPos: 3000,
  beginAbs: 10_000,
  endAbs: 13_000,
  gradients: [
    { pos: 0, dir: "up", value: 2 },
    { pos: 1000, dir: "up", value: 8.5 },
    { pos: 2200, dir: "up", value: -3 },
  ],
  radii: [
    { pos: 0, dir: "up", value: 0 },
    { pos: 1500, dir: "up", value: 600 },
    { pos: 1800, dir: "up", value: 0 },
    { pos: 2500, dir: "up", value: -450 },
  ],
};

describe("one track", () => {
  const xml = railmlFile({ tracks: [oneTrack] });

  it("reproduces the file's gradients and radii travelling up", () => {
    // Front at absPos 11 600 m = pos 1600; 1200 m behind (pos 400) and 900 m ahead (pos 2500).
    const s = stretchOf(xml, { front: { kind: "absPos", absPos: 11_600 }, direction: "up", behindM: 1200, aheadM: 900 });
    expect(s.segments).toEqual([seg(0, 600, 2, 0), seg(600, 500, 8.5, 0), seg(1100, 300, 8.5, 600), seg(1400, 400, 8.5, 0), seg(1800, 300, -3, 0)]);
    expect(s.frontAt_m).toBe(1200);
    expect(s.aheadM).toBe(900);
    expect(s.notes).toEqual([]);
  });

  it("turns rises into falls travelling down (the same track from the other end)", () => {
    const up = stretchOf(xml, { front: { kind: "absPos", absPos: 11_600 }, direction: "up", behindM: 1200, aheadM: 900 });
    const down = stretchOf(xml, { front: { kind: "absPos", absPos: 11_600 }, direction: "down", behindM: 900, aheadM: 1200 });
    expect(down.segments).toEqual([seg(0, 300, 3, 0), seg(300, 400, -8.5, 0), seg(700, 300, -8.5, 600), seg(1000, 500, -8.5, 0), seg(1500, 600, -2, 0)]);
    expect(down.segments).toEqual(reversed(up.segments));
    expect(down.frontAt_m).toBe(900);
  });

  it("takes a left curve (negative radius) as a curve of that radius", () => {
    const s = stretchOf(xml, { front: { kind: "pos", track: "T1", pos: 2800 }, direction: "up", behindM: 500, aheadM: 200 });
    expect(s.segments).toEqual([seg(0, 200, -3, 0), seg(200, 500, -3, 450)]);
  });

  it("stops where the line ends and says so", () => {
    const s = stretchOf(xml, { front: { kind: "pos", track: "T1", pos: 2800 }, direction: "up", behindM: 500, aheadM: 1000 });
    expect(s.aheadM).toBe(200);
    expect(s.notes.join(" ")).toMatch(/Only 200 m ahead of the front could be taken: track "Down main" \(T1\) ends \(trackEnd: openEnd\)/);
  });
});

describe("across track boundaries", () => {
  // T1 0–1000, T2 1000–2500, T3 2500–3300 (absPos), joined trackEnd → trackBegin.
  const [t1, t2, t3] = chain([1000, 1500, 800]);
  t1!.gradients = [{ pos: 0, dir: "up", value: 5 }];
  t1!.radii = [
    { pos: 0, dir: "up", value: 0 },
    { pos: 600, dir: "up", value: 500 },
  ];
  t2!.gradients = [
    { pos: 0, dir: "up", value: 7 },
    { pos: 900, dir: "up", value: 0 },
  ];
  // T2 has no radius before pos 200 and T3 no gradient before pos 300: the values carry on across the joint.
  t2!.radii = [{ pos: 200, dir: "up", value: 0 }];
  t3!.gradients = [{ pos: 300, dir: "up", value: -2 }];
  const xml = railmlFile({ tracks: [t1!, t2!, t3!] });

  it("reads a stretch over three tracks as one profile", () => {
    const s = stretchOf(xml, { front: { kind: "absPos", absPos: 2000 }, direction: "up", behindM: 1800, aheadM: 1000 });
    expect(s.segments).toEqual([seg(0, 400, 5, 0), seg(400, 400, 5, 500), seg(800, 200, 7, 500), seg(1000, 700, 7, 0), seg(1700, 900, 0, 0), seg(2600, 200, -2, 0)]);
    expect(s.tracks.map((t) => t.id)).toEqual(["T1", "T2", "T3"]);
    expect(s.frontAt_m).toBe(1800);
  });

  it("reads the same stretch the other way as its mirror image", () => {
    const up = stretchOf(xml, { front: { kind: "absPos", absPos: 2000 }, direction: "up", behindM: 1800, aheadM: 1000 });
    const down = stretchOf(xml, { front: { kind: "absPos", absPos: 2000 }, direction: "down", behindM: 1000, aheadM: 1800 });
    expect(down.segments).toEqual(reversed(up.segments));
    expect(down.tracks.map((t) => t.id)).toEqual(["T3", "T2", "T1"]);
  });

  it("follows a track laid the other way round (trackEnd joined to trackEnd)", () => {
    // T2' runs from mileage 2200 (pos 0) back to 1000 (pos 1200); its gradient rises towards its own
    // increasing pos, so walking from T1 into it (decreasing pos) the train meets a fall.
    const a: TestTrack = { id: "A", endPos: 1000, beginAbs: 0, endAbs: 1000, endConn: { id: "A_out", ref: "B_out" }, gradients: [{ pos: 0, dir: "up", value: 1 }] };
    const b: TestTrack = { id: "B", endPos: 1200, beginAbs: 2200, endAbs: 1000, endConn: { id: "B_out", ref: "A_out" }, gradients: [{ pos: 0, dir: "up", value: 4 }] };
    const twisted = railmlFile({ tracks: [a, b] });
    const fromA = stretchOf(twisted, { front: { kind: "pos", track: "A", pos: 800 }, direction: "up", behindM: 800, aheadM: 1000 });
    expect(fromA.segments).toEqual([seg(0, 1000, 1, 0), seg(1000, 800, -4, 0)]);
    // From B towards A ("up" is B's increasing pos): B rises 4 ‰, then A is walked backwards, falling 1 ‰.
    const fromB = stretchOf(twisted, { front: { kind: "pos", track: "B", pos: 700 }, direction: "up", behindM: 300, aheadM: 700 });
    expect(fromB.segments).toEqual([seg(0, 800, 4, 0), seg(800, 200, -1, 0)]);
    expect(fromB.frontAt_m).toBe(300);
  });
});

describe("directions of the changes", () => {
  it("reads changes given only for the down direction as rising the other way", () => {
    // dir="down" at pos 2000: -6 ‰ travelling down, i.e. +6 ‰ towards increasing pos, down to pos 800;
    // below pos 800 a 2 ‰ rise travelling down, i.e. -2 ‰ towards increasing pos.
    const t: TestTrack = { id: "D", endPos: 2000, gradients: [{ pos: 2000, dir: "down", value: -6 }, { pos: 800, dir: "down", value: 2 }] };
    const s = stretchOf(railmlFile({ tracks: [t] }), { front: { kind: "pos", track: "D", pos: 1000 }, direction: "up", behindM: 1000, aheadM: 500 });
    expect(s.segments).toEqual([seg(0, 800, -2, 0), seg(800, 700, 6, 0)]);
  });

  it("uses the changes given for the direction of travel when both are given", () => {
    // Up: 3 ‰ throughout. Down: a different figure (as a file may give the other track of a double line).
    const t: TestTrack = { id: "E", endPos: 1000, gradients: [{ pos: 0, dir: "up", value: 3 }, { pos: 1000, dir: "down", value: 5 }] };
    const xml = railmlFile({ tracks: [t] });
    expect(stretchOf(xml, { front: { kind: "pos", track: "E", pos: 500 }, direction: "up", behindM: 500, aheadM: 500 }).segments).toEqual([seg(0, 1000, 3, 0)]);
    expect(stretchOf(xml, { front: { kind: "pos", track: "E", pos: 500 }, direction: "down", behindM: 500, aheadM: 500 }).segments).toEqual([seg(0, 1000, 5, 0)]);
  });

  it("reads a change without dir as given towards increasing pos, and says so", () => {
    const t: TestTrack = { id: "F", endPos: 1000, gradients: [{ pos: 0, value: 3 }] };
    const m = readRailmlText(railmlFile({ tracks: [t] }));
    expect(m.warnings.join(" ")).toContain("1 gradient, radius or speed change(s) have no dir");
    const r = railmlStretch(m, { front: { kind: "pos", track: "F", pos: 500 }, direction: "down", behindM: 500, aheadM: 500 });
    expect(r.ok && r.value.segments).toEqual([seg(0, 1000, -3, 0)]);
  });
});

describe("signals, points and the speed limit", () => {
  const t: TestTrack = {
    ...oneTrack,
    speeds: [
      { pos: 0, dir: "up", value: 80 },
      { pos: 2000, dir: "up", value: 40 },
      { pos: 3000, dir: "down", value: 60 },
    ],
    signals: [
      { id: "sig1", pos: 1900, dir: "up", name: "S12" },
      { id: "sig2", pos: 1950, dir: "down", name: "S13" },
    ],
    switches: [{ id: "sw1", pos: 2100, name: "Points 7" }],
    levelCrossings: [{ id: "lx1", pos: 600 }],
  };
  const xml = railmlFile({ tracks: [t] });

  it("offers the signals facing the train, the points and crossings as hazards, at their chainage", () => {
    const s = stretchOf(xml, { front: { kind: "absPos", absPos: 11_600 }, direction: "up", behindM: 1200, aheadM: 900 });
    expect(s.hazards.map((h) => [h.kind, h.at_m])).toEqual([
      ["level-crossing", 200],
      ["signal", 1500],
      ["points", 1700],
    ]);
    expect(s.hazards[1]!.note).toContain('signal "S12"');
  });

  it("takes the lowest vMax for the direction of travel ahead of the front as the speed limit", () => {
    expect(stretchOf(xml, { front: { kind: "absPos", absPos: 11_600 }, direction: "up", behindM: 1200, aheadM: 900 }).speedLimit_kmh).toBe(40);
    expect(stretchOf(xml, { front: { kind: "absPos", absPos: 11_600 }, direction: "up", behindM: 1200, aheadM: 300 }).speedLimit_kmh).toBe(80);
    expect(stretchOf(xml, { front: { kind: "absPos", absPos: 11_600 }, direction: "down", behindM: 900, aheadM: 1200 }).speedLimit_kmh).toBe(60);
  });
});

describe("choosing where the front stands", () => {
  it("finds a named operational point through its crossSection", () => {
    const t: TestTrack = { ...oneTrack, crossSections: [{ id: "cs1", pos: 1600, ocpRef: "ocp1" }] };
    const xml = railmlFile({ tracks: [t], ocps: [{ id: "ocp1", name: "Wrenfield loop exit (invented)" }] });
    const model = readRailmlText(xml);
    expect(summarise(model).ocps).toEqual([{ id: "ocp1", label: "Wrenfield loop exit (invented)" }]);
    const byName = stretchOf(xml, { front: { kind: "ocp", ocp: "wrenfield loop exit (invented)" }, direction: "up", behindM: 1200, aheadM: 900 });
    const byAbs = stretchOf(xml, { front: { kind: "absPos", absPos: 11_600 }, direction: "up", behindM: 1200, aheadM: 900 });
    expect(byName.segments).toEqual(byAbs.segments);
    expect(byName.frontWords).toContain('operational point "Wrenfield loop exit (invented)"');
  });

  it("asks which track when a line position is on two, unless one is the main track", () => {
    const main: TestTrack = { ...oneTrack, id: "M" };
    const loop: TestTrack = { id: "L", endPos: 1000, beginAbs: 11_000, endAbs: 12_000 };
    const ambiguous = railmlStretch(readRailmlText(railmlFile({ tracks: [main, loop] })), { front: { kind: "absPos", absPos: 11_600 }, direction: "up", behindM: 500, aheadM: 100 });
    expect(ambiguous).toMatchObject({ ok: false, message: "The line position 11600 m is on 2 tracks (M, L): choose one of them." });
    const typed = railmlStretch(readRailmlText(railmlFile({ tracks: [{ ...main, type: "mainTrack" }, loop] })), { front: { kind: "absPos", absPos: 11_600 }, direction: "up", behindM: 500, aheadM: 100 });
    expect(typed.ok && typed.value.tracks[0]!.id).toBe("M");
    const chosen = railmlStretch(readRailmlText(railmlFile({ tracks: [main, loop] })), { front: { kind: "absPos", absPos: 11_600, track: "L" }, direction: "up", behindM: 500, aheadM: 100 });
    expect(chosen.ok && chosen.value.tracks[0]!.id).toBe("L");
  });

  it("says what is wrong with a front that is not on the line", () => {
    const m = readRailmlText(railmlFile({ tracks: [oneTrack] }));
    const ask = (front: StretchRequest["front"]) => railmlStretch(m, { front, direction: "up", behindM: 500, aheadM: 100 });
    expect(ask({ kind: "absPos", absPos: 20_000 })).toMatchObject({ ok: false, message: "No track covers the line position 20000 m (absPos)." });
    expect(ask({ kind: "pos", track: "X", pos: 1 })).toMatchObject({ ok: false, message: 'There is no track "X" in the file.' });
    // A file without operational points says so, and what to give instead.
    expect(ask({ kind: "ocp", ocp: "Nowhere" })).toMatchObject({ ok: false, message: 'There is no operational point "Nowhere" in the file. It names none: give a line position, or a track and a pos on it.' });
    expect(ask({ kind: "pos", track: "T1", pos: 0 })).toMatchObject({ ok: false, message: expect.stringContaining("no track behind the front") });
  });
});

describe("an operational point not found", () => {
  it("names the file's operational points (name and id, the first ten), so the next try can be one of them", () => {
    const ocps = Array.from({ length: 12 }, (_, i) => ({ id: `op${i + 1}`, name: `Invented halt ${i + 1}` }));
    const m = readRailmlText(railmlFile({ tracks: [oneTrack], ocps }));
    const r = railmlStretch(m, { front: { kind: "ocp", ocp: "Invented" }, direction: "up", behindM: 500, aheadM: 100 });
    expect(r.ok).toBe(false);
    const message = r.ok ? "" : r.message;
    expect(message).toMatch(/^There is no operational point "Invented" in the file\. Its operational points: "Invented halt 1" \(op1\), "Invented halt 2" \(op2\), /);
    expect(message).toContain('"Invented halt 10" (op10), …');
    expect(message).not.toContain("op11");
  });
});

describe("which files are read", () => {
  const body = trackXml(oneTrack);
  const withNs = (namespace: string, version: string) => railmlHead({ namespace, version }) + body + railmlTail();

  it("accepts railML 2.2 to 2.5 namespaces over http and https", () => {
    for (const [ns, v] of [
      ["http://www.railml.org/schemas/2013", "2.2"],
      ["https://www.railml.org/schemas/2013", "2.3"],
      [RAILML_24_NS, "2.4"],
      [RAILML_25_NS, "2.5"],
    ] as const) {
      const m = readRailmlText(withNs(ns, v));
      expect(m.version, ns).toBe(v);
      expect(m.tracks[0]!.gradients).toHaveLength(3);
    }
  });

  it("skips elements of other namespaces (a supplier's extensions)", () => {
    const xml = railmlFile({ tracks: [oneTrack] }).replace(
      "<trackElements>",
      '<trackElements><x:extra xmlns:x="urn:example:extension"><gradientChanges><gradientChange id="no" pos="0" dir="up" slope="55"/></gradientChanges></x:extra>',
    );
    expect(readRailmlText(xml).tracks[0]!.gradients.map((g) => g.value)).toEqual([2, 8.5, -3]);
  });

  const refused: Array<[string, string, RegExp]> = [
    ["a railML 3 file", `<?xml version="1.0"?><railML xmlns="https://www.railml.org/schemas/3.2" version="3.2"><infrastructure/></railML>`, /This is a railML 3 file \(version 3\.2\)\. Taut reads the infrastructure of railML 2\.2 to 2\.5/],
    ["another XML file", `<?xml version="1.0"?><gpx xmlns="http://www.topografix.com/GPX/1/1" version="1.1"/>`, /This is not a railML file: its root element is <gpx> in the namespace http:\/\/www\.topografix\.com\/GPX\/1\/1\./],
    ["a railML timetable", `<?xml version="1.0"?><railml xmlns="http://www.railml.org/schemas/2013" version="2.2"><timetable id="tt"/></railml>`, /has no infrastructure \(it may hold only timetables or rolling stock\)/],
    ["broken XML", railmlFile({ tracks: [oneTrack] }).slice(0, 900), /The file is not well-formed XML/],
    ["a JSON file", `{"schema":"taut/location@1"}`, /The file is not well-formed XML/],
    ["a slope that is not a number", railmlFile({ tracks: [{ ...oneTrack, gradients: [{ pos: 0, dir: "up", value: Number.NaN }] }] }), /<gradientChange id="T1_gradientChange_0">: slope="NaN" is not a number\./],
  ];
  it.each(refused)("refuses %s with a clear message", (_what, text, message) => {
    expect(() => readRailmlText(text)).toThrow(RailmlError);
    expect(() => readRailmlText(text)).toThrow(message);
  });
});

describe("hostile and huge files", () => {
  it("refuses entity declarations (billion laughs) without expanding anything", () => {
    const lol = [
      "<!DOCTYPE railml [",
      ' <!ENTITY lol "lol">',
      ...Array.from({ length: 9 }, (_, k) => ` <!ENTITY lol${k + 1} "${`&lol${k === 0 ? "" : k};`.repeat(10)}">`),
      "]>",
    ].join("\n");
    const xml = railmlFile({ tracks: [{ ...oneTrack, name: "&lol9;" }], prolog: `${lol}\n` });
    expect(() => readRailmlText(xml)).toThrow(/declares XML entities/);
  });

  it("refuses an external entity and never fetches it", () => {
    const xml = railmlFile({ tracks: [{ ...oneTrack, name: "&ext;" }], prolog: '<!DOCTYPE railml [ <!ENTITY ext SYSTEM "file:///etc/passwd"> ]>\n' });
    expect(() => readRailmlText(xml)).toThrow(/declares XML entities/);
  });

  it("refuses an entity it does not know (no DOCTYPE at all)", () => {
    expect(() => readRailmlText(railmlFile({ tracks: [{ ...oneTrack, name: "&ext;" }] }))).toThrow(/not well-formed XML/);
  });

  it("reads a large file chunk by chunk, and stops a file over its limit with a message", () => {
    // About 9 MB of railML: 3000 tracks of 25 changes each, written and read a piece at a time (the app's
    // browser test imports a 50 MB file through its worker).
    const r = createRailmlReader();
    r.write(railmlHead({}));
    let chars = 0;
    const n = 3_000;
    const tracks = chain(Array.from({ length: n }, () => 500));
    tracks.forEach((t, k) => {
      t.gradients = Array.from({ length: 25 }, (_, j) => ({ pos: j * 20, absPos: k * 500 + j * 20, dir: "up" as const, value: ((k + j) % 7) - 3 }));
      const x = trackXml(t);
      chars += x.length;
      r.write(x);
    });
    r.write(railmlTail());
    const m = r.close();
    expect(chars).toBeGreaterThan(8e6);
    expect(m.tracks).toHaveLength(n);
    // Across the joint between track 1500 and 1501: the last change of one, the first of the next.
    const s = railmlStretch(m, { front: { kind: "absPos", absPos: 1_500 * 500 }, direction: "up", behindM: 20, aheadM: 20 });
    expect(s.ok && s.value.segments).toEqual([seg(0, 20, ((1_499 + 24) % 7) - 3, 0), seg(20, 20, ((1_500 + 0) % 7) - 3, 0)]);

    const small = createRailmlReader({ maxChars: 1 << 20 });
    expect(() => {
      small.write(railmlHead({}));
      for (let k = 0; k < 1000; k++) small.write(trackXml(tracks[k]!));
    }).toThrow(/The file is larger than 1 MB: too large to read\./);
  }, 60_000);
});

describe("the note", () => {
  const xml = railmlFile({ tracks: [oneTrack] });
  const meta = { id: "railml-test", name: "Imported stretch (test)", date: "2030-04-05", initials: "QA", source: "line.xml", hazards: true };

  it("is a valid location note with the stretch's profile, front, clear distance and revision", () => {
    const s = stretchOf(xml, { front: { kind: "absPos", absPos: 11_600 }, direction: "up", behindM: 1200, aheadM: 900 });
    const n = railmlNote(s, meta);
    expect(n.ok).toBe(true);
    if (!n.ok) return;
    expect(n.value.schema).toBe("taut/location@1");
    expect(n.value.segments).toEqual(s.segments);
    expect(n.value.frontAt_m).toBe(1200);
    expect(n.value.clearAhead_m).toBe(900);
    expect(n.value.revisions).toEqual([{ date: "2030-04-05", initials: "QA", change: expect.stringContaining("Imported from railML (line.xml)") }]);
  });

  it("says which segment the notes cannot take (a curve under 80 m)", () => {
    const tight = railmlFile({ tracks: [{ ...oneTrack, radii: [{ pos: 0, dir: "up", value: 0 }, { pos: 1700, dir: "up", value: 60 }] }] });
    const s = stretchOf(tight, { front: { kind: "absPos", absPos: 11_600 }, direction: "up", behindM: 1200, aheadM: 900 });
    const n = railmlNote(s, meta);
    expect(n.ok).toBe(false);
    expect(!n.ok && n.issues[0]).toMatchObject({ path: expect.stringMatching(/^segments\[\d+\]\.curveRadius_m$/), message: expect.stringContaining("must be 0 (straight) or at least 80 m"), code: "straightOrRadius" });
  });

  it("plans exactly as the same profile typed by hand", () => {
    const s = stretchOf(xml, { front: { kind: "absPos", absPos: 11_600 }, direction: "up", behindM: 1200, aheadM: 900 });
    const imported = railmlNote(s, { ...meta, hazards: false });
    if (!imported.ok) throw new Error("note");
    // The profile a trainer would type from the same drawing: 2 ‰ for 600 m, 8.5 ‰ with a 600 m curve
    // from 1100 to 1400 m, then -3 ‰; front at 1200 m, 900 m clear.
    const typed: LocationNoteFile = {
      ...imported.value,
      segments: [
        { from_m: 0, length_m: 600, gradient_permille: 2, curveRadius_m: 0 },
        { from_m: 600, length_m: 500, gradient_permille: 8.5, curveRadius_m: 0 },
        { from_m: 1100, length_m: 300, gradient_permille: 8.5, curveRadius_m: 600 },
        { from_m: 1400, length_m: 400, gradient_permille: 8.5, curveRadius_m: 0 },
        { from_m: 1800, length_m: 300, gradient_permille: -3, curveRadius_m: 0 },
      ],
      frontAt_m: 1200,
      clearAhead_m: 900,
    };
    const lib = builtinLibrary();
    const a = referenceCase(imported.value, builtinTrains, lib);
    const b = referenceCase(typed, builtinTrains, lib);
    if (!a.ok || !b.ok) throw new Error("case");
    expect(planStart(a.value, { skipMassSearch: true })).toEqual(planStart(b.value, { skipMassSearch: true }));
  }, 60_000);
});
