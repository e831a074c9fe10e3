/**
 * Every file shipped under profiles/ parses with the schema of its folder, every demo case resolves against
 * the built-in library, and the rail-condition table carries the values of PHYSICS.md §2.
 */
import { existsSync, readdirSync, readFileSync } from "node:fs";
import { basename, dirname, extname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { RAIL_CONDITIONS } from "../../src/core/index.js";
import { readRecording } from "../../src/profiles/recording.js";
import { builtinCases, builtinLibrary, builtinLocations, builtinRailConditions, builtinTrains, DEMO_CASE_ID } from "../../src/profiles/builtin.js";
import {
  formatIssues,
  parseJsonText,
  parseLocationNote,
  parseLocomotiveFile,
  parseRailConditionsFile,
  parseStartCase,
  parseTrainPreset,
  parseWagonFile,
  type ParseResult,
} from "../../src/profiles/index.js";

const root = fileURLToPath(new URL("../../profiles/", import.meta.url));
const lib = builtinLibrary();

/** Which parser reads the JSON files of each folder. */
const PARSERS: Record<string, (data: unknown) => ParseResult<unknown>> = {
  locomotives: parseLocomotiveFile,
  wagons: parseWagonFile,
  conditions: parseRailConditionsFile,
  locations: parseLocationNote,
  trains: parseTrainPreset,
  cases: (d) => parseStartCase(d, lib),
  // A departures file (taut check) is a list of start cases, each with an optional id.
  departures: (d) => {
    if (!Array.isArray(d)) return { ok: false, issues: [{ path: "", message: "must be a list of start cases" }] };
    for (const [k, c] of d.entries()) {
      const r = parseStartCase(c, lib);
      if (!r.ok) return { ok: false, issues: r.issues.map((i) => ({ ...i, path: `[${k}].${i.path}` })) };
    }
    return { ok: true, value: d };
  },
};

function filesUnder(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? filesUnder(join(dir, e.name)) : [join(dir, e.name)]));
}

const files = filesUnder(root).map((f) => f.slice(root.length));

function readJson(rel: string): unknown {
  const r = parseJsonText(readFileSync(join(root, rel), "utf8"));
  if (!r.ok) throw new Error(`${rel}: ${formatIssues(r.issues)}`);
  return r.value;
}

describe("profile files", () => {
  it("there are the demo files the design asks for", () => {
    const count = (folder: string) => files.filter((f) => f.startsWith(`${folder}/`)).length;
    expect(count("locomotives")).toBeGreaterThanOrEqual(3);
    expect(count("wagons")).toBeGreaterThanOrEqual(2);
    expect(count("locations")).toBeGreaterThanOrEqual(3);
    expect(count("trains")).toBeGreaterThanOrEqual(3);
    expect(count("cases")).toBeGreaterThanOrEqual(3);
    expect(count("conditions")).toBe(1);
  });

  for (const rel of files) {
    it(`${rel} parses with its folder's schema`, () => {
      const folder = rel.split("/")[0]!;
      if (extname(rel) === ".csv") {
        // A departures table (INTERFACE.md: columns id,case,rail,sand; a case path relative to the CSV, or the
        // id of a built-in case, which must then be a shipped case file of that name).
        expect(folder).toBe("departures");
        const [header, ...rows] = readFileSync(join(root, rel), "utf8").trim().split(/\r?\n/);
        expect(header!.split(",").slice(0, 4)).toEqual(["id", "case", "rail", "sand"]);
        const builtinIds = new Set(builtinCases.map((c) => c.id));
        for (const row of rows) {
          const ref = row.split(",")[1]!;
          if (/^[A-Za-z0-9][A-Za-z0-9-]*$/.test(ref)) {
            expect(builtinIds.has(ref), ref).toBe(true);
            expect(existsSync(join(root, "cases", `${ref}.json`)), ref).toBe(true);
          } else expect(existsSync(join(root, dirname(rel), ref)), ref).toBe(true);
        }
        return;
      }
      if (extname(rel) === ".gpx") {
        // A recorded start for trying Start review: it reads as a start (the reader throws on what cannot be one).
        expect(folder).toBe("recordings");
        expect(readRecording(rel, readFileSync(join(root, rel), "utf8")).recording.samples.length).toBeGreaterThan(60);
        return;
      }
      expect(extname(rel), `${rel}: unexpected file kind`).toBe(".json");
      const parse = PARSERS[folder];
      expect(parse, `no schema is known for profiles/${folder}: add it to PARSERS`).toBeDefined();
      const r = parse!(readJson(rel));
      expect(r.ok ? "" : formatIssues(r.issues)).toBe("");
      // Files named by id are found by id: the name must match.
      const data = readJson(rel) as { id?: unknown };
      if (typeof data === "object" && data !== null && "id" in data) expect(data.id).toBe(basename(rel, ".json"));
    });
  }

  it("every shipped locomotive, wagon type and location note is registered in the built-in library", () => {
    const ids = (folder: string) => files.filter((f) => f.startsWith(`${folder}/`)).map((f) => basename(f, ".json"));
    expect([...lib.locomotives.keys()].sort()).toEqual(ids("locomotives").sort());
    expect([...lib.wagons.keys()].sort()).toEqual(ids("wagons").sort());
    expect([...lib.locations.keys()].sort()).toEqual(ids("locations").sort());
    expect(builtinLocations.length).toBe(ids("locations").length);
    expect(builtinTrains.map((t) => t.id).sort()).toEqual(ids("trains").sort());
    expect(ids("cases")).toContain(DEMO_CASE_ID);
  });

  it("demo trains name only known locomotives and wagon types", () => {
    for (const t of builtinTrains) {
      for (const l of t.locomotives) if (typeof l.profile === "string") expect(lib.locomotives.has(l.profile), l.profile).toBe(true);
      if (t.train.wagonType !== undefined) expect(lib.wagons.has(t.train.wagonType), t.train.wagonType).toBe(true);
    }
  });

  it("locomotive profiles are labelled illustrative, not a real class", () => {
    for (const { file } of lib.locomotives.values()) expect(file.label).toMatch(/not a real class/);
  });
});

describe("rail-condition table", () => {
  // Transcribed from PHYSICS.md §2 (values [M], consistent with Koffman 1948, Fisk et al. 2015 and
  // Olofsson et al. 2004 as named there): median μ at standstill, with sand, σ of ln μ.
  const PHYSICS_TABLE = {
    dry: [0.33, 0.36, 0.12],
    damp: [0.16, 0.24, 0.25],
    wet: [0.2, 0.26, 0.18],
    frost: [0.12, 0.2, 0.3],
    leaves: [0.06, 0.12, 0.4],
    greasy: [0.08, 0.15, 0.35],
  } as const;

  it("file values equal PHYSICS.md's table, and the library uses them", () => {
    const fileData = readJson("conditions/rail-conditions.json") as typeof builtinRailConditions;
    for (const rail of RAIL_CONDITIONS) {
      const [median, sanded, sigmaLn] = PHYSICS_TABLE[rail];
      expect(fileData.conditions[rail]).toMatchObject({ median, sanded, sigmaLn });
      expect(lib.adhesion[rail]).toEqual({ median, sanded, sigmaLn });
      expect(fileData.conditions[rail].source.length).toBeGreaterThan(0);
    }
  });

  it("every value names its source, and the dry median matches Curtius–Kniffler μ(0) = 0.3315 to two decimals", () => {
    for (const rail of RAIL_CONDITIONS) expect(builtinRailConditions.conditions[rail].source).toMatch(/\[M\]|\[S\]|\[P\]/);
    expect(builtinRailConditions.conditions.dry.median).toBeCloseTo(0.3315, 2);
  });
});
