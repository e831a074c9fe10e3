/**
 * Synthetic recorded starts for the Start review tests: a run of `taut simulate` (the CLI's own function)
 * on a case whose train or units differ from the planned case, resampled at 1 Hz, written as GPX 1.1 or CSV,
 * with position noise on the GPX fixes. A deterministic generator keeps the files the same on every run.
 */
import { simulateCase, type SequenceEntry } from "../../src/cli/commands/simulate.js";
import { interpolate } from "../../src/core/dispatch/recording.js";
import type { StartCase } from "../../src/core/train/types.js";

export interface SyntheticStart {
  timeS: number[];
  speedKmh: number[];
  distanceM: number[];
  notch: number[];
}

/** Run `taut simulate` and resample its series at 1 Hz from `fromS` to its end. */
export function simulatedStart(c: StartCase, seq: SequenceEntry[], opts: { fromS?: number; extraS?: number } = {}): SyntheticStart {
  const r = simulateCase(c, seq, { series: true });
  const endS = r.final.time_s + (opts.extraS ?? 0);
  const s = opts.extraS ? simulateCase(c, seq, { series: true, durationS: endS }).series! : r.series!;
  const out: SyntheticStart = { timeS: [], speedKmh: [], distanceM: [], notch: [] };
  for (let t = Math.ceil(opts.fromS ?? 0); t <= s.time_s[s.time_s.length - 1]!; t++) {
    out.timeS.push(t);
    out.speedKmh.push(interpolate(s.time_s, s.speed_kmh, t));
    out.distanceM.push(interpolate(s.time_s, s.distance_m, t));
    // The notch in force at t: the last change at or before it.
    let n = 0;
    for (const e of seq) if (e.atS <= t + 1e-9) n = e.notch;
    out.notch.push(n);
  }
  return out;
}

/** A small deterministic generator (mulberry32), so noisy files are the same on every run. */
export function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Mean Earth radius used to lay the run out on the ground, m (IUGG mean radius R1, 6371.0088 km). */
const EARTH_M = 6_371_008.8;

/**
 * The run as a GPX 1.1 track: along a straight line heading `headingDeg` from an invented origin, each fix
 * moved by up to ±noiseM east and north (uniform), times from `startIso`. Element names after the GPX 1.1
 * schema (gpx/trk/trkseg/trkpt with lat, lon; ele; time as xsd:dateTime).
 */
export function gpxText(run: SyntheticStart, o: { noiseM: number; seed: number; startIso?: string; headingDeg?: number; ele?: boolean }): string {
  const rnd = seeded(o.seed);
  const lat0 = 47.1;
  const lon0 = 19.4;
  const h = ((o.headingDeg ?? 60) * Math.PI) / 180;
  const t0 = Date.parse(o.startIso ?? "2026-11-03T05:40:00Z");
  const pts = run.timeS.map((t, i) => {
    const east = run.distanceM[i]! * Math.sin(h) + (2 * rnd() - 1) * o.noiseM;
    const north = run.distanceM[i]! * Math.cos(h) + (2 * rnd() - 1) * o.noiseM;
    const lat = lat0 + (north / EARTH_M) * (180 / Math.PI);
    const lon = lon0 + (east / (EARTH_M * Math.cos((lat0 * Math.PI) / 180))) * (180 / Math.PI);
    const ele = o.ele === false ? "" : `<ele>${(112 + run.distanceM[i]! * 0.002).toFixed(2)}</ele>`;
    return `      <trkpt lat="${lat.toFixed(7)}" lon="${lon.toFixed(7)}">${ele}<time>${new Date(t0 + t * 1000).toISOString()}</time></trkpt>`;
  });
  return [
    '<?xml version="1.0" encoding="UTF-8"?>',
    '<gpx version="1.1" creator="taut tests" xmlns="http://www.topografix.com/GPX/1/1">',
    "  <trk><name>synthetic start (illustrative)</name>",
    "    <trkseg>",
    ...pts,
    "    </trkseg>",
    "  </trk>",
    "</gpx>",
    "",
  ].join("\n");
}

/** The run as the CSV log the review reads: speed to 0.1 km/h, optionally notch, current and distance. */
export function csvText(run: SyntheticStart, o: { notch?: boolean; distance?: boolean; current?: number[] } = {}): string {
  const head = ["time_s", "speed_kmh", ...(o.notch ? ["notch"] : []), ...(o.current ? ["current_A"] : []), ...(o.distance ? ["distance_m"] : [])];
  const rows = run.timeS.map((t, i) =>
    [String(t - run.timeS[0]!), run.speedKmh[i]!.toFixed(1), ...(o.notch ? [String(run.notch[i])] : []), ...(o.current ? [o.current[i]!.toFixed(0)] : []), ...(o.distance ? [run.distanceM[i]!.toFixed(1)] : [])].join(","),
  );
  return [head.join(","), ...rows, ""].join("\n");
}
