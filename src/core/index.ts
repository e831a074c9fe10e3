/** The one public surface of the calculation core: pure TypeScript, SI inside, no I/O. */
export * from "./constants.js";
export * from "./units.js";
export * from "./types.js";
export * from "./normal.js";
export * from "./resistance.js";
export * from "./adhesion.js";
export * from "./traction.js";
export * from "./track.js";
export * from "./coupling.js";
export * from "./consist.js";
export * from "./slack.js";
export * from "./standing.js";
export * from "./staticCheck.js";
export * from "./startableMass.js";
export * from "./rating.js";
export * from "./cautions.js";
