/**
 * `taut plan` judges the masses its mass search will try first on other threads while this one plans the
 * case: the largest startable and marginal masses are nearly always settled by one plan each, at the masses
 * `massProbesKg` gives, and those plans do not need the case's own verdict. Two worker threads start with
 * the process; when the search reaches a probe it takes the verdict from the worker (waiting for it, on a
 * shared word, if it is not in yet) instead of planning it again. The answer is the one the search would
 * give alone: the same verdict function, on the same mass.
 *
 * Only with the built command line (plain JavaScript): under the TypeScript loader a worker thread takes
 * longer to load than the plan it would save.
 */
import { availableParallelism } from "node:os";
import { Worker } from "node:worker_threads";
import { massProbesKg, withTrailingMass, type MassVerdictLookup } from "../../core/planner/index.js";
import type { StartCase } from "../../core/train/types.js";
import { VERDICT_ERROR, VERDICT_FAILS, VERDICT_HOLDS, VERDICT_PENDING, type Job } from "./jobs.js";

/** Longest to wait for a worker thread to pick its job up before planning the mass here instead, ms. */
const START_WAIT_MS = 3000;
/** Longest to wait for a verdict a worker has started on, ms (a plan takes seconds at most). */
const VERDICT_WAIT_MS = 600_000;

export interface Speculation {
  verdictAt: MassVerdictLookup;
  /** Stop the workers (a verdict the search did not need is dropped). */
  close(): Promise<void>;
}

interface Slot {
  need: "starts" | "goes";
  massKg: number;
  /** [0]: the verdict (jobs.ts codes); [1]: 1 once the worker has picked the job up. */
  shared: Int32Array;
  worker: Worker;
  abandoned: boolean;
}

const workerUrl = new URL("./worker.mjs", import.meta.url);
/** The worker is the built one (build/cli), not the TypeScript source run through the loader. */
const builtWorker = !workerUrl.pathname.includes("/src/");

/** Start judging the probes of `c` on two worker threads; null where that would not pay (one core, sources). */
export function speculateMassVerdicts(c: StartCase): Speculation | null {
  if (!builtWorker || availableParallelism() < 2) return null;
  // The workers first: each loads its modules while this thread finds the probes (a few hundred ms of
  // quasi-static searches), so neither waits for the other.
  const workers = [new Worker(workerUrl), new Worker(workerUrl)];
  let probes: ReturnType<typeof massProbesKg>;
  try {
    probes = massProbesKg(c);
  } catch (e) {
    for (const w of workers) void w.terminate();
    throw e;
  }
  const slots: Slot[] = (["starts", "goes"] as const).map((need, k) => {
    const massKg = need === "starts" ? probes.startsKg : probes.goesKg;
    const shared = new Int32Array(new SharedArrayBuffer(8));
    const worker = workers[k]!;
    const job: Job = { kind: "verdict", case: withTrailingMass(c, massKg), need, shared };
    // Posted at once: the worker takes it when it is up, while this thread is busy planning.
    worker.postMessage({ id: 1, job });
    // A worker that fails leaves its verdict pending; the search then plans that mass itself.
    worker.on("error", () => undefined);
    worker.on("message", () => undefined);
    worker.unref();
    return { need, massKg, shared, worker, abandoned: false };
  });
  const verdictAt: MassVerdictLookup = (need, massKg) => {
    const s = slots.find((x) => x.need === need && x.massKg === massKg && !x.abandoned);
    if (!s) return undefined;
    if (Atomics.load(s.shared, 1) === 0 && Atomics.wait(s.shared, 1, 0, START_WAIT_MS) === "timed-out") {
      s.abandoned = true;
      return undefined;
    }
    Atomics.wait(s.shared, 0, VERDICT_PENDING, VERDICT_WAIT_MS);
    const v = Atomics.load(s.shared, 0);
    if (v === VERDICT_HOLDS) return true;
    if (v === VERDICT_FAILS) return false;
    // VERDICT_ERROR or still pending: plan it here (an error will show itself there too).
    s.abandoned = v === VERDICT_ERROR || v === VERDICT_PENDING;
    return undefined;
  };
  return {
    verdictAt,
    close: async () => {
      await Promise.all(slots.map((s) => s.worker.terminate()));
    },
  };
}
