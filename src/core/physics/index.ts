/** Physics: one vehicle in SI — units and constants with their sources, resistance, adhesion, traction, track, coupling law. Imports nothing outside this folder. */
export * from "./constants.js";
export * from "./units.js";
export * from "./types.js";
export * from "./normal.js";
export * from "./resistance.js";
export * from "./adhesion.js";
export * from "./traction.js";
export * from "./track.js";
export * from "./coupling.js";
export * from "./brakes.js";
