/**
 * The page's side of the railML import worker: one request at a time, a promise per request, progress
 * while a file is read, and cancel (which ends the worker; the next request starts a fresh one). A failure
 * is an Error with its English message and, as `text`, the same as data (profiles/railml/text.ts).
 */
import type { RailmlSummary, StretchRequest, StretchResult } from "../../../../profiles/railml/index.js";
import { railmlEnglish, say } from "../../../../profiles/railml/text.js";
import type { RailmlReply, RailmlRequest } from "./protocol.js";

export interface RailmlWorkerLike {
  postMessage(m: RailmlRequest): void;
  onmessage: ((ev: MessageEvent<RailmlReply>) => void) | null;
  onerror: ((ev: ErrorEvent) => void) | null;
  terminate(): void;
}

export interface RailmlImporter {
  read(file: Blob, onProgress?: (fraction: number) => void): Promise<RailmlSummary>;
  stretch(request: StretchRequest): Promise<StretchResult>;
  /** Stop what is running (its promise rejects with an AbortError) and end the worker. */
  cancel(): void;
}

/** The import worker; where there is no Worker (the tests' jsdom), the same handler on this thread. */
export function defaultRailmlWorker(): RailmlWorkerLike {
  if (typeof Worker === "undefined") return inThreadRailmlWorker((post) => {
    const handler = import("./handler.js").then((h) => h.createRailmlHandler(post));
    return async (m) => (await handler)(m);
  });
  return new Worker(new URL("./railml.worker.ts", import.meta.url), { type: "module", name: "taut-railml" }) as unknown as RailmlWorkerLike;
}

export function createRailmlImporter(createWorker: () => RailmlWorkerLike = defaultRailmlWorker): RailmlImporter {
  let worker: RailmlWorkerLike | undefined;
  let next = 1;
  const pending = new Map<number, { resolve: (r: RailmlReply) => void; reject: (e: Error) => void; progress?: (f: number) => void }>();

  const fail = (e: Error) => {
    for (const p of pending.values()) p.reject(e);
    pending.clear();
  };
  const ensure = (): RailmlWorkerLike => {
    if (worker) return worker;
    const w = createWorker();
    w.onmessage = (ev) => {
      const r = ev.data;
      const p = pending.get(r.id);
      if (!p) return;
      if (r.type === "progress") return p.progress?.(r.fraction);
      pending.delete(r.id);
      if (r.type === "error") p.reject(Object.assign(new Error(r.message), { text: r.text }));
      else p.resolve(r);
    };
    w.onerror = (ev) => {
      ev.preventDefault?.();
      worker?.terminate();
      worker = undefined;
      const text = say("importStopped", { reason: ev.message ? ev.message : say("workerFailed") });
      fail(Object.assign(new Error(railmlEnglish(text)), { text }));
    };
    worker = w;
    return w;
  };
  type Unsent = { type: "read"; file: Blob } | { type: "stretch"; request: StretchRequest };
  const ask = (req: Unsent, progress?: (f: number) => void) =>
    new Promise<RailmlReply>((resolve, reject) => {
      const id = next++;
      pending.set(id, { resolve, reject, ...(progress ? { progress } : {}) });
      ensure().postMessage({ ...req, id } as RailmlRequest);
    });

  return {
    async read(file, onProgress) {
      const r = await ask({ type: "read", file }, onProgress);
      if (r.type !== "read") throw new Error("unexpected answer");
      return r.summary;
    },
    async stretch(request) {
      const r = await ask({ type: "stretch", request });
      if (r.type !== "stretch") throw new Error("unexpected answer");
      return r.result;
    },
    cancel() {
      worker?.terminate();
      worker = undefined;
      fail(Object.assign(new Error("Cancelled."), { name: "AbortError" }));
    },
  };
}

/** A stand-in for the worker that runs the same handler on this thread (tests; no Worker in jsdom). */
export function inThreadRailmlWorker(handlerFor: (post: (r: RailmlReply) => void) => (m: RailmlRequest) => Promise<void>): RailmlWorkerLike {
  let ended = false;
  const w: RailmlWorkerLike = {
    onmessage: null,
    onerror: null,
    postMessage(m) {
      void handle(m);
    },
    terminate() {
      ended = true;
    },
  };
  const handle = handlerFor((r) => queueMicrotask(() => !ended && w.onmessage?.({ data: r } as MessageEvent<RailmlReply>)));
  return w;
}
