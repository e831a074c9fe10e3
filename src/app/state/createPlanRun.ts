/**
 * Running the planner for the case being edited. Whenever the valid case changes: wait a moment for the
 * typing to settle, cancel what is in progress and ask the worker for the plan (without the
 * largest-startable-mass search, so it is on screen quickly); then, on a second worker when there is
 * one, the full plan with that search, which replaces the first when it arrives. The last good plan stays on screen, marked
 * as out of date, until its successor arrives. The first request goes out at once, before the page has
 * finished rendering.
 */
import { createEffect, createMemo, createSignal, on, onCleanup, type Accessor } from "solid-js";
import type { PlanResult } from "../../core/planner/types.js";
import type { StartCase } from "../../core/train/types.js";
import type { PlannerClient } from "../../worker/client.js";
import type { WorkerIssue } from "../../worker/protocol.js";
import { failureWords, type RunFailure } from "./runFailure.js";

export type RunStatus = "idle" | "waiting" | "running" | "done" | "invalid" | "failed";

export interface PlanRun {
  status: Accessor<RunStatus>;
  /** 0..1 while running. */
  progress: Accessor<number>;
  /** The latest plan (possibly for earlier inputs: see `current`). */
  result: Accessor<PlanResult | null>;
  /** Whether `result` belongs to the inputs on screen. */
  current: Accessor<boolean>;
  /** The largest-startable-mass search for the plan on screen is still running. */
  massPending: Accessor<boolean>;
  /** Issues the worker found (the screen validates first, so these mean a bug). */
  issues: Accessor<WorkerIssue[]>;
  error: Accessor<string | null>;
  /** Time the last plan took in the worker, ms. */
  elapsedMs: Accessor<number | null>;
  /** Ask again for the same inputs (after a failure). */
  retry(): void;
}

/** The part of a planner client a plan run uses. */
export type PlanningClient = Pick<PlannerClient, "plan" | "warm">;

export interface PlanRunDeps {
  client: PlanningClient;
  /** A second worker for the slower largest-startable-mass search that follows each plan; without it that figure is not computed. */
  background?: PlanningClient;
  /** The validated case to plan (core SI form), null while the inputs break a rule, undefined while not yet checked. */
  startCase: Accessor<StartCase | null | undefined>;
  /** Wait after the last change before planning, ms. */
  debounceMs?: number;
  /**
   * Called when the first plan is on screen, with the time the planner took in the worker (ms): once for
   * the first plan from the worker, and before that, when there is one, once for the plan worked out at
   * build time (0 ms, `fromBuild`).
   */
  onFirstResult?: (workerMs: number, fromBuild: boolean) => void;
  /**
   * A plan worked out in advance (at build time) for the case with this key: when the first case has this
   * key it is shown at once, and the live plan of the same request replaces it quietly when it arrives.
   */
  initial?: { key: string; result: PlanResult };
}

export function createPlanRun(deps: PlanRunDeps): PlanRun {
  const debounceMs = deps.debounceMs ?? 200;
  const [status, setStatus] = createSignal<RunStatus>("idle");
  const [progress, setProgress] = createSignal(0);
  const [result, setResult] = createSignal<PlanResult | null>(null);
  const [resultKey, setResultKey] = createSignal<string | null>(null);
  const [massPending, setMassPending] = createSignal(false);
  const [issues, setIssues] = createSignal<WorkerIssue[]>([]);
  // Why the last plan failed, worded when shown (runFailure.ts).
  const [failure, setFailure] = createSignal<RunFailure | null>(null);
  const setError = (message: string | null, stopped = false) => setFailure(message === null ? null : { message, stopped });
  const error = () => {
    const f = failure();
    return f ? failureWords(f) : null;
  };
  const [elapsedMs, setElapsedMs] = createSignal<number | null>(null);
  const [nonce, setNonce] = createSignal(0);
  let controller: AbortController | null = null;
  let timer: ReturnType<typeof setTimeout> | null = null;
  let firstDone = false;
  /** The key of the request in flight or answered (so the first effect run does not repeat the early start). */
  let requestedKey: string | null = null;

  // The case's identity: its full SI content (a changed note or setting replans even under the same ids).
  const key = createMemo(() => {
    const c = deps.startCase();
    return c === undefined ? undefined : c ? JSON.stringify(c) : null;
  });

  const cancel = () => {
    if (timer !== null) clearTimeout(timer);
    timer = null;
    const stopped = controller !== null && massPending();
    controller?.abort();
    controller = null;
    setMassPending(false);
    // Stopping a running search ends its worker; start the next one in a task of its own, not in the
    // task that renders the next plan.
    if (stopped && deps.background) setTimeout(() => deps.background?.warm(), 0);
  };

  const fail = (e: unknown) => {
    if ((e as { name?: string }).name === "AbortError") return;
    setError(e instanceof Error ? e.message : String(e));
    setStatus("failed");
  };

  const background = (startCase: StartCase, k: string, ctrl: AbortController) => {
    if (!deps.background) {
      if (controller === ctrl) controller = null;
      return;
    }
    setMassPending(true);
    deps.background
      .plan(startCase, { signal: ctrl.signal })
      .then((out) => {
        if (ctrl.signal.aborted || resultKey() !== k) return;
        setMassPending(false);
        if (out.ok) setResult(out.result);
      })
      .catch(() => {
        if (!ctrl.signal.aborted) setMassPending(false);
      });
  };

  /** Ask for the plan of `startCase`; `quiet` when a plan for the same key is already on screen (no progress shown). */
  const start = (startCase: StartCase, k: string, quiet = false) => {
    const ctrl = new AbortController();
    controller = ctrl;
    requestedKey = k;
    if (!quiet) {
      setStatus("running");
      setProgress(0);
    }
    deps.client
      .plan(startCase, { signal: ctrl.signal, onProgress: (f) => !quiet && !ctrl.signal.aborted && setProgress(f), skipMassSearch: true, skipVerification: true })
      .then((out) => {
        if (ctrl.signal.aborted) return;
        if (out.ok) {
          setResult(out.result);
          setResultKey(k);
          setIssues([]);
          setError(null);
          setElapsedMs(out.elapsedMs);
          setStatus("done");
          if (!firstDone) {
            firstDone = true;
            deps.onFirstResult?.(out.elapsedMs, false);
          }
          background(startCase, k, ctrl);
        } else if (out.kind === "invalid") {
          setIssues(out.issues);
          setStatus("invalid");
        } else {
          setError(out.message, out.kind === "crashed");
          setStatus("failed");
        }
      })
      .catch(fail);
  };

  // The first plan is asked for at once (the worker loads while the page renders). When it was worked out
  // in advance, that plan is on screen from the first render and the live one replaces it quietly.
  {
    const k = key();
    const c = deps.startCase();
    if (k && c) {
      const initial = deps.initial?.key === k ? deps.initial : undefined;
      if (initial) {
        setResult(initial.result);
        setResultKey(k);
        setStatus("done");
        deps.onFirstResult?.(0, true);
      }
      start(c, k, initial !== undefined);
    }
  }

  createEffect(
    on([key, nonce], ([k], prev) => {
      const retried = prev !== undefined && prev[1] !== nonce();
      if (!retried && k !== null && k === requestedKey && (status() === "running" || status() === "done")) return;
      cancel();
      const c = deps.startCase();
      if (k === undefined || c === undefined) {
        // Not checked yet (the checker is loading): nothing to plan, nothing wrong either.
        requestedKey = null;
        setStatus("waiting");
        return;
      }
      if (k === null || c === null) {
        requestedKey = null;
        setStatus("invalid");
        return;
      }
      setStatus("waiting");
      const wait = result() === null ? 0 : debounceMs;
      timer = setTimeout(() => {
        timer = null;
        start(c, k);
      }, wait);
    }),
  );

  onCleanup(cancel);

  return {
    status,
    progress,
    result,
    current: () => resultKey() !== null && resultKey() === key(),
    massPending,
    issues,
    error,
    elapsedMs,
    retry: () => setNonce((n) => n + 1),
  };
}
