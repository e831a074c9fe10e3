/**
 * The readers' messages as issues and headlines: a code with its figures (i18n/en/readers.ts) and its
 * English words, which a file's readers carry as they always have; the command line and the app render
 * the code in their language (i18n/renderReaders.ts).
 */
import type { PlanWorkProblem } from "../core/planner/workCap.js";
import { readerMessage, type ReaderCoded } from "../i18n/renderReaders.js";

export type { ReaderCoded } from "../i18n/renderReaders.js";
import type { FieldIssue } from "./issues.js";
import { ENGLISH } from "./lineReport.js";

/** A reader's message in English (the words a reader's result carries). */
export function readerEnglish(r: ReaderCoded | PlanWorkProblem): string {
  return readerMessage(ENGLISH, r);
}

/** A reader's issue at `path`: the code, and its English message. */
export function readerIssue(path: string, r: ReaderCoded | PlanWorkProblem): FieldIssue {
  return { path, message: readerEnglish(r), reader: r };
}
