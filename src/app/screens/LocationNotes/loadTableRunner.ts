/**
 * The note's load table, behind one asynchronous function. Each row is a mass search over the
 * dynamics-verified planner (seconds in all), so it runs in a Web Worker of its own; a newer request or
 * an abort stops a running one by terminating the worker. Where no Worker exists (tests), the same job
 * runs on the calling thread. When the app's planner worker gains a load-table request, only this file
 * changes.
 */
import type { ReferenceTrainFile } from "../../../profiles/schemas.js";
import type { LoadTableOutcome, LoadTableRequest, LoadTableResponse, NoteGeometry } from "./loadTableJob.js";

export type { LoadTableOutcome, NoteGeometry } from "./loadTableJob.js";

interface Running {
  id: number;
  resolve: (o: LoadTableOutcome) => void;
  reject: (e: unknown) => void;
}

let worker: Worker | null = null;
let running: Running | null = null;
let nextId = 1;
const cache = new Map<string, LoadTableOutcome>();

function abortError(): Error {
  const e = new Error("The load table was cancelled.");
  e.name = "AbortError";
  return e;
}

function stop(): void {
  worker?.terminate();
  worker = null;
  running?.reject(abortError());
  running = null;
}

function startWorker(): Worker {
  const w = new Worker(new URL("./loadTable.worker.ts", import.meta.url), { type: "module", name: "taut-load-table" });
  w.onmessage = (ev: MessageEvent<LoadTableResponse>) => {
    const r = running;
    if (!r || ev.data.id !== r.id) return;
    running = null;
    if ("outcome" in ev.data) r.resolve(ev.data.outcome);
    else r.reject(new Error(ev.data.error));
  };
  w.onerror = (ev) => {
    ev.preventDefault();
    const r = running;
    running = null;
    worker?.terminate();
    worker = null;
    r?.reject(new Error(ev.message || "The load-table worker stopped unexpectedly."));
  };
  return w;
}

/** Largest startable trailing mass per rail condition, without and with sand, for a note and its reference train. */
export async function computeNoteLoadTable(note: NoteGeometry, ref: ReferenceTrainFile, signal?: AbortSignal): Promise<LoadTableOutcome> {
  const key = JSON.stringify([note.segments, note.frontAt_m, note.clearAhead_m, note.speedLimit_kmh ?? null, ref]);
  const hit = cache.get(key);
  if (hit) return hit;
  if (signal?.aborted) throw abortError();
  let outcome: LoadTableOutcome;
  if (typeof Worker === "undefined") {
    // Let the caller paint first; then do the work here.
    await new Promise<void>((resolve) => setTimeout(resolve, 0));
    if (signal?.aborted) throw abortError();
    const { runLoadTableJob } = await import("./loadTableJob.js");
    outcome = runLoadTableJob(note, ref);
  } else {
    // Only the newest table matters: a job still running is stopped.
    if (running) stop();
    worker ??= startWorker();
    const w = worker;
    const id = nextId++;
    outcome = await new Promise<LoadTableOutcome>((resolve, reject) => {
      running = { id, resolve, reject };
      signal?.addEventListener("abort", () => running?.id === id && stop(), { once: true });
      const req: LoadTableRequest = { id, note, ref };
      w.postMessage(req);
    });
  }
  if (outcome.ok) cache.set(key, outcome);
  return outcome;
}
