/**
 * Working out a load table on the planner workers: the core's `loadTable` rows for one case, the twelve
 * cells shared out among the workers (each row a mass search over the planner's verdict), rows shown as
 * they come. A changed case stops the running table; finished tables are kept per case.
 */
import { createEffect, createMemo, createSignal, on, onCleanup, type Accessor } from "solid-js";
import { loadTableCells, type LoadTableRow } from "../../../core/dispatch/loadTable.js";
import type { StartCase } from "../../../core/train/types.js";
import type { PlannerCalls } from "../../../worker/client.js";
import type { LoadTableCell, WorkerIssue } from "../../../worker/protocol.js";
import { failureWords, type RunFailure } from "../../state/runFailure.js";

export type TableStatus = "idle" | "running" | "done" | "cancelled" | "failed";

export interface LoadTableRun {
  status: Accessor<TableStatus>;
  /** Rows found so far, in the core's order (every rail condition, without then with sand). */
  rows: Accessor<LoadTableRow[]>;
  progress: Accessor<number>;
  error: Accessor<string | null>;
  elapsedMs: Accessor<number | null>;
  cancel(): void;
  retry(): void;
}

export interface LoadTableRunDeps {
  workers: Pick<PlannerCalls, "loadTable">;
  /** How many requests to share the cells among (the pool's size). */
  parallel: number;
  startCase: Accessor<StartCase | null>;
  /** The issues that stopped a table, in words (read when drawn: the app's words in the language on screen); default: path and message as they came. */
  issueWords?: (issues: readonly WorkerIssue[]) => string;
}

const finished = new Map<string, { rows: LoadTableRow[]; elapsedMs: number }>();

/** Forget finished tables (tests). */
export function forgetLoadTables(): void {
  finished.clear();
}

/** The cells dealt out in turn to `n` groups (so each worker gets a mix of slow and quick rows). */
export function dealCells(n: number): LoadTableCell[][] {
  const groups: LoadTableCell[][] = Array.from({ length: Math.max(1, n) }, () => []);
  loadTableCells().forEach((c, k) => groups[k % groups.length]!.push(c));
  return groups.filter((g) => g.length > 0);
}

const order = (r: Pick<LoadTableRow, "rail" | "sand">) => loadTableCells().findIndex((c) => c.rail === r.rail && c.sand === r.sand);

export function createLoadTableRun(deps: LoadTableRunDeps): LoadTableRun {
  const [status, setStatus] = createSignal<TableStatus>("idle");
  const [rows, setRows] = createSignal<LoadTableRow[]>([]);
  // Why the table failed, as data worded when read: the workers' issues, or a run failure (runFailure.ts).
  const [failure, setFailure] = createSignal<{ issues: readonly WorkerIssue[] } | RunFailure | null>(null);
  const setError = (message: string | null) => setFailure(message === null ? null : { message });
  const error = () => {
    const f = failure();
    if (!f) return null;
    if ("message" in f) return failureWords(f);
    return (deps.issueWords ?? ((is) => is.map((i) => `${i.path}: ${i.message}`).join("; ")))(f.issues);
  };
  const [elapsedMs, setElapsed] = createSignal<number | null>(null);
  const [nonce, setNonce] = createSignal(0);
  let controller: AbortController | null = null;
  const stop = () => {
    controller?.abort();
    controller = null;
  };
  const add = (row: LoadTableRow) => setRows((rs) => (rs.some((x) => x.rail === row.rail && x.sand === row.sand) ? rs : [...rs, row].sort((a, b) => order(a) - order(b))));

  const start = (c: StartCase, key: string) => {
    const ctrl = new AbortController();
    controller = ctrl;
    const live = () => !ctrl.signal.aborted;
    setRows([]);
    setError(null);
    setElapsed(null);
    setStatus("running");
    const t0 = performance.now();
    const parts = dealCells(deps.parallel).map((cells) => deps.workers.loadTable(c, { cells, signal: ctrl.signal, onRow: (row) => live() && add(row) }));
    Promise.all(parts).then(
      (outs) => {
        if (!live()) return;
        controller = null;
        const bad = outs.find((o) => !o.ok);
        if (bad && !bad.ok) {
          setFailure(bad.issues.length > 0 ? { issues: bad.issues } : { message: bad.message, stopped: bad.kind === "crashed" });
          setStatus("failed");
          return;
        }
        for (const o of outs) if (o.ok) o.result.forEach(add);
        const ms = performance.now() - t0;
        setElapsed(ms);
        finished.set(key, { rows: rows(), elapsedMs: ms });
        setStatus("done");
      },
      (e: unknown) => {
        if (!live() || (e as { name?: string }).name === "AbortError") return;
        setError(e instanceof Error ? e.message : String(e));
        setStatus("failed");
      },
    );
  };

  // The case's identity: its whole content (an equal case rebuilt elsewhere does not start the work again).
  const key = createMemo(() => {
    const c = deps.startCase();
    return c ? JSON.stringify(c) : null;
  });
  createEffect(
    on([key, nonce], ([k], prev) => {
      const again = prev !== undefined && prev[1] !== nonce();
      stop();
      const c = deps.startCase();
      if (k === null || c === null) {
        setRows([]);
        setStatus("idle");
        return;
      }
      const known = again ? undefined : finished.get(k);
      if (known) {
        setRows(known.rows);
        setElapsed(known.elapsedMs);
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
    rows,
    progress: () => rows().length / loadTableCells().length,
    error,
    elapsedMs,
    cancel: () => {
      if (status() !== "running") return;
      stop();
      setStatus("cancelled");
    },
    retry: () => setNonce((n) => n + 1),
  };
}
