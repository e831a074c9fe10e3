/**
 * The charts' chunk, loaded once the page's first verdict is painted (Chart.tsx's `chartParts`): the
 * drawing half of every chart, and the builders of the Start plan's three charts (planCharts.ts).
 */
export { ChartDrawing } from "./ChartDrawing.js";
export { couplerChart } from "../charts/couplerAlong.js";
export { effortChart } from "../charts/effortSpeed.js";
export { speedNotchChart } from "../charts/speedNotch.js";
