/**
 * Offline readiness and updates, from the service worker registration (vite-plugin-pwa's
 * `sw/register.ts`, passed in so tests and non-PWA builds can do without). "Ready offline" once the
 * app is precached; a new version waits until the user agrees to update.
 */
import { createSignal, onCleanup, type Accessor } from "solid-js";

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
  online: Accessor<boolean>;
  /** A new version is installed and waiting. */
  updateWaiting: Accessor<boolean>;
  /** A message when registration failed. */
  problem: Accessor<string | null>;
  supported: boolean;
  update(): Promise<void>;
  later(): void;
  /** Ask the server whether a newer version exists. */
  check(): Promise<void>;
}

/**
 * `after`: register only once this settles (the app registers after the first plan is on screen, so the
 * service worker's precaching does not compete with it for the two cores of a tablet).
 */
export function createOffline(register: RegisterSW | null, after: Promise<unknown> = Promise.resolve()): OfflineState {
  const supported = register !== null && typeof navigator !== "undefined" && "serviceWorker" in navigator;
  const [ready, setReady] = createSignal(supported && navigator.serviceWorker.controller !== null);
  const [online, setOnline] = createSignal(typeof navigator === "undefined" ? true : navigator.onLine);
  const [updateWaiting, setUpdateWaiting] = createSignal(false);
  const [problem, setProblem] = createSignal<string | null>(null);
  let registration: ServiceWorkerRegistration | undefined;
  let updateSW: (reload?: boolean) => Promise<void> = async () => undefined;

  const on = () => setOnline(true);
  const off = () => setOnline(false);
  addEventListener("online", on);
  addEventListener("offline", off);
  onCleanup(() => {
    removeEventListener("online", on);
    removeEventListener("offline", off);
  });

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
    online,
    updateWaiting,
    problem,
    supported,
    update: () => updateSW(true),
    later: () => setUpdateWaiting(false),
    check: async () => {
      await registration?.update();
    },
  };
}
