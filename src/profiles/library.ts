/**
 * A library of named profiles (locomotives, wagon types, location notes, rail conditions) that start
 * cases refer to by id. The CLI fills it from the profiles folder, the app from the built-in set and the
 * device's notes store.
 */
import type { AdhesionTable, LocomotiveSpec } from "../core/physics/types.js";
import type { WagonType } from "./convert.js";
import type { LocationNoteFile, LocomotiveFile } from "./schemas.js";

export interface Library {
  locomotives: ReadonlyMap<string, { spec: LocomotiveSpec; file: LocomotiveFile }>;
  wagons: ReadonlyMap<string, WagonType>;
  locations: ReadonlyMap<string, LocationNoteFile>;
  adhesion: AdhesionTable;
  /**
   * Start cases a departures file may name by id instead of by path (the built-in demo cases), as their raw
   * JSON: each row's overrides are applied to it before it is parsed, as to a case file.
   */
  cases?: ReadonlyMap<string, unknown>;
}

/** A library with extra location notes (e.g. the device's own) layered over another. */
export function withLocations(lib: Library, notes: Iterable<LocationNoteFile>): Library {
  const locations = new Map(lib.locations);
  for (const n of notes) locations.set(n.id, n);
  return { ...lib, locations };
}
