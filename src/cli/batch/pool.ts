/**
 * A small pool of worker threads (Node `worker_threads`) for batch jobs: as many workers as asked (by default
 * the available cores), each running one job at a time from a shared queue. With one worker, jobs run on the
 * calling thread instead (no thread start-up).
 */
import { availableParallelism } from "node:os";
import { Worker } from "node:worker_threads";
import { runJob, type Job, type JobOutcome } from "./jobs.js";

interface Pending {
  id: number;
  job: Job;
  resolve: (o: JobOutcome) => void;
  reject: (e: Error) => void;
}

interface Slot {
  worker: Worker;
  ready: boolean;
  busy: Pending | null;
}

/** Default pool size: the cores this process may use. */
export function defaultPoolSize(): number {
  return Math.max(1, availableParallelism());
}

export class JobPool {
  private queue: Pending[] = [];
  private slots: Slot[] = [];
  private nextId = 1;
  private closed = false;

  constructor(readonly size: number = defaultPoolSize()) {}

  /** Run a job; resolves with its outcome, rejects with the job's error. */
  run(job: Job): Promise<JobOutcome> {
    if (this.closed) return Promise.reject(new Error("the pool is closed"));
    return new Promise<JobOutcome>((resolve, reject) => {
      this.queue.push({ id: this.nextId++, job, resolve, reject });
      if (this.size <= 1) this.drainHere();
      else this.dispatch();
    });
  }

  /** Stop the workers (pending jobs are rejected). */
  async close(): Promise<void> {
    this.closed = true;
    for (const p of this.queue) p.reject(new Error("the pool was closed"));
    this.queue = [];
    await Promise.all(this.slots.map((s) => s.worker.terminate()));
    this.slots = [];
  }

  private running = false;

  /** One thread: run queued jobs here, yielding between jobs so output (progress) gets written. */
  private drainHere(): void {
    if (this.running) return;
    this.running = true;
    const next = () => {
      const p = this.queue.shift();
      if (!p) {
        this.running = false;
        return;
      }
      try {
        p.resolve(runJob(p.job));
      } catch (e) {
        p.reject(e instanceof Error ? e : new Error(String(e)));
      }
      setImmediate(next);
    };
    setImmediate(next);
  }

  private dispatch(): void {
    // Start workers as the queue needs them, up to the pool's size.
    const outstanding = this.queue.length + this.slots.filter((s) => s.busy).length;
    while (this.slots.length < this.size && this.slots.length < outstanding) this.slots.push(this.spawn());
    for (const slot of this.slots) {
      if (!slot.ready || slot.busy) continue;
      const p = this.queue.shift();
      if (!p) return;
      slot.busy = p;
      slot.worker.postMessage({ id: p.id, job: p.job });
    }
  }

  private spawn(): Slot {
    const worker = new Worker(new URL("./worker.mjs", import.meta.url));
    const slot: Slot = { worker, ready: false, busy: null };
    worker.on("message", (m: { ready?: true; id?: number; ok?: boolean; outcome?: JobOutcome; error?: string }) => {
      if (m.ready) {
        slot.ready = true;
        this.dispatch();
        return;
      }
      const p = slot.busy;
      slot.busy = null;
      if (p && p.id === m.id) {
        if (m.ok) p.resolve(m.outcome!);
        else p.reject(new Error(m.error ?? "job failed"));
      }
      this.dispatch();
    });
    worker.on("error", (e) => {
      const err = e instanceof Error ? e : new Error(String(e));
      const p = slot.busy;
      slot.busy = null;
      this.slots = this.slots.filter((s) => s !== slot);
      p?.reject(err);
      if (!slot.ready) {
        // A worker that cannot even start will not start next time either: fail what is queued.
        for (const q of this.queue) q.reject(new Error(`a worker thread could not start: ${err.message}`));
        this.queue = [];
        return;
      }
      // A worker that dies takes its job with it; the others carry on, and a new worker replaces it.
      if (!this.closed) this.dispatch();
    });
    return slot;
  }
}
