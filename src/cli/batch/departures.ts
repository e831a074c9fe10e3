/**
 * A day's departures from a file (INTERFACE.md, `taut check`): the file and the case files a CSV names are
 * read from disk here; the rows are read by src/profiles/departures.ts (the same reader the app uses).
 * A row that cannot be read becomes a departure with an error naming its line (CSV) or index (JSON); the
 * others are read as usual. A file that cannot be read at all is bad input.
 *
 * The case files a CSV names are read from the CSV's folder and the folders below it, unless the caller
 * allows more: a departures file from someone else must not be able to read any file on this machine
 * ("../../etc/passwd"). Symbolic links are followed before the check, so a link cannot lead out either.
 */
import { realpathSync } from "node:fs";
import { dirname, extname, isAbsolute, relative, resolve, sep } from "node:path";
import type { Library } from "../../profiles/library.js";
import { CaseFileError, CaseFileUnreadable, caseFileJson, departuresFromCsv, departuresFromJson, type Departure, type DeparturesRead } from "../../profiles/departures.js";
import { planWorkProblem } from "../../core/planner/workCap.js";
import { readerIssue } from "../../profiles/readerIssues.js";
import { readerText } from "../../i18n/renderReaders.js";
import { cliTr } from "../lang.js";
import { InputError } from "../errors.js";
import { pathText, readRegularFile, readText } from "../files.js";

export type { Departure } from "../../profiles/departures.js";

export interface ReadDeparturesOptions {
  /** Read case files outside the CSV's folder too (`taut check --allow-outside`). */
  allowOutside?: boolean;
}

/** Read departures from a CSV or JSON file (by extension; otherwise by the first character). */
export function readDepartures(path: string, lib: Library, opts: ReadDeparturesOptions = {}): Departure[] {
  const text = readText(path);
  const ext = extname(path).toLowerCase();
  const json = ext === ".json" || (ext !== ".csv" && /^\ufeff?\s*[[{]/.test(text));
  const dir = dirname(path);
  const read: DeparturesRead = json
    ? departuresFromJson(text, lib)
    : departuresFromCsv(text, (casePath) => readCaseFile(resolve(dir, casePath), opts.allowOutside ? undefined : dir), lib);
  if (!read.ok) throw new InputError(`${pathText(path)}: ${readerText(cliTr(), read.headline)}`, read.issues);
  return read.departures.map(withinWorkCap);
}

/** A departure whose plan would take more work than a plan may becomes a row with that error. */
function withinWorkCap(d: Departure): Departure {
  if (!d.case) return d;
  const problem = planWorkProblem(d.case);
  if (!problem) return d;
  const { case: _dropped, ...rest } = d;
  const issue = readerIssue("train", problem);
  const at = d.line !== undefined ? { line: d.line } : { index: d.index ?? 0 };
  return { ...rest, error: `${d.where}: train: ${issue.message}`, problem: { ...at, parts: [{ prefix: "train: ", issue }] } };
}

/** Whether `path` is `folder` itself or below it. */
export function isInside(folder: string, path: string): boolean {
  const rel = relative(folder, path);
  return rel === "" || (rel !== ".." && !rel.startsWith(`..${sep}`) && !isAbsolute(rel));
}

/** The real path (symbolic links followed), or the path as given when it does not exist. */
function real(path: string): string {
  try {
    return realpathSync(path);
  } catch {
    return resolve(path);
  }
}

/** A start-case file's JSON, or the error that stops it; with `folder`, only files inside it are read. */
function readCaseFile(path: string, folder: string | undefined): unknown {
  if (folder !== undefined && !isInside(real(folder), real(path))) {
    return new CaseFileError([readerIssue("", { code: "caseOutside", figures: { folder: pathText(resolve(folder)) } })]);
  }
  const r = readRegularFile(path);
  if (!r.ok) return new CaseFileUnreadable(r.problem);
  return caseFileJson(r.text);
}
