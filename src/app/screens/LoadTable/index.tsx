/**
 * Load table (wiring): a location from the picker's notes (saved on this device, or the built-in demo
 * notes), a train preset and a locomotive set placed on the note's profile exactly as the notes card
 * does it (src/profiles), and the core's load table worked out on the planner workers. The view is View.tsx.
 */
import { createMemo, createSignal, type JSX, type Signal } from "solid-js";
import { builtinTrains } from "../../../profiles/builtin.js";
import { referenceCase, referenceSummary } from "../../../profiles/referenceTrain.js";
import { referenceLocomotiveWords } from "../shared/referenceWords.js";
import type { LocationNoteFile, ReferenceTrainFile } from "../../../profiles/schemas.js";
import { PALETTES } from "../../charts/palette.js";
import { useApp } from "../../context.js";
import { builtinLocationSource, type LocationChoice } from "../../locations.js";
import { declarePrintStatus } from "../../state/printStatus.js";
import "../shared/dispatch.css";
import { createLoadTableRun } from "./createLoadTableRun.js";
import { LoadTableView } from "./View.js";
import { dispatch } from "../../../i18n/en/dispatch.js";
import { tr } from "../../i18n.js";
import { printWaits } from "../../../i18n/en/printWaits.js";
import { fieldWords, localiseIssue } from "../../fieldWords.js";

// A train that cannot be placed is said in field words, in the language on screen.
await fieldWords;

const t = tr.ns(dispatch);

type Picked = { train?: string; locomotive?: string; count?: number };

/** The choices made, kept while the app is open (per app state). */
const kept = new WeakMap<object, { location: Signal<string | null>; choice: Signal<Picked> }>();
function keptFor(app: object) {
  let k = kept.get(app);
  if (!k) {
    k = { location: createSignal<string | null>(null), choice: createSignal<Picked>({}) };
    kept.set(app, k);
  }
  return k;
}

/** The reference train for a note with the user's choices over the note's own. */
export function chosenReference(note: LocationNoteFile, picked: Picked): ReferenceTrainFile {
  const own = note.referenceTrain;
  const train = picked.train ?? own?.train ?? builtinTrains[0]?.id ?? "";
  const preset = builtinTrains.find((p) => p.id === train);
  const first = preset?.locomotives[0];
  const presetLoco = first ? (typeof first.profile === "string" ? first.profile : first.profile.id) : undefined;
  const locomotive = picked.locomotive ?? (picked.train === undefined ? own?.locomotive : undefined) ?? presetLoco;
  const count = picked.count ?? (picked.train === undefined ? own?.count : undefined) ?? first?.count ?? 1;
  return { train, ...(locomotive ? { locomotive } : {}), count, ...(own?.temperature_C !== undefined ? { temperature_C: own.temperature_C } : {}) };
}

export default function LoadTable(): JSX.Element {
  const app = useApp();
  const {
    location: [locationId, setLocationId],
    choice: [choice, setChoice],
  } = keptFor(app);
  const units = () => app.settings.settings().units;
  const lib = () => app.locations.library();
  const locations = createMemo<readonly LocationChoice[]>(() => {
    const list = app.locations.choices();
    return list.length > 0 ? list : (builtinLocationSource() as readonly LocationChoice[]);
  });
  // The location in use: the one picked here, else the Start plan's note, else the first.
  const current = createMemo(() => {
    const list = locations();
    const want = locationId() ?? (app.draft.draft.locationMode === "note" ? app.draft.draft.noteId : null);
    return list.find((c) => c.id === want) ?? list[0] ?? null;
  });
  const ref = createMemo(() => {
    const c = current();
    return c ? chosenReference(c.note, choice()) : null;
  });
  const placed = createMemo(() => {
    const c = current();
    const r = ref();
    if (!c || !r) return null;
    return referenceCase(c.note, builtinTrains, lib(), r);
  });
  const startCase = createMemo(() => {
    const p = placed();
    return p && p.ok ? p.value : null;
  });
  // A table the workers refuse (the work cap, a case they cannot take) is said in field words too.
  const run = createLoadTableRun({
    workers: app.pool,
    parallel: app.pool.size,
    startCase,
    issueWords: (issues) => issues.map((i) => `${i.path}: ${localiseIssue(i, units()).message}`).join("; "),
  });
  declarePrintStatus(() => ({ complete: run.status() !== "running", waitingFor: tr.ns(printWaits)("loadTable"), inputs: startCase() }));
  const summary = createMemo(() => {
    const r = ref();
    return r ? referenceSummary(r, builtinTrains, lib()) : null;
  });
  // The locomotives in the language on screen ("1 × … an der Spitze"), not the summary's English words.
  const locomotiveWords = createMemo(() => {
    const r = ref();
    return (r && referenceLocomotiveWords(r, builtinTrains, lib())) ?? summary()?.locomotives ?? "";
  });
  return (
    <LoadTableView
      locations={locations()}
      locationId={current()?.id ?? ""}
      trains={builtinTrains.map((t) => ({ value: t.id, label: t.label }))}
      trainId={ref()?.train ?? ""}
      locomotives={[...lib().locomotives.values()].map((l) => ({ value: l.spec.id, label: l.spec.label }))}
      locoId={ref()?.locomotive ?? ""}
      count={ref()?.count ?? 1}
      describe={(() => {
        const s = summary();
        return s ? t("describe", { train: s.trainLabel, locomotives: locomotiveWords() }) : "";
      })()}
      trainMassKg={(() => {
        const s = summary();
        return s && Number.isFinite(s.trailingMassKg) ? s.trailingMassKg : null;
      })()}
      problem={(() => {
        const p = placed();
        return p && !p.ok ? p.issues.map((i) => (i.path ? `${i.path}: ${localiseIssue(i, units()).message}` : localiseIssue(i, units()).message)).join("; ") : null;
      })()}
      status={run.status()}
      rows={run.rows()}
      progress={run.progress()}
      error={run.error()}
      elapsedMs={run.elapsedMs()}
      units={units()}
      palette={PALETTES[app.theme()]}
      onLocation={(id) => setLocationId(id)}
      onTrain={(id) => setChoice({ train: id })}
      onLoco={(id) => setChoice((c) => ({ ...c, locomotive: id }))}
      onCount={(n) => setChoice((c) => ({ ...c, count: n }))}
      onCancel={run.cancel}
      onRetry={run.retry}
    />
  );
}
