/**
 * Why a departure has no answer, in words: the English kept on the row for the CSV export (as `taut check`
 * writes it), and the same as codes with figures that the screen writes in the language on screen at
 * display time, so a language switch redraws it. A row the file's reader refused carries the reader's
 * `problem` (profiles/departures.ts); one the planner could not answer, the planner's `failure`.
 */
import type { WorkerIssue } from "../../../worker/protocol.js";
import { departureProblemText, type DepartureProblem } from "../../../profiles/departures.js";
import { readerMessage } from "../../../i18n/renderReaders.js";
import { readers } from "../../../i18n/en/readers.js";
import { departureErrors } from "../../../i18n/en/departureErrors.js";
import type { Translator } from "../../../i18n/translator.js";
import { ENGLISH } from "../../../profiles/lineReport.js";

/** Why the planner gave a row no answer: a case it refused (its issues), a failure, or a stopped planner. */
export interface RowFailure {
  kind: "invalid" | "internal" | "crashed";
  /** The program's own words for an internal failure (a programming error), shown as they are. */
  detail: string;
  issues: WorkerIssue[];
}

/** What a row's error is made of: its place in the file and, when it has one, the reader's or the planner's codes. */
export interface RowErrorParts {
  where: string;
  line?: number;
  problem?: DepartureProblem;
  failure?: RowFailure;
}

/** An issue of a refused case: its path, then the reader's words (the work cap) or the check's own. */
function issueText(tr: Translator, i: WorkerIssue): string {
  return `${i.path}: ${i.reader ? readerMessage(tr, i.reader) : i.message}`;
}

/** The row's error in English, as the export has always written it (`message`: the planner's own English). */
export function rowErrorEnglish(where: string, f: RowFailure, message: string): string {
  const issues = f.issues.length > 0 ? ` (${f.issues.map((i) => issueText(ENGLISH, i)).join("; ")})` : "";
  return `${where}: ${f.kind === "invalid" ? "cannot be checked" : "internal error"}: ${message}${issues}`;
}

/** The row's error in the language of `tr`: the place, then the reader's problem or the planner's failure. */
export function rowErrorText(tr: Translator, x: RowErrorParts): string {
  if (x.problem) return departureProblemText(tr, x.problem);
  const t = tr.ns(departureErrors);
  const where = x.line !== undefined ? tr.ns(readers)("rowLine", { line: x.line }) : x.where;
  const f = x.failure;
  if (!f) return `${where}: ${t("cannotBeRead")}`;
  if (f.kind === "invalid") return `${where}: ${t("cannotBeChecked")}${f.issues.length > 0 ? ` (${f.issues.map((i) => issueText(tr, i)).join("; ")})` : ""}`;
  if (f.kind === "crashed") return `${where}: ${t("plannerStopped")}`;
  return `${where}: ${t("internalError", { detail: f.detail })}`;
}
