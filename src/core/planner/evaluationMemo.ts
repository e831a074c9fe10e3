/**
 * Plans already made, kept for the length of one piece of work (a departure's check with its assistance and
 * mass searches, a plan with its mass search). The searches of that work judge the same train on the same
 * rail more than once — the verdict run of an assistance option and its full plan, the lightest train of the
 * dividing search and the mass search's floor, the threshold's plan at a mass both mass searches try — and a
 * plan depends on nothing but the case and the rail quantile (the search is deterministic), so the second
 * judgement takes the first one's plan instead of running the dynamics again. Exact: the same plan, the same
 * figures.
 *
 * Scoped, not global: a plan's series may be handed to another thread (transferred, which empties them here),
 * so nothing is kept once the work that asked for the memo returns.
 */
import type { PlannerContext } from "./context.js";
import { searchPlan, type SearchOptions, type SearchResult } from "./search.js";
import { lumpedWagons } from "../train/lumped.js";

/** Plans kept at most (oldest dropped first): a check with its searches makes a few dozen. */
const MAX_ENTRIES = 48;

let active: Map<string, SearchResult> | null = null;
let hits = 0;

/** Run `work` with plans shared between its judgements (joins the memo of an enclosing call). */
export function withEvaluationMemo<T>(work: () => T): T {
  if (active) return work();
  active = new Map();
  try {
    return work();
  } finally {
    active = null;
  }
}

/**
 * The plan of a context: from the memo when the same case on the same rail was planned in this work. A
 * verdict-only plan (`stopWhenFailed`) is kept under its check's key and answers only that check; a whole plan
 * answers every request (a verdict-only one that never stopped is a whole plan).
 */
export function memoSearchPlan(ctx: PlannerContext, opts: SearchOptions = {}): SearchResult {
  if (!active) return searchPlan(ctx, opts);
  const { known, keep } = memoEntry(ctx, opts);
  if (known) return known;
  const r = searchPlan(ctx, opts);
  keep(r);
  return r;
}

/**
 * The memo's answer for a plan of a context (`known`, counted as a hit), or how to keep the plan once made
 * (`keep`: a whole plan under the case's key, one stopped by `stopWhenFailed` under its check's; nothing
 * outside a memo). For searches run a phase at a time (resumableSearch.ts).
 */
export function memoEntry(ctx: PlannerContext, opts: SearchOptions = {}): { known: SearchResult | undefined; keep: (r: SearchResult) => void } {
  const memo = active;
  if (!memo) return { known: undefined, keep: () => {} };
  const key = keyOf(ctx);
  const stopKey = opts.stopWhenFailed ? `${opts.stopWhenFailed.key}|${key}` : null;
  const known = memo.get(key) ?? (stopKey !== null ? memo.get(stopKey) : undefined);
  if (known) hits++;
  return { known, keep: (r) => keep(memo, r.stoppedEarly && stopKey !== null ? stopKey : key, r) };
}

function keyOf(ctx: PlannerContext): string {
  // A plan of lumped wagons (a search's guide, startableMass.ts) is kept apart from the full model's.
  const lump = lumpedWagons();
  return `${lump > 1 ? `lumped ${lump}|` : ""}${ctx.quantile}|${JSON.stringify(ctx.c)}`;
}

function keep(memo: Map<string, SearchResult>, key: string, r: SearchResult): void {
  if (memo.size >= MAX_ENTRIES) memo.delete(memo.keys().next().value!);
  memo.set(key, r);
}

/** Judgements answered from the memo since the process started (for the benchmark). */
export function evaluationMemoHits(): number {
  return hits;
}
