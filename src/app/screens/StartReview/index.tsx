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
import { readerText, type ReaderCoded } from "../../../i18n/renderReaders.js";
import { issueMessage } from "../../../profiles/issueText.js";
import type { FieldIssue } from "../../../profiles/issues.js";
import { words } from "../../words.js";
import { checkWords } from "../../checkWords.js";
import { fieldWords, localiseIssue } from "../../fieldWords.js";

// The screen's Hungarian and German words come in a chunk of their own, before the screen shows; a
// field's problem (a refused review, a train that cannot be placed) is said in field words.
await Promise.all([checkWords, fieldWords]);

const t = tr.ns(review);

/**
 * A problem to show, as data rendered when drawn (a language switch redraws it): a refused recording (its
 * file's name and the reasons), or a review the store refused (its code, and the field's issue as a code).
 */
type Problem = { fileName: string; texts: ReviewText[] } | { refused: ReaderCoded; issue?: FieldIssue };
const problemWords = (p: Problem) => ("refused" in p ? refusedWords(p.refused, p.issue) : `${p.fileName}: ${p.texts.map((x) => reviewText(tr, x)).join("\n")}`);

/** A refused review in the language on screen: the field's problem rendered from its code (English: the words the store gave). */
export function refusedWords(coded: ReaderCoded, issue?: FieldIssue): string {
  if (issue && coded.code === "reviewInvalid" && coded.figures) return readerText(tr, { ...coded, figures: { ...coded.figures, problem: issueMessage(tr, issue) } });
  return readerText(tr, coded);
}

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
        } else setProblem({ refused: out.coded, ...(out.issue ? { issue: out.issue } : {}) });
      })
      .finally(() => setBusy(false));
  };

  // Why no table came, as data (the issues that stop the reference train, or an error), worded when drawn.
  const [table, setTable] = createSignal<(ObservedTable & { issues?: FieldIssue[] }) | null>(null);
  const tableShown = (): ObservedTable | null => {
    const x = table();
    if (!x?.issues) return x;
    const { issues, ...rest } = x;
    return { ...rest, why: issues.map((i) => localiseIssue(i, app.settings.settings().units).message).join("; ") };
  };
  const onTable = () => {
    const n = note();
    const o = observedMassFactor(reviews() ?? []);
    if (!n || !o) return;
    const ref = n.referenceTrain ?? { train: builtinTrains[0]?.id ?? "" };
    setTable({ working: true });
    void computeNoteLoadTable(n, ref, app.pool).then(
      (out) => {
        if (!out.ok) return setTable({ working: false, issues: out.issues });
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
      table={tableShown()}
      onTable={onTable}
    />
  );
}
