/**
 * `taut table` (INTERFACE.md "Other commands") and the assistance section of `taut plan`. The table's
 * figures are the core's load table for the same train (worked out in worker threads here); the plan's
 * assistance options are real cases the planner says start.
 */
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, describe, expect, it } from "vitest";
import { loadTable } from "../../src/core/dispatch/loadTable.js";
import { tableCase } from "../../src/cli/commands/table.js";
import { builtinLibrary, builtinLocations, builtinTrains } from "../../src/profiles/builtin.js";
import { referenceCase, referenceOf } from "../../src/profiles/referenceTrain.js";
import { makeNotesBundle } from "../../src/profiles/notes.js";
import type { LocationNoteFile } from "../../src/profiles/schemas.js";
import { taut } from "../tools/cli.js";

const repo = fileURLToPath(new URL("../../", import.meta.url));
const dir = mkdtempSync(join(tmpdir(), "taut-table-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const file = (name: string, data: unknown) => {
  const p = join(dir, name);
  writeFileSync(p, JSON.stringify(data, null, 2));
  return p;
};

interface TableJson {
  schema: string;
  location: { id: string };
  train: { source: string; wagons: number; wagonType: string; couplerLimit_kN: number; target_kmh: number };
  rows: Array<{ rail: string; sand: boolean; maxTrailingMass_t: number }>;
}

describe("taut table", () => {
  const ashvale = `${repo}profiles/locations/ashvale-loop-up.json`;

  it("12 rows equal to the core's load table for the same train (--json), with progress on stderr", async () => {
    const r = await taut("table", ashvale, "--loco", "illustrative-6axle-3000", "--wagons", "20", "--json");
    expect(r.code).toBe(0);
    const t = JSON.parse(r.stdout) as TableJson;
    expect(t.schema).toBe("taut/load-table@1");
    expect(t.train).toMatchObject({ source: "options", wagons: 20, wagonType: "bogie-hopper-loaded", couplerLimit_kN: 970, target_kmh: 20 });
    const lib = builtinLibrary();
    const note = builtinLocations.find((n) => n.id === "ashvale-loop-up")!;
    const core = loadTable(tableCase(note, { loco: "illustrative-6axle-3000", wagons: "20" }, lib).c);
    expect(t.rows).toEqual(core.map((row) => ({ rail: row.rail, sand: row.sand, maxTrailingMass_t: Math.floor(row.maxTrailingMassKg / 1000) })));
    expect(r.stderr).toMatch(/12\/12 rows of the load table \(100%\)/);
  }, 120_000);

  it("readable and CSV forms; a built-in note may be named by id; --count and --limit shape the train; \"none\" where the app says none", async () => {
    const opts = ["--loco", "illustrative-4axle-1100", "--count", "2", "--wagons", "10", "--limit", "500", "--quiet"];
    const a = await taut("table", "cinderfield-yard", ...opts);
    expect(a.code).toBe(0);
    expect(a.stdout).toMatch(/^Load table — Cinderfield Yard/);
    expect(a.stdout).toMatch(/Locomotives: 2 × illustrative-4axle-1100 at the head/);
    expect(a.stdout).toMatch(/couplings 500 kN/);
    expect(a.stdout).toMatch(/^\s+rail\s+no sand\s+sand$/m);
    expect(a.stdout).toMatch(/^\s+leaves\s+(\d+|none)\s+(\d+|none)$/m);
    expect(a.stderr).toBe("");
    const b = await taut("table", "cinderfield-yard", ...opts, "--csv");
    const lines = b.stdout.trim().split("\n");
    expect(lines[0]).toBe("rail,sand,maxTrailingMass_t");
    expect(lines.length).toBe(13);
    expect(lines[1]).toMatch(/^dry,false,\d+$/);
    // The readable table says "none" exactly where the CSV has 0 (the app's load table and card say "none" too).
    const csvCell = (rail: string, sand: boolean) => Number(lines.find((l) => l.startsWith(`${rail},${sand},`))!.split(",")[2]);
    for (const rail of ["dry", "damp", "wet", "frost", "leaves", "greasy"]) {
      const row = new RegExp(`^\\s+${rail}\\s+(\\S+)\\s+(\\S+)$`, "m").exec(a.stdout)!;
      [row[1], row[2]].forEach((cell, k) => {
        const t = csvCell(rail, k === 1);
        expect(cell, `${rail} ${k === 1 ? "sand" : "no sand"}`).toBe(t > 0 ? String(t) : "none");
      });
    }
    expect(a.stdout).not.toMatch(/\b0 means\b/);
  }, 120_000);

  it("one reference train per note: without train options, the train the app's card uses (the note's, or the first preset)", () => {
    const lib = builtinLibrary();
    for (const note of builtinLocations) {
      const cli = tableCase(note, {}, lib);
      // What the app's Location notes card works its load table out for (loadTableRunner → referenceCase).
      const app = referenceCase(note, builtinTrains, lib);
      expect(app.ok).toBe(true);
      if (!app.ok) continue;
      expect(cli.c, note.id).toEqual(app.value);
      expect(cli.referenceTrain).toBe(referenceOf(note, builtinTrains).train);
      expect(cli.source).toBe(note.referenceTrain ? "referenceTrain" : "defaultReferenceTrain");
    }
    // --loco and --count replace the reference train's locomotives, as the card's own choice does.
    const note = builtinLocations[0]!;
    const swapped = tableCase(note, { loco: "illustrative-6axle-1800", count: "2" }, lib);
    const app = referenceCase(note, builtinTrains, lib, { ...referenceOf(note, builtinTrains), locomotive: "illustrative-6axle-1800", count: 2 });
    expect(app.ok && swapped.c).toEqual(app.ok && app.value);
  });

  it("a note's reference train is used when it has one; --loco then replaces its locomotives", async () => {
    const base = builtinLocations.find((n) => n.id === "cinderfield-yard")!;
    const note: LocationNoteFile = { ...base, id: "cinderfield-ref", referenceTrain: { train: "goods-1100", temperature_C: 4 } };
    const bundle = file("bundle.json", makeNotesBundle([note, { ...base, id: "other" }]));
    const r = await taut("table", bundle, "--note", "cinderfield-ref", "--json", "--quiet", "--target-kmh", "10");
    expect(r.code).toBe(0);
    const t = JSON.parse(r.stdout) as TableJson & { locomotives: Array<{ profile: string; count: number }>; train: { temperature_C: number; bearing: string } };
    expect(t.train).toMatchObject({ source: "referenceTrain", wagons: 30, wagonType: "bogie-van-buffered", temperature_C: 4, bearing: "plain", target_kmh: 10 });
    expect(t.locomotives).toEqual([{ profile: "illustrative-4axle-1100", count: 1, position: "head" }]);
  }, 120_000);

  it("bad input: train options without --loco, an unknown profile, a bundle without --note", async () => {
    const ashvaleNote = builtinLocations.find((n) => n.id === "ashvale-loop-up")!;
    const a = await taut("table", `${repo}profiles/locations/ashvale-loop-up.json`, "--wagons", "20");
    expect(a.code).toBe(2);
    expect(a.stderr).toMatch(/--loco ID is needed with the train options/);
    const b = await taut("table", `${repo}profiles/locations/ashvale-loop-up.json`, "--loco", "no-such-unit");
    expect(b.code).toBe(2);
    expect(b.stderr).toMatch(/--loco: no locomotive profile "no-such-unit"/);
    const c = await taut("table", file("two.json", makeNotesBundle([ashvaleNote, { ...ashvaleNote, id: "second" }])), "--loco", "illustrative-6axle-3000");
    expect(c.code).toBe(2);
    expect(c.stderr).toMatch(/holds 2 notes: choose one with --note ID/);
    const d = await taut("table", `${repo}profiles/locations/ashvale-loop-up.json`, "--loco", "illustrative-6axle-3000", "--wagons", "400");
    expect(d.code).toBe(2);
    expect(d.stderr).toMatch(/does not fit/);
  });
});

describe("taut plan: assistance when the train does not start", () => {
  // 3000 t on a uniform 10 ‰ rise behind one 138 t unit: beyond what it starts alone within the slip-risk
  // threshold (resistance 385 kN against 355 kN of adhesion at the 10 % quantile, dry and sanded).
  const heavy = {
    schema: "taut/start-case@1",
    id: "heavy-on-10",
    locomotives: [{ profile: "illustrative-6axle-3000", count: 1, position: "head" }],
    train: { trailingMass_t: 3000, wagons: 40, length_m: 560, couplerSlack_mm: 50, bearing: "roller", couplerLimit_kN: 970, wagonType: "bogie-hopper-loaded" },
    location: { gradient_permille: 10, curveRadius_m: 0, clearAhead_m: 1500 },
    conditions: { rail: "dry", sand: true, temperature_C: 10 },
    target: { speed_kmh: 15 },
  };
  const path = file("heavy.json", heavy);

  it("lists options that start, each a case `taut plan` itself says starts", async () => {
    const r = await taut("plan", path, "--json");
    expect(r.code).toBe(0);
    const p = JSON.parse(r.stdout) as {
      verdict: string;
      assistance: Array<{ add: string; position: string; verdict: string; peakCouplerForce_kN: number; locomotives: unknown[]; units: number }>;
      assistanceSearch: { plannerRuns: number; budget: number };
    };
    expect(p.verdict).not.toBe("starts");
    expect(p.assistance.length).toBeGreaterThan(0);
    expect(p.assistanceSearch.plannerRuns).toBeLessThanOrEqual(p.assistanceSearch.budget);
    const first = p.assistance[0]!;
    expect(first.verdict).toBe("starts");
    const again = await taut("plan", file("with-help.json", { ...heavy, locomotives: [...heavy.locomotives, ...first.locomotives] }), "--json", "--no-assistance");
    const q = JSON.parse(again.stdout) as { verdict: string; peakCouplerForce_kN: number; assistance: unknown[] };
    expect(q.verdict).toBe("starts");
    expect(q.peakCouplerForce_kN).toBeCloseTo(first.peakCouplerForce_kN, 0);
    expect(q.assistance).toEqual([]);
  }, 120_000);

  it("readable: an options table, cheapest first, and the search's extent", async () => {
    const r = await taut("plan", path);
    expect(r.stdout).toMatch(/Assistance options:\n\s+#\s+add\s+where\s+verdict\s+peak pull kN\s+peak push kN\s+to target s/);
    expect(r.stdout).toMatch(/^\s+1\s+1 × illustrative-6axle-3000\s+\S.*\sstarts\s/m);
    expect(r.stdout).toMatch(/Search: \d+ planner runs \(cap 16\)/);
  }, 120_000);
});
