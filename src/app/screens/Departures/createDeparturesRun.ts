/**
 * Checking a day's departures on the planner workers: every good row becomes a `check` request (identical
 * departures share one), spread over the pool; a bad row keeps the error of its line and the others are
 * answered; progress counts the rows answered (with the share of the ones running); Cancel stops them all.
 */
import { batch, createSignal, type Accessor } from "solid-js";
import type { Departure } from "../../../profiles/departures.js";
import type { CheckOutcome, PlannerCalls } from "../../../worker/client.js";
import type { DepartureRow } from "./rows.js";
import { rowErrorEnglish, type RowFailure } from "./rowErrors.js";

export type RunState = "empty" | "running" | "done" | "cancelled";

export interface DeparturesRun {
  state: Accessor<RunState>;
  rows: Accessor<DepartureRow[]>;
  /** 0..1 while running. */
  progress: Accessor<number>;
  /** Start checking these departures (what was running is stopped). */
  start(deps: readonly Departure[]): void;
  cancel(): void;
  clear(): void;
}

function rowOf(d: Departure, order: number): DepartureRow {
  const row: DepartureRow = { id: d.id, where: d.where, order };
  if (d.line !== undefined) row.line = d.line;
  if (d.index !== undefined) row.index = d.index;
  if (d.case) {
    if (d.file !== undefined) row.file = d.file;
    row.rail = d.case.conditions.rail;
    row.sand = d.case.conditions.sand;
    row.trailingMassKg = d.case.train.trailingMassKg;
  } else {
    row.error = d.error ?? `${d.where}: cannot be read`;
    if (d.problem) row.problem = d.problem;
    row.errorKind = "input";
  }
  return row;
}

/** One run per set of workers, kept while the app is open (switching screens does not stop a check). */
const runs = new WeakMap<object, DeparturesRun>();

export function departuresRunFor(workers: Pick<PlannerCalls, "check">): DeparturesRun {
  let run = runs.get(workers);
  if (!run) {
    run = createDeparturesRun({ workers });
    runs.set(workers, run);
  }
  return run;
}

export function createDeparturesRun(deps: { workers: Pick<PlannerCalls, "check"> }): DeparturesRun {
  const [state, setState] = createSignal<RunState>("empty");
  const [rows, setRows] = createSignal<DepartureRow[]>([]);
  const [progress, setProgress] = createSignal(0);
  let controller: AbortController | null = null;

  const stop = () => {
    controller?.abort();
    controller = null;
  };

  const start = (list: readonly Departure[]) => {
    stop();
    const ctrl = new AbortController();
    controller = ctrl;
    const live = () => !ctrl.signal.aborted;
    const initial = list.map(rowOf);
    const todo = initial.filter((x) => !x.error).length;
    batch(() => {
      setRows(initial);
      setProgress(0);
      setState(todo === 0 ? "done" : "running");
    });
    if (todo === 0) return;
    // Identical departures are checked once; each check's progress counts once per row it answers.
    const checks = new Map<string, { promise: Promise<CheckOutcome>; fraction: number; rows: number }>();
    let answered = 0;
    const update = () => {
      let running = 0;
      for (const c of checks.values()) if (c.fraction < 1) running += c.fraction * c.rows;
      setProgress(Math.min(1, (answered + running) / todo));
    };
    list.forEach((d, k) => {
      if (!d.case) return;
      const key = JSON.stringify(d.case);
      let c = checks.get(key);
      if (!c) {
        const entry = { promise: undefined as unknown as Promise<CheckOutcome>, fraction: 0, rows: 0 };
        entry.promise = deps.workers.check(d.case, {
          signal: ctrl.signal,
          onProgress: (f) => {
            if (!live()) return;
            entry.fraction = f;
            update();
          },
        });
        checks.set(key, entry);
        c = entry;
      }
      c.rows++;
      const settle = (patch: Partial<DepartureRow>) => {
        answered++;
        setRows((rs) => rs.map((x) => (x.order === k ? { ...x, ...patch } : x)));
        update();
        if (answered === todo) {
          controller = null;
          setState("done");
        }
      };
      c.promise.then(
        (o) => {
          if (!live()) return;
          if (o.ok) settle({ answer: o.result });
          else {
            // The English for the export; the codes for the screen, which writes them in its language.
            const failure: RowFailure = { kind: o.kind, detail: o.message, issues: o.issues };
            settle({ error: rowErrorEnglish(d.where, failure, o.message), failure, errorKind: o.kind === "invalid" ? "input" : "internal" });
          }
        },
        (e: unknown) => {
          // Cancelled: the row stays unanswered. Anything else is reported on the row.
          if (!live()) return;
          const detail = e instanceof Error ? e.message : String(e);
          settle({ error: `${d.where}: internal error: ${detail}`, failure: { kind: "internal", detail, issues: [] }, errorKind: "internal" });
        },
      );
    });
  };

  return {
    state,
    rows,
    progress,
    start,
    cancel: () => {
      if (state() !== "running") return;
      stop();
      setState("cancelled");
    },
    clear: () => {
      stop();
      batch(() => {
        setRows([]);
        setProgress(0);
        setState("empty");
      });
    },
  };
}
