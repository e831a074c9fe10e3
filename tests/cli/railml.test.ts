/**
 * `taut notes from-railml`: a railML 2.2 file written by the test (element names and their sources: see
 * tests/profiles/railml.test.ts) becomes a taut/location@1 note that the rest of the command line reads;
 * a hostile or non-railML file is refused with exit code 2 and nothing written.
 */
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { parseLocationNote } from "../../src/profiles/parse.js";
import { chain, railmlFile } from "../tools/railml.js";
import { taut } from "../tools/cli.js";

const dir = mkdtempSync(join(tmpdir(), "taut-railml-cli-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const file = (name: string, text: string) => {
  const p = join(dir, name);
  writeFileSync(p, text);
  return p;
};

// Two tracks of 2000 m, mileage 5000 to 9000 m: 4 ‰ then 9 ‰ on the first, a 700 m curve on the second.
const [a, b] = chain([2000, 2000], 5000);
a!.name = "Up main west";
a!.gradients = [
  { pos: 0, dir: "up", value: 4 },
  { pos: 1500, dir: "up", value: 9 },
];
a!.radii = [{ pos: 0, dir: "up", value: 0 }];
b!.gradients = [{ pos: 0, dir: "up", value: 9 }];
b!.radii = [
  { pos: 0, dir: "up", value: 0 },
  { pos: 400, dir: "up", value: 700 },
  { pos: 900, dir: "up", value: 0 },
];
b!.signals = [{ id: "s1", pos: 600, dir: "up", name: "Exit 3" }];
b!.crossSections = [{ id: "cs1", pos: 200, ocpRef: "o1" }];
const line = file("line.railml", railmlFile({ tracks: [a!, b!], ocps: [{ id: "o1", name: "Hollin Gate loop (invented)" }] }));

describe("taut notes from-railml", () => {
  it("writes a location note for the stretch around the front", async () => {
    const out = join(dir, "note.json");
    const r = await taut("notes", "from-railml", line, "--at", "7200", "--direction", "up", "--behind", "1000", "--ahead", "1000", "--json", "--out", out);
    expect(r.code).toBe(0);
    const note = JSON.parse(r.stdout) as unknown;
    expect(JSON.parse(readFileSync(out, "utf8"))).toEqual(note);
    const parsed = parseLocationNote(note);
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    // absPos 6200–8200: first track 1200–2000 (4 ‰ to pos 1500, then 9 ‰), second track 0–1200.
    expect(parsed.value.segments).toEqual([
      { from_m: 0, length_m: 300, gradient_permille: 4, curveRadius_m: 0 },
      { from_m: 300, length_m: 900, gradient_permille: 9, curveRadius_m: 0 },
      { from_m: 1200, length_m: 500, gradient_permille: 9, curveRadius_m: 700 },
      { from_m: 1700, length_m: 300, gradient_permille: 9, curveRadius_m: 0 },
    ]);
    expect(parsed.value.frontAt_m).toBe(1000);
    expect(parsed.value.clearAhead_m).toBe(1000);
    expect(parsed.value.hazards).toEqual([{ kind: "signal", at_m: 1400, note: expect.stringContaining('"Exit 3"') }]);
  });

  it("takes an operational point by name, and prints a readable table without --json", async () => {
    const r = await taut("notes", "from-railml", line, "--at", "Hollin Gate loop (invented)", "--direction", "down", "--behind", "600", "--ahead", "500");
    expect(r.code).toBe(0);
    expect(r.stdout).toContain("Hollin Gate loop (invented)");
    expect(r.stdout).toMatch(/from m\s+length m\s+gradient ‰\s+radius m/);
    // Travelling down from pos 200 of the second track (600 m behind: pos 800 back to 200; 500 m ahead:
    // pos 200 to 0, then the first track from its end back to pos 1700): the 9 ‰ rise up is a 9 ‰ fall
    // down, through the 700 m curve (pos 900 to 400) for its first 400 m.
    expect(r.stdout).toMatch(/\n\s*0\.0\s+400\.0\s+-9\.00\s+700\n\s*400\.0\s+700\.0\s+-9\.00\s+straight\n/);
    expect(r.stdout).toContain("Add --json to print the note");
  });

  it("refuses hostile and foreign files with exit code 2 and writes nothing", async () => {
    const out = join(dir, "never.json");
    const lol = file("lol.xml", '<?xml version="1.0"?><!DOCTYPE railml [<!ENTITY a "aaaaaaaaaa"><!ENTITY b "&a;&a;&a;&a;&a;&a;&a;&a;&a;&a;">]><railml xmlns="http://www.railml.org/schemas/2013">&b;</railml>');
    const r1 = await taut("notes", "from-railml", lol, "--at", "1", "--direction", "up", "--out", out);
    expect(r1.code).toBe(2);
    expect(r1.stderr).toMatch(/lol\.xml: The file's document type declares XML entities/);
    const gpx = file("track.gpx", '<?xml version="1.0"?><gpx xmlns="http://www.topografix.com/GPX/1/1" version="1.1"/>');
    const r2 = await taut("notes", "from-railml", gpx, "--at", "1", "--direction", "up", "--out", out);
    expect(r2.code).toBe(2);
    expect(r2.stderr).toContain("This is not a railML file: its root element is <gpx>");
    expect(existsSync(out)).toBe(false);
  });

  it("says what is missing or wrong in the options", async () => {
    expect((await taut("notes", "from-railml", line, "--direction", "up")).stderr).toContain("--at: where the front of the train stands is needed");
    expect((await taut("notes", "from-railml", line, "--at", "7200", "--direction", "east")).stderr).toContain('--direction: up or down is needed (got "east")');
    expect((await taut("notes", "from-railml", line, "--at", "7200", "--direction", "up", "--behind", "0")).stderr).toContain("--behind: metres from more than 0 to 100000 are needed");
    expect((await taut("notes", "from-railml", join(dir, "missing.xml"), "--at", "1", "--direction", "up")).stderr).toContain("missing.xml: no such file");
    const far = await taut("notes", "from-railml", line, "--at", "99999", "--direction", "up");
    expect(far.code).toBe(2);
    expect(far.stderr).toContain("No track covers the line position 99999 m (absPos).");
  });
});
