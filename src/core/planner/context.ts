/**
 * What the planner knows about a case before it simulates anything: the static check, the forces on the
 * standing train, whether it would roll back, the limits it must respect and the notch it can hold with.
 */
import { adhesionSpeedFactor, slipRisk, standstillMedian } from "../physics/adhesion.js";
import { buildConsist, type Consist } from "../train/consist.js";
import { standingForces, type StandingForces } from "../train/standing.js";
import { staticCheckOf, type StaticCheck } from "./staticCheck.js";
import { modelFromCase, trainBrakeReleaseS, type TrainModel } from "../train/trainModel.js";
import { notchTargetN } from "../dynamics/runner.js";
import type { StartCase } from "../train/types.js";

export interface PlannerContext {
  c: StartCase;
  consist: Consist;
  forces: StandingForces;
  st: StaticCheck;
  model: TrainModel;
  sigmaLn: number;
  /** Median standstill adhesion of each unit (sand included where fitted and used). */
  mu0Median: Float64Array;
  /** Highest slip risk a step may carry: the threshold, or what starting needs when the start is marginal. */
  riskCap: number;
  /** Peak coupler force the plan must keep under, N. */
  couplerAllowanceN: number;
  /** Net force pulling the released train backwards (grade less what holds it), N; ≤ 0 when it would not roll back. */
  rollBackPullN: number;
  /** Net force pulling the released train forwards down a falling grade, N; ≤ 0 when it would stand. */
  runAwayPullN: number;
  /** Time for the train-brake release to reach the rear and the rear brake to come off, s. */
  releaseS: number;
  maxNotch: number;
  trainMassKg: number;
}

/** Notch settling: the effort lag's time constant ×3 and never under the 2–3 s practice minimum. */
export const MIN_NOTCH_DWELL_S = 3;

export function plannerContext(c: StartCase): PlannerContext {
  const consist = buildConsist(c);
  const forces = standingForces(consist, c.location.track);
  const st = staticCheckOf(c, consist, forces);
  const model = modelFromCase(c);
  const cond = c.adhesion[c.conditions.rail];
  const mu0Median = Float64Array.from(model.locoSpecs.map((s) => standstillMedian(cond, c.conditions.sand && s.sanders)));
  let grade = 0;
  let hold = 0;
  for (let i = 0; i < forces.gradeN.length; i++) {
    grade += forces.gradeN[i]!;
    hold += forces.breakawayN[i]! + forces.curveN[i]!;
  }
  const threshold = c.settings.slipRiskThreshold;
  const maxNotch = Math.min(...model.locoSpecs.map((s) => s.notchPower.length));
  return {
    c,
    consist,
    forces,
    st,
    model,
    sigmaLn: cond.sigmaLn,
    mu0Median,
    // A marginal start may carry the risk that starting itself needs, never more than even odds.
    riskCap: Math.min(0.5, Math.max(threshold, st.slipRiskAtStart + 0.005)),
    couplerAllowanceN: c.train.couplerLimitN / c.settings.couplerSafetyFactor,
    rollBackPullN: grade - hold,
    runAwayPullN: -grade - hold,
    releaseS: trainBrakeReleaseS(consist.lengthM),
    maxNotch,
    trainMassKg: consist.vehicles.reduce((s, v) => s + v.massKg, 0),
  };
}

/** Σ effort all units ask for in a notch at a speed, N. */
export function notchEffortAllN(ctx: PlannerContext, notch: number, speedMps: number): number {
  let f = 0;
  for (let k = 0; k < ctx.model.nl; k++) f += notchTargetN(ctx.model, k, notch, speedMps);
  return f;
}

/** Slip risk and adhesion use of a notch at a speed (worst unit, median adhesion). */
export function notchAdhesion(ctx: PlannerContext, notch: number, speedMps: number): { risk: number; use: number } {
  const m = ctx.model;
  let risk = 0;
  let use = 0;
  const factor = adhesionSpeedFactor(speedMps);
  for (let k = 0; k < m.nl; k++) {
    const demandMu = notchTargetN(m, k, notch, speedMps) / m.adhesiveWeightN[k]!;
    const mu = ctx.mu0Median[k]! * factor;
    risk = Math.max(risk, slipRisk(demandMu, mu, ctx.sigmaLn));
    use = Math.max(use, demandMu / mu);
  }
  return { risk, use };
}

/** Lowest notch whose effort at standstill holds the train against rolling back (with 10 % in hand). */
export function holdingNotch(ctx: PlannerContext): number {
  if (ctx.rollBackPullN <= 0) return 0;
  for (let n = 1; n <= ctx.maxNotch; n++) {
    if (notchEffortAllN(ctx, n, 0) >= 1.1 * ctx.rollBackPullN && notchAdhesion(ctx, n, 0).risk <= ctx.riskCap) return n;
  }
  return -1;
}
