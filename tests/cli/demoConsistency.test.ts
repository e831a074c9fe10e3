/**
 * One story for every built-in demo case (profiles/cases), whichever surface a user reads it on: `taut plan
 * --json`, the row `taut check --csv` gives for the same case, the load table's cell at the case's own rail
 * and sand (the command line's job and the app's worker), and the plan the app's worker returns — the same
 * verdict, margin (to the two decimals both print), binding limit and largest masses (whole tonnes, rounded
 * down), and a verdict that agrees with the masses: starts ⇔ the train's own trailing mass is at most the
 * largest startable, needs assistance ⇔ it is above the largest marginal (README "How Taut decides").
 *
 * The figures come from the surfaces' own code paths (the command line in-process, the worker's message
 * handler), never from stored output.
 */
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, describe, expect, it, vi } from "vitest";
import { margin as appMargin, showAtMost } from "../../src/app/format.js";
import { massesLine } from "../../src/app/screens/StartPlan/masses.js";
import { runJob, type MassOutcome } from "../../src/cli/batch/jobs.js";
import { renderPlan } from "../../src/cli/render/plan.js";
import type { PlanResult } from "../../src/core/planner/types.js";
import type { StartCase } from "../../src/core/train/types.js";
import { loadTableRowReport } from "../../src/profiles/assistanceReport.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { CHECK_CSV_HEADER, parseCsv } from "../../src/profiles/csv.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import type { PlanReport } from "../../src/profiles/report.js";
import { createPlannerHandler } from "../../src/worker/handler.js";
import { runLoadTable } from "../../src/worker/jobs.js";
import type { WorkerResponse } from "../../src/worker/protocol.js";
import { taut } from "../tools/cli.js";

const casesDir = fileURLToPath(new URL("../../profiles/cases/", import.meta.url));
const files = readdirSync(casesDir).filter((f) => f.endsWith(".json"));
const lib = builtinLibrary();

function resolved(json: unknown): StartCase {
  const r = parseStartCase(json, lib);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.value;
}

/** The plan the app's worker answers for a case, as the app asks for it once the first plan is shown (with the mass search). */
async function workerPlan(c: StartCase): Promise<PlanResult> {
  const posted: WorkerResponse[] = [];
  const ticks: Array<() => void> = [];
  const handle = createPlannerHandler((msg) => posted.push(msg), { schedule: (f) => ticks.push(f) });
  handle({ type: "plan", id: 1, startCase: structuredClone(c) });
  while (ticks.length > 0) ticks.shift()!();
  // A plan with its largest masses waits for the later jobs' code (the mass search) to load.
  await vi.waitFor(() => expect(posted.at(-1)?.type).not.toBe("progress"), { timeout: 60_000 });
  const last = posted.at(-1)!;
  if (last.type !== "result" || last.request !== "plan") throw new Error(`worker: ${JSON.stringify(last)}`);
  return last.result;
}

const dir = mkdtempSync(join(tmpdir(), "taut-demo-consistency-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** `taut check --csv` over every demo case at its own rail and sand, one row per case id. */
async function checkRows(): Promise<Map<string, Record<(typeof CHECK_CSV_HEADER)[number], string>>> {
  const lines = ["id,case,rail,sand"];
  for (const f of files) {
    const raw = JSON.parse(readFileSync(casesDir + f, "utf8")) as { id: string; conditions: { rail: string; sand: boolean } };
    lines.push(`${raw.id},${raw.id},${raw.conditions.rail},${raw.conditions.sand ? "yes" : "no"}`);
  }
  const path = join(dir, "demos.csv");
  writeFileSync(path, `${lines.join("\n")}\n`);
  const r = await taut("check", path, "--csv", "--jobs", "1", "--quiet");
  expect(r.code, r.stderr).toBe(0);
  const [head, ...rows] = parseCsv(r.stdout);
  expect(head!.fields).toEqual([...CHECK_CSV_HEADER]);
  return new Map(rows.map((x) => [x.fields[0]!, Object.fromEntries(CHECK_CSV_HEADER.map((k, i) => [k, x.fields[i] ?? ""])) as Record<(typeof CHECK_CSV_HEADER)[number], string>]));
}

describe("every demo case tells one story on every surface", () => {
  let rows: Awaited<ReturnType<typeof checkRows>> | null = null;
  const row = async (id: string) => (rows ??= await checkRows()).get(id)!;

  it("covers every case in profiles/cases", () => {
    expect(files.length).toBeGreaterThanOrEqual(4);
  });

  for (const f of files) {
    it(f, async () => {
      const raw = JSON.parse(readFileSync(casesDir + f, "utf8")) as { id: string };
      const c = resolved(raw);
      // The command line's plan (assistance left out: it does not change the plan's figures).
      const planRun = await taut("plan", casesDir + f, "--json", "--no-assistance");
      expect(planRun.code, planRun.stderr).toBe(0);
      const plan = JSON.parse(planRun.stdout) as PlanReport;
      const check = await row(raw.id);
      const app = await workerPlan(c);
      // The load table's cell at the case's own conditions: the command line's job and the app's worker.
      const tableCli = loadTableRowReport({ rail: c.conditions.rail, sand: c.conditions.sand, maxTrailingMassKg: (runJob({ kind: "mass", case: c, startsOnly: true, ofMakeUp: true }) as MassOutcome).maxStartableMassKg });
      const tableApp = runLoadTable(structuredClone(c), [{ rail: c.conditions.rail, sand: c.conditions.sand }])[0]!;

      // Verdict and binding limit.
      expect(check.verdict).toBe(plan.verdict);
      expect(app.verdict).toBe(plan.verdict);
      expect(check.binding).toBe(plan.binding);
      expect(app.binding).toBe(plan.binding);
      // Margin: to three decimals in both machine-readable forms, to two as the app and the table print it.
      expect(Number(check.margin)).toBe(plan.margin);
      expect(appMargin(app.margin)).toBe(`× ${plan.margin.toFixed(2)}`);
      // Largest masses in whole tonnes, rounded down.
      const starts = plan.maxStartableMass_t;
      expect(Number(check.maxStartableMass_t)).toBe(starts);
      expect(Number(check.largestMarginalMass_t)).toBe(plan.largestMarginalMass_t);
      expect(tableCli.maxTrailingMass_t).toBe(starts);
      expect(Math.floor(tableApp.maxTrailingMassKg / 1000)).toBe(starts);
      expect(Math.floor(app.maxStartableMassKg / 1000)).toBe(starts);
      expect(Math.floor(app.largestMarginalMassKg / 1000)).toBe(plan.largestMarginalMass_t);
      if (starts >= 1) expect(showAtMost("mass", app.maxStartableMassKg, "metric")).toBe(`${starts.toLocaleString("en-GB")} t`);
      // The train's own mass: the case file's figure on every surface.
      const train = (raw as { train?: { trailingMass_t?: number } }).train?.trailingMass_t ?? c.train.trailingMassKg / 1000;
      expect(plan.trailingMass_t).toBe(train);
      expect(Number(check.trailingMass_t)).toBe(Math.round(train));
      expect(app.trailingMassKg / 1000).toBe(train);
      // The readable plan and the app's verdict give the three masses side by side, with the same figures.
      expect(renderPlan(plan)).toContain(`this train ${train} t · `);
      expect(massesLine(app, "metric", false)).toContain(`This train ${train.toLocaleString("en-GB")} t · `);
      // The verdict agrees with the masses (in kilograms, and as printed).
      expect(plan.verdict === "starts").toBe(c.train.trailingMassKg <= app.maxStartableMassKg);
      expect(plan.verdict === "needs-assistance").toBe(c.train.trailingMassKg > app.largestMarginalMassKg);
      expect(plan.verdict === "starts").toBe(train <= starts);
      expect(plan.verdict === "needs-assistance").toBe(train > plan.largestMarginalMass_t!);
      // And starts ⇔ margin ≥ 1, as printed.
      expect(plan.verdict === "starts").toBe(plan.margin >= 1);
    }, 240_000);
  }
});
