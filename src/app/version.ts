/** The program version, from package.json at build time (vite's `define`); "dev" when run without a build (tests). */
declare const __TAUT_VERSION__: string | undefined;

export const APP_VERSION: string = typeof __TAUT_VERSION__ === "string" ? __TAUT_VERSION__ : "dev";
