/**
 * Departures (wiring): read the picked files (saved location notes count as locations), check every row
 * on the planner worker pool, sort by risk or keep the file's order, show one verdict, open a row's train
 * in Start plan or Assistance check (it becomes the case being edited), export CSV. The view is View.tsx.
 */
import { createSignal, type JSX, type Signal } from "solid-js";
import { builtinLibrary } from "../../../profiles/builtin.js";
import type { Library } from "../../../profiles/library.js";
import { useApp } from "../../context.js";
import { declarePrintStatus } from "../../state/printStatus.js";
import { download } from "../../download.js";
import "../shared/dispatch.css";
import { departuresRunFor } from "./createDeparturesRun.js";
import { pickedFiles, pickedProblemText, readPickedDepartures, type PickedFile } from "./readFiles.js";
import { parseStartCaseFile } from "../../../profiles/parse.js";
import { byRisk, departuresCsv, summarise, type DepartureRow } from "./rows.js";
import { DeparturesView, type DeparturesFilter, type DeparturesSort, type LoadedFile } from "./View.js";
import { departures } from "../../../i18n/en/departures.js";
import { tr } from "../../i18n.js";
import { laterWords } from "../../laterWords.js";
import { fieldWords, localiseIssue } from "../../fieldWords.js";
import { printWaits } from "../../../i18n/en/printWaits.js";

// This screen's words in the language on screen (a chunk of their own) come before it shows, and the
// field messages of a refused file or row.
await Promise.all([laterWords, fieldWords]);

const t = tr.ns(departures);

/** A problem shown: written when it is drawn, in the language on screen then (a switch redraws it). */
type Problem = () => string;

/** The file and problem shown, kept with the run (per set of workers) while the app is open. */
const screens = new WeakMap<
  object,
  {
    loaded: Signal<{ file: LoadedFile; picked: PickedFile[] } | null>;
    problem: Signal<Problem | null>;
    filter: Signal<DeparturesFilter>;
    sort: Signal<DeparturesSort>;
  }
>();
function screenState(workers: object) {
  let s = screens.get(workers);
  if (!s) {
    s = {
      loaded: createSignal<{ file: LoadedFile; picked: PickedFile[] } | null>(null),
      problem: createSignal<Problem | null>(null),
      filter: createSignal<DeparturesFilter>("all"),
      sort: createSignal<DeparturesSort>("risk"),
    };
    screens.set(workers, s);
  }
  return s;
}

/** A library in which a case may name any note saved on this device (the built-in one when the store cannot be read). */
async function libraryForFiles(fallback: Library): Promise<Library> {
  try {
    const { libraryWithSavedNotes } = await import("../../../notes/index.js");
    return await libraryWithSavedNotes(builtinLibrary());
  } catch {
    return fallback;
  }
}

export default function Departures(): JSX.Element {
  const app = useApp();
  const run = departuresRunFor(app.pool);
  const {
    loaded: [loaded, setLoaded],
    problem: [problem, setProblem],
    filter: [filter, setFilter],
    sort: [sort, setSort],
  } = screenState(app.pool);
  const [reading, setReading] = createSignal(false);
  const rows = run.rows;
  declarePrintStatus(() => ({ complete: run.state() !== "running", waitingFor: tr.ns(printWaits)("departures"), inputs: loaded()?.picked ?? null }));

  const load = async (picked: PickedFile[]) => {
    setReading(true);
    try {
      const lib = await libraryForFiles(app.locations.library());
      const r = readPickedDepartures(picked, lib);
      if (!r.ok) {
        const p = r.problem;
        setProblem(() => () => pickedProblemText(tr, p, (i) => localiseIssue(i, app.settings.settings().units).message));
        return;
      }
      setProblem(null);
      setLoaded({ file: { name: r.file, kind: r.kind, missing: r.missing, unused: r.unused }, picked });
      run.start(r.departures);
    } catch (e) {
      const error = (e as Error).message || String(e);
      setProblem(() => () => t("unreadable", { error }));
    } finally {
      setReading(false);
    }
  };

  return (
    <DeparturesView
      file={loaded()?.file ?? null}
      problem={problem()?.() ?? null}
      reading={reading()}
      state={run.state()}
      rows={shown(rows(), filter(), sort())}
      filter={filter()}
      onFilter={setFilter}
      sort={sort()}
      onSort={setSort}
      onOpen={(row, where) => {
        const f = parseStartCaseFile(row.file);
        if (!f.ok) {
          const issues = f.issues;
          setProblem(() => () => t("cannotOpen", { id: row.id, issues: issues.map((i) => `${i.path}: ${localiseIssue(i, app.settings.settings().units).message}`).join("; ") }));
          return;
        }
        // The departure becomes the case being edited: Start plan plans it, Assistance check checks it.
        app.draft.loadCase({ ...f.value, id: f.value.id ?? row.id, label: f.value.label ? `${row.id}: ${f.value.label}` : t("departureLabel", { id: row.id }) });
        app.nav.go(where === "plan" ? "start-plan" : "assistance-check");
      }}
      bad={rows().filter((x) => x.error !== undefined)}
      summary={summarise(rows())}
      progress={run.progress()}
      units={app.settings.settings().units}
      onPick={(files) => void pickedFiles(files).then(load)}
      onAddCases={(files) =>
        void pickedFiles(files).then((more) => {
          const before = loaded()?.picked ?? [];
          const names = new Set(more.map((f) => f.name));
          return load([...before.filter((f) => !names.has(f.name)), ...more]);
        })
      }
      onDemo={() =>
        void import("../../../../profiles/departures/demo-day.json").then((m) => load([{ name: "demo-day.json", text: JSON.stringify((m as { default: unknown }).default) }]))
      }
      onCancel={() => run.cancel()}
      onRestart={() => {
        const l = loaded();
        if (l) void load(l.picked);
      }}
      onExport={() => download(departuresCsv(rows()), `${(loaded()?.file.name ?? "departures").replace(/\.(csv|json)$/i, "")}-check.csv`, "text/csv")}
    />
  );
}

/** The answered and waiting rows to show: one verdict or all, most at risk first or in the file's order. */
export function shown(rows: readonly DepartureRow[], filter: DeparturesFilter, sort: DeparturesSort): DepartureRow[] {
  const good = rows.filter((x) => x.error === undefined && (filter === "all" || x.answer?.verdict === filter));
  return sort === "risk" ? byRisk(good) : [...good].sort((a, b) => a.order - b.order);
}
