/**
 * The note being edited: a plain object close to the file shape (metres, ‰), with a revision entry for
 * this save kept apart from the recorded history. Converting back to a `taut/location@1` note happens
 * only on save; ids are made from the name once, when a new note is first saved.
 */
import type { LocationNoteFile, ReferenceTrainFile, SegmentFile } from "../../../profiles/schemas.js";
import { card } from "../../../i18n/en/card.js";
import { notes } from "../../../i18n/en/notes.js";
import { tr } from "../../i18n.js";

export type HazardKind = LocationNoteFile["hazards"][number]["kind"];
export type Season = LocationNoteFile["seasons"][number]["season"];
export type RailWord = LocationNoteFile["seasons"][number]["rail"];
export type Revision = LocationNoteFile["revisions"][number];

export const HAZARD_KINDS: ReadonlyArray<{ kind: HazardKind; label: string }> = [
  { kind: "points", label: "Points" },
  { kind: "level-crossing", label: "Level crossing" },
  { kind: "tunnel", label: "Tunnel" },
  { kind: "signal", label: "Signal close ahead" },
  { kind: "bridge", label: "Bridge" },
  { kind: "platform", label: "Platform" },
  { kind: "other", label: "Other" },
];
const HAZARD_KEY = {
  points: "hazardPoints",
  "level-crossing": "hazardLevelCrossing",
  tunnel: "hazardTunnel",
  signal: "hazardSignal",
  bridge: "hazardBridge",
  platform: "hazardPlatform",
  other: "hazardOther",
} as const satisfies Record<HazardKind, keyof typeof card.en>;

/** The words a new revision entry starts with, in the language on screen. */
const tn = (k: "edRevNew" | "edRevCarried") => tr.ns(notes)(k);

/** A hazard's kind in the language on screen. */
export function hazardWord(k: HazardKind): string {
  return tr.ns(card)(HAZARD_KEY[k]);
}
export const SEASONS: readonly Season[] = ["spring", "summer", "autumn", "winter"];

export interface DraftHazard {
  kind: HazardKind;
  /** Chainage, m; NaN when not given. */
  at_m: number;
  note: string;
}

export interface DraftSeason {
  season: Season;
  rail: RailWord;
  note: string;
}

export interface NoteDraft {
  /** The saved note's id; "" for a note not yet saved. */
  id: string;
  name: string;
  line: string;
  direction: string;
  standing: string;
  illustrative: boolean;
  segments: SegmentFile[];
  frontAt_m: number;
  clearAhead_m: number;
  /** NaN when not given. */
  speedLimit_kmh: number;
  hazards: DraftHazard[];
  seasons: DraftSeason[];
  practice: string;
  /** The recorded history (not edited). */
  revisions: Revision[];
  /** The entry this save adds. */
  revision: Revision;
  referenceTrain: ReferenceTrainFile;
}

/** Today as YYYY-MM-DD in the device's time zone. */
export function today(now: Date = new Date()): string {
  const p = (n: number) => String(n).padStart(2, "0");
  return `${now.getFullYear()}-${p(now.getMonth() + 1)}-${p(now.getDate())}`;
}

/** A draft for a new note: one straight level segment, the train's front 100 m from its end. */
export function newDraft(referenceTrain: ReferenceTrainFile, initials: string, now: Date = new Date()): NoteDraft {
  return {
    id: "",
    name: "",
    line: "",
    direction: "",
    standing: "",
    illustrative: false,
    segments: [{ from_m: 0, length_m: 1000, gradient_permille: 0, curveRadius_m: 0 }],
    frontAt_m: 900,
    clearAhead_m: 100,
    speedLimit_kmh: Number.NaN,
    hazards: [],
    seasons: [],
    practice: "",
    revisions: [],
    revision: { date: today(now), initials, change: tn("edRevNew") },
    referenceTrain,
  };
}

/** A draft of a saved note; the revision entry for the next save starts empty. */
export function draftFromNote(n: LocationNoteFile, fallbackTrain: ReferenceTrainFile, initials: string, now: Date = new Date()): NoteDraft {
  return {
    id: n.id,
    name: n.name,
    line: n.line ?? "",
    direction: n.direction ?? "",
    standing: n.standing ?? "",
    illustrative: n.illustrative === true,
    segments: n.segments.map((s) => ({ ...s })),
    frontAt_m: n.frontAt_m,
    clearAhead_m: n.clearAhead_m,
    speedLimit_kmh: n.speedLimit_kmh ?? Number.NaN,
    hazards: n.hazards.map((h) => ({ kind: h.kind, at_m: h.at_m ?? Number.NaN, note: h.note ?? "" })),
    seasons: n.seasons.map((s) => ({ season: s.season, rail: s.rail, note: s.note ?? "" })),
    practice: n.practice,
    revisions: n.revisions.map((r) => ({ ...r })),
    revision: { date: today(now), initials, change: "" },
    referenceTrain: { ...(n.referenceTrain ?? fallbackTrain) },
  };
}

/** A lower-case id from a name, unique among `taken`. */
export function idFromName(name: string, taken: ReadonlySet<string>): string {
  const base =
    name
      .normalize("NFKD")
      .replace(/[\u0300-\u036f]/g, "")
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, "-")
      .replace(/^-+|-+$/g, "")
      .slice(0, 60)
      .replace(/-+$/, "") || "note";
  let id = base;
  for (let k = 2; taken.has(id); k++) id = `${base}-${k}`;
  return id;
}

const optText = (s: string) => (s.trim() === "" ? undefined : s.trim());

/**
 * The note a save writes: the draft's fields, with this save's revision entry appended when it says
 * what changed. `id` is used for a draft not yet saved.
 */
export function noteFromDraft(d: NoteDraft, id: string): Record<string, unknown> {
  const revision = { date: d.revision.date.trim(), initials: d.revision.initials.trim(), change: d.revision.change.trim() };
  const addRevision = revision.change !== "" || d.revisions.length === 0;
  const note: Record<string, unknown> = {
    schema: "taut/location@1",
    id: d.id || id,
    name: d.name.trim(),
  };
  const line = optText(d.line);
  const direction = optText(d.direction);
  if (line !== undefined) note.line = line;
  if (direction !== undefined) note.direction = direction;
  if (d.illustrative) note.illustrative = true;
  const standing = optText(d.standing);
  if (standing !== undefined) note.standing = standing;
  note.referenceTrain = { ...d.referenceTrain };
  note.segments = d.segments.map((s) => ({ from_m: s.from_m, length_m: s.length_m, gradient_permille: s.gradient_permille, curveRadius_m: s.curveRadius_m }));
  note.frontAt_m = d.frontAt_m;
  note.clearAhead_m = d.clearAhead_m;
  if (Number.isFinite(d.speedLimit_kmh)) note.speedLimit_kmh = d.speedLimit_kmh;
  note.hazards = d.hazards.map((h) => ({ kind: h.kind, ...(Number.isFinite(h.at_m) ? { at_m: h.at_m } : {}), ...(h.note.trim() ? { note: h.note.trim() } : {}) }));
  note.seasons = d.seasons.map((s) => ({ season: s.season, rail: s.rail, ...(s.note.trim() ? { note: s.note.trim() } : {}) }));
  note.practice = d.practice.trim();
  note.revisions = addRevision ? [...d.revisions, revision] : [...d.revisions];
  return note;
}

/** Segments laid end to end from the first one's start, lengths kept (the "join up" fix for gaps and overlaps). */
export function joinSegments(segs: readonly SegmentFile[]): SegmentFile[] {
  let at = segs[0]?.from_m ?? 0;
  return segs.map((s) => {
    const out = { ...s, from_m: at };
    at += s.length_m;
    return out;
  });
}

/** A segment added after the last one, continuing its gradient and curve. */
export function nextSegment(segs: readonly SegmentFile[]): SegmentFile {
  const last = segs[segs.length - 1];
  if (!last) return { from_m: 0, length_m: 500, gradient_permille: 0, curveRadius_m: 0 };
  return { from_m: last.from_m + last.length_m, length_m: 500, gradient_permille: last.gradient_permille, curveRadius_m: last.curveRadius_m };
}

const isObj = (x: unknown): x is Record<string, unknown> => !!x && typeof x === "object" && !Array.isArray(x);
/** A number as the draft keeps it: NaN for an empty field (JSON writes NaN as null). */
const num = (x: unknown): number => (typeof x === "number" ? x : Number.NaN);
const str = (x: unknown): string => (typeof x === "string" ? x : "");

/**
 * A draft read back from storage, or undefined when it is not one: every field of the right kind, words
 * the editor knows. Numbers left empty come back as NaN.
 */
export function storedNoteDraft(x: unknown): NoteDraft | undefined {
  if (!isObj(x) || !Array.isArray(x.segments) || !Array.isArray(x.hazards) || !Array.isArray(x.seasons) || !Array.isArray(x.revisions)) return undefined;
  if (!isObj(x.revision) || !isObj(x.referenceTrain) || typeof x.referenceTrain.train !== "string") return undefined;
  for (const k of ["id", "name", "line", "direction", "standing", "practice"]) if (typeof x[k] !== "string") return undefined;
  const kinds = HAZARD_KINDS.map((h) => h.kind as string);
  if (!x.segments.every(isObj) || !x.hazards.every((h) => isObj(h) && kinds.includes(str(h.kind)))) return undefined;
  if (!x.seasons.every((s) => isObj(s) && (SEASONS as readonly string[]).includes(str(s.season)) && typeof s.rail === "string")) return undefined;
  if (!x.revisions.every(isObj)) return undefined;
  const rt = x.referenceTrain;
  return {
    id: str(x.id),
    name: str(x.name),
    line: str(x.line),
    direction: str(x.direction),
    standing: str(x.standing),
    illustrative: x.illustrative === true,
    segments: x.segments.map((s) => ({ from_m: num(s.from_m), length_m: num(s.length_m), gradient_permille: num(s.gradient_permille), curveRadius_m: num(s.curveRadius_m) })),
    frontAt_m: num(x.frontAt_m),
    clearAhead_m: num(x.clearAhead_m),
    speedLimit_kmh: num(x.speedLimit_kmh),
    hazards: x.hazards.map((h) => ({ kind: str(h.kind) as HazardKind, at_m: num(h.at_m), note: str(h.note) })),
    seasons: x.seasons.map((s) => ({ season: str(s.season) as Season, rail: str(s.rail) as RailWord, note: str(s.note) })),
    practice: str(x.practice),
    revisions: x.revisions.map((r) => ({ date: str(r.date), initials: str(r.initials), change: str(r.change) })),
    revision: { date: str(x.revision.date), initials: str(x.revision.initials), change: str(x.revision.change) },
    referenceTrain: {
      train: str(rt.train),
      ...(typeof rt.locomotive === "string" ? { locomotive: rt.locomotive } : {}),
      ...(typeof rt.count === "number" ? { count: rt.count } : {}),
      ...(typeof rt.temperature_C === "number" ? { temperature_C: rt.temperature_C } : {}),
    },
  };
}

/**
 * A draft of a note as far as an older record could be carried over (any field may be missing or out of
 * range): the editor then shows what must be put right, field by field, before it can be saved.
 */
export function draftFromPartial(p: Record<string, unknown>, fallbackTrain: ReferenceTrainFile, initials: string, now: Date = new Date()): NoteDraft {
  const list = (x: unknown): Array<Record<string, unknown>> => (Array.isArray(x) ? x.filter(isObj) : []);
  const kinds = HAZARD_KINDS.map((h) => h.kind as string);
  return {
    id: str(p.id),
    name: str(p.name),
    line: str(p.line),
    direction: str(p.direction),
    standing: str(p.standing),
    illustrative: p.illustrative === true,
    segments: list(p.segments).map((s) => ({ from_m: num(s.from_m), length_m: num(s.length_m), gradient_permille: num(s.gradient_permille), curveRadius_m: num(s.curveRadius_m) })),
    frontAt_m: num(p.frontAt_m),
    clearAhead_m: num(p.clearAhead_m),
    speedLimit_kmh: num(p.speedLimit_kmh),
    hazards: list(p.hazards).map((h) => ({ kind: (kinds.includes(str(h.kind)) ? str(h.kind) : "other") as HazardKind, at_m: num(h.at_m), note: str(h.note) })),
    seasons: list(p.seasons)
      .filter((s) => (SEASONS as readonly string[]).includes(str(s.season)))
      .map((s) => ({ season: str(s.season) as Season, rail: str(s.rail) as RailWord, note: str(s.note) })),
    practice: str(p.practice),
    revisions: list(p.revisions).map((r) => ({ date: str(r.date), initials: str(r.initials), change: str(r.change) })),
    revision: { date: today(now), initials, change: tn("edRevCarried") },
    referenceTrain: isObj(p.referenceTrain) && typeof p.referenceTrain.train === "string" ? (p.referenceTrain as ReferenceTrainFile) : fallbackTrain,
  };
}
