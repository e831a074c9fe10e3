/**
 * The shape of the planner's view of a case (context.ts builds it): kept apart so that modules the context
 * itself uses can name it without an import circle.
 */
import type { Consist } from "../train/consist.js";
import type { StandingForces } from "../train/standing.js";
import type { StaticCheck } from "./staticCheck.js";
import type { TrainModel } from "../train/trainModel.js";
import type { StartCase } from "../train/types.js";
import type { StartKind } from "./outcome.js";

/**
 * What the planner knows about a case before it simulates anything: the static figures, the forces on the
 * standing train, whether it would roll back or run away when released, the limits it must respect, the
 * rail it plans on (a quantile of the rail condition) and the notch it can hold with.
 */
export interface PlannerContext {
  c: StartCase;
  consist: Consist;
  forces: StandingForces;
  st: StaticCheck;
  /** The dynamics model, with each unit's adhesion at the quantile the plan is made for. */
  model: TrainModel;
  /** Quantile of the rail condition the plan assumes (the slip-risk threshold, or the marginal bound). */
  quantile: number;
  sigmaLn: number;
  /** Median standstill adhesion of each unit (sand included where fitted and used): slip risks are read against it. */
  mu0Median: Float64Array;
  /** Highest slip risk a notch may carry without being needed: the case's threshold. */
  threshold: number;
  /** Peak coupler force the plan must keep under, N. */
  couplerAllowanceN: number;
  /** Peak coupler compression the plan must keep under, N (the buff working limit ÷ the safety factor). */
  buffAllowanceN: number;
  /**
   * The wheel-climb check (physics/wheelClimb.ts): made when units push (any unit behind the head) or the
   * train is mixed. Per coupling, L/V of its lighter-loaded neighbour per newton of buff per 1/radius, and
   * which vehicle that is.
   */
  wheelClimb: { active: boolean; allowance: number; ratioPerNPerInvR: Float64Array; vehicle: Int32Array };
  /** Curve radius of each track segment, m (0 straight). */
  segRadiusM: Float64Array;
  /** Highest notch of each control group (group 0: the head's, = `maxNotch`). */
  groupMaxNotch: number[];
  /** The standing train's settings level by level (groupNotches.ts `powerLadder`), built when first needed. */
  ladder: Int32Array[] | null;
  /** Track segment of each vehicle where the train stands. */
  standingSeg: Int32Array;
  /** Work arrays, one entry per vehicle. */
  scratch: Float64Array;
  scratchEffort: Float64Array;
  /** Net force pulling the released train backwards (grade less what holds it), N; ≤ 0 when it would not roll back. */
  rollBackPullN: number;
  /** Net force pulling the released train forwards down a falling grade, N; ≤ 0 when it would stand. */
  runAwayPullN: number;
  /** What the locomotive brakes of all units hold, N. */
  locoBrakeN: number;
  /** What the train brake holds, fully applied, N. */
  trainBrakeN: number;
  startKind: StartKind;
  /** On a falling grade: the locomotive brake alone (with 10 % in hand) holds the released train. */
  locoBrakeHolds: boolean;
  /** Time for the train-brake release to reach the rear and the rear brake to come off, s. */
  releaseS: number;
  maxNotch: number;
  trainMassKg: number;
  effMassKg: number;
  /** Slowest acceleration that still reaches the target in time, m/s² (need.ts). */
  aMinMps2: number;
}
