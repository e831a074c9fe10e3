/** The dispatcher's questions asked of the planner: verdict per rail condition, load table, assistance and its placement, dividing the train, tonnage ratings. Imports every other core folder. */
export * from "./rating.js";
export * from "./loadTable.js";
export * from "./conditionMargins.js";
export * from "./assistPlacement.js";
export * from "./assistance.js";
export * from "./divideTrain.js";
export * from "./recording.js";
export * from "./reviewFit.js";
export * from "./reviewSlips.js";
export * from "./startReview.js";
