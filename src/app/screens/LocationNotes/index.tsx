/**
 * Location notes (wiring): the device's notes store, the editor, the card and printing, import and
 * export, connected to the app's settings (units), theme (chart palette) and the location pickers of the
 * other screens. The view is `View.tsx`.
 */
import { createMemo, createSignal, onCleanup, type JSX } from "solid-js";
import { builtinLibrary, builtinTrains } from "../../../profiles/builtin.js";
import type { ConflictChoice, ImportConflict } from "../../../notes/merge.js";
import { deviceNotesStore } from "../../../notes/index.js";
import { cardProvenance, noteFigureInputs } from "../../../profiles/provenance.js";
import { PALETTES } from "../../charts/palette.js";
import { useApp } from "../../context.js";
import { notifyLocationsChanged } from "../../locations.js";
import { read, safeLocalStorage, write } from "../../state/createSettings.js";
import { declarePrintStatus, printStamp } from "../../state/printStatus.js";
import { APP_VERSION } from "../../version.js";
import { cardComplete } from "./Card.js";
import { createNoteEditor } from "./createNoteEditor.js";
import { createNotesLibrary, downloadBundle } from "./createNotesLibrary.js";
import { noteLoadTableOn } from "./loadTableRunner.js";
import { installNotesLocationSource } from "./source.js";
import { cardLoadTable, View, type Mode } from "./View.js";
import { railmlNote } from "../../../profiles/railml/note.js";
import type { Stretch } from "../../../profiles/railml/stretch.js";
import { createRailmlImporter } from "./railml/client.js";
import { createRailmlImport } from "./railml/createRailmlImport.js";
import { idFromName, today } from "./draft.js";

/** Where the editor remembers the trainer's initials between revisions. */
export const INITIALS_KEY = "taut.notes.initials";

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

  const lib = createNotesLibrary({ openStore: deviceNotesStore, changed: notifyLocationsChanged });
  const editor = createNoteEditor({
    units,
    presets: builtinTrains,
    library: () => profiles,
    initials,
    active: () => mode() !== "library",
    computeLoadTable: noteLoadTableOn(app.pool),
  });
  const takenIds = createMemo(() => new Set(lib.notes().map((n) => n.note.id)));

  // Import from railML: the file is read and the stretch made in a worker; saving goes through the
  // notes store like any note (the schema checks it), or the editor opens with it first.
  const railml = createRailmlImport({ importer: () => createRailmlImporter() });
  const railmlDirection = () => `${railml.choice.direction} (railML dir="${railml.choice.direction}" on the front's track)`;
  const saveRailml = (s: Stretch) =>
    void task(async () => {
      const name = railml.choice.name.trim();
      const n = railmlNote(s, {
        id: idFromName(name, takenIds()),
        name,
        direction: railmlDirection(),
        date: today(),
        initials: initials().trim().slice(0, 8) || "railML",
        source: railml.fileName(),
        hazards: true,
        ...(builtinTrains[0] ? { referenceTrain: { train: builtinTrains[0].id } } : {}),
      });
      if (!n.ok) {
        lib.setNotice({ kind: "problem", text: "The stretch does not make a valid note; nothing was saved.", details: n.issues.map((i) => `${i.path}: ${i.message}`) });
        return;
      }
      const r = await lib.save(n.value);
      if (!r.ok) {
        lib.setNotice({ kind: "problem", text: "The note was not saved.", details: r.issues.map((i) => `${i.path}: ${i.message}`) });
        return;
      }
      lib.setNotice({ kind: "done", text: `Saved "${name}" from railML.` });
      editor.load(r.saved.note);
      setMode("edit");
    });
  const editRailml = (s: Stretch) => {
    lib.setNotice(null);
    editor.load(undefined);
    editor.set({
      name: railml.choice.name.trim(),
      direction: railmlDirection(),
      standing: `Front at ${s.frontWords} (from railML).`.slice(0, 400),
      segments: s.segments.map((g) => ({ ...g })),
      frontAt_m: s.frontAt_m,
      clearAhead_m: s.aheadM,
      speedLimit_kmh: s.speedLimit_kmh ?? Number.NaN,
      hazards: s.hazards.map((h) => ({ kind: h.kind, at_m: h.at_m, note: h.note.slice(0, 400) })),
    });
    editor.set("revision", "change", `Imported from railML (${railml.fileName()}).`.slice(0, 400));
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
    waitingFor: "the load table",
    inputs: mode() === "library" ? null : noteFigureInputs(editor.draft, builtinTrains, profiles, APP_VERSION, editor.draft.referenceTrain),
  }));

  const task = async (f: () => Promise<void>) => {
    setBusy(true);
    try {
      await f();
    } catch (e) {
      lib.setNotice({ kind: "problem", text: `Something went wrong: ${(e as Error).message || String(e)}` });
    } finally {
      setBusy(false);
    }
  };

  const openNote = (id: string, then: Mode) => {
    const s = lib.notes().find((n) => n.note.id === id);
    if (!s) return;
    lib.setNotice(null);
    editor.load(s.note);
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
    <View
      mode={mode()}
      units={units()}
      palette={palette()}
      presets={builtinTrains}
      profiles={profiles}
      editor={editor}
      busy={busy()}
      printedAt={printedAt()}
      printedEarly={printedEarly() && !cardComplete(cardLoadTable(editor))}
      provenance={(note) => cardProvenance(note, builtinTrains, profiles, APP_VERSION)}
      conflicts={conflicts()?.list ?? null}
      onConflictsDone={(c) => conflicts()?.answer(c)}
      library={{
        ready: lib.ready(),
        failure: lib.failure(),
        notes: lib.notes(),
        problems: lib.problems(),
        reminder: lib.reminder(),
        persisted: lib.persisted(),
        notice: lib.notice(),
        busy: busy(),
        onDismissNotice: () => lib.setNotice(null),
        onImport: (file) => void task(async () => lib.importText(await file.text(), file.name, ask)),
        onExportAll: () =>
          void task(async () => {
            const b = await lib.exportBundle();
            if (b) downloadBundle(b);
          }),
        onRestoreDemos: () => void task(() => lib.restoreDemos()),
        onRemove: (id) => void task(() => lib.remove(id)),
        onRemoveAll: () => void task(() => lib.removeAll()),
      }}
      railml={{ imp: railml, onOpen: () => (lib.setNotice(null), setMode("railml")), onSave: saveRailml, onEdit: editRailml }}
      onOpen={(id) => openNote(id, "edit")}
      onCard={(id) => openNote(id, "card")}
      onNew={() => {
        lib.setNotice(null);
        editor.load(undefined);
        setMode("edit");
      }}
      onSave={() =>
        void task(async () => {
          const note = editor.toNote(takenIds());
          const r = await lib.save(note);
          if (!r.ok) {
            lib.setNotice({ kind: "problem", text: "The note was not saved.", details: r.issues.map((i) => `${i.path}: ${i.message}`) });
            return;
          }
          const ini = editor.draft.revision.initials.trim();
          if (ini) {
            setInitials(ini);
            write(storage, INITIALS_KEY, ini);
          }
          editor.load(r.saved.note);
        })
      }
      onClose={() => {
        setMode("library");
        void lib.refresh();
      }}
      onDelete={() =>
        void task(async () => {
          const s = editor.saved();
          if (!s) return;
          await lib.remove(s.id);
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
    />
  );
}

export default LocationNotesScreen;
