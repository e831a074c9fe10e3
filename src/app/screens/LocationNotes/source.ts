/**
 * The location pickers of the other screens (Start plan, Assistance check, Departures) list the
 * device's saved notes: this source reads them from the notes store. A demo note left as shipped is
 * marked built-in (the planner worker knows it); every other note is the device's own and is sent
 * with each plan request.
 */
import { builtinLocations } from "../../../profiles/builtin.js";
import { canonicalNote } from "../../../profiles/notes.js";
import { listNotesForPicker } from "../../../notes/index.js";
import type { NotesStore } from "../../../notes/store.js";
import { setLocationSource, type LocationChoice, type LocationSource } from "../../locations.js";

const shipped = new Map(builtinLocations.map((n) => [n.id, canonicalNote(n)]));

/** A picker source over the device's notes store (the shared store unless one is given). */
export function notesLocationSource(store?: NotesStore): LocationSource {
  return async (): Promise<LocationChoice[]> => {
    const list = await listNotesForPicker(store);
    return list.map((p) => ({
      id: p.id,
      name: p.detail ? `${p.name} — ${p.detail}` : p.name,
      note: p.note,
      origin: shipped.get(p.id) === canonicalNote(p.note) ? "builtin" : "device",
    }));
  };
}

let installed = false;

/** Point the app's location pickers at the device's notes (once). */
export function installNotesLocationSource(): void {
  if (installed) return;
  installed = true;
  setLocationSource(notesLocationSource());
}
