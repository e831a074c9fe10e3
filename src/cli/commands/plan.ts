/**
 * `taut plan CASE.json|- [--json]` — the start plan for one case, with assistance options when it does not
 * start; `-` reads the case from standard input, and --rail, --sand/--no-sand, --mass and --grade override
 * what changes between departures.
 */
import { searchAssistance } from "../../core/dispatch/assistance.js";
import { conditionMargins } from "../../core/dispatch/conditionMargins.js";
import { planStart, type MassVerdictLookup } from "../../core/planner/index.js";
import { speculateMassVerdicts } from "../batch/speculate.js";
import { withEvaluationMemo } from "../../core/planner/evaluationMemo.js";
import { builtinCaseJson, DEMO_CASE_ID } from "../../profiles/builtin.js";
import { parseStartCase } from "../../profiles/parse.js";
import { planReport as reportOf, type PlanReport } from "../../profiles/report.js";
import { assistanceReport, conditionMarginReport } from "../../profiles/assistanceReport.js";
import type { LocomotiveSpec } from "../../core/physics/types.js";
import type { StartCase } from "../../core/train/types.js";
import { errorWords, InputError, usageLine } from "../errors.js";
import { quoted } from "../../profiles/text.js";
import { library, readNotesFiles, readStartCase, wagonTypeOf } from "../files.js";
import type { Command } from "../command.js";
import { helperControl, helperSpec } from "../options.js";
import type { UnitControl } from "../../core/train/types.js";
import { applyOverrides, hasOverrides, OVERRIDE_HELP, OVERRIDE_OPTIONS, overridesFrom } from "../caseOverrides.js";
import { renderPlan } from "../render/plan.js";

/** Planner runs the assistance search may use inside `taut plan` for the options, and for dividing the train. */
export const PLAN_ASSISTANCE_BUDGET = 10;
export const PLAN_DIVIDE_BUDGET = 6;
/** Options `taut plan` confirms with a full, verified plan. */
export const PLAN_ASSISTANCE_FULL_PLANS = 2;

export const planCommand: Command = {
  name: "plan",
  summary: "start plan for one train: verdict, resistance, adhesion, steps, assistance",
  usage:
    "taut plan CASE.json|- [--rail R] [--sand|--no-sand] [--mass T] [--grade PERMILLE] [--notes FILE]... [--location NOTE-ID] [--helper ID] [--helper-control remote|helper] [--no-assistance] [--conditions] [--json] | taut plan --demo [...]",
  help: [
    "Computes whether the locomotives can start the train at the location, and how.",
    "When the verdict is not \"starts\", it also searches for assistance: one or two more units of the",
    "lead unit's profile (or --helper) at the head, at the rear or mid-train, each option checked by the",
    "planner's dynamics; options that start are listed cheapest first. When no option works it gives the",
    "largest first part of the train that starts (dividing the train). To keep `plan` to a few seconds the",
    `search is capped here at ${PLAN_ASSISTANCE_BUDGET} planner runs for the options (${PLAN_ASSISTANCE_FULL_PLANS} of them fully verified) and ${PLAN_DIVIDE_BUDGET}`,
    "for dividing; the output says when the cap cut the search short.",
    "",
    "CASE.json is a start-case file (taut/start-case@1); \"-\" reads it from standard input.",
    "",
    ...OVERRIDE_HELP,
    "",
    "Options:",
    "  --json              print the plan as JSON instead of a table: the same figures, each field named",
    "                      with its unit (trailingMass_t, peakCouplerForce_kN, ...), for scripts",
    "  --demo              use the built-in illustrative demo case instead of a file",
    "  --notes FILE        location notes (a taut/location@1 note or a taut/notes-bundle@2 bundle)",
    "                      the case's \"location\" may name by id; may be given more than once",
    "  --location NOTE-ID  start at this location note instead of the case's own location",
    "  --helper ID         locomotive profile the assistance options add (default: the lead unit's)",
    "  --helper-control C  how units added mid-train or at the rear are driven: remote (own notch from the",
    "                      head cab; default) or helper (own driver, coordinated by radio)",
    "  --no-assistance     do not search for assistance",
    "  --conditions        also give the verdict and margins for every rail condition, without and with",
    "                      sand (12 more plans: several seconds)",
  ].join("\n"),
  options: {
    json: { type: "boolean" },
    demo: { type: "boolean" },
    notes: { type: "string", multiple: true },
    location: { type: "string" },
    helper: { type: "string" },
    "helper-control": { type: "string" },
    "no-assistance": { type: "boolean" },
    conditions: { type: "boolean" },
    ...OVERRIDE_OPTIONS,
  },
  async run({ values, positionals }, io) {
    const overrides = overridesFrom(values);
    const lib = library(readNotesFiles((values.notes as string[] | undefined) ?? []));
    const location = values.location as string | undefined;
    const helper = helperSpec(lib, values.helper as string | undefined);
    const control = helperControl(values["helper-control"] as string | undefined);
    let c: StartCase;
    let meta: PlanReport["case"];
    if (values.demo) {
      const demo = builtinCaseJson.find((j) => (j as { id?: string }).id === DEMO_CASE_ID) as Record<string, unknown>;
      const raw = applyOverrides(location !== undefined ? { ...demo, location } : demo, overrides, (id) => lib.locations.get(id), wagonTypeOf(lib)) as Record<string, unknown>;
      const r = parseStartCase(raw, lib);
      if (!r.ok && location !== undefined) throw new InputError(errorWords()("demoAtLocation", { location: quoted(location) }), r.issues);
      if (!r.ok && hasOverrides(overrides)) throw new InputError(errorWords()("demoOverrides"), r.issues);
      if (!r.ok) throw new Error("built-in demo case does not resolve");
      c = r.value;
      meta = caseMeta(raw);
    } else {
      const path = positionals[0];
      if (!path) throw new InputError(`${errorWords()("planCaseNeeded")}\n  ${usageLine("taut plan CASE.json|- [--json]")}`);
      if (positionals.length > 1) throw new InputError(errorWords()("oneCase", { count: String(positionals.length) }));
      let text: string | undefined;
      if (path === "-") {
        if (!io.stdin) throw new InputError(errorWords()("noStdin"));
        text = io.stdin();
      }
      const read = readStartCase(path, lib, { ...(location !== undefined ? { location } : {}), case: overrides }, text);
      c = read.c;
      meta = caseMeta(read.raw);
    }
    if (hasOverrides(overrides)) meta.overrides = { ...overrides };
    // The mass search's first plans judged on other threads meanwhile (batch/speculate.ts): the same answer, sooner.
    const speculation = speculateMassVerdicts(c);
    let report: PlanReport;
    try {
      // The printout shows neither the verifying re-run nor the sensitivity table (the JSON has both): not computed for it.
      const printed = !values.json;
      report = planReport(c, meta, { assistance: !values["no-assistance"], printed, ...(helper ? { helper } : {}), ...(control ? { control } : {}), ...(speculation ? { massVerdictAt: speculation.verdictAt } : {}) });
    } finally {
      await speculation?.close();
    }
    if (values.conditions) report.byCondition = conditionMargins(c).map(conditionMarginReport);
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

/** The plan report for a case: the planner's result with units in names, and assistance when it does not start. */
export interface PlanReportOptions {
  assistance?: boolean;
  helper?: LocomotiveSpec;
  /** How units the assistance options add mid-train or at the rear are driven (default remote). */
  control?: UnitControl;
  /** Verdicts of the mass search found on other threads (batch/speculate.ts). */
  massVerdictAt?: MassVerdictLookup;
  /**
   * For the printout only: skip what it does not show — the verifying re-run on the median rail and the
   * sensitivity table (the report then has none; every printed figure is the same).
   */
  printed?: boolean;
}

export function planReport(c: StartCase, meta: PlanReport["case"], opts: PlanReportOptions = {}): PlanReport {
  // The plan, its mass search and the assistance search share the plans they have in common (evaluationMemo.ts).
  return withEvaluationMemo(() => reportWithAssistance(c, meta, opts));
}

function reportWithAssistance(c: StartCase, meta: PlanReport["case"], opts: PlanReportOptions): PlanReport {
  const p = planStart(c, { ...(opts.massVerdictAt ? { massVerdictAt: opts.massVerdictAt } : {}), ...(opts.printed ? { skipVerification: true, skipSensitivity: true } : {}) });
  const rep = reportOf(c, p, meta);
  if (opts.assistance !== false && p.verdict !== "starts") {
    const a = searchAssistance(c, {
      baseVerdict: p.verdict,
      budget: PLAN_ASSISTANCE_BUDGET,
      divideBudget: PLAN_DIVIDE_BUDGET,
      maxFullPlans: PLAN_ASSISTANCE_FULL_PLANS,
      // The plan's mass search has settled whether a lightly loaded train starts (dividing asks it first).
      ...(Number.isFinite(p.maxStartableMassKg) ? { lightestStarts: p.maxStartableMassKg > 0 } : {}),
      ...(opts.helper ? { spec: opts.helper } : {}),
      ...(opts.control ? { control: opts.control } : {}),
    });
    const ar = assistanceReport(a, PLAN_ASSISTANCE_BUDGET + PLAN_DIVIDE_BUDGET);
    rep.assistance = ar.assistance;
    rep.divide = ar.divide;
    rep.assistanceSearch = ar.search;
  }
  return rep;
}
