/** The load-table worker: thin wiring of `runLoadTableJob` to the worker's message port. */
import { runLoadTableJob, type LoadTableRequest, type LoadTableResponse } from "./loadTableJob.js";

interface WorkerScope {
  onmessage: ((ev: MessageEvent<LoadTableRequest>) => void) | null;
  postMessage(msg: LoadTableResponse): void;
}

const scope = self as unknown as WorkerScope;
scope.onmessage = (ev) => {
  const { id, note, ref } = ev.data;
  try {
    scope.postMessage({ id, outcome: runLoadTableJob(note, ref) });
  } catch (e) {
    scope.postMessage({ id, error: e instanceof Error ? e.message : String(e) });
  }
};
