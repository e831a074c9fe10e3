/**
 * The profile sketch of the printed card, as inline SVG (sharp on paper, no canvas): the ground, the
 * train on it (a solid bar where its couplings are stretched, a dashed bar where they are bunched, so it
 * reads in black and white), the front, the distance clear ahead, and numbered hazard markers.
 */
import { For, Show, type JSX } from "solid-js";
import { formatNumber, toDisplay, unitSymbol, type UnitSystem } from "../../format.js";
import { alongGround, exaggerationFor, exaggerationWords, type ProfileModel } from "./profileModel.js";
import { notes } from "../../../i18n/en/notes.js";
import { sketch } from "../../../i18n/en/sketch.js";
import { tr } from "../../i18n.js";

const nt = tr.ns(notes);
const st = tr.ns(sketch);

const W = 1000;
const H = 300;
const PAD = { left: 30, right: 36, top: 64, bottom: 46 };
/** Labels stay below the legend line. */
const LABEL_TOP = 50;

export function ProfileSketch(props: { model: ProfileModel; units: UnitSystem }): JSX.Element {
  const m = () => props.model;
  const d = (metres: number) => toDisplay("distance", metres, "m", props.units);
  const hs = () => m().ground.map((p) => p.h);
  const hMin = () => Math.min(...hs());
  const hMax = () => Math.max(...hs());
  /** Pixels per metre along the line; heights at the one exaggeration of every profile drawing. */
  const perAlong = () => (W - PAD.left - PAD.right) / Math.max(1, m().endM - m().startM);
  /** Room under the ground for the hazard markers, px. */
  const ROOM = 30;
  const exaggeration = () => exaggerationFor(hMax() - hMin(), perAlong(), H - PAD.top - PAD.bottom - ROOM);
  const perUp = () => perAlong() * exaggeration();
  /** The ground's lowest point sits this far above the axis: centred in the room above the markers. */
  const base = () => ROOM + (H - PAD.top - PAD.bottom - ROOM - (hMax() - hMin()) * perUp()) / 2;
  const sx = (x: number) => PAD.left + (x - m().startM) * perAlong();
  const sy = (h: number) => H - PAD.bottom - base() - (h - hMin()) * perUp();
  const path = (pts: ReadonlyArray<{ x: number; h: number }>, lift = 0) => pts.map((p, k) => `${k === 0 ? "M" : "L"}${sx(p.x).toFixed(1)},${(sy(p.h) - lift).toFixed(1)}`).join(" ");
  const ground = () => path(m().ground);
  const groundFill = () => `${ground()} L${sx(m().endM).toFixed(1)},${H - PAD.bottom} L${sx(m().startM).toFixed(1)},${H - PAD.bottom} Z`;
  const unit = () => unitSymbol("distance", props.units);
  const label = (metres: number) => `${formatNumber(d(metres), 0)} ${unit()}`;
  const hAt = (x: number) => alongGround(m().ground, x, x)[0]!.h;
  const labelY = (y: number) => Math.max(LABEL_TOP, y);
  /** Where the legend's second and third items start: after the words before them in the language on screen (about 9.5 px a letter at 17 px). */
  const legendX = () => {
    const second = 50 + st("stretched").length * 9.5 + 28;
    return [second, second + 50 + st("bunched").length * 9.5 + 28] as const;
  };
  const ticks = () => {
    const span = m().endM - m().startM;
    const raw = span / 6;
    const mag = 10 ** Math.floor(Math.log10(Math.max(1, raw)));
    const step = [1, 2, 5, 10].map((f) => f * mag).find((s) => s >= raw) ?? raw;
    const out: number[] = [];
    for (let x = Math.ceil(m().startM / step) * step; x <= m().endM + 1e-9; x += step) out.push(x);
    return out;
  };

  return (
    <svg class="notes-sketch" data-exaggeration={exaggeration()} viewBox={`0 0 ${W} ${H}`} role="img" aria-label={nt("psLabel")} preserveAspectRatio="xMidYMid meet">
      <path d={groundFill()} fill="#e9ecef" stroke="none" />
      <path d={ground()} fill="none" stroke="#222" stroke-width="2.5" />
      <line x1={PAD.left} y1={H - PAD.bottom} x2={W - PAD.right} y2={H - PAD.bottom} stroke="#555" stroke-width="1" />
      <For each={ticks()}>
        {(x) => (
          <g>
            <line x1={sx(x)} y1={H - PAD.bottom} x2={sx(x)} y2={H - PAD.bottom + 6} stroke="#555" />
            <text x={sx(x)} y={H - PAD.bottom + 22} font-size="18" text-anchor="middle" fill="#222">
              {formatNumber(d(x), 0)}
            </text>
          </g>
        )}
      </For>
      <text x={W - PAD.right} y={H - 4} font-size="16" text-anchor="end" fill="#444">
        {nt("ppDistance", { unit: unit(), heights: exaggerationWords(exaggeration()) })}
      </text>
      <Show when={m().train}>
        {(t) => (
          <g>
            <For each={t().runs}>
              {(r) => (
                <path
                  d={path(alongGround(m().ground, r.rearM, r.frontM), 9)}
                  fill="none"
                  stroke="#111"
                  stroke-width="12"
                  stroke-dasharray={r.state === "bunched" ? "14 7" : undefined}
                  stroke-linecap="butt"
                />
              )}
            </For>
            <line x1={sx(t().frontM)} y1={sy(hAt(t().frontM)) - 36} x2={sx(t().frontM)} y2={sy(hAt(t().frontM)) + 4} stroke="#111" stroke-width="2" />
            <text x={sx(t().frontM) - 6} y={labelY(sy(hAt(t().frontM)) - 42)} font-size="18" text-anchor="end" fill="#111" font-weight="bold">
              {st("front", { distance: label(t().frontM) })}
            </text>
          </g>
        )}
      </Show>
      <Show when={m().clearEndM > m().frontM}>
        <path d={path(alongGround(m().ground, m().frontM, m().clearEndM), 7)} fill="none" stroke="#111" stroke-width="2.5" stroke-dasharray="3 5" />
        <text x={sx(m().frontM) + 10} y={labelY(sy(hAt(m().frontM)) - 42)} font-size="17" text-anchor="start" fill="#111">
          {st("clear", { distance: label(m().clearEndM - m().frontM) })}
        </text>
      </Show>
      <For each={m().hazards}>
        {(h, k) => (
          <g>
            <path d={`M${sx(h.x)},${sy(h.h) + 6} l-11,22 h22 z`} fill="#fff" stroke="#111" stroke-width="2" />
            <text x={sx(h.x)} y={sy(h.h) + 25} font-size="14" text-anchor="middle" fill="#111" font-weight="bold">
              {k() + 1}
            </text>
          </g>
        )}
      </For>
      <g transform={`translate(${PAD.left}, 14)`}>
        <line x1="0" y1="0" x2="42" y2="0" stroke="#111" stroke-width="10" />
        <text x="50" y="6" font-size="17" fill="#111">
          {st("stretched")}
        </text>
        <line x1={legendX()[0]} y1="0" x2={legendX()[0] + 42} y2="0" stroke="#111" stroke-width="10" stroke-dasharray="14 7" />
        <text x={legendX()[0] + 50} y="6" font-size="17" fill="#111">
          {st("bunched")}
        </text>
        <path d={`M${legendX()[1] + 9},-8 l-9,17 h18 z`} fill="#fff" stroke="#111" stroke-width="2" />
        <text x={legendX()[1] + 25} y="6" font-size="17" fill="#111">
          {st("hazard")}
        </text>
      </g>
    </svg>
  );
}
