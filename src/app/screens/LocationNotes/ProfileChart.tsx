/**
 * The live profile chart of the editor, drawn as inline SVG (no chart library on the page, and sharp at
 * any size): the ground from the gradients, the standing train on it drawn solid where its couplings are
 * stretched and dashed where they are bunched, the front, the distance clear ahead, and numbered hazard
 * markers matching the legend. The layout (`profilePlot.ts`) follows the box's width; colours come from
 * the app's chart palette for the theme; the legend is ours, large and readable.
 */
import { createMemo, createSignal, For, onCleanup, onMount, Show, type JSX } from "solid-js";
import { withAlpha } from "../../charts/colours.js";
import type { ChartPalette } from "../../charts/palette.js";
import type { UnitSystem } from "../../format.js";
import { hazardWord } from "./draft.js";
import type { ProfileModel } from "./profileModel.js";
import { profilePlot } from "./profilePlot.js";
import { notes } from "../../../i18n/en/notes.js";
import { tr } from "../../i18n.js";

const t = tr.ns(notes);

export interface ProfileChartProps {
  model: ProfileModel | undefined;
  units: UnitSystem;
  palette: ChartPalette;
  /** One or two sentences on what the chart shows (also the drawing's text alternative). */
  summary: string;
}

/** Drawing height, px, and the width used until the box has been measured (a test DOM has no layout). */
const HEIGHT = 300;
const DEFAULT_WIDTH = 900;
const BUNCHED_DASH = "14 7";
const CLEAR_DASH = "3 5";

export function ProfileChart(props: ProfileChartProps): JSX.Element {
  let box!: HTMLDivElement;
  const [width, setWidth] = createSignal(DEFAULT_WIDTH);
  onMount(() => {
    const measure = () => box.clientWidth > 0 && setWidth(box.clientWidth);
    measure();
    if (typeof ResizeObserver === "undefined") return;
    const ro = new ResizeObserver(measure);
    ro.observe(box);
    onCleanup(() => ro.disconnect());
  });

  const plot = createMemo(() => (props.model ? profilePlot(props.model, props.units, width(), HEIGHT) : undefined));
  const p = () => props.palette;

  return (
    <figure class="chart notes-chart" data-chart="Profile">
      <figcaption>
        <span class="chart-caption">{props.summary}</span>
      </figcaption>
      <div class="chart-box notes-chart-box" classList={{ empty: !plot() }} ref={box}>
        <Show when={plot()}>
          {(g) => (
            <svg class="notes-profile" data-exaggeration={g().exaggeration} width={g().width} height={g().height} viewBox={`0 0 ${g().width} ${g().height}`} role="img" aria-label={t("pcLabel", { summary: props.summary })}>
              <g class="notes-profile-grid" stroke={p().grid} stroke-width="1">
                <For each={g().yTicks}>{(t) => <line x1={g().left} x2={g().right} y1={t.at} y2={t.at} />}</For>
                <For each={g().xTicks}>{(t) => <line x1={t.at} x2={t.at} y1={g().top} y2={g().bottom} />}</For>
              </g>
              <g fill={p().text} font-size="14">
                <For each={g().yTicks}>
                  {(t) => (
                    <text x={g().left - 8} y={t.at + 5} text-anchor="end">
                      {t.label}
                    </text>
                  )}
                </For>
                <For each={g().xTicks}>
                  {(t) => (
                    <text x={t.at} y={g().bottom + 20} text-anchor="middle">
                      {t.label}
                    </text>
                  )}
                </For>
                <text x={g().left - 8} y={g().top - 14} text-anchor="start" font-size="13">
                  {g().yTitle}
                </text>
                <text x={(g().left + g().right) / 2} y={g().height - 8} text-anchor="middle">
                  {g().xTitle}
                </text>
              </g>
              <path d={g().groundFill} fill={withAlpha(p().need, 0.08)} stroke="none" />
              <path d={g().ground} fill="none" stroke={p().need} stroke-width="2.5" stroke-linejoin="round" />
              <Show when={g().clear}>
                {(c) => <path d={c().path} fill="none" stroke={p().text} stroke-width="2.5" stroke-dasharray={CLEAR_DASH} />}
              </Show>
              <For each={g().train}>
                {(r) => (
                  <path
                    class={`notes-profile-train ${r.state}`}
                    d={r.path}
                    fill="none"
                    stroke={r.state === "stretched" ? p().main : p().second}
                    stroke-width="10"
                    stroke-dasharray={r.state === "bunched" ? BUNCHED_DASH : undefined}
                    stroke-linecap="butt"
                    stroke-linejoin="round"
                  />
                )}
              </For>
              <Show when={g().front}>
                {(f) => (
                  <g>
                    <line x1={f().x} x2={f().x} y1={f().y1} y2={f().y2} stroke={p().need} stroke-width="2" />
                    <text x={f().label.x} y={f().label.y} text-anchor={f().label.anchor} fill={p().text} font-size="15" font-weight="bold">
                      {f().label.text}
                    </text>
                  </g>
                )}
              </Show>
              <Show when={g().clear}>
                {(c) => (
                  <text x={c().label.x} y={c().label.y} text-anchor={c().label.anchor} fill={p().text} font-size="15">
                    {c().label.text}
                  </text>
                )}
              </Show>
              <For each={g().hazards}>
                {(h) => (
                  <g class="notes-profile-hazard">
                    <path d={`M${h.x.toFixed(1)},${(h.y + 4).toFixed(1)} l-12,23 h24 z`} fill={p().limit} stroke={p().limit} stroke-width="1.5" stroke-linejoin="round" />
                    <text x={h.x} y={h.y + 23} text-anchor="middle" font-size="13" font-weight="bold" style={{ fill: "var(--surface)" }}>
                      {h.n}
                    </text>
                  </g>
                )}
              </For>
            </svg>
          )}
        </Show>
      </div>
      <ul class="legend notes-legend">
        <li>
          <Swatch colour={p().main} width={10} />
          {t("pcStretched")}
        </li>
        <li>
          <Swatch colour={p().second} width={10} dash={BUNCHED_DASH} />
          {t("pcBunched")}
        </li>
        <li>
          <Swatch colour={p().text} width={2.5} dash={CLEAR_DASH} />
          {t("pcClear")}
        </li>
        <Show when={(props.model?.hazards.length ?? 0) > 0}>
          <li>
            <svg class="notes-swatch" width="24" height="22" viewBox="0 0 24 22" aria-hidden="true">
              <path d="M12,1 l-11,20 h22 z" fill={p().limit} />
            </svg>
            {t("pcHazards")}{" "}
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

/** A short stretch of line drawn exactly as on the chart (width, dashes), for the legend. */
function Swatch(props: { colour: string; width: number; dash?: string }): JSX.Element {
  // 35 px: two dashes and the gap between them (14 7 14), or four dots (3 5 …).
  return (
    <svg class="notes-swatch" width="35" height="14" viewBox="0 0 35 14" aria-hidden="true">
      <line x1="0" x2="35" y1="7" y2="7" stroke={props.colour} stroke-width={props.width} stroke-dasharray={props.dash} />
    </svg>
  );
}
