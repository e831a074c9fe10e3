/**
 * Fixed worker answers for the dispatcher's screens: a pool whose calls the test scripts (answered at once
 * from a function, or held until the test releases them), recording every request and its signal.
 */
import type { ConditionMargin } from "../../../src/core/dispatch/conditionMargins.js";
import type { LoadTableRow } from "../../../src/core/dispatch/loadTable.js";
import { RAIL_CONDITIONS } from "../../../src/core/physics/types.js";
import type { StartCase } from "../../../src/core/train/types.js";
import type { Outcome } from "../../../src/worker/client.js";
import type { PlannerPool } from "../../../src/worker/pool.js";
import type { AssistanceAnswer, CheckAnswer, LoadTableCell } from "../../../src/worker/protocol.js";

export interface Call {
  kind: "plan" | "assistance" | "conditionMargins" | "loadTable" | "check";
  startCase: StartCase;
  opts: { signal?: AbortSignal; onProgress?: (f: number) => void; onRow?: (r: LoadTableRow) => void; cells?: LoadTableCell[] };
  release: (o: Outcome<unknown>) => void;
}

export interface Script {
  assistance?: (c: StartCase) => Outcome<AssistanceAnswer> | null;
  conditionMargins?: (c: StartCase) => Outcome<ConditionMargin[]> | null;
  loadTable?: (c: StartCase, cells: LoadTableCell[]) => Outcome<LoadTableRow[]> | null;
  check?: (c: StartCase) => Outcome<CheckAnswer> | null;
}

/** A pool whose answers come from `script` (null: held until the test calls `release`). */
export function fakePool(script: Script, size = 2): PlannerPool & { calls: Call[] } {
  const calls: Call[] = [];
  const call =
    (kind: Call["kind"]) =>
    (c: StartCase, opts: Call["opts"] = {}): Promise<Outcome<never>> =>
      new Promise((resolve, reject) => {
        if (opts.signal?.aborted) return reject(Object.assign(new Error("aborted"), { name: "AbortError" }));
        opts.signal?.addEventListener("abort", () => reject(Object.assign(new Error("aborted"), { name: "AbortError" })));
        const entry: Call = { kind, startCase: c, opts, release: (o) => resolve(o as Outcome<never>) };
        calls.push(entry);
        opts.onProgress?.(0);
        const f = script[kind as keyof Script] as ((c: StartCase, cells?: LoadTableCell[]) => Outcome<unknown> | null) | undefined;
        const out = f ? f(c, opts.cells) : null;
        if (out) {
          // Rows of a load table come one by one, then the answer (on a later tick, as from a worker).
          setTimeout(() => {
            if (opts.signal?.aborted) return;
            if (kind === "loadTable" && out.ok) for (const r of out.result as LoadTableRow[]) opts.onRow?.(r);
            opts.onProgress?.(1);
            resolve(out as Outcome<never>);
          }, 0);
        }
      });
  return {
    calls,
    size,
    plan: call("plan") as PlannerPool["plan"],
    assistance: call("assistance") as PlannerPool["assistance"],
    conditionMargins: call("conditionMargins") as PlannerPool["conditionMargins"],
    loadTable: call("loadTable") as PlannerPool["loadTable"],
    check: call("check") as PlannerPool["check"],
    waiting: 0,
    running: 0,
    dispose: () => undefined,
  };
}

export const ok = <T>(result: T): Outcome<T> => ({ ok: true, result, elapsedMs: 5 });

/** Twelve margins: a fixed pattern, dry best, sand better, with verdicts to match. */
export function marginRows(): ConditionMargin[] {
  const base: Record<string, number> = { dry: 1.8, damp: 0.9, wet: 1.1, frost: 0.6, leaves: 0.3, greasy: 0.4 };
  return RAIL_CONDITIONS.flatMap((rail) =>
    [false, true].map((sand): ConditionMargin => {
      const m = base[rail]! * (sand ? 1.3 : 1);
      const verdict = m >= 1.2 ? "starts" : m >= 1 ? "marginal" : "needs-assistance";
      const reasons = verdict === "starts" ? [] : (["adhesion"] as ConditionMargin["reasons"]);
      return { rail, sand, verdict, reasons, margin: m, margins: { brake: 99, adhesion: m, power: 3, coupler: 2, distance: 5 }, limitedBy: "adhesion", binding: "adhesion" };
    }),
  );
}
