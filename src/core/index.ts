/**
 * The one public surface of the calculation core: pure TypeScript, SI inside, no I/O. Its folders, lowest
 * first — each imports only from itself and the folders before it (tests/architecture checks this):
 * physics ← train ← dynamics ← planner ← dispatch.
 */
export * from "./physics/index.js";
export * from "./train/index.js";
export * from "./dynamics/index.js";
export * from "./planner/index.js";
export * from "./dispatch/index.js";
