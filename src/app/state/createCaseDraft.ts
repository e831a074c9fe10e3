/**
 * The case being edited on the Start plan screen: a Solid store of the draft, kept in localStorage so
 * it survives a reload (the built-in demo case on first open), its start-case JSON with the safety
 * settings, and its validation with issues by field in the user's units.
 */
import { createEffect, createMemo, createSignal, onCleanup, type Accessor } from "solid-js";
import { createStore, reconcile, unwrap, type SetStoreFunction } from "solid-js/store";
import type { StartCase } from "../../core/train/types.js";
import { builtinCases, DEMO_CASE_ID } from "../../profiles/builtin.js";
import type { FieldIssue, ParseResult } from "../../profiles/issues.js";
import type { LocalIssue } from "../fields.js";
import type { Library } from "../../profiles/library.js";
import type { StartCaseFile, TrainPresetFile } from "../../profiles/schemas.js";
import type { AppSettings } from "./createSettings.js";
import { read, safeLocalStorage, write } from "./createSettings.js";
import { applyPreset, draftFromFile, draftToFile, storedDraft, type CaseDraft, type DraftLoco } from "./caseDraft.js";
import { loadDraftChecker, loadedDraftChecker } from "./draftChecker.js";

export const DRAFT_KEY = "taut.case.v1";
/** Where a stored draft that cannot be used is kept (for export), instead of being thrown away. */
export const SET_ASIDE_KEY = "taut.case.v1.set-aside";

/** A stored draft that could not be used: its text as stored, and why. */
export interface SetAsideDraft {
  text: string;
  reason: string;
}

/** Read every field of a store so an effect re-runs on any change inside it. */
function trackDeep(x: unknown): void {
  if (Array.isArray(x)) for (const v of x) trackDeep(v);
  else if (x && typeof x === "object") for (const k of Object.keys(x)) trackDeep((x as Record<string, unknown>)[k]);
}

export interface CaseDraftStore {
  draft: CaseDraft;
  /** Edit the draft (Solid store setter); marks it edited. */
  set: SetStoreFunction<CaseDraft>;
  /** Whether the user changed the draft since it was loaded from a case or preset. */
  edited: Accessor<boolean>;
  loadCase(f: StartCaseFile): void;
  loadDemo(): void;
  applyPreset(p: TrainPresetFile): void;
  addLocomotive(): void;
  removeLocomotive(k: number): void;
  /** Add a wagon group (the first turns the train into groups: its wagons, type and mass as the first group). */
  addWagonGroup(): void;
  /** Remove a wagon group; removing the last returns to one trailing mass, wagons and length (the groups' totals). */
  removeWagonGroup(k: number): void;
  /** The `taut/start-case@1` object, with the safety settings. */
  caseJson: Accessor<Record<string, unknown>>;
  /** The draft checked; `pending` for the moment before the checker has loaded (nothing known yet). */
  checked: Accessor<DraftCheck>;
  /** Every issue, in the user's units. */
  issues: Accessor<LocalIssue[]>;
  /** The first issue at one of these field paths (e.g. "train.trailingMass_t"). */
  issueAt(...paths: string[]): FieldIssue | undefined;
  /** The stored inputs set aside at launch because they could not be used (the demo opened instead). */
  setAside: Accessor<SetAsideDraft | null>;
  /** The notice about them has been read (the set-aside copy stays until the next one replaces it). */
  dismissSetAside(): void;
}

export interface CaseDraftDeps {
  library: Accessor<Library>;
  settings: Accessor<AppSettings>;
  storage?: Storage | null;
  /** A case already checked (the built-in demo, at build time): its start-case JSON text and the result. */
  prechecked?: { caseJson: string; value: StartCase };
}

/** The draft's check: the checker's result, or pending until the checker has loaded. */
export type DraftCheck = ParseResult<StartCase> | { ok: false; issues: FieldIssue[]; pending: true };

const PENDING: DraftCheck = { ok: false, issues: [], pending: true };

/** The demo case the app opens with. */
export function demoCaseFile(): StartCaseFile {
  return builtinCases.find((c) => c.id === DEMO_CASE_ID) ?? builtinCases[0]!;
}

export function createCaseDraft(deps: CaseDraftDeps): CaseDraftStore {
  const storage = deps.storage === undefined ? safeLocalStorage() : deps.storage;
  const couplingOf = (id: string) => deps.library().wagons.get(id)?.coupling;
  const [setAside, setSetAside] = createSignal<SetAsideDraft | null>(null);
  const stored = (() => {
    const raw = read(storage, DRAFT_KEY);
    if (!raw) return undefined;
    let r: ReturnType<typeof storedDraft>;
    try {
      r = storedDraft(JSON.parse(raw));
    } catch {
      r = { ok: false, reason: "the stored text is not complete JSON" };
    }
    if (r.ok) return r.draft;
    // Kept, not lost: set aside for export, and the app opens on the demo case with a notice.
    write(storage, SET_ASIDE_KEY, raw);
    setSetAside({ text: raw, reason: r.reason });
    return undefined;
  })();
  const [draft, setDraft] = createStore<CaseDraft>(stored ?? draftFromFile(demoCaseFile(), couplingOf));
  const [edited, setEdited] = createSignal(false);

  const set = ((...args: unknown[]) => {
    (setDraft as (...a: unknown[]) => void)(...args);
    setEdited(true);
  }) as SetStoreFunction<CaseDraft>;

  const replace = (d: CaseDraft) => {
    setDraft(reconcile(d));
    setEdited(false);
  };

  // Saved a moment after the last edit, not on every keystroke.
  let saveTimer: ReturnType<typeof setTimeout> | null = null;
  const save = () => {
    saveTimer = null;
    write(storage, DRAFT_KEY, JSON.stringify(draft));
  };
  createEffect(() => {
    trackDeep(draft);
    if (saveTimer !== null) clearTimeout(saveTimer);
    saveTimer = setTimeout(save, 400);
  });
  onCleanup(() => {
    if (saveTimer !== null) {
      clearTimeout(saveTimer);
      save();
    }
  });
  if (typeof addEventListener === "function") {
    const flush = () => saveTimer !== null && (clearTimeout(saveTimer), save());
    addEventListener("pagehide", flush);
    onCleanup(() => removeEventListener("pagehide", flush));
  }

  const caseJson = createMemo(() => {
    const s = deps.settings();
    return draftToFile(draft, { couplerSafetyFactor: s.couplerSafetyFactor, slipRiskThreshold: s.slipRiskThreshold, marginalSlipRisk: s.marginalSlipRisk });
  });
  const [checker, setChecker] = createSignal(loadedDraftChecker());
  if (!checker()) void loadDraftChecker().then((f) => setChecker(() => f));
  const checked = createMemo((): DraftCheck => {
    const loaded = checker();
    const json = caseJson();
    if (loaded) return loaded.validate(json, unwrap(draft), deps.library());
    // Before the checker has loaded: the case checked at build time when the draft is that case.
    const pre = deps.prechecked;
    return pre && JSON.stringify(json) === pre.caseJson ? { ok: true, value: pre.value } : PENDING;
  });
  const issues = createMemo(() => {
    const c = checked();
    const units = deps.settings().units;
    const localise = checker()?.localise;
    return c.ok || !localise ? [] : c.issues.map((i) => localise(i, units));
  });

  return {
    draft,
    set,
    edited,
    loadCase: (f) => replace(draftFromFile(f, couplingOf)),
    loadDemo: () => replace(draftFromFile(demoCaseFile(), couplingOf)),
    applyPreset: (p) => replace(applyPreset(unwrap(draft), p, couplingOf)),
    addLocomotive: () => {
      const first = draft.locomotives[0];
      const l: DraftLoco = { profile: first?.profile ?? [...deps.library().locomotives.keys()][0] ?? "", count: 1, position: "rear", afterWagon: Math.max(1, Math.floor(draft.train.wagons / 2)) };
      set("locomotives", draft.locomotives.length, l);
    },
    removeLocomotive: (k) => {
      if (draft.locomotives.length <= 1) return;
      set("locomotives", (ls) => ls.filter((_, i) => i !== k));
    },
    addWagonGroup: () => {
      const t = draft.train;
      const groups = t.groups ?? [];
      const type = t.wagonType || [...deps.library().wagons.keys()][0] || "";
      if (groups.length === 0) {
        const wt = deps.library().wagons.get(type);
        set("train", "groups", [{ wagons: t.wagons, wagonType: type, mass_t: t.trailingMass_t }]);
        if (wt && !(t.length_m > 0)) set("train", "length_m", t.wagons * wt.lengthM);
        return;
      }
      const last = groups[groups.length - 1]!;
      set("train", "groups", [...groups, { wagons: 10, wagonType: last.wagonType, mass_t: (10 * last.mass_t) / Math.max(1, last.wagons) }]);
    },
    removeWagonGroup: (k) => {
      const groups = draft.train.groups ?? [];
      const rest = groups.filter((_, i) => i !== k);
      if (rest.length === 0) {
        // Back to one trailing mass: the group's figures carry over.
        const g = groups[0];
        if (g) {
          const wt = deps.library().wagons.get(g.wagonType);
          set("train", { trailingMass_t: g.mass_t, wagons: g.wagons, wagonType: g.wagonType, ...(wt ? { length_m: g.wagons * wt.lengthM } : {}) });
        }
        set("train", "groups", undefined);
        return;
      }
      set("train", "groups", rest);
    },
    caseJson,
    checked,
    issues,
    issueAt: (...paths) => issues().find((i) => paths.includes(i.path)),
    setAside,
    dismissSetAside: () => setSetAside(null),
  };
}
