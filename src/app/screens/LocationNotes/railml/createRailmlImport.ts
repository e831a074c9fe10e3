/**
 * The railML import's state: the file being read in the worker (with progress and cancel), what it holds,
 * the trainer's choice of stretch (where the front stands, which way the train goes, how far behind and
 * ahead), and the stretch the worker makes of it, asked again shortly after each change of the choice.
 * What it has to say (a problem, why no stretch can be made) is kept as words to be drawn (`Words`), so the
 * screen writes them in the language on screen and again when the language changes.
 */
import { createEffect, createSignal, on, onCleanup, type Accessor } from "solid-js";
import { createStore, unwrap, type SetStoreFunction } from "solid-js/store";
import type { FrontPlace, RailmlSummary, Stretch, StretchRequest, TravelDirection } from "../../../../profiles/railml/index.js";
import { railmlWords, type RailmlText } from "../../../../profiles/railml/text.js";
import type { RailmlImporter } from "./client.js";
import { notes } from "../../../../i18n/en/notes.js";
import { tr } from "../../../i18n.js";

const t = tr.ns(notes);

/** Words drawn in the language on screen at the time they are drawn (a reactive read of the language). */
export type Words = () => string;

/** A text of the railML reader, the stretch or the worker, in the language on screen. */
export const railmlSaid = (text: RailmlText): Words => () => railmlWords(tr, text);

/** An error's words: its railML text where it carries one (from the worker), else its message as it is. */
export function errorWords(e: Error): Words {
  const text = (e as Error & { text?: RailmlText }).text;
  return text ? railmlSaid(text) : () => e.message;
}

/** The stretch for the choice, or why there is none, in words. */
export type ImportResult = { ok: true; value: Stretch } | { ok: false; words: Words };

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
  problem: Accessor<Words | null>;
  choice: RailmlChoice;
  setChoice: SetStoreFunction<RailmlChoice>;
  /** The stretch for the current choice (undefined while it is being made). */
  result: Accessor<ImportResult | undefined>;
  pick(file: File): void;
  cancel(): void;
}

/** Default lengths: enough behind for a long train, a start's worth ahead. */
export const RAILML_DEFAULT_BEHIND_M = 1500;
export const RAILML_DEFAULT_AHEAD_M = 1000;

/** The notes messages that say what a choice still lacks (none takes a value). */
type NotesKey = "rmChooseOcp" | "rmEnterTrack" | "rmEnterPos" | "rmEnterAbsPos" | "rmBehindMore" | "rmAheadMore";

/** The request for a choice, or why it cannot be made yet (a message of the notes namespace). */
export function requestOf(c: RailmlChoice): StretchRequest | { missing: NotesKey } {
  let front: FrontPlace;
  const track = c.track.trim();
  if (c.kind === "ocp") {
    if (!c.ocp) return { missing: "rmChooseOcp" };
    front = track ? { kind: "ocp", ocp: c.ocp, track } : { kind: "ocp", ocp: c.ocp };
  } else if (c.kind === "pos") {
    if (!track) return { missing: "rmEnterTrack" };
    if (!Number.isFinite(c.pos)) return { missing: "rmEnterPos" };
    front = { kind: "pos", track, pos: c.pos };
  } else {
    if (!Number.isFinite(c.absPos)) return { missing: "rmEnterAbsPos" };
    front = track ? { kind: "absPos", absPos: c.absPos, track } : { kind: "absPos", absPos: c.absPos };
  }
  if (!(c.behindM > 0)) return { missing: "rmBehindMore" };
  if (!(c.aheadM >= 0)) return { missing: "rmAheadMore" };
  return { front, direction: c.direction, behindM: c.behindM, aheadM: c.aheadM };
}

export function createRailmlImport(deps: { importer: () => RailmlImporter; delayMs?: number }): RailmlImport {
  const [phase, setPhase] = createSignal<ImportPhase>("pick");
  const [progress, setProgress] = createSignal(0);
  const [fileName, setFileName] = createSignal("");
  const [summary, setSummary] = createSignal<RailmlSummary | undefined>();
  const [problem, setProblem] = createSignal<Words | null>(null);
  const [result, setResult] = createSignal<ImportResult | undefined>();
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
          const said = errorWords(e);
          setProblem(() => (e.name === "AbortError" ? () => t("rmCancelled") : () => t("rmNothingSaved", { problem: said() })));
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
      if ("missing" in req) {
        const key = req.missing;
        setResult({ ok: false, words: () => t(key) });
        return;
      }
      const n = ++asked;
      timer = setTimeout(() => {
        worker()
          .stretch(req)
          .then(
            (r) => n === asked && setResult(r.ok ? r : { ok: false, words: r.text ? railmlSaid(r.text) : () => r.message }),
            (e: Error) => n === asked && setResult({ ok: false, words: errorWords(e) }),
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
      setProblem(() => () => t("rmCancelled"));
      setPhase("failed");
    },
  };
}
