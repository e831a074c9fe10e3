/**
 * The work behind each worker request other than `plan`, over the core alone: the assistance search with
 * the case's own verdict, margins per rail condition, load-table rows, and one departure checked as
 * `taut check` checks it (the same planner calls with the same caps, so the app and the command line give
 * the same answers). Results are plain SI data; progress goes to a callback. Free of Worker globals.
 */
import { searchAssistance, type AssistanceOption, type AssistanceResult } from "../core/dispatch/assistance.js";
import { conditionMargins, type ConditionMargin } from "../core/dispatch/conditionMargins.js";
import type { DividedTrain } from "../core/dispatch/divideTrain.js";
import { loadTableCells, loadTableRow, type LoadTableRow } from "../core/dispatch/loadTable.js";
import { planStart, startableMasses } from "../core/planner/index.js";
import { withEvaluationMemo } from "../core/planner/evaluationMemo.js";
import type { PlanOptions, PlanResult } from "../core/planner/types.js";
import type { LocomotiveSpec } from "../core/physics/types.js";
import type { StartCase } from "../core/train/types.js";
import type {
  AssistanceAnswer,
  AssistanceOptionData,
  AssistanceRequestOptions,
  CheckAnswer,
  CheckRequestOptions,
  ConditionMarginsRequestOptions,
  DivideData,
  HelperData,
  LoadTableCell,
  PlanSummary,
} from "./protocol.js";

/** Planner runs a departure's assistance search may use for the options, and for dividing (as `taut check`). */
export const CHECK_ASSISTANCE_BUDGET = 12;
export const CHECK_DIVIDE_BUDGET = 6;

export type Progress = (fraction: number) => void;

/** The figures of a plan the assistance and batch screens show. */
export function planSummary(p: PlanResult): PlanSummary {
  return {
    verdict: p.verdict,
    reasons: p.reasons,
    margin: p.margin,
    binding: p.binding,
    margins: { ...p.margins },
    startKind: p.startKind,
    peakCouplerForceN: p.peakCouplerForceN,
    timeToTargetS: p.timeToTargetS,
  };
}

export function optionData(o: AssistanceOption): AssistanceOptionData {
  return {
    added: o.added.map((a) => ({ count: a.count, position: typeof a.position === "string" ? a.position : { afterWagon: a.position.afterWagon } })),
    units: o.units,
    verdict: o.verdict,
    reasons: o.reasons,
    margin: o.margin,
    peakCouplerForceN: o.peakCouplerForceN,
    peakCompressionN: o.peakCompressionN,
    peakCompressionAt: o.peakCompressionAt,
    couplings: o.plan?.couplerCompressionPeaksN.length ?? 0,
    headCompressionN: o.headCompressionN,
    timeToTargetS: o.timeToTargetS,
    note: o.note,
    effortSplit: o.effortSplit.map((g) => ({ ...g })),
  };
}

/** The divided train as data; null when not even one wagon starts. */
export function divideData(d: DividedTrain | null): DivideData | null {
  if (!d || d.wagons < 1) return null;
  return {
    wagons: d.wagons,
    trailingMassKg: d.trailingMassKg,
    lengthM: d.lengthM,
    remainingWagons: d.remainingWagons,
    remainingMassKg: d.remainingMassKg,
    trips: d.trips,
    maxParts: d.maxParts,
    verdict: d.plan ? d.plan.verdict : null,
    peakCouplerForceN: d.plan ? d.plan.peakCouplerForceN : null,
    timeToTargetS: d.plan ? d.plan.timeToTargetS : null,
  };
}

function helperOf(a: AssistanceResult | null, c: StartCase, helper?: LocomotiveSpec): HelperData {
  const spec = a?.spec ?? helper ?? c.locomotives.find((g) => g.position === "head")?.spec ?? c.locomotives[0]!.spec;
  return { id: spec.id, label: spec.label };
}

/** Scale a sub-task's progress into [from, to] of the whole. */
const part =
  (on: Progress | undefined, from: number, to: number): Progress =>
  (f) =>
    on?.(from + (to - from) * Math.min(1, Math.max(0, f)));

/**
 * The assistance check of one case: its own verified plan (no mass search), then, unless it starts, the
 * search for added units and, when none works, the divided train. The core's defaults unless told.
 */
/** A plan with its largest masses (the search's code is in this chunk, not in the worker's first script). */
export function runPlan(c: StartCase, opts: PlanOptions): PlanResult {
  return planStart(c, opts);
}

export function runAssistance(c: StartCase, o: AssistanceRequestOptions = {}, onProgress?: Progress): AssistanceAnswer {
  // Plans shared between the searches' judgements (evaluationMemo.ts); the answer is plain data, copied out.
  return withEvaluationMemo(() => assistanceOf(c, o, onProgress));
}

function assistanceOf(c: StartCase, o: AssistanceRequestOptions, onProgress?: Progress): AssistanceAnswer {
  const base = planStart(c, { skipMassSearch: true, onProgress: part(onProgress, 0, 0.25) });
  const a = searchAssistance(c, {
    baseVerdict: base.verdict,
    onProgress: part(onProgress, 0.25, 1),
    ...(o.helper ? { spec: o.helper } : {}),
    ...(o.control ? { control: o.control } : {}),
    ...(o.maxUnits !== undefined ? { maxUnits: o.maxUnits } : {}),
    ...(o.budget !== undefined ? { budget: o.budget } : {}),
    ...(o.divideBudget !== undefined ? { divideBudget: o.divideBudget } : {}),
    ...(o.maxFullPlans !== undefined ? { maxFullPlans: o.maxFullPlans } : {}),
  });
  return {
    base: planSummary(base),
    needed: a.needed,
    helper: helperOf(a, c, o.helper),
    control: a.control === "helper" ? "helper" : "remote",
    options: a.options.map(optionData),
    rejected: a.rejected.map((x) => ({ ...x, added: x.added.map((u) => ({ ...u })) })),
    divide: divideData(a.divide),
    plannerRuns: a.plannerRuns,
    complete: a.complete,
  };
}

/** Margins per rail condition (twelve plans), progress after each. */
export function runConditionMargins(c: StartCase, o: ConditionMarginsRequestOptions = {}, onProgress?: Progress): ConditionMargin[] {
  return conditionMargins(c, { ...(o.quick ? { quick: true } : {}), ...(onProgress ? { onProgress } : {}) });
}

/** Load-table rows for the cells asked for (default all twelve, in the core's order); each row reported as found. */
export function runLoadTable(c: StartCase, cells: readonly LoadTableCell[] = loadTableCells(), onRow?: (row: LoadTableRow, fraction: number) => void): LoadTableRow[] {
  return cells.map(({ rail, sand }, k) => {
    const row = loadTableRow(c, rail, sand);
    onRow?.(row, (k + 1) / cells.length);
    return row;
  });
}

/**
 * One departure, as `taut check` checks it: the verified plan (no mass search); when it does not start, the
 * cheapest assistance option (searched with the batch caps, one option fully planned) or, when it needs
 * assistance, the divided train; and the largest startable and marginal masses.
 */
export function runCheck(c: StartCase, o: CheckRequestOptions = {}, onProgress?: Progress): CheckAnswer {
  return withEvaluationMemo(() => checkOf(c, o, onProgress));
}

function checkOf(c: StartCase, o: CheckRequestOptions, onProgress?: Progress): CheckAnswer {
  // Nothing the check shows comes from the verifying re-run or the sensitivity table: neither is made (as in
  // `taut check`), for the departure, its assistance option or its divided train.
  const p = planStart(c, { skipMassSearch: true, skipVerification: true, skipSensitivity: true, onProgress: part(onProgress, 0, 0.3) });
  // The same search as the plan's, bracketed by this departure's own verdict; before the assistance, whose
  // dividing asks whether a lightly loaded train starts — the mass search has settled that (as in `taut check`).
  const masses = startableMasses(c, { own: p.verdict });
  onProgress?.(0.6);
  let a: AssistanceResult | null = null;
  if (p.verdict !== "starts") {
    a = searchAssistance(c, {
      baseVerdict: p.verdict,
      budget: CHECK_ASSISTANCE_BUDGET,
      divideBudget: CHECK_DIVIDE_BUDGET,
      maxFullPlans: 1,
      reportedOnly: true,
      // Only the cheapest option is reported, not the rejections: a candidate that cannot rank first is not judged to the end.
      pruneLosers: true,
      lightestStarts: masses.startsKg > 0,
      onProgress: part(onProgress, 0.6, 1),
      ...(o.helper ? { spec: o.helper } : {}),
    });
  }
  const cheapest = a?.options[0];
  return {
    ...planSummary(p),
    maxStartableMassKg: masses.startsKg,
    largestMarginalMassKg: masses.marginalKg,
    helper: helperOf(a, c, o.helper),
    assistance: cheapest ? optionData(cheapest) : null,
    divide: divideData(a?.divide ?? null),
    searchCapped: a !== null && !a.complete,
  };
}
