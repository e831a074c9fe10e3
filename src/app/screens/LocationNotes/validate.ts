/**
 * The editor's checks, in words a route trainer can act on, in the language on screen and in the user's
 * units: gaps and overlaps between segments, gradients beyond ±60 ‰, radii below 80 m, the reference
 * train not fitting on the profile, and the revision entry. Each carries its code, which is what the
 * editor acts on (the "Join segments" offer), never its words. The schema runs last as a guard for
 * anything not covered here.
 */
import { noteChecks, type NoteCheckCode } from "../../../i18n/en/noteChecks.js";
import { notes } from "../../../i18n/en/notes.js";
import { fromZodIssues, type RawIssue } from "../../../profiles/issues.js";
import { locationNoteSchema } from "../../../profiles/schemas.js";
import { localiseIssue } from "../../fieldWords.js";
import { show, type UnitSystem } from "../../format.js";
import { tr } from "../../i18n.js";
import { noteFromDraft, type NoteDraft } from "./draft.js";

export interface NoteIssue {
  /** Field path in the note's shape, e.g. "segments[2].gradient_permille"; "train" for the fit. */
  path: string;
  /** What the check found; "segGap" and "segOverlap" are what "Join segments" mends. */
  code: NoteCheckCode;
  message: string;
  severity: "error" | "warning";
}

export interface CheckContext {
  units: UnitSystem;
  /** Length of the reference train with its locomotives, m (NaN when unknown). */
  trainLengthM: number;
  /** Whether the draft differs from the saved note (a revision entry is then needed). */
  changed: boolean;
}

/** Gradient limit of adhesion railways, ‰. */
export const MAX_GRADIENT_PERMILLE = 60;
/** Smallest curve radius accepted, m (0 = straight). */
export const MIN_RADIUS_M = 80;
const EPS = 1e-6;

export function checkDraft(d: NoteDraft, ctx: CheckContext): NoteIssue[] {
  const u = ctx.units;
  const dist = (m: number) => show("distance", m, u);
  const grade = (pm: number) => show("grade", pm / 1000, u);
  const out: NoteIssue[] = [];
  const t = tr.ns(noteChecks);
  const say = (code: NoteCheckCode, figures?: Readonly<Record<string, string | number>>) => (t as (k: string, p?: Readonly<Record<string, string | number>>) => string)(code, figures);
  const err = (path: string, code: NoteCheckCode, figures?: Readonly<Record<string, string | number>>) => out.push({ path, code, message: say(code, figures), severity: "error" });
  const warn = (path: string, code: NoteCheckCode, figures?: Readonly<Record<string, string | number>>) => out.push({ path, code, message: say(code, figures), severity: "warning" });

  if (d.name.trim() === "") err("name", "nameMissing");

  if (d.segments.length === 0) err("segments", "noSegments");
  d.segments.forEach((s, k) => {
    const n = k + 1;
    if (!Number.isFinite(s.from_m)) err(`segments[${k}].from_m`, "segStart", { n });
    if (!Number.isFinite(s.length_m)) err(`segments[${k}].length_m`, "segLength", { n });
    else if (s.length_m <= 0) err(`segments[${k}].length_m`, "segLengthPositive", { n, zero: dist(0) });
    if (!Number.isFinite(s.gradient_permille)) err(`segments[${k}].gradient_permille`, "segGradient", { n });
    else if (Math.abs(s.gradient_permille) > MAX_GRADIENT_PERMILLE + EPS) {
      err(`segments[${k}].gradient_permille`, "segGradientSteep", { n, grade: grade(s.gradient_permille), max: grade(MAX_GRADIENT_PERMILLE) });
    }
    if (!Number.isFinite(s.curveRadius_m)) err(`segments[${k}].curveRadius_m`, "segRadius", { n });
    else if (s.curveRadius_m !== 0 && s.curveRadius_m < MIN_RADIUS_M) {
      err(`segments[${k}].curveRadius_m`, "segRadiusTight", { n, radius: show("radius", s.curveRadius_m, u), min: show("radius", MIN_RADIUS_M, u) });
    }
    if (k > 0) {
      const p = d.segments[k - 1]!;
      const end = p.from_m + p.length_m;
      const gap = s.from_m - end;
      const join = tr.ns(notes)("segJoin");
      if (Number.isFinite(gap) && gap > EPS) {
        err(`segments[${k}].from_m`, "segGap", { gap: dist(gap), k, next: k + 1, end: dist(end), start: dist(s.from_m), join });
      } else if (Number.isFinite(gap) && gap < -EPS) {
        err(`segments[${k}].from_m`, "segOverlap", { overlap: dist(-gap), k, next: k + 1, end: dist(end), start: dist(s.from_m), join });
      }
    }
  });

  const first = d.segments[0];
  const last = d.segments[d.segments.length - 1];
  const geometryOk = first !== undefined && last !== undefined && d.segments.every((s) => Number.isFinite(s.from_m) && Number.isFinite(s.length_m));
  if (!Number.isFinite(d.frontAt_m)) err("frontAt_m", "frontMissing");
  else if (geometryOk) {
    const start = first.from_m;
    const end = last.from_m + last.length_m;
    if (d.frontAt_m > end + EPS) err("frontAt_m", "frontBeyond", { front: dist(d.frontAt_m), end: dist(end) });
    else if (d.frontAt_m < start - EPS) err("frontAt_m", "frontBefore", { front: dist(d.frontAt_m), start: dist(start) });
    else if (Number.isFinite(ctx.trainLengthM)) {
      const rear = d.frontAt_m - ctx.trainLengthM;
      if (rear < start - EPS) {
        err("train", "trainNotFit", { length: dist(ctx.trainLengthM), rear: dist(rear), short: dist(start - rear), start: dist(start) });
      }
    }
    if (Number.isFinite(d.clearAhead_m) && d.clearAhead_m >= 0 && d.frontAt_m <= end + EPS && d.frontAt_m + d.clearAhead_m > end + EPS) {
      warn("clearAhead_m", "profileEnds", { ahead: dist(end - d.frontAt_m), clear: dist(d.clearAhead_m) });
    }
  }
  if (!Number.isFinite(d.clearAhead_m) || d.clearAhead_m < 0) err("clearAhead_m", "clearMissing");
  if (Number.isFinite(d.speedLimit_kmh) && d.speedLimit_kmh <= 0) err("speedLimit_kmh", "speedLimit");

  d.hazards.forEach((h, k) => {
    if (h.kind === "other" && h.note.trim() === "") err(`hazards[${k}].note`, "hazardNote", { n: k + 1 });
  });

  if (ctx.changed || d.revisions.length === 0) {
    if (!/^\d{4}-\d{2}-\d{2}$/.test(d.revision.date.trim()) || Number.isNaN(Date.parse(d.revision.date.trim()))) err("revision.date", "revisionDate");
    if (d.revision.initials.trim() === "") err("revision.initials", "initialsMissing");
    else if (d.revision.initials.trim().length > 8) err("revision.initials", "initialsLong");
    if (d.revision.change.trim() === "") err("revision.change", "changeMissing");
  }

  // The schema as a last guard (text lengths and anything the checks above do not cover).
  if (!out.some((i) => i.severity === "error")) {
    const r = locationNoteSchema.safeParse(noteFromDraft(d, d.id || "draft"), { reportInput: true });
    if (!r.success) for (const i of fromZodIssues(r.error.issues as ReadonlyArray<RawIssue>)) err(i.path, "schema", { path: i.path, message: localiseIssue(i, u).message });
  }
  return out;
}

/** The first error at a path (or at one of several). */
export function issueAt(issues: readonly NoteIssue[], ...paths: string[]): NoteIssue | undefined {
  return issues.find((i) => paths.includes(i.path));
}
