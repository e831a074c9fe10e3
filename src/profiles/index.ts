/** The boundary between files and the core: schemas, parsing, conversion to SI, the built-in library. */
export * from "./issues.js";
export * from "./schemas.js";
export * from "./parse.js";
export * from "./convert.js";
export * from "./library.js";
export * from "./report.js";
export * from "./assistanceReport.js";
