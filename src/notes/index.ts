/**
 * The notes library's public surface for the app: the device's store (opened once, demo notes added
 * on first open), the list the other screens' location pickers show, and the library layering that
 * lets a start case name a saved note by id.
 */
import { builtinLocations } from "../profiles/builtin.js";
import { withLocations, type Library } from "../profiles/library.js";
import type { LocationNoteFile } from "../profiles/schemas.js";
import { openNotesStore, type NotesStore } from "./store.js";

export * from "./store.js";
export * from "./records.js";
export * from "./merge.js";
export * from "./reminder.js";
export * from "../profiles/referenceTrain.js";
export { NOTES_DB_VERSION, migrateV1Record, type NoteRecordV1 } from "./migrations.js";

let shared: Promise<NotesStore> | undefined;
const closedListeners = new Set<(reason: "upgrade" | "terminated") => void>();

/** The device's notes store, opened on first use (with the demo notes on a new device). */
export function deviceNotesStore(): Promise<NotesStore> {
  shared ??= openNotesStore({ demos: builtinLocations, onClosed: (reason) => closedListeners.forEach((f) => f(reason)) }).catch((e: unknown) => {
    shared = undefined;
    throw e;
  });
  return shared;
}

/** Be told when the device's store is closed under the page (another tab upgrades the database); returns a way to stop. */
export function onDeviceNotesClosed(f: (reason: "upgrade" | "terminated") => void): () => void {
  closedListeners.add(f);
  return () => closedListeners.delete(f);
}

/** One saved note as a location picker shows it. */
export interface PickerNote {
  id: string;
  name: string;
  /** "line · direction", when the note gives them. */
  detail: string;
  illustrative: boolean;
  note: LocationNoteFile;
}

/**
 * The saved location notes for Start plan, Assistance check and Departures to offer as locations,
 * sorted by name. Damaged records are left out (the Location notes screen reports them).
 */
export async function listNotesForPicker(store?: NotesStore): Promise<PickerNote[]> {
  const s = store ?? (await deviceNotesStore());
  const { notes } = await s.list();
  return notes.map(({ note }) => ({
    id: note.id,
    name: note.name,
    detail: [note.line, note.direction].filter((x): x is string => Boolean(x)).join(" · "),
    illustrative: note.illustrative === true,
    note,
  }));
}

/** A library in which a start case can name any saved note (saved notes override built-in ones of the same id). */
export async function libraryWithSavedNotes(lib: Library, store?: NotesStore): Promise<Library> {
  const s = store ?? (await deviceNotesStore());
  const { notes } = await s.list();
  return withLocations(
    lib,
    notes.map((n) => n.note),
  );
}
