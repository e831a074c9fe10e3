/**
 * The worker's requests beyond `plan`: assistance, margins per rail condition, load-table rows and one
 * departure's check. Each answer is compared with the core called directly (and the check with the command
 * line's batch job), so the app and `taut check` agree; malformed options come back as field issues.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { runJob, type CheckOutcome, type MassOutcome } from "../../src/cli/batch/jobs.js";
import { checkCsv } from "../../src/cli/render/check.js";
import type { DepartureRow as CliRow } from "../../src/cli/batch/checkDepartures.js";
import { searchAssistance } from "../../src/core/dispatch/assistance.js";
import { conditionMargins } from "../../src/core/dispatch/conditionMargins.js";
import { loadTableRow } from "../../src/core/dispatch/loadTable.js";
import { maxStartableMassKg, planStart } from "../../src/core/planner/index.js";
import type { StartCase } from "../../src/core/train/types.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { departuresCsv, type DepartureRow } from "../../src/app/screens/Departures/rows.js";
import { createPlannerHandler } from "../../src/worker/handler.js";
import { CHECK_ASSISTANCE_BUDGET, CHECK_DIVIDE_BUDGET } from "../../src/worker/jobs.js";
import { CHECK_ASSISTANCE_BUDGET as CLI_ASSIST, CHECK_DIVIDE_BUDGET as CLI_DIVIDE } from "../../src/cli/batch/jobs.js";
import type { ProgressMessage, ResultOf, WorkerResponse, WorkRequest } from "../../src/worker/protocol.js";

const lib = builtinLibrary();
const day = JSON.parse(readFileSync(new URL("../../profiles/departures/demo-day.json", import.meta.url), "utf8")) as Array<{ id: string }>;
/** A departure of the demo day as the app sends it: validated, resolved, structured-cloned. */
function departure(id: string): StartCase {
  const r = parseStartCase(day.find((d) => d.id === id), lib);
  if (!r.ok) throw new Error(`demo departure ${id} invalid`);
  return structuredClone(r.value);
}

/**
 * Run one request through the handler and collect what it posts, up to its answer (a result or an
 * error). The jobs beyond `plan` load on first use (handler.ts), so the answer may come a few turns later.
 */
function ask(req: WorkRequest): Promise<{ posted: WorkerResponse[]; last: WorkerResponse }> {
  return new Promise((resolve) => {
    const posted: WorkerResponse[] = [];
    const handle = createPlannerHandler(
      (m) => {
        posted.push(structuredClone(m));
        if (m.type === "result" || m.type === "error") resolve({ posted, last: posted.at(-1)! });
      },
      { schedule: (f) => f() },
    );
    handle(structuredClone(req));
  });
}

function resultOf<K extends WorkRequest["type"]>(kind: K, last: WorkerResponse): ResultOf<K>["result"] {
  if (last.type !== "result") throw new Error(`expected a result, got ${JSON.stringify(last).slice(0, 300)}`);
  expect(last.request).toBe(kind);
  return (last as ResultOf<K>).result;
}

describe("assistance request", () => {
  it("answers a train that needs help with the core's options, cheapest first, and the case's own verdict", async () => {
    // agg-1415: wet rail, no sand, 1,400 t behind one unit — the demo day's "needs assistance" that a rear unit fixes.
    const c = departure("agg-1415");
    const { posted, last } = await ask({ type: "assistance", id: 1, startCase: c });
    const a = resultOf("assistance", last);
    const base = planStart(departure("agg-1415"), { skipMassSearch: true });
    const direct = searchAssistance(departure("agg-1415"), { baseVerdict: base.verdict });
    expect(a.base.verdict).toBe(base.verdict);
    expect(a.base.margin).toBeCloseTo(base.margin, 12);
    expect(a.needed).toBe(true);
    expect(a.options.length).toBeGreaterThan(0);
    expect(a.options.map((o) => o.added)).toEqual(direct.options.map((o) => o.added));
    expect(a.options.map((o) => o.peakCouplerForceN)).toEqual(direct.options.map((o) => o.peakCouplerForceN));
    for (const o of a.options) {
      expect(o.verdict).toBe("starts");
      expect(o.couplings).toBeGreaterThan(0);
      expect(o.note.code).toMatch(/^(all-at-head|pushing)$/);
    }
    // Cheapest first: fewest units, then the lowest peak pull.
    for (let k = 1; k < a.options.length; k++) {
      const [p, q] = [a.options[k - 1]!, a.options[k]!];
      expect(p.units < q.units || (p.units === q.units && p.peakCouplerForceN <= q.peakCouplerForceN)).toBe(true);
    }
    expect(a.helper.id).toBe(c.locomotives[0]!.spec.id);
    expect(a.divide).toBeNull();
    // Progress climbs from 0 and never reaches 1 before the result.
    const fractions = posted.filter((m): m is ProgressMessage => m.type === "progress").map((m) => m.fraction);
    expect(fractions[0]).toBe(0);
    for (let k = 1; k < fractions.length; k++) expect(fractions[k]!).toBeGreaterThanOrEqual(fractions[k - 1]!);
    expect(Math.max(...fractions)).toBeLessThan(1);
  });

  it("says a train that starts as it stands needs nothing, and searches nothing", async () => {
    const { last } = await ask({ type: "assistance", id: 2, startCase: departure("agg-0930") });
    const a = resultOf("assistance", last);
    expect(a.base.verdict).toBe("starts");
    expect(a.needed).toBe(false);
    expect(a.options).toEqual([]);
    expect(a.rejected).toEqual([]);
  });

  it("divides the train when no added unit makes it start, in no more parts than the case allows", async () => {
    // agg-1845: leaves on the rail; no option with two more units starts. Into three parts (the default) it
    // does not start either, so nothing is offered; allowed ten parts, a short first part does.
    const leaves = departure("agg-1845");
    const three = resultOf("assistance", (await ask({ type: "assistance", id: 3, startCase: leaves, options: { budget: 8, divideBudget: 6 } })).last);
    expect(three.options).toEqual([]);
    expect(three.rejected.length).toBeGreaterThan(0);
    expect(three.divide).toBeNull();
    const ten = { ...leaves, settings: { ...leaves.settings, maxDividedParts: 10 } };
    const a = resultOf("assistance", (await ask({ type: "assistance", id: 3, startCase: ten, options: { budget: 8, divideBudget: 6 } })).last);
    expect(a.divide).not.toBeNull();
    const d = a.divide!;
    expect(d.wagons).toBeGreaterThanOrEqual(Math.ceil(leaves.train.wagons / 10));
    expect(d.trips).toBeLessThanOrEqual(10);
    expect(d.wagons + d.remainingWagons).toBe(leaves.train.wagons);
    expect(d.trailingMassKg + d.remainingMassKg).toBeCloseTo(leaves.train.trailingMassKg, 6);
  });
});

describe("conditionMargins request", () => {
  it("gives twelve rows, every rail condition without then with sand, as the core gives them", async () => {
    const c = departure("agg-0610");
    const { last } = await ask({ type: "conditionMargins", id: 4, startCase: c, options: { quick: true } });
    const rows = resultOf("conditionMargins", last);
    const direct = conditionMargins(departure("agg-0610"), { quick: true });
    expect(rows).toHaveLength(12);
    expect(rows.map((r) => `${r.rail}/${r.sand}`)).toEqual(["dry", "damp", "wet", "frost", "leaves", "greasy"].flatMap((r) => [`${r}/false`, `${r}/true`]));
    expect(rows).toEqual(direct);
    // Sand never hurts on the same rail here, and dry beats leaves (a property, not a copy of the code).
    expect(rows.find((r) => r.rail === "dry" && !r.sand)!.margin).toBeGreaterThan(rows.find((r) => r.rail === "leaves" && !r.sand)!.margin);
  });
});

describe("loadTable request", () => {
  it("works out the cells asked for, sends each row as it is found, and matches the core's row", async () => {
    const c = departure("goods-1710");
    const cells = [
      { rail: "wet" as const, sand: true },
      { rail: "greasy" as const, sand: false },
    ];
    const { posted, last } = await ask({ type: "loadTable", id: 5, startCase: c, options: { cells } });
    const rows = resultOf("loadTable", last);
    expect(rows.map((r) => [r.rail, r.sand])).toEqual([
      ["wet", true],
      ["greasy", false],
    ]);
    const streamed = posted.filter((m): m is ProgressMessage => m.type === "progress" && m.row !== undefined);
    expect(streamed.map((m) => m.row)).toEqual(rows);
    expect(streamed.map((m) => m.fraction)).toEqual([0.5, 1]);
    expect(rows[0]).toEqual(loadTableRow(departure("goods-1710"), "wet", true));
    // Wet rail with sand carries more than greasy rail without.
    expect(rows[0]!.maxTrailingMassKg).toBeGreaterThan(rows[1]!.maxTrailingMassKg);
  });

  it("refuses cells that name no rail condition, as a field issue", async () => {
    const { last } = await ask({ type: "loadTable", id: 6, startCase: departure("goods-1710"), options: { cells: [{ rail: "slush" as never, sand: true }] } });
    expect(last).toMatchObject({ type: "error", kind: "invalid", issues: [{ path: "options.cells[0]" }] });
  });
});

describe("check request", () => {
  it("uses the same caps as taut check", () => {
    expect([CHECK_ASSISTANCE_BUDGET, CHECK_DIVIDE_BUDGET]).toEqual([CLI_ASSIST, CLI_DIVIDE]);
  });

  it("answers a departure as the command line's batch job does, down to the exported CSV line", async () => {
    for (const id of ["agg-1415", "agg-0930"]) {
      const { last } = await ask({ type: "check", id: 7, startCase: departure(id) });
      const a = resultOf("check", last);
      const cli = runJob({ kind: "check", case: departure(id) }) as CheckOutcome;
      const mass = runJob({ kind: "mass", case: departure(id) }) as MassOutcome;
      expect(a.verdict).toBe(cli.verdict);
      expect(a.reasons).toEqual(cli.reasons);
      expect(a.maxStartableMassKg).toBe(mass.maxStartableMassKg);
      expect(a.maxStartableMassKg).toBe(maxStartableMassKg(departure(id)));
      expect(a.assistance === null).toBe(cli.assistance === null);
      expect(a.divide === null).toBe(cli.divide === null);
      // The CSV the app exports is the CSV `taut check --csv` prints for the same row.
      const c = departure(id);
      const appRow: DepartureRow = { id, where: "[0]", index: 0, order: 0, rail: c.conditions.rail, sand: c.conditions.sand, trailingMassKg: c.train.trailingMassKg, answer: a };
      const cliRow: CliRow = {
        id,
        index: 0,
        rail: c.conditions.rail,
        sand: c.conditions.sand,
        trailingMass_t: Math.round(c.train.trailingMassKg / 1000),
        verdict: cli.verdict,
        reasons: cli.reasons,
        margin: cli.margin,
        binding: cli.binding,
        maxStartableMass_t: Math.floor(mass.maxStartableMassKg / 1000),
        largestMarginalMass_t: Math.floor(mass.largestMarginalMassKg / 1000),
        peakCouplerForce_kN: cli.peakCouplerForce_kN,
        timeToTarget_s: cli.timeToTarget_s,
        assistance: cli.assistance,
        divide: cli.divide,
      };
      expect(departuresCsv([appRow])).toBe(checkCsv([cliRow]));
    }
  });

  it("refuses a helper that is not a locomotive profile", async () => {
    const { last } = await ask({ type: "check", id: 8, startCase: departure("agg-0930"), options: { helper: { id: "x" } as never } });
    expect(last).toMatchObject({ type: "error", kind: "invalid", issues: [{ path: "options.helper" }] });
  });
});

describe("request validation", () => {
  it("refuses a budget that is not a whole number of at least 1", async () => {
    const { last } = await ask({ type: "assistance", id: 9, startCase: departure("agg-0930"), options: { budget: 0, maxUnits: 1.5 } });
    expect(last).toMatchObject({ type: "error", kind: "invalid" });
    if (last.type === "error") expect(last.issues.map((i) => i.path)).toEqual(["options.maxUnits", "options.budget"]);
  });

  it("answers a malformed case of any kind with the case's field issues", async () => {
    for (const type of ["assistance", "conditionMargins", "loadTable", "check"] as const) {
      const { last } = await ask({ type, id: 10, startCase: { train: {} } as unknown as StartCase });
      expect(last).toMatchObject({ type: "error", kind: "invalid" });
      if (last.type === "error") expect(last.issues.map((i) => i.path)).toEqual(expect.arrayContaining(["locomotives", "train.trailingMassKg"]));
    }
  });
});
