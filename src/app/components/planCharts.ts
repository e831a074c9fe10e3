/**
 * The Start plan's chart builders as the plan screen calls them, in its first chunk without their code:
 * each gives its chart once the charts' chunk is here (chartParts.ts, loaded after the first verdict is
 * painted), undefined until then — the chart's box stands in (Chart.tsx). Called in a reactive scope (a
 * memo, a JSX property), that scope runs again when the chunk comes, and the chart appears.
 */
import type { ChartSpec } from "../charts/spec.js";
import { chartParts, type ChartParts } from "./Chart.js";

type Builder<K extends "couplerChart" | "effortChart" | "speedNotchChart"> = (...args: Parameters<ChartParts[K]>) => ChartSpec | null | undefined;

/** Speed and notch over time (charts/speedNotch.ts). */
export const speedNotchChart: Builder<"speedNotchChart"> = (...args) => chartParts()?.speedNotchChart(...args);

/** Peak coupler force along the train (charts/couplerAlong.ts). */
export const couplerChart: Builder<"couplerChart"> = (...args) => chartParts()?.couplerChart(...args);

/** Tractive effort and adhesion against speed (charts/effortSpeed.ts). */
export const effortChart: Builder<"effortChart"> = (...args) => chartParts()?.effortChart(...args);
