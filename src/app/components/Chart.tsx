/**
 * A chart from a `ChartSpec`: the frame — heading, caption, and a box of the chart's height — is here, in
 * the page's first chunk; while there is nothing to draw it shows a plain sentence. Everything else is a
 * chunk of its own (chartParts.ts), loaded once the page's first verdict is painted, so nothing before the
 * verdict waits for it: the canvas handed to the chart worker where chart.js (only the line parts) draws
 * it, the legend, chart.js's configuration, and the Start plan's chart builders (planCharts.ts). Until it
 * is here, the box holds an empty canvas of the same size.
 */
import { createSignal, Show, type JSX } from "solid-js";
import { Dynamic } from "solid-js/web";
import type { ChartPalette } from "../charts/palette.js";
import type { ChartSpec } from "../charts/spec.js";
import { shell } from "../../i18n/en/shell.js";
import { tr } from "../i18n.js";

const t = tr.ns(shell);

// ------------------------------------------------------------------ the charts' chunk, on demand

/** Charts wait (their code loads, the chart worker starts) until this settles: the page holds them until its verdict is painted. */
let chartsAllowed: Promise<void> = Promise.resolve();

/** Hold every chart until `until` settles (launch.tsx: until the first verdict is on screen). */
export function holdChartsUntil(until: Promise<void>): void {
  chartsAllowed = until;
}

export type ChartParts = typeof import("./chartParts.js");
const [parts, setParts] = createSignal<ChartParts | null>(null);
let partsLoad: Promise<unknown> | null = null;

/**
 * The charts' chunk once loaded, else null — and its load begun (once charts are allowed; once for all
 * charts, again on a later call if it failed). Read in a reactive scope, that scope runs again when it comes.
 */
export function chartParts(): ChartParts | null {
  const p = parts();
  if (p) return p;
  partsLoad ??= chartsAllowed
    .then(() => import("./chartParts.js"))
    .then(
      (m) => setParts(() => m),
      (e: unknown) => {
        // Offline before the chunk was ever saved, or a broken update: the boxes stay empty, the figures stand.
        partsLoad = null;
        console.warn("The charts could not load:", e);
      },
    );
  return null;
}

// ------------------------------------------------------------------ component

export interface ChartProps {
  /** Heading shown above the chart. */
  title: string;
  /**
   * The chart; null to show `empty`; undefined while it is not known yet (its builder's code is still
   * loading, planCharts.ts): the box stands in.
   */
  spec: ChartSpec | null | undefined;
  palette: ChartPalette;
  /** Sentence shown while there is nothing to draw. */
  empty: string;
  /** A sentence on how to read the chart (also the canvas's text alternative). */
  caption: string;
  height?: number;
}

export function Chart(props: ChartProps): JSX.Element {
  const height = () => props.height ?? 280;
  const label = () => t("chartLabel", { title: props.title, caption: props.caption });
  return (
    <figure class="chart" data-chart={props.title} data-empty={props.spec === undefined ? "pending" : props.spec ? "no" : "yes"}>
      <figcaption>
        <span class="chart-title">{props.title}</span>
        <span class="chart-caption">{props.caption}</span>
      </figcaption>
      <Show
        when={props.spec !== null}
        fallback={
          <p class="chart-empty" role="note">
            {props.empty}
          </p>
        }
      >
        <Show when={props.spec && chartParts()} fallback={<EmptyBox height={height()} label={label()} />}>
          {(m) => <Dynamic component={m().ChartDrawing} spec={props.spec!} palette={props.palette} height={height()} label={label()} />}
        </Show>
      </Show>
    </figure>
  );
}

/** The chart's box with an empty canvas, until the drawing half is here. */
function EmptyBox(props: { height: number; label: string }): JSX.Element {
  return (
    <div class="chart-box" style={{ height: `${props.height}px` }} data-drawn="no">
      <canvas role="img" aria-label={props.label} />
    </div>
  );
}
