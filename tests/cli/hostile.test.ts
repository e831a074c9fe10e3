/**
 * Hostile and careless input at the command line: what a file or an argument carries must not run as a
 * formula in a spreadsheet, drive the terminal, read files it has no business reading, hang a command or
 * overflow into the output, and every message says what is wrong. One block per finding; most runs stop
 * at the input check, so the file is quick (the few full plans are marked).
 */
import { execFileSync } from "node:child_process";
import { copyFileSync, mkdirSync, mkdtempSync, rmSync, symlinkSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, describe, expect, it } from "vitest";
import { PLAN_WORK_CAP_VEHICLE_STEPS, planWork, planWorkProblem } from "../../src/core/planner/workCap.js";
import { readerMessage } from "../../src/i18n/renderReaders.js";
import { ENGLISH } from "../../src/profiles/lineReport.js";
import { readerEnglish } from "../../src/profiles/readerIssues.js";
import { builtinCaseJson, builtinLibrary } from "../../src/profiles/builtin.js";
import { csvField, parseCsv, toCsv } from "../../src/profiles/csv.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { createPlannerHandler } from "../../src/worker/handler.js";
import type { WorkerResponse } from "../../src/worker/protocol.js";
import { taut } from "../tools/cli.js";
import { uniformCase, testLoco, testWagon } from "../tools/cases.js";

const repo = fileURLToPath(new URL("../../", import.meta.url));
const dir = mkdtempSync(join(tmpdir(), "taut-hostile-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const STACK_LINE = /^\s+at\s/m;
/** Characters that must never reach a terminal raw: C0 but line feed and tab, DEL, C1, bidirectional controls. */
const RAW_UNSAFE = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/;

function file(name: string, text: string): string {
  const p = join(dir, name);
  mkdirSync(join(p, ".."), { recursive: true });
  writeFileSync(p, text);
  return p;
}

const goods = JSON.parse(JSON.stringify(builtinCaseJson.find((c) => (c as { id?: string }).id === "demo-goods-cinderfield"))) as Record<string, unknown> & { train: Record<string, unknown> };
/** The goods case with some fields replaced. */
const goodsWith = (over: Record<string, unknown>, train: Record<string, unknown> = {}) => ({ ...goods, ...over, train: { ...goods.train, ...train } });

describe("spreadsheet formulas are neutralised in the one CSV writer", () => {
  // OWASP, "CSV Injection" (owasp.org community page): cells starting with =, +, -, @, tab or carriage return
  // are read as formulas; prefix an apostrophe and quote the field.
  it("every formula start gets an apostrophe inside a quoted field; numbers and plain text are left alone", () => {
    for (const lead of ["=", "+", "-", "@", "\t", "\r"]) {
      const f = csvField(`${lead}HYPERLINK("http://x","y")`);
      expect(f.startsWith(`"'${lead}`)).toBe(true);
      expect(parseCsv(`${f}\n`)[0]!.fields[0]).toBe(`'${lead}HYPERLINK("http://x","y")`);
    }
    expect(csvField(-3.5)).toBe("-3.5");
    expect(csvField("g-0610")).toBe("g-0610");
    expect(csvField("a,b")).toBe('"a,b"');
    expect(toCsv(["id", "margin"], [["=1+2", -0.25]])).toBe(`id,margin\n"'=1+2",-0.25\n`);
  });

  it("taut check --csv writes a formula-like id neutralised (the app's Export CSV uses the same writer)", async () => {
    const deps = file("formula/day.json", JSON.stringify([{ id: "=1+2", schema: "taut/start-case@1" }, { id: "@SUM(A1:A9)", schema: "taut/start-case@1" }]));
    const r = await taut("check", deps, "--csv", "--quiet");
    expect(r.code).toBe(2);
    const recs = parseCsv(r.stdout).slice(1);
    expect(recs.map((x) => x.fields[0])).toEqual(["'=1+2", "'@SUM(A1:A9)"]);
    expect(r.stdout.split("\n").some((l) => /^[=+\-@]/.test(l))).toBe(false);
  });
});

describe("control and bidirectional characters never reach the terminal raw", () => {
  const evil = "\u001b[2J\u001b[H\nVerdict: STARTS   margin 9.99\u202e";

  it("a case label cannot clear the screen or print a fake verdict line (one full plan)", async () => {
    const p = file("escape/case.json", JSON.stringify(goodsWith({ label: evil })));
    const r = await taut("plan", p, "--no-assistance");
    expect(r.code).toBe(0);
    expect(r.stdout).not.toMatch(RAW_UNSAFE);
    // The only line that starts with "Verdict:" is the program's own, and the label shows its escapes.
    expect(r.stdout.split("\n").filter((l) => l.startsWith("Verdict:"))).toHaveLength(1);
    expect(r.stdout.split("\n")[0]).toBe("\\u001b[2J\\u001b[H\\nVerdict: STARTS   margin 9.99\\u202e");
  });

  it("ids, file names, option values and unknown commands are escaped in every message", async () => {
    const deps = file("escape/day.json", JSON.stringify([{ id: evil, schema: "taut/start-case@1" }]));
    const text = await taut("check", deps, "--quiet");
    expect(text.code).toBe(2);
    expect(text.stdout).toContain("\\u001b[2J");
    const json = await taut("check", deps, "--quiet", "--json");
    // JSON output stays JSON and gives back the exact id, yet shows no raw control or override.
    expect(json.stdout).not.toMatch(RAW_UNSAFE);
    expect((JSON.parse(json.stdout) as { departures: Array<{ id: string }> }).departures[0]!.id).toBe(evil);
    for (const argv of [[`nothing-${evil}.json`], [`--${evil}`], [join(dir, "escape", "case.json"), "--helper", evil]]) {
      const r = await taut("plan", ...argv);
      expect(r.code).toBe(2);
      expect(r.stderr).not.toMatch(RAW_UNSAFE);
      expect(r.stderr.split("\n").some((l) => l.startsWith("Verdict:"))).toBe(false);
    }
    const cmd = await taut(`pl${evil}an`);
    expect(cmd.code).toBe(2);
    expect(cmd.stderr).not.toMatch(RAW_UNSAFE);
    expect(cmd.stderr).toContain('unknown command "pl\\u001b[2J');
  });
});

describe("files: only regular files are read, case files only from the CSV's folder, nothing echoed", () => {
  const fifo = join(dir, "special", "pipe.json");
  mkdirSync(join(dir, "special"), { recursive: true });
  execFileSync("mkfifo", [fifo]);
  const folder = join(dir, "special", "a-folder.json");
  mkdirSync(folder);
  const specials: Array<[string, string, RegExp]> = [
    ["a named pipe", fifo, /is a named pipe, not a file/],
    ["a folder", folder, /is a folder, not a file/],
    ["/dev/zero", "/dev/zero", /is a device, not a file/],
  ];
  const commands: Array<[string, (p: string) => string[]]> = [
    ["plan", (p) => ["plan", p]],
    ["plan --notes", (p) => ["plan", "--demo", "--notes", p]],
    ["simulate", (p) => ["simulate", p, "--sequence", "1@0"]],
    ["check", (p) => ["check", p, "--quiet"]],
    ["table", (p) => ["table", p, "--loco", "illustrative-4axle-1100"]],
    ["notes from-railml", (p) => ["notes", "from-railml", p, "--at", "0", "--direction", "up"]],
  ];
  for (const [what, path, message] of specials) {
    it(`every command refuses ${what} at once with exit 2`, async () => {
      for (const [name, argv] of commands) {
        const r = await taut(...argv(path));
        expect(r.code, name).toBe(2);
        expect(r.stderr, name).toMatch(message);
        expect(r.stdout, name).toBe("");
        expect(r.stderr).not.toMatch(STACK_LINE);
      }
    });
  }

  it("a CSV's case column reads only inside the CSV's folder: ../, absolute paths and links out are refused", async () => {
    const secret = file("secret.json", "root:x:0:0:SECRET-TEXT:/root:/bin/sh\n");
    const day = file(
      "inside/day.csv",
      ["id,case,rail,sand", "up,../secret.json,,", "abs,/etc/passwd,,", "env,/proc/self/environ,,", "link,link.json,,", "pipe,pipe.json,,", "ok,cases/goods.json,dry,no"].join("\n"),
    );
    symlinkSync(secret, join(dir, "inside", "link.json"));
    execFileSync("mkfifo", [join(dir, "inside", "pipe.json")]);
    mkdirSync(join(dir, "inside", "cases"));
    writeFileSync(join(dir, "inside", "cases", "goods.json"), JSON.stringify(goodsWith({}, { trailingMass_t: 0.5 })));
    const r = await taut("check", day, "--json", "--quiet", "--jobs", "1");
    expect(r.code).toBe(2);
    expect(r.stdout + r.stderr).not.toContain("SECRET");
    expect(r.stdout + r.stderr).not.toContain("root:");
    const rows = new Map((JSON.parse(r.stdout) as { departures: Array<{ id: string; error?: string }> }).departures.map((d) => [d.id, d.error ?? ""]));
    for (const id of ["up", "abs", "env", "link"]) expect(rows.get(id), id).toMatch(/is outside the folder of the departures file .*--allow-outside reads others/);
    expect(rows.get("pipe")).toMatch(/^line 6: pipe\.json: is a named pipe, not a file/);
    // A file inside the folder is read as usual (and its own mistake reported).
    expect(rows.get("ok")).toMatch(/^line 7: cases\/goods\.json: train\.trailingMass_t: must be from 5 to 60000 t \(got 0\.5\)$/);

    // --allow-outside reads the file, yet a file that is not JSON is refused without a word of it.
    const allowed = await taut("check", day, "--json", "--quiet", "--jobs", "1", "--allow-outside");
    expect(allowed.stdout + allowed.stderr).not.toContain("SECRET");
    const up = (JSON.parse(allowed.stdout) as { departures: Array<{ id: string; error?: string }> }).departures.find((d) => d.id === "up")!;
    expect(up.error).toBe("line 2: ../secret.json: is not valid JSON: a value should start here (an object, a list, text in double quotes, a number, true, false or null) (line 1, column 1)");
  });

  it("a file named by mistake is not quoted in the error, whichever command reads it", async () => {
    const secret = file("named/passwd", "root:x:0:0:SECRET-TEXT:/root:/bin/sh\n");
    for (const argv of [
      ["plan", secret],
      ["simulate", secret, "--sequence", "1@0"],
      ["plan", "--demo", "--notes", secret],
      ["check", secret],
      ["table", secret, "--loco", "illustrative-4axle-1100"],
      ["notes", "from-railml", secret, "--at", "0", "--direction", "up"],
    ]) {
      const r = await taut(...argv);
      expect(r.code, argv[0]).toBe(2);
      expect(r.stderr).not.toContain("SECRET");
      expect(r.stderr).not.toContain("root:x");
    }
  });
});

describe("every number within a physical range; a plan's work capped", () => {
  const issuesOf = (json: unknown) => {
    const r = parseStartCase(json, builtinLibrary());
    return r.ok ? [] : r.issues;
  };

  it("the extremes that hung or overflowed are refused with the range and the unit in the message", () => {
    const loco = { ...JSON.parse(JSON.stringify(builtinLibrary().locomotives.get("illustrative-4axle-1100")!.file)), mass_t: 1e308, adhesiveMass_t: 1e308 };
    const cases: Array<[unknown, string, string]> = [
      [goodsWith({}, { trailingMass_t: 0.001 }), "train.trailingMass_t", "must be from 5 to 60000 t (got 0.001)"],
      [goodsWith({}, { trailingMass_t: 1e308 }), "train.trailingMass_t", "must be from 5 to 60000 t (got 1e+308)"],
      [goodsWith({}, { length_m: 1e9 }), "train.length_m", "must be from 5 to 16000 m (got 1000000000)"],
      [goodsWith({}, { couplerLimit_kN: 1e308 }), "train.couplerLimit_kN", "must be from 100 to 5000 kN (got 1e+308)"],
      [goodsWith({}, { trailingMass_t: 6 }), "train.trailingMass_t", "must give from 5 to 150 t per wagon (got 0.2 t per wagon over 30 wagons)"],
      [goodsWith({}, { length_m: 5000 }), "train.length_m", "must give from 5 to 40 m per wagon (got 167 m per wagon over 30 wagons)"],
      [goodsWith({ locomotives: [{ profile: loco }] }), "locomotives[0].profile.mass_t", "must be from 10 to 300 t (got 1e+308)"],
      [
        goodsWith({ location: { segments: Array.from({ length: 2001 }, (_, k) => ({ from_m: k * 10, length_m: 10, gradient_permille: 0, curveRadius_m: 0 })), frontAt_m: 19000, clearAhead_m: 500 } }),
        "location.segments",
        "must have at most 2000 items",
      ],
      [goodsWith({ location: { gradient_permille: 0, curveRadius_m: 0, clearAhead_m: 1e12 } }), "location.clearAhead_m", "must be from 0 to 100000 m (got 1000000000000)"],
    ];
    for (const [json, path, message] of cases) {
      const issues = issuesOf(json);
      expect(issues.find((i) => i.path === path)?.message, path).toBe(message);
    }
  });

  it("one such row does not stall taut check: it is answered as bad input and the file finishes", async () => {
    const deps = file("ranges/day.json", JSON.stringify([goodsWith({ id: "gram" }, { trailingMass_t: 0.001 })]));
    const r = await taut("check", deps, "--json", "--quiet", "--jobs", "1");
    expect(r.code).toBe(2);
    expect((JSON.parse(r.stdout) as { departures: Array<{ error: string }> }).departures[0]!.error).toBe("[0] (gram): train.trailingMass_t: must be from 5 to 60000 t (got 0.001)");
  });

  it("the core caps one plan's work as data: a train of one-gram wagons is refused with the reason", () => {
    // Built directly in SI (the file schema would refuse it first): 60 wagons of a gram each.
    const c = uniformCase({ locos: [{ spec: testLoco(), count: 1, position: "head" }], trailingMassKg: 0.06, wagons: 60, wagon: testWagon() });
    const w = planWork(c);
    // The step is the leapfrog stability limit for the lightest mass on the stiffest coupling, 2/ω with
    // ω = 2√(k/m) (Gershgorin), shortened further by damping: it falls as √m, and as m once damping rules,
    // so a gram wagon's step is microseconds or less, far below the 3 ms accuracy cap [D].
    expect(w.stepS).toBeLessThan(1e-5);
    expect(w.vehicleSteps).toBeGreaterThan(PLAN_WORK_CAP_VEHICLE_STEPS);
    expect(readerEnglish(planWorkProblem(c)!)).toMatch(/^one plan of this train would take .* vehicle-steps \(61 vehicles at a [\d.]+ ns step, which the lightest vehicle, 1 g, sets\), more than the 5\.0 × 10\^8 a plan may take: check the masses$/);
    // The planner worker answers it as invalid input with that message, never by running for hours.
    const posted: WorkerResponse[] = [];
    const ticks: Array<() => void> = [];
    const handle = createPlannerHandler((m) => posted.push(m), { schedule: (f) => ticks.push(f) });
    handle({ type: "plan", id: 1, startCase: c });
    while (ticks.length > 0) ticks.shift()!();
    const last = posted.at(-1)!;
    expect(last).toMatchObject({ type: "error", id: 1, kind: "invalid" });
    // As a code with its figures (the worker carries no words); the page writes them.
    const reader = last.type === "error" ? last.issues?.[0]?.reader : undefined;
    expect(reader).toMatchObject({ code: "work-cap", vehicles: 61, capVehicleSteps: PLAN_WORK_CAP_VEHICLE_STEPS });
    expect(readerMessage(ENGLISH, reader!)).toMatch(/vehicle-steps/);
  });

  it("every train the schemas admit is within the cap: the most work is 408 of the lightest, shortest vehicles", () => {
    // The worst corners of the ranges for the integrator: most vehicles, least mass each, 0 slack, either coupling.
    const loco = { ...builtinLibrary().locomotives.get("illustrative-4axle-1100")!.file, id: "light-unit", mass_t: 10, adhesiveMass_t: 10, length_m: 5 };
    let most = 0;
    for (const coupling of ["knuckle", "screw"] as const) {
      for (const couplerSlack_mm of [0, 200]) {
        const json = goodsWith(
          { locomotives: [{ profile: loco, count: 8 }], location: { gradient_permille: 0, curveRadius_m: 0, clearAhead_m: 500 } },
          { trailingMass_t: 2000, wagons: 400, length_m: 2000, coupling, couplerSlack_mm, wagonType: undefined },
        );
        const r = parseStartCase(json, builtinLibrary());
        expect(r.ok).toBe(true);
        if (!r.ok) continue;
        most = Math.max(most, planWork(r.value).vehicleSteps);
        expect(planWorkProblem(r.value)).toBeUndefined();
      }
    }
    expect(most).toBeLessThan(PLAN_WORK_CAP_VEHICLE_STEPS);
    // …and the cap is not so loose that the worst schema train is far below it (a cap that cannot bind is no cap).
    expect(most).toBeGreaterThan(PLAN_WORK_CAP_VEHICLE_STEPS / 5);
  });
});

describe("messages say what is wrong", () => {
  it("an id's rule in words, not a pattern", async () => {
    const p = file("msg/bad-id.json", JSON.stringify(goodsWith({ location: "Loop Exit 2" })));
    const r = await taut("plan", p);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('location: must be lower-case letters, digits, hyphens, dots or underscores, starting with a letter or digit (got "Loop Exit 2")');
    expect(r.stderr).not.toMatch(/regex|format/);
  });

  it("a CSV cell's mistake is blamed on the CSV line, not on the case file", async () => {
    mkdirSync(join(dir, "cell"), { recursive: true });
    copyFileSync(`${repo}profiles/cases/demo-goods-cinderfield.json`, join(dir, "cell", "goods.json"));
    const day = file("cell/day.csv", "id,case,rail,sand,location\nx,goods.json,dry,no,no-such-place\ny,goods.json,dry,no,Bad Place\n");
    const r = await taut("check", day, "--json", "--quiet", "--jobs", "1");
    const rows = (JSON.parse(r.stdout) as { departures: Array<{ error: string }> }).departures;
    expect(rows[0]!.error).toMatch(/^line 2: location "no-such-place": names no known location note \("no-such-place"; known: /);
    expect(rows[1]!.error).toMatch(/^line 3: location "Bad Place": must be lower-case letters/);
    for (const row of rows) expect(row.error).not.toContain("goods.json");
  });

  it("at most a dozen issues, then how many more; never Infinity or NaN in a message", async () => {
    const bad = goodsWith(
      { conditions: { rail: "icy", sand: "maybe", temperature_C: 1e308 }, target: { speed_kmh: -1 } },
      { trailingMass_t: -1, wagons: 0.5, length_m: -1, couplerSlack_mm: 1e308, bearing: "square", couplerLimit_kN: 0, coupling: "rope", wagonType: "NO", slackState: "loose" },
    );
    const p = file("msg/many.json", JSON.stringify({ ...bad, id: 7, label: 8, illustrative: "yes", settings: { couplerSafetyFactor: 100, slipRiskThreshold: 2 } }));
    const r = await taut("plan", p);
    expect(r.code).toBe(2);
    const listed = r.stderr.split("\n").filter((l) => /^ {2}\S/.test(l));
    expect(listed).toHaveLength(13);
    expect(listed.at(-1)).toMatch(/^ {2}…and \d+ more$/);
    expect(r.stderr).not.toMatch(/Infinity|NaN/);
  });

  it("a wrong schema value is quoted with its control and bidirectional characters escaped", async () => {
    const p = file("msg/schema.json", JSON.stringify({ schema: "taut/\u001b[31mlocomotive\u202e@1" }));
    const r = await taut("plan", p);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('this is a "taut/\\u001b[31mlocomotive\\u202e@1" file; a start case (taut/start-case@1) is needed here');
    expect(r.stderr).not.toMatch(RAW_UNSAFE);
  });

  it("a JSON syntax error says where and what, in our words", async () => {
    const p = file("msg/broken.json", '{\n  "schema": "taut/start-case@1",\n  "label": tru\n}');
    const r = await taut("plan", p);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain("is not valid JSON: a value should start here (an object, a list, text in double quotes, a number, true, false or null) (line 3, column 12)");
  });
});

describe("a byte-order mark before JSON is accepted", () => {
  const bom = "\ufeff";
  it("a start case, a notes file and a departures list read with a BOM as without", async () => {
    // A case with one field out of range: the reader got past the BOM to the field check.
    const p = file("bom/case.json", bom + JSON.stringify(goodsWith({}, { couplerLimit_kN: 50 })));
    const plan = await taut("plan", p);
    expect(plan.code).toBe(2);
    expect(plan.stderr).toContain("train.couplerLimit_kN: must be from 100 to 5000 kN (got 50)");
    // A notes file with a BOM is read; the table then stops at its option check (no mass search run).
    const note = JSON.parse(JSON.stringify(builtinLibrary().locations.get("lantern-dip")!)) as Record<string, unknown>;
    const notes = file("bom/note.json", bom + JSON.stringify({ ...note, id: "bom-note" }));
    const table = await taut("table", notes, "--loco", "illustrative-4axle-1100", "--count", "99");
    expect(table.code).toBe(2);
    expect(table.stderr).toBe('taut table: --count: must be a whole number from 1 to 8 (got "99")');
    const deps = file("bom/day.json", bom + JSON.stringify([{ id: "x", schema: "taut/start-case@1" }]));
    const check = await taut("check", deps, "--json", "--quiet");
    expect(check.code).toBe(2);
    expect((JSON.parse(check.stdout) as { departures: Array<{ id: string }> }).departures[0]!.id).toBe("x");
  });
});
