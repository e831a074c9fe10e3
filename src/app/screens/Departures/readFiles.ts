/**
 * Departures from files the user picked: a JSON list of start cases, or a CSV (`id,case,rail,sand`) whose
 * `case` column names start-case files by path — in the browser those are files picked alongside it,
 * matched by file name (the folders in the path are not looked at). Rows are read by src/profiles, the same
 * reader `taut check` uses, so a row's error reads the same.
 */
import { CaseFileError, caseFileJson, departuresFromCsv, departuresFromJson, type Departure } from "../../../profiles/departures.js";
import { formatIssues, type FieldIssue } from "../../../profiles/issues.js";
import type { Library } from "../../../profiles/library.js";
import { readerIssue, type ReaderCoded } from "../../../profiles/readerIssues.js";
import { readerText } from "../../../i18n/renderReaders.js";
import { departureErrors } from "../../../i18n/en/departureErrors.js";
import { fields } from "../../../i18n/en/fields.js";
import type { Translator } from "../../../i18n/translator.js";
import { ENGLISH } from "../../../profiles/lineReport.js";

export interface PickedFile {
  name: string;
  text: string;
}

export type PickedRead =
  | {
      ok: true;
      /** The departures file's name. */
      file: string;
      kind: "json" | "csv";
      departures: Departure[];
      /** Case files a CSV names that were not picked (their rows carry an error). */
      missing: string[];
      /** Picked files the CSV does not name. */
      unused: string[];
    }
  | { ok: false; message: string; problem: PickedProblem };

/**
 * Why the picked files give no departures, as codes: no departures file among them (or two), or the
 * departures file refused by its reader (its headline and field issues). `pickedProblemText` writes it.
 */
export type PickedProblem =
  | { code: "pickOne" | "noneAmong"; files: string[] }
  | { code: "nonePicked" }
  | { code: "refused"; file: string; headline: ReaderCoded; issues: FieldIssue[] };

/** An issue in words: `path: message`, the message written by `issue` (the language on screen's, in the app). */
export type IssueWords = (i: FieldIssue) => string;

/**
 * Why the picked files give no departures, in the language of `tr` (English: the message the reader has
 * always given). `issue` writes a field issue (the app's, in the user's units; else its English message).
 */
export function pickedProblemText(tr: Translator, p: PickedProblem, issue: IssueWords = (i) => i.message): string {
  const t = tr.ns(departureErrors);
  switch (p.code) {
    case "pickOne":
      return t("pickOne", { files: p.files.join(", ") });
    case "nonePicked":
      return t("nonePicked");
    case "noneAmong":
      return t("noneAmong", { files: p.files.join(", "), columns: "id,case,rail,sand", open: "{", close: "}" });
    case "refused": {
      const listed = p.issues.slice(0, MAX_SHOWN).map((i) => (i.path ? `${i.path}: ${issue(i)}` : issue(i)));
      if (p.issues.length > MAX_SHOWN) listed.push(tr.ns(fields)("andMore", { count: p.issues.length - MAX_SHOWN }));
      return `${p.file}: ${readerText(tr, p.headline)}${listed.length > 0 ? ` — ${listed.join("; ")}` : ""}`;
    }
  }
}

/** Issues listed with a refused file (the rest counted), as the reader's own list. */
const MAX_SHOWN = 12;

/** The last part of a path written with / or \. */
export function baseName(path: string): string {
  return path.split(/[\\/]/).filter((p) => p !== "").at(-1) ?? path;
}

const isJsonList = (f: PickedFile) => /^\s*\[/.test(f.text);

/** Which picked file is the departures file: the one CSV, else the one JSON list. */
function departuresFile(files: readonly PickedFile[]): PickedFile | PickedProblem {
  const csvs = files.filter((f) => /\.csv$/i.test(f.name));
  if (csvs.length > 1) return { code: "pickOne", files: csvs.map((f) => f.name) };
  if (csvs.length === 1) return csvs[0]!;
  const lists = files.filter(isJsonList);
  if (lists.length > 1) return { code: "pickOne", files: lists.map((f) => f.name) };
  if (lists.length === 1) return lists[0]!;
  if (files.length === 0) return { code: "nonePicked" };
  return { code: "noneAmong", files: files.map((f) => f.name) };
}

/** Refused: the English message as it has always read, and the codes. */
const refusedRead = (problem: PickedProblem): PickedRead => ({ ok: false, message: pickedProblemText(ENGLISH, problem, (i) => i.message), problem });

/** Read the picked files into departures. */
export function readPickedDepartures(files: readonly PickedFile[], lib: Library): PickedRead {
  const main = departuresFile(files);
  if ("code" in main) return refusedRead(main);
  const fail = (headline: ReaderCoded, message: string, issues?: FieldIssue[]): PickedRead => ({
    ok: false,
    message: `${main.name}: ${message}${issues && issues.length > 0 ? ` — ${formatIssues(issues).split("\n").join("; ")}` : ""}`,
    problem: { code: "refused", file: main.name, headline, issues: issues ?? [] },
  });
  const json = /\.json$/i.test(main.name) || (!/\.csv$/i.test(main.name) && isJsonList(main));
  if (json) {
    const r = departuresFromJson(main.text, lib);
    if (!r.ok) return fail(r.headline, r.message, r.issues);
    return { ok: true, file: main.name, kind: "json", departures: r.departures, missing: [], unused: files.filter((f) => f !== main).map((f) => f.name) };
  }
  const others = files.filter((f) => f !== main);
  const used = new Set<PickedFile>();
  const missing: string[] = [];
  const find = (path: string): PickedFile | undefined => {
    const name = baseName(path);
    return others.find((f) => f.name === name) ?? others.find((f) => f.name.toLowerCase() === name.toLowerCase());
  };
  const r = departuresFromCsv(
    main.text,
    (casePath) => {
      const f = find(casePath);
      if (!f) {
        missing.push(baseName(casePath));
        return new CaseFileError([readerIssue("", { code: "caseNotPicked", figures: { file: baseName(casePath), departures: main.name } })]);
      }
      used.add(f);
      return caseFileJson(f.text);
    },
    lib,
  );
  if (!r.ok) return fail(r.headline, r.message, r.issues);
  return { ok: true, file: main.name, kind: "csv", departures: r.departures, missing, unused: others.filter((f) => !used.has(f)).map((f) => f.name) };
}

/** Read browser File objects as text. */
export async function pickedFiles(list: Iterable<File>): Promise<PickedFile[]> {
  return Promise.all([...list].map(async (f) => ({ name: f.name, text: await f.text() })));
}
