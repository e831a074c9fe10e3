/**
 * The Location notes screen as props → JSX: the library, the editor, or a note's card (with its print
 * copy mounted at the page's top level so the print stylesheet can print it alone), plus the import
 * conflict question and the "remove this note?" confirmation.
 */
import { createSignal, Match, onCleanup, Show, Switch, type JSX } from "solid-js";
import { Portal } from "solid-js/web";
import type { Library as ProfileLibrary } from "../../../profiles/library.js";
import type { LocationNoteFile, TrainPresetFile } from "../../../profiles/schemas.js";
import type { ConflictChoice, ImportConflict } from "../../../notes/merge.js";
import type { ChartPalette } from "../../charts/palette.js";
import type { UnitSystem } from "../../format.js";
import type { CardProvenance } from "../../../profiles/provenance.js";
import { Card, cardComplete } from "./Card.js";
import { ConflictDialog } from "./ConflictDialog.js";
import type { NoteEditor } from "./createNoteEditor.js";
import type { LoadTableOutcome } from "./loadTableRunner.js";
import { Editor } from "./Editor.js";
import { Library, NoticeBox, type LibraryProps } from "./Library.js";
import type { Stretch } from "../../../profiles/railml/index.js";
import type { RailmlImport } from "./railml/createRailmlImport.js";
import { RailmlImportView } from "./railml/RailmlImport.js";
import { SegmentedButtons } from "../../components/SegmentedButtons.js";
import { card } from "../../../i18n/en/card.js";
import { notes } from "../../../i18n/en/notes.js";
import { LANGS, LANGUAGE_NAMES, type Lang } from "../../../i18n/language.js";
import { appLang, tr } from "../../i18n.js";
import "./notes.css";

const t = tr.ns(card);
const n = tr.ns(notes);

export type Mode = "library" | "edit" | "card" | "railml";

export interface ViewProps {
  mode: Mode;
  units: UnitSystem;
  palette: ChartPalette;
  presets: readonly TrainPresetFile[];
  profiles: ProfileLibrary;
  library: Omit<LibraryProps, "onOpen" | "onCard" | "onNew">;
  editor: NoteEditor;
  busy: boolean;
  conflicts: readonly ImportConflict[] | null;
  onConflictsDone: (choices: Record<string, ConflictChoice> | null) => void;
  onOpen: (id: string) => void;
  onCard: (id: string) => void;
  onNew: () => void;
  onSave: () => void;
  onClose: () => void;
  onDelete: () => void;
  onExportNote: () => void;
  onEdit: () => void;
  onPrint: () => void;
  /** Open the Start review place for the note shown. */
  onReview?: (id: string) => void;
  /** Print the card in another language: the app shows that language (Settings keeps it). */
  onLanguage?: (l: Lang) => void;
  /** When the card is printed, "YYYY-MM-DD HH:MM" (refreshed just before each print). */
  printedAt: string;
  /** A print was started (the browser's own command) before the card was complete. */
  printedEarly?: boolean;
  /** What the card's figures are computed from, for a note. */
  provenance: (note: LocationNoteFile) => CardProvenance;
  /** The railML import (mode "railml"). */
  railml?: { imp: RailmlImport; onOpen: () => void; onSave: (s: Stretch) => void; onEdit: (s: Stretch) => void };
}

/** Height a card may take on paper: A4 leaves 273 mm inside 12 mm margins, Letter 255 mm; keep a little in hand. */
export const CARD_PAGE_HEIGHT_MM = 250;
const PX_PER_MM = 96 / 25.4;

/**
 * Keep the printed card on one page: measure the print copy (laid out off-screen at the page's width)
 * and shrink it by CSS zoom, in print only, when a long note would run over.
 */
function fitToPage(root: HTMLDivElement): void {
  root.classList.add("notes-print-root");
  root.setAttribute("aria-hidden", "true");
  const fit = () => {
    const card = root.querySelector<HTMLElement>(".notes-card");
    if (!card) return;
    const avail = CARD_PAGE_HEIGHT_MM * PX_PER_MM;
    const h = card.scrollHeight;
    root.style.setProperty("--card-fit", h > avail ? (avail / h).toFixed(3) : "1");
  };
  if (typeof ResizeObserver === "function") {
    const ro = new ResizeObserver(fit);
    queueMicrotask(() => {
      const card = root.querySelector(".notes-card");
      if (card) ro.observe(card);
      fit();
    });
    onCleanup(() => ro.disconnect());
  } else queueMicrotask(fit);
}

/**
 * The load table a card shows: the editor's, or — when the reference train cannot be placed on the note's
 * profile, so no table will come — why not (a card that says why is complete; one that waits is not).
 */
export function cardLoadTable(editor: Pick<NoteEditor, "loadTable" | "placed" | "errors">): LoadTableOutcome | undefined {
  if (editor.placed()) return editor.loadTable();
  const why = editor.errors()[0]?.message ?? t("cannotPlace");
  return { ok: false, issues: [{ path: "", message: why }] };
}

export function View(props: ViewProps): JSX.Element {
  const [confirmDelete, setConfirmDelete] = createSignal(false);
  const saved = () => props.editor.saved();
  const table = () => cardLoadTable(props.editor);
  const cardOf = (note: LocationNoteFile) => (
    <Card
      note={note}
      units={props.units}
      model={props.editor.model()}
      figures={props.editor.figures()}
      reference={props.editor.reference()}
      loadTable={table()}
      placementIssue={props.editor.model()?.train ? undefined : props.editor.issues().find((i) => i.path === "train")?.message}
      printedAt={props.printedAt}
      provenance={props.provenance(note)}
    />
  );

  return (
    <div class="notes-screen">
      <Switch>
        <Match when={props.mode === "library"}>
          <Library {...props.library} onOpen={props.onOpen} onCard={props.onCard} onNew={props.onNew} {...(props.railml ? { onRailml: props.railml.onOpen } : {})} />
        </Match>
        <Match when={props.mode === "railml" && props.railml}>
          {(r) => (
            <>
              <Show when={props.library.notice}>{(n) => <NoticeBox notice={n()} onDismiss={props.library.onDismissNotice} />}</Show>
              <RailmlImportView
                imp={r().imp}
                units={props.units}
                presets={props.presets}
                library={props.profiles}
                busy={props.busy}
                onSave={r().onSave}
                onEdit={r().onEdit}
                onClose={props.onClose}
              />
            </>
          )}
        </Match>
        <Match when={props.mode === "edit"}>
          <Show when={props.library.notice}>{(n) => <NoticeBox notice={n()} onDismiss={props.library.onDismissNotice} />}</Show>
          <Editor
            editor={props.editor}
            units={props.units}
            palette={props.palette}
            presets={props.presets}
            library={props.profiles}
            busy={props.busy}
            onSave={props.onSave}
            onClose={props.onClose}
            onDelete={() => setConfirmDelete(true)}
            onCard={() => saved() && props.onCard(saved()!.id)}
            onExport={props.onExportNote}
          />
        </Match>
        <Match when={props.mode === "card" && saved()}>
          {(note) => (
            <div class="notes-card-view">
              <div class="notes-row-actions">
                <button
                  type="button"
                  class="button primary"
                  disabled={!cardComplete(table())}
                  aria-describedby={cardComplete(table()) ? undefined : "notes-print-wait"}
                  onClick={() => props.onPrint()}
                >
                  {t("print")}
                </button>
                <button type="button" class="button" onClick={() => props.onEdit()}>
                  {n("editNote")}
                </button>
                <Show when={props.onReview}>
                  <button type="button" class="button" onClick={() => props.onReview?.(note().id)}>
                    {n("startReview")}
                  </button>
                </Show>
                <button type="button" class="button" onClick={() => props.onClose()}>
                  {n("backToLibrary")}
                </button>
              </div>
              <Show
                when={cardComplete(table())}
                fallback={
                  <p class="notes-hint notes-print-wait" id="notes-print-wait" role="status">
                    {n("printWaits", { percent: Math.round(100 * props.editor.loadTableProgress()) })}
                    <Show when={props.printedEarly}>{n("printedEarly")}</Show>
                  </p>
                }
              >
                <p class="notes-hint">{n("printHint")}</p>
              </Show>
              <Show when={props.onLanguage}>
                {(choose) => (
                  <SegmentedButtons<Lang>
                    name="cardLanguage"
                    label={t("cardLanguage")}
                    value={appLang()}
                    onChange={(l) => choose()(l)}
                    options={LANGS.map((l) => ({ value: l, label: LANGUAGE_NAMES[l] }))}
                  />
                )}
              </Show>
              <Show when={props.onLanguage}>
                <p class="notes-hint">{t("cardLanguageNote")}</p>
              </Show>
              <div class="notes-card-preview">{cardOf(note())}</div>
              <Portal ref={fitToPage}>{cardOf(note())}</Portal>
            </div>
          )}
        </Match>
      </Switch>

      <Show when={confirmDelete() && saved()}>
        {(note) => (
          <div class="notes-dialog-backdrop">
            <div class="notes-dialog" role="alertdialog" aria-modal="true" aria-labelledby="notes-del-title">
              <h2 id="notes-del-title">{n("removeTitle", { name: note().name })}</h2>
              <p>{n("removeText")}</p>
              <div class="notes-row-actions">
                <button
                  type="button"
                  class="button danger"
                  onClick={() => {
                    setConfirmDelete(false);
                    props.onDelete();
                  }}
                >
                  {n("removeNote")}
                </button>
                <button type="button" class="button" onClick={() => setConfirmDelete(false)}>
                  {n("keepIt")}
                </button>
              </div>
            </div>
          </div>
        )}
      </Show>

      <Show when={props.conflicts}>{(c) => <ConflictDialog conflicts={c()} onDone={props.onConflictsDone} />}</Show>
    </div>
  );
}
