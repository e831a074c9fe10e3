/** The planner worker: thin wiring of the handler to the worker's message port. */
import { createPlannerHandler } from "./handler.js";
import type { WorkerResponse } from "./protocol.js";

interface WorkerScope {
  onmessage: ((ev: MessageEvent) => void) | null;
  postMessage(msg: WorkerResponse, transfer: Transferable[]): void;
}

const scope = self as unknown as WorkerScope;
const handle = createPlannerHandler((msg, transfer) => scope.postMessage(msg, transfer));
scope.onmessage = (ev) => handle(ev.data);
