/**
 * The moving lock: while the user allows it (Settings), watch the device's position; when it reports a
 * speed above a few km/h the app hides its controls behind a notice (Taut is for planning before
 * departure). Nothing is watched unless the user turned it on.
 */
import { createEffect, createSignal, onCleanup, type Accessor } from "solid-js";
import { nextMotion, STILL, type MotionState } from "./motion.js";

export type MotionLockStatus = "off" | "watching" | "unsupported" | "denied" | "unavailable";

export interface MotionLock {
  moving: Accessor<boolean>;
  status: Accessor<MotionLockStatus>;
  /** Last speed the device reported, m/s. */
  speedMps: Accessor<number | null>;
}

export function createMotionLock(enabled: Accessor<boolean>, geo: Geolocation | undefined = typeof navigator !== "undefined" ? navigator.geolocation : undefined): MotionLock {
  const [state, setState] = createSignal<MotionState>(STILL);
  const [status, setStatus] = createSignal<MotionLockStatus>("off");
  const [speed, setSpeed] = createSignal<number | null>(null);
  let watchId: number | null = null;
  let tick: ReturnType<typeof setInterval> | null = null;

  const stop = () => {
    if (watchId !== null && geo) geo.clearWatch(watchId);
    watchId = null;
    if (tick !== null) clearInterval(tick);
    tick = null;
    setState(STILL);
    setSpeed(null);
  };

  createEffect(() => {
    if (!enabled()) {
      stop();
      setStatus("off");
      return;
    }
    if (!geo) {
      setStatus("unsupported");
      return;
    }
    if (watchId !== null) return;
    setStatus("watching");
    watchId = geo.watchPosition(
      (p) => {
        setStatus("watching");
        setSpeed(p.coords.speed);
        setState((s) => nextMotion(s, p.coords.speed, Date.now()));
      },
      (e) => setStatus(e.code === e.PERMISSION_DENIED ? "denied" : "unavailable"),
      { enableHighAccuracy: true, maximumAge: 2000 },
    );
    // Fixes may stop arriving when the device is still: let time alone lift the lock.
    tick = setInterval(() => setState((s) => (s.moving && s.slowSinceMs !== null ? nextMotion(s, 0, Date.now()) : s)), 1000);
  });
  onCleanup(stop);
  return { moving: () => state().moving, status, speedMps: speed };
}
