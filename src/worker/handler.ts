/**
 * The planner worker's logic, free of Worker globals so it runs in tests: requests are queued and run
 * one at a time on a later tick (a cancel that arrives first drops a queued request); each case gets a
 * structural check, then the work its kind asks for (src/worker/jobs.ts, the planner for `plan`).
 *
 * Only the planner is in the worker's first script, without its largest masses' search: the page's first
 * plan (which skips that search) waits for nothing else. A plan with its masses and the other jobs
 * (assistance, margins per rail, load table, departures check: jobs.ts and the dispatch code behind it) are a
 * chunk of their own, imported when the first such request comes; that request, and any behind it in the
 * queue, wait for the import. Once loaded, every job runs synchronously.
 */
import { planStartWith } from "../core/planner/planBody.js";
import { planWorkProblem } from "../core/planner/workCap.js";
import type { PlanOptions, PlanResult } from "../core/planner/types.js";
import type { StartCase } from "../core/train/types.js";
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

/** The module of the jobs other than `plan` (jobs.ts). */
export type JobsModule = Pick<typeof import("./jobs.js"), "runAssistance" | "runCheck" | "runConditionMargins" | "runLoadTable" | "runPlan">;

/** The jobs of jobs.ts, given its module. */
type LaterJobs = { [K in Exclude<RequestKind, "plan">]: (m: JobsModule, ...args: Parameters<Jobs[K]>) => ReturnType<Jobs[K]> };

const laterJobs: LaterJobs = {
  assistance: (m, c, o, progress) => m.runAssistance(c, o ?? {}, progress),
  conditionMargins: (m, c, o, progress) => m.runConditionMargins(c, o ?? {}, progress),
  loadTable: (m, c, o, progress) => m.runLoadTable(c, o?.cells, (row, f) => progress(f, { row })),
  check: (m, c, o, progress) => m.runCheck(c, o ?? {}, progress),
};

/** A plan with its largest masses (jobs.ts): the search's code loads with the other jobs. */
const planWithMasses = (m: JobsModule, c: StartCase, o: RequestMap["plan"]["options"], progress: (fraction: number) => void): PlanResult =>
  m.runPlan(c, { ...(o?.skipVerification ? { skipVerification: true } : {}), onProgress: (f: number) => progress(f) });

export interface HandlerDeps {
  plan?: (c: StartCase, opts: PlanOptions) => PlanResult;
  /** Replace the work of some request kinds (tests). */
  jobs?: Partial<Jobs>;
  now?: () => number;
  /** Run `f` on a later tick (default: setTimeout 0). */
  schedule?: (f: () => void) => void;
  /** Least time between two progress messages of one request, ms. */
  progressIntervalMs?: number;
  /** Load jobs.ts (default: a dynamic import, on the first request other than `plan`). */
  loadJobs?: () => Promise<JobsModule>;
}

/** A message handler for the planner worker; `post` sends a response (with its transfer list). */
export function createPlannerHandler(post: Post, deps: HandlerDeps = {}): (msg: unknown) => void {
  // A plan that skips the largest masses runs at once; one with them waits for jobs.ts (the search's code).
  // The page shows no sensitivity table: the quick plan skips it with the masses.
  const plan = deps.plan ?? ((c: StartCase, o: PlanOptions) => planStartWith(c, { ...o, skipSensitivity: true }, null));
  const now = deps.now ?? (() => performance.now());
  const schedule = deps.schedule ?? ((f: () => void) => void setTimeout(f, 0));
  const interval = deps.progressIntervalMs ?? 50;
  const plans: Pick<Jobs, "plan"> = {
    plan: (c, o, progress) =>
      plan(c, {
        ...(o?.skipMassSearch ? { skipMassSearch: true } : {}),
        ...(o?.skipVerification ? { skipVerification: true } : {}),
        onProgress: (f) => progress(f),
      }),
  };
  const loadJobs = deps.loadJobs ?? (() => import("./jobs.js"));
  let jobsModule: JobsModule | null = null;
  let jobsLoading: Promise<JobsModule> | null = null;

  /** The job for a request: at once when its code is here, else once jobs.ts is loaded. */
  function jobOf<K extends RequestKind>(req: RequestOf<K>): Jobs[K] | Promise<Jobs[K]> {
    const kind = req.type as K;
    const here = kind === "plan" && (deps.plan || (req.options as RequestMap["plan"]["options"])?.skipMassSearch);
    const given = deps.jobs?.[kind] ?? (here ? plans.plan : undefined);
    if (given) return given as Jobs[K];
    const later = (kind === "plan" ? planWithMasses : laterJobs[kind as Exclude<RequestKind, "plan">]) as (m: JobsModule, ...a: unknown[]) => unknown;
    const withModule = (m: JobsModule) => ((c, o, progress) => later(m, c, o, progress)) as Jobs[K];
    if (jobsModule) return withModule(jobsModule);
    jobsLoading ??= loadJobs().then(
      (m) => (jobsModule = m),
      (e: unknown) => {
        // Tried again on the next request (a chunk that failed to load once, offline before it was saved).
        jobsLoading = null;
        throw e;
      },
    );
    return jobsLoading.then(withModule);
  }

  const queue: WorkRequest[] = [];
  let scheduled = false;
  /** A request is waiting for its job's code: the queue waits with it. */
  let waiting = false;

  /** Run one request; a promise when its job's code must load first. */
  function run<K extends RequestKind>(req: RequestOf<K>): Promise<void> | void {
    post({ type: "progress", id: req.id, fraction: 0 }, []);
    const issues = [...startCaseIssues(req.startCase), ...requestOptionIssues(req as WorkRequest)];
    // A well-formed case may still ask for more work than a plan may take (a wagon of a few kilograms):
    // refused with the reason, as the command line refuses it, rather than run for hours.
    const work = issues.length === 0 ? planWorkProblem(req.startCase) : undefined;
    // The worker carries no words: the message is the code's, the page writes it (i18n/renderReaders.ts).
    if (work) issues.push({ path: "train", message: work.code, reader: work });
    if (issues.length > 0) {
      post({ type: "error", id: req.id, kind: "invalid", issues, message: "The start case is malformed." }, []);
      return;
    }
    const job = jobOf(req);
    if (job instanceof Promise) {
      return job.then(
        (j) => runJob(req, j),
        (e: unknown) => internalError(req.id, e),
      );
    }
    runJob(req, job);
  }

  function internalError(id: number, e: unknown): void {
    post({ type: "error", id, kind: "internal", issues: [], message: e instanceof Error ? e.message : String(e) }, []);
  }

  function runJob<K extends RequestKind>(req: RequestOf<K>, job: Jobs[K]): void {
    const t0 = now();
    let lastPost = t0;
    try {
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
      internalError(req.id, e);
    }
  }

  function drain(): void {
    scheduled = false;
    const req = queue.shift();
    const pending = req ? run(req) : undefined;
    if (pending) {
      waiting = true;
      void pending.then(() => {
        waiting = false;
        next();
      });
      return;
    }
    next();
  }

  /** Run the next request on a later tick, unless one is due or a request waits for its code. */
  function next(): void {
    if (queue.length > 0 && !scheduled && !waiting) {
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
    next();
  };
}
