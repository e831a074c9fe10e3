/**
 * Keep the screen on while `active()` holds (Screen Wake Lock API, where the browser offers it). The
 * browser drops the lock when the page is hidden; it is taken again when the page shows.
 */
import { createEffect, createSignal, onCleanup, type Accessor } from "solid-js";

export type WakeLockState = "off" | "on" | "unsupported" | "refused";

interface Sentinel {
  release(): Promise<void>;
  addEventListener(type: "release", f: () => void): void;
}
interface WakeLockApi {
  request(type: "screen"): Promise<Sentinel>;
}

export function createWakeLock(active: Accessor<boolean>, nav: { wakeLock?: WakeLockApi } = navigator as unknown as { wakeLock?: WakeLockApi }): Accessor<WakeLockState> {
  const [state, setState] = createSignal<WakeLockState>(nav.wakeLock ? "off" : "unsupported");
  let sentinel: Sentinel | null = null;
  let wanted = false;

  const acquire = async () => {
    if (!nav.wakeLock || sentinel || !wanted || document.visibilityState !== "visible") return;
    try {
      const s = await nav.wakeLock.request("screen");
      if (!wanted) {
        void s.release();
        return;
      }
      sentinel = s;
      setState("on");
      s.addEventListener("release", () => {
        if (sentinel === s) sentinel = null;
        setState(nav.wakeLock ? "off" : "unsupported");
      });
    } catch {
      setState("refused");
    }
  };
  const release = () => {
    const s = sentinel;
    sentinel = null;
    if (s) void s.release().catch(() => undefined);
    if (nav.wakeLock) setState("off");
  };
  const onVisible = () => {
    if (document.visibilityState === "visible") void acquire();
  };

  createEffect(() => {
    wanted = active();
    if (wanted) void acquire();
    else release();
  });
  document.addEventListener("visibilitychange", onVisible);
  onCleanup(() => {
    wanted = false;
    document.removeEventListener("visibilitychange", onVisible);
    release();
  });
  return state;
}
