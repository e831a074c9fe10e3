/** Cab steps wiring: the plan, the step in hand, its clock, the wake lock and the slip card. */
import { createEffect, createMemo, createSignal, on, onCleanup, type JSX } from "solid-js";
import { useApp } from "../../context.js";
import { declarePrintStatus } from "../../state/printStatus.js";
import { createWakeLock } from "../../state/createWakeLock.js";
import { CabStepsView } from "./View.js";
import { printWaits } from "../../../i18n/en/printWaits.js";
import { tr } from "../../i18n.js";

/** Seconds since `key()` last changed, ticking twice a second. */
export function createStepClock(key: () => unknown, now: () => number = () => performance.now()): () => number {
  const [startedAt, setStartedAt] = createSignal(now());
  const [t, setT] = createSignal(now());
  createEffect(on(key, () => setStartedAt(now()), { defer: true }));
  const timer = setInterval(() => setT(now()), 500);
  onCleanup(() => clearInterval(timer));
  return () => Math.max(0, (t() - startedAt()) / 1000);
}

export default function CabSteps(): JSX.Element {
  const app = useApp();
  const [index, setIndex] = createSignal(0);
  const [slipOpen, setSlipOpen] = createSignal(false);
  const steps = () => app.run.result()?.steps ?? [];
  // A different plan starts again at its first step (the same steps arriving with the largest-mass
  // search filled in do not move the driver back).
  const stepsKey = createMemo(() => JSON.stringify(steps()));
  createEffect(on(stepsKey, () => setIndex(0), { defer: true }));
  const seconds = createStepClock(index);
  const wake = createWakeLock(() => true);
  const go = (i: number) => setIndex(Math.max(0, Math.min(steps().length - 1, i)));
  const onKey = (e: KeyboardEvent) => {
    if (slipOpen() || e.target instanceof HTMLInputElement) return;
    if (e.key === "ArrowRight" || e.key === "PageDown") go(index() + 1);
    else if (e.key === "ArrowLeft" || e.key === "PageUp") go(index() - 1);
  };
  document.addEventListener("keydown", onKey);
  onCleanup(() => document.removeEventListener("keydown", onKey));
  const checked = () => app.draft.checked();
  declarePrintStatus(() => {
    const s = app.run.status();
    const c = checked();
    return { complete: !(s === "running" || s === "waiting" || (s === "done" && !app.run.current())), waitingFor: tr.ns(printWaits)("plan"), inputs: c.ok ? c.value : null };
  });
  return (
    <CabStepsView
      result={app.run.result()}
      current={app.run.current()}
      invalid={app.run.status() === "invalid"}
      index={index()}
      onIndex={go}
      units={app.settings.settings().units}
      target={(() => {
        const c = checked();
        return c.ok ? c.value.target : undefined;
      })()}
      slipThreshold={app.settings.settings().slipRiskThreshold}
      stepSeconds={seconds()}
      wakeLock={wake()}
      slipOpen={slipOpen()}
      sanders={(() => {
        const c = checked();
        return c.ok ? c.value.locomotives.some((g) => g.spec.sanders) : true;
      })()}
      onSlip={setSlipOpen}
      onClose={() => app.nav.go("start-plan")}
    />
  );
}
