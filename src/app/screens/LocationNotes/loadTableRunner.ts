/**
 * The note's load table, behind one asynchronous function: the reference train is placed on the note's
 * profile here (src/profiles, already on the page for the editor), and the rows are worked out by the
 * planner worker's `loadTable` request — the core's load table, each row a mass search over the
 * dynamics-verified planner (seconds in all). Tables are cached per geometry and train; an abort (each
 * edit) stops a running one, and progress comes as the rows are found.
 */
import type { LoadTableRow } from "../../../core/dispatch/loadTable.js";
import { builtinLibrary, builtinTrains } from "../../../profiles/builtin.js";
import type { FieldIssue } from "../../../profiles/issues.js";
import type { Library } from "../../../profiles/library.js";
import { referenceCase } from "../../../profiles/referenceTrain.js";
import type { LocationNoteFile, ReferenceTrainFile } from "../../../profiles/schemas.js";
import type { PlannerCalls } from "../../../worker/client.js";

export type NoteGeometry = Pick<LocationNoteFile, "segments" | "frontAt_m" | "clearAhead_m" | "speedLimit_kmh">;

export type LoadTableOutcome = { ok: true; rows: LoadTableRow[]; elapsedMs: number } | { ok: false; issues: FieldIssue[] };

/** How the editor asks for a table: the note's geometry and reference train; an abort signal; progress 0..1. */
export type ComputeLoadTable = (note: NoteGeometry, ref: ReferenceTrainFile, signal?: AbortSignal, onProgress?: (fraction: number) => void) => Promise<LoadTableOutcome>;

const cache = new Map<string, LoadTableOutcome>();
let lib: Library | undefined;

/** The key a table is cached under: everything that changes it. */
export function loadTableKey(note: NoteGeometry, ref: ReferenceTrainFile): string {
  return JSON.stringify([note.segments, note.frontAt_m, note.clearAhead_m, note.speedLimit_kmh ?? null, ref]);
}

/** Largest startable trailing mass per rail condition, without and with sand, for a note and its reference train. */
export async function computeNoteLoadTable(
  note: NoteGeometry,
  ref: ReferenceTrainFile,
  workers: Pick<PlannerCalls, "loadTable">,
  opts: { signal?: AbortSignal; onProgress?: (fraction: number) => void } = {},
): Promise<LoadTableOutcome> {
  const key = loadTableKey(note, ref);
  const hit = cache.get(key);
  if (hit) return hit;
  lib ??= builtinLibrary();
  const c = referenceCase({ ...note, referenceTrain: ref }, builtinTrains, lib, ref);
  if (!c.ok) return { ok: false, issues: c.issues };
  const out = await workers.loadTable(c.value, { ...(opts.signal ? { signal: opts.signal } : {}), ...(opts.onProgress ? { onProgress: opts.onProgress } : {}) });
  const outcome: LoadTableOutcome = out.ok ? { ok: true, rows: out.result, elapsedMs: out.elapsedMs } : { ok: false, issues: out.issues.length > 0 ? out.issues : [{ path: "", message: out.message }] };
  if (outcome.ok) cache.set(key, outcome);
  return outcome;
}

/** The editor's table function over the given workers (the app's planner pool). */
export function noteLoadTableOn(workers: Pick<PlannerCalls, "loadTable">): ComputeLoadTable {
  return (note, ref, signal, onProgress) => computeNoteLoadTable(note, ref, workers, { ...(signal ? { signal } : {}), ...(onProgress ? { onProgress } : {}) });
}
