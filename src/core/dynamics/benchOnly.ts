/**
 * The benchmarks' counters (work by phase, vehicle-steps) and their before/after switches (the full step
 * throughout, every brake change restless, the earlier settling rule, …) serve the benchmarks and the
 * exactness tests, not the app. The app's build defines `__TAUT_APP__` (src/app/vite.config.ts): there
 * `BENCH` is false, the bundler drops the counting and the switches, and every switch keeps its default —
 * the same figures, less code before the verdict (issue 14). Everywhere else (the command line, the tests,
 * the benchmarks) `BENCH` is true and they work.
 */
declare const __TAUT_APP__: boolean | undefined;

/** True unless in the app's build: count the benchmarks' work and honour their switches. */
export const BENCH: boolean = typeof __TAUT_APP__ !== "boolean";
