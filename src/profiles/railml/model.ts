/**
 * What Taut keeps of a railML 2.x infrastructure file: each track's two ends (position along the track,
 * position along the line, the connection to the next track), its gradient, radius and speed changes,
 * and the things a trainer may want as hazards (signals, points, level crossings, tunnels, bridges,
 * platform edges), plus the operational points and where they are on the tracks. Plain data: it crosses
 * a Worker boundary by structured clone.
 *
 * Element and attribute names are railML's own (see README "railML import" for the versions and
 * elements read, and tests/profiles/railml.test.ts for the public sources each one was checked against).
 */
import type { RailmlText } from "./text.js";

/**
 * The direction an element applies in, from railML's `dir`: "up" towards increasing `pos` of its track,
 * "down" towards decreasing `pos`; "both" for "both", "none", "unknown" or no `dir` at all.
 */
export type RailmlDir = "up" | "down" | "both";

/** A value that holds from its position on, in its direction, until the next one (slope, radius, vMax). */
export interface PlacedValue {
  id?: string;
  /** Position along the track, m. */
  pos: number;
  dir: RailmlDir;
  value: number;
}

export type RailmlThingKind = "signal" | "points" | "level-crossing" | "tunnel" | "bridge" | "platform";

/** Something at a place on a track that a note may list as a hazard. */
export interface PlacedThing {
  kind: RailmlThingKind;
  id?: string;
  name?: string;
  pos: number;
  dir: RailmlDir;
  /** Length along the track for tunnels, bridges and platform edges, m. */
  length?: number;
}

/** One end of a track (`trackBegin` or `trackEnd`). */
export interface TrackEndInfo {
  /** Position along the track, m. */
  pos: number;
  /** Position along the line (mileage), m, when the file gives it. */
  absPos?: number;
  /** The `connection` at this end: its own id and the id of the connection it joins. */
  connection?: { id: string; ref: string };
  /** How the track ends when it joins nothing. */
  closed?: "openEnd" | "bufferStop" | "other";
}

export interface RailmlTrack {
  id: string;
  name?: string;
  /** railML's track type, e.g. "mainTrack". */
  type?: string;
  begin?: TrackEndInfo;
  end?: TrackEndInfo;
  /** `gradientChange/@slope`, ‰, rising positive as seen travelling in the element's direction. */
  gradients: PlacedValue[];
  /** `radiusChange/@radius`, m; 0 straight; the sign gives the side of the curve. */
  radii: PlacedValue[];
  /** `speedChange/@vMax`, km/h. */
  speeds: PlacedValue[];
  things: PlacedThing[];
  /** `crossSection` elements that place an operational point on this track. */
  crossSections: Array<{ pos: number; ocpRef: string }>;
}

export interface RailmlOcp {
  id: string;
  name?: string;
  code?: string;
}

export interface RailmlModel {
  /** The file's `version` attribute (e.g. "2.2"), or "" when it has none. */
  version: string;
  namespace: string;
  tracks: RailmlTrack[];
  ocps: RailmlOcp[];
  /** Things read but not used, in words (e.g. "2 tracks have no absPos"). */
  warnings: string[];
  /** The same as data, for words in another language (railml/text.ts). */
  warningTexts: RailmlText[];
}

/** What a model holds, for a picker: where positions can be chosen. */
export interface RailmlSummary {
  version: string;
  tracks: number;
  /** Tracks with a position along the line at both ends, and the range they cover. */
  absPosRange?: { min: number; max: number };
  /** Operational points placed on a track (they can be chosen as the front's place). */
  ocps: Array<{ id: string; label: string }>;
  gradientChanges: number;
  radiusChanges: number;
  warnings: string[];
  /** The same as data, for words in another language (railml/text.ts). */
  warningTexts: RailmlText[];
}

export function summarise(m: RailmlModel): RailmlSummary {
  let min = Infinity;
  let max = -Infinity;
  for (const t of m.tracks) {
    for (const e of [t.begin, t.end]) {
      if (e?.absPos !== undefined && t.begin?.absPos !== undefined && t.end?.absPos !== undefined) {
        min = Math.min(min, e.absPos);
        max = Math.max(max, e.absPos);
      }
    }
  }
  const placed = new Set(m.tracks.flatMap((t) => t.crossSections.map((c) => c.ocpRef)));
  return {
    version: m.version,
    tracks: m.tracks.length,
    ...(Number.isFinite(min) ? { absPosRange: { min, max } } : {}),
    ocps: m.ocps.filter((o) => placed.has(o.id)).map((o) => ({ id: o.id, label: o.name ?? o.code ?? o.id })),
    gradientChanges: m.tracks.reduce((n, t) => n + t.gradients.length, 0),
    radiusChanges: m.tracks.reduce((n, t) => n + t.radii.length, 0),
    warnings: m.warnings,
    warningTexts: m.warningTexts,
  };
}
