/**
 * What a printed card says it was computed from: the FNV-1a hash behind its fingerprint against the
 * published test vectors, and the fingerprint of a note changing with every input of its figures (profile,
 * where the train stands, speed limit, reference train, rail-condition table, program version) and with
 * nothing else (name, practice, hazards).
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { builtinLibrary, builtinLocations, builtinTrains } from "../../src/profiles/builtin.js";
import { canonicalJson, cardProvenance, fingerprint, fnv1a32, noteFigureInputs, railDefaultsLine } from "../../src/profiles/provenance.js";
import type { LocationNoteFile } from "../../src/profiles/schemas.js";

const lib = builtinLibrary();
const note = builtinLocations[0]!;
const print = (n: LocationNoteFile, version = "1.2.3", l = lib) => fingerprint(noteFigureInputs(n, builtinTrains, l, version));

describe("FNV-1a, 32 bit", () => {
  // Test vectors of FNV-1a 32: D. Eastlake, L. C. Noll, G. Fowler, K.-P. Vo, T. Hansen, "The FNV
  // Non-Cryptographic Hash Algorithm", IETF draft-eastlake-fnv (revision 14 and later), test vectors
  // section [S: quoted in Boost.Hash2's test/fnv1a.cpp]; "fo" and "foo" from L. C. Noll's test_fnv.c suite
  // [S: quoted in public test files of FNV implementations].
  it.each([
    ["", 0x811c9dc5],
    ["a", 0xe40c292c],
    ["fo", 0x6222e842],
    ["foo", 0xa9f37ed7],
    ["foobar", 0xbf9cf968],
  ])("hashes %j to the published value", (text, expected) => {
    expect(fnv1a32(text)).toBe(expected);
  });

  it("hashes the UTF-8 bytes of text beyond ASCII (Node's own encoder gives the bytes)", () => {
    for (const text of ["é", "‰", "gradient 6 ‰ — 450 m", "😀"]) {
      let h = 0x811c9dc5;
      for (const b of Buffer.from(text, "utf8")) h = Math.imul(h ^ b, 0x01000193) >>> 0;
      expect(fnv1a32(text), text).toBe(h);
    }
  });
});

describe("canonical JSON and the fingerprint", () => {
  it("does not depend on the order keys were written in", () => {
    expect(canonicalJson({ b: 1, a: { d: [1, { y: 2, x: 3 }], c: null } })).toBe('{"a":{"c":null,"d":[1,{"x":3,"y":2}]},"b":1}');
    expect(fingerprint({ a: 1, b: 2 })).toBe(fingerprint({ b: 2, a: 1 }));
    expect(fingerprint({ a: 1, b: 2 })).toMatch(/^[0-9a-f]{4}-[0-9a-f]{4}$/);
  });
});

describe("a note's fingerprint", () => {
  const base = print(note);

  it("changes with every input of the card's figures", () => {
    const seg0 = note.segments[0]!;
    const changed: Array<[string, string]> = [
      ["a gradient", print({ ...note, segments: [{ ...seg0, gradient_permille: seg0.gradient_permille + 0.5 }, ...note.segments.slice(1)] })],
      ["a curve", print({ ...note, segments: [{ ...seg0, curveRadius_m: seg0.curveRadius_m === 0 ? 600 : 0 }, ...note.segments.slice(1)] })],
      ["where the front stands", print({ ...note, frontAt_m: note.frontAt_m - 10 })],
      ["the distance clear ahead", print({ ...note, clearAhead_m: note.clearAhead_m + 10 })],
      ["the speed limit", print({ ...note, speedLimit_kmh: (note.speedLimit_kmh ?? 40) + 5 })],
      ["the reference train", print({ ...note, referenceTrain: { train: builtinTrains.find((t) => t.id !== (note.referenceTrain?.train ?? builtinTrains[0]!.id))!.id } })],
      ["the temperature", print({ ...note, referenceTrain: { ...(note.referenceTrain ?? { train: builtinTrains[0]!.id }), temperature_C: -15 } })],
      ["the rail-condition table", print(note, "1.2.3", { ...lib, adhesion: { ...lib.adhesion, wet: { ...lib.adhesion.wet, median: lib.adhesion.wet.median - 0.01 } } })],
      ["the program version", print(note, "1.2.4")],
    ];
    for (const [what, fp] of changed) expect(fp, what).not.toBe(base);
    // All different from one another, too.
    expect(new Set(changed.map(([, fp]) => fp)).size).toBe(changed.length);
  });

  it("stays the same when only words change", () => {
    expect(print({ ...note, name: `${note.name} (renamed)`, practice: "Other words.", hazards: [], seasons: [] })).toBe(base);
  });

  it("is printed with the revision number and date, the version and the rail defaults", () => {
    const more = { ...note, revisions: [...note.revisions, { date: "2031-02-03", initials: "QA", change: "Checked." }] };
    const p = cardProvenance(more, builtinTrains, lib, "1.2.3");
    expect(p.revision).toBe(note.revisions.length + 1);
    expect(p.revisionDate).toBe("2031-02-03");
    expect(p.version).toBe("1.2.3");
    // The defaults in words, read against the shipped table file itself.
    const file = JSON.parse(readFileSync(new URL("../../profiles/conditions/rail-conditions.json", import.meta.url), "utf8")) as {
      conditions: Record<string, { median: number; sanded: number }>;
    };
    for (const [rail, c] of Object.entries(file.conditions)) expect(p.rail).toContain(`${rail} ${c.median.toFixed(2)} / ${c.sanded.toFixed(2)}`);
    expect(railDefaultsLine(lib.adhesion)).toBe(p.rail);
  });
});
