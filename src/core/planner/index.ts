/**
 * The start planner: the static check, the search for a notch sequence and its verdict, the cautions,
 * the slip card and the sensitivity that go with a plan. Imports physics, train and dynamics.
 */
export * from "./outcome.js";
export * from "./types.js";
export * from "./staticCheck.js";
export * from "./startableMass.js";
export * from "./cautions.js";
export * from "./sensitivity.js";
export * from "./slip.js";
export * from "./plan.js";
export * from "./decision.js";
export * from "./need.js";
export { isCancelled, brakeSchedule } from "./search.js";
export { marginalBound, plannerContext } from "./context.js";
export type { PlannerContext } from "./context.js";
export * from "./workCap.js";
export * from "./sequenceRun.js";
