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
import { review } from "../../../i18n/en/review.js";
import { reviewText, type ReviewText } from "../../../i18n/reviewText.js";
import { tr } from "../../i18n.js";
import { readerText } from "../../../i18n/renderReaders.js";
import { words } from "../../words.js";
import { checkWords } from "../../checkWords.js";

// The screen's Hungarian and German words come in a chunk of their own, before the screen shows.
await checkWords;

const t = tr.ns(review);

/** A problem to show: a refused recording (its file's name and the reasons, as data), or a message as it came. */
type Problem = { fileName: string; texts: ReviewText[] } | { message: string };
const problemWords = (p: Problem) => ("message" in p ? p.message : `${p.fileName}: ${p.texts.map((x) => reviewText(tr, x)).join("\n")}`);

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
  const [problem, setProblem] = createSignal<Problem | null>(null);
  const [result, setResult] = createSignal<{ report: ReviewReport; lines: ReviewText[]; findings: ReviewFindings } | null>(null);
  const [kept, setKept] = createSignal(false);
  const [form, setForm] = createSignal<KeepForm>({ date: today(), rail: "dry", train: "", initials: "" });

  const blocked = () => {
    if (!noteId()) return t("noNote");
    if (note.loading) return t("readingNote");
    if (!note()) return t("noteGone");
    if (!startCase()) return t("noCase");
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
        if (!out.ok) return setProblem({ fileName: out.fileName, texts: out.texts });
        setResult(out);
        setForm((f) => ({ ...f, rail: c.conditions.rail, train: f.train || t("trainDefault", { mass: Math.round(c.train.trailingMassKg / 1000), count: c.train.wagons }) }));
      })
      .catch((e: unknown) => setProblem({ fileName: file.name, texts: [{ key: "failed", params: { error: (e as Error).message || String(e) } }] }))
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
      train: f.train.trim() || t("trainNotNamed"),
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
        } else setProblem({ message: readerText(tr, out.coded) });
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
      (e: unknown) => setTable({ working: false, why: t("tableFailed", { error: (e as Error).message || String(e) }) }),
    );
  };


  return (
    <StartReviewView
      noteName={note()?.name ?? null}
      blocked={blocked()}
      caseText={(() => {
        const c = startCase();
        return c
          ? t("caseText", { mass: Math.round(c.train.trailingMassKg / 1000), count: c.train.wagons, rail: words.railInline(c.conditions.rail), sand: c.conditions.sand ? t("caseSand") : "" })
          : "";
      })()}
      busy={busy()}
      problem={(() => {
        const p = problem();
        return p ? problemWords(p) : null;
      })()}
      report={result()?.report ?? null}
      lines={(result()?.lines ?? []).map((l) => reviewText(tr, l))}
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
