/**
 * The verdict: starts, marginal or needs assistance, with the reasons — the static limits (adhesion,
 * power, coupler, distance) combined with what the simulated plan showed.
 */
import type { Reason, Verdict } from "./outcome.js";
import type { PlannerContext } from "./context.js";
import type { SearchResult } from "./search.js";

type Level = 0 | 1 | 2;

export interface PlanVerdict {
  verdict: Verdict;
  reasons: Reason[];
  margins: { adhesion: number; power: number; coupler: number; distance: number };
  margin: number;
}

const MAX_MARGIN = 99;
const ratio = (available: number, needed: number): number => (needed <= 0 ? MAX_MARGIN : Math.min(MAX_MARGIN, available / needed));

export function planVerdict(ctx: PlannerContext, r: SearchResult, verificationFailed: { slip: boolean; coupler: boolean }, riskRelaxed = false): PlanVerdict {
  const st = ctx.st;
  const levels = new Map<Reason, Level>([
    ["adhesion", levelOf(st.reasons.includes("adhesion") ? st.verdict : "starts")],
    ["power", levelOf(st.reasons.includes("power") ? st.verdict : "starts")],
    ["coupler", levelOf(st.reasons.includes("coupler") ? st.verdict : "starts")],
    ["distance", levelOf(st.reasons.includes("distance") ? st.verdict : "starts")],
  ]);
  const raise = (reason: Reason, level: Level) => {
    if (level > (levels.get(reason) ?? 0)) levels.set(reason, level);
  };
  const powerLimited = st.margins.power < st.margins.adhesion;
  // The plan needed a step with more slip risk than the threshold.
  if (riskRelaxed) raise("adhesion", 1);
  if (r.failure === "cannot-hold" || r.failure === "cannot-start") raise(powerLimited ? "power" : "adhesion", 2);
  const peak = r.branch.peakTensionN();
  const limit = ctx.c.train.couplerLimitN;
  if (r.failure === null) {
    if (peak > limit) raise("coupler", 2);
    else if (peak > ctx.couplerAllowanceN) raise("coupler", 1);
    const stretchTravel = r.branch.run.locoTravelToStretchM;
    if (stretchTravel !== null && stretchTravel > ctx.c.location.clearAheadM) raise("distance", 2);
    // Getting the train moving and built up must fit in the distance clear ahead; reaching the target
    // speed beyond it is shown in the steps but is not a starting problem.
    const built = buildTravelM(r);
    if (built !== null && built > ctx.c.location.clearAheadM) raise("distance", 1);
    if (r.targetReachedS === null) raise(r.adhesionCapped && !powerLimited ? "adhesion" : "power", r.stalled ? 2 : 1);
    if (verificationFailed.slip) raise("adhesion", 1);
    if (verificationFailed.coupler) raise("coupler", 1);
  }
  const worst = Math.max(...levels.values()) as Level;
  const verdict: Verdict = worst === 2 ? "needs-assistance" : worst === 1 ? "marginal" : "starts";
  const reasons = [...levels.entries()].filter(([, l]) => l === worst && l > 0).map(([reason]) => reason);
  const margins = {
    adhesion: st.margins.adhesion,
    power: st.margins.power,
    coupler: r.failure === null ? Math.min(st.margins.coupler, ratio(ctx.couplerAllowanceN, peak)) : st.margins.coupler,
    distance: ratio(ctx.c.location.clearAheadM, buildTravelM(r) ?? r.branch.run.locoTravelToStretchM ?? st.stretchTravelM),
  };
  return { verdict, reasons, margins, margin: Math.min(margins.adhesion, margins.power, margins.coupler) };
}

/** Locomotive travel when the build phase ended, m. */
function buildTravelM(r: SearchResult): number | null {
  const steps = r.branch.steps;
  if (r.buildEndS === null) return null;
  let travel: number | null = null;
  for (const s of steps) if (s.startS <= r.buildEndS + 1e-9) travel = s.startS === r.buildEndS ? s.startTravelM : s.endS <= r.buildEndS ? s.endTravelM : s.startTravelM;
  return travel;
}

function levelOf(v: Verdict): Level {
  return v === "needs-assistance" ? 2 : v === "marginal" ? 1 : 0;
}
