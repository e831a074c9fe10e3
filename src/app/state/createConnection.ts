/**
 * Whether the app can reach its server, from what it has observed rather than from `navigator.onLine`
 * alone: that flag only says a network interface is up (a connected network with no route reads
 * "online"), and some browsers' emulation of "offline" leaves it true. So the app also checks: a small
 * same-origin request once the first plan is on screen, when the tab becomes visible again, and every
 * couple of minutes while it is visible. Whatever it observed last — the browser's `online`/`offline`
 * event, a check, or another same-origin request such as the service worker's update check — decides.
 */
import { createSignal, onCleanup, type Accessor } from "solid-js";

/** One reachability check: settles when the server answered (any status), rejects when it could not be reached. */
export type Probe = (signal: AbortSignal) => Promise<unknown>;

/** What the state rests on: the browser's own word, or a request of the app's, and when (ms since the epoch). */
export interface Observation {
  source: "browser" | "check";
  online: boolean;
  at: number;
}

export interface Connection {
  online: Accessor<boolean>;
  observation: Accessor<Observation>;
  /** Check now; true when the server answered. */
  check(): Promise<boolean>;
  /** Count the outcome of a same-origin request made elsewhere (the service worker's update check). */
  observe(reached: boolean): void;
}

export interface ConnectionOptions {
  /** The check; null: only the browser's events count. */
  probe: Probe | null;
  /** The first check waits until this settles (the app's first plan on screen). */
  after?: Promise<unknown>;
  /** Between checks while the page is visible (default 2 minutes). */
  everyMs?: number;
  /** A check without an answer in this long counts as failed (default 10 s). */
  timeoutMs?: number;
  now?: () => number;
}

/**
 * A HEAD request for the app's own address, past the HTTP cache. The service worker answers only GET
 * requests from its copy, so a HEAD always goes to the network; its answer has no body.
 */
export function headProbe(url: string): Probe {
  return (signal) => fetch(url, { method: "HEAD", cache: "no-store", signal });
}

export function createConnection(options: ConnectionOptions): Connection {
  const now = options.now ?? Date.now;
  const everyMs = options.everyMs ?? 120_000;
  const timeoutMs = options.timeoutMs ?? 10_000;
  const browserOnline = typeof navigator === "undefined" ? true : navigator.onLine;
  const [observation, setObservation] = createSignal<Observation>({ source: "browser", online: browserOnline, at: now() });
  // Only the newest check's answer counts, and none that started before the browser's latest event.
  let latest = 0;
  let inFlight: Promise<boolean> | null = null;
  let started = false;

  const observe = (source: Observation["source"], online: boolean) => {
    setObservation({ source, online, at: now() });
  };

  const check = (): Promise<boolean> => {
    const probe = options.probe;
    if (!probe) return Promise.resolve(observation().online);
    const id = ++latest;
    const abort = new AbortController();
    const timer = setTimeout(() => abort.abort(), timeoutMs);
    const run = new Promise((resolve) => resolve(probe(abort.signal)))
      .then(
        () => true,
        () => false,
      )
      .then((reached) => {
        clearTimeout(timer);
        if (id === latest) observe("check", reached);
        if (inFlight === run) inFlight = null;
        return reached;
      });
    inFlight = run;
    return run;
  };
  /** A routine check: none while another is under way, the page is hidden, or before the first plan. */
  const routine = () => {
    if (!started || inFlight || (typeof document !== "undefined" && document.visibilityState === "hidden")) return;
    void check();
  };

  const onOnline = () => {
    latest++;
    observe("browser", true);
    inFlight = null;
    if (started) void check();
  };
  const onOffline = () => {
    latest++;
    observe("browser", false);
  };
  const onVisible = () => {
    if (document.visibilityState === "visible") routine();
  };
  addEventListener("online", onOnline);
  addEventListener("offline", onOffline);
  if (typeof document !== "undefined") document.addEventListener("visibilitychange", onVisible);
  let interval: ReturnType<typeof setInterval> | undefined;
  let disposed = false;
  onCleanup(() => {
    disposed = true;
    removeEventListener("online", onOnline);
    removeEventListener("offline", onOffline);
    if (typeof document !== "undefined") document.removeEventListener("visibilitychange", onVisible);
    clearInterval(interval);
  });
  if (options.probe) {
    void (options.after ?? Promise.resolve()).then(() => {
      if (disposed) return;
      started = true;
      routine();
      interval = setInterval(routine, everyMs);
    });
  }

  return {
    online: () => observation().online,
    observation,
    check,
    observe: (reached) => {
      latest++;
      observe("check", reached);
    },
  };
}
