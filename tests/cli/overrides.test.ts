/**
 * `taut plan` overrides for what changes between departures (--rail, --sand/--no-sand, --mass, --grade), a
 * case read from standard input ("-"), `taut --version`, and help that names only documents the project has.
 * An override must give what the same change written into the case file gives; the grade is checked against
 * the exact grade resistance m·g·sin(atan i) (US Army Transportation School, TR 0603 *Railway operations*,
 * §2.7 [P]).
 */
import { spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, describe, expect, it } from "vitest";
import { commands } from "../../src/cli/main.js";
import { GRAVITY_MPS2 } from "../../src/core/index.js";
import { taut, tautWithInput } from "../tools/cli.js";

const repo = fileURLToPath(new URL("../../", import.meta.url));
const dir = mkdtempSync(join(tmpdir(), "taut-overrides-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** A small case (quick to plan): 600 t behind one 120 t unit on a uniform 6 ‰, dry, no sand. */
const CASE = {
  schema: "taut/start-case@1",
  id: "override-test",
  locomotives: [{ profile: "illustrative-6axle-1800", count: 1, position: "head" }],
  train: { trailingMass_t: 600, wagons: 12, length_m: 170, couplerSlack_mm: 60, bearing: "roller", couplerLimit_kN: 850, wagonType: "bogie-hopper-loaded" },
  location: { gradient_permille: 6, curveRadius_m: 0, clearAhead_m: 800 },
  conditions: { rail: "dry", sand: false, temperature_C: 10 },
  target: { speed_kmh: 10 },
};

function caseFile(name: string, edit: (c: typeof CASE) => void = () => undefined): string {
  const c = structuredClone(CASE);
  edit(c);
  const path = join(dir, `${name}.json`);
  writeFileSync(path, JSON.stringify(c));
  return path;
}

/** The plan's JSON without the case block (which names the overrides). */
async function planJson(...argv: string[]): Promise<Record<string, unknown>> {
  const r = await taut("plan", ...argv, "--no-assistance", "--json");
  expect(r.stderr).toBe("");
  expect(r.code).toBe(0);
  const { case: _case, ...rest } = JSON.parse(r.stdout) as Record<string, unknown>;
  return rest;
}

describe("taut plan overrides", () => {
  it("--rail and --sand give what the same conditions written into the case give", async () => {
    const base = caseFile("base");
    const edited = caseFile("wet-sand", (c) => {
      c.conditions.rail = "wet";
      c.conditions.sand = true;
    });
    expect(await planJson(base, "--rail", "wet", "--sand")).toEqual(await planJson(edited));
    // and the override changed something: wet rail gives a lower adhesion than dry.
    expect((await planJson(base)).adhesion).not.toEqual((await planJson(edited)).adhesion);
  });

  it("--no-sand turns sand off; --mass sets the trailing mass", async () => {
    const sanded = caseFile("sanded", (c) => (c.conditions.sand = true));
    const heavier = caseFile("heavier", (c) => (c.train.trailingMass_t = 900));
    expect(await planJson(sanded, "--no-sand", "--mass", "900")).toEqual(await planJson(heavier));
  });

  it("--grade sets the gradient under the whole train: resistance_kN.grade = m·g·sin(atan i) within 1 % (TR 0603 §2.7 [P])", async () => {
    const p = await planJson(caseFile("base"), "--grade", "12");
    const wholeTrainKg = (600 + 120) * 1000; // the 120 t unit (illustrative-6axle-1800) is on the grade too
    const expectedKN = (wholeTrainKg * GRAVITY_MPS2 * Math.sin(Math.atan(0.012))) / 1000;
    expect(Math.abs((p.resistance_kN as { grade: number }).grade / expectedKN - 1)).toBeLessThan(0.01);
  });

  it("--grade on a case that names a location note: a uniform grade with the note's curve and distance clear ahead", async () => {
    // ashvale-loop-up puts the whole demo train in its 400 m curve with 600 m clear ahead (profiles/locations).
    const r = await taut("plan", "--demo", "--grade", "0", "--no-assistance", "--json");
    expect(r.code).toBe(0);
    const p = JSON.parse(r.stdout) as { case: { overrides: object }; resistance_kN: { grade: number; curve: number } };
    expect(p.case.overrides).toEqual({ gradient_permille: 0 });
    expect(p.resistance_kN.grade).toBe(0);
    const demo = JSON.parse((await taut("plan", "--demo", "--no-assistance", "--json")).stdout) as { resistance_kN: { curve: number } };
    expect(p.resistance_kN.curve).toBeCloseTo(demo.resistance_kN.curve, 1);
  });

  it("the readable plan says what was changed from the file", async () => {
    const r = await taut("plan", caseFile("base"), "--rail", "leaves", "--no-sand", "--mass", "650", "--no-assistance");
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/^Changed from the case file: rail leaves, no sand, trailing mass 650 t$/m);
  });

  it("bad overrides: exit 2 with what is wrong, nothing planned", async () => {
    const base = caseFile("base");
    const rail = await taut("plan", base, "--rail", "snow");
    expect(rail.code).toBe(2);
    expect(rail.stderr).toMatch(/--rail: must be one of dry, damp, wet, frost, leaves, greasy \(got "snow"\)/);
    const both = await taut("plan", base, "--sand", "--no-sand");
    expect(both.code).toBe(2);
    expect(both.stderr).toMatch(/--sand and --no-sand/);
    const word = await taut("plan", base, "--mass", "heavy");
    expect(word.code).toBe(2);
    expect(word.stderr).toMatch(/--mass: a trailing mass in tonnes is needed \(got "heavy"\)/);
    const negative = await taut("plan", base, "--mass=-100");
    expect(negative.code).toBe(2);
    expect(negative.stderr).toMatch(/train\.trailingMass_t: must be from 5 to 60000 t \(got -100\)/);
    const steep = await taut("plan", base, "--grade", "75");
    expect(steep.code).toBe(2);
    expect(steep.stderr).toMatch(/location\.gradient_permille/);
    for (const r of [rail, both, word, negative, steep]) expect(r.stdout).toBe("");
  });
});

describe("a case from standard input", () => {
  it('"-" reads the case from standard input and gives what the file gives', async () => {
    const r = await tautWithInput(JSON.stringify(CASE), "plan", "-", "--rail", "wet", "--no-assistance", "--json");
    expect(r.code).toBe(0);
    const fromFile = await planJson(caseFile("base"), "--rail", "wet");
    const { case: _c, ...fromStdin } = JSON.parse(r.stdout) as Record<string, unknown>;
    expect(fromStdin).toEqual(fromFile);
  });

  it("bad JSON on standard input names standard input; no standard input is bad input too", async () => {
    const bad = await tautWithInput("{ not json", "plan", "-");
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/standard input: not a valid file/);
    const none = await taut("plan", "-");
    expect(none.code).toBe(2);
    expect(none.stderr).toMatch(/no standard input/);
  });

  it("the installed bin reads a piped case", () => {
    const r = spawnSync(process.execPath, ["src/cli/taut.mjs", "plan", "-", "--no-assistance"], { cwd: repo, input: JSON.stringify(CASE), encoding: "utf8", timeout: 60_000 });
    expect(r.stderr).toBe("");
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/^Verdict: /m);
  });
});

describe("version and help", () => {
  it("--version prints the version in package.json", async () => {
    const pkg = JSON.parse(readFileSync(join(repo, "package.json"), "utf8")) as { version: string };
    const r = await taut("--version");
    expect(r.code).toBe(0);
    expect(r.stdout).toBe(`taut ${pkg.version}`);
  });

  it("no help text names a document the project does not have", async () => {
    const texts = [(await taut("--help")).stdout];
    for (const c of commands()) texts.push((await taut(c.name, "--help")).stdout);
    const named = texts.join("\n").match(/[\w./-]+\.md\b/g) ?? [];
    for (const doc of named) expect(existsSync(join(repo, doc)), doc).toBe(true);
    expect(texts.join("\n")).toMatch(/--rail R/);
  });
});
