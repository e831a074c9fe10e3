/**
 * One load-table job: a note's geometry and its reference train in, the table or the issues that stop
 * it out. Runs in the load-table worker, or on the calling thread where no Worker exists (tests).
 * Uses the built-in train presets and locomotive profiles, as the whole app does.
 */
import { loadTable, type LoadTableRow } from "../../../core/loadTable.js";
import type { FieldIssue } from "../../../profiles/issues.js";
import { builtinLibrary, builtinTrains } from "../../../profiles/builtin.js";
import type { LocationNoteFile, ReferenceTrainFile } from "../../../profiles/schemas.js";
import { referenceCase } from "../../../profiles/referenceTrain.js";
import type { Library } from "../../../profiles/library.js";

export type NoteGeometry = Pick<LocationNoteFile, "segments" | "frontAt_m" | "clearAhead_m" | "speedLimit_kmh">;

export type LoadTableOutcome = { ok: true; rows: LoadTableRow[]; elapsedMs: number } | { ok: false; issues: FieldIssue[] };

export interface LoadTableRequest {
  id: number;
  note: NoteGeometry;
  ref: ReferenceTrainFile;
}

export type LoadTableResponse = { id: number; outcome: LoadTableOutcome } | { id: number; error: string };

let lib: Library | undefined;

/** Work out the table (slow: every row is a mass search over the dynamics-verified planner). */
export function runLoadTableJob(note: NoteGeometry, ref: ReferenceTrainFile): LoadTableOutcome {
  lib ??= builtinLibrary();
  const c = referenceCase({ ...note, referenceTrain: ref }, builtinTrains, lib, ref);
  if (!c.ok) return { ok: false, issues: c.issues };
  const t0 = performance.now();
  const rows = loadTable(c.value);
  return { ok: true, rows, elapsedMs: performance.now() - t0 };
}
