/**
 * The note being edited: the draft (a Solid store), what it implies (the reference train placed on the
 * profile, its slack, the key figures, the load table) and its checks, recomputed as the trainer types.
 */
import { createEffect, createMemo, createSignal, on, onCleanup, type Accessor } from "solid-js";
import { createStore, reconcile, unwrap, type SetStoreFunction } from "solid-js/store";
import type { StartCase } from "../../../core/train/types.js";
import { canonicalNote } from "../../../profiles/notes.js";
import type { Library } from "../../../profiles/library.js";
import type { LocationNoteFile, TrainPresetFile } from "../../../profiles/schemas.js";
import { referenceCase, referenceSummary, type ReferenceSummary } from "../../../profiles/referenceTrain.js";
import type { UnitSystem } from "../../format.js";
import { referenceLocomotiveWords } from "../shared/referenceWords.js";
import { draftFromNote, idFromName, joinSegments, newDraft, nextSegment, noteFromDraft, type NoteDraft } from "./draft.js";
import { noteFigures, type NoteFigures } from "./figures.js";
import type { ComputeLoadTable, LoadTableOutcome } from "./loadTableRunner.js";
import { profileModel, type ProfileModel } from "./profileModel.js";
import { checkDraft, type NoteIssue } from "./validate.js";

export interface NoteEditor {
  draft: NoteDraft;
  set: SetStoreFunction<NoteDraft>;
  /** The saved note this draft started from (undefined for a new note). */
  saved: Accessor<LocationNoteFile | undefined>;
  changed: Accessor<boolean>;
  issues: Accessor<NoteIssue[]>;
  errors: Accessor<NoteIssue[]>;
  reference: Accessor<ReferenceSummary>;
  /** The reference train on the draft's profile, when it can be placed. */
  placed: Accessor<StartCase | undefined>;
  model: Accessor<ProfileModel | undefined>;
  figures: Accessor<NoteFigures>;
  loadTable: Accessor<LoadTableOutcome | undefined>;
  /** 0..1 while the load table is being worked out. */
  loadTableProgress: Accessor<number>;
  load(note: LocationNoteFile | undefined): void;
  /** Go on with a draft kept from before (a reload, a rescued record); `saved` is the note it started from. */
  restore(draft: NoteDraft, saved: LocationNoteFile | undefined): void;
  addSegment(): void;
  removeSegment(k: number): void;
  joinSegments(): void;
  /** The note to save, with its id (made from the name for a new note). */
  toNote(takenIds: ReadonlySet<string>): Record<string, unknown>;
}

export interface NoteEditorDeps {
  units: Accessor<UnitSystem>;
  presets: readonly TrainPresetFile[];
  library: Accessor<Library>;
  initials: Accessor<string>;
  /** Wait before recomputing the load table after an edit, ms. */
  loadTableDelayMs?: number;
  /** Whether the note is on screen (editor or card): the load table is worked out only then. */
  active?: Accessor<boolean>;
  /** How the load table is worked out (the app: the planner workers' `loadTable`, see loadTableRunner.ts). */
  computeLoadTable: ComputeLoadTable;
}

/** Fields whose errors stop the train being placed and the load table being worked out. */
const GEOMETRY = /^(segments|frontAt_m|clearAhead_m|train|speedLimit_kmh)/;

export function createNoteEditor(deps: NoteEditorDeps): NoteEditor {
  const fallbackTrain = () => ({ train: deps.presets[0]?.id ?? "" });
  const [saved, setSaved] = createSignal<LocationNoteFile | undefined>();
  const [draft, setDraft] = createStore<NoteDraft>(newDraft(fallbackTrain(), deps.initials()));

  const load = (note: LocationNoteFile | undefined) => {
    setSaved(note);
    setDraft(reconcile(note ? draftFromNote(note, fallbackTrain(), deps.initials()) : newDraft(fallbackTrain(), deps.initials())));
  };

  /** The draft as a note without this save's revision entry: compared with the saved note to tell a change. */
  const asSavedShape = createMemo(() => {
    const d = { ...unwrap(draft), revision: { date: "", initials: "", change: "" } };
    // Track every field.
    JSON.stringify(draft);
    return noteFromDraft(d, draft.id || "new");
  });
  /**
   * The saved note as the editor would write it back unchanged: padded text trimmed, empty optional
   * fields left out, the default reference train named. Compared with the draft in the same form, a note
   * from a file that was written another way does not open as "changed".
   */
  const savedShape = createMemo(() => {
    const s = saved();
    if (!s) return undefined;
    const d = { ...draftFromNote(s, fallbackTrain(), ""), revision: { date: "", initials: "", change: "" } };
    return canonicalNote(noteFromDraft(d, s.id) as LocationNoteFile);
  });
  const changed = createMemo(() => {
    const s = savedShape();
    return s === undefined || canonicalNote(asSavedShape() as LocationNoteFile) !== s;
  });

  // The locomotives in the language on screen (the summary's own words are English, for files and the command line).
  const reference = createMemo((): ReferenceSummary => {
    const r = referenceSummary(draft.referenceTrain, deps.presets, deps.library());
    return { ...r, locomotives: referenceLocomotiveWords(draft.referenceTrain, deps.presets, deps.library()) ?? r.locomotives };
  });
  const issues = createMemo(() => {
    JSON.stringify(draft);
    return checkDraft(unwrap(draft), { units: deps.units(), trainLengthM: reference().lengthM, changed: changed() });
  });
  const errors = createMemo(() => issues().filter((i) => i.severity === "error"));
  const geometryOk = createMemo(() => !errors().some((i) => GEOMETRY.test(i.path)));

  const geometry = createMemo(() => {
    JSON.stringify([draft.segments, draft.frontAt_m, draft.clearAhead_m, draft.speedLimit_kmh, draft.referenceTrain]);
    const d = unwrap(draft);
    return {
      segments: d.segments.map((s) => ({ ...s })),
      frontAt_m: d.frontAt_m,
      clearAhead_m: d.clearAhead_m,
      ...(Number.isFinite(d.speedLimit_kmh) ? { speedLimit_kmh: d.speedLimit_kmh } : {}),
      referenceTrain: { ...d.referenceTrain },
    };
  });

  const placed = createMemo(() => {
    if (!geometryOk()) return undefined;
    const r = referenceCase(geometry(), deps.presets, deps.library());
    return r.ok ? r.value : undefined;
  });

  const model = createMemo(() => {
    JSON.stringify(draft.hazards);
    return profileModel({ ...geometry(), hazards: unwrap(draft).hazards.map((h) => ({ kind: h.kind, ...(Number.isFinite(h.at_m) ? { at_m: h.at_m } : {}), note: h.note })) }, placed());
  });

  const figures = createMemo(() => noteFigures(geometry().segments, geometry().frontAt_m, reference().lengthM, geometry().clearAhead_m));

  const [loadTable, setLoadTable] = createSignal<LoadTableOutcome | undefined>();
  const [loadTableProgress, setLoadTableProgress] = createSignal(0);
  let controller: AbortController | undefined;
  let timer: ReturnType<typeof setTimeout> | undefined;
  createEffect(
    on([geometry, geometryOk, () => deps.active?.() ?? true], ([g, ok, active]) => {
      controller?.abort();
      if (timer !== undefined) clearTimeout(timer);
      setLoadTable(undefined);
      setLoadTableProgress(0);
      if (!ok || !active) return;
      const c = new AbortController();
      controller = c;
      timer = setTimeout(() => {
        deps.computeLoadTable(g, g.referenceTrain, c.signal, (f) => !c.signal.aborted && setLoadTableProgress(f)).then(
          (r) => {
            if (!c.signal.aborted) setLoadTable(r);
          },
          (e: unknown) => {
            if ((e as Error).name !== "AbortError") setLoadTable({ ok: false, issues: [{ path: "", message: (e as Error).message }] });
          },
        );
      }, deps.loadTableDelayMs ?? 600);
    }),
  );
  onCleanup(() => {
    controller?.abort();
    if (timer !== undefined) clearTimeout(timer);
  });

  const restore = (d: NoteDraft, from: LocationNoteFile | undefined) => {
    setSaved(from);
    setDraft(reconcile(d));
  };

  return {
    draft,
    set: setDraft,
    restore,
    saved,
    changed,
    issues,
    errors,
    reference,
    placed,
    model,
    figures,
    loadTable,
    loadTableProgress,
    load,
    addSegment: () => setDraft("segments", draft.segments.length, nextSegment(unwrap(draft).segments)),
    removeSegment: (k) => setDraft("segments", (segs) => segs.filter((_, i) => i !== k)),
    joinSegments: () => setDraft("segments", joinSegments(unwrap(draft).segments)),
    toNote: (taken) => noteFromDraft(unwrap(draft), draft.id || idFromName(draft.name, taken)),
  };
}
