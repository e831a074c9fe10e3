/** `taut plan CASE.json [--json]` — the start plan for one case. */
import { largestStartableMassKg } from "../../core/startableMass.js";
import { staticCheck } from "../../core/staticCheck.js";
import { builtinCaseJson, DEMO_CASE_ID } from "../../profiles/builtin.js";
import { parseStartCase } from "../../profiles/parse.js";
import { staticReport, type PlanReport } from "../../profiles/report.js";
import type { StartCase } from "../../core/types.js";
import { InputError } from "../errors.js";
import { library, readStartCase } from "../files.js";
import type { Command } from "../main.js";
import { renderPlan } from "../render/plan.js";

export const planCommand: Command = {
  name: "plan",
  summary: "start plan for one train: verdict, resistance, adhesion, steps",
  usage: "taut plan CASE.json [--json] | taut plan --demo [--json]",
  help: [
    "Computes whether the locomotives can start the train at the location, and how.",
    "",
    "Options:",
    "  --json   print the plan as JSON (INTERFACE.md shape) instead of a table",
    "  --demo   use the built-in illustrative demo case instead of a file",
  ].join("\n"),
  options: { json: { type: "boolean" }, demo: { type: "boolean" } },
  run({ values, positionals }, io) {
    const lib = library();
    let c: StartCase;
    let meta: PlanReport["case"];
    if (values.demo) {
      const raw = builtinCaseJson.find((j) => (j as { id?: string }).id === DEMO_CASE_ID) as Record<string, unknown>;
      const r = parseStartCase(raw, lib);
      if (!r.ok) throw new Error("built-in demo case does not resolve");
      c = r.value;
      meta = caseMeta(raw);
    } else {
      const path = positionals[0];
      if (!path) throw new InputError("a start-case file is needed (or --demo)\n  usage: taut plan CASE.json [--json]");
      if (positionals.length > 1) throw new InputError(`one start-case file at a time (got ${positionals.length})`);
      const read = readStartCase(path, lib);
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

/** The plan report for a case. */
export function planReport(c: StartCase, meta: PlanReport["case"]): PlanReport {
  const s = staticCheck(c);
  const maxKg = largestStartableMassKg(c, (x) => staticCheck(x).verdict === "starts");
  return staticReport(c, s, maxKg, meta);
}
