/**
 * The Assistance check of the case being edited: two requests to the planner workers side by side — the
 * margins per rail condition, and the assistance search (the case's own verdict, added units that make it
 * start, the divided train when none does). Results are kept per case, so coming back to the screen shows
 * them at once; each part shows as soon as it arrives. Cancel stops both; Check again starts them anew.
 */
import { createEffect, createMemo, createSignal, on, onCleanup, type Accessor } from "solid-js";
import type { ConditionMargin } from "../../../core/dispatch/conditionMargins.js";
import type { StartCase } from "../../../core/train/types.js";
import type { LocomotiveSpec } from "../../../core/physics/types.js";
import type { Outcome, PlannerCalls } from "../../../worker/client.js";
import type { AssistanceAnswer } from "../../../worker/protocol.js";
import { failures } from "../../../i18n/en/failures.js";
import { readerMessage } from "../../../i18n/renderReaders.js";
import { tr } from "../../i18n.js";

const tf = tr.ns(failures);

/** Why a request gave no answer, in the language on screen: a refused case with its issues, a failure's own words, a stopped planner. */
function failureWords(o: Extract<Outcome<unknown>, { ok: false }>): string {
  if (o.kind === "invalid") {
    const issues = o.issues.map((i) => `${i.path}: ${i.reader ? readerMessage(tr, i.reader) : i.message}`).join("; ");
    return issues ? tf("caseRefusedBecause", { issues }) : tf("caseRefused");
  }
  return o.kind === "crashed" ? tf("plannerStopped") : tf("internalError", { detail: o.message });
}

export type CheckStatus = "invalid" | "running" | "done" | "cancelled" | "failed";

export interface AssistanceCheck {
  status: Accessor<CheckStatus>;
  /** 0..1 over both requests while running. */
  progress: Accessor<number>;
  margins: Accessor<ConditionMargin[] | null>;
  answer: Accessor<AssistanceAnswer | null>;
  /** Why a part failed (the other part may still be shown). */
  error: Accessor<string | null>;
  cancel(): void;
  retry(): void;
}

export interface AssistanceCheckDeps {
  workers: Pick<PlannerCalls, "assistance" | "conditionMargins">;
  /** The validated case (core SI form), or null while the inputs break a rule. */
  startCase: Accessor<StartCase | null>;
  /** The unit the options add (default: the lead unit's) and how units added mid-train or at the rear are driven. */
  added?: Accessor<{ helper?: LocomotiveSpec; control?: "remote" | "helper" }>;
}

interface Finished {
  margins: ConditionMargin[];
  answer: AssistanceAnswer;
}

/** Answers of the last few cases (a case is identified by its whole content). */
const finished = new Map<string, Finished>();
const KEEP = 6;

function remember(key: string, f: Finished): void {
  finished.delete(key);
  finished.set(key, f);
  while (finished.size > KEEP) finished.delete(finished.keys().next().value as string);
}

/** Forget remembered answers (tests). */
export function forgetAssistanceChecks(): void {
  finished.clear();
}

export function createAssistanceCheck(deps: AssistanceCheckDeps): AssistanceCheck {
  const [status, setStatus] = createSignal<CheckStatus>("invalid");
  const [marginsProgress, setMarginsProgress] = createSignal(0);
  const [assistProgress, setAssistProgress] = createSignal(0);
  const [margins, setMargins] = createSignal<ConditionMargin[] | null>(null);
  const [answer, setAnswer] = createSignal<AssistanceAnswer | null>(null);
  // Why a part failed, written when it is shown (a language switch redraws it).
  const [errorWords, setErrorWords] = createSignal<(() => string) | null>(null);
  const setError = (words: (() => string) | null) => setErrorWords(() => words);
  const error = () => errorWords()?.() ?? null;
  const [nonce, setNonce] = createSignal(0);
  let controller: AbortController | null = null;

  const stop = () => {
    controller?.abort();
    controller = null;
  };


  const start = (c: StartCase, key: string) => {
    const ctrl = new AbortController();
    controller = ctrl;
    setStatus("running");
    setError(null);
    setMargins(null);
    setAnswer(null);
    setMarginsProgress(0);
    setAssistProgress(0);
    const live = () => !ctrl.signal.aborted;
    const m = deps.workers.conditionMargins(c, { signal: ctrl.signal, onProgress: (f) => live() && setMarginsProgress(f) }).then((o) => {
      if (!live()) return null;
      if (o.ok) setMargins(o.result);
      else setError(() => tf("marginsFailed", { why: failureWords(o) }));
      return o.ok ? o.result : null;
    });
    const added = deps.added?.() ?? {};
    const a = deps.workers.assistance(c, { signal: ctrl.signal, onProgress: (f) => live() && setAssistProgress(f), ...(added.helper ? { helper: added.helper } : {}), ...(added.control ? { control: added.control } : {}) }).then((o) => {
      if (!live()) return null;
      if (o.ok) setAnswer(o.result);
      else setError(() => tf("searchFailed", { why: failureWords(o) }));
      return o.ok ? o.result : null;
    });
    Promise.all([m, a]).then(
      ([mr, ar]) => {
        if (!live()) return;
        controller = null;
        if (mr && ar) {
          remember(key, { margins: mr, answer: ar });
          setStatus("done");
        } else setStatus("failed");
      },
      (e: unknown) => {
        if ((e as { name?: string }).name === "AbortError" || !live()) return;
        const detail = e instanceof Error ? e.message : String(e);
        setError(() => tf("internalError", { detail }));
        setStatus("failed");
      },
    );
  };

  // The case's identity: its whole content (an equal case rebuilt elsewhere does not start the work again).
  const key = createMemo(() => {
    const c = deps.startCase();
    const added = deps.added?.() ?? {};
    return c ? JSON.stringify([c, added.helper?.id ?? "", added.control ?? "remote"]) : null;
  });

  createEffect(
    on([key, nonce], ([k], prev) => {
      const again = prev !== undefined && prev[1] !== nonce();
      stop();
      const c = deps.startCase();
      if (k === null || c === null) {
        setMargins(null);
        setAnswer(null);
        setStatus("invalid");
        return;
      }
      const known = again ? undefined : finished.get(k);
      if (known) {
        setMargins(known.margins);
        setAnswer(known.answer);
        setError(null);
        setStatus("done");
        return;
      }
      start(c, k);
    }),
  );
  onCleanup(stop);

  return {
    status,
    progress: () => (marginsProgress() + assistProgress()) / 2,
    margins,
    answer,
    error,
    cancel: () => {
      if (status() !== "running") return;
      stop();
      setStatus("cancelled");
    },
    retry: () => setNonce((n) => n + 1),
  };
}
