/**
 * From a railML model to the stretch of line a location note describes: find the track and position
 * where the standing train's front is, walk the tracks' topology (trackBegin / trackEnd connections) both
 * ways for as far as asked behind and ahead, and lay the gradients and radii met on the way end to end
 * in the note's chainage: 0 at the rear end of the stretch, growing in the direction of travel, gradients
 * rising positive in that direction, radius 0 for straight track. Pure; metres, ‰, km/h.
 *
 * How railML's values are read (sources beside the tests in tests/profiles/railml.test.ts):
 * - A gradientChange, radiusChange or speedChange holds from its `pos` on, in its `dir`, until the next
 *   one of the same direction. `slope` is in ‰ and rises positive as seen travelling in `dir`: a
 *   dir="down" slope of -4 ‰ is a rise of 4 ‰ towards increasing pos. Elements without a direction are
 *   taken as given towards increasing pos.
 * - Changes given for the direction of travel are used; where none holds at a place, those given for the
 *   other direction are turned round (a slope changes sign, a radius does not).
 * - A change holds across the joint into the next track until a change of the same direction comes, so a
 *   value is the same whichever way the stretch is read. Where nothing holds at the start of the
 *   stretch, the first value found is taken back to it (and said so).
 * - A curve's side does not change its resistance, so a radius's sign is dropped; 0 is straight.
 */
import type { SegmentFile } from "../schemas.js";
import { counted, given, railmlEnglish, say, type RailmlCode, type RailmlText } from "./text.js";
import type { PlacedThing, PlacedValue, RailmlModel, RailmlThingKind, RailmlTrack } from "./model.js";

export type TravelDirection = "up" | "down";

/** Where the front of the standing train is. */
export type FrontPlace =
  /** A position along the line (railML `absPos`), m. */
  | { kind: "absPos"; absPos: number; track?: string }
  /** A position along one track (railML `pos`), m. */
  | { kind: "pos"; track: string; pos: number }
  /** An operational point (its id, name or code), placed on a track by a crossSection. */
  | { kind: "ocp"; ocp: string; track?: string };

export interface StretchRequest {
  front: FrontPlace;
  /** "up": towards increasing pos of the track the front stands on (railML's dir="up"); "down": the other way. */
  direction: TravelDirection;
  /** How far behind the front to take, m (at least the train's length). */
  behindM: number;
  /** How far ahead of the front to take, m. */
  aheadM: number;
}

export interface StretchHazard {
  kind: "signal" | "points" | "level-crossing" | "tunnel" | "bridge" | "platform";
  /** Chainage in the note, m. */
  at_m: number;
  /** The hazard's note in English ("From railML: signal "S4" (T1, s4)."). */
  note: string;
  /** The same as data, for the note in another language (railml/text.ts). */
  text: RailmlText;
}

export interface Stretch {
  /** Contiguous segments from 0, in the note's units (m, ‰, radius m with 0 straight). */
  segments: SegmentFile[];
  frontAt_m: number;
  /** Length taken ahead of the front, m (less than asked where the line ends). */
  aheadM: number;
  behindM: number;
  /** The lowest vMax in force from the front to the end of the stretch ahead, km/h, if the file gives one. */
  speedLimit_kmh?: number;
  hazards: StretchHazard[];
  /** The tracks walked, in the direction of travel, with the part of each that was used. */
  tracks: Array<{ id: string; name?: string; fromPos: number; toPos: number }>;
  /** Where the front is, in words ("track T1 at pos 420 m, absPos 12 420 m"). */
  frontWords: string;
  /** The same as data, for words in another language (railml/text.ts). */
  frontText: RailmlText;
  /** What was assumed or left out, in words. */
  notes: string[];
  /** The same as data, for words in another language (railml/text.ts). */
  noteTexts: RailmlText[];
}

/** A failure's `text` is its message as data (absent where a caller words a failure of its own). */
export type StretchResult = { ok: true; value: Stretch } | { ok: false; message: string; text?: RailmlText };

/** Most hazards offered from one stretch. */
const MAX_HAZARDS = 40;
const EPS = 1e-6;

/** A part of one track walked in one direction: from `fromPos` to `toPos` (decreasing when `sense` is -1). */
interface Piece {
  track: RailmlTrack;
  fromPos: number;
  toPos: number;
  sense: 1 | -1;
}

const round3 = (x: number) => Math.round(x * 1000) / 1000;
const lo = (t: RailmlTrack) => Math.min(t.begin?.pos ?? 0, t.end?.pos ?? 0);
const hi = (t: RailmlTrack) => Math.max(t.begin?.pos ?? 0, t.end?.pos ?? 0);

/** Position along the line at a pos of a track, when both its ends give one (linear in between). */
export function absPosAt(t: RailmlTrack, pos: number): number | undefined {
  const b = t.begin;
  const e = t.end;
  if (b?.absPos === undefined || e?.absPos === undefined || Math.abs(e.pos - b.pos) < EPS) return undefined;
  return b.absPos + ((pos - b.pos) * (e.absPos - b.absPos)) / (e.pos - b.pos);
}

function posAtAbs(t: RailmlTrack, absPos: number): number | undefined {
  const b = t.begin;
  const e = t.end;
  if (b?.absPos === undefined || e?.absPos === undefined || Math.abs(e.absPos - b.absPos) < EPS) return undefined;
  const f = (absPos - b.absPos) / (e.absPos - b.absPos);
  if (f < -EPS || f > 1 + EPS) return undefined;
  return b.pos + f * (e.pos - b.pos);
}

/** A track as the texts name it after the word "track": its name and id, or its id. */
const trackName = (t: RailmlTrack) => `"${t.name ?? t.id}"${t.name ? ` (${t.id})` : ""}`;
/** A failure with its text. */
const failed = (text: RailmlText): { ok: false; message: string; text: RailmlText } => ({ ok: false, message: railmlEnglish(text), text });

/** Of several tracks, the one main track; undefined when that does not single one out. */
function onlyMain(tracks: RailmlTrack[]): RailmlTrack | undefined {
  const main = tracks.filter((t) => t.type === "mainTrack");
  return main.length === 1 ? main[0] : undefined;
}

function findFront(
  m: RailmlModel,
  f: FrontPlace,
): { ok: true; track: RailmlTrack; pos: number; words: string; text: RailmlText; ocp?: string } | { ok: false; message: string; text: RailmlText } {
  const byId = (id: string) => m.tracks.find((t) => t.id === id);
  const placeText = (t: RailmlTrack, pos: number): RailmlText => {
    const a = absPosAt(t, pos);
    return a !== undefined ? say("frontTrackAbs", { track: trackName(t), pos: given(round3(pos)), absPos: given(round3(a)) }) : say("frontTrack", { track: trackName(t), pos: given(round3(pos)) });
  };
  const found = (t: RailmlTrack, pos: number, ocp?: string) => {
    const text = ocp !== undefined ? say("frontOcp", { ocp, place: placeText(t, pos) }) : placeText(t, pos);
    return { ok: true as const, track: t, pos, words: railmlEnglish(text), text, ...(ocp !== undefined ? { ocp } : {}) };
  };
  if (f.kind === "pos") {
    const t = byId(f.track);
    if (!t) return failed(say("noTrack", { track: f.track }));
    if (f.pos < lo(t) - EPS || f.pos > hi(t) + EPS) return failed(say("posOutside", { pos: given(f.pos), track: trackName(t), from: given(lo(t)), to: given(hi(t)) }));
    return found(t, f.pos);
  }
  if (f.kind === "absPos") {
    const candidates = (f.track ? [byId(f.track)].filter((t): t is RailmlTrack => t !== undefined) : m.tracks)
      .map((t) => ({ t, pos: posAtAbs(t, f.absPos) }))
      .filter((c): c is { t: RailmlTrack; pos: number } => c.pos !== undefined);
    if (f.track && !byId(f.track)) return failed(say("noTrack", { track: f.track }));
    if (candidates.length === 0) {
      const anyAbs = m.tracks.some((t) => t.begin?.absPos !== undefined && t.end?.absPos !== undefined);
      return failed(anyAbs ? say("noTrackCovers", { which: f.track ? ` "${f.track}"` : "", absPos: given(f.absPos) }) : say("noAbsPos"));
    }
    // Where two tracks meet, the position is on both: take the one the position is inside, else the first.
    const inside = candidates.filter((c) => c.pos > lo(c.t) + EPS && c.pos < hi(c.t) - EPS);
    const distinct = inside.length > 0 ? inside : [candidates[0]!];
    if (distinct.length > 1) {
      const main = onlyMain(distinct.map((c) => c.t));
      if (!main) {
        return failed(say("absPosOnSeveral", { absPos: given(f.absPos), count: counted(distinct.length), list: distinct.map((c) => c.t.id).join(", ") }));
      }
      const c = distinct.find((x) => x.t === main)!;
      return found(c.t, c.pos);
    }
    const c = distinct[0]!;
    return found(c.t, c.pos);
  }
  const key = f.ocp.trim().toLowerCase();
  const ocps = m.ocps.filter((o) => [o.id, o.name, o.code].some((x) => x !== undefined && x.toLowerCase() === key));
  if (ocps.length === 0) {
    // Name what the file has (the first ten, each by its name and id), so the next try can be one of them.
    const listed = m.ocps.slice(0, 10).map((o) => `"${o.name ?? o.code ?? o.id}"${o.name !== undefined || o.code !== undefined ? ` (${o.id})` : ""}`);
    const list = listed.join(", ") + (m.ocps.length > 10 ? ", …" : "");
    return failed(say("noOcp", { ocp: f.ocp, known: m.ocps.length > 0 ? say("knownOcps", { list }) : say("noOcps") }));
  }
  const ids = new Set(ocps.map((o) => o.id));
  const places = m.tracks.flatMap((t) => t.crossSections.filter((c) => ids.has(c.ocpRef) && (!f.track || t.id === f.track)).map((c) => ({ t, pos: c.pos })));
  if (places.length === 0) return failed(say("ocpNotPlaced", { ocp: f.ocp, which: f.track ? ` "${f.track}"` : "" }));
  let place = places[0]!;
  if (places.length > 1) {
    const main = onlyMain(places.map((p) => p.t));
    if (!main) return failed(say("ocpOnSeveral", { ocp: f.ocp, count: String(places.length), list: places.map((p) => p.t.id).join(", ") }));
    place = places.find((p) => p.t === main)!;
  }
  const name = ocps[0]!.name ?? ocps[0]!.code ?? ocps[0]!.id;
  return found(place.t, place.pos, name);
}

/**
 * Walk from (track, pos) in `sense` (+1 towards increasing pos) for `lengthM`, crossing to the next track
 * through the connection at each end. Returns the pieces walked and why the walk stopped short, if it did.
 */
function walk(m: RailmlModel, start: RailmlTrack, pos: number, sense: 1 | -1, lengthM: number): { pieces: Piece[]; short?: RailmlText } {
  const connections = new Map<string, { track: RailmlTrack; at: "begin" | "end" }>();
  for (const t of m.tracks) {
    if (t.begin?.connection) connections.set(t.begin.connection.id, { track: t, at: "begin" });
    if (t.end?.connection) connections.set(t.end.connection.id, { track: t, at: "end" });
  }
  const pieces: Piece[] = [];
  let track = start;
  let at = pos;
  let s = sense;
  let left = lengthM;
  const seen = new Set<string>();
  for (;;) {
    // The end of this track in the direction walked (trackEnd when its pos is the larger).
    const endsUp = (track.end?.pos ?? 0) >= (track.begin?.pos ?? 0);
    const exitEnd = (s === 1) === endsUp ? track.end : track.begin;
    const exitPos = exitEnd?.pos ?? (s === 1 ? hi(track) : lo(track));
    const available = Math.max(0, (exitPos - at) * s);
    const take = Math.min(available, left);
    if (take > EPS) pieces.push({ track, fromPos: at, toPos: at + s * take, sense: s });
    left -= take;
    if (left <= EPS) return { pieces };
    seen.add(`${track.id}:${s}`);
    const conn = exitEnd?.connection;
    const why = (): RailmlText => {
      const end = exitEnd === track.end ? "trackEnd" : "trackBegin";
      if (!conn) return say("trackEnds", { track: trackName(track), end, closed: exitEnd?.closed ? `: ${exitEnd.closed}` : "", distance: given(round3(lengthM - left)) });
      return say("connectionNowhere", { end, track: trackName(track), ref: conn.ref });
    };
    if (!conn) return { pieces, short: why() };
    const next = connections.get(conn.ref);
    if (!next) return { pieces, short: why() };
    // Entering at a track's begin walks it towards its end, and the other way round.
    const nt = next.track;
    const nEndsUp = (nt.end?.pos ?? 0) >= (nt.begin?.pos ?? 0);
    const enterBegin = next.at === "begin";
    const ns: 1 | -1 = enterBegin === nEndsUp ? 1 : -1;
    if (seen.has(`${nt.id}:${ns}`)) return { pieces, short: say("loop", { track: trackName(nt) }) };
    track = nt;
    at = (enterBegin ? nt.begin?.pos : nt.end?.pos) ?? 0;
    s = ns;
  }
}

/** A change placed on the walk: where it is (travel distance from the walk's start) and its value. */
interface Mark {
  u: number;
  value: number;
}

/**
 * The changes met on a walk, split by the way they hold. A change holds from its place on in its own
 * direction: one whose direction is the way of travel ("forward") holds from its place onwards, until the
 * next forward change; one given for the other way ("backward") holds from its place back towards the
 * start, until the next backward change behind it. Values come out as seen travelling (a backward slope
 * is turned round). Changes on the first and last tracks beyond the walked part count too: they say what
 * holds where the walk begins.
 */
function marksAlong(pieces: readonly Piece[], pick: (t: RailmlTrack) => readonly PlacedValue[], signed: boolean): { fwd: Mark[]; back: Mark[]; total: number } {
  const fwd: Mark[] = [];
  const back: Mark[] = [];
  let offset = 0;
  pieces.forEach((p, k) => {
    const len = Math.abs(p.toPos - p.fromPos);
    for (const v of pick(p.track)) {
      const u = offset + (v.pos - p.fromPos) * p.sense;
      const inside = u >= offset - EPS && u <= offset + len + EPS;
      const beforeStart = k === 0 && u < offset;
      const afterEnd = k === pieces.length - 1 && u > offset + len;
      if (!inside && !beforeStart && !afterEnd) continue;
      // "both" and no dir are taken as given towards increasing pos, like "up".
      const elementUp = v.dir !== "down";
      const withTravel = elementUp === (p.sense === 1);
      const value = signed && !withTravel ? -v.value : v.value;
      (withTravel ? fwd : back).push({ u, value });
    }
    offset += len;
  });
  const byU = (x: Mark, y: Mark) => x.u - y.u;
  // Stable sorts: of two changes at one place (a track's end and the next one's begin), the later track's counts.
  return { fwd: fwd.sort(byU), back: back.sort(byU), total: offset };
}

/** A value along a track as intervals of pos: [from, to) with the value in force (null: none given). */
type Interval = { from: number; to: number; value: number | null };

/**
 * A track's own values of one direction, as seen travelling towards increasing pos: an "up" change holds
 * from its pos upwards, a "down" change from its pos downwards (its slope turned round).
 */
function ownIntervals(t: RailmlTrack, items: readonly PlacedValue[], which: "up" | "down", signed: boolean): Interval[] {
  const a = lo(t);
  const b = hi(t);
  const own = items.filter((v) => (which === "up" ? v.dir !== "down" : v.dir === "down")).sort((x, y) => x.pos - y.pos);
  const cuts = [a, ...own.map((v) => v.pos).filter((p) => p > a + EPS && p < b - EPS), b];
  const uniq = cuts.filter((p, k) => k === 0 || p - cuts[k - 1]! > EPS);
  const out: Interval[] = [];
  for (let k = 0; k + 1 < uniq.length; k++) {
    const from = uniq[k]!;
    const to = uniq[k + 1]!;
    const mid = (from + to) / 2;
    let v: PlacedValue | undefined;
    if (which === "up") {
      for (const x of own) if (x.pos <= mid) v = x;
    } else {
      v = own.find((x) => x.pos >= mid);
    }
    out.push({ from, to, value: v === undefined ? null : which === "down" && signed ? -v.value : v.value });
  }
  return out;
}

const valueIn = (list: readonly Interval[], pos: number): number | null => list.find((i) => pos >= i.from - EPS && pos <= i.to + EPS)?.value ?? null;

/**
 * Values along the whole walk (pieces in travel order), in travel distance from the walk's start; null
 * where nothing is given. On each track its own changes count, those for the direction of travel first;
 * where a track has none in force, a change from a track before or after holds on across the joint (a
 * change for the way of travel from behind, else one for the other way from ahead).
 */
function along(pieces: readonly Piece[], pick: (t: RailmlTrack) => readonly PlacedValue[], signed: boolean): Array<{ from: number; to: number; value: number | null }> {
  const own: Array<{ from: number; to: number; value: number | null }> = [];
  let offset = 0;
  for (const p of pieces) {
    const items = pick(p.track);
    const preferred = ownIntervals(p.track, items, p.sense === 1 ? "up" : "down", signed);
    const other = ownIntervals(p.track, items, p.sense === 1 ? "down" : "up", signed);
    const a = Math.min(p.fromPos, p.toPos);
    const b = Math.max(p.fromPos, p.toPos);
    const cuts = new Set<number>([p.fromPos, p.toPos]);
    for (const i of [...preferred, ...other]) for (const x of [i.from, i.to]) if (x > a + EPS && x < b - EPS) cuts.add(x);
    const sorted = [...cuts].sort((x, y) => (x - y) * p.sense);
    for (let k = 0; k + 1 < sorted.length; k++) {
      const x0 = sorted[k]!;
      const x1 = sorted[k + 1]!;
      if (Math.abs(x1 - x0) <= EPS) continue;
      const mid = (x0 + x1) / 2;
      const up = valueIn(preferred, mid) ?? valueIn(other, mid);
      // Values are kept as towards increasing pos; walking the other way turns a slope round.
      own.push({ from: offset + Math.abs(x0 - p.fromPos), to: offset + Math.abs(x1 - p.fromPos), value: up === null ? null : signed ? up * p.sense : up });
    }
    offset += b - a;
  }
  const { fwd, back } = marksAlong(pieces, pick, signed);
  return own.map((i) => {
    if (i.value !== null) return i;
    const mid = (i.from + i.to) / 2;
    let value: number | null = null;
    for (const m of fwd) if (m.u <= mid) value = m.value;
    if (value === null) value = back.find((m) => m.u >= mid)?.value ?? null;
    return { ...i, value };
  });
}

/** Fill gaps: carry the value before forward; the first value found goes back to the start. */
function filled(list: Array<{ from: number; to: number; value: number | null }>): { values: Array<{ from: number; to: number; value: number }>; backFilledM: number; none: boolean } {
  const first = list.find((x) => x.value !== null)?.value;
  if (first === undefined || first === null) return { values: list.map((x) => ({ ...x, value: 0 })), backFilledM: 0, none: true };
  let last: number | null = null;
  let back = 0;
  const values = list.map((x) => {
    if (x.value !== null) last = x.value;
    else if (last === null) back += x.to - x.from;
    return { from: x.from, to: x.to, value: x.value ?? last ?? first };
  });
  return { values, backFilledM: back, none: false };
}

/** Merge two piecewise lists into segments (cut wherever either changes), joining equal neighbours. */
function toSegments(grad: Array<{ from: number; to: number; value: number }>, rad: Array<{ from: number; to: number; value: number }>, total: number): SegmentFile[] {
  const cuts = new Set<number>([0, total]);
  for (const x of [...grad, ...rad]) {
    if (x.from > EPS && x.from < total - EPS) cuts.add(round3(x.from));
    if (x.to > EPS && x.to < total - EPS) cuts.add(round3(x.to));
  }
  const sorted = [...cuts].map(round3).sort((a, b) => a - b).filter((x, k, all) => k === 0 || x - all[k - 1]! > 1e-3 / 2);
  const at = (list: Array<{ from: number; to: number; value: number }>, x: number) => list.find((i) => x >= i.from - EPS && x <= i.to + EPS)?.value ?? 0;
  const segs: SegmentFile[] = [];
  for (let k = 0; k + 1 < sorted.length; k++) {
    const from = sorted[k]!;
    const to = sorted[k + 1]!;
    const mid = (from + to) / 2;
    const g = at(grad, mid);
    const r = Math.abs(at(rad, mid));
    const prev = segs[segs.length - 1];
    if (prev && prev.gradient_permille === g && prev.curveRadius_m === r) prev.length_m = round3(to - prev.from_m);
    else segs.push({ from_m: from, length_m: round3(to - from), gradient_permille: g === 0 ? 0 : g, curveRadius_m: r });
  }
  return segs;
}

const HAZARD_WORD: Record<RailmlThingKind, RailmlCode> = {
  signal: "thingSignal",
  points: "thingPoints",
  "level-crossing": "thingLevelCrossing",
  tunnel: "thingTunnel",
  bridge: "thingBridge",
  platform: "thingPlatform",
};

/** Things on the walk that a note may list as hazards, at their chainage (signals only facing the way of travel). */
function hazardsAlong(pieces: readonly Piece[], startAt: number): StretchHazard[] {
  const out: StretchHazard[] = [];
  let offset = 0;
  for (const p of pieces) {
    const a = Math.min(p.fromPos, p.toPos);
    const b = Math.max(p.fromPos, p.toPos);
    const facing = p.sense === 1 ? "up" : "down";
    for (const th of p.track.things as PlacedThing[]) {
      if (th.pos < a - EPS || th.pos > b + EPS) continue;
      if (th.kind === "signal" && th.dir !== "both" && th.dir !== facing) continue;
      const at = round3(startAt + offset + Math.abs(th.pos - p.fromPos));
      const text = say("hazardNote", {
        what: say(HAZARD_WORD[th.kind]),
        name: th.name ? say("hazardName", { name: th.name }) : "",
        length: th.length !== undefined ? say("hazardLength", { length: given(round3(th.length)) }) : "",
        ids: `${p.track.id}${th.id ? `, ${th.id}` : ""}`,
      });
      out.push({ kind: th.kind, at_m: at, note: railmlEnglish(text), text });
    }
    offset += b - a;
  }
  return out.sort((x, y) => x.at_m - y.at_m);
}

/** The stretch a note describes: see the module comment. */
export function railmlStretch(m: RailmlModel, req: StretchRequest): StretchResult {
  if (!(req.behindM > 0) || !(req.aheadM >= 0) || !Number.isFinite(req.behindM) || !Number.isFinite(req.aheadM)) {
    return failed(say("giveBehindAhead"));
  }
  const front = findFront(m, req.front);
  if (!front.ok) return front;
  const sense: 1 | -1 = req.direction === "up" ? 1 : -1;
  const ahead = walk(m, front.track, front.pos, sense, req.aheadM);
  const behindWalk = walk(m, front.track, front.pos, sense === 1 ? -1 : 1, req.behindM);
  // Behind, walked backwards from the front, then turned round to run in the direction of travel.
  const behind = behindWalk.pieces.map((p): Piece => ({ track: p.track, fromPos: p.toPos, toPos: p.fromPos, sense: p.sense === 1 ? -1 : 1 })).reverse();
  const behindM = behind.reduce((s, p) => s + Math.abs(p.toPos - p.fromPos), 0);
  const aheadM = ahead.pieces.reduce((s, p) => s + Math.abs(p.toPos - p.fromPos), 0);
  const pieces = [...behind, ...ahead.pieces];
  const total = behindM + aheadM;
  if (total <= EPS) return failed(say("nothingAround", { front: front.text }));
  if (behindM <= EPS) return failed(say("nothingBehind", { front: front.text, direction: req.direction }));

  const noteTexts: RailmlText[] = [];
  const note = (t: RailmlText) => noteTexts.push(t);
  if (behindWalk.short && behindM < req.behindM - EPS) note(say("onlyBehind", { length: given(round3(behindM)), why: behindWalk.short }));
  if (ahead.short && aheadM < req.aheadM - EPS) note(say("onlyAhead", { length: given(round3(aheadM)), why: ahead.short }));

  const g = filled(along(pieces, (t) => t.gradients, true));
  const r = filled(along(pieces, (t) => t.radii, false));
  if (g.none) note(say("noGradient"));
  else if (g.backFilledM > EPS) note(say("gradientBackFilled", { length: given(round3(g.backFilledM)) }));
  if (r.none) note(say("noRadius"));
  else if (r.backFilledM > EPS) note(say("radiusBackFilled", { length: given(round3(r.backFilledM)) }));

  const segments = toSegments(g.values, r.values, round3(total));
  const frontAt = round3(behindM);

  // The speed limit: the lowest vMax in force from the front to the end of the stretch ahead.
  const speedAhead = lowestAhead(along(pieces, (t) => t.speeds, false), frontAt, total);
  if (speedAhead !== undefined) note(say("speedLimit", { speed: given(speedAhead) }));

  const hazards = hazardsAlong(pieces, 0);
  if (hazards.length > MAX_HAZARDS) note(say("manyHazards", { count: String(hazards.length), max: String(MAX_HAZARDS) }));
  const nearest = [...hazards].sort((x, y) => Math.abs(x.at_m - frontAt) - Math.abs(y.at_m - frontAt)).slice(0, MAX_HAZARDS).sort((x, y) => x.at_m - y.at_m);

  return {
    ok: true,
    value: {
      segments,
      frontAt_m: frontAt,
      aheadM: round3(aheadM),
      behindM: round3(behindM),
      ...(speedAhead !== undefined ? { speedLimit_kmh: speedAhead } : {}),
      hazards: nearest,
      tracks: trackList(pieces),
      frontWords: front.words,
      frontText: front.text,
      notes: noteTexts.map(railmlEnglish),
      noteTexts,
    },
  };
}

/** The tracks walked, one entry for consecutive pieces of one track. */
function trackList(pieces: readonly Piece[]): Stretch["tracks"] {
  const out: Stretch["tracks"] = [];
  for (const p of pieces) {
    const last = out[out.length - 1];
    if (last && last.id === p.track.id && Math.abs(last.toPos - p.fromPos) < 1e-3) last.toPos = round3(p.toPos);
    else out.push({ id: p.track.id, ...(p.track.name ? { name: p.track.name } : {}), fromPos: round3(p.fromPos), toPos: round3(p.toPos) });
  }
  return out;
}

/**
 * The lowest positive value in force between the front and the end (gaps carry the value before them on;
 * limits given for the direction of travel are used where the track has them, else those of the other).
 */
function lowestAhead(list: ReadonlyArray<{ from: number; to: number; value: number | null }>, frontAt: number, total: number): number | undefined {
  let lowest: number | undefined;
  let carried: number | null = null;
  for (const i of list) {
    if (i.value !== null) carried = i.value;
    const v = i.value ?? carried;
    if (v === null || i.to <= frontAt + EPS || i.from >= total - EPS) continue;
    if (v > 0 && (lowest === undefined || v < lowest)) lowest = v;
  }
  return lowest;
}

/** Chainage of railML things and track names, for the preview's caption. */
export function stretchWords(s: Stretch): string {
  const names = [...new Set(s.tracks.map((t) => t.name ?? t.id))];
  return `${round3(s.behindM)} m behind and ${round3(s.aheadM)} m ahead of the front (${s.frontWords}), over ${names.length} track${names.length === 1 ? "" : "s"}: ${names.join(", ")}.`;
}
