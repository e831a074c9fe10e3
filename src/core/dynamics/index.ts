/** Longitudinal dynamics: the chain's state and its step, the run that records it, and the simulation over a notch schedule. Imports physics and train. */
export * from "./dynamics.js";
export * from "./runner.js";
export * from "./simulate.js";
