/**
 * The editor's live profile laid out in screen pixels for a box of a given size, from the profile model:
 * axes with round ticks in the user's units, the ground, the standing train lifted onto it in runs
 * (stretched or bunched), the front, the distance clear ahead and numbered hazards, plus the height
 * exaggeration. Pure, so the drawing can be checked without a browser; `ProfileChart.tsx` draws it as SVG.
 */
import { formatNumber, toDisplay, unitSymbol, type UnitSystem } from "../../format.js";
import { alongGround, exaggerationFor, exaggerationWords, type ProfileModel, type ProfilePoint, type SlackWord } from "./profileModel.js";
import { notes } from "../../../i18n/en/notes.js";
import { sketch } from "../../../i18n/en/sketch.js";
import { tr } from "../../i18n.js";

const nt = tr.ns(notes);
const st = tr.ns(sketch);

export interface PlotTick {
  /** Pixel position along its axis. */
  at: number;
  label: string;
}

export interface PlotLabel {
  x: number;
  y: number;
  text: string;
  anchor: "start" | "end";
}

export interface ProfilePlot {
  width: number;
  height: number;
  /** The plotting area, px. */
  left: number;
  right: number;
  top: number;
  bottom: number;
  xTicks: PlotTick[];
  yTicks: PlotTick[];
  /** SVG path of the ground line, and of the area under it. */
  ground: string;
  groundFill: string;
  /** The train, one path per run of couplings in one state, head first. */
  train: Array<{ state: SlackWord; path: string }>;
  /** The front of the train: a short upright mark and its label. */
  front?: { x: number; y1: number; y2: number; label: PlotLabel };
  /** The distance clear ahead of the front, drawn above the ground, with its label. */
  clear?: { path: string; label: PlotLabel };
  /** Hazard markers, numbered as in the legend (the hazards with a position inside the profile). */
  hazards: Array<{ x: number; y: number; n: number }>;
  /** Heights are drawn this many times steeper than distances. */
  exaggeration: number;
  /** Axis titles. */
  xTitle: string;
  yTitle: string;
}

/** Space around the plotting area, px: tick labels on the left and below, the front's label above. */
const PAD = { left: 58, right: 16, top: 46, bottom: 52 };
/** The train is drawn this far above the ground line (it stands on the rails), the clear-ahead line higher. */
const TRAIN_LIFT = 8;
const CLEAR_LIFT = 16;
/** Height of a hazard marker under the ground line, px. */
const HAZARD_ROOM = 32;
/** Rough width of one character of a 15 px label, for keeping labels inside the box. */
const CHAR_PX = 8.2;

/** A round step (1, 2 or 5 × a power of ten) giving about `count` intervals over `span`. */
export function roundStep(span: number, count: number): number {
  const raw = Math.max(span, 1e-9) / Math.max(1, count);
  const mag = 10 ** Math.floor(Math.log10(raw));
  return [1, 2, 5, 10].map((f) => f * mag).find((s) => s >= raw * 0.999) ?? 10 * mag;
}

function ticksOver(lo: number, hi: number, step: number): number[] {
  const out: number[] = [];
  for (let v = Math.ceil(lo / step - 1e-9) * step; v <= hi + step * 1e-9; v += step) out.push(Math.abs(v) < step * 1e-9 ? 0 : v);
  return out;
}

/** Lay the profile out in a `width` × `height` px box. */
export function profilePlot(m: ProfileModel, units: UnitSystem, width: number, height: number): ProfilePlot {
  const d = (metres: number) => toDisplay("distance", metres, "m", units);
  const unit = unitSymbol("distance", units);
  const left = PAD.left;
  const right = Math.max(left + 40, width - PAD.right);
  const top = PAD.top;
  const bottom = Math.max(top + 40, height - PAD.bottom);

  // Along the line first: the width sets the scale, and the heights follow at the one exaggeration.
  const xLo0 = d(m.startM);
  const xHi0 = d(m.endM);
  const perAlong = (right - left) / Math.max(1e-9, xHi0 - xLo0);
  const hs = m.ground.map((g) => d(g.h));
  const hLo0 = Math.min(...hs);
  const hHi0 = Math.max(...hs);
  const exaggeration = exaggerationFor(hHi0 - hLo0, perAlong, bottom - top - HAZARD_ROOM);
  const perUp = perAlong * exaggeration;
  // The height range the box shows at that scale: the ground centred in the room above the hazard markers.
  const span = (bottom - top) / perUp;
  const roomBelow = HAZARD_ROOM / perUp;
  const spare = span - roomBelow - (hHi0 - hLo0);
  const hLo = hLo0 - roomBelow - spare / 2;
  const hHi = hLo + span;
  const yStep = roundStep(hHi - hLo, Math.max(2, Math.floor((bottom - top) / 55)));
  const tickLo = Math.ceil(hLo / yStep - 1e-9) * yStep;
  const xLo = xLo0;
  const xHi = xHi0;
  const sx = (metres: number) => left + ((d(metres) - xLo) / Math.max(1e-9, xHi - xLo)) * (right - left);
  const sy = (metres: number) => bottom - ((d(metres) - hLo) / Math.max(1e-9, hHi - hLo)) * (bottom - top);
  const path = (pts: readonly ProfilePoint[], lift = 0) => pts.map((p, k) => `${k === 0 ? "M" : "L"}${sx(p.x).toFixed(1)},${(sy(p.h) - lift).toFixed(1)}`).join(" ");
  const groundAt = (x: number) => alongGround(m.ground, x, x)[0]!.h;

  const xStep = roundStep(xHi - xLo, Math.max(2, Math.floor((right - left) / 120)));
  const xTicks = ticksOver(xLo, xHi, xStep).map((v) => ({ at: left + ((v - xLo) / Math.max(1e-9, xHi - xLo)) * (right - left), label: formatNumber(v, 0) }));
  const yDecimals = yStep < 1 ? 1 : 0;
  const yTicks = ticksOver(tickLo, hHi, yStep).map((v) => ({ at: bottom - ((v - hLo) / Math.max(1e-9, hHi - hLo)) * (bottom - top), label: formatNumber(v, yDecimals) }));

  const ground = path(m.ground);
  const groundFill = `${ground} L${sx(m.endM).toFixed(1)},${bottom} L${sx(m.startM).toFixed(1)},${bottom} Z`;


  const plot: ProfilePlot = {
    width,
    height,
    left,
    right,
    top,
    bottom,
    xTicks,
    yTicks,
    ground,
    groundFill,
    train: (m.train?.runs ?? []).map((r) => ({ state: r.state, path: path(alongGround(m.ground, r.rearM, r.frontM), TRAIN_LIFT) })),
    hazards: m.hazards
      .map((h, k) => ({ x: sx(h.x), y: sy(h.h), n: k + 1, inside: h.x >= m.startM && h.x <= m.endM }))
      .filter((h) => h.inside)
      .map(({ x, y, n }) => ({ x, y, n })),
    exaggeration,
    xTitle: nt("ppDistance", { unit, heights: exaggerationWords(exaggeration) }),
    yTitle: nt("ppHeight", { unit }),
  };

  /** The chainage at a pixel column. */
  const mAt = (px: number) => m.startM + ((Math.min(right, Math.max(left, px)) - left) / Math.max(1e-9, right - left)) * (m.endM - m.startM);
  /** The highest ground under a stretch of pixel columns, as a pixel row. */
  const highest = (px0: number, px1: number) => Math.min(...alongGround(m.ground, mAt(Math.min(px0, px1)), mAt(Math.max(px0, px1))).map((g) => sy(g.h)));
  /** A label's baseline: 40 px above the ground at the front, and clear of whatever is drawn under its span (train, clear-ahead line). */
  const labelY = (x: number, text: string, anchor: "start" | "end", gap: number) => {
    const span = text.length * CHAR_PX;
    const under = highest(anchor === "start" ? x : x - span, anchor === "start" ? x + span : x);
    return Math.max(16, Math.min(sy(groundAt(m.frontM)) - 40, under - gap));
  };
  const dist = (metres: number) => `${formatNumber(d(metres), 0)} ${unit}`;
  const fits = (x: number, text: string, anchor: "start" | "end") => (anchor === "end" ? x - text.length * CHAR_PX >= 2 : x + text.length * CHAR_PX <= width - 2);
  let frontLabelRight = false;
  if (m.train) {
    const fx = sx(m.train.frontM);
    const gy = sy(groundAt(m.train.frontM));
    const text = st("front", { distance: dist(m.train.frontM) });
    // To the left of the mark, unless there is no room there.
    frontLabelRight = !fits(fx - 6, text, "end");
    const anchor = frontLabelRight ? "start" : "end";
    const x = frontLabelRight ? fx + 6 : fx - 6;
    plot.front = { x: fx, y1: gy + 4, y2: gy - 34, label: { x, y: labelY(x, text, anchor, TRAIN_LIFT + 12), text, anchor } };
  }
  if (m.clearEndM > m.frontM) {
    const text = st("clear", { distance: dist(m.clearEndM - m.frontM) });
    const x0 = sx(m.frontM) + 8;
    const anchor = fits(x0, text, "start") ? "start" : "end";
    const x = anchor === "start" ? x0 : width - 2;
    // Above the front's label when both would sit on the same side of the mark.
    const y = labelY(x, text, anchor, CLEAR_LIFT + 8) - (frontLabelRight || anchor === "end" ? 20 : 0);
    plot.clear = { path: path(alongGround(m.ground, m.frontM, m.clearEndM), CLEAR_LIFT), label: { x, y: Math.max(16, y), text, anchor } };
  }
  return plot;
}
