/** Reading the user's files: JSON with clear errors, resolved against the profile library. */
import { readFileSync } from "node:fs";
import { builtinLibrary } from "../profiles/builtin.js";
import { fileKind, parseJsonText, parseLocationNote, parseStartCase } from "../profiles/parse.js";
import { withLocations, type Library } from "../profiles/library.js";
import type { StartCase } from "../core/train/types.js";
import { InputError } from "./errors.js";
import type { LocationNoteFile } from "../profiles/schemas.js";
import { readNotesText } from "../profiles/notes.js";
import { applyOverrides, type CaseOverrides } from "./caseOverrides.js";

/** Read a file as text; a missing or unreadable file is bad input. */
export function readText(path: string): string {
  try {
    return readFileSync(path, "utf8");
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    throw new InputError(code === "ENOENT" ? `${path}: no such file` : `${path}: cannot be read (${code ?? (e as Error).message})`);
  }
}

/** Read and parse a JSON file. */
export function readJson(path: string): unknown {
  const r = parseJsonText(readText(path));
  if (!r.ok) throw new InputError(`${path}: not a valid file`, r.issues);
  return r.value;
}

/** The library: built-in profiles plus any location notes the caller adds. */
export function library(extraNotes: LocationNoteFile[] = []): Library {
  return withLocations(builtinLibrary(), extraNotes);
}

/** Read and parse JSON text from a named source (a file, or standard input). */
export function parseJsonFrom(name: string, text: string): unknown {
  const r = parseJsonText(text);
  if (!r.ok) throw new InputError(`${name}: not a valid file`, r.issues);
  return r.value;
}

/**
 * Read a start case and resolve it into the core's form; `location` (a note id) replaces the case's
 * location and `case` holds the command line's overrides (rail, sand, mass, grade). `text` gives the
 * case's text when it does not come from `path` (standard input, named "-").
 */
export function readStartCase(
  path: string,
  lib: Library,
  overrides: { location?: string; case?: CaseOverrides } = {},
  text?: string,
): { c: StartCase; raw: Record<string, unknown> } {
  const name = path === "-" ? "standard input" : path;
  let raw = text !== undefined ? parseJsonFrom(name, text) : readJson(path);
  const kind = fileKind(raw);
  if (kind !== undefined && kind !== "taut/start-case@1") throw new InputError(`${name}: this is a ${kind} file; a start case (taut/start-case@1) is needed here`);
  if (overrides.location !== undefined && raw && typeof raw === "object" && !Array.isArray(raw)) raw = { ...(raw as Record<string, unknown>), location: overrides.location };
  if (overrides.case) raw = applyOverrides(raw, overrides.case, (id) => lib.locations.get(id));
  const r = parseStartCase(raw, lib);
  if (!r.ok) throw new InputError(`${name}: the start case is not valid`, r.issues);
  return { c: r.value, raw: raw as Record<string, unknown> };
}

/** Read a location note file. */
export function readLocationNote(path: string): LocationNoteFile {
  const raw = readJson(path);
  const r = parseLocationNote(raw);
  if (!r.ok) throw new InputError(`${path}: the location note is not valid`, r.issues);
  return r.value;
}

/**
 * Read location notes from files, each a single note (taut/location@1) or a bundle
 * (taut/notes-bundle@1); a note id given twice across files is bad input.
 */
export function readNotesFiles(paths: readonly string[]): LocationNoteFile[] {
  const notes: LocationNoteFile[] = [];
  const from = new Map<string, string>();
  for (const path of paths) {
    const r = readNotesText(readText(path));
    if (!r.ok) throw new InputError(`${path}: ${r.message.replace(/ Nothing was changed\.$/, "")}`, r.issues);
    for (const n of r.notes) {
      const earlier = from.get(n.id);
      if (earlier !== undefined) throw new InputError(`${path}: the location note "${n.id}" is also in ${earlier}; give each note once`);
      from.set(n.id, path);
      notes.push(n);
    }
  }
  return notes;
}
