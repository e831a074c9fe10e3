/**
 * A day's departures from a file (INTERFACE.md, `taut check`), without I/O, for the command line and the
 * app alike: a CSV with columns `id,case,rail,sand` (optional `location`: a location note id) where `case`
 * names a start-case file and `rail`/`sand` override its conditions; or a JSON array of start cases, each
 * with an optional `id`. A row that cannot be read becomes a departure with an error naming its line (CSV)
 * or index (JSON); the others are read as usual. A file that cannot be read at all gets a message.
 * The caller reads the case files a CSV names (from disk, or from files the user picked).
 */
import { RAIL_CONDITIONS, type RailCondition } from "../core/physics/types.js";
import type { StartCase } from "../core/train/types.js";
import { parseCsv } from "./csv.js";
import { formatIssues, type FieldIssue } from "./issues.js";
import type { Library } from "./library.js";
import { fileKind, kindText, parseJsonText, parseStartCase } from "./parse.js";
import { printable, quoted } from "./text.js";

export interface Departure {
  /** The row's id (from the file, or made from its place when it has none). */
  id: string;
  /** Where in the file: "line 4" (CSV, 1-based, the header is line 1) or "[3]" (JSON array index, 0-based). */
  where: string;
  line?: number;
  index?: number;
  /** The resolved case, when the row is good. */
  case?: StartCase;
  /** The row's start case as a file (taut/start-case@1, the row's overrides written in), when the row is good: to open it elsewhere. */
  file?: unknown;
  /** What is wrong with the row, when it is not. */
  error?: string;
}

/** The departures of a file, or why the file as a whole cannot be read (with field issues when there are some). */
export type DeparturesRead = { ok: true; departures: Departure[] } | { ok: false; message: string; issues?: FieldIssue[] };

/** Issues on one line, for a row's error. */
export function oneLine(issues: readonly FieldIssue[]): string {
  return formatIssues(issues).split("\n").join("; ");
}

/** Departures from a JSON departures file's text: a list of start cases. */
export function departuresFromJson(text: string, lib: Library): DeparturesRead {
  const parsed = parseJsonText(text);
  if (!parsed.ok) return { ok: false, message: "not a valid file", issues: parsed.issues };
  if (!Array.isArray(parsed.value)) return { ok: false, message: "a departures file in JSON is a list of start cases ([ {...}, {...} ])" };
  return {
    ok: true,
    departures: parsed.value.map((item, index): Departure => {
      const rawId = item && typeof item === "object" && typeof (item as { id?: unknown }).id === "string" ? (item as { id: string }).id : undefined;
      const base = { id: rawId ?? `[${index}]`, where: `[${index}]`, index };
      const r = parseStartCase(item, lib);
      if (!r.ok) return { ...base, error: `[${index}]${rawId ? ` (${printable(rawId)})` : ""}: ${oneLine(r.issues)}` };
      return { ...base, case: r.value, file: item };
    }),
  };
}

const SAND_WORDS: Record<string, boolean> = { true: true, yes: true, y: true, "1": true, false: false, no: false, n: false, "0": false };

/**
 * A start-case file's JSON from its text, or the error that stops it (not JSON, or another kind of Taut file).
 * The case itself is validated later, with the row's overrides.
 */
export function caseFileJson(text: string): unknown {
  const parsed = parseJsonText(text);
  if (!parsed.ok) return new Error(oneLine(parsed.issues));
  const kind = fileKind(parsed.value);
  if (kind !== undefined && kind !== "taut/start-case@1") return new Error(`this is a ${kindText(kind)} file; a start case (taut/start-case@1) is needed`);
  return parsed.value;
}

/**
 * Departures from a CSV departures file's text. `readCase(path)` gives the JSON of the start-case file a row
 * names (as written in the CSV), or an Error saying why it cannot; it is asked once per distinct path.
 */
/** What a case named by id looks like: letters, digits and hyphens only. */
const CASE_ID = /^[A-Za-z0-9][A-Za-z0-9-]*$/;

export function departuresFromCsv(text: string, readCase: (casePath: string) => unknown, lib: Library): DeparturesRead {
  let records;
  try {
    records = parseCsv(text);
  } catch (e) {
    return { ok: false, message: (e as Error).message };
  }
  const header = records.shift();
  if (!header) return { ok: false, message: 'the file is empty (a header line "id,case,rail,sand" is needed)' };
  const col = new Map(header.fields.map((h, k) => [h.trim().toLowerCase(), k]));
  // The header is not quoted back: a file given here by mistake may be anything.
  if (!col.has("case")) return { ok: false, message: `line ${header.line}: the header must name the columns id,case,rail,sand (its ${header.fields.length} column${header.fields.length === 1 ? "" : "s"} include no "case")` };
  const files = new Map<string, unknown>();
  const cell = (fields: string[], name: string): string => {
    const k = col.get(name);
    return k === undefined ? "" : (fields[k] ?? "").trim();
  };
  return {
    ok: true,
    departures: records.map(({ line, fields }): Departure => {
      const id = cell(fields, "id") || `line ${line}`;
      const base = { id, where: `line ${line}`, line };
      const fail = (message: string): Departure => ({ ...base, error: `line ${line}: ${message}` });
      const casePath = cell(fields, "case");
      if (casePath === "") return fail("case: a start-case file is needed");
      const rail = cell(fields, "rail").toLowerCase();
      if (rail !== "" && !(RAIL_CONDITIONS as readonly string[]).includes(rail)) return fail(`rail: must be one of ${RAIL_CONDITIONS.join(", ")} (got ${quoted(rail)})`);
      const sandWord = cell(fields, "sand").toLowerCase();
      if (sandWord !== "" && SAND_WORDS[sandWord] === undefined) return fail(`sand: must be yes or no (true/false, 1/0) (got ${quoted(sandWord)})`);
      const location = cell(fields, "location");
      // A bare id (no folder, no extension) names a case of the library — the built-in demo cases — so a
      // shared departures file need not reach outside its own folder for them.
      if (!files.has(casePath)) files.set(casePath, CASE_ID.test(casePath) && lib.cases?.has(casePath) ? lib.cases.get(casePath) : readCase(casePath));
      const raw = files.get(casePath);
      const shownPath = printable(casePath);
      if (raw instanceof Error) return fail(`${shownPath}: ${raw.message}`);
      const data = (raw && typeof raw === "object" && !Array.isArray(raw) ? (JSON.parse(JSON.stringify(raw)) as unknown) : {}) as Record<string, unknown>;
      const conditions = (data.conditions && typeof data.conditions === "object" ? data.conditions : {}) as Record<string, unknown>;
      if (rail !== "") conditions.rail = rail as RailCondition;
      if (sandWord !== "") conditions.sand = SAND_WORDS[sandWord];
      data.conditions = conditions;
      if (location !== "") data.location = location;
      const r = parseStartCase(data, lib);
      if (!r.ok) {
        // A value the row's own cells put in is the CSV line's fault, not the case file's.
        const fromCell = r.issues.filter((i) => (location !== "" && i.path.startsWith("location")) || (rail !== "" && i.path === "conditions.rail") || (sandWord !== "" && i.path === "conditions.sand"));
        if (fromCell.length > 0) {
          const said = (i: FieldIssue) =>
            i.path.startsWith("location")
              ? `location ${quoted(location)}: ${i.path === "location" ? "" : `${i.path.slice("location.".length)} `}${i.message}`
              : `${i.path.slice("conditions.".length)}: ${i.message}`;
          return fail(printable(fromCell.map(said).join("; ")));
        }
        return fail(`${shownPath}: ${oneLine(r.issues)}`);
      }
      return { ...base, case: r.value, file: data };
    }),
  };
}
