/**
 * The planner worker's message protocol: a tagged union each way. The app validates the start case at
 * its boundary (src/profiles: field issues shown at the fields) and sends the resolved case in the core's
 * SI form, so the worker needs only the core (ARCHITECTURE.md: worker imports core and protocol) and the
 * schema code is not shipped twice. Errors come back as data, never as an exception across the thread.
 *
 * Requests (each with the case it works on):
 * - `plan`: the start plan of one case.
 * - `assistance`: the case's own verdict, then added locomotives that make it start, and when none does,
 *   the divided train (src/core/assistance.ts).
 * - `conditionMargins`: verdict, margin and limiting reason for every rail condition, without and with sand.
 * - `loadTable`: the largest startable trailing mass per rail condition and sanding (all twelve rows, or the
 *   cells asked for); each row is also sent as it is found.
 * - `check`: one departure as `taut check` answers it: verdict, reasons, margin and its limit, the largest
 *   startable and marginal masses and the cheapest assistance (or the divided train).
 */
import type { AssistanceOption, RejectedOption } from "../core/dispatch/assistance.js";
import type { DividedTrain } from "../core/dispatch/divideTrain.js";
import type { ConditionMargin } from "../core/dispatch/conditionMargins.js";
import type { LoadTableRow } from "../core/dispatch/loadTable.js";
import type { PlanOptions, PlanResult } from "../core/planner/types.js";
import { RAIL_CONDITIONS, type LocomotiveSpec, type RailCondition } from "../core/physics/types.js";
import type { LimitName, Reason, StartKind, Verdict } from "../core/planner/outcome.js";
import type { StartCase } from "../core/train/types.js";
import type { PlanWorkProblem } from "../core/planner/workCap.js";

/** A field problem, as the app shows it (same shape as src/profiles' FieldIssue). */
export interface WorkerIssue {
  path: string;
  message: string;
  /** The work cap's refusal as a code with its figures (the page writes it in words: i18n/renderReaders.ts). */
  reader?: PlanWorkProblem;
}

// ------------------------------------------------------------------ results (plain data, SI)

/** The figures of one planned start that the assistance and batch screens show. */
export interface PlanSummary {
  verdict: Verdict;
  reasons: Reason[];
  /** The binding limit's margin (allowance ÷ demand, the smallest); starts ⇔ margin ≥ 1. */
  margin: number;
  /** The limit the margin is of. */
  binding: LimitName;
  margins: PlanResult["margins"];
  startKind: StartKind;
  /** Largest coupler tension during the start, N. */
  peakCouplerForceN: number;
  /** Seconds from taking power to the target; null when not reached. */
  timeToTargetS: number | null;
}

/** An assistance option as the core returns it, without its case and full plan (they stay in the worker). */
export type AssistanceOptionData = Omit<AssistanceOption, "case" | "plan"> & {
  /** Couplings in the train with the option's units. */
  couplings: number;
};

/** The divided train: the largest first part the train's own locomotives start (without its case and plan). */
export type DivideData = Omit<DividedTrain, "plan" | "case" | "plannerRuns"> & {
  /** The first part's verified verdict; null when only a verdict run judged it. */
  verdict: Verdict | null;
  peakCouplerForceN: number | null;
  timeToTargetS: number | null;
};

/** The profile the assistance options add. */
export interface HelperData {
  id: string;
  label: string;
}

export interface AssistanceAnswer {
  /** The case as it stands (a verified plan, without the mass search). */
  base: PlanSummary;
  /** False when the case starts as it stands (nothing searched). */
  needed: boolean;
  helper: HelperData;
  /** How the units the options add mid-train or at the rear are driven (absent in older answers: remote). */
  control?: "remote" | "helper";
  /** Options that make the verdict `starts`, cheapest first (fewest units, then lowest peak pull). */
  options: AssistanceOptionData[];
  /** Options tried that did not make it start, and what ruled them out. */
  rejected: RejectedOption[];
  divide: DivideData | null;
  plannerRuns: number;
  /** False when the search's cap cut it short. */
  complete: boolean;
}

/** One departure, answered as `taut check` answers it (SI; the app formats and exports it). */
export interface CheckAnswer extends PlanSummary {
  /** Largest trailing mass that still starts with everything else unchanged, kg. */
  maxStartableMassKg: number;
  /** Largest trailing mass that is at least marginal, kg. */
  largestMarginalMassKg: number;
  helper: HelperData;
  /** The cheapest option that starts, or null (none needed, or none works). */
  assistance: AssistanceOptionData | null;
  /** When no option works: the divided train. */
  divide: DivideData | null;
  /** The assistance search was cut short by its cap. */
  searchCapped: boolean;
}

// ------------------------------------------------------------------ requests

/** Planner options that can cross a thread (no callbacks). */
export type PlanRequestOptions = Pick<PlanOptions, "skipMassSearch" | "skipVerification">;

export interface AssistanceRequestOptions {
  /** Profile to add (default: the lead unit's). */
  helper?: LocomotiveSpec;
  /** How units added mid-train or at the rear are driven: remote (default) or helper. */
  control?: "remote" | "helper";
  /** Most units to add, 1 or 2 (default 2). */
  maxUnits?: number;
  /** Most planner runs for the options, and for dividing the train (the core's defaults otherwise). */
  budget?: number;
  divideBudget?: number;
  /** Most options confirmed with a full, verified plan (default 3). */
  maxFullPlans?: number;
}

export interface ConditionMarginsRequestOptions {
  /** Kept for older callers: every row is the plan's own decision. */
  quick?: boolean;
}

export interface LoadTableCell {
  rail: RailCondition;
  sand: boolean;
}

export interface CheckRequestOptions {
  /** Profile the assistance options add (default: the lead unit's). */
  helper?: LocomotiveSpec;
}

/** Each request kind: what it carries besides the case, and what it answers. */
export interface RequestMap {
  plan: { options: PlanRequestOptions; result: PlanResult };
  assistance: { options: AssistanceRequestOptions; result: AssistanceAnswer };
  conditionMargins: { options: ConditionMarginsRequestOptions; result: ConditionMargin[] };
  loadTable: { options: { cells?: LoadTableCell[] }; result: LoadTableRow[] };
  check: { options: CheckRequestOptions; result: CheckAnswer };
}

export type RequestKind = keyof RequestMap;
export const REQUEST_KINDS: readonly RequestKind[] = ["plan", "assistance", "conditionMargins", "loadTable", "check"];

/** A request of one kind, already validated and resolved by the sender. */
export type RequestOf<K extends RequestKind> = { type: K; id: number; startCase: StartCase; options?: RequestMap[K]["options"] };

export type PlanRequest = RequestOf<"plan">;
export type AssistanceRequest = RequestOf<"assistance">;
export type ConditionMarginsRequest = RequestOf<"conditionMargins">;
export type LoadTableRequest = RequestOf<"loadTable">;
export type CheckRequest = RequestOf<"check">;
export type WorkRequest = PlanRequest | AssistanceRequest | ConditionMarginsRequest | LoadTableRequest | CheckRequest;

/** Drop a request that has not started yet (a running one is stopped by terminating the worker). */
export interface CancelRequest {
  type: "cancel";
  id: number;
}

export type WorkerRequest = WorkRequest | CancelRequest;

// ------------------------------------------------------------------ responses

/** Fraction 0..1 of the work done so far; 0 when the worker starts on the request. */
export interface ProgressMessage {
  type: "progress";
  id: number;
  fraction: number;
  /** A load-table row just found (a `loadTable` request sends each row as it comes). */
  row?: LoadTableRow;
}

/** The answer to a request of kind K (a plan's Float64Array series are transferred, not copied). */
export type ResultOf<K extends RequestKind> = { type: "result"; id: number; request: K; result: RequestMap[K]["result"]; elapsedMs: number };

export type ResultMessage = { [K in RequestKind]: ResultOf<K> }[RequestKind];

/** `invalid`: the case is malformed (issues name the fields). `internal`: the calculation failed. */
export interface ErrorMessage {
  type: "error";
  id: number;
  kind: "invalid" | "internal";
  issues: WorkerIssue[];
  message: string;
}

export type WorkerResponse = ProgressMessage | ResultMessage | ErrorMessage;

/** Every distinct ArrayBuffer inside a plan result, for the transfer list (a buffer may appear only once). */
export function planTransferables(r: PlanResult): ArrayBuffer[] {
  const arrays = [r.couplerPeaksN, r.couplerCompressionPeaksN, r.series.timeS, r.series.speedMps, r.series.notch, r.series.locoTravelM, r.series.maxTensionN];
  const seen = new Set<ArrayBuffer>();
  for (const a of arrays) if (a && a.buffer instanceof ArrayBuffer && a.buffer.byteLength > 0) seen.add(a.buffer);
  return [...seen];
}

/** Narrow an unknown message to a worker request (the worker trusts nothing it receives). */
export function isWorkerRequest(m: unknown): m is WorkerRequest {
  if (!m || typeof m !== "object") return false;
  const o = m as { type?: unknown; id?: unknown };
  return (o.type === "cancel" || (REQUEST_KINDS as readonly unknown[]).includes(o.type)) && typeof o.id === "number";
}

/** Narrow an unknown message to a worker response. */
export function isWorkerResponse(m: unknown): m is WorkerResponse {
  if (!m || typeof m !== "object") return false;
  const o = m as { type?: unknown; id?: unknown };
  return (o.type === "progress" || o.type === "result" || o.type === "error") && typeof o.id === "number";
}

const isNum = (x: unknown): x is number => typeof x === "number" && Number.isFinite(x);

/**
 * Structural check of a received case, so a malformed message (an old client, a bug) gets a field issue
 * rather than an exception deep in the physics. The full rules live in src/profiles, on the sending side.
 */
export function startCaseIssues(c: unknown): WorkerIssue[] {
  const out: WorkerIssue[] = [];
  if (!c || typeof c !== "object") return [{ path: "", message: "must be a start case object" }];
  const s = c as Partial<StartCase>;
  if (!Array.isArray(s.locomotives) || s.locomotives.length === 0) out.push({ path: "locomotives", message: "must list at least one locomotive group" });
  else
    s.locomotives.forEach((g, k) => {
      if (!g || !g.spec || !Array.isArray(g.spec.notchPower) || !isNum(g.spec.adhesiveMassKg)) out.push({ path: `locomotives[${k}].spec`, message: "must be a locomotive profile" });
      if (!g || !Number.isInteger(g.count) || g.count < 1) out.push({ path: `locomotives[${k}].count`, message: "must be a whole number of at least 1" });
    });
  const t = s.train;
  if (!t || typeof t !== "object") out.push({ path: "train", message: "is required" });
  else {
    if (!isNum(t.trailingMassKg) || t.trailingMassKg <= 0) out.push({ path: "train.trailingMassKg", message: "must be a number greater than 0" });
    if (!Number.isInteger(t.wagons) || t.wagons < 1) out.push({ path: "train.wagons", message: "must be a whole number of at least 1" });
    if (!isNum(t.lengthM) || t.lengthM <= 0) out.push({ path: "train.lengthM", message: "must be a number greater than 0" });
    if (!isNum(t.couplerLimitN) || t.couplerLimitN <= 0) out.push({ path: "train.couplerLimitN", message: "must be a number greater than 0" });
  }
  const l = s.location;
  if (!l || !l.track || !Array.isArray(l.track.segments) || l.track.segments.length === 0) out.push({ path: "location", message: "must have a track profile" });
  if (!s.conditions || !s.adhesion || !(s.conditions.rail in s.adhesion)) out.push({ path: "conditions.rail", message: "must name a rail condition of the adhesion table" });
  if (!s.target || (s.target.kind !== "speed" && s.target.kind !== "distance")) out.push({ path: "target", message: "must be a speed or a distance" });
  if (!s.settings || !isNum(s.settings.couplerSafetyFactor) || !isNum(s.settings.slipRiskThreshold)) out.push({ path: "settings", message: "must give the safety settings" });
  return out;
}

/** Structural check of a request's options (the parts that reach the physics). */
export function requestOptionIssues(req: WorkRequest): WorkerIssue[] {
  const out: WorkerIssue[] = [];
  const o = req.options as Record<string, unknown> | undefined;
  if (o === undefined) return out;
  if (!o || typeof o !== "object") return [{ path: "options", message: "must be an object" }];
  if (req.type === "assistance" || req.type === "check") {
    const h = o.helper as Partial<LocomotiveSpec> | undefined;
    if (h !== undefined && (!h || !Array.isArray(h.notchPower) || !isNum(h.adhesiveMassKg) || typeof h.id !== "string")) out.push({ path: "options.helper", message: "must be a locomotive profile" });
    if (o.control !== undefined && o.control !== "remote" && o.control !== "helper") out.push({ path: "options.control", message: "must be remote or helper" });
  }
  if (req.type === "assistance") {
    for (const k of ["maxUnits", "budget", "divideBudget", "maxFullPlans"] as const) {
      const v = o[k];
      if (v !== undefined && !(Number.isInteger(v) && (v as number) >= 1)) out.push({ path: `options.${k}`, message: "must be a whole number of at least 1" });
    }
  }
  if (req.type === "loadTable" && o.cells !== undefined) {
    const cells = o.cells;
    if (!Array.isArray(cells) || cells.length === 0) out.push({ path: "options.cells", message: "must list at least one rail condition and sanding" });
    else
      cells.forEach((cell: unknown, k) => {
        const x = cell as Partial<LoadTableCell> | null;
        if (!x || !(RAIL_CONDITIONS as readonly unknown[]).includes(x.rail) || typeof x.sand !== "boolean") out.push({ path: `options.cells[${k}]`, message: `must name a rail condition (${RAIL_CONDITIONS.join(", ")}) and sand true or false` });
      });
  }
  return out;
}
