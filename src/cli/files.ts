/** Reading the user's files: JSON with clear errors, resolved against the profile library. */
import { readFileSync } from "node:fs";
import { builtinLibrary } from "../profiles/builtin.js";
import { fileKind, parseJsonText, parseLocationNote, parseStartCase } from "../profiles/parse.js";
import { withLocations, type Library } from "../profiles/library.js";
import type { StartCase } from "../core/types.js";
import { InputError } from "./errors.js";
import type { LocationNoteFile } from "../profiles/schemas.js";

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

/** Read a start case and resolve it into the core's form. */
export function readStartCase(path: string, lib: Library): { c: StartCase; raw: Record<string, unknown> } {
  const raw = readJson(path);
  const kind = fileKind(raw);
  if (kind !== undefined && kind !== "taut/start-case@1") throw new InputError(`${path}: this is a ${kind} file; a start case (taut/start-case@1) is needed here`);
  const r = parseStartCase(raw, lib);
  if (!r.ok) throw new InputError(`${path}: the start case is not valid`, r.issues);
  return { c: r.value, raw: raw as Record<string, unknown> };
}

/** Read a location note file. */
export function readLocationNote(path: string): LocationNoteFile {
  const raw = readJson(path);
  const r = parseLocationNote(raw);
  if (!r.ok) throw new InputError(`${path}: the location note is not valid`, r.issues);
  return r.value;
}
