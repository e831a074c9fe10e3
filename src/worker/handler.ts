/**
 * The planner worker's logic, free of Worker globals so it runs in tests: requests are queued and run
 * one at a time on a later tick (a cancel that arrives first drops a queued request); each case gets a
 * structural check, then the work its kind asks for (src/worker/jobs.ts, the planner for `plan`).
 */
import { planStart } from "../core/planner/index.js";
import { planWorkProblem } from "../core/planner/workCap.js";
import type { PlanOptions, PlanResult } from "../core/planner/types.js";
import type { StartCase } from "../core/train/types.js";
import { runAssistance, runCheck, runConditionMargins, runLoadTable } from "./jobs.js";
import {
  isWorkerRequest,
  planTransferables,
  requestOptionIssues,
  startCaseIssues,
  type ProgressMessage,
  type RequestKind,
  type RequestMap,
  type RequestOf,
  type WorkRequest,
  type WorkerResponse,
} from "./protocol.js";

export type Post = (msg: WorkerResponse, transfer: ArrayBuffer[]) => void;

/** The work of each request kind: its result from the case and options, reporting progress (and load-table rows). */
export type Jobs = {
  [K in RequestKind]: (c: StartCase, options: RequestMap[K]["options"], progress: (fraction: number, extra?: Pick<ProgressMessage, "row">) => void) => RequestMap[K]["result"];
};

export interface HandlerDeps {
  plan?: (c: StartCase, opts: PlanOptions) => PlanResult;
  /** Replace the work of some request kinds (tests). */
  jobs?: Partial<Jobs>;
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
  const jobs: Jobs = {
    plan: (c, o, progress) =>
      plan(c, {
        ...(o?.skipMassSearch ? { skipMassSearch: true } : {}),
        ...(o?.skipVerification ? { skipVerification: true } : {}),
        onProgress: (f) => progress(f),
      }),
    assistance: (c, o, progress) => runAssistance(c, o ?? {}, progress),
    conditionMargins: (c, o, progress) => runConditionMargins(c, o ?? {}, progress),
    loadTable: (c, o, progress) => runLoadTable(c, o?.cells, (row, f) => progress(f, { row })),
    check: (c, o, progress) => runCheck(c, o ?? {}, progress),
    ...deps.jobs,
  };
  const queue: WorkRequest[] = [];
  let scheduled = false;

  function run<K extends RequestKind>(req: RequestOf<K>): void {
    post({ type: "progress", id: req.id, fraction: 0 }, []);
    const issues = [...startCaseIssues(req.startCase), ...requestOptionIssues(req as WorkRequest)];
    // A well-formed case may still ask for more work than a plan may take (a wagon of a few kilograms):
    // refused with the reason, as the command line refuses it, rather than run for hours.
    const work = issues.length === 0 ? planWorkProblem(req.startCase) : undefined;
    if (work) issues.push({ path: "train", message: work });
    if (issues.length > 0) {
      post({ type: "error", id: req.id, kind: "invalid", issues, message: "The start case is malformed." }, []);
      return;
    }
    const t0 = now();
    let lastPost = t0;
    try {
      const job = jobs[req.type] as Jobs[K];
      const result = job(req.startCase, (req.options ?? {}) as RequestMap[K]["options"], (fraction, extra) => {
        // A row of the load table always goes out; plain progress at most every `interval` ms, never 1.
        if (extra?.row) {
          lastPost = now();
          post({ type: "progress", id: req.id, fraction, row: extra.row }, []);
          return;
        }
        const t = now();
        if (t - lastPost < interval || fraction >= 1) return;
        lastPost = t;
        post({ type: "progress", id: req.id, fraction }, []);
      });
      const transfer = req.type === "plan" ? planTransferables(result as PlanResult) : [];
      post({ type: "result", id: req.id, request: req.type, result, elapsedMs: now() - t0 } as WorkerResponse, transfer);
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
