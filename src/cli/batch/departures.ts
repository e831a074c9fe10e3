/**
 * A day's departures from a file (INTERFACE.md, `taut check`): the file and the case files a CSV names are
 * read from disk here; the rows are read by src/profiles/departures.ts (the same reader the app uses).
 * A row that cannot be read becomes a departure with an error naming its line (CSV) or index (JSON); the
 * others are read as usual. A file that cannot be read at all is bad input.
 */
import { readFileSync } from "node:fs";
import { dirname, extname, resolve } from "node:path";
import type { Library } from "../../profiles/library.js";
import { caseFileJson, departuresFromCsv, departuresFromJson, type Departure, type DeparturesRead } from "../../profiles/departures.js";
import { InputError } from "../errors.js";
import { readText } from "../files.js";

export type { Departure } from "../../profiles/departures.js";

/** Read departures from a CSV or JSON file (by extension; otherwise by the first character). */
export function readDepartures(path: string, lib: Library): Departure[] {
  const text = readText(path);
  const ext = extname(path).toLowerCase();
  const json = ext === ".json" || (ext !== ".csv" && /^\s*[[{]/.test(text));
  const dir = dirname(path);
  const read: DeparturesRead = json ? departuresFromJson(text, lib) : departuresFromCsv(text, (casePath) => readCaseFile(resolve(dir, casePath)), lib);
  if (!read.ok) throw new InputError(`${path}: ${read.message}`, read.issues);
  return read.departures;
}

/** A start-case file's JSON, or the error that stops it. */
function readCaseFile(path: string): unknown {
  let text: string;
  try {
    text = readFileSync(path, "utf8");
  } catch (e) {
    return new Error((e as NodeJS.ErrnoException).code === "ENOENT" ? "no such file" : `cannot be read (${(e as Error).message})`);
  }
  return caseFileJson(text);
}
