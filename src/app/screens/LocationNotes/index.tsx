/**
 * Location notes (wiring): the device's notes store, the editor, the card and printing, import and
 * export, connected to the app's settings (units), theme (chart palette) and the location pickers of the
 * other screens. The view is `View.tsx`.
 */
import { createEffect, createMemo, createSignal, onCleanup, Show, type JSX } from "solid-js";
import { builtinLibrary, builtinTrains } from "../../../profiles/builtin.js";
import { download } from "../../download.js";
import type { ConflictChoice, ImportConflict } from "../../../notes/merge.js";
import { deviceNotesStore, onDeviceNotesClosed } from "../../../notes/index.js";
import type { RecordProblem, SavedNote } from "../../../notes/records.js";
import type { SaveBase, SaveConflict } from "../../../notes/store.js";
import type { LocationNoteFile } from "../../../profiles/schemas.js";
import { cardProvenance, noteFigureInputs } from "../../../profiles/provenance.js";
import { PALETTES } from "../../charts/palette.js";
import { useApp } from "../../context.js";
import { notifyLocationsChanged } from "../../locations.js";
import { read, safeLocalStorage, write } from "../../state/createSettings.js";
import { declarePrintStatus, printStamp } from "../../state/printStatus.js";
import { APP_VERSION } from "../../version.js";
import { setReviewTarget } from "../../state/reviewTarget.js";
import { cardComplete } from "./Card.js";
import { createNoteEditor } from "./createNoteEditor.js";
import { createNotesLibrary, downloadBundle, flagWords, issueLines } from "./createNotesLibrary.js";
import { draftFromPartial, idFromName, storedNoteDraft, today, type NoteDraft } from "./draft.js";
import { SaveConflictDialog } from "./SaveConflictDialog.js";
import { noteLoadTableOn } from "./loadTableRunner.js";
import { installNotesLocationSource } from "./source.js";
import { cardLoadTable, View, type Mode } from "./View.js";
import { railmlDirection, railmlHazards, railmlNote, railmlStanding } from "../../../profiles/railml/note.js";
import type { Stretch } from "../../../profiles/railml/stretch.js";
import { createRailmlImporter } from "./railml/client.js";
import { createRailmlImport } from "./railml/createRailmlImport.js";
import { notes } from "../../../i18n/en/notes.js";
import { tr } from "../../i18n.js";
import { laterWords } from "../../laterWords.js";
import { fieldWords } from "../../fieldWords.js";
import { railmlTextWords } from "./railml/words.js";
import { printWaits } from "../../../i18n/en/printWaits.js";

// This screen's words in the language on screen (a chunk of their own) come before it shows, and the
// field words its editor's last check (the schema) speaks in.
await Promise.all([laterWords, fieldWords, railmlTextWords]);

const nt = tr.ns(notes);

/** Where the editor remembers the trainer's initials between revisions. */
export const INITIALS_KEY = "taut.notes.initials";
/** Where an edit not yet saved is kept, so a reload (or a library closed under the page) does not lose it. */
export const NOTE_DRAFT_KEY = "taut.notes.draft.v1";
/** Where a kept edit that could not be read back is set aside (never thrown away). */
export const NOTE_DRAFT_SET_ASIDE_KEY = "taut.notes.draft.v1.set-aside";

/** An edit kept on the device: the draft, the note it started from, and which stored version that was. */
interface KeptEdit {
  draft: NoteDraft;
  saved?: LocationNoteFile;
  base: SaveBase;
  keptAt: string;
}


// The other screens' location pickers list the device's notes from the moment the app loads this screen.
installNotesLocationSource();

export function LocationNotesScreen(): JSX.Element {
  const app = useApp();
  const storage = safeLocalStorage();
  const units = () => app.settings.settings().units;
  const palette = () => PALETTES[app.theme()];
  const profiles = builtinLibrary();
  const [initials, setInitials] = createSignal(read(storage, INITIALS_KEY) ?? "");
  const [mode, setMode] = createSignal<Mode>("library");
  const [busy, setBusy] = createSignal(false);
  const [conflicts, setConflicts] = createSignal<{ list: ImportConflict[]; answer: (c: Record<string, ConflictChoice> | null) => void } | null>(null);

  const lib = createNotesLibrary({ openStore: deviceNotesStore, changed: notifyLocationsChanged, onClosed: onDeviceNotesClosed });
  const editor = createNoteEditor({
    units,
    presets: builtinTrains,
    library: () => profiles,
    initials,
    active: () => mode() !== "library",
    computeLoadTable: noteLoadTableOn(app.pool),
  });
  const takenIds = createMemo(() => new Set(lib.rows().map((r) => r.id)));
  /** Which stored version the note being edited started from (a save that finds another asks first). */
  const [base, setBase] = createSignal<SaveBase>("new");
  const [saveConflict, setSaveConflict] = createSignal<{ conflict: SaveConflict; note: Record<string, unknown> } | null>(null);

  // ---- the edit in progress is kept on the device until it is saved or closed
  const keep = (k: KeptEdit | null) => {
    if (!storage) return;
    try {
      if (k) storage.setItem(NOTE_DRAFT_KEY, JSON.stringify(k));
      else storage.removeItem(NOTE_DRAFT_KEY);
    } catch {
      // Storage full or refused: the edit is still on screen.
    }
  };
  let keepTimer: ReturnType<typeof setTimeout> | undefined;
  const keepNow = () => {
    keepTimer = undefined;
    if (mode() === "edit" && editor.changed()) keep({ draft: JSON.parse(JSON.stringify(editor.draft)) as NoteDraft, ...(editor.saved() ? { saved: editor.saved()! } : {}), base: base(), keptAt: new Date().toISOString() });
    else keep(null);
  };
  createEffect(() => {
    JSON.stringify(editor.draft);
    mode();
    editor.changed();
    if (keepTimer !== undefined) clearTimeout(keepTimer);
    keepTimer = setTimeout(keepNow, 300);
  });
  const flush = () => keepTimer !== undefined && (clearTimeout(keepTimer), keepNow());
  addEventListener("pagehide", flush);
  onCleanup(() => {
    removeEventListener("pagehide", flush);
    flush();
  });
  const forget = () => {
    if (keepTimer !== undefined) clearTimeout(keepTimer);
    keepTimer = undefined;
    keep(null);
  };
  // An edit kept from before (a reload, a closed library): open it again, said so.
  const kept = read(storage, NOTE_DRAFT_KEY);
  if (kept) {
    let k: Partial<KeptEdit> | undefined;
    try {
      k = JSON.parse(kept) as Partial<KeptEdit>;
    } catch {
      k = undefined;
    }
    const draft = k ? storedNoteDraft(k.draft) : undefined;
    const b = k?.base;
    const okBase = b === "new" || b === "replace" || (!!b && typeof b === "object" && typeof b.rev === "number");
    if (draft && okBase) {
      editor.restore(draft, k?.saved);
      setBase(b);
      setMode("edit");
      lib.setNotice({ kind: "done", text: nt("nfEditKept", { name: draft.name || nt("nfNewNote") }) });
    } else {
      write(storage, NOTE_DRAFT_SET_ASIDE_KEY, kept);
      forget();
      lib.setNotice({ kind: "problem", text: nt("nfEditUnreadable") });
    }
  }

  /** After a save: the editor shows the saved note, the kept edit is dropped, the initials remembered. */
  const afterSaved = (saved: SavedNote) => {
    const ini = editor.draft.revision.initials.trim();
    if (ini) {
      setInitials(ini);
      write(storage, INITIALS_KEY, ini);
    }
    editor.load(saved.note);
    setBase({ rev: saved.rev });
    forget();
  };

  const settle = async (choice: "mine" | "theirs" | "both" | null) => {
    const c = saveConflict();
    setSaveConflict(null);
    if (!c || choice === null) return;
    if (choice === "theirs") {
      forget();
      if (c.conflict.theirs) {
        editor.load(c.conflict.theirs.note);
        setBase({ rev: c.conflict.theirs.rev });
        lib.setNotice({ kind: "done", text: nt("nfOpenedTheirs", { name: c.conflict.theirs.note.name }) });
      } else {
        setMode("library");
        void lib.refresh();
      }
      return;
    }
    let note = c.note;
    let saveBase: SaveBase = "replace";
    if (choice === "both") {
      const name = String(c.note.name ?? "");
      const mark = " (my copy)";
      note = { ...c.note, id: idFromName(`${name}${mark}`, new Set([...takenIds(), String(c.note.id)])), name: `${name.slice(0, 120 - mark.length)}${mark}` };
      saveBase = "new";
    }
    const r = await lib.save(note, saveBase);
    if (r.ok) afterSaved(r.saved);
    else if (r.conflict) setSaveConflict({ conflict: r.conflict, note });
    else if (r.issues.length > 0) lib.setNotice({ kind: "problem", text: nt("nfNotSaved"), details: issueLines(r.issues) });
  };

  const rescue = (p: RecordProblem) => {
    if (!p.rescue) return;
    editor.restore(draftFromPartial(p.rescue.note, { train: builtinTrains[0]?.id ?? "" }, initials()), undefined);
    setBase("replace");
    setMode("edit");
    lib.setNotice({
      kind: "problem",
      text: nt("nfRescue", { name: String(p.rescue.note.name ?? p.key) }),
      ...(p.rescue.flags.length > 0 ? { details: flagWords(p.rescue.flags, p.rescue.flagCodes) } : {}),
    });
  };

  // Import from railML: the file is read and the stretch made in a worker; saving goes through the
  // notes store like any note (the schema checks it), or the editor opens with it first.
  const railml = createRailmlImport({ importer: () => createRailmlImporter() });
  // The words the import writes into the note are in the language on screen: the trainer reads the note in it.
  const railmlWay = () => railmlDirection(railml.choice.direction, tr);
  const saveRailml = (s: Stretch) =>
    void task(async () => {
      const name = railml.choice.name.trim();
      const n = railmlNote(s, {
        id: idFromName(name, takenIds()),
        name,
        direction: railmlWay(),
        date: today(),
        initials: initials().trim().slice(0, 8) || "railML",
        source: railml.fileName(),
        hazards: true,
        ...(builtinTrains[0] ? { referenceTrain: { train: builtinTrains[0].id } } : {}),
      }, tr);
      if (!n.ok) {
        lib.setNotice({ kind: "problem", text: nt("nfStretchInvalid"), details: issueLines(n.issues) });
        return;
      }
      const r = await lib.save(n.value, "new");
      if (!r.ok) {
        if (r.conflict) setSaveConflict({ conflict: r.conflict, note: n.value as unknown as Record<string, unknown> });
        else if (r.issues.length > 0) lib.setNotice({ kind: "problem", text: nt("nfNotSaved"), details: issueLines(r.issues) });
        return;
      }
      lib.setNotice({ kind: "done", text: nt("nfSavedRailml", { name }) });
      editor.load(r.saved.note);
      setBase({ rev: r.saved.rev });
      setMode("edit");
    });
  const editRailml = (s: Stretch) => {
    lib.setNotice(null);
    editor.load(undefined);
    setBase("new");
    editor.set({
      name: railml.choice.name.trim(),
      direction: railmlWay(),
      standing: railmlStanding(s, tr),
      segments: s.segments.map((g) => ({ ...g })),
      frontAt_m: s.frontAt_m,
      clearAhead_m: s.aheadM,
      speedLimit_kmh: s.speedLimit_kmh ?? Number.NaN,
      hazards: railmlHazards(s, tr),
    });
    editor.set("revision", "change", nt("nfImportedRailml", { file: railml.fileName() }).slice(0, 400));
    setMode("edit");
  };

  // Printing: the card's "printed" time is taken just before each print, however it was started; a print
  // started (by the browser's own command) before the load table is worked out is remembered, so the
  // screen can say that the copy is marked incomplete.
  const [printedAt, setPrintedAt] = createSignal(printStamp());
  const [printedEarly, setPrintedEarly] = createSignal(false);
  const beforePrint = () => {
    setPrintedAt(printStamp());
    if (mode() === "card") setPrintedEarly(!cardComplete(cardLoadTable(editor)));
  };
  window.addEventListener("beforeprint", beforePrint);
  onCleanup(() => window.removeEventListener("beforeprint", beforePrint));
  // The editor printed as it is (the card prints its own stamp): incomplete while its load table is coming.
  declarePrintStatus(() => ({
    complete: mode() === "library" || cardComplete(cardLoadTable(editor)),
    waitingFor: tr.ns(printWaits)("loadTable"),
    inputs: mode() === "library" ? null : noteFigureInputs(editor.draft, builtinTrains, profiles, APP_VERSION, editor.draft.referenceTrain),
  }));

  const task = async (f: () => Promise<void>) => {
    setBusy(true);
    try {
      await f();
    } catch (e) {
      lib.setNotice({ kind: "problem", text: nt("nfWentWrong", { problem: (e as Error).message || String(e) }) });
    } finally {
      setBusy(false);
    }
  };

  const openNote = (id: string, then: Mode) => {
    // At once when the library has been read; from the store when only its rows are shown yet.
    const listed = lib.notes().find((n) => n.note.id === id);
    if (listed) showNote(listed, then);
    else void lib.note(id).then((s) => s && showNote(s, then));
  };
  const showNote = (s: SavedNote, then: Mode) => {
    // A note carried over from the older format with something left out says what, until it is saved again.
    lib.setNotice(s.flags && s.flags.length > 0 ? { kind: "problem", text: nt("nfOlderFormat"), details: flagWords(s.flags, s.flagCodes) } : null);
    editor.load(s.note);
    setBase({ rev: s.rev });
    setMode(then);
    // Start the opened note at its top: scroll the app's screen area, not the page.
    const area = document.querySelector(".notes-screen")?.closest(".screen");
    if (area) area.scrollTop = 0;
  };

  const ask = (list: ImportConflict[]) =>
    new Promise<Record<string, ConflictChoice> | null>((resolve) =>
      setConflicts({
        list,
        answer: (c) => {
          setConflicts(null);
          resolve(c);
        },
      }),
    );

  return (
    <>
    <View
      mode={mode()}
      units={units()}
      palette={palette()}
      presets={builtinTrains}
      profiles={profiles}
      editor={editor}
      busy={busy()}
      printedAt={printedAt()}
      onLanguage={(language) => app.settings.update({ language })}
      printedEarly={printedEarly() && !cardComplete(cardLoadTable(editor))}
      provenance={(note) => cardProvenance(note, builtinTrains, profiles, APP_VERSION)}
      conflicts={conflicts()?.list ?? null}
      onConflictsDone={(c) => conflicts()?.answer(c)}
      library={{
        ready: lib.ready(),
        failure: lib.failure(),
        rows: lib.rows(),
        checking: lib.checking(),
        problems: lib.problems(),
        reminder: lib.reminder(),
        persisted: lib.persisted(),
        notice: lib.notice(),
        busy: busy(),
        onDismissNotice: () => lib.setNotice(null),
        onImport: (file) => void task(async () => lib.importFile(file, file.name, ask)),
        onExportAll: () =>
          void task(async () => {
            const b = await lib.exportBundle();
            if (b) downloadBundle(b);
          }),
        onRestoreDemos: () => void task(() => lib.restoreDemos()),
        onRemove: (key) => void task(() => lib.remove(key)),
        onRemoveAll: () => void task(() => lib.removeAll()),
        onExportRaw: (p) =>
          void task(async () => {
            const text = await lib.rawText(p.rawKey);
            if (text !== undefined) download(text, `taut-damaged-record-${p.key.replace(/[^a-z0-9._-]+/gi, "_").slice(0, 60)}.json`, "application/json");
          }),
        onRescue: rescue,
      }}
      railml={{ imp: railml, onOpen: () => (lib.setNotice(null), setMode("railml")), onSave: saveRailml, onEdit: editRailml }}
      onOpen={(id) => openNote(id, "edit")}
      onCard={(id) => openNote(id, "card")}
      onNew={() => {
        lib.setNotice(null);
        editor.load(undefined);
        setBase("new");
        setMode("edit");
      }}
      onSave={() =>
        void task(async () => {
          const note = editor.toNote(takenIds());
          const r = await lib.save(note, base());
          if (!r.ok) {
            if (r.conflict) setSaveConflict({ conflict: r.conflict, note });
            // No issues and no conflict: the library was closed under the page (its notice says so; the edit is kept).
            else if (r.issues.length > 0) lib.setNotice({ kind: "problem", text: nt("nfNotSaved"), details: issueLines(r.issues) });
            return;
          }
          afterSaved(r.saved);
        })
      }
      onClose={() => {
        forget();
        setMode("library");
        void lib.refresh();
      }}
      onDelete={() =>
        void task(async () => {
          const s = editor.saved();
          if (!s) return;
          await lib.remove(s.id);
          forget();
          setMode("library");
        })
      }
      onExportNote={() =>
        void task(async () => {
          const s = editor.saved();
          if (!s) return;
          const b = await lib.exportBundle([s.id]);
          if (b) downloadBundle(b, `taut-note-${s.id}.json`);
        })
      }
      onEdit={() => setMode("edit")}
      onPrint={() => window.print()}
      onReview={(id) => {
        setReviewTarget(id);
        app.nav.go("start-review");
      }}
    />
    <Show when={saveConflict()}>{(c) => <SaveConflictDialog conflict={c().conflict} onChoose={(choice) => void task(() => settle(choice))} />}</Show>
    </>
  );
}

export default LocationNotesScreen;
