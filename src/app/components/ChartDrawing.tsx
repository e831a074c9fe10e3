/**
 * The drawing half of a chart (Chart.tsx is the frame): the canvas, handed over to the chart worker
 * (OffscreenCanvas) where chart.js draws it, so the page never waits for a drawing, and the legend (ours,
 * large and readable, not the library's). The chart is created once it is near the screen (or the page is
 * idle), updated when its figures change, and destroyed on cleanup; a browser that cannot hand a canvas to
 * a worker gets a note instead. Part of the charts' chunk (chartParts.ts), loaded once the first verdict
 * is painted; the chart worker starts with the first chart drawn.
 */
import type { ChartConfiguration } from "chart.js";
import { createEffect, createSignal, For, on, onCleanup, onMount, Show, type JSX } from "solid-js";
import type { ChartReply, ChartRequest } from "../charts/chart.worker.js";
import { colourOf } from "../charts/colours.js";
import type { ChartPalette } from "../charts/palette.js";
import type { ChartSpec, LegendEntry } from "../charts/spec.js";
import { shell } from "../../i18n/en/shell.js";
import { tr } from "../i18n.js";
import { toChartConfig, type LineConfig } from "./chartConfig.js";

const t = tr.ns(shell);

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

export interface ChartDrawingProps {
  spec: ChartSpec;
  palette: ChartPalette;
  height: number;
  /** The canvas's text alternative. */
  label: string;
}

/** A chart's canvas and its legend. */
export function ChartDrawing(props: ChartDrawingProps): JSX.Element {
  return (
    <>
      <ChartCanvas {...props} />
      <Legend entries={props.spec.legend} palette={props.palette} />
    </>
  );
}

/** The canvas of one chart, drawn in the chart worker once it comes near the screen (or the page is idle). */
function ChartCanvas(props: ChartDrawingProps): JSX.Element {
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
        if (!alive || drawer) return;
        drawnKey = keyOf();
        const config = toChartConfig(props.spec, props.palette);
        if (offscreenSupported(canvas)) drawer = workerDrawer(canvas, config, box.clientWidth, props.height, () => setDrawn(true));
        else setUnsupported(true);
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
