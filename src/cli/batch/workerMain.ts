/** The batch worker thread: runs the jobs it is sent, one at a time, and answers each with its outcome or an error. */
import { parentPort } from "node:worker_threads";
import { runJob, type Job } from "./jobs.js";

const port = parentPort;
if (!port) throw new Error("the batch worker must run in a worker thread");
port.on("message", (m: { id: number; job: Job }) => {
  try {
    port.postMessage({ id: m.id, ok: true, outcome: runJob(m.job) });
  } catch (e) {
    port.postMessage({ id: m.id, ok: false, error: e instanceof Error ? e.message : String(e) });
  }
});
port.postMessage({ ready: true });
