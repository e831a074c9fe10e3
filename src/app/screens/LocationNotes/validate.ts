/**
 * The editor's checks, in words a route trainer can act on and in the user's units: gaps and overlaps
 * between segments, gradients beyond ±60 ‰, radii below 80 m, the reference train not fitting on the
 * profile, and the revision entry. The schema runs last as a guard for anything not covered here.
 */
import { fromZodIssues, type RawIssue } from "../../../profiles/issues.js";
import { locationNoteSchema } from "../../../profiles/schemas.js";
import { show, type UnitSystem } from "../../format.js";
import { noteFromDraft, type NoteDraft } from "./draft.js";

export interface NoteIssue {
  /** Field path in the note's shape, e.g. "segments[2].gradient_permille"; "train" for the fit. */
  path: string;
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
  const err = (path: string, message: string) => out.push({ path, message, severity: "error" });
  const warn = (path: string, message: string) => out.push({ path, message, severity: "warning" });

  if (d.name.trim() === "") err("name", "Give the place a name: it heads the card and the location pickers.");

  if (d.segments.length === 0) err("segments", "Add at least one segment of track.");
  d.segments.forEach((s, k) => {
    const n = `Segment ${k + 1}`;
    if (!Number.isFinite(s.from_m)) err(`segments[${k}].from_m`, `${n}: enter where it starts.`);
    if (!Number.isFinite(s.length_m)) err(`segments[${k}].length_m`, `${n}: enter its length.`);
    else if (s.length_m <= 0) err(`segments[${k}].length_m`, `${n}: the length must be more than ${dist(0)}.`);
    if (!Number.isFinite(s.gradient_permille)) err(`segments[${k}].gradient_permille`, `${n}: enter a gradient (0 for level track).`);
    else if (Math.abs(s.gradient_permille) > MAX_GRADIENT_PERMILLE + EPS) {
      err(`segments[${k}].gradient_permille`, `${n}: a gradient of ${grade(s.gradient_permille)} is beyond ±${grade(MAX_GRADIENT_PERMILLE)}, steeper than adhesion railways are built. Check the figure and its sign.`);
    }
    if (!Number.isFinite(s.curveRadius_m)) err(`segments[${k}].curveRadius_m`, `${n}: enter a curve radius, or 0 for straight track.`);
    else if (s.curveRadius_m !== 0 && s.curveRadius_m < MIN_RADIUS_M) {
      err(`segments[${k}].curveRadius_m`, `${n}: a radius of ${show("radius", s.curveRadius_m, u)} is below ${show("radius", MIN_RADIUS_M, u)}. Enter 0 for straight track.`);
    }
    if (k > 0) {
      const p = d.segments[k - 1]!;
      const end = p.from_m + p.length_m;
      const gap = s.from_m - end;
      if (Number.isFinite(gap) && gap > EPS) {
        err(`segments[${k}].from_m`, `Gap of ${dist(gap)} between segment ${k} (ends at ${dist(end)}) and segment ${k + 1} (starts at ${dist(s.from_m)}). Use "Join segments" or correct the start.`);
      } else if (Number.isFinite(gap) && gap < -EPS) {
        err(`segments[${k}].from_m`, `Segment ${k + 1} overlaps segment ${k} by ${dist(-gap)} (segment ${k} ends at ${dist(end)}, segment ${k + 1} starts at ${dist(s.from_m)}). Use "Join segments" or correct the start.`);
      }
    }
  });

  const first = d.segments[0];
  const last = d.segments[d.segments.length - 1];
  const geometryOk = first !== undefined && last !== undefined && d.segments.every((s) => Number.isFinite(s.from_m) && Number.isFinite(s.length_m));
  if (!Number.isFinite(d.frontAt_m)) err("frontAt_m", "Enter where the front of the train stands.");
  else if (geometryOk) {
    const start = first.from_m;
    const end = last.from_m + last.length_m;
    if (d.frontAt_m > end + EPS) err("frontAt_m", `The front of the train (at ${dist(d.frontAt_m)}) is beyond the end of the profile (${dist(end)}). Add the track ahead or move the front back.`);
    else if (d.frontAt_m < start - EPS) err("frontAt_m", `The front of the train (at ${dist(d.frontAt_m)}) is before the profile begins (${dist(start)}).`);
    else if (Number.isFinite(ctx.trainLengthM)) {
      const rear = d.frontAt_m - ctx.trainLengthM;
      if (rear < start - EPS) {
        err(
          "train",
          `The reference train (${dist(ctx.trainLengthM)} with its locomotives) does not fit: its rear would stand at ${dist(rear)}, ${dist(start - rear)} before the profile begins at ${dist(start)}. Add the track behind the train, or move the front forward.`,
        );
      }
    }
    if (Number.isFinite(d.clearAhead_m) && d.clearAhead_m >= 0 && d.frontAt_m <= end + EPS && d.frontAt_m + d.clearAhead_m > end + EPS) {
      warn(
        "clearAhead_m",
        `The profile ends ${dist(end - d.frontAt_m)} ahead of the front, but ${dist(d.clearAhead_m)} are clear ahead: add the track ahead (until then the last gradient is taken to continue).`,
      );
    }
  }
  if (!Number.isFinite(d.clearAhead_m) || d.clearAhead_m < 0) err("clearAhead_m", "Enter the distance clear ahead of the front (0 or more).");
  if (Number.isFinite(d.speedLimit_kmh) && d.speedLimit_kmh <= 0) err("speedLimit_kmh", "The speed limit must be more than 0, or left empty.");

  d.hazards.forEach((h, k) => {
    if (h.kind === "other" && h.note.trim() === "") err(`hazards[${k}].note`, `Hazard ${k + 1}: say what it is.`);
  });

  if (ctx.changed || d.revisions.length === 0) {
    if (!/^\d{4}-\d{2}-\d{2}$/.test(d.revision.date.trim()) || Number.isNaN(Date.parse(d.revision.date.trim()))) err("revision.date", "The revision date must be a date (YYYY-MM-DD).");
    if (d.revision.initials.trim() === "") err("revision.initials", "Add your initials to the revision entry.");
    else if (d.revision.initials.trim().length > 8) err("revision.initials", "Initials: 8 characters at most.");
    if (d.revision.change.trim() === "") err("revision.change", "Say in a few words what changed in this revision.");
  }

  // The schema as a last guard (text lengths and anything the checks above do not cover).
  if (!out.some((i) => i.severity === "error")) {
    const r = locationNoteSchema.safeParse(noteFromDraft(d, d.id || "draft"), { reportInput: true });
    if (!r.success) for (const i of fromZodIssues(r.error.issues as ReadonlyArray<RawIssue>)) err(i.path, `${i.path}: ${i.message}`);
  }
  return out;
}

/** The first error at a path (or at one of several). */
export function issueAt(issues: readonly NoteIssue[], ...paths: string[]): NoteIssue | undefined {
  return issues.find((i) => paths.includes(i.path));
}
