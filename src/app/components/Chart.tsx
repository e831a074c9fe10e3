/**
 * A chart from a `ChartSpec`, drawn by chart.js (only the line parts) in a chart worker on a canvas
 * handed over to it (OffscreenCanvas), so the page never waits for a drawing. The chart is created in
 * onMount once it is near the screen (or the page is idle), updated in an effect when its figures change,
 * and destroyed on cleanup. While there is nothing to draw it shows a plain sentence; a browser that
 * cannot hand a canvas to a worker gets the caption and legend with a note; the legend is ours (large,
 * readable), not the library's.
 */
import type { ChartConfiguration, ChartDataset } from "chart.js";
import { createEffect, createSignal, For, on, onCleanup, onMount, Show, type JSX } from "solid-js";
import type { ChartReply, ChartRequest } from "../charts/chart.worker.js";
import { colourOf, withAlpha, type ChartPalette } from "../charts/palette.js";
import type { ChartSpec, LegendEntry } from "../charts/spec.js";
import { shell } from "../../i18n/en/shell.js";
import { tr } from "../i18n.js";
import { LOCALE_TAGS, type Lang } from "../../i18n/language.js";

const t = tr.ns(shell);

type LineConfig = ChartConfiguration<"line", Array<{ x: number; y: number }>>;

/**
 * The chart.js configuration for a spec: plain data (it crosses to the chart worker), no animation, no
 * pointer events. The tick numbers are written in `lang` (chart.js formats them with Intl for `locale`:
 * a decimal comma in Hungarian and German), in the chart worker, after the verdict is on screen.
 */
export function toChartConfig(spec: ChartSpec, p: ChartPalette, lang: Lang = tr.lang): LineConfig {
  const datasets: Array<ChartDataset<"line", Array<{ x: number; y: number }>>> = spec.series.map((s) => {
    const colour = colourOf(p, s.role, s.tone, s.tones, s.rail);
    const band = s.role === "band";
    // Filled to the axis: bars. Dashed bars (without sand) are filled more lightly than solid ones.
    const bars = s.bars === true;
    const marks = s.marker ? new Set(s.markAt ?? s.points.map((_, i) => i)) : null;
    return {
      label: s.label,
      data: s.points,
      borderColor: band && !s.strong ? withAlpha(colour, 0.55) : colour,
      backgroundColor: band ? withAlpha(colour, s.strong ? 0.32 : 0.12) : bars ? withAlpha(colour, s.dashed ? 0.22 : 0.55) : s.role === "main" ? p.mainFill : colour,
      borderWidth: s.strong ? 3 : band ? 1 : s.role === "notch" ? 2 : 3,
      borderDash: s.dashed ? [8, 6] : [],
      // Markers (a shape per rail condition, the plan's steps) where the series asks for them.
      pointRadius: marks ? s.points.map((_, i) => (marks.has(i) ? (s.role === "step" ? 6 : 5) : 0)) : 0,
      pointStyle: s.marker ?? "circle",
      pointBorderColor: colour,
      pointBackgroundColor: s.role === "step" ? colour : withAlpha(colour, 0.85),
      pointBorderWidth: 2,
      showLine: !s.noLine,
      stepped: s.stepped ? "before" : false,
      fill: s.fill === "previous" ? "-1" : s.fill === "origin" ? "origin" : false,
      yAxisID: s.axis ?? "y",
      tension: 0,
      ...(s.endLabel ? { endLabel: s.endLabel } : {}),
    };
  });
  const labelled = spec.series.some((s) => s.endLabel);
  const axisStyle = { color: p.text, font: { size: 14 } };
  const scales: NonNullable<LineConfig["options"]>["scales"] = {
    x: {
      type: "linear",
      min: spec.x.min,
      max: spec.x.max,
      title: { display: true, text: spec.x.title, ...axisStyle },
      ticks: { ...axisStyle, ...(spec.x.labels ? { autoSkip: false } : {}) },
      grid: { color: p.grid },
      // Plain data for the chart worker, which turns it into the tick callback (a function cannot cross).
      ...(spec.x.labels ? { tautLabels: [...spec.x.labels] } : {}),
    },
    y: { type: "linear", min: spec.y.min, max: spec.y.max, title: { display: true, text: spec.y.title, ...axisStyle }, ticks: { ...axisStyle }, grid: { color: p.grid } },
  };
  if (spec.y2) {
    scales.y2 = {
      type: "linear",
      position: "right",
      min: spec.y2.min,
      max: spec.y2.max,
      title: { display: true, text: spec.y2.title, ...axisStyle },
      ticks: { ...axisStyle, ...(spec.y2.stepSize ? { stepSize: spec.y2.stepSize } : {}) },
      grid: { drawOnChartArea: false },
    };
  }
  return {
    type: "line",
    data: { datasets },
    options: {
      animation: false,
      locale: LOCALE_TAGS[lang],
      responsive: true,
      maintainAspectRatio: false,
      parsing: false,
      normalized: true,
      events: [],
      layout: { padding: { right: labelled ? 22 : 8 } },
      plugins: { legend: { display: false }, tooltip: { enabled: false } },
      scales,
    },
  };
}

/** How a chart is drawn: in the chart worker, or here. */
interface Drawer {
  update(config: LineConfig): void;
  resize(width: number, height: number): void;
  destroy(): void;
}

// ------------------------------------------------------------------ chart worker (OffscreenCanvas)

let chartWorker: Worker | null = null;
let nextId = 1;
const onDrawn = new Map<number, () => void>();
/** Charts start drawing (and the chart worker starts) once this settles: the page holds them until its verdict is painted. */
let chartsAllowed: Promise<void> = Promise.resolve();

/** Hold every chart until `until` settles (launch.tsx: until the first verdict is on screen). */
export function holdChartsUntil(until: Promise<void>): void {
  chartsAllowed = until;
}

function offscreenSupported(canvas: HTMLCanvasElement): boolean {
  return typeof Worker !== "undefined" && typeof canvas.transferControlToOffscreen === "function" && typeof OffscreenCanvas !== "undefined";
}

function theChartWorker(): Worker {
  if (chartWorker) return chartWorker;
  const w = new Worker(new URL("../charts/chart.worker.ts", import.meta.url), { type: "module", name: "taut-charts" });
  w.onmessage = (ev: MessageEvent<ChartReply>) => {
    if (ev.data.type === "drawn") onDrawn.get(ev.data.id)?.();
  };
  chartWorker = w;
  return w;
}

function workerDrawer(canvas: HTMLCanvasElement, config: LineConfig, width: number, height: number, drawn: () => void): Drawer {
  const id = nextId++;
  const w = theChartWorker();
  const post = (m: ChartRequest, transfer: Transferable[] = []) => w.postMessage(m, transfer);
  onDrawn.set(id, drawn);
  const offscreen = canvas.transferControlToOffscreen();
  post({ type: "create", id, canvas: offscreen, config: config as ChartConfiguration, width, height, dpr: devicePixelRatio || 1 }, [offscreen]);
  return {
    update: (c) => post({ type: "update", id, config: c as ChartConfiguration }),
    resize: (wd, ht) => post({ type: "resize", id, width: wd, height: ht }),
    destroy: () => {
      onDrawn.delete(id);
      post({ type: "destroy", id });
    },
  };
}

// ------------------------------------------------------------------ component

export interface ChartProps {
  /** Heading shown above the chart. */
  title: string;
  /** The chart, or null to show `empty`. */
  spec: ChartSpec | null;
  palette: ChartPalette;
  /** Sentence shown while there is nothing to draw. */
  empty: string;
  /** A sentence on how to read the chart (also the canvas's text alternative). */
  caption: string;
  height?: number;
}

export function Chart(props: ChartProps): JSX.Element {
  return (
    <figure class="chart" data-chart={props.title} data-empty={props.spec ? "no" : "yes"}>
      <figcaption>
        <span class="chart-title">{props.title}</span>
        <span class="chart-caption">{props.caption}</span>
      </figcaption>
      <Show
        when={props.spec}
        fallback={
          <p class="chart-empty" role="note">
            {props.empty}
          </p>
        }
      >
        {(spec) => (
          <>
            <ChartCanvas spec={spec()} palette={props.palette} height={props.height ?? 280} label={t("chartLabel", { title: props.title, caption: props.caption })} />
            <Legend entries={spec().legend} palette={props.palette} />
          </>
        )}
      </Show>
    </figure>
  );
}

function ChartCanvas(props: { spec: ChartSpec; palette: ChartPalette; height: number; label: string }): JSX.Element {
  let canvas!: HTMLCanvasElement;
  let box!: HTMLDivElement;
  let drawer: Drawer | null = null;
  let drawnKey = "";
  // Wanted once it comes near the screen, or when the page is idle.
  const [wanted, setWanted] = createSignal(typeof IntersectionObserver === "undefined");
  const [drawn, setDrawn] = createSignal(false);
  const [unsupported, setUnsupported] = createSignal(false);
  const keyOf = () => `${props.palette.text}|${tr.lang}|${JSON.stringify(props.spec)}`;

  onMount(() => {
    if (typeof IntersectionObserver !== "undefined") {
      const io = new IntersectionObserver((entries) => entries.some((e) => e.isIntersecting) && setWanted(true), { rootMargin: "300px" });
      io.observe(box);
      onCleanup(() => io.disconnect());
    }
    if (typeof requestIdleCallback === "function") {
      const idle = requestIdleCallback(() => setWanted(true), { timeout: 4000 });
      onCleanup(() => cancelIdleCallback(idle));
    }
    let alive = true;
    onCleanup(() => (alive = false));
    createEffect(
      on(wanted, (w) => {
        if (!w) return;
        void chartsAllowed.then(() => {
          if (!alive || drawer) return;
          drawnKey = keyOf();
          const config = toChartConfig(props.spec, props.palette);
          if (offscreenSupported(canvas)) drawer = workerDrawer(canvas, config, box.clientWidth, props.height, () => setDrawn(true));
          else setUnsupported(true);
        });
      }),
    );
    if (typeof ResizeObserver !== "undefined") {
      let lastWidth = box.clientWidth;
      const ro = new ResizeObserver(() => {
        const width = box.clientWidth;
        if (width > 0 && width !== lastWidth) {
          lastWidth = width;
          drawer?.resize(width, props.height);
        }
      });
      ro.observe(box);
      onCleanup(() => ro.disconnect());
    }
  });

  createEffect(
    on(
      () => [props.spec, props.palette, tr.lang] as const,
      () => {
        if (!drawer) return;
        const key = keyOf();
        if (key === drawnKey) return;
        drawnKey = key;
        drawer.update(toChartConfig(props.spec, props.palette));
      },
      { defer: true },
    ),
  );

  onCleanup(() => {
    drawer?.destroy();
    drawer = null;
  });

  return (
    <div class="chart-box" ref={box} style={{ height: `${props.height}px` }} data-drawn={drawn() ? "yes" : "no"}>
      <canvas ref={canvas} role="img" aria-label={props.label} />
      <Show when={unsupported()}>
        <p class="chart-empty chart-unsupported">{t("chartUnsupported")}</p>
      </Show>
    </div>
  );
}

function Legend(props: { entries: readonly LegendEntry[]; palette: ChartPalette }): JSX.Element {
  return (
    <ul class="legend">
      <For each={props.entries}>
        {(e) => (
          <li>
            <Show
              when={e.marker}
              fallback={
                <span
                  class="swatch"
                  classList={{ dashed: e.dashed === true, band: e.role === "band", box: e.box === true }}
                  style={{ "--swatch": colourOf(props.palette, e.role, e.tone, e.tones, e.rail) }}
                  aria-hidden="true"
                />
              }
            >
              {(m) => <MarkerSwatch shape={m()} colour={colourOf(props.palette, e.role, e.tone, e.tones, e.rail)} band={e.role === "band"} />}
            </Show>
            {e.label}
          </li>
        )}
      </For>
    </ul>
  );
}

/** A legend swatch with the series' marker shape drawn over its colour (a band's fill behind it). */
function MarkerSwatch(props: { shape: string; colour: string; band: boolean }): JSX.Element {
  const shape = (): JSX.Element => {
    switch (props.shape) {
      case "rect":
        return <rect x="7" y="4" width="10" height="10" />;
      case "triangle":
        return <path d="M12 3 18 14H6z" />;
      case "rectRot":
        return <path d="M12 2 18 9 12 16 6 9z" />;
      case "crossRot":
        return <path d="M7 4l10 10M17 4 7 14" />;
      case "star":
        return <path d="M12 3v12M6 9h12M8 5l8 8M16 5l-8 8" />;
      default:
        return <circle cx="12" cy="9" r="5" />;
    }
  };
  return (
    <svg class="swatch-marker" width="28" height="18" viewBox="0 0 24 18" aria-hidden="true" data-marker={props.shape}>
      <Show when={props.band}>
        <rect x="0" y="4" width="24" height="10" rx="2" fill={props.colour} fill-opacity="0.3" />
      </Show>
      <g fill={props.colour} fill-opacity="0.85" stroke={props.colour} stroke-width="2">
        {shape()}
      </g>
    </svg>
  );
}
