/**
 * The main thread's side of the planner worker: a typed promise API. The worker starts on the first
 * request and stops after an idle time; an AbortSignal drops a queued request with a cancel message
 * and stops a running one by terminating the worker (requests queued behind it go to a fresh worker).
 * Outcomes are data: a plan, or the issues of a malformed case, or a failure; only an abort rejects.
 * The caller validates and resolves the case first (src/profiles), and sends the core's SI form.
 */
import type { PlanResult } from "../core/planner/types.js";
import type { StartCase } from "../core/types.js";
import { isWorkerResponse, type PlanRequest, type WorkerIssue, type WorkerRequest } from "./protocol.js";

/** The part of a Worker the client uses (a fake in tests). */
export interface WorkerLike {
  postMessage(msg: WorkerRequest): void;
  terminate(): void;
  onmessage: ((ev: { data: unknown }) => void) | null;
  onerror: ((ev: { message?: string; preventDefault?: () => void }) => void) | null;
}

export type PlanOutcome =
  | { ok: true; result: PlanResult; elapsedMs: number }
  | { ok: false; kind: "invalid" | "internal" | "crashed"; issues: WorkerIssue[]; message: string };

export interface PlanCallOptions {
  signal?: AbortSignal;
  /** Called with 0..1 as the planner works; 0 when the worker starts on this request. */
  onProgress?: (fraction: number) => void;
  /** Skip the largest-startable-mass search (batch and assistance screens). */
  skipMassSearch?: boolean;
  /** Skip the verifying re-run at pessimistic adhesion (a quick first answer; the full plan follows). */
  skipVerification?: boolean;
}

export interface PlannerClient {
  plan(startCase: StartCase, opts?: PlanCallOptions): Promise<PlanOutcome>;
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
  req: PlanRequest;
  started: boolean;
  resolve: (o: PlanOutcome) => void;
  reject: (e: unknown) => void;
  onProgress?: ((f: number) => void) | undefined;
  cleanup: () => void;
}

/** An AbortError as `fetch` throws it. */
export function abortError(): Error {
  const e = new Error("The plan was cancelled.");
  e.name = "AbortError";
  return e;
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

  function settle(id: number, outcome: PlanOutcome): void {
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
        p.onProgress?.(m.fraction);
      } else if (m.type === "result") {
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
      const message = ev.message || "The planner stopped unexpectedly.";
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
      // A running plan cannot hear a message until it finishes: stop the thread, resend the queue.
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

  return {
    plan(startCase, opts = {}) {
      const { signal } = opts;
      if (signal?.aborted) return Promise.reject(abortError());
      stopIdleTimer();
      const id = nextId++;
      const options: NonNullable<PlanRequest["options"]> = {
        ...(opts.skipMassSearch ? { skipMassSearch: true } : {}),
        ...(opts.skipVerification ? { skipVerification: true } : {}),
      };
      const req: PlanRequest = { type: "plan", id, startCase, ...(Object.keys(options).length > 0 ? { options } : {}) };
      return new Promise<PlanOutcome>((resolve, reject) => {
        const onAbort = () => abort(id);
        signal?.addEventListener("abort", onAbort, { once: true });
        pending.set(id, { req, started: false, resolve, reject, onProgress: opts.onProgress, cleanup: () => signal?.removeEventListener("abort", onAbort) });
        ensureWorker().postMessage(req);
      });
    },
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
