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
import { Card } from "./Card.js";
import { ConflictDialog } from "./ConflictDialog.js";
import type { NoteEditor } from "./createNoteEditor.js";
import { Editor } from "./Editor.js";
import { Library, NoticeBox, type LibraryProps } from "./Library.js";
import "./notes.css";

export type Mode = "library" | "edit" | "card";

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
  printedOn: string;
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

export function View(props: ViewProps): JSX.Element {
  const [confirmDelete, setConfirmDelete] = createSignal(false);
  const saved = () => props.editor.saved();
  const cardOf = (note: LocationNoteFile) => (
    <Card
      note={note}
      units={props.units}
      model={props.editor.model()}
      figures={props.editor.figures()}
      reference={props.editor.reference()}
      loadTable={props.editor.loadTable()}
      placementIssue={props.editor.model()?.train ? undefined : props.editor.issues().find((i) => i.path === "train")?.message}
      printedOn={props.printedOn}
    />
  );

  return (
    <div class="notes-screen">
      <Switch>
        <Match when={props.mode === "library"}>
          <Library {...props.library} onOpen={props.onOpen} onCard={props.onCard} onNew={props.onNew} />
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
                <button type="button" class="button primary" onClick={() => props.onPrint()}>
                  Print / save as PDF
                </button>
                <button type="button" class="button" onClick={() => props.onEdit()}>
                  Edit note
                </button>
                <button type="button" class="button" onClick={() => props.onClose()}>
                  Back to the library
                </button>
              </div>
              <p class="notes-hint">One page, A4 or Letter. In the print dialog choose "Save as PDF" to make a file to share.</p>
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
              <h2 id="notes-del-title">Remove "{note().name}"?</h2>
              <p>It is removed from this device and from the location pickers. A copy you exported earlier is not affected.</p>
              <div class="notes-row-actions">
                <button
                  type="button"
                  class="button danger"
                  onClick={() => {
                    setConfirmDelete(false);
                    props.onDelete();
                  }}
                >
                  Remove note
                </button>
                <button type="button" class="button" onClick={() => setConfirmDelete(false)}>
                  Keep it
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
