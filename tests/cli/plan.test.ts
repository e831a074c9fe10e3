/**
 * The `taut` command line, run in-process through `main(argv, io)`, plus one spawn of the real bin to prove
 * the installed command works. Contract: INTERFACE.md (keys, exit codes 0/2/1, errors with the field path).
 */
import { spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { GRAVITY_MPS2 } from "../../src/core/index.js";
import { taut } from "../tools/cli.js";

const repo = fileURLToPath(new URL("../../", import.meta.url));
const fixture = (rel: string): string => fileURLToPath(new URL(`../fixtures/in/${rel}`, import.meta.url));
const STACK_LINE = /^\s+at\s/m;

describe("help", () => {
  it("taut --help lists the commands and exit codes", async () => {
    const r = await taut("--help");
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/Usage: taut <command>/);
    expect(r.stdout).toMatch(/^\s+plan\s/m);
    expect(r.stdout).toMatch(/Exit codes: 0 success, 2 bad input, 1 internal error/);
  });
  it("taut plan --help shows the plan options", async () => {
    const r = await taut("plan", "--help");
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/Usage: taut plan/);
    expect(r.stdout).toMatch(/--json/);
    expect(r.stdout).toMatch(/--demo/);
  });
  it("taut with no command prints the help and exits 2", async () => {
    const r = await taut();
    expect(r.code).toBe(2);
    expect(r.stdout).toMatch(/Usage: taut/);
  });
});

describe("taut plan", () => {
  it("--demo prints a readable result with a verdict and the cautions", async () => {
    const r = await taut("plan", "--demo");
    expect(r.code).toBe(0);
    expect(r.stderr).toBe("");
    expect(r.stdout).toMatch(/^Verdict: (STARTS|MARGINAL|NEEDS ASSISTANCE)/m);
    expect(r.stdout).toMatch(/Resistance at start: \d+ kN/);
    expect(r.stdout).toMatch(/Cautions:/);
    expect(r.stdout).toMatch(/Advisory only/);
    expect(r.stdout).toMatch(/local instructions/);
    expect(r.stdout).not.toMatch(/[{}]/); // a table for people, not JSON
  });

  it("--json has the INTERFACE.md keys", async () => {
    const r = await taut("plan", "--demo", "--json");
    expect(r.code).toBe(0);
    const p = JSON.parse(r.stdout) as Record<string, unknown>;
    for (const k of ["verdict", "reasons", "resistance_kN", "adhesion", "steps", "peakCouplerForce_kN", "timeToTarget_s", "maxStartableMass_t", "assistance", "cautions"]) {
      expect(p, k).toHaveProperty(k);
    }
    expect(["starts", "marginal", "needs-assistance"]).toContain(p.verdict);
    expect(Object.keys(p.resistance_kN as object)).toEqual(expect.arrayContaining(["starting", "grade", "curve", "running", "total"]));
    expect(Object.keys(p.adhesion as object)).toEqual(expect.arrayContaining(["mu", "maxTractiveEffort_kN"]));
    for (const reason of p.reasons as string[]) expect(["adhesion", "power", "coupler", "distance"]).toContain(reason);
    expect(Array.isArray(p.steps)).toBe(true);
    expect(Array.isArray(p.cautions) && (p.cautions as string[]).length).toBeGreaterThan(0);
    expect(typeof p.maxStartableMass_t).toBe("number");
  });

  it("a case file: plan FILE --json", async () => {
    const r = await taut("plan", `${repo}profiles/cases/demo-ore-lantern.json`, "--json");
    expect(r.code).toBe(0);
    expect(JSON.parse(r.stdout)).toMatchObject({ case: { id: "demo-ore-lantern" } });
  });

  // Done criterion of issue 2: a 1618 t train on a uniform 10 ‰ grade reports resistance_kN.grade within 1 %
  // of m·g·sin(atan 0.01). INTERFACE.md: resistance_kN is the whole train's, locomotives included. So m is the
  // trailing mass (1618 t) plus the locomotive's mass (120 t, profile illustrative-6axle-1800) = 1738 t.
  // The trailing mass alone would give 158.7 kN, 7 % low: the check tells the two apart.
  it("1618 t on 10 ‰: resistance_kN.grade within 1 % of m·g·sin(atan 0.01) for the whole train [D]", async () => {
    const r = await taut("plan", fixture("cases/uniform-1618t-10permille.json"), "--json");
    expect(r.code).toBe(0);
    const grade = (JSON.parse(r.stdout) as { resistance_kN: { grade: number } }).resistance_kN.grade;
    const wholeTrainKg = (1618 + 120) * 1000;
    const expectedKN = (wholeTrainKg * GRAVITY_MPS2 * Math.sin(Math.atan(0.01))) / 1000; // 170.43 kN
    expect(Math.abs(grade / expectedKN - 1)).toBeLessThan(0.01);
    const trailingOnlyKN = (1618_000 * GRAVITY_MPS2 * Math.sin(Math.atan(0.01))) / 1000;
    expect(Math.abs(grade / trailingOnlyKN - 1)).toBeGreaterThan(0.05);
  });
});

describe("bad input: exit 2, the field path and the rule, no stack trace", () => {
  it("an invalid field", async () => {
    const r = await taut("plan", fixture("invalid/negative-mass.json"));
    expect(r.code).toBe(2);
    expect(r.stdout).toBe("");
    expect(r.stderr).toMatch(/negative-mass\.json: the start case is not valid/);
    expect(r.stderr).toMatch(/train\.trailingMass_t: must be from 5 to 60000 t \(got -100\)/);
    expect(r.stderr).not.toMatch(STACK_LINE);
  });
  it("a reference to an unknown profile and a train that does not fit", async () => {
    const a = await taut("plan", fixture("invalid/unknown-locomotive-profile.json"), "--json");
    expect(a.code).toBe(2);
    expect(a.stderr).toMatch(/locomotives\[0\]\.profile: names no known locomotive profile/);
    const b = await taut("plan", fixture("invalid/train-does-not-fit.json"));
    expect(b.code).toBe(2);
    expect(b.stderr).toMatch(/location\.frontAt_m: puts the rear of the 579 m train/);
    expect(a.stderr + b.stderr).not.toMatch(STACK_LINE);
  });
  it("malformed JSON", async () => {
    const r = await taut("plan", fixture("invalid/malformed-json.json"));
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/malformed-json\.json: not a valid file\n\s+is not valid JSON/);
    expect(r.stderr).not.toMatch(STACK_LINE);
  });
  it("a file of another kind", async () => {
    const r = await taut("plan", `${repo}profiles/locomotives/illustrative-6axle-1800.json`);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/"taut\/locomotive@1" file; a start case \(taut\/start-case@1\) is needed/);
  });
  it("a missing file", async () => {
    const r = await taut("plan", "no/such/case.json");
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/no\/such\/case\.json: no such file/);
    expect(r.stderr).not.toMatch(STACK_LINE);
  });
  it("no file and no --demo", async () => {
    const r = await taut("plan");
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/a start-case file is needed/);
  });
  it("an unknown option", async () => {
    const r = await taut("plan", "--demo", "--fast");
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/--fast/);
    expect(r.stderr).toMatch(/usage: taut plan/);
    expect(r.stderr).not.toMatch(STACK_LINE);
  });
  it("an unknown command", async () => {
    const r = await taut("launch");
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/unknown command "launch"/);
  });
});

describe("the installed bin", () => {
  // One real process: the bin runs the plain JavaScript build of the command line (build/cli), made again
  // first when a source has changed, so it runs what the sources say.
  it("node src/cli/taut.mjs plan --demo exits 0 and prints the plan the sources print", async () => {
    const r = spawnSync(process.execPath, ["src/cli/taut.mjs", "plan", "--demo"], { cwd: repo, encoding: "utf8", timeout: 60_000 });
    expect(r.stderr).toBe("");
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/^Verdict: /m);
    expect(r.stdout).toMatch(/Cautions:/);
    expect(r.stdout.trimEnd()).toBe((await taut("plan", "--demo")).stdout.trimEnd());
  });
});
