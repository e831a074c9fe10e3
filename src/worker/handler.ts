/**
 * The planner worker's logic, free of Worker globals so it runs in tests: requests are queued and run
 * one at a time on a later tick (a cancel that arrives first drops a queued request); each case gets a
 * structural check, then the planner.
 */
import { planStart } from "../core/planner/index.js";
import type { PlanOptions, PlanResult } from "../core/planner/types.js";
import type { StartCase } from "../core/types.js";
import { isWorkerRequest, planTransferables, startCaseIssues, type PlanRequest, type WorkerResponse } from "./protocol.js";

export type Post = (msg: WorkerResponse, transfer: ArrayBuffer[]) => void;

export interface HandlerDeps {
  plan?: (c: StartCase, opts: PlanOptions) => PlanResult;
  now?: () => number;
  /** Run `f` on a later tick (default: setTimeout 0). */
  schedule?: (f: () => void) => void;
  /** Least time between two progress messages of one request, ms. */
  progressIntervalMs?: number;
}

/** A message handler for the planner worker; `post` sends a response (with its transfer list). */
export function createPlannerHandler(post: Post, deps: HandlerDeps = {}): (msg: unknown) => void {
  const plan = deps.plan ?? planStart;
  const now = deps.now ?? (() => performance.now());
  const schedule = deps.schedule ?? ((f: () => void) => void setTimeout(f, 0));
  const interval = deps.progressIntervalMs ?? 50;
  const queue: PlanRequest[] = [];
  let scheduled = false;

  function run(req: PlanRequest): void {
    post({ type: "progress", id: req.id, fraction: 0 }, []);
    const issues = startCaseIssues(req.startCase);
    if (issues.length > 0) {
      post({ type: "error", id: req.id, kind: "invalid", issues, message: "The start case is malformed." }, []);
      return;
    }
    const t0 = now();
    let lastPost = t0;
    try {
      const result = plan(req.startCase, {
        ...(req.options?.skipMassSearch ? { skipMassSearch: true } : {}),
        ...(req.options?.skipVerification ? { skipVerification: true } : {}),
        onProgress: (fraction) => {
          const t = now();
          if (t - lastPost < interval || fraction >= 1) return;
          lastPost = t;
          post({ type: "progress", id: req.id, fraction }, []);
        },
      });
      post({ type: "result", id: req.id, result, elapsedMs: now() - t0 }, planTransferables(result));
    } catch (e) {
      post({ type: "error", id: req.id, kind: "internal", issues: [], message: e instanceof Error ? e.message : String(e) }, []);
    }
  }

  function drain(): void {
    scheduled = false;
    const req = queue.shift();
    if (req) run(req);
    if (queue.length > 0 && !scheduled) {
      scheduled = true;
      schedule(drain);
    }
  }

  return (msg: unknown) => {
    if (!isWorkerRequest(msg)) {
      post({ type: "error", id: -1, kind: "internal", issues: [], message: "The planner received a message it does not understand." }, []);
      return;
    }
    if (msg.type === "cancel") {
      const k = queue.findIndex((q) => q.id === msg.id);
      if (k >= 0) queue.splice(k, 1);
      return;
    }
    queue.push(msg);
    if (!scheduled) {
      scheduled = true;
      schedule(drain);
    }
  };
}
