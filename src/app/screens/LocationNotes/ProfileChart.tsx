/**
 * The live profile chart of the editor (chart.js, registering only the line parts, as the shared chart
 * does): the ground from the gradients, the standing train on it drawn solid where its couplings are
 * stretched and dashed where they are bunched, the distance clear ahead, and numbered hazard markers.
 * Colours come from the app's chart palette for the theme; the legend is ours, large and readable.
 * Created in onMount, updated in an effect, destroyed on cleanup.
 */
import { Chart, LinearScale, LineController, LineElement, PointElement, type ChartConfiguration, type ChartDataset } from "chart.js";
import { createEffect, For, on, onCleanup, onMount, Show, type JSX } from "solid-js";
import type { ChartPalette } from "../../charts/palette.js";
import { toDisplay, unitSymbol, type UnitSystem } from "../../format.js";
import { HAZARD_KINDS } from "./draft.js";
import { alongGround, type ProfileModel } from "./profileModel.js";

Chart.register(LineController, LineElement, PointElement, LinearScale);

type Pt = { x: number; y: number };
type Config = ChartConfiguration<"line", Pt[]>;

/** The chart's datasets and axes in display units; NaN points break a line between runs. */
export function profileConfig(m: ProfileModel, units: UnitSystem, p: ChartPalette): Config {
  const d = (metres: number) => toDisplay("distance", metres, "m", units);
  const hs = m.ground.map((g) => g.h);
  const lift = Math.max(1, Math.max(...hs) - Math.min(...hs)) * 0.05;
  const train = (state: "stretched" | "bunched"): Pt[] => {
    const pts: Pt[] = [];
    for (const r of m.train?.runs ?? []) {
      if (r.state !== state) continue;
      if (pts.length > 0) pts.push({ x: d(r.frontM), y: Number.NaN });
      for (const g of alongGround(m.ground, r.rearM, r.frontM)) pts.push({ x: d(g.x), y: d(g.h + lift) });
    }
    return pts;
  };
  const line = (label: string, data: Pt[], colour: string, width: number, dash: number[] = []): ChartDataset<"line", Pt[]> => ({
    label,
    data,
    borderColor: colour,
    backgroundColor: colour,
    borderWidth: width,
    borderDash: dash,
    pointRadius: 0,
    spanGaps: false,
    tension: 0,
  });
  const datasets: ChartDataset<"line", Pt[]>[] = [
    line("Track", m.ground.map((g) => ({ x: d(g.x), y: d(g.h) })), p.need, 2),
    line("Clear ahead", alongGround(m.ground, m.frontM, m.clearEndM).map((g) => ({ x: d(g.x), y: d(g.h + 2.2 * lift) })), p.text, 2, [3, 5]),
    line("Train, couplings stretched", train("stretched"), p.main, 10),
    line("Train, couplings bunched", train("bunched"), p.second, 10, [12, 7]),
  ];
  if (m.hazards.length > 0) {
    datasets.push({
      ...line("Hazards", m.hazards.map((h) => ({ x: d(h.x), y: d(h.h - lift) })), p.limit, 2),
      showLine: false,
      pointStyle: "triangle",
      pointRadius: 9,
      backgroundColor: p.limit,
    });
  }
  const axis = { color: p.text, font: { size: 14 } };
  const unit = unitSymbol("distance", units);
  return {
    type: "line",
    data: { datasets },
    options: {
      animation: false,
      responsive: true,
      maintainAspectRatio: false,
      parsing: false,
      normalized: true,
      events: [],
      plugins: { legend: { display: false }, tooltip: { enabled: false } },
      scales: {
        x: { type: "linear", min: d(m.startM), max: d(m.endM), title: { display: true, text: `Distance along the line (${unit})`, ...axis }, ticks: { ...axis }, grid: { color: p.grid } },
        y: { type: "linear", title: { display: true, text: `Height (${unit}), exaggerated`, ...axis }, ticks: { ...axis }, grid: { color: p.grid } },
      },
    },
  };
}

export interface ProfileChartProps {
  model: ProfileModel | undefined;
  units: UnitSystem;
  palette: ChartPalette;
  /** One or two sentences on what the chart shows (also the canvas's text alternative). */
  summary: string;
}

export function ProfileChart(props: ProfileChartProps): JSX.Element {
  let canvas: HTMLCanvasElement | undefined;
  let chart: Chart<"line", Pt[]> | null = null;

  const draw = () => {
    const m = props.model;
    if (!canvas) return;
    if (!m) {
      chart?.destroy();
      chart = null;
      return;
    }
    const cfg = profileConfig(m, props.units, props.palette);
    if (chart) {
      chart.data = cfg.data;
      chart.options = cfg.options!;
      chart.update("none");
      return;
    }
    // No 2D context (a test DOM, a locked-down browser): the summary and legend still say what it shows.
    let ctx: CanvasRenderingContext2D | null = null;
    try {
      ctx = canvas.getContext("2d");
    } catch {
      ctx = null;
    }
    if (ctx) chart = new Chart<"line", Pt[]>(ctx, cfg);
  };

  onMount(draw);
  createEffect(on(() => [props.model, props.units, props.palette] as const, draw, { defer: true }));
  onCleanup(() => {
    chart?.destroy();
    chart = null;
  });

  const hazardWord = (k: string) => HAZARD_KINDS.find((h) => h.kind === k)?.label ?? k;

  return (
    <figure class="chart notes-chart" data-chart="Profile">
      <figcaption>
        <span class="chart-caption">{props.summary}</span>
      </figcaption>
      <div class="chart-box notes-chart-box">
        <canvas ref={canvas} role="img" aria-label={`Profile. ${props.summary}`} />
      </div>
      <ul class="legend notes-legend">
        <li>
          <span class="notes-swatch" style={{ "--swatch": props.palette.main }} aria-hidden="true" />
          Train, couplings stretched
        </li>
        <li>
          <span class="notes-swatch dashed" style={{ "--swatch": props.palette.second }} aria-hidden="true" />
          Train, couplings bunched
        </li>
        <li>
          <span class="notes-swatch thin dotted" style={{ "--swatch": props.palette.text }} aria-hidden="true" />
          Clear ahead
        </li>
        <Show when={(props.model?.hazards.length ?? 0) > 0}>
          <li>
            <span class="notes-triangle" style={{ "--swatch": props.palette.limit }} aria-hidden="true" />
            Hazards:{" "}
            <For each={props.model?.hazards ?? []}>
              {(h, k) => (
                <span class="notes-hazard-key">
                  {k() + 1}. {hazardWord(h.kind)}
                  {k() < (props.model?.hazards.length ?? 0) - 1 ? "; " : ""}
                </span>
              )}
            </For>
          </li>
        </Show>
      </ul>
    </figure>
  );
}
