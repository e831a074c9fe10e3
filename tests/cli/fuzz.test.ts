/**
 * Fuzzing every command's input and output (fast-check; 10,700 generated inputs in all). Where the work goes:
 *
 * A. In process, over the parsers every command reads its input with (start cases for plan, simulate and
 *    check; CSV and JSON departures for check; notes for --notes and table; JSON text; simulate's
 *    --sequence; table's options): 10,500 inputs, valid files mutated at random fields with the extremes
 *    that once hung or overflowed (a gram, 1e308, 1e12 m), wrong types, text with control and
 *    bidirectional characters. Bad input must give issues that name a field (at most a dozen listed, safe
 *    to print, no Infinity or NaN); good input must resolve to a case whose plan is within the work cap
 *    (src/core/planner/workCap.ts: a counter of vehicles × integrator steps, not a clock) and whose
 *    static check gives finite numbers: the cheap path, no dynamics.
 * B. Through `main()` with files on disk: 150 generated bad start cases given to plan, simulate and check:
 *    exit 2 with the field and the rule, nothing on stdout for plan and simulate. Bad input stops before
 *    any planning, so these are quick.
 * C. The JSON output of each command on a few valid extremes of the ranges (one wagon of 5 t, 400 wagons
 *    of 150 t, ±60 ‰, the coupler limits' ends): every number finite, null only where the contract
 *    allows it. These run the planner, so they are few and the trains small or refused early by the
 *    static check.
 */
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import fc from "fast-check";
import { afterAll, describe, expect, it } from "vitest";
import { staticCheck } from "../../src/core/planner/staticCheck.js";
import { PLAN_WORK_CAP_VEHICLE_STEPS, planWork } from "../../src/core/planner/workCap.js";
import { InputError } from "../../src/cli/errors.js";
import { parseSequence } from "../../src/cli/commands/simulate.js";
import { tableCase } from "../../src/cli/commands/table.js";
import { builtinCaseJson, builtinLibrary } from "../../src/profiles/builtin.js";
import { caseFileJson, departuresFromCsv, departuresFromJson } from "../../src/profiles/departures.js";
import { formatIssues, MAX_LISTED_ISSUES, type FieldIssue } from "../../src/profiles/issues.js";
import { jsonSyntaxProblem } from "../../src/profiles/jsonSyntax.js";
import { readNotesText } from "../../src/profiles/notes.js";
import { parseJsonText, parseStartCase } from "../../src/profiles/parse.js";
import type { LocationNoteFile } from "../../src/profiles/schemas.js";
import { taut } from "../tools/cli.js";

const lib = builtinLibrary();
const dir = mkdtempSync(join(tmpdir(), "taut-fuzz-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const seed = Number(process.env.FUZZ_SEED ?? 20_260_613);

/** Characters that must never reach a terminal raw (C0 but line feed and tab, DEL, C1, bidirectional controls). */
const RAW_UNSAFE = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/;

// ---------------------------------------------------------------- what the mutations put in
/** The extremes behind the findings, the ranges' edges, and the ordinary. */
const EXTREME_NUMBERS = [0, -1, 1e-9, 0.001, 0.5, 1, 4.99, 5, 10, 60, 60.001, 79.9, 80, 100, 150, 150.1, 400, 401, 4999, 5000, 5001, 1e6, 1e9, 1e12, 1e308, -1e308, Number.MAX_SAFE_INTEGER];
const ODD_VALUES: unknown[] = [null, true, false, "", "12", "\u001b[2J\u001b[H", "a\u202eb", "x\ny", [], {}, [1, 2], { a: 1 }];
const DELETE = Symbol("delete");
const valueArb: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 4, arbitrary: fc.constantFrom(...EXTREME_NUMBERS) },
  { weight: 2, arbitrary: fc.double({ noNaN: true, noDefaultInfinity: true }) },
  { weight: 1, arbitrary: fc.integer() },
  { weight: 2, arbitrary: fc.constantFrom(...ODD_VALUES) },
  { weight: 1, arbitrary: fc.string({ unit: "binary", maxLength: 12 }) },
  { weight: 1, arbitrary: fc.constant(DELETE) },
);
const mutationsArb = fc.array(fc.tuple(fc.nat(), valueArb), { maxLength: 3 });

/** Every path to a leaf or a container in `x` (as lists of keys). */
function pathsOf(x: unknown, at: Array<string | number> = [], out: Array<Array<string | number>> = []): Array<Array<string | number>> {
  if (at.length > 0) out.push(at);
  if (Array.isArray(x)) x.forEach((v, k) => pathsOf(v, [...at, k], out));
  else if (x && typeof x === "object") for (const [k, v] of Object.entries(x)) pathsOf(v, [...at, k], out);
  return out;
}

/** A deep copy of `base` with each mutation applied at the path its number picks (JSON-safe values only). */
function mutate(base: unknown, muts: ReadonlyArray<readonly [number, unknown]>): unknown {
  const copy = JSON.parse(JSON.stringify(base)) as unknown;
  for (const [pick, value] of muts) {
    const paths = pathsOf(copy);
    if (paths.length === 0) break;
    const path = paths[pick % paths.length]!;
    let parent = copy as Record<string | number, unknown>;
    for (const k of path.slice(0, -1)) parent = parent[k] as Record<string | number, unknown>;
    const last = path[path.length - 1]!;
    if (value === DELETE) {
      if (Array.isArray(parent)) parent.splice(Number(last), 1);
      else delete parent[last];
    } else parent[last] = JSON.parse(JSON.stringify(value)) as unknown;
  }
  return copy;
}

// ---------------------------------------------------------------- the valid files mutated
const goods = builtinCaseJson.find((c) => (c as { id?: string }).id === "demo-goods-cinderfield") as Record<string, unknown> & { train: Record<string, unknown> };
const cinderfield = lib.locations.get("cinderfield-yard")!;
/** The demo cases, and one with an inline locomotive profile and an inline track profile. */
const CASES: unknown[] = [
  ...builtinCaseJson,
  {
    ...goods,
    locomotives: [{ profile: lib.locomotives.get("illustrative-4axle-1100")!.file, count: 2, position: "head" }],
    location: { segments: cinderfield.segments, frontAt_m: cinderfield.frontAt_m, clearAhead_m: cinderfield.clearAhead_m },
  },
];
const NOTES: LocationNoteFile[] = [...lib.locations.values()];

// ---------------------------------------------------------------- checks
/** Issues as a command prints them: each names a field or the file, at most a dozen, safe, in words. */
function expectGoodIssues(issues: readonly FieldIssue[]): void {
  expect(issues.length).toBeGreaterThan(0);
  for (const i of issues) expect(i.message.length).toBeGreaterThan(0);
  const printed = formatIssues(issues);
  expect(printed.split("\n").length).toBeLessThanOrEqual(MAX_LISTED_ISSUES + 1);
  expect(printed).not.toMatch(RAW_UNSAFE);
  expect(printed).not.toMatch(/Infinity|NaN|\[object /);
}

/** A valid case: its plan's work within the cap (a counter, not a clock) and its static check finite. */
function expectBoundedAndFinite(c: Parameters<typeof staticCheck>[0]): void {
  expect(planWork(c).vehicleSteps).toBeLessThanOrEqual(PLAN_WORK_CAP_VEHICLE_STEPS);
  const s = staticCheck(c);
  const r = s.resistance;
  for (const x of [r.startingN, r.gradeN, r.curveN, r.runningN, r.totalN, s.requiredN, s.availableN, s.adhesionLimitN, s.peakTensionN, s.margin, s.slipRiskAtStart]) {
    expect(Number.isFinite(x)).toBe(true);
  }
}

const run = (numRuns: number) => ({ numRuns, seed });

describe("A. the parsers, in process (10,500 inputs)", () => {
  it("start cases (4,000): issues naming the field, or a case within the work cap with a finite static check", () => {
    let valid = 0;
    fc.assert(
      fc.property(fc.nat(CASES.length - 1), mutationsArb, (k, muts) => {
        const r = parseStartCase(mutate(CASES[k], muts), lib);
        if (!r.ok) {
          expectGoodIssues(r.issues);
          return;
        }
        valid++;
        expectBoundedAndFinite(r.value);
      }),
      run(4000),
    );
    // The mix reaches both sides: a fuzzer that only ever produced errors would test half the contract.
    expect(valid).toBeGreaterThan(400);
  });

  it("JSON text (2,000): parsed exactly when the engine parses it; otherwise where and what, never the text", () => {
    const texts = fc.oneof(
      fc.string({ unit: fc.constantFrom(..."{}[]\":,0123456789.eE+- \ntrufalsn\\u'x\u0001".split("")), maxLength: 40 }),
      fc.tuple(fc.nat(CASES.length - 1), fc.nat(), fc.nat(3)).map(([k, at, cut]) => {
        const t = JSON.stringify(CASES[k]);
        const i = at % t.length;
        return cut === 0 ? t.slice(0, i) : cut === 1 ? t.slice(0, i) + t.slice(i + 1) : cut === 2 ? `${t.slice(0, i)}@${t.slice(i)}` : `\ufeff${t}`;
      }),
    );
    fc.assert(
      fc.property(texts, (text) => {
        let engine = true;
        try {
          JSON.parse(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
        } catch {
          engine = false;
        }
        const ours = parseJsonText(text);
        expect(ours.ok).toBe(engine);
        // The scanner agrees with the engine (ECMA-404 grammar) on every text.
        expect(jsonSyntaxProblem(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text) === undefined).toBe(engine);
        if (!ours.ok) expect(ours.issues[0]!.message).toMatch(/^is not valid JSON: (the file is empty|.+ \(line \d+, column \d+\))$/);
      }),
      run(2000),
    );
  });

  it("CSV departures (1,500): every row answered or named by its line, whatever the cells hold", () => {
    const files: Record<string, string> = {
      "a.json": JSON.stringify(goods),
      "b.json": JSON.stringify({ ...goods, train: { ...goods.train, trailingMass_t: 1e308 } }),
      "kind.json": JSON.stringify({ schema: "taut/locomotive@1" }),
      "text.json": "root:x:0:0:SECRET",
    };
    const cell = fc.oneof(
      fc.constantFrom("a.json", "b.json", "kind.json", "text.json", "missing.json", "dry", "leaves", "icy", "yes", "no", "maybe", "cinderfield-yard", "Bad Place", "", "=1+2", '"q"', "\u001b[2J"),
      fc.string({ maxLength: 8 }),
    );
    const row = fc.array(cell, { minLength: 0, maxLength: 6 }).map((cells) => cells.map((c) => (/[",\n]/.test(c) ? `"${c.replace(/"/g, '""')}"` : c)).join(","));
    const header = fc.constantFrom("id,case,rail,sand", "id,case,rail,sand,location", "case", "id,rail", "\ufeffid,case,rail,sand");
    fc.assert(
      fc.property(header, fc.array(row, { maxLength: 6 }), (h, rows) => {
        const text = [h, ...rows].join("\n");
        const read = departuresFromCsv(text, (p) => (p in files ? caseFileJson(files[p]!) : new Error("no such file")), lib);
        if (!read.ok) {
          expect(read.message).not.toContain("SECRET");
          return;
        }
        for (const d of read.departures) {
          if (d.case) expectBoundedAndFinite(d.case);
          else expect(d.error).toMatch(/^line \d+: \S/);
          expect(d.error ?? "").not.toContain("SECRET");
        }
      }),
      run(1500),
    );
  });

  it("JSON departures (500): every item answered or named by its index", () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.nat(CASES.length - 1), mutationsArb), { minLength: 1, maxLength: 3 }), (items) => {
        const read = departuresFromJson(JSON.stringify(items.map(([k, m]) => mutate(CASES[k], m))), lib);
        expect(read.ok).toBe(true);
        if (!read.ok) return;
        read.departures.forEach((d, k) => {
          if (d.case) expectBoundedAndFinite(d.case);
          else expect(d.error).toMatch(new RegExp(`^\\[${k}\\]`));
        });
      }),
      run(500),
    );
  });

  it("notes files (1,500): a note or bundle read whole, or refused with a headline and field issues", () => {
    const bundle = { schema: "taut/notes-bundle@1", exported: "2026-06-13T08:00:00Z", notes: NOTES };
    fc.assert(
      fc.property(fc.nat(NOTES.length), mutationsArb, (k, muts) => {
        const r = readNotesText(JSON.stringify(mutate(k === NOTES.length ? bundle : NOTES[k], muts)));
        if (r.ok) {
          expect(r.notes.length).toBeGreaterThan(0);
          return;
        }
        expect(r.message).not.toMatch(RAW_UNSAFE);
        if (r.issues.length > 0) expectGoodIssues(r.issues);
      }),
      run(1500),
    );
  });

  it("simulate --sequence (500): entries in order within the notches, or an input error naming the entry", () => {
    fc.assert(
      fc.property(fc.oneof(fc.string({ unit: fc.constantFrom(..."0123456789@,. -e".split("")), maxLength: 20 }), fc.string({ maxLength: 10 })), (text) => {
        try {
          const seq = parseSequence(text, 8);
          for (const [k, e] of seq.entries()) {
            expect(e.notch).toBeLessThanOrEqual(8);
            expect(Number.isFinite(e.atS)).toBe(true);
            if (k > 0) expect(e.atS).toBeGreaterThanOrEqual(seq[k - 1]!.atS);
          }
        } catch (e) {
          expect(e).toBeInstanceOf(InputError);
          expect((e as InputError).message).toMatch(/^--sequence: /);
        }
      }),
      run(500),
    );
  });

  it("table options (500): a train within the ranges and the work cap, or an input error naming the option", () => {
    const option = fc.option(fc.oneof(fc.constantFrom(...EXTREME_NUMBERS.map(String)), fc.constantFrom("x", "", "1e400", "-0", "3.5")), { nil: undefined });
    fc.assert(
      fc.property(
        fc.record({ count: option, wagons: option, slack: option, limit: option, temperature: option, "target-kmh": option, loco: fc.constantFrom(undefined, "illustrative-4axle-1100", "nope") }),
        fc.nat(NOTES.length - 1),
        (values, k) => {
          try {
            const t = tableCase(NOTES[k]!, values, lib);
            expectBoundedAndFinite(t.c);
          } catch (e) {
            expect(e).toBeInstanceOf(InputError);
            expect((e as InputError).describe()).not.toMatch(RAW_UNSAFE);
          }
        },
      ),
      run(500),
    );
  });
});

describe("B. bad start cases through the command line (150 runs, exit 2)", () => {
  it("plan, simulate and check name the field and the rule; plan and simulate print nothing on stdout", async () => {
    let n = 0;
    const badCase = fc
      .tuple(fc.nat(CASES.length - 1), mutationsArb.filter((m) => m.length > 0))
      .map(([k, m]) => mutate(CASES[k], m))
      .filter((json) => !parseStartCase(json, lib).ok);
    await fc.assert(
      fc.asyncProperty(badCase, fc.constantFrom("plan", "simulate", "check"), async (json, command) => {
        const path = join(dir, `bad-${n++}.json`);
        writeFileSync(path, JSON.stringify(command === "check" ? [json] : json));
        const r = await taut(...(command === "simulate" ? ["simulate", path, "--sequence", "1@0"] : command === "check" ? ["check", path, "--json", "--quiet"] : ["plan", path]));
        expect(r.code).toBe(2);
        expect(r.stdout + r.stderr).not.toMatch(RAW_UNSAFE);
        if (command === "check") {
          const row = (JSON.parse(r.stdout) as { departures: Array<{ error: string }> }).departures[0]!;
          expect(row.error).toMatch(/^\[0\]( \(.*\))?: \S/);
        } else {
          expect(r.stdout).toBe("");
          expect(r.stderr).toMatch(new RegExp(`^taut ${command}: .*(the start case is not valid|not a valid file|file; a start case)`));
          expect(r.stderr).not.toMatch(/^\s+at\s/m);
        }
      }),
      run(150),
    );
  });
});

/** Keys the output contract allows to be null (INTERFACE.md): "not reached", "not run", "none"; in the planner lines' codes (additive), a part the line does not have. */
const NULLABLE = new Set(["timeToTarget_s", "lastVehicleMoves_s", "locoTravelToStretch_m", "verification", "assistance", "divide", "wagonType", "target_kmh", "divide.verdict", "divide.peakCouplerForce_kN", "whyCode.protection", "whyCode.groups", "line.stretchTravel_m", "line.fastOver_kmh", "line.dwell_s", "adviceCodes.marginal_t"]);

/** Every number in a command's JSON is finite; a null only at a key the contract allows it. */
function expectFiniteJson(x: unknown, at = "", parent = ""): void {
  if (x === null) {
    const key = at.split(".").at(-1)!.replace(/\[\d+\]$/, "");
    expect(NULLABLE.has(key) || NULLABLE.has(`${parent}.${key}`), `null at ${at}`).toBe(true);
  } else if (typeof x === "number") expect(Number.isFinite(x), `number at ${at}`).toBe(true);
  else if (Array.isArray(x)) x.forEach((v, k) => expectFiniteJson(v, `${at}[${k}]`, parent));
  else if (x && typeof x === "object") for (const [k, v] of Object.entries(x)) expectFiniteJson(v, at ? `${at}.${k}` : k, at.split(".").at(-1)?.replace(/\[\d+\]$/, "") ?? "");
}

describe("C. the JSON output of every command at the ranges' edges: finite numbers only", () => {
  const level = { gradient_permille: 0, curveRadius_m: 0, clearAhead_m: 500 };
  const edge = (train: Record<string, unknown>, over: Record<string, unknown> = {}) => ({ ...goods, location: level, ...over, train: { ...goods.train, ...train } });
  const EDGES: Array<[string, unknown]> = [
    ["one wagon of 5 t, 5 m, limit 100 kN, −60 °C", edge({ trailingMass_t: 5, wagons: 1, length_m: 5, couplerLimit_kN: 100 }, { conditions: { rail: "dry", sand: false, temperature_C: -60 } })],
    ["400 wagons of 150 t, 40 m, limit 5000 kN, 60 ‰ up, 60 °C", edge({ trailingMass_t: 60_000, wagons: 400, length_m: 16_000, couplerLimit_kN: 5000 }, { location: { ...level, gradient_permille: 60 }, conditions: { rail: "greasy", sand: false, temperature_C: 60 } })],
    ["two wagons on 60 ‰ down", edge({ trailingMass_t: 300, wagons: 2, length_m: 80 }, { location: { ...level, gradient_permille: -60 } })],
  ];

  it("taut plan --json (three plans)", async () => {
    for (const [name, json] of EDGES) {
      const path = join(dir, "edge.json");
      writeFileSync(path, JSON.stringify(json));
      const r = await taut("plan", path, "--json", "--no-assistance");
      expect(r.code, name).toBe(0);
      expectFiniteJson(JSON.parse(r.stdout));
    }
  });

  it("taut check --json and taut simulate --json (the smallest edge)", async () => {
    const path = join(dir, "edge-day.json");
    writeFileSync(path, JSON.stringify([EDGES[0]![1], EDGES[1]![1]]));
    const check = await taut("check", path, "--json", "--quiet", "--jobs", "1");
    expect(check.code).toBe(0);
    expectFiniteJson(JSON.parse(check.stdout));
    const one = join(dir, "edge-one.json");
    writeFileSync(one, JSON.stringify(EDGES[0]![1]));
    const sim = await taut("simulate", one, "--sequence", "1@0,8@5", "--duration", "20", "--json", "--series");
    expect(sim.code).toBe(0);
    expectFiniteJson(JSON.parse(sim.stdout));
  });

  it("taut table --json (one wagon of the note's reference train's make-up)", async () => {
    const r = await taut("table", "cinderfield-yard", "--loco", "illustrative-4axle-1100", "--wagons", "1", "--limit", "5000", "--json", "--quiet", "--jobs", "1");
    expect(r.code).toBe(0);
    expectFiniteJson(JSON.parse(r.stdout));
  });
});
