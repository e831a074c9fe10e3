/**
 * Registering the service worker (`sw.ts`, built to sw.js beside index.html), in the shape the app's
 * offline state expects (`RegisterSW`): "offline ready" once the first copy is installed, "need
 * refresh" when a new version is installed and waiting, and an update function that lets the waiting
 * version take over and reloads the page once it has.
 */
import type { RegisterSW } from "../state/createOffline.js";

export const registerSW: RegisterSW = (options) => {
  const swUrl = "./sw.js";
  let registration: ServiceWorkerRegistration | undefined;
  const sw = navigator.serviceWorker;
  const watch = (w: ServiceWorker | null) =>
    w?.addEventListener("statechange", () => {
      if (w.state !== "installed") return;
      // With a page already controlled this is a new version waiting; otherwise the first copy.
      if (sw.controller) options.onNeedRefresh?.();
      else options.onOfflineReady?.();
    });
  sw.register(swUrl, { scope: "./" }).then(
    (r) => {
      registration = r;
      options.onRegisteredSW?.(swUrl, r);
      if (r.waiting && sw.controller) options.onNeedRefresh?.();
      watch(r.installing);
      r.addEventListener("updatefound", () => watch(r.installing));
    },
    (e: unknown) => options.onRegisterError?.(e),
  );
  return async (reloadPage = true) => {
    const waiting = registration?.waiting;
    if (!waiting) return;
    if (reloadPage) sw.addEventListener("controllerchange", () => location.reload(), { once: true });
    waiting.postMessage({ type: "SKIP_WAITING" });
  };
};
