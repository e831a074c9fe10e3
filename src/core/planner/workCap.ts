/**
 * The work one plan may take, said before it starts. The dynamics integrate every vehicle at a fixed step
 * that the lightest vehicle and the stiffest coupling set (`stableTimeStep`), over at most the planner's
 * phase caps of simulated time, so a plan's work is bounded by vehicles × steps. A case whose bound is
 * beyond the cap (a wagon of a few kilograms shrinks the step a thousandfold) is refused with a message
 * rather than run for hours: as data (a code with its figures), so the command line, the app and the planner workers can all say it.
 */
import { modelFromCase, stableTimeStep } from "../train/trainModel.js";
import type { StartCase } from "../train/types.js";
import { ACCELERATE_MAX_S, STRETCH_MAX_S } from "./search.js";

/** Simulated time one planner pass may cover at most: the stretch and the acceleration caps, s. */
export const PLAN_SIMULATED_MAX_S = STRETCH_MAX_S + ACCELERATE_MAX_S;

/**
 * Vehicle-steps one planner pass may take. Every train the file schemas admit stays below it (408
 * vehicles of at least 5 t each come to some 1.7 × 10⁸, tests/cli/hostile.test.ts), with room for the
 * planner's own lighter probes of the mass search (down to 1 t a wagon).
 */
export const PLAN_WORK_CAP_VEHICLE_STEPS = 5e8;

export interface PlanWork {
  vehicles: number;
  /** The integrator's step for this train, s. */
  stepS: number;
  /** The lightest vehicle's mass, kg. */
  lightestKg: number;
  /** Vehicles × steps over the longest simulated start. */
  vehicleSteps: number;
}

/** The bound on one planner pass's work for a case. */
export function planWork(c: StartCase): PlanWork {
  const m = modelFromCase(c);
  const stepS = stableTimeStep(m);
  let lightestKg = Infinity;
  for (let i = 0; i < m.n; i++) lightestKg = Math.min(lightestKg, m.massKg[i]!);
  const steps = stepS > 0 ? Math.ceil(PLAN_SIMULATED_MAX_S / stepS) : Infinity;
  return { vehicles: m.n, stepS, lightestKg, vehicleSteps: m.n * steps };
}

/** Why a case would take more work than a plan may: its work and the cap, in vehicle-steps (words: src/i18n/renderReaders.ts). */
export interface PlanWorkProblem extends PlanWork {
  code: "work-cap";
  /** The cap it exceeds, vehicle-steps. */
  capVehicleSteps: number;
}

/** Why a case would take more work than a plan may, or undefined when it is within the cap. */
export function planWorkProblem(c: StartCase, cap = PLAN_WORK_CAP_VEHICLE_STEPS): PlanWorkProblem | undefined {
  const w = planWork(c);
  if (w.vehicleSteps <= cap) return undefined;
  return { code: "work-cap", ...w, capVehicleSteps: cap };
}
