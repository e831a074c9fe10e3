/**
 * A day's departures from a file (INTERFACE.md, `taut check`): a CSV with columns `id,case,rail,sand`
 * (optional `location`: a location note id) where `case` is a start-case file relative to the CSV and
 * `rail`/`sand` override its conditions; or a JSON array of start cases, each with an optional `id`.
 * A row that cannot be read becomes a departure with an error naming its line (CSV) or index (JSON); the
 * others are read as usual. A file that cannot be read at all is bad input.
 */
import { readFileSync } from "node:fs";
import { dirname, extname, resolve } from "node:path";
import { RAIL_CONDITIONS, type RailCondition, type StartCase } from "../../core/types.js";
import { formatIssues, type FieldIssue } from "../../profiles/issues.js";
import type { Library } from "../../profiles/library.js";
import { fileKind, parseJsonText, parseStartCase } from "../../profiles/parse.js";
import { parseCsv } from "../csvParse.js";
import { InputError } from "../errors.js";
import { readText } from "../files.js";

export interface Departure {
  /** The row's id (from the file, or made from its place when it has none). */
  id: string;
  /** Where in the file: "line 4" (CSV, 1-based, the header is line 1) or "[3]" (JSON array index, 0-based). */
  where: string;
  line?: number;
  index?: number;
  /** The resolved case, when the row is good. */
  case?: StartCase;
  /** What is wrong with the row, when it is not. */
  error?: string;
}

/** Read departures from a CSV or JSON file (by extension; otherwise by the first character). */
export function readDepartures(path: string, lib: Library): Departure[] {
  const text = readText(path);
  const ext = extname(path).toLowerCase();
  const json = ext === ".json" || (ext !== ".csv" && /^\s*[[{]/.test(text));
  return json ? jsonDepartures(path, text, lib) : csvDepartures(path, text, lib);
}

function jsonDepartures(path: string, text: string, lib: Library): Departure[] {
  const parsed = parseJsonText(text);
  if (!parsed.ok) throw new InputError(`${path}: not a valid file`, parsed.issues);
  if (!Array.isArray(parsed.value)) throw new InputError(`${path}: a departures file in JSON is a list of start cases ([ {...}, {...} ])`);
  return parsed.value.map((item, index): Departure => {
    const rawId = item && typeof item === "object" && typeof (item as { id?: unknown }).id === "string" ? (item as { id: string }).id : undefined;
    const base = { id: rawId ?? `[${index}]`, where: `[${index}]`, index };
    const r = parseStartCase(item, lib);
    if (!r.ok) return { ...base, error: `[${index}]${rawId ? ` (${rawId})` : ""}: ${oneLine(r.issues)}` };
    return { ...base, case: r.value };
  });
}

const SAND_WORDS: Record<string, boolean> = { true: true, yes: true, y: true, "1": true, false: false, no: false, n: false, "0": false };

function csvDepartures(path: string, text: string, lib: Library): Departure[] {
  let records;
  try {
    records = parseCsv(text);
  } catch (e) {
    throw new InputError(`${path}: ${(e as Error).message}`);
  }
  const header = records.shift();
  if (!header) throw new InputError(`${path}: the file is empty (a header line "id,case,rail,sand" is needed)`);
  const col = new Map(header.fields.map((h, k) => [h.trim().toLowerCase(), k]));
  if (!col.has("case")) throw new InputError(`${path}: line ${header.line}: the header must name the columns id,case,rail,sand (no "case" column in "${header.fields.join(",")}")`);
  const dir = dirname(path);
  const files = new Map<string, unknown>();
  const cell = (fields: string[], name: string): string => {
    const k = col.get(name);
    return k === undefined ? "" : (fields[k] ?? "").trim();
  };
  return records.map(({ line, fields }): Departure => {
    const id = cell(fields, "id") || `line ${line}`;
    const base = { id, where: `line ${line}`, line };
    const fail = (message: string): Departure => ({ ...base, error: `line ${line}: ${message}` });
    const casePath = cell(fields, "case");
    if (casePath === "") return fail("case: a start-case file is needed");
    const rail = cell(fields, "rail").toLowerCase();
    if (rail !== "" && !(RAIL_CONDITIONS as readonly string[]).includes(rail)) return fail(`rail: must be one of ${RAIL_CONDITIONS.join(", ")} (got "${rail}")`);
    const sandWord = cell(fields, "sand").toLowerCase();
    if (sandWord !== "" && SAND_WORDS[sandWord] === undefined) return fail(`sand: must be yes or no (true/false, 1/0) (got "${sandWord}")`);
    const location = cell(fields, "location");
    const full = resolve(dir, casePath);
    let raw = files.get(full);
    if (raw === undefined) {
      raw = readCaseFile(full);
      files.set(full, raw);
    }
    if (raw instanceof Error) return fail(`${casePath}: ${raw.message}`);
    const data = structuredClone(raw) as Record<string, unknown>;
    const conditions = (data.conditions && typeof data.conditions === "object" ? data.conditions : {}) as Record<string, unknown>;
    if (rail !== "") conditions.rail = rail as RailCondition;
    if (sandWord !== "") conditions.sand = SAND_WORDS[sandWord];
    data.conditions = conditions;
    if (location !== "") data.location = location;
    const r = parseStartCase(data, lib);
    if (!r.ok) return fail(`${casePath}: ${oneLine(r.issues)}`);
    return { ...base, case: r.value };
  });
}

/** A start-case file's JSON, or the error that stops it. */
function readCaseFile(path: string): unknown {
  let text: string;
  try {
    text = readFileSync(path, "utf8");
  } catch (e) {
    return new Error((e as NodeJS.ErrnoException).code === "ENOENT" ? "no such file" : `cannot be read (${(e as Error).message})`);
  }
  const parsed = parseJsonText(text);
  if (!parsed.ok) return new Error(oneLine(parsed.issues));
  const kind = fileKind(parsed.value);
  if (kind !== undefined && kind !== "taut/start-case@1") return new Error(`this is a ${kind} file; a start case (taut/start-case@1) is needed`);
  return parsed.value;
}

function oneLine(issues: readonly FieldIssue[]): string {
  return formatIssues(issues).split("\n").join("; ");
}
