/**
 * Reading the user's files: JSON with clear errors, resolved against the profile library. Only regular
 * files are read (a named pipe would wait for ever, a device never ends), and no error shows what a file
 * holds: a path given by mistake may name a file that is nobody's business.
 */
import { closeSync, constants, fstatSync, openSync, readFileSync, readSync } from "node:fs";
import { isatty } from "node:tty";
import { errorWords } from "./errors.js";
import { builtinLibrary } from "../profiles/builtin.js";
import { fileKind, kindText, parseJsonText, parseLocationNote, parseStartCase } from "../profiles/parse.js";
import { withLocations, type Library } from "../profiles/library.js";
import { printable } from "../profiles/text.js";
import { planWorkProblem } from "../core/planner/workCap.js";
import type { StartCase } from "../core/train/types.js";
import { InputError } from "./errors.js";
import { cliFieldWords, cliTr } from "./lang.js";
import { readerText } from "../i18n/renderReaders.js";
import type { LocationNoteFile } from "../profiles/schemas.js";
import { readNotesText } from "../profiles/notes.js";
import { readerIssue } from "../profiles/readerIssues.js";
import { applyOverrides, type CaseOverrides } from "./caseOverrides.js";
import { fileProblemText, type FileProblem, type NotAFileKind } from "../i18n/renderFiles.js";

/** The largest file read, bytes: a bundle of every note of a large network is some tens of megabytes. */
export const MAX_INPUT_BYTES = 256 * 1024 * 1024;

/** What a file that is not a regular file is. */
function kindOfFile(st: ReturnType<typeof fstatSync>): NotAFileKind {
  if (st.isDirectory()) return "folder";
  if (st.isFIFO()) return "pipe";
  if (st.isCharacterDevice() || st.isBlockDevice()) return "device";
  if (st.isSocket()) return "socket";
  return "other";
}

/** Why a file cannot be read: as a code (`problem`) and in this run's language (`why`). */
export type FileRefusal = { ok: false; problem: FileProblem; why: string };

function refusal(problem: FileProblem): FileRefusal {
  return { ok: false, problem, why: fileProblemText(cliTr(), problem) };
}

/**
 * Open a regular file for reading, or say why not (in words that never quote the file). The file is opened
 * without blocking and checked on the open handle, so a named pipe is refused, not waited on, and nothing
 * can swap the file between the check and the read. The caller closes the descriptor. `jsonOrCsv`: the
 * file is to be a JSON or CSV file (said when it is not a file at all).
 */
export function openRegularFile(path: string, jsonOrCsv = false): { ok: true; fd: number; size: number } | FileRefusal {
  let fd: number;
  try {
    fd = openSync(path, constants.O_RDONLY | (constants.O_NONBLOCK ?? 0));
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    if (code === "ENOENT" || code === "ENOTDIR") return refusal({ code: "noSuchFile" });
    if (code === "EACCES" || code === "EPERM") return refusal({ code: "noPermission" });
    return refusal({ code: "cannotRead", errno: code ?? "error" });
  }
  try {
    const st = fstatSync(fd);
    if (!st.isFile()) {
      closeSync(fd);
      return refusal({ code: "notAFile", kind: kindOfFile(st), ...(jsonOrCsv ? { jsonOrCsv } : {}) });
    }
    return { ok: true, fd, size: st.size };
  } catch (e) {
    closeSync(fd);
    return refusal({ code: "cannotRead", errno: (e as NodeJS.ErrnoException).code ?? "error" });
  }
}

/** A regular file's text, or why it cannot be read (in words that never quote the file). */
export function readRegularFile(path: string): { ok: true; text: string } | FileRefusal {
  const opened = openRegularFile(path, true);
  if (!opened.ok) return opened;
  const fd = opened.fd;
  const maxMB = MAX_INPUT_BYTES / 1048576;
  try {
    if (opened.size > MAX_INPUT_BYTES) return refusal({ code: "tooLarge", sizeMB: Math.round(opened.size / 1048576), maxMB });
    const bytes = readFileSync(fd);
    if (bytes.length > MAX_INPUT_BYTES) return refusal({ code: "holdsMore", maxMB });
    return { ok: true, text: bytes.toString("utf8") };
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    return refusal(code === "EISDIR" ? { code: "isFolder" } : { code: "cannotRead", errno: code ?? "error" });
  } finally {
    closeSync(fd);
  }
}

/** A path as messages show it: anything unsafe in it escaped. */
export function pathText(path: string): string {
  return printable(path);
}

/**
 * All of standard input as text, within the size a file may have. A device that never ends (standard
 * input redirected from /dev/zero) is refused at once; a terminal is read until the end of input.
 */
export function readStandardInput(): string {
  const st = fstatSync(0);
  if ((st.isCharacterDevice() || st.isBlockDevice()) && !isatty(0)) throw new InputError(errorWords()("stdinDevice"));
  const chunks: Buffer[] = [];
  let total = 0;
  const buf = Buffer.alloc(1 << 16);
  for (;;) {
    let n: number;
    try {
      n = readSync(0, buf, 0, buf.length, null);
    } catch (e) {
      if ((e as NodeJS.ErrnoException).code === "EAGAIN") continue;
      if ((e as NodeJS.ErrnoException).code === "EOF") break;
      throw new InputError(errorWords()("stdinCannotRead", { code: (e as NodeJS.ErrnoException).code ?? "error" }));
    }
    if (n === 0) break;
    total += n;
    if (total > MAX_INPUT_BYTES) throw new InputError(errorWords()("stdinTooLarge", { max: String(MAX_INPUT_BYTES / 1048576) }));
    chunks.push(Buffer.from(buf.subarray(0, n)));
  }
  return Buffer.concat(chunks).toString("utf8");
}

/** Read a file as text; a missing, unreadable or irregular file is bad input. */
export function readText(path: string): string {
  const r = readRegularFile(path);
  if (!r.ok) throw new InputError(`${pathText(path)}: ${r.why}`);
  return r.text;
}

/** Read and parse a JSON file. */
export function readJson(path: string): unknown {
  const r = parseJsonText(readText(path));
  if (!r.ok) throw new InputError(cliFieldWords()("notValidFile", { name: pathText(path) }), r.issues);
  return r.value;
}

/** The library: built-in profiles plus any location notes the caller adds. */
export function library(extraNotes: LocationNoteFile[] = []): Library {
  return withLocations(builtinLibrary(), extraNotes);
}

/** Read and parse JSON text from a named source (a file, or standard input). */
export function parseJsonFrom(name: string, text: string): unknown {
  const r = parseJsonText(text);
  if (!r.ok) throw new InputError(cliFieldWords()("notValidFile", { name }), r.issues);
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
  const name = path === "-" ? errorWords()("standardInput") : pathText(path);
  let raw = text !== undefined ? parseJsonFrom(name, text) : readJson(path);
  const kind = fileKind(raw);
  if (kind !== undefined && kind !== "taut/start-case@1") throw new InputError(errorWords()("notStartCase", { name, kind: kindText(kind) }));
  if (overrides.location !== undefined && raw && typeof raw === "object" && !Array.isArray(raw)) raw = { ...(raw as Record<string, unknown>), location: overrides.location };
  if (overrides.case) raw = applyOverrides(raw, overrides.case, (id) => lib.locations.get(id), wagonTypeOf(lib));
  const r = parseStartCase(raw, lib);
  if (!r.ok) throw new InputError(cliFieldWords()("caseNotValid", { name }), r.issues);
  checkWork(r.value, cliFieldWords()("caseNotValid", { name }));
  return { c: r.value, raw: raw as Record<string, unknown> };
}

/** A wagon type's tare and length in file units, for the overrides of a mixed train. */
export function wagonTypeOf(lib: Library): (id: string) => { tare_t: number; length_m: number } | undefined {
  return (id) => {
    const w = lib.wagons.get(id);
    return w ? { tare_t: w.tareKg / 1000, length_m: w.lengthM } : undefined;
  };
}

/** Read a location note file. */
export function readLocationNote(path: string): LocationNoteFile {
  const raw = readJson(path);
  const r = parseLocationNote(raw);
  if (!r.ok) throw new InputError(cliFieldWords()("noteNotValid", { name: pathText(path) }), r.issues);
  return r.value;
}

/**
 * Read location notes from files, each a single note (taut/location@1) or a bundle
 * (taut/notes-bundle@2); a note id given twice across files is bad input.
 */
export function readNotesFiles(paths: readonly string[]): LocationNoteFile[] {
  const notes: LocationNoteFile[] = [];
  const from = new Map<string, string>();
  for (const path of paths) {
    const r = readNotesText(readText(path));
    if (!r.ok) throw new InputError(`${pathText(path)}: ${readerText(cliTr(), r.headline)}`, r.issues);
    for (const n of r.notes) {
      const earlier = from.get(n.id);
      if (earlier !== undefined) throw new InputError(errorWords()("noteTwice", { file: pathText(path), id: `"${n.id}"`, earlier: pathText(earlier) }));
      from.set(n.id, path);
      notes.push(n);
    }
  }
  return notes;
}

/** Refuse a case whose plan would take more work than a plan may (src/core/planner/workCap.ts). */
export function checkWork(c: StartCase, headline: string): void {
  const problem = planWorkProblem(c);
  if (problem) throw new InputError(headline, [readerIssue("train", problem)]);
}
