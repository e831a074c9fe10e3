/**
 * A small pool of planner workers for batch work (Departures, load tables): up to `size` clients, each
 * given one request at a time from a shared queue, so a long request never holds others back while a
 * worker is free. The same typed calls as one client; an AbortSignal takes a waiting request out of the
 * queue, or stops a running one (its client terminates that worker and the next request gets a fresh one).
 * Workers start as the queue needs them and stop when idle (the clients' idle timeout).
 */
import { abortError, createBrowserPlannerClient, type CallOptions, type Outcome, type PlannerCalls, type PlannerClient } from "./client.js";

/** Most workers a pool starts (the planner is CPU-bound; more threads than cores only share them). */
export const MAX_POOL_SIZE = 4;

export interface PlannerPool extends PlannerCalls {
  readonly size: number;
  /** Requests waiting for a free worker. */
  readonly waiting: number;
  /** Requests running now. */
  readonly running: number;
  /** Abort everything and stop the workers. */
  dispose(): void;
}

export interface PlannerPoolOptions {
  size: number;
  createClient: () => PlannerClient;
}

interface Task {
  start: (client: PlannerClient) => Promise<Outcome<unknown>>;
  signal: AbortSignal | undefined;
  resolve: (o: Outcome<unknown>) => void;
  reject: (e: unknown) => void;
  cleanup: () => void;
}

interface Slot {
  client: PlannerClient;
  busy: boolean;
}

/** The pool size for this device: its logical processors, at least 1 and at most MAX_POOL_SIZE (2 when unknown). */
export function defaultPoolSize(hardwareConcurrency: number | undefined = typeof navigator !== "undefined" ? navigator.hardwareConcurrency : undefined): number {
  const n = Number.isFinite(hardwareConcurrency) && (hardwareConcurrency as number) >= 1 ? Math.floor(hardwareConcurrency as number) : 2;
  return Math.max(1, Math.min(MAX_POOL_SIZE, n));
}

export function createPlannerPool(options: PlannerPoolOptions): PlannerPool {
  const size = Math.max(1, Math.floor(options.size));
  const slots: Slot[] = [];
  const queue: Task[] = [];
  let disposed = false;

  function freeSlot(): Slot | undefined {
    const idle = slots.find((s) => !s.busy);
    if (idle) return idle;
    if (slots.length >= size) return undefined;
    const s: Slot = { client: options.createClient(), busy: false };
    slots.push(s);
    return s;
  }

  function pump(): void {
    while (queue.length > 0) {
      const slot = freeSlot();
      if (!slot) return;
      const task = queue.shift()!;
      task.cleanup();
      slot.busy = true;
      const done = () => {
        slot.busy = false;
        pump();
      };
      task.start(slot.client).then(
        (o) => {
          done();
          task.resolve(o);
        },
        (e: unknown) => {
          done();
          task.reject(e);
        },
      );
    }
  }

  function enqueue<T>(start: (client: PlannerClient) => Promise<Outcome<T>>, opts: CallOptions | undefined): Promise<Outcome<T>> {
    const signal = opts?.signal;
    if (disposed) return Promise.reject(abortError());
    if (signal?.aborted) return Promise.reject(abortError());
    return new Promise<Outcome<T>>((resolve, reject) => {
      const task: Task = { start: start as Task["start"], signal, resolve: resolve as Task["resolve"], reject, cleanup: () => undefined };
      if (signal) {
        // While waiting, an abort takes the task out of the queue; once running, the client hears the signal.
        const onAbort = () => {
          const k = queue.indexOf(task);
          if (k >= 0) {
            queue.splice(k, 1);
            reject(abortError());
          }
        };
        signal.addEventListener("abort", onAbort, { once: true });
        task.cleanup = () => signal.removeEventListener("abort", onAbort);
      }
      queue.push(task);
      pump();
    });
  }

  return {
    size,
    plan: (c, o) => enqueue((cl) => cl.plan(c, o), o),
    assistance: (c, o) => enqueue((cl) => cl.assistance(c, o), o),
    conditionMargins: (c, o) => enqueue((cl) => cl.conditionMargins(c, o), o),
    loadTable: (c, o) => enqueue((cl) => cl.loadTable(c, o), o),
    check: (c, o) => enqueue((cl) => cl.check(c, o), o),
    get waiting() {
      return queue.length;
    },
    get running() {
      return slots.filter((s) => s.busy).length;
    },
    dispose() {
      disposed = true;
      for (const t of queue.splice(0)) {
        t.cleanup();
        t.reject(abortError());
      }
      for (const s of slots) s.client.dispose();
      slots.length = 0;
    },
  };
}

/** The browser's pool: module workers built from planner.worker.ts, as many as `defaultPoolSize()`. */
export function createBrowserPlannerPool(size: number = defaultPoolSize()): PlannerPool {
  return createPlannerPool({ size, createClient: () => createBrowserPlannerClient(30_000) });
}
