/** Shared helpers for the notes-store tests: a fresh database per test, a valid note to edit. */
import "fake-indexeddb/auto";
import { openDB } from "idb";
import { builtinLocations } from "../../src/profiles/builtin.js";
import type { LocationNoteFile } from "../../src/profiles/schemas.js";
import { openNotesStore, type NotesStore, type OpenOptions } from "../../src/notes/store.js";

let counter = 0;
/** A database name no other test uses. */
export const freshName = (): string => `taut-notes-test-${process.pid}-${++counter}`;

/** Open a store on a fresh database (no demo notes unless asked). */
export async function freshStore(opts: OpenOptions = {}): Promise<{ store: NotesStore; name: string }> {
  const name = opts.name ?? freshName();
  const store = await openNotesStore({ demos: [], ...opts, name });
  return { store, name };
}

/** A note of our own: two segments, a rising grade under the train. */
export function sampleNote(over: Partial<LocationNoteFile> = {}): LocationNoteFile {
  return {
    schema: "taut/location@1",
    id: "brackenfold-up-main",
    name: "Brackenfold, up main signal (test)",
    line: "Test line",
    direction: "Up",
    segments: [
      { from_m: 0, length_m: 800, gradient_permille: 4, curveRadius_m: 0 },
      { from_m: 800, length_m: 1200, gradient_permille: 9, curveRadius_m: 500 },
    ],
    frontAt_m: 1200,
    clearAhead_m: 500,
    hazards: [{ kind: "points", at_m: 1300, note: "Trailing points 100 m ahead." }],
    seasons: [{ season: "autumn", rail: "leaves" }],
    practice: "Hold on the locomotive brake while the train brake releases.",
    revisions: [{ date: "2026-03-01", initials: "JQ", change: "First survey." }],
    ...over,
  };
}

/** Write a raw value straight into the notes object store, bypassing every check (a damaged record). */
export async function writeRaw(name: string, value: unknown): Promise<void> {
  const db = await openDB(name);
  await db.put("notes", value);
  db.close();
}

export const demos = builtinLocations;
