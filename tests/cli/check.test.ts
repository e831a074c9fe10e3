/**
 * `taut check`: a day's departures from CSV or JSON (INTERFACE.md "Other commands"), answered in a pool of
 * worker threads. A broken row is named by its line (CSV) or index (JSON) and the others are still answered;
 * every answered row agrees with what the planner says of the same case on this thread.
 */
import { copyFileSync, mkdirSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, describe, expect, it } from "vitest";
import { planStart } from "../../src/core/planner/index.js";
import { builtinCaseJson, builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { runJob } from "../../src/cli/batch/jobs.js";
import { JobPool } from "../../src/cli/batch/pool.js";
import { parseCsv } from "../../src/cli/csvParse.js";
import { taut } from "../tools/cli.js";

const repo = fileURLToPath(new URL("../../", import.meta.url));
const cases = `${repo}profiles/cases`;
const dir = mkdtempSync(join(tmpdir(), "taut-check-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const STACK_LINE = /^\s+at\s/m;

function file(name: string, text: string): string {
  const p = join(dir, name);
  writeFileSync(p, text);
  return p;
}

interface Row {
  id: string;
  line?: number;
  index?: number;
  verdict?: string;
  reasons?: string[];
  margin?: number;
  binding?: string;
  trailingMass_t?: number;
  maxStartableMass_t?: number;
  largestMarginalMass_t?: number;
  advice?: string[];
  rail?: string;
  sand?: boolean;
  error?: string;
  assistance?: { add: string; position: string; verdict: string } | null;
  divide?: { firstPart: { wagons: number } } | null;
}
interface CheckJson {
  schema: string;
  departures: Row[];
  summary: { departures: number; badRows: number; distinctChecks: number; distinctMassSearches: number; workers: number };
  cautions: string[];
}

const goods = JSON.parse(JSON.stringify(builtinCaseJson[2])) as Record<string, unknown>;

describe("a CSV with broken rows", () => {
  // Good rows use the quickest demo train (goods, 30 vans); the broken ones break in different ways.
  const csv = file(
    "day.csv",
    [
      "id,case,rail,sand",
      "g-dry,cases/goods.json,dry,no",
      "g-missing,no-such-case.json,dry,no",
      "g-icy,cases/goods.json,icy,no",
      "g-sand,cases/goods.json,wet,maybe",
      "g-wet,cases/goods.json,wet,yes",
      "g-bad,bad-case.json,,",
      "g-dry-again,./cases/goods.json,dry,no",
    ].join("\n"),
  );
  // Case files are read from the CSV's folder and below (tests/cli/hostile.test.ts checks the refusal).
  mkdirSync(join(dir, "cases"), { recursive: true });
  copyFileSync(`${cases}/demo-goods-cinderfield.json`, join(dir, "cases", "goods.json"));
  file("bad-case.json", JSON.stringify({ ...goods, train: { ...(goods.train as object), trailingMass_t: -5 } }));

  it("answers the good rows, names each broken line, exits 2", async () => {
    const r = await taut("check", csv, "--json", "--jobs", "2");
    expect(r.code).toBe(2);
    const out = JSON.parse(r.stdout) as CheckJson;
    expect(out.schema).toBe("taut/departures-check@1");
    expect(out.departures.map((d) => d.id)).toEqual(["g-dry", "g-missing", "g-icy", "g-sand", "g-wet", "g-bad", "g-dry-again"]);
    const byId = new Map(out.departures.map((d) => [d.id, d]));
    expect(byId.get("g-missing")!.error).toMatch(/^line 3: no-such-case\.json: no such file/);
    expect(byId.get("g-icy")!.error).toMatch(/^line 4: rail: must be one of dry, damp, wet, frost, leaves, greasy \(got "icy"\)/);
    expect(byId.get("g-sand")!.error).toMatch(/^line 5: sand: must be yes or no/);
    expect(byId.get("g-bad")!.error).toMatch(/^line 7: bad-case\.json: train\.trailingMass_t: must be from 5 to 60000 t \(got -5\)$/);
    for (const id of ["g-dry", "g-wet", "g-dry-again"]) {
      const d = byId.get(id)!;
      expect(d.error).toBeUndefined();
      expect(["starts", "marginal", "needs-assistance"]).toContain(d.verdict);
      expect(d.maxStartableMass_t).toBeGreaterThan(0);
    }
    expect(byId.get("g-wet")).toMatchObject({ line: 6, rail: "wet", sand: true });
    expect(out.summary).toMatchObject({ departures: 7, badRows: 4 });
    // The two identical departures are worked out once.
    expect(out.summary.distinctChecks).toBe(2);
    expect(byId.get("g-dry-again")).toMatchObject({ ...byId.get("g-dry"), id: "g-dry-again", line: 8 });
    expect(r.stderr).toMatch(/taut: 7\/7 departures answered \(100%\)/);
    expect(r.stderr).not.toMatch(STACK_LINE);
  });

  it("the answered rows agree with the planner run on this thread (verdict, reasons, margin)", async () => {
    const r = await taut("check", csv, "--json", "--quiet");
    const out = JSON.parse(r.stdout) as CheckJson;
    const lib = builtinLibrary();
    for (const [id, rail, sand] of [["g-dry", "dry", false], ["g-wet", "wet", true]] as const) {
      const c = parseStartCase({ ...goods, conditions: { ...(goods.conditions as object), rail, sand } }, lib);
      if (!c.ok) throw new Error("demo case invalid");
      const p = planStart(c.value, { skipMassSearch: true });
      const d = out.departures.find((x) => x.id === id)!;
      expect(d.verdict).toBe(p.verdict);
      expect(d.reasons).toEqual(p.reasons);
      expect(d.margin).toBeCloseTo(p.margin, 3);
    }
  });

  it("readable output: a table of the answered rows, then the unanswered rows by line", async () => {
    const r = await taut("check", csv, "--quiet");
    expect(r.code).toBe(2);
    expect(r.stdout).toMatch(/^id\s+row\s+rail\s+sand\s+mass t\s+verdict/m);
    expect(r.stdout).toMatch(/^g-wet\s+line 6\s+wet\s+yes\s+1100\s/m);
    expect(r.stdout).toMatch(/Rows not answered \(4\):\n\s+- line 3: no-such-case\.json: no such file/);
    expect(r.stdout).toMatch(/7 departures: .*4 bad rows\./);
    expect(r.stdout).toMatch(/Advisory only/);
    expect(r.stderr).toBe("");
  });

  it("--csv: one line per departure with the error column filled for the broken ones", async () => {
    const r = await taut("check", csv, "--csv", "--quiet", "--jobs", "1");
    const recs = parseCsv(r.stdout);
    const header = recs[0]!.fields;
    expect(header.slice(0, 3)).toEqual(["id", "line", "index"]);
    const err = header.indexOf("error");
    expect(recs.length).toBe(8);
    expect(recs.slice(1).filter((x) => x.fields[err] !== "").map((x) => x.fields[1])).toEqual(["3", "4", "5", "7"]);
  });
});

describe("a JSON list with one broken entry", () => {
  const bad = { ...goods, id: "broken", train: { ...(goods.train as object), wagons: 0 } };
  const good = { ...goods, id: "fine" };
  const unnamed = { ...goods, conditions: { rail: "wet", sand: true, temperature_C: 8 } };
  delete (unnamed as { id?: unknown }).id;
  const json = file("day.json", JSON.stringify([good, bad, unnamed], null, 2));

  it("answers the others and names the broken index; an entry without id is named by its index", async () => {
    const r = await taut("check", json, "--json", "--quiet");
    expect(r.code).toBe(2);
    const out = JSON.parse(r.stdout) as CheckJson;
    expect(out.departures.map((d) => d.id)).toEqual(["fine", "broken", "[2]"]);
    expect(out.departures[1]!.error).toMatch(/^\[1\] \(broken\): train\.wagons: /);
    expect(out.departures[0]!.verdict).toBeDefined();
    expect(out.departures[2]).toMatchObject({ index: 2, rail: "wet", sand: true });
    expect(out.departures[2]!.verdict).toBeDefined();
  });

  it("a file that is not a list is bad input as a whole", async () => {
    const r = await taut("check", file("obj.json", JSON.stringify(good)));
    expect(r.code).toBe(2);
    expect(r.stdout).toBe("");
    expect(r.stderr).toMatch(/a departures file in JSON is a list of start cases/);
  });
});

describe("the file as a whole", () => {
  it("a CSV without a case column, a missing file, and --json with --csv are bad input", async () => {
    const a = await taut("check", file("nohead.csv", "id,rail,sand\nx,dry,no\n"));
    expect(a.code).toBe(2);
    expect(a.stderr).toMatch(/line 1: the header must name the columns id,case,rail,sand/);
    const b = await taut("check", join(dir, "none.csv"));
    expect(b.code).toBe(2);
    expect(b.stderr).toMatch(/none\.csv: no such file/);
    const c = await taut("check", file("x.csv", "id,case\n"), "--json", "--csv");
    expect(c.code).toBe(2);
    const d = await taut("check", file("y.csv", "id,case\n"), "--jobs", "0");
    expect(d.stderr).toMatch(/--jobs: must be a whole number from 1 to 64/);
  });

  it("--sort takes file or risk", async () => {
    const r = await taut("check", file("z.csv", "id,case\n"), "--sort", "margin");
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/--sort: must be file or risk \(got "margin"\)/);
  });

  it("--help documents the formats and the exit codes", async () => {
    const r = await taut("check", "--help");
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/id,case,rail,sand/);
    expect(r.stdout).toMatch(/Exit codes: 0 when every row was answered; 2 when some rows were bad input/);
  });
});

describe("the worker pool", () => {
  it("gives what the same job gives on this thread", async () => {
    const c = parseStartCase(builtinCaseJson[2], builtinLibrary());
    if (!c.ok) throw new Error("demo case invalid");
    const pool = new JobPool(2);
    try {
      const [inPool, mass] = await Promise.all([pool.run({ kind: "check", case: c.value }), pool.run({ kind: "mass", case: c.value })]);
      const here = runJob({ kind: "check", case: c.value });
      const strip = (o: object) => ({ ...o, elapsedMs: 0 });
      expect(strip(inPool)).toEqual(strip(here));
      expect(mass.kind).toBe("mass");
    } finally {
      await pool.close();
    }
  });
});

describe("CSV reading", () => {
  it("quoted fields with commas, doubled quotes and line breaks keep the line numbers right", () => {
    const recs = parseCsv('id,case\r\n"a,1","say ""hi"""\n\n"multi\nline",x\nlast,y');
    expect(recs).toEqual([
      { line: 1, fields: ["id", "case"] },
      { line: 2, fields: ["a,1", 'say "hi"'] },
      { line: 4, fields: ["multi\nline", "x"] },
      { line: 6, fields: ["last", "y"] },
    ]);
    expect(() => parseCsv('a,"b\nc')).toThrow(/line 1: a quoted field is not closed/);
  });
});

describe("the sample departures of the demo scenario (profiles/departures)", () => {
  it("the CSV and the JSON version give the same answers, every row answered", async () => {
    // The sample CSV names the built-in demo cases by id: nothing is read outside its own folder.
    const a = await taut("check", `${repo}profiles/departures/demo-day.csv`, "--json", "--quiet");
    const b = await taut("check", `${repo}profiles/departures/demo-day.json`, "--json", "--quiet", "--sort", "risk");
    expect(a.code).toBe(0);
    expect(b.code).toBe(0);
    const rowsA = (JSON.parse(a.stdout) as CheckJson).departures;
    const rowsB = (JSON.parse(b.stdout) as CheckJson).departures;
    expect(rowsA.length).toBe(12);
    const strip = (r: Row) => ({ ...r, line: undefined, index: undefined });
    const byId = (x: { id: string }, y: { id: string }) => (x.id < y.id ? -1 : 1);
    expect(rowsB.map(strip).sort(byId)).toEqual(rowsA.map(strip).sort(byId));
    // --sort risk: needs assistance, then marginal, then starts, each by margin (smallest first).
    const rank = { "needs-assistance": 0, marginal: 1, starts: 2 } as Record<string, number>;
    for (let k = 1; k < rowsB.length; k++) {
      const [p, q] = [rowsB[k - 1]!, rowsB[k]!];
      expect(rank[p.verdict!]! < rank[q.verdict!]! || (p.verdict === q.verdict && p.margin! <= q.margin!), `${p.id} before ${q.id}`).toBe(true);
    }
    expect((JSON.parse(b.stdout) as { order: string }).order).toBe("risk");
    // Something for the dispatcher in every row that does not start: an option, a divided train, or what
    // would change it.
    for (const r of rowsA) if (r.verdict !== "starts") expect(r.assistance ?? r.divide ?? r.advice).toBeTruthy();
    // One story on every row: the verdict, the margin and the largest masses agree.
    for (const r of rowsA) {
      expect(r.verdict === "starts").toBe(r.margin! >= 1);
      expect(r.verdict === "starts").toBe(r.trailingMass_t! <= r.maxStartableMass_t!);
      expect(r.verdict === "needs-assistance").toBe(r.trailingMass_t! > r.largestMarginalMass_t!);
    }
  }, 120_000);
});
