/**
 * A plan search run a phase at a time, for a ranking that plans several candidates side by side and leaves the
 * losers unfinished (dispatch/assistance.ts): the search's own code (search.ts's `searchPhases`), paused
 * between control intervals, so a search resumed to its end is the search run in one go. Kept apart from
 * search.ts so the app's first plan does not load it.
 */
import type { PlannerContext } from "./context.js";
import { memoEntry } from "./evaluationMemo.js";
import { searchPhases, type PlanSoFar, type SearchOptions, type SearchResult } from "./search.js";

/**
 * A search that can be run a phase at a time (`continueSearch`) and left unfinished: it pauses once the
 * stretch is chosen, once the build is over, and every `ACCELERATE_SLICE_TICKS` control intervals of the
 * accelerate phase — each time on the plan's own line, so the peak coupler tension so far is a floor of the
 * finished plan's (it only grows along a plan). Resumed to the end it is the search run in one go, every step
 * and figure (the same code, paused between ticks).
 */
export class ResumableSearch {
  private readonly phases: Generator<PlanSoFar, SearchResult, void> | null;
  /** The plan's line at the last pause (null before the first phase, and once finished). */
  soFar: PlanSoFar | null = null;
  /** The finished search (null until then). */
  result: SearchResult | null;

  constructor(ctx: PlannerContext, opts: SearchOptions = {}, finished: SearchResult | null = null) {
    this.result = finished;
    this.phases = finished ? null : searchPhases(ctx, opts);
  }

  /** Largest coupler tension the plan has reached so far, N: no more than the finished plan's. */
  floorN(): number {
    if (this.result) return this.result.branch.peakTensionN();
    return this.soFar ? this.soFar.branch.peakTensionN() : 0;
  }

  /** Run the next phase (or slice); the finished search once it ends, else null. */
  continueSearch(): SearchResult | null {
    if (this.result) return this.result;
    const r = this.phases!.next();
    if (r.done) {
      this.result = r.value;
      this.soFar = null;
      this.onFinished?.(r.value);
      return r.value;
    }
    this.soFar = r.value;
    return null;
  }

  /** Called once when the search finishes (the memo keeps the plan: evaluationMemo.ts). */
  onFinished: ((r: SearchResult) => void) | null = null;
}

/**
 * A search of a context to be run a phase at a time, shared with the evaluation memo as `memoSearchPlan` is
 * (evaluationMemo.ts): already finished when the memo holds a plan that answers it, and once run to its end
 * kept there (a whole plan under the case's key, one stopped by `stopWhenFailed` under its check's), so a
 * later judgement of the same case on the same rail takes it and nothing is planned twice. A search left
 * unfinished keeps nothing.
 */
export function memoResumableSearch(ctx: PlannerContext, opts: SearchOptions = {}): ResumableSearch {
  const entry = memoEntry(ctx, opts);
  if (entry.known) return new ResumableSearch(ctx, opts, entry.known);
  const s = new ResumableSearch(ctx, opts);
  s.onFinished = entry.keep;
  return s;
}
