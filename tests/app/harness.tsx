/** A real app state for component tests: the real planner run in-process behind the worker protocol. */
import { render } from "@solidjs/testing-library";
import type { JSX } from "solid-js";
import { App } from "../../src/app/App.js";
import { AppContext, type AppContextValue } from "../../src/app/context.js";
import { createAppState } from "../../src/app/createAppState.js";
import { SCREENS, type ScreenEntry } from "../../src/app/screens/registry.js";
import { createPlannerClient, type WorkerLike } from "../../src/worker/client.js";
import { loadTableCells, loadTableRow } from "../../src/core/dispatch/loadTable.js";
import { staticCheck } from "../../src/core/planner/staticCheck.js";
import type { StartCase } from "../../src/core/train/types.js";
import { createPlannerHandler, type HandlerDeps } from "../../src/worker/handler.js";
import { createPlannerPool, type PlannerPool } from "../../src/worker/pool.js";
import type { WorkerRequest } from "../../src/worker/protocol.js";

/** A worker that runs the real handler in this thread, passing messages by structured clone on later ticks. */
export class InProcessWorker implements WorkerLike {
  onmessage: WorkerLike["onmessage"] = null;
  onerror: WorkerLike["onerror"] = null;
  terminated = false;
  private handle: (msg: unknown) => void;
  constructor(deps: HandlerDeps = {}) {
    this.handle = createPlannerHandler((msg, transfer) => {
      const copy = structuredClone(msg, { transfer });
      setTimeout(() => {
        if (!this.terminated) this.onmessage?.({ data: copy });
      }, 0);
    }, deps);
  }
  postMessage(m: WorkerRequest) {
    const copy = structuredClone(m);
    setTimeout(() => {
      if (!this.terminated) this.handle(copy);
    }, 0);
  }
  terminate() {
    this.terminated = true;
  }
}

/** An in-memory Storage. */
export function memoryStorage(init: Record<string, string> = {}): Storage {
  const m = new Map(Object.entries(init));
  return {
    get length() {
      return m.size;
    },
    clear: () => m.clear(),
    getItem: (k) => m.get(k) ?? null,
    key: (i) => [...m.keys()][i] ?? null,
    removeItem: (k) => void m.delete(k),
    setItem: (k, v) => void m.set(k, String(v)),
  };
}

export interface Harness {
  state: AppContextValue;
  storage: Storage;
}

/**
 * Render `ui` inside a full app state (or the whole App when `ui` is omitted). The planner runs in this
 * thread; `background: true` adds the second worker's largest-startable-mass search (slow: it blocks the
 * test thread while it runs).
 */
/** A pool of in-process planner workers (they share this thread: a pool here runs one request at a time in effect). */
export function inProcessPool(size = 2, deps: HandlerDeps = {}): PlannerPool {
  return createPlannerPool({ size, createClient: () => createPlannerClient({ createWorker: () => new InProcessWorker(deps) }) });
}

/**
 * In-process workers whose load tables use the static check as the verdict: the real protocol and client,
 * a table in milliseconds (the planner's own table blocks this thread for seconds; the browser tests run it).
 */
export function quickTablePool(): PlannerPool {
  const starts = (c: StartCase) => staticCheck(c).verdict === "starts";
  return inProcessPool(2, {
    jobs: {
      loadTable: (c, o, progress) =>
        (o.cells ?? loadTableCells()).map(({ rail, sand }, k, all) => {
          const row = loadTableRow(c, rail, sand, starts);
          progress((k + 1) / all.length, { row });
          return row;
        }),
    },
  });
}

export function renderWithApp(ui?: () => JSX.Element, opts: { storage?: Storage; screens?: readonly ScreenEntry[]; background?: boolean; pool?: PlannerPool; createWorker?: () => WorkerLike } = {}) {
  const storage = opts.storage ?? memoryStorage();
  let h!: Harness;
  const screens = opts.screens ?? SCREENS;
  const result = render(() => {
    const state = createAppState({
      planner: createPlannerClient({ createWorker: opts.createWorker ?? (() => new InProcessWorker()) }),
      ...(opts.background ? { background: createPlannerClient({ createWorker: () => new InProcessWorker() }) } : {}),
      registerSW: null,
      screenIds: screens.map((s) => s.id),
      storage,
      debounceMs: 0,
      pool: opts.pool ?? inProcessPool(),
    });
    h = { state, storage };
    return ui ? <AppContext.Provider value={state}>{ui()}</AppContext.Provider> : <App state={state} screens={screens} />;
  });
  return { ...result, get harness() {
    return h;
  } };
}
