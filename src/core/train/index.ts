/** The train placed on its track: the start case, the consist, standing forces, slack state, and the model the integrator runs. Imports physics. */
export * from "./types.js";
export * from "./consist.js";
export * from "./slack.js";
export * from "./standing.js";
export * from "./trainModel.js";
