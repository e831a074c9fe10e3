/**
 * Offline readiness and updates, from the service worker registration (`sw/register.ts`, passed in so
 * tests and non-PWA builds can do without). "Ready offline" once the app is precached; a new version
 * waits until the user agrees to update. Whether the server can be reached is observed
 * (`createConnection`): the browser's events, the app's own small checks and the update checks.
 */
import { createSignal, type Accessor } from "solid-js";
import { createConnection, headProbe, type Observation, type Probe } from "./createConnection.js";

export interface RegisterOptions {
  immediate?: boolean;
  onNeedRefresh?: () => void;
  onOfflineReady?: () => void;
  onRegisteredSW?: (swUrl: string, registration: ServiceWorkerRegistration | undefined) => void;
  onRegisterError?: (error: unknown) => void;
}
export type RegisterSW = (options: RegisterOptions) => (reloadPage?: boolean) => Promise<void>;

export interface OfflineState {
  /** The service worker holds a full copy of the app. */
  ready: Accessor<boolean>;
  /** The server could be reached, as last observed. */
  online: Accessor<boolean>;
  /** What `online` rests on, and when it was seen. */
  observation: Accessor<Observation>;
  /** A new version is installed and waiting. */
  updateWaiting: Accessor<boolean>;
  /** A message when registration failed. */
  problem: Accessor<string | null>;
  supported: boolean;
  update(): Promise<void>;
  later(): void;
  /** Ask the server whether a newer version exists (a failure to reach it counts as offline). */
  check(): Promise<void>;
}

export interface OfflineOptions {
  /** The reachability check (default: a HEAD request for the app's own address; null: none). */
  probe?: Probe | null;
  /** Between reachability checks while the page is visible. */
  everyMs?: number;
}

/**
 * `after`: register only once this settles (the app registers after the first plan is on screen, so the
 * service worker's precaching does not compete with it for the two cores of a tablet).
 */
export function createOffline(register: RegisterSW | null, after: Promise<unknown> = Promise.resolve(), options: OfflineOptions = {}): OfflineState {
  const supported = register !== null && typeof navigator !== "undefined" && "serviceWorker" in navigator;
  const [ready, setReady] = createSignal(supported && navigator.serviceWorker.controller !== null);
  // Only an app that can work offline has a use for knowing: the checks run when it has a service worker.
  const probe = !supported ? null : options.probe !== undefined ? options.probe : typeof fetch === "function" ? headProbe(new URL("./", document.baseURI).href) : null;
  const connection = createConnection({ probe, after, ...(options.everyMs !== undefined ? { everyMs: options.everyMs } : {}) });
  const [updateWaiting, setUpdateWaiting] = createSignal(false);
  const [problem, setProblem] = createSignal<string | null>(null);
  let registration: ServiceWorkerRegistration | undefined;
  let updateSW: (reload?: boolean) => Promise<void> = async () => undefined;

  if (supported && register) {
    void after.then(() => {
      updateSW = register({
        immediate: true,
        onOfflineReady: () => setReady(true),
        onNeedRefresh: () => setUpdateWaiting(true),
        onRegisteredSW: (_url, r) => {
          registration = r;
          if (r?.active) setReady(true);
        },
        onRegisterError: (e) => setProblem(e instanceof Error ? e.message : String(e)),
      });
    });
  }

  return {
    ready,
    online: connection.online,
    observation: connection.observation,
    updateWaiting,
    problem,
    supported,
    update: () => updateSW(true),
    later: () => setUpdateWaiting(false),
    check: async () => {
      if (!registration) return;
      try {
        await registration.update();
        connection.observe(true);
      } catch {
        // The service worker's script could not be fetched: as far as the app can tell, it is offline.
        connection.observe(false);
      }
    },
  };
}
