/** `taut plan CASE.json [--json]` — the start plan for one case. */
import { planStart } from "../../core/planner/index.js";
import { builtinCaseJson, DEMO_CASE_ID } from "../../profiles/builtin.js";
import { parseStartCase } from "../../profiles/parse.js";
import { planReport as reportOf, type PlanReport } from "../../profiles/report.js";
import type { StartCase } from "../../core/types.js";
import { InputError } from "../errors.js";
import { library, readNotesFiles, readStartCase } from "../files.js";
import type { Command } from "../main.js";
import { renderPlan } from "../render/plan.js";

export const planCommand: Command = {
  name: "plan",
  summary: "start plan for one train: verdict, resistance, adhesion, steps",
  usage: "taut plan CASE.json [--notes FILE]... [--location NOTE-ID] [--json] | taut plan --demo [--json]",
  help: [
    "Computes whether the locomotives can start the train at the location, and how.",
    "",
    "Options:",
    "  --json              print the plan as JSON (INTERFACE.md shape) instead of a table",
    "  --demo              use the built-in illustrative demo case instead of a file",
    "  --notes FILE        location notes (a taut/location@1 note or a taut/notes-bundle@1 bundle)",
    "                      the case's \"location\" may name by id; may be given more than once",
    "  --location NOTE-ID  start at this location note instead of the case's own location",
  ].join("\n"),
  options: { json: { type: "boolean" }, demo: { type: "boolean" }, notes: { type: "string", multiple: true }, location: { type: "string" } },
  run({ values, positionals }, io) {
    const lib = library(readNotesFiles((values.notes as string[] | undefined) ?? []));
    const location = values.location as string | undefined;
    let c: StartCase;
    let meta: PlanReport["case"];
    if (values.demo) {
      const demo = builtinCaseJson.find((j) => (j as { id?: string }).id === DEMO_CASE_ID) as Record<string, unknown>;
      const raw = location !== undefined ? { ...demo, location } : demo;
      const r = parseStartCase(raw, lib);
      if (!r.ok && location !== undefined) throw new InputError(`the demo case cannot start at location "${location}"`, r.issues);
      if (!r.ok) throw new Error("built-in demo case does not resolve");
      c = r.value;
      meta = caseMeta(raw);
    } else {
      const path = positionals[0];
      if (!path) throw new InputError("a start-case file is needed (or --demo)\n  usage: taut plan CASE.json [--json]");
      if (positionals.length > 1) throw new InputError(`one start-case file at a time (got ${positionals.length})`);
      const read = readStartCase(path, lib, location !== undefined ? { location } : {});
      c = read.c;
      meta = caseMeta(read.raw);
    }
    const report = planReport(c, meta);
    io.out(values.json ? JSON.stringify(report, null, 2) : renderPlan(report));
    return 0;
  },
};

export function caseMeta(raw: Record<string, unknown>): PlanReport["case"] {
  const meta: PlanReport["case"] = {};
  if (typeof raw.id === "string") meta.id = raw.id;
  if (typeof raw.label === "string") meta.label = raw.label;
  if (raw.illustrative === true) meta.illustrative = true;
  return meta;
}

/** The plan report for a case: the planner's result with units in names. */
export function planReport(c: StartCase, meta: PlanReport["case"]): PlanReport {
  return reportOf(c, planStart(c), meta);
}
