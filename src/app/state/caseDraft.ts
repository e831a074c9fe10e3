/**
 * The start case as the Start plan screen edits it: flat, always complete, in file units (t, kN, mm,
 * km/h, m, ‰, °C). `draftToFile` turns it into the `taut/start-case@1` shape the worker and the command
 * line read; `draftFromFile` fills it from a case file. Pure functions, no Solid.
 */
import { RAIL_CONDITIONS, type RailCondition } from "../../core/physics/types.js";
import type { SlackState, UnitControl } from "../../core/train/types.js";
import type { StartCaseFile, TrainPresetFile } from "../../profiles/schemas.js";

export type DraftPosition = "head" | "rear" | "after";

export interface DraftLoco {
  profile: string;
  count: number;
  position: DraftPosition;
  /** Used when position is "after". */
  afterWagon: number;
  /** How the group is driven; absent: the default for its position (head in multiple, others remote). */
  control?: UnitControl;
}

/** One wagon group of a mixed train (INTERFACE.md `train.groups`): its wagons, their type, its total mass. */
export interface DraftGroup {
  wagons: number;
  wagonType: string;
  mass_t: number;
}

export interface CaseDraft {
  id: string;
  label: string;
  illustrative: boolean;
  locomotives: DraftLoco[];
  train: {
    trailingMass_t: number;
    wagons: number;
    length_m: number;
    couplerSlack_mm: number;
    bearing: "roller" | "plain";
    couplerLimit_kN: number;
    coupling: "knuckle" | "screw";
    /** A wagon type id from the library, or "" for a plain bogie wagon. */
    wagonType: string;
    slackState: SlackState;
    /**
     * A mixed train's wagon groups, head first; when there are any they replace the trailing mass, wagons,
     * length and wagon type (derived from them).
     */
    groups?: DraftGroup[];
  };
  /** A saved note, a quick uniform entry, or the track profile a case file carried (kept as it was). */
  locationMode: "note" | "quick" | "profile";
  /** The chosen location note (saved or built-in). */
  noteId: string;
  /** The track profile of an opened case file, when it had one (INTERFACE.md: segments, frontAt_m, clearAhead_m). */
  profile?: DraftProfile | null;
  quick: { gradient_permille: number; curveRadius_m: number; clearAhead_m: number };
  conditions: { rail: RailCondition; sand: boolean; temperature_C: number };
  targetKind: "speed" | "distance";
  target: { speed_kmh: number; distance_m: number };
}

export interface DraftProfile {
  segments: Array<{ from_m: number; length_m: number; gradient_permille: number; curveRadius_m: number }>;
  frontAt_m: number;
  clearAhead_m: number;
}

/** The settings a case carries (INTERFACE.md `settings`). */
export interface CaseSettings {
  couplerSafetyFactor: number;
  slipRiskThreshold: number;
  marginalSlipRisk?: number;
}

/** Working limits used when the coupling type changes (PHYSICS.md §4). */
export const COUPLING_DEFAULTS = {
  knuckle: { couplerLimit_kN: 970, couplerSlack_mm: 50 },
  screw: { couplerLimit_kN: 850, couplerSlack_mm: 5 },
} as const;

const QUICK_DEFAULT = { gradient_permille: 0, curveRadius_m: 0, clearAhead_m: 500 };

/** Fill a draft from a validated case file (inline locomotive profiles are kept by id). */
export function draftFromFile(f: StartCaseFile, wagonCoupling: (wagonType: string) => "knuckle" | "screw" | undefined = () => undefined): CaseDraft {
  const loc = f.location;
  return {
    id: f.id ?? "",
    label: f.label ?? "",
    illustrative: f.illustrative ?? false,
    locomotives: f.locomotives.map(locoFromFile),
    train: trainFromFile(f.train, wagonCoupling),
    locationMode: typeof loc === "string" ? "note" : "segments" in loc ? "profile" : "quick",
    noteId: typeof loc === "string" ? loc : "",
    profile: typeof loc !== "string" && "segments" in loc ? { segments: loc.segments.map((x) => ({ ...x })), frontAt_m: loc.frontAt_m, clearAhead_m: loc.clearAhead_m } : null,
    quick:
      typeof loc === "string"
        ? { ...QUICK_DEFAULT }
        : "segments" in loc
          ? quickFromProfile(loc)
          : { gradient_permille: loc.gradient_permille, curveRadius_m: loc.curveRadius_m, clearAhead_m: loc.clearAhead_m },
    conditions: { rail: f.conditions.rail, sand: f.conditions.sand, temperature_C: f.conditions.temperature_C },
    targetKind: "speed_kmh" in f.target ? "speed" : "distance",
    target: {
      speed_kmh: "speed_kmh" in f.target ? f.target.speed_kmh : 20,
      distance_m: "distance_m" in f.target ? f.target.distance_m : 500,
    },
  };
}

/** A quick entry near a profile: the segment at the train's front, and the distance clear ahead. */
function quickFromProfile(p: DraftProfile): CaseDraft["quick"] {
  const front = p.segments.find((x) => x.from_m < p.frontAt_m && x.from_m + x.length_m >= p.frontAt_m) ?? p.segments[0]!;
  return { gradient_permille: front.gradient_permille, curveRadius_m: front.curveRadius_m, clearAhead_m: p.clearAhead_m };
}

function locoFromFile(l: StartCaseFile["locomotives"][number]): DraftLoco {
  const p = l.position;
  return {
    profile: typeof l.profile === "string" ? l.profile : l.profile.id,
    count: l.count,
    position: typeof p === "string" ? p : "after",
    afterWagon: typeof p === "string" ? 1 : p.afterWagon,
    ...(l.control !== undefined ? { control: l.control } : {}),
  };
}

function trainFromFile(t: StartCaseFile["train"], wagonCoupling: (id: string) => "knuckle" | "screw" | undefined): CaseDraft["train"] {
  return {
    trailingMass_t: t.trailingMass_t,
    wagons: t.wagons,
    length_m: t.length_m ?? 0,
    couplerSlack_mm: t.couplerSlack_mm,
    bearing: t.bearing,
    couplerLimit_kN: t.couplerLimit_kN,
    coupling: t.coupling ?? (t.wagonType ? wagonCoupling(t.wagonType) : undefined) ?? "knuckle",
    wagonType: t.wagonType ?? t.groups?.[0]?.wagonType ?? "",
    slackState: t.slackState,
    ...(t.groups ? { groups: t.groups.map((g) => ({ wagons: g.wagons, wagonType: g.wagonType, mass_t: g.mass_t })) } : {}),
  };
}

/** Apply a train preset (locomotives and train make-up) to a draft, keeping location, conditions and target. */
export function applyPreset(d: CaseDraft, p: TrainPresetFile, wagonCoupling: (id: string) => "knuckle" | "screw" | undefined = () => undefined): CaseDraft {
  return { ...d, id: "", label: p.label, illustrative: p.illustrative ?? false, locomotives: p.locomotives.map(locoFromFile), train: trainFromFile(p.train, wagonCoupling) };
}

/** The `taut/start-case@1` object for a draft (the worker and the CLI read this shape). */
export function draftToFile(d: CaseDraft, settings?: CaseSettings): Record<string, unknown> {
  const out: Record<string, unknown> = { schema: "taut/start-case@1" };
  if (d.id) out.id = d.id;
  if (d.label) out.label = d.label;
  if (d.illustrative) out.illustrative = true;
  out.locomotives = d.locomotives.map((l) => ({
    profile: l.profile,
    count: l.count,
    position: l.position === "after" ? { afterWagon: l.afterWagon } : l.position,
    ...(l.control ? { control: l.control } : {}),
  }));
  const t = d.train;
  const groups = t.groups ?? [];
  out.train = {
    // A mixed train: its groups, from which the wagons, trailing mass and length follow.
    ...(groups.length > 0 ? { groups: groups.map((g) => ({ ...g })) } : { trailingMass_t: t.trailingMass_t, wagons: t.wagons, length_m: t.length_m }),
    couplerSlack_mm: t.couplerSlack_mm,
    bearing: t.bearing,
    couplerLimit_kN: t.couplerLimit_kN,
    coupling: t.coupling,
    ...(t.wagonType && groups.length === 0 ? { wagonType: t.wagonType } : {}),
    slackState: t.slackState,
  };
  out.location =
    d.locationMode === "note"
      ? d.noteId
      : d.locationMode === "profile" && d.profile
        ? { segments: d.profile.segments.map((x) => ({ ...x })), frontAt_m: d.profile.frontAt_m, clearAhead_m: d.profile.clearAhead_m }
        : { ...d.quick };
  out.conditions = { ...d.conditions };
  out.target = d.targetKind === "speed" ? { speed_kmh: d.target.speed_kmh } : { distance_m: d.target.distance_m };
  if (settings) {
    out.settings = {
      couplerSafetyFactor: settings.couplerSafetyFactor,
      slipRiskThreshold: settings.slipRiskThreshold,
      ...(settings.marginalSlipRisk !== undefined ? { marginalSlipRisk: settings.marginalSlipRisk } : {}),
    };
  }
  return out;
}

/** Whether a value read back from storage has the draft's shape (a stale or foreign value is ignored). */
export function looksLikeDraft(x: unknown): x is CaseDraft {
  return storedDraft(x).ok;
}

type Check = (v: unknown) => boolean;
const isText: Check = (v) => typeof v === "string";
const isFlag: Check = (v) => typeof v === "boolean";
/** A number, or null: a field left empty is NaN in the draft, which JSON writes as null. */
const isNumber: Check = (v) => typeof v === "number" || v === null;
const oneOf =
  (...words: readonly string[]): Check =>
  (v) =>
    typeof v === "string" && words.includes(v);

/** The draft's shape, field by field: what each field must hold. */
const SHAPE = {
  top: { id: isText, label: isText, illustrative: isFlag, locationMode: oneOf("note", "quick", "profile"), noteId: isText, targetKind: oneOf("speed", "distance") },
  loco: { profile: isText, count: isNumber, position: oneOf("head", "rear", "after"), afterWagon: isNumber },
  train: {
    trailingMass_t: isNumber,
    wagons: isNumber,
    length_m: isNumber,
    couplerSlack_mm: isNumber,
    bearing: oneOf("roller", "plain"),
    couplerLimit_kN: isNumber,
    coupling: oneOf("knuckle", "screw"),
    wagonType: isText,
    slackState: oneOf("bunched", "stretched", "from-profile"),
  },
  quick: { gradient_permille: isNumber, curveRadius_m: isNumber, clearAhead_m: isNumber },
  conditions: { rail: oneOf(...RAIL_CONDITIONS), sand: isFlag, temperature_C: isNumber },
  target: { speed_kmh: isNumber, distance_m: isNumber },
  profile: { frontAt_m: isNumber, clearAhead_m: isNumber },
  segment: { from_m: isNumber, length_m: isNumber, gradient_permille: isNumber, curveRadius_m: isNumber },
  group: { wagons: isNumber, wagonType: isText, mass_t: isNumber },
} as const;
/** A loco's control, when the stored draft has one (older drafts have none: the default). */
const isControl: Check = (v) => v === undefined || oneOf("with-head", "remote", "helper")(v);

/** The first field of `x` that breaks `shape`, as "path: what it holds", or undefined. */
function shapeProblem(x: unknown, shape: Record<string, Check>, at: string): string | undefined {
  if (!x || typeof x !== "object" || Array.isArray(x)) return `${at || "the inputs"}: not an object`;
  for (const [k, ok] of Object.entries(shape)) {
    const v = (x as Record<string, unknown>)[k];
    if (!ok(v)) return `${at ? `${at}.` : ""}${k}: ${v === undefined ? "missing" : `${JSON.stringify(v)?.slice(0, 40) ?? typeof v} is not allowed here`}`;
  }
  return undefined;
}

/** Empty fields come back from JSON as null: NaN again, as the draft keeps them. */
function revive<T>(x: T): T {
  if (Array.isArray(x)) return x.map(revive) as T;
  // `profile` is null when the case has no track profile of its own; every other null is an empty number field.
  if (x && typeof x === "object") return Object.fromEntries(Object.entries(x).map(([k, v]) => [k, v === null ? (k === "profile" ? null : Number.NaN) : revive(v)])) as T;
  return x;
}

/**
 * A draft read back from storage, checked field by field (every word one the screen knows, every number
 * a number), or why it cannot be used. A draft from another version of the app, or damaged, must not
 * reach the screen: an unknown coupling word there stops the whole app from drawing.
 */
export function storedDraft(x: unknown): { ok: true; draft: CaseDraft } | { ok: false; reason: string } {
  const fail = (reason: string) => ({ ok: false as const, reason });
  const top = shapeProblem(x, SHAPE.top, "");
  if (top) return fail(top);
  const d = x as Record<string, unknown>;
  for (const part of ["train", "quick", "conditions", "target"] as const) {
    const p = shapeProblem(d[part], SHAPE[part], part);
    if (p) return fail(p);
  }
  if (!Array.isArray(d.locomotives) || d.locomotives.length === 0) return fail("locomotives: none listed");
  // The track profile a case file carried: absent or null unless that is the location used.
  if (d.profile !== undefined && d.profile !== null) {
    const p = shapeProblem(d.profile, SHAPE.profile, "profile");
    if (p) return fail(p);
    const segs = (d.profile as { segments?: unknown }).segments;
    if (!Array.isArray(segs) || segs.length === 0) return fail("profile.segments: none listed");
    for (const [k, s] of segs.entries()) {
      const q = shapeProblem(s, SHAPE.segment, `profile.segments[${k}]`);
      if (q) return fail(q);
    }
  } else if (d.locationMode === "profile") return fail("profile: missing");
  for (const [k, l] of d.locomotives.entries()) {
    const p = shapeProblem(l, SHAPE.loco, `locomotives[${k}]`);
    if (p) return fail(p);
    if (!isControl((l as { control?: unknown }).control)) return fail(`locomotives[${k}].control: not allowed here`);
  }
  const groups = (d.train as { groups?: unknown }).groups;
  if (groups !== undefined) {
    if (!Array.isArray(groups)) return fail("train.groups: not a list");
    for (const [k, g] of groups.entries()) {
      const q = shapeProblem(g, SHAPE.group, `train.groups[${k}]`);
      if (q) return fail(q);
    }
  }
  return { ok: true, draft: revive(d) as unknown as CaseDraft };
}
