/**
 * Start review (wiring): the note chosen in Location notes, the start case from Start plan placed at that
 * note's location, the recording read and reviewed, and the note's reviews in the device's notes store.
 * The review runs in a worker (a few hundred milliseconds for a short train, a few seconds for a long one).
 */
import { createMemo, createResource, createSignal, type JSX } from "solid-js";
import { deviceNotesStore } from "../../../notes/index.js";
import { locationFromNote } from "../../../profiles/convert.js";
import { observedMassFactor, type StartReviewFile } from "../../../profiles/notes.js";
import type { ReviewReport } from "../../../profiles/reviewReport.js";
import { reviewInWorker } from "./reviewClient.js";
import type { ReviewFindings } from "./runReview.js";
import { useApp } from "../../context.js";
import { reviewTarget } from "../../state/reviewTarget.js";
import { builtinTrains } from "../../../profiles/builtin.js";
import { computeNoteLoadTable } from "../LocationNotes/loadTableRunner.js";
import { StartReviewView, type KeepForm, type ObservedTable } from "./View.js";

const today = () => new Date().toISOString().slice(0, 10);

export default function StartReview(): JSX.Element {
  const app = useApp();
  const noteId = reviewTarget;
  const [note] = createResource(noteId, async (id) => {
    const s = await deviceNotesStore();
    const r = await s.get(id);
    return r.status === "ok" ? r.saved.note : null;
  });
  const [version, setVersion] = createSignal(0);
  const [reviews] = createResource(
    () => [noteId(), version()] as const,
    async ([id]) => (id ? (await deviceNotesStore()).reviews(id) : []),
  );
  const startCase = createMemo(() => {
    const c = app.draft.checked();
    const n = note();
    if (!c.ok || !n) return null;
    return { ...c.value, location: locationFromNote(n) };
  });
  const [busy, setBusy] = createSignal(false);
  const [problem, setProblem] = createSignal<string | null>(null);
  const [result, setResult] = createSignal<{ report: ReviewReport; findings: ReviewFindings } | null>(null);
  const [kept, setKept] = createSignal(false);
  const [form, setForm] = createSignal<KeepForm>({ date: today(), rail: "dry", train: "", initials: "" });

  const blocked = () => {
    if (!noteId()) return "Open a location note and choose Start review there.";
    if (note.loading) return "Reading the note…";
    if (!note()) return "The note is not in the library any more.";
    if (!startCase()) return "Set up the train, locomotives and conditions in Start plan first: the review plans that start at this note's location.";
    return null;
  };

  const onFile = (file: File) => {
    const c = startCase();
    if (!c) return;
    setProblem(null);
    setResult(null);
    setKept(false);
    setBusy(true);
    void file
      .text()
      .then((text) => reviewInWorker(c, file.name, text))
      .then((out) => {
        if (!out.ok) return setProblem(out.message);
        setResult(out);
        setForm((f) => ({ ...f, rail: c.conditions.rail, train: f.train || `${Math.round(c.train.trailingMassKg / 1000)} t, ${c.train.wagons} wagons` }));
      })
      .catch((e: unknown) => setProblem(`${file.name}: the review failed (${(e as Error).message || String(e)}).`))
      .finally(() => setBusy(false));
  };

  const onKeep = () => {
    const res = result();
    const id = noteId();
    if (!res || !id) return;
    const f = form();
    const review: StartReviewFile = {
      id: `${id}-${f.date}-${Date.now().toString(36)}`.slice(0, 80),
      location: id,
      date: f.date,
      rail: f.rail,
      train: f.train.trim() || "train not named",
      ...(f.initials.trim() ? { initials: f.initials.trim() } : {}),
      ...res.findings,
    };
    setBusy(true);
    void deviceNotesStore()
      .then((s) => s.addReview(review))
      .then((out) => {
        if (out.ok) {
          setKept(true);
          setVersion((v) => v + 1);
        } else setProblem(out.message);
      })
      .finally(() => setBusy(false));
  };

  const [table, setTable] = createSignal<ObservedTable | null>(null);
  const onTable = () => {
    const n = note();
    const o = observedMassFactor(reviews() ?? []);
    if (!n || !o) return;
    const ref = n.referenceTrain ?? { train: builtinTrains[0]?.id ?? "" };
    setTable({ working: true });
    void computeNoteLoadTable(n, ref, app.pool).then(
      (out) => {
        if (!out.ok) return setTable({ working: false, why: out.issues.map((i) => i.message).join("; ") });
        // A train that starts as if f times heavier than its papers: of the masses on paper, the model's
        // largest ÷ f start as the model's largest does.
        const t = (kg: number) => (kg > 0 ? Math.floor(kg / 1000) : null);
        setTable({ working: false, rows: out.rows.map((r) => ({ rail: r.rail, sand: r.sand, modelT: t(r.maxTrailingMassKg), observedT: t(r.maxTrailingMassKg / o.median) })) });
      },
      (e: unknown) => setTable({ working: false, why: `The load table could not be worked out (${(e as Error).message || String(e)}).` }),
    );
  };


  return (
    <StartReviewView
      noteName={note()?.name ?? null}
      blocked={blocked()}
      caseText={(() => {
        const c = startCase();
        return c ? `The start case from Start plan (${Math.round(c.train.trailingMassKg / 1000)} t, ${c.train.wagons} wagons, ${c.conditions.rail} rail${c.conditions.sand ? ", sand" : ""}), placed at this note's location.` : "";
      })()}
      busy={busy()}
      problem={problem()}
      report={result()?.report ?? null}
      form={form()}
      kept={kept()}
      reviews={reviews() ?? []}
      observed={observedMassFactor(reviews() ?? [])}
      onFile={onFile}
      onForm={(f) => setForm((old) => ({ ...old, ...f }))}
      onKeep={onKeep}
      onDelete={(rid) =>
        void deviceNotesStore()
          .then((s) => s.deleteReview(rid))
          .then(() => setVersion((v) => v + 1))
      }
      onBack={() => app.nav.go("location-notes")}
      table={table()}
      onTable={onTable}
    />
  );
}
