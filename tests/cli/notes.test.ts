/** `taut plan` with location notes from files: a single note or a bundle, named by id in the case or with --location. */
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import type { Output } from "../../src/cli/command.js";
import { main } from "../../src/cli/main.js";
import { builtinCaseJson, builtinLibrary } from "../../src/profiles/builtin.js";
import { makeNotesBundle } from "../../src/profiles/notes.js";
import type { LocationNoteFile } from "../../src/profiles/schemas.js";

const dir = mkdtempSync(join(tmpdir(), "taut-notes-cli-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function file(name: string, data: unknown): string {
  const p = join(dir, name);
  writeFileSync(p, typeof data === "string" ? data : JSON.stringify(data, null, 2));
  return p;
}

async function run(...argv: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = "";
  let err = "";
  const io: Output = { out: (t) => (out += `${t}\n`), err: (t) => (err += `${t}\n`) };
  const code = await main(argv, io);
  return { code, out, err };
}

/** A steep place of our own: 14 ‰ under the whole train. */
const steep: LocationNoteFile = {
  schema: "taut/location@1",
  id: "quarrelton-bank-foot",
  name: "Quarrelton bank foot (test)",
  segments: [
    { from_m: 0, length_m: 1000, gradient_permille: 14, curveRadius_m: 0 },
    { from_m: 1000, length_m: 1000, gradient_permille: 14, curveRadius_m: 0 },
  ],
  frontAt_m: 1200,
  clearAhead_m: 700,
  hazards: [],
  seasons: [],
  practice: "",
  revisions: [{ date: "2026-02-02", initials: "AB", change: "First note." }],
};
const level: LocationNoteFile = { ...steep, id: "quarrelton-level-siding", name: "Quarrelton level siding (test)", segments: steep.segments.map((s) => ({ ...s, gradient_permille: 0 })) };

const demoCase = builtinCaseJson[0] as Record<string, unknown>;
const caseAt = (location: string) => file(`case-${location}.json`, { ...demoCase, location });

describe("taut plan --notes", () => {
  it("resolves the case's location from a single note file", async () => {
    const r = await run("plan", caseAt("quarrelton-bank-foot"), "--notes", file("steep.json", steep), "--json");
    expect(r.err).toBe("");
    expect(r.code).toBe(0);
    const plan = JSON.parse(r.out);
    // 14 ‰ under every vehicle: grade force m·g·sin(atan(0.014)) over the whole train (PHYSICS.md §1).
    const lib = builtinLibrary();
    const locos = demoCase.locomotives as Array<{ profile: string; count?: number }>;
    const massT = (demoCase.train as { trailingMass_t: number }).trailingMass_t + locos.reduce((m, l) => m + lib.locomotives.get(l.profile)!.file.mass_t * (l.count ?? 1), 0);
    expect(plan.resistance_kN.grade).toBeCloseTo(massT * 9.80665 * Math.sin(Math.atan(0.014)), 0);
  });

  it("resolves a note id from a bundle, and --location picks another note of the same bundle", async () => {
    const bundle = file("bundle.json", makeNotesBundle([steep, level], new Date("2026-06-01T00:00:00Z")));
    const a = await run("plan", caseAt("quarrelton-bank-foot"), "--notes", bundle, "--json");
    const b = await run("plan", caseAt("quarrelton-bank-foot"), "--notes", bundle, "--location", "quarrelton-level-siding", "--json");
    expect([a.code, b.code]).toEqual([0, 0]);
    expect(JSON.parse(a.out).resistance_kN.grade).toBeGreaterThan(200);
    expect(JSON.parse(b.out).resistance_kN.grade).toBe(0);
    const demo = await run("plan", "--demo", "--notes", bundle, "--location", "quarrelton-level-siding", "--json");
    expect(demo.code).toBe(0);
    expect(JSON.parse(demo.out).resistance_kN.grade).toBe(0);
  });

  it("without the notes file the id is unknown: exit 2 naming the field and the known notes", async () => {
    const r = await run("plan", caseAt("quarrelton-bank-foot"));
    expect(r.code).toBe(2);
    expect(r.err).toContain('location: names no known location note ("quarrelton-bank-foot"; known: ashvale-loop-up');
  });

  it("a truncated notes file is bad input with its message", async () => {
    const text = JSON.stringify(makeNotesBundle([steep])).slice(0, 120);
    const r = await run("plan", caseAt("quarrelton-bank-foot"), "--notes", file("cut.json", text));
    expect(r.code).toBe(2);
    expect(r.err).toContain("The file is not complete JSON: it may have been cut short");
    expect(r.err).not.toContain("    at ");
  });

  it("a bundle with one bad note names the note and the field", async () => {
    const bad = { ...level, segments: [{ from_m: 0, length_m: 500, gradient_permille: 0, curveRadius_m: 50 }] };
    const r = await run("plan", caseAt("quarrelton-bank-foot"), "--notes", file("bad.json", makeNotesBundle([steep, bad])));
    expect(r.code).toBe(2);
    expect(r.err).toContain('note 2 ("Quarrelton level siding (test)") is not valid');
    expect(r.err).toContain("notes[1].segments[0].curveRadius_m: must be 0 (straight) or at least 80 m");
  });

  it("a file of another kind given as notes is refused", async () => {
    const r = await run("plan", caseAt("quarrelton-bank-foot"), "--notes", file("case-as-notes.json", demoCase));
    expect(r.code).toBe(2);
    expect(r.err).toContain('This is a "taut/start-case@1" file, not location notes');
  });

  it("the same note id in two files is refused", async () => {
    const r = await run("plan", caseAt("quarrelton-bank-foot"), "--notes", file("one.json", steep), "--notes", file("two.json", makeNotesBundle([steep])));
    expect(r.code).toBe(2);
    expect(r.err).toContain('the location note "quarrelton-bank-foot" is also in');
  });

  it("--help lists the notes options", async () => {
    const r = await run("plan", "--help");
    expect(r.code).toBe(0);
    expect(r.out).toContain("--notes FILE");
    expect(r.out).toContain("--location NOTE-ID");
  });
});
