/**
 * What the profile chart and the printed sketch draw, worked out once: the ground (elevation
 * integrated from the gradients, `elevationAt`), the standing train on it, the slack state each
 * coupling is in (`initialSlack`), the clear distance ahead and the hazards. Pure; SI metres.
 */
import { buildConsist } from "../../../core/train/consist.js";
import { initialSlack } from "../../../core/train/slack.js";
import { elevationAt } from "../../../core/physics/track.js";
import type { StartCase } from "../../../core/train/types.js";
import type { TrackProfile } from "../../../core/physics/types.js";
import type { SegmentFile } from "../../../profiles/schemas.js";
import type { HazardKind } from "./draft.js";
import { card } from "../../../i18n/en/card.js";
import { tr } from "../../i18n.js";
import { notes } from "../../../i18n/en/notes.js";

const nt = tr.ns(notes);

const t = tr.ns(card);

export type SlackWord = "stretched" | "bunched";

/** A stretch of the train whose couplings are all in one slack state (from front to rear). */
export interface SlackRun {
  state: SlackWord;
  /** Chainage of the run's front end and rear end, m. */
  frontM: number;
  rearM: number;
  couplings: number;
}

export interface ProfilePoint {
  x: number;
  h: number;
}

export interface ProfileModel {
  startM: number;
  endM: number;
  /** Elevation at every segment boundary, relative to the profile's start, m. */
  ground: ProfilePoint[];
  frontM: number;
  clearEndM: number;
  train?: { rearM: number; frontM: number; runs: SlackRun[]; vehicles: number };
  hazards: Array<ProfilePoint & { kind: HazardKind; label: string }>;
}

/**
 * Heights are drawn this many times steeper than distances in every profile drawing — the editor's chart
 * and the printed card's sketch, whatever the note or the size of the box — so two notes compare at a
 * glance and a driver learns one look for a 10 ‰ bank. Each drawing says it ("heights ×20").
 */
export const VERTICAL_EXAGGERATION = 20;
/** Smaller exaggerations, tried in turn when the relief of a long or steep profile would not fit the box. */
const FALLBACK_EXAGGERATIONS = [10, 5, 2, 1] as const;

/**
 * The exaggeration a drawing uses: VERTICAL_EXAGGERATION, unless the ground's relief (m) drawn that steep
 * would not fit `heightPx` at `pxPerM` along the line; then the largest fallback that fits.
 */
export function exaggerationFor(reliefM: number, pxPerM: number, heightPx: number): number {
  for (const e of [VERTICAL_EXAGGERATION, ...FALLBACK_EXAGGERATIONS]) if (reliefM * pxPerM * e <= heightPx) return e;
  return 1;
}

/** The drawing's words for its exaggeration. */
export function exaggerationWords(e: number): string {
  return e === VERTICAL_EXAGGERATION ? nt("pmHeights", { factor: String(e) }) : nt("pmHeightsNoFit", { factor: String(e), wanted: String(VERTICAL_EXAGGERATION) });
}

/** The segments that can be drawn (finite, positive length), as a track profile. */
export function drawableTrack(segs: readonly SegmentFile[]): TrackProfile | undefined {
  const ok = segs.filter((s) => [s.from_m, s.length_m, s.gradient_permille, s.curveRadius_m].every(Number.isFinite) && s.length_m > 0);
  if (ok.length === 0) return undefined;
  return { segments: ok.map((s) => ({ startM: s.from_m, lengthM: s.length_m, gradePermille: s.gradient_permille, curveRadiusM: s.curveRadius_m })) };
}

/** Elevation along the profile and the train on it; `c` is the reference case (absent when it cannot be placed). */
export function profileModel(
  note: { segments: readonly SegmentFile[]; frontAt_m: number; clearAhead_m: number; hazards: ReadonlyArray<{ kind: HazardKind; at_m?: number; note?: string }> },
  c: StartCase | undefined,
): ProfileModel | undefined {
  const track = drawableTrack(note.segments);
  if (!track) return undefined;
  const first = track.segments[0]!;
  const last = track.segments[track.segments.length - 1]!;
  const startM = first.startM;
  const frontM = Number.isFinite(note.frontAt_m) ? note.frontAt_m : last.startM + last.lengthM;
  const clearEndM = frontM + (Number.isFinite(note.clearAhead_m) ? Math.max(0, note.clearAhead_m) : 0);
  const endM = Math.max(last.startM + last.lengthM, clearEndM);
  const xs = new Set<number>([startM, endM]);
  for (const s of track.segments) {
    xs.add(s.startM);
    xs.add(s.startM + s.lengthM);
  }
  const ground = [...xs].filter((x) => x >= startM && x <= endM).sort((a, b) => a - b).map((x) => ({ x, h: elevationAt(track, x) }));
  const hazards = note.hazards
    .filter((h) => h.at_m !== undefined && Number.isFinite(h.at_m))
    .map((h) => ({ x: h.at_m!, h: elevationAt(track, h.at_m!), kind: h.kind, label: h.note ?? "" }))
    .sort((a, b) => a.x - b.x);
  const model: ProfileModel = { startM, endM, ground, frontM, clearEndM, hazards };
  if (c) model.train = placeTrain(c);
  return model;
}

/** The standing train's extent and its slack runs, head first. */
export function placeTrain(c: StartCase): NonNullable<ProfileModel["train"]> {
  const consist = buildConsist(c);
  const signs = initialSlack(consist, c.location.track, c.train.slackState);
  const vs = consist.vehicles;
  const frontM = c.location.frontAtM;
  const rearM = frontM - consist.lengthM;
  const runs: SlackRun[] = [];
  for (let j = 0; j < signs.length; j++) {
    const state: SlackWord = signs[j]! > 0 ? "stretched" : "bunched";
    const prev = runs[runs.length - 1];
    // A run ends at the centre of the vehicle after its last coupling; the train's ends close the first and last.
    const runRear = j === signs.length - 1 ? rearM : vs[j + 1]!.centreChainageM;
    if (prev && prev.state === state) {
      prev.rearM = runRear;
      prev.couplings++;
    } else {
      runs.push({ state, frontM: prev ? prev.rearM : frontM, rearM: runRear, couplings: 1 });
    }
  }
  return { rearM, frontM, runs, vehicles: vs.length };
}

/** One plain sentence on the slack state, front to rear, with lengths in the caller's words. */
export function slackSentence(runs: readonly SlackRun[], dist: (m: number) => string): string {
  if (runs.length === 0) return "";
  if (runs.length === 1) {
    return runs[0]!.state === "stretched" ? t("slackStretched") : t("slackBunched");
  }
  const parts = runs.map((r, k) => {
    const where = k === 0 ? t("slackFront") : k === runs.length - 1 ? t("slackRear") : t("slackNext");
    return t(r.state === "stretched" ? "slackPartStretched" : "slackPartBunched", { where, length: dist(r.frontM - r.rearM) });
  });
  const s = parts.join(", ");
  return `${s.charAt(0).toUpperCase()}${s.slice(1)}.`;
}

/** Ground points between two chainages (ends included), for drawing something that follows the track. */
export function alongGround(ground: readonly ProfilePoint[], fromM: number, toM: number): ProfilePoint[] {
  const lo = Math.min(fromM, toM);
  const hi = Math.max(fromM, toM);
  const at = (x: number): number => {
    for (let k = 1; k < ground.length; k++) {
      const a = ground[k - 1]!;
      const b = ground[k]!;
      if (x <= b.x || k === ground.length - 1) return b.x === a.x ? a.h : a.h + ((b.h - a.h) * (x - a.x)) / (b.x - a.x);
    }
    return ground[0]?.h ?? 0;
  };
  return [{ x: lo, h: at(lo) }, ...ground.filter((p) => p.x > lo && p.x < hi), { x: hi, h: at(hi) }];
}
