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
import { CsvQuoteError, parseCsv } from "./csv.js";
import type { ReaderCoded } from "../i18n/renderReaders.js";
import { readerEnglish, readerIssue } from "./readerIssues.js";
import { coded, formatIssues, MAX_LISTED_ISSUES, type FieldIssue } from "./issues.js";
import { issueMessage } from "./issueText.js";
import { fields } from "../i18n/en/fields.js";
import { readers } from "../i18n/en/readers.js";
import { readerMessage } from "../i18n/renderReaders.js";
import type { Translator } from "../i18n/translator.js";
import type { Library } from "./library.js";
import { fileKind, kindText, parseJsonText, parseStartCase } from "./parse.js";
import { printable, quoted } from "./text.js";
import { fileProblemText, type FileProblem } from "../i18n/renderFiles.js";
import { ENGLISH } from "./lineReport.js";

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
  /** What is wrong with the row, when it is not (English). */
  error?: string;
  /** The same as codes with their figures, for other languages (departureProblemText). */
  problem?: DepartureProblem;
}

/**
 * What is wrong with a row as data: where (a CSV line, or a JSON index with the row's id), then the issues,
 * each after a prefix that is no word of any language (a column or field name, a file's path); written
 * `where: lead part; part; …` as the English `error` is.
 */
export interface DepartureProblem {
  line?: number;
  index?: number;
  id?: string;
  /** Text before the first part (a case file's path and ": "). */
  lead?: string;
  /** `file`: a case file that cannot be opened or read, as a code (its English words are the issue's message). */
  parts: Array<{ prefix: string; issue: FieldIssue; file?: FileProblem }>;
  /** Issues beyond those listed. */
  more?: number;
}

/** A case file that cannot be used for a row: its issues (the message is them on one line, in English). */
export class CaseFileError extends Error {
  constructor(readonly issues: FieldIssue[]) {
    super(oneLine(issues));
  }
}

/** A case file that cannot be opened or read for a row (no such file, a folder…): why, as a code; the message is it in English. */
export class CaseFileUnreadable extends Error {
  constructor(readonly problem: FileProblem) {
    super(fileProblemText(ENGLISH, problem));
  }
}

/** A list of issues as a problem's parts, `path: message` each, cut as `oneLine` cuts them. */
export function issueParts(issues: readonly FieldIssue[]): Pick<DepartureProblem, "parts" | "more"> {
  const parts = issues.slice(0, MAX_LISTED_ISSUES).map((i) => ({ prefix: i.path ? `${i.path}: ` : "", issue: i }));
  return issues.length > MAX_LISTED_ISSUES ? { parts, more: issues.length - MAX_LISTED_ISSUES } : { parts };
}

/** A row's problem in a language: the English `error` in English, the same codes and figures in Hungarian or German. */
export function departureProblemText(tr: Translator, p: DepartureProblem): string {
  const t = tr.ns(readers);
  const where = p.line !== undefined ? t("rowLine", { line: p.line }) : `[${p.index}]${p.id ? ` (${printable(p.id)})` : ""}`;
  const text = (i: FieldIssue) => (i.reader ? readerMessage(tr, i.reader) : issueMessage(tr, i));
  const parts = p.parts.map((x, k) => printable(`${k === 0 ? (p.lead ?? "") : ""}${x.prefix}${x.file ? fileProblemText(tr, x.file) : text(x.issue)}`));
  if (p.more) parts.push(tr.ns(fields)("andMore", { count: p.more }));
  return `${where}: ${parts.join("; ")}`;
}

/** The departures of a file, or why the file as a whole cannot be read (with field issues when there are some). */
export type DeparturesRead = { ok: true; departures: Departure[] } | { ok: false; message: string; headline: ReaderCoded; issues?: FieldIssue[] };

/** A departures file refused: the headline as a code and in English. */
function refused(headline: ReaderCoded, issues?: FieldIssue[]): DeparturesRead {
  return { ok: false, message: readerEnglish(headline), headline, ...(issues ? { issues } : {}) };
}

/** Issues on one line, for a row's error. */
export function oneLine(issues: readonly FieldIssue[]): string {
  return formatIssues(issues).split("\n").join("; ");
}

/** Departures from a JSON departures file's text: a list of start cases. */
export function departuresFromJson(text: string, lib: Library): DeparturesRead {
  const parsed = parseJsonText(text);
  if (!parsed.ok) return refused({ code: "departuresNotValid" }, parsed.issues);
  if (!Array.isArray(parsed.value)) return refused({ code: "departuresJsonList", figures: { open: "{", close: "}" } });
  return {
    ok: true,
    departures: parsed.value.map((item, index): Departure => {
      const rawId = item && typeof item === "object" && typeof (item as { id?: unknown }).id === "string" ? (item as { id: string }).id : undefined;
      const base = { id: rawId ?? `[${index}]`, where: `[${index}]`, index };
      const r = parseStartCase(item, lib);
      if (!r.ok) return { ...base, error: `[${index}]${rawId ? ` (${printable(rawId)})` : ""}: ${oneLine(r.issues)}`, problem: { index, ...(rawId ? { id: rawId } : {}), ...issueParts(r.issues) } };
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
  if (!parsed.ok) return new CaseFileError(parsed.issues);
  const kind = fileKind(parsed.value);
  if (kind !== undefined && kind !== "taut/start-case@1") return new CaseFileError([readerIssue("", { code: "caseOtherKind", figures: { kind: kindText(kind) } })]);
  return parsed.value;
}

/**
 * Departures from a CSV departures file's text. `readCase(path)` gives the JSON of the start-case file a row
 * names (as written in the CSV), or an Error saying why it cannot (a CaseFileUnreadable or a CaseFileError
 * says it as codes, which the row's problem keeps); it is asked once per distinct path.
 */
/** What a case named by id looks like: letters, digits and hyphens only. */
const CASE_ID = /^[A-Za-z0-9][A-Za-z0-9-]*$/;

export function departuresFromCsv(text: string, readCase: (casePath: string) => unknown, lib: Library): DeparturesRead {
  let records;
  try {
    records = parseCsv(text);
  } catch (e) {
    if (e instanceof CsvQuoteError) return refused({ code: "csvUnclosed", figures: { line: e.line } });
    throw e;
  }
  const header = records.shift();
  if (!header) return refused({ code: "csvEmpty" });
  const col = new Map(header.fields.map((h, k) => [h.trim().toLowerCase(), k]));
  // The header is not quoted back: a file given here by mistake may be anything.
  if (!col.has("case")) return refused({ code: "csvNoCase", figures: { line: header.line, count: header.fields.length } });
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
      // The English error as it has always read, and the same as codes (`problem`) for other languages.
      const fail = (message: string, problem: Omit<DepartureProblem, "line">): Departure => ({ ...base, error: `line ${line}: ${message}`, problem: { line, ...problem } });
      const failWith = (prefix: string, issue: FieldIssue): Departure => fail(`${prefix}${issue.message}`, { parts: [{ prefix, issue }] });
      const casePath = cell(fields, "case");
      if (casePath === "") return failWith("case: ", readerIssue("case", { code: "caseNeeded" }));
      const rail = cell(fields, "rail").toLowerCase();
      if (rail !== "" && !(RAIL_CONDITIONS as readonly string[]).includes(rail)) return failWith("rail: ", coded("rail", { code: "oneOf", figures: { values: RAIL_CONDITIONS.join(", ") }, got: quoted(rail) }));
      const sandWord = cell(fields, "sand").toLowerCase();
      if (sandWord !== "" && SAND_WORDS[sandWord] === undefined) return failWith("sand: ", readerIssue("sand", { code: "sandYesNo", figures: { value: quoted(sandWord) } }));
      const location = cell(fields, "location");
      // A bare id (no folder, no extension) names a case of the library — the built-in demo cases — so a
      // shared departures file need not reach outside its own folder for them.
      if (!files.has(casePath)) files.set(casePath, CASE_ID.test(casePath) && lib.cases?.has(casePath) ? lib.cases.get(casePath) : readCase(casePath));
      const raw = files.get(casePath);
      const shownPath = printable(casePath);
      if (raw instanceof CaseFileUnreadable) return fail(`${shownPath}: ${raw.message}`, { lead: `${shownPath}: `, parts: [{ prefix: "", issue: { path: "", message: raw.message }, file: raw.problem }] });
      if (raw instanceof Error) {
        const issues = raw instanceof CaseFileError ? raw.issues : [{ path: "", message: raw.message }];
        return fail(`${shownPath}: ${raw.message}`, { lead: `${shownPath}: `, ...issueParts(issues) });
      }
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
          const prefix = (i: FieldIssue) =>
            i.path.startsWith("location") ? `location ${quoted(location)}: ${i.path === "location" ? "" : `${i.path.slice("location.".length)} `}` : `${i.path.slice("conditions.".length)}: `;
          return fail(printable(fromCell.map((i) => `${prefix(i)}${i.message}`).join("; ")), { parts: fromCell.map((i) => ({ prefix: prefix(i), issue: i })) });
        }
        return fail(`${shownPath}: ${oneLine(r.issues)}`, { lead: `${shownPath}: `, ...issueParts(r.issues) });
      }
      return { ...base, case: r.value, file: data };
    }),
  };
}
