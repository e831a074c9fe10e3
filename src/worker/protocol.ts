/**
 * The planner worker's message protocol: a tagged union each way. The app validates the start case at
 * its boundary (src/profiles: field issues shown at the fields) and sends the resolved case in the core's
 * SI form, so the worker needs only the core (ARCHITECTURE.md: worker imports core and protocol) and the
 * schema code is not shipped twice. Errors come back as data, never as an exception across the thread.
 */
import type { PlanOptions, PlanResult } from "../core/planner/types.js";
import type { StartCase } from "../core/types.js";

/** A field problem, as the app shows it (same shape as src/profiles' FieldIssue). */
export interface WorkerIssue {
  path: string;
  message: string;
}

/** Plan one start case (already validated and resolved by the sender). */
export interface PlanRequest {
  type: "plan";
  id: number;
  startCase: StartCase;
  /** Planner options that can cross a thread (no callbacks). */
  options?: Pick<PlanOptions, "skipMassSearch" | "skipVerification">;
}

/** Drop a request that has not started yet (a running plan is stopped by terminating the worker). */
export interface CancelRequest {
  type: "cancel";
  id: number;
}

export type WorkerRequest = PlanRequest | CancelRequest;

/** Fraction 0..1 of the planner's budget used so far; 0 when the worker starts on the request. */
export interface ProgressMessage {
  type: "progress";
  id: number;
  fraction: number;
}

/** The plan, with its Float64Array series transferred (not copied). */
export interface ResultMessage {
  type: "result";
  id: number;
  result: PlanResult;
  /** Time the planner took inside the worker, ms. */
  elapsedMs: number;
}

/** `invalid`: the case is malformed (issues name the fields). `internal`: the planner failed. */
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
  const arrays = [r.couplerPeaksN, r.series.timeS, r.series.speedMps, r.series.notch, r.series.locoTravelM, r.series.maxTensionN];
  const seen = new Set<ArrayBuffer>();
  for (const a of arrays) if (a.buffer instanceof ArrayBuffer && a.buffer.byteLength > 0) seen.add(a.buffer);
  return [...seen];
}

/** Narrow an unknown message to a worker request (the worker trusts nothing it receives). */
export function isWorkerRequest(m: unknown): m is WorkerRequest {
  if (!m || typeof m !== "object") return false;
  const o = m as { type?: unknown; id?: unknown };
  return (o.type === "plan" || o.type === "cancel") && typeof o.id === "number";
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
