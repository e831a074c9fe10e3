/**
 * The assistance check: when a train does not start (or only marginally), which added locomotives make it
 * start — at the head, at the rear, or mid-train after a wagon, one or two units: at the head in multiple
 * with the train's own (the same notch), mid-train and at the rear as remote units or a helper with their
 * own notch (groupNotches.ts). Every option is judged by the one decision (decision.ts): first by the
 * limits known before any dynamics, then by the planned start in the longitudinal dynamics; the options
 * returned carry a full, verified plan. When no option with up to two added units works and the train needs
 * assistance, the train is divided into a practical number of parts: the largest first part that starts
 * (common practice: "doubling", PRACTICE.md, Alaska Railroad manual p. 64-18 [P]).
 */
import { middleWagon, proportionalSplitWagon, withAddedUnits, leadSpec, type AddedUnits } from "./assistPlacement.js";
import { divideTrain, type DividedTrain } from "./divideTrain.js";
import { judge, planStart, quasiStaticLimits, type PlanResult } from "../planner/index.js";
import { failedSoFar } from "../planner/decision.js";
import { staticCheck } from "../planner/staticCheck.js";
import { marginalBound, plannerContext } from "../planner/context.js";
import { memoSearchPlan, withEvaluationMemo } from "../planner/evaluationMemo.js";
import { memoResumableSearch, type ResumableSearch } from "../planner/resumableSearch.js";
import type { LimitCheck } from "../planner/outcome.js";
import type { LocomotiveSpec } from "../physics/types.js";
import type { Reason, Verdict } from "../planner/outcome.js";
import type { StartCase, UnitControl } from "../train/types.js";
import type { GroupPlace } from "../planner/lines.js";

/** One way of adding units, and what the planner says of it. */
export interface AssistanceOption {
  /** The units added (all of the same profile). */
  added: AddedUnits[];
  /** Number of units added. */
  units: number;
  /** The case with the units added, as it was planned. */
  case: StartCase;
  verdict: Verdict;
  reasons: Reason[];
  /** Smallest margin (available ÷ needed) of the planned start. */
  margin: number;
  /** Largest coupler tension anywhere in the train during the planned start, N. */
  peakCouplerForceN: number;
  /** Largest coupler compression anywhere in the train, N, and the coupling (0 = behind the first vehicle). */
  peakCompressionN: number;
  peakCompressionAt: number;
  /** Largest compression in the front quarter of the train's couplings, N (shoving raises it). */
  headCompressionN: number;
  /** Seconds from taking power to the target; null when not reached. */
  timeToTargetS: number | null;
  /** What to watch with this option (e.g. shoving from the rear), as a code with its figures (words in src/i18n). */
  note: AssistanceNote;
  /**
   * How the effort is shared among the control groups in the planned start's running step (head first; one
   * entry when every unit works in the head's notch).
   */
  effortSplit: Array<{ place: GroupPlace | "all"; notch: number; share: number }>;
  /** The full plan of the option (absent for options judged only by a verdict run). */
  plan?: PlanResult;
}

/** An option that does not make the train start, with the verdict that ruled it out. */
export interface RejectedOption {
  added: AddedUnits[];
  units: number;
  verdict: Verdict;
  reasons: Reason[];
  /** "static" when the limits known before any dynamics ruled it out, "planner" when the planned start did. */
  by: "static" | "planner";
}

export interface AssistanceResult {
  /** False when the case already starts as it stands (nothing searched). */
  needed: boolean;
  /** The profile the options add. */
  spec: LocomotiveSpec;
  /** How the units added mid-train or at the rear are driven. */
  control: UnitControl;
  /** Options that make the verdict `starts`, cheapest first (fewest units, then lowest peak coupler force). */
  options: AssistanceOption[];
  rejected: RejectedOption[];
  /** The largest first part that starts with the train's own locomotives, when no option works and the train needs assistance. */
  divide: DividedTrain | null;
  /** Planner runs used (verdict runs, full plans and dividing); a candidate stopped at the ceiling counts as one. */
  plannerRuns: number;
  /**
   * Candidates whose judgement stopped early (`pruneLosers`): a limit had already failed, or the peak coupler
   * tension had passed the best options'. Not among `rejected`.
   */
  pruned: number;
  /** False when the budget ran out before every candidate was judged. */
  complete: boolean;
}

export interface AssistanceOptions {
  /** Profile to add; default the lead unit's. */
  spec?: LocomotiveSpec;
  /** How units added mid-train or at the rear are driven: remote (default) or helper (units at the head work in multiple). */
  control?: UnitControl;
  /** Most units to add (1 or 2); default 2. */
  maxUnits?: number;
  /** Most options to confirm with a full, verified plan (the options returned); default 3. */
  maxFullPlans?: number;
  /** Most planner runs for the options (verdict runs and full plans); default 16. */
  budget?: number;
  /** Most planner runs for dividing the train when no option works; default 8. */
  divideBudget?: number;
  /** Also look at two units when one already works; default false (the cheapest level only). */
  allLevels?: boolean;
  /** The case's own verdict when the caller already has it (saves a planner run); `starts` means no search. */
  baseVerdict?: Verdict;
  /** Search for a divided train when no option works and the train needs assistance; default true. */
  divide?: boolean;
  /**
   * Plans of the options (and of the divided train's first part) without what the departures check never
   * reports: the verifying re-run on the median rail and the sensitivity table. The verdicts, margins,
   * coupler forces and times are the same (they come from the decision's plan, not from those).
   */
  reportedOnly?: boolean;
  /** Whether the lightly loaded train starts, when a mass search already knows (divideTrain.ts). */
  lightestStarts?: boolean;
  /**
   * Stop judging a candidate as soon as it cannot be among the options returned: a limit has failed (the
   * verdict-only plan, decision.ts's `failedSoFar`), or its planned start's peak coupler tension has passed
   * that of the `maxFullPlans`-th best option found so far at its number of units — ranked by that peak, it
   * comes after them. Both look only at what the plan keeps (search.ts's `stopWhenFailed`), so the stop is
   * certain, and a plan that does not stop is the whole plan. The options, their plans, the divided train,
   * `plannerRuns` and `complete` are exactly those of the full ranking; `rejected` then lists only the
   * candidates judged to the end (a stopped one is counted in `pruned`). For the departures check, which
   * reports the options and not the rejections; default false (the plan and the assistance screen list every
   * rejection with its reasons).
   */
  pruneLosers?: boolean;
  shouldStop?: () => boolean;
  onProgress?: (fraction: number) => void;
}

/** A candidate placement before it is judged. */
interface Candidate {
  added: AddedUnits[];
  units: number;
  case: StartCase;
  staticPeakN: number;
}

/** The candidate placements of `units` added units (1 or 2), duplicates removed. */
export function candidatePlacements(c: StartCase, spec: LocomotiveSpec, units: number): AddedUnits[][] {
  const mid = (n: number, base: StartCase = c): AddedUnits => ({ count: n, position: { afterWagon: proportionalSplitWagon(base, spec, n) } });
  const middle = (n: number): AddedUnits => ({ count: n, position: { afterWagon: middleWagon(c) } });
  const out: AddedUnits[][] = [];
  const wagons = c.train.wagons;
  if (units === 1) {
    out.push([{ count: 1, position: "head" }], [{ count: 1, position: "rear" }]);
    if (wagons >= 2) out.push([mid(1)], [middle(1)]);
  } else {
    out.push([{ count: 2, position: "head" }], [{ count: 2, position: "rear" }]);
    if (wagons >= 2) out.push([mid(2)], [middle(2)]);
    out.push([{ count: 1, position: "head" }, { count: 1, position: "rear" }]);
    if (wagons >= 2) {
      const rear1 = withAddedUnits(c, spec, [{ count: 1, position: "rear" }]);
      out.push([mid(1, rear1), { count: 1, position: "rear" }]);
      const head1 = withAddedUnits(c, spec, [{ count: 1, position: "head" }]);
      out.push([{ count: 1, position: "head" }, mid(1, head1)]);
    }
  }
  const seen = new Set<string>();
  return out.filter((adds) => {
    const key = JSON.stringify(adds);
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}

/** Every candidate judged to the end even where `pruneLosers` is asked for (the benchmark's "before"). */
let forceFullRanking = false;

/** Judge every candidate to the end whatever the options say (true), or as asked (false, the default). */
export function setFullRanking(on: boolean): void {
  forceFullRanking = on;
}

/**
 * How `pruneLosers` ranks: the candidates planned a phase at a time, the one with the lowest peak so far
 * continued first, until the best finished ones are certain (true, the default: `rankByFloor`); or each
 * candidate planned in turn, stopped once its peak passes the best found so far (false, kept for the test and
 * the benchmark).
 */
let judgeByFloor = true;

/** Rank by the peaks so far (true, the default) or by a ceiling from the candidates planned before (false). */
export function setJudgeByFloor(on: boolean): void {
  judgeByFloor = on;
}

/**
 * The benchmark's exact-search floor: the ceiling each number of added units would have if the answer were
 * known beforehand (what a perfect ordering of the candidates costs). Null (the default): none.
 */
let knownCeiling: ((units: number) => number) | null = null;

/** Give the ceiling of every level beforehand (the benchmark only), or take it away (null). */
export function setKnownCeiling(ceiling: ((units: number) => number) | null): void {
  knownCeiling = ceiling;
}

/** Search for assistance. Throws the planner's "cancelled" error when `shouldStop` says so. */
export function searchAssistance(c: StartCase, opts: AssistanceOptions = {}): AssistanceResult {
  // Pruning judges a candidate first with a ceiling and then, if it is not stopped, by the same plan: shared.
  if (opts.pruneLosers && !forceFullRanking) return withEvaluationMemo(() => search(c, opts, true));
  return search(c, opts, false);
}

function search(c: StartCase, opts: AssistanceOptions, prune: boolean): AssistanceResult {
  const spec = opts.spec ?? leadSpec(c);
  const control = opts.control ?? "remote";
  const maxUnits = Math.max(1, Math.min(2, opts.maxUnits ?? 2));
  const budget = opts.budget ?? 16;
  const maxFull = opts.maxFullPlans ?? 3;
  const stop = opts.shouldStop;
  const planOpts = stop ? { shouldStop: stop } : {};
  let runs = 0;
  let pruned = 0;
  let complete = true;
  const result: AssistanceResult = { needed: true, spec, control, options: [], rejected: [], divide: null, plannerRuns: 0, pruned: 0, complete: true };

  let base = opts.baseVerdict;
  if (base === undefined) {
    base = judge(c, stop ? { shouldStop: stop } : {}).verdict;
    runs++;
  }
  if (base === "starts") return { ...result, needed: false, plannerRuns: runs };
  const bound = marginalBound(c.settings);

  for (let units = 1; units <= maxUnits; units++) {
    if (result.options.length > 0 && !opts.allLevels) break;
    const candidates = candidatePlacements(c, spec, units).map((added) => candidateOf(c, spec, added, units, control));
    // Screen: a start needs its quasi-static limits within before any dynamics can make it start.
    const screened: Candidate[] = [];
    for (const k of candidates) {
      const qs = quasiStaticLimits(plannerContext(k.case), bound).limits;
      if (!qs.every((l) => l.level === "within")) result.rejected.push({ added: k.added, units, ...ruledOut(qs), by: "static" });
      else screened.push({ ...k, staticPeakN: staticCheck(k.case).peakTensionN });
    }
    // Verdict runs, easiest on the couplers first, so a short budget keeps the likeliest options; one run is
    // kept back for the full plan of an option that passes.
    screened.sort((a, b) => a.staticPeakN - b.staticPeakN);
    const passing: Array<{ k: Candidate; peakN: number }> = [];
    const byFloor = prune && judgeByFloor && !knownCeiling;
    if (byFloor) {
      // The candidates the budget judges are the same as below, each counted as one run.
      const judged: Candidate[] = [];
      for (const k of screened) {
        if (runs >= budget - 1) {
          complete = false;
          break;
        }
        runs++;
        judged.push(k);
      }
      const r = rankByFloor(judged, units, maxFull, planOpts, result.rejected);
      passing.push(...r.passing);
      pruned += r.pruned;
    }
    for (const k of byFloor ? [] : screened) {
      if (runs >= budget - 1) {
        complete = false;
        break;
      }
      runs++;
      // Pruning: a candidate stops once a limit fails, and once `maxFull` options pass, when its peak passes the
      // worst of the best `maxFull` (it ranks behind them all; a tie is kept and sorted as before).
      if (prune) {
        const ctx = plannerContext(k.case);
        const ceilingN = knownCeiling ? knownCeiling(units) : passing.length >= maxFull ? passing.map((x) => x.peakN).sort((a, b) => a - b)[maxFull - 1]! : Infinity;
        const fails = failedSoFar(ctx, "within");
        const failed = (p: Parameters<typeof fails>[0]) => fails(p) || p.branch.peakTensionN() > ceilingN;
        const r = memoSearchPlan(ctx, { ...planOpts, stopWhenFailed: { key: `within, peak to ${ceilingN} N`, failed } });
        if (r.stoppedEarly) {
          pruned++;
          continue;
        }
      }
      // (After a search the ceiling did not stop, the judgement takes that very plan from the memo.)
      const d = judge(k.case, { depth: "starts", ...planOpts });
      if (d.verdict === "starts") passing.push({ k, peakN: d.threshold.search?.branch.peakTensionN() ?? 0 });
      else result.rejected.push({ added: k.added, units, ...ruledOut(d.limits), by: "planner" });
    }
    opts.onProgress?.(units / (maxUnits + 1));
    // Full, verified plans, lowest coupler force (in the verdict run) first, until `maxFull` are confirmed.
    passing.sort((a, b) => a.peakN - b.peakN);
    let confirmed = 0;
    for (const { k } of passing) {
      if (confirmed >= maxFull) break;
      if (runs >= budget) {
        complete = false;
        break;
      }
      const p = planStart(k.case, { ...planOpts, skipMassSearch: true, ...(opts.reportedOnly ? { skipVerification: true, skipSensitivity: true } : {}) });
      runs++;
      if (p.verdict === "starts") {
        result.options.push(optionOf(k, p));
        confirmed++;
      } else result.rejected.push({ added: k.added, units, verdict: p.verdict, reasons: p.reasons, by: "planner" });
    }
  }
  result.options.sort((a, b) => a.units - b.units || a.peakCouplerForceN - b.peakCouplerForceN);

  if (result.options.length === 0 && opts.divide !== false && base === "needs-assistance") {
    result.divide = divideTrain(c, { budget: opts.divideBudget ?? 8, ...(opts.reportedOnly ? { reportedOnly: true } : {}), ...(opts.lightestStarts !== undefined ? { lightestStarts: opts.lightestStarts } : {}), ...(stop ? { shouldStop: stop } : {}) });
    runs += result.divide.plannerRuns;
  }
  opts.onProgress?.(1);
  return { ...result, plannerRuns: runs, pruned, complete };
}

/**
 * The best `maxFull` of `judged` (all of `units` added units, in the order a short budget keeps them), ranked
 * as the full ranking ranks them — by the peak coupler tension of their planned starts, a tie to the earlier —
 * without planning every one to the end. Each is planned a phase at a time (resumableSearch.ts),
 * always the one with the lowest peak so far next (the earlier on a tie): a peak so far is a floor of the
 * finished plan's, as peaks only grow along a plan. A candidate is dropped once a limit has failed
 * (decision.ts's `failedSoFar`: it cannot start), or once `maxFull` finished candidates that start rank ahead
 * of anything it can still become: the `maxFull`-th best's peak below its floor, or equal to it and earlier.
 * So the ones that start and are kept are the full ranking's first `maxFull`, with the same peaks; a finished
 * search goes to the memo, and the judgement takes that very plan. `rejected` gets the candidates finished
 * that do not start, as the full ranking lists them.
 */
function rankByFloor(judged: readonly Candidate[], units: number, maxFull: number, planOpts: { shouldStop?: () => boolean }, rejected: RejectedOption[]): { passing: Array<{ k: Candidate; peakN: number }>; pruned: number } {
  interface Open {
    k: Candidate;
    index: number;
    search: ResumableSearch;
  }
  const open: Open[] = judged.map((k, index) => {
    const ctx = plannerContext(k.case);
    return { k, index, search: memoResumableSearch(ctx, { ...planOpts, stopWhenFailed: { key: "within", failed: failedSoFar(ctx, "within") } }) };
  });
  const passing: Array<{ k: Candidate; peakN: number; index: number }> = [];
  const ahead = (a: { peakN: number; index: number }, b: { peakN: number; index: number }) => a.peakN - b.peakN || a.index - b.index;
  let pruned = 0;
  for (;;) {
    // The finished: stopped once a limit failed (dropped), or judged by the decision from the memo's plan.
    for (let j = open.length - 1; j >= 0; j--) {
      const o = open[j]!;
      const r = o.search.result;
      if (!r) continue;
      open.splice(j, 1);
      if (r.stoppedEarly) {
        pruned++;
        continue;
      }
      const d = judge(o.k.case, { depth: "starts", ...planOpts });
      if (d.verdict === "starts") passing.push({ k: o.k, peakN: d.threshold.search?.branch.peakTensionN() ?? 0, index: o.index });
      else rejected.push({ added: o.k.added, units, ...ruledOut(d.limits), by: "planner" });
    }
    passing.sort(ahead);
    // Dropped: the unfinished that rank behind the `maxFull`-th best finished, whatever the rest of their plans.
    if (passing.length >= maxFull) {
      const last = passing[maxFull - 1]!;
      for (let j = open.length - 1; j >= 0; j--) {
        if (ahead(last, { peakN: open[j]!.search.floorN(), index: open[j]!.index }) < 0) {
          open.splice(j, 1);
          pruned++;
        }
      }
    }
    if (open.length === 0) break;
    let next = open[0]!;
    for (const o of open) if (ahead({ peakN: o.search.floorN(), index: o.index }, { peakN: next.search.floorN(), index: next.index }) < 0) next = o;
    next.search.continueSearch();
  }
  // In the order the full ranking sorts them (by peak, stable over the budget's order).
  return { passing: passing.map(({ k, peakN }) => ({ k, peakN })), pruned };
}

/** A verdict and its reasons from the threshold's limits of a start judged only as far as "starts". */
function ruledOut(limits: readonly LimitCheck[]): { verdict: Verdict; reasons: Reason[] } {
  const failing = limits.filter((l) => l.level !== "within");
  const over = failing.filter((l) => l.level === "over");
  const deciding = over.length > 0 ? over : failing;
  return { verdict: over.length > 0 ? "needs-assistance" : "marginal", reasons: [...new Set(deciding.map((l) => l.reason))] };
}

function candidateOf(c: StartCase, spec: LocomotiveSpec, added: AddedUnits[], units: number, control: UnitControl): Candidate {
  return { added, units, case: withAddedUnits(c, spec, added, control), staticPeakN: 0 };
}

function optionOf(k: Candidate, p: PlanResult): AssistanceOption {
  const comp = p.couplerCompressionPeaksN;
  let at = 0;
  for (let j = 1; j < comp.length; j++) if (comp[j]! > comp[at]!) at = j;
  const front = Math.max(1, Math.ceil(comp.length / 4));
  let head = 0;
  for (let j = 0; j < front && j < comp.length; j++) head = Math.max(head, comp[j]!);
  return {
    added: k.added,
    units: k.units,
    case: k.case,
    verdict: p.verdict,
    reasons: p.reasons,
    margin: p.margin,
    peakCouplerForceN: p.peakCouplerForceN,
    peakCompressionN: comp.length > 0 ? comp[at]! : 0,
    peakCompressionAt: at,
    headCompressionN: head,
    timeToTargetS: p.timeToTargetS,
    note: noteOf(k.added, comp.length, at, comp.length > 0 ? comp[at]! : 0, controlOfAdded(k.case, k.added)),
    effortSplit: effortSplitOf(p),
    plan: p,
  };
}

/** How the added units mid-train or at the rear are driven (as the option's case has them). */
function controlOfAdded(c: StartCase, added: readonly AddedUnits[]): UnitControl {
  const pushing = c.locomotives.slice(c.locomotives.length - added.length).find((g) => g.position !== "head");
  return pushing?.control ?? "with-head";
}

/** The effort split of the plan's last power step: each control group's notch and share (one group: all of it). */
function effortSplitOf(p: PlanResult): AssistanceOption["effortSplit"] {
  const last = [...p.steps].reverse().find((s) => s.notch > 0 || (s.groups ?? []).some((g) => g.notch > 0));
  if (!last) return [];
  if (!last.groups) return [{ place: "all", notch: last.notch, share: 1 }];
  return last.groups.map((g) => ({ place: g.place, notch: g.notch, share: g.effortShare }));
}

/**
 * What to watch with an option: all power at the head (the head couplings carry the whole pull), or units
 * pushing — how they are driven, the peak compression and where, and when shoving from the rear, lateral
 * forces on curves with light wagons near the head.
 */
export type AssistanceNote =
  | { code: "all-at-head" }
  | {
      code: "pushing";
      added: AddedUnits[];
      control: UnitControl;
      /** Third of the train where the peak compression is (null without couplings). */
      where: "head" | "mid" | "rear" | null;
      peakN: number;
      /** The coupling of the peak, from 1, of `couplings`. */
      coupling: number;
      couplings: number;
      rear: boolean;
    };

/**
 * What to watch: pushing units put the couplings ahead of them in compression; shoving from the rear risks
 * lateral forces at the head of the train, especially with light wagons there [P: Alaska Railroad, Air Brake
 * and Train Handling Manual, 1996, §64.8].
 */
function noteOf(added: readonly AddedUnits[], couplings: number, at: number, peakN: number, control: UnitControl): AssistanceNote {
  const pushing = added.some((a) => a.position !== "head");
  if (!pushing) return { code: "all-at-head" };
  const where = couplings > 0 ? (at < couplings / 3 ? "head" : at < (2 * couplings) / 3 ? "mid" : "rear") : null;
  return { code: "pushing", added: added.map((a) => ({ ...a })), control, where, peakN, coupling: at + 1, couplings, rear: added.some((a) => a.position === "rear") };
}
