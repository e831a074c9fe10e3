/**
 * The railML import's state: the file being read in the worker (with progress and cancel), what it holds,
 * the trainer's choice of stretch (where the front stands, which way the train goes, how far behind and
 * ahead), and the stretch the worker makes of it, asked again shortly after each change of the choice.
 */
import { createEffect, createSignal, on, onCleanup, type Accessor } from "solid-js";
import { createStore, unwrap, type SetStoreFunction } from "solid-js/store";
import type { FrontPlace, RailmlSummary, StretchRequest, StretchResult, TravelDirection } from "../../../../profiles/railml/index.js";
import type { RailmlImporter } from "./client.js";
import { notes } from "../../../../i18n/en/notes.js";
import { tr } from "../../../i18n.js";

const t = tr.ns(notes);

export type FrontKind = "absPos" | "ocp" | "pos";

export interface RailmlChoice {
  kind: FrontKind;
  /** Line position (absPos), m. */
  absPos: number;
  /** Operational point id. */
  ocp: string;
  /** Track id: needed for a pos, optional otherwise (where a position is on several tracks). */
  track: string;
  /** Position along the track, m. */
  pos: number;
  direction: TravelDirection;
  behindM: number;
  aheadM: number;
  /** The note's name. */
  name: string;
}

export type ImportPhase = "pick" | "reading" | "ready" | "failed";

export interface RailmlImport {
  phase: Accessor<ImportPhase>;
  progress: Accessor<number>;
  fileName: Accessor<string>;
  summary: Accessor<RailmlSummary | undefined>;
  problem: Accessor<string | null>;
  choice: RailmlChoice;
  setChoice: SetStoreFunction<RailmlChoice>;
  /** The stretch for the current choice (undefined while it is being made). */
  result: Accessor<StretchResult | undefined>;
  pick(file: File): void;
  cancel(): void;
}

/** Default lengths: enough behind for a long train, a start's worth ahead. */
export const RAILML_DEFAULT_BEHIND_M = 1500;
export const RAILML_DEFAULT_AHEAD_M = 1000;

/** The request for a choice, or why it cannot be made yet. */
export function requestOf(c: RailmlChoice): StretchRequest | string {
  let front: FrontPlace;
  const track = c.track.trim();
  if (c.kind === "ocp") {
    if (!c.ocp) return t("rmChooseOcp");
    front = track ? { kind: "ocp", ocp: c.ocp, track } : { kind: "ocp", ocp: c.ocp };
  } else if (c.kind === "pos") {
    if (!track) return t("rmEnterTrack");
    if (!Number.isFinite(c.pos)) return t("rmEnterPos");
    front = { kind: "pos", track, pos: c.pos };
  } else {
    if (!Number.isFinite(c.absPos)) return t("rmEnterAbsPos");
    front = track ? { kind: "absPos", absPos: c.absPos, track } : { kind: "absPos", absPos: c.absPos };
  }
  if (!(c.behindM > 0)) return t("rmBehindMore");
  if (!(c.aheadM >= 0)) return t("rmAheadMore");
  return { front, direction: c.direction, behindM: c.behindM, aheadM: c.aheadM };
}

export function createRailmlImport(deps: { importer: () => RailmlImporter; delayMs?: number }): RailmlImport {
  const [phase, setPhase] = createSignal<ImportPhase>("pick");
  const [progress, setProgress] = createSignal(0);
  const [fileName, setFileName] = createSignal("");
  const [summary, setSummary] = createSignal<RailmlSummary | undefined>();
  const [problem, setProblem] = createSignal<string | null>(null);
  const [result, setResult] = createSignal<StretchResult | undefined>();
  const [choice, setChoice] = createStore<RailmlChoice>({
    kind: "absPos",
    absPos: Number.NaN,
    ocp: "",
    track: "",
    pos: Number.NaN,
    direction: "up",
    behindM: RAILML_DEFAULT_BEHIND_M,
    aheadM: RAILML_DEFAULT_AHEAD_M,
    name: "",
  });
  let importer: RailmlImporter | undefined;
  const worker = () => (importer ??= deps.importer());
  let reading = 0;

  const pick = (file: File) => {
    const n = ++reading;
    setFileName(file.name);
    setSummary(undefined);
    setResult(undefined);
    setProblem(null);
    setProgress(0);
    setPhase("reading");
    worker()
      .read(file, (f) => n === reading && setProgress(f))
      .then(
        (s) => {
          if (n !== reading) return;
          setSummary(s);
          const first = s.ocps[0];
          const mid = s.absPosRange ? Math.round((s.absPosRange.min + s.absPosRange.max) / 2) : Number.NaN;
          setChoice({
            kind: first ? "ocp" : s.absPosRange ? "absPos" : "pos",
            ocp: first?.id ?? "",
            absPos: mid,
            name: first ? first.label : "",
          });
          setPhase("ready");
        },
        (e: Error) => {
          if (n !== reading) return;
          setProblem(e.name === "AbortError" ? t("rmCancelled") : t("rmNothingSaved", { problem: e.message }));
          setPhase("failed");
        },
      );
  };

  // Each change of the choice asks for the stretch again, shortly after the last change.
  let timer: ReturnType<typeof setTimeout> | undefined;
  let asked = 0;
  createEffect(
    on([phase, () => JSON.stringify(choice)], ([p]) => {
      if (timer !== undefined) clearTimeout(timer);
      setResult(undefined);
      if (p !== "ready") return;
      const req = requestOf(unwrap(choice));
      if (typeof req === "string") {
        setResult({ ok: false, message: req });
        return;
      }
      const n = ++asked;
      timer = setTimeout(() => {
        worker()
          .stretch(req)
          .then(
            (r) => n === asked && setResult(r),
            (e: Error) => n === asked && setResult({ ok: false, message: e.message }),
          );
      }, deps.delayMs ?? 250);
    }),
  );
  onCleanup(() => {
    if (timer !== undefined) clearTimeout(timer);
    importer?.cancel();
  });

  return {
    phase,
    progress,
    fileName,
    summary,
    problem,
    choice,
    setChoice,
    result,
    pick,
    cancel: () => {
      reading++;
      importer?.cancel();
      setProblem(t("rmCancelled"));
      setPhase("failed");
    },
  };
}
