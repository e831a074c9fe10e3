/**
 * Where the Start plan's location picker gets its notes. Today: the built-in demo notes. The location
 * notes store (src/notes) replaces the source with `setLocationSource` when the app starts, so the
 * picker lists the device's saved notes. The chosen note is resolved into the case on the main thread
 * (src/profiles), so the planner worker needs nothing from the store.
 */
import { builtinLocations } from "../profiles/builtin.js";
import type { LocationNoteFile } from "../profiles/schemas.js";

export interface LocationChoice {
  id: string;
  name: string;
  note: LocationNoteFile;
  /** "builtin": shipped with the app; "device": saved on this device. */
  origin: "builtin" | "device";
}

export type LocationSource = () => Promise<readonly LocationChoice[]> | readonly LocationChoice[];

/** The built-in demo notes (illustrative). */
export const builtinLocationSource: LocationSource = () => builtinLocations.map((note) => ({ id: note.id, name: note.name, note, origin: "builtin" as const }));

let current: LocationSource = builtinLocationSource;
const listeners = new Set<() => void>();

/** Replace the picker's source (the notes store calls this once at start-up, and `notifyLocationsChanged` after edits). */
export function setLocationSource(source: LocationSource): void {
  current = source;
  notifyLocationsChanged();
}

/** The source in use. */
export function locationSource(): LocationSource {
  return current;
}

/** Tell open pickers to read the source again (after a note is saved, removed or imported). */
export function notifyLocationsChanged(): void {
  for (const f of listeners) f();
}

/** Subscribe to `notifyLocationsChanged`; returns the unsubscribe function. */
export function onLocationsChanged(f: () => void): () => void {
  listeners.add(f);
  return () => listeners.delete(f);
}
