/**
 * The chart renderer: chart.js drawing into OffscreenCanvases handed over by the page, so drawing a chart
 * never blocks the main thread. Messages: create (with the canvas), update, resize, destroy; it answers
 * "drawn" after each draw.
 */
import type { ChartConfiguration } from "chart.js";
import { Chart } from "../components/chartjs.js";

export type ChartRequest =
  | { type: "create"; id: number; canvas: OffscreenCanvas; config: ChartConfiguration; width: number; height: number; dpr: number }
  | { type: "update"; id: number; config: ChartConfiguration }
  | { type: "resize"; id: number; width: number; height: number }
  | { type: "destroy"; id: number };

export type ChartReply = { type: "drawn"; id: number } | { type: "failed"; id: number; message: string };

interface Scope {
  onmessage: ((ev: MessageEvent<ChartRequest>) => void) | null;
  postMessage(m: ChartReply): void;
}

const scope = self as unknown as Scope;
const charts = new Map<number, { chart: Chart; dpr: number }>();

interface LabelledScale {
  tautLabels?: string[];
  ticks?: object;
  afterBuildTicks?: (axis: { ticks: Array<{ value: number }> }) => void;
}

/** Where a scale carries `tautLabels` (a category axis drawn on a linear scale): one tick at 0, 1, 2…, each with its word. */
function withTickLabels(options: ChartConfiguration["options"]): void {
  for (const scale of Object.values((options?.scales ?? {}) as Record<string, LabelledScale | undefined>)) {
    const labels = scale?.tautLabels;
    if (!scale || !labels) continue;
    scale.afterBuildTicks = (axis) => {
      axis.ticks = labels.map((_, value) => ({ value }));
    };
    scale.ticks = { ...scale.ticks, callback: (v: number | string) => labels[Math.round(Number(v))] ?? "" };
  }
}

/** Options a chart in a worker needs: no DOM to watch, so a fixed size and the page's pixel ratio. */
function forWorker(config: ChartConfiguration, dpr: number): ChartConfiguration {
  const options = { ...config.options, responsive: false, devicePixelRatio: dpr };
  withTickLabels(options);
  return { ...config, options } as ChartConfiguration;
}

scope.onmessage = (ev) => {
  const m = ev.data;
  try {
    if (m.type === "create") {
      m.canvas.width = Math.round(m.width * m.dpr);
      m.canvas.height = Math.round(m.height * m.dpr);
      const chart = new Chart(m.canvas as unknown as HTMLCanvasElement, forWorker(m.config, m.dpr));
      chart.resize(m.width, m.height);
      charts.set(m.id, { chart, dpr: m.dpr });
    } else if (m.type === "update") {
      const c = charts.get(m.id);
      if (!c) return;
      const cfg = forWorker(m.config, c.dpr);
      c.chart.data = cfg.data;
      c.chart.options = cfg.options!;
      c.chart.update("none");
    } else if (m.type === "resize") {
      charts.get(m.id)?.chart.resize(m.width, m.height);
    } else {
      charts.get(m.id)?.chart.destroy();
      charts.delete(m.id);
      return;
    }
    scope.postMessage({ type: "drawn", id: m.id });
  } catch (e) {
    scope.postMessage({ type: "failed", id: m.id, message: e instanceof Error ? e.message : String(e) });
  }
};
