/**
 * The main thread's side of the planner worker: a typed promise API. The worker starts on the first
 * request and stops after an idle time; an AbortSignal drops a queued request with a cancel message
 * and stops a running one by terminating the worker (requests queued behind it go to a fresh worker).
 * Outcomes are data: a result, or the issues of a malformed case, or a failure; only an abort rejects.
 * The caller validates and resolves the case first (src/profiles), and sends the core's SI form.
 */
import type { ConditionMargin } from "../core/dispatch/conditionMargins.js";
import type { LoadTableRow } from "../core/dispatch/loadTable.js";
import type { PlanResult } from "../core/planner/types.js";
import type { StartCase } from "../core/train/types.js";
import {
  isWorkerResponse,
  type AssistanceAnswer,
  type AssistanceRequestOptions,
  type CheckAnswer,
  type CheckRequestOptions,
  type LoadTableCell,
  type RequestKind,
  type RequestMap,
  type WorkRequest,
  type WorkerIssue,
  type WorkerRequest,
} from "./protocol.js";

/** A crashed worker's message when the browser gave none (the app says it in the language on screen). */
export const PLANNER_STOPPED = "The planner stopped unexpectedly.";

/** The part of a Worker the client uses (a fake in tests). */
export interface WorkerLike {
  postMessage(msg: WorkerRequest): void;
  terminate(): void;
  onmessage: ((ev: { data: unknown }) => void) | null;
  onerror: ((ev: { message?: string; preventDefault?: () => void }) => void) | null;
}

/** What a request comes back with: its result, or the issues of a malformed case, or a failure. */
export type Outcome<T> =
  | { ok: true; result: T; elapsedMs: number }
  | { ok: false; kind: "invalid" | "internal" | "crashed"; issues: WorkerIssue[]; message: string };

export type PlanOutcome = Outcome<PlanResult>;
export type AssistanceOutcome = Outcome<AssistanceAnswer>;
export type ConditionMarginsOutcome = Outcome<ConditionMargin[]>;
export type LoadTableOutcome = Outcome<LoadTableRow[]>;
export type CheckOutcome = Outcome<CheckAnswer>;

/** What every call takes: a signal to cancel it, and a progress callback. */
export interface CallOptions {
  signal?: AbortSignal;
  /** Called with 0..1 as the work goes on; 0 when the worker starts on this request, 1 with the result. */
  onProgress?: (fraction: number) => void;
}

export interface PlanCallOptions extends CallOptions {
  /** Skip the largest-startable-mass search (batch and assistance screens). */
  skipMassSearch?: boolean;
  /** Skip the verifying re-run at pessimistic adhesion (a quick first answer; the full plan follows). */
  skipVerification?: boolean;
}

export interface AssistanceCallOptions extends CallOptions, AssistanceRequestOptions {}

export interface ConditionMarginsCallOptions extends CallOptions {
  /** Verdict runs only (faster, no verifying re-run). */
  quick?: boolean;
}

export interface LoadTableCallOptions extends CallOptions {
  /** Only these rows (default all twelve). */
  cells?: LoadTableCell[];
  /** Each row as soon as it is found. */
  onRow?: (row: LoadTableRow) => void;
}

export interface CheckCallOptions extends CallOptions, CheckRequestOptions {}

/** The typed calls of the planner worker (a client, or a pool of them). */
export interface PlannerCalls {
  plan(startCase: StartCase, opts?: PlanCallOptions): Promise<PlanOutcome>;
  /** The case's own verdict, the added units that make it start, and the divided train when none does. */
  assistance(startCase: StartCase, opts?: AssistanceCallOptions): Promise<AssistanceOutcome>;
  /** Verdict and margin for every rail condition, without and with sand (twelve plans). */
  conditionMargins(startCase: StartCase, opts?: ConditionMarginsCallOptions): Promise<ConditionMarginsOutcome>;
  /** The largest startable trailing mass per rail condition and sanding (the core's load table). */
  loadTable(startCase: StartCase, opts?: LoadTableCallOptions): Promise<LoadTableOutcome>;
  /** One departure as `taut check` answers it. */
  check(startCase: StartCase, opts?: CheckCallOptions): Promise<CheckOutcome>;
}

export interface PlannerClient extends PlannerCalls {
  /** Start the worker now (its script loads while the page renders); it stops again when idle. */
  warm(): void;
  /** Whether a worker is alive now. */
  readonly alive: boolean;
  /** Requests not yet answered. */
  readonly pending: number;
  /** Stop the worker and abort everything pending. */
  dispose(): void;
}

export interface PlannerClientOptions {
  createWorker: () => WorkerLike;
  /** Stop the worker after this long with nothing to do, ms (default 60 s). */
  idleTimeoutMs?: number;
  setTimer?: (f: () => void, ms: number) => unknown;
  clearTimer?: (handle: unknown) => void;
}

interface Pending {
  req: WorkRequest;
  started: boolean;
  resolve: (o: Outcome<unknown>) => void;
  reject: (e: unknown) => void;
  onProgress?: ((f: number) => void) | undefined;
  onRow?: ((row: LoadTableRow) => void) | undefined;
  cleanup: () => void;
}

/** An AbortError as `fetch` throws it. */
export function abortError(): Error {
  const e = new Error("The request was cancelled.");
  e.name = "AbortError";
  return e;
}

/** Options of a request without its undefined or false fields (false is every option's default; neither goes on the wire). */
function defined<T extends object>(o: T): Partial<T> {
  const out: Partial<T> = {};
  for (const [k, v] of Object.entries(o)) if (v !== undefined && v !== false) (out as Record<string, unknown>)[k] = v;
  return out;
}

export function createPlannerClient(options: PlannerClientOptions): PlannerClient {
  const idleMs = options.idleTimeoutMs ?? 60_000;
  const setTimer = options.setTimer ?? ((f: () => void, ms: number) => setTimeout(f, ms));
  const clearTimer = options.clearTimer ?? ((h: unknown) => clearTimeout(h as ReturnType<typeof setTimeout>));
  let worker: WorkerLike | null = null;
  let idleTimer: unknown = null;
  let nextId = 1;
  const pending = new Map<number, Pending>();

  function stopIdleTimer(): void {
    if (idleTimer !== null) clearTimer(idleTimer);
    idleTimer = null;
  }

  function armIdleTimer(): void {
    stopIdleTimer();
    if (pending.size > 0 || !worker) return;
    idleTimer = setTimer(() => {
      idleTimer = null;
      if (pending.size === 0) stopWorker();
    }, idleMs);
  }

  function stopWorker(): void {
    if (!worker) return;
    worker.onmessage = null;
    worker.onerror = null;
    worker.terminate();
    worker = null;
  }

  function settle(id: number, outcome: Outcome<unknown>): void {
    const p = pending.get(id);
    if (!p) return;
    pending.delete(id);
    p.cleanup();
    p.resolve(outcome);
    armIdleTimer();
  }

  function ensureWorker(): WorkerLike {
    if (worker) return worker;
    const w = options.createWorker();
    w.onmessage = (ev) => {
      const m = ev.data;
      if (!isWorkerResponse(m)) return;
      const p = pending.get(m.id);
      if (!p) return;
      if (m.type === "progress") {
        p.started = true;
        if (m.row) p.onRow?.(m.row);
        p.onProgress?.(m.fraction);
      } else if (m.type === "result") {
        // An answer of another kind than asked for is a bug on one side: report it, do not hand it on.
        if (m.request !== p.req.type) {
          settle(m.id, { ok: false, kind: "internal", issues: [], message: `The planner answered a ${p.req.type} request with a ${String(m.request)} result.` });
          return;
        }
        p.onProgress?.(1);
        settle(m.id, { ok: true, result: m.result, elapsedMs: m.elapsedMs });
      } else {
        settle(m.id, { ok: false, kind: m.kind, issues: m.issues, message: m.message });
      }
    };
    w.onerror = (ev) => {
      ev.preventDefault?.();
      // A crashed worker answers nothing more: report every pending request and start afresh next time.
      stopWorker();
      const message = ev.message || PLANNER_STOPPED;
      for (const id of [...pending.keys()]) settle(id, { ok: false, kind: "crashed", issues: [], message });
    };
    worker = w;
    return w;
  }

  function abort(id: number): void {
    const p = pending.get(id);
    if (!p) return;
    pending.delete(id);
    p.cleanup();
    p.reject(abortError());
    if (!worker) return;
    if (p.started) {
      // A running request cannot hear a message until it finishes: stop the thread, resend the queue.
      stopWorker();
      const rest = [...pending.values()];
      if (rest.length > 0) {
        const w = ensureWorker();
        for (const q of rest) {
          q.started = false;
          w.postMessage(q.req);
        }
      }
    } else {
      worker.postMessage({ type: "cancel", id });
    }
    armIdleTimer();
  }

  function request<K extends RequestKind>(
    type: K,
    startCase: StartCase,
    requestOptions: RequestMap[K]["options"],
    call: CallOptions & { onRow?: (row: LoadTableRow) => void },
  ): Promise<Outcome<RequestMap[K]["result"]>> {
    const { signal } = call;
    if (signal?.aborted) return Promise.reject(abortError());
    stopIdleTimer();
    const id = nextId++;
    const o = defined(requestOptions as object);
    const req = { type, id, startCase, ...(Object.keys(o).length > 0 ? { options: o } : {}) } as WorkRequest;
    return new Promise<Outcome<RequestMap[K]["result"]>>((resolve, reject) => {
      const onAbort = () => abort(id);
      signal?.addEventListener("abort", onAbort, { once: true });
      pending.set(id, {
        req,
        started: false,
        resolve: resolve as (o: Outcome<unknown>) => void,
        reject,
        onProgress: call.onProgress,
        onRow: call.onRow,
        cleanup: () => signal?.removeEventListener("abort", onAbort),
      });
      ensureWorker().postMessage(req);
    });
  }

  return {
    plan: (c, opts = {}) => request("plan", c, { skipMassSearch: opts.skipMassSearch, skipVerification: opts.skipVerification } as RequestMap["plan"]["options"], opts),
    assistance: (c, opts = {}) =>
      request("assistance", c, { helper: opts.helper, control: opts.control, maxUnits: opts.maxUnits, budget: opts.budget, divideBudget: opts.divideBudget, maxFullPlans: opts.maxFullPlans } as AssistanceRequestOptions, opts),
    conditionMargins: (c, opts = {}) => request("conditionMargins", c, { quick: opts.quick } as RequestMap["conditionMargins"]["options"], opts),
    loadTable: (c, opts = {}) => request("loadTable", c, { cells: opts.cells } as RequestMap["loadTable"]["options"], opts),
    check: (c, opts = {}) => request("check", c, { helper: opts.helper } as CheckRequestOptions, opts),
    warm() {
      if (worker) return;
      ensureWorker();
      armIdleTimer();
    },
    get alive() {
      return worker !== null;
    },
    get pending() {
      return pending.size;
    },
    dispose() {
      stopIdleTimer();
      for (const id of [...pending.keys()]) {
        const p = pending.get(id)!;
        pending.delete(id);
        p.cleanup();
        p.reject(abortError());
      }
      stopWorker();
    },
  };
}

/** The client for the browser: a module worker built by Vite from planner.worker.ts. */
export function createBrowserPlannerClient(idleTimeoutMs?: number): PlannerClient {
  return createPlannerClient({
    createWorker: () => new Worker(new URL("./planner.worker.ts", import.meta.url), { type: "module", name: "taut-planner" }) as unknown as WorkerLike,
    ...(idleTimeoutMs !== undefined ? { idleTimeoutMs } : {}),
  });
}
