/**
 * The notes library's messages about its records (src/notes) as codes with figures, and their words in
 * any language (i18n/en/noteRecords.ts): the English the library carries (its `message`s, as they have
 * always read) and the words the app shows in the language on screen. Here rather than in src/notes,
 * which holds no words of any language; the issues of a damaged note are field issues, written by
 * `issueMessage` or by the caller's own writer (the app's, in the language on screen).
 */
import { fields } from "../i18n/en/fields.js";
import { noteRecords } from "../i18n/en/noteRecords.js";
import { createTranslator, type Translator } from "../i18n/translator.js";
import { MAX_LISTED_ISSUES, type FieldIssue } from "./issues.js";
import { issueMessage } from "./issueText.js";
import { printable } from "./text.js";

/** Why a record of the older format could not be carried over. */
export type MigrationFailure = { code: "migrationNotObject" } | { code: "noteInvalid"; issues: FieldIssue[] };

/** Why a saved record is damaged and skipped. */
export type RecordWhy =
  | { code: "notObject" | "olderFormat" | "badSavedAt" }
  | { code: "olderNotCarried"; why: MigrationFailure }
  | { code: "badOrigin"; origin: string; origins: string }
  | { code: "noteInvalid"; issues: FieldIssue[] }
  | { code: "wrongKey"; key: string; id: string };

/** Something carrying a note over from the older format left out. */
export type MigrationFlag = { code: "hazardNotText"; number: number } | { code: "seasonUnknown"; season: string } | { code: "railUnknown"; season: string; word: string; rails: string };

/** Writes a field issue's message (default: `issueMessage`, in the language of the translator). */
export type IssueWriter = (i: FieldIssue) => string;

/** Issues on one line, `path: message; …`, at most as many as a list shows, then how many more. */
export function issuesLine(tr: Translator, issues: readonly FieldIssue[], write: IssueWriter = (i) => issueMessage(tr, i)): string {
  const lines = issues.slice(0, MAX_LISTED_ISSUES).map((i) => printable(i.path ? `${i.path}: ${write(i)}` : write(i)));
  if (issues.length > MAX_LISTED_ISSUES) lines.push(tr.ns(fields)("andMore", { count: issues.length - MAX_LISTED_ISSUES }));
  return lines.join("; ");
}

/** Why a carrying over failed, in words. */
export function migrationFailureText(tr: Translator, f: MigrationFailure, write?: IssueWriter): string {
  return f.code === "migrationNotObject" ? tr.ns(noteRecords)("migrationNotObject") : issuesLine(tr, f.issues, write);
}

/** Why a record is damaged, in words. */
export function recordWhyText(tr: Translator, w: RecordWhy, write?: IssueWriter): string {
  const t = tr.ns(noteRecords);
  switch (w.code) {
    case "olderNotCarried":
      return t("olderNotCarried", { why: migrationFailureText(tr, w.why, write) });
    case "badOrigin":
      return t("badOrigin", { origin: w.origin, origins: w.origins });
    case "noteInvalid":
      return issuesLine(tr, w.issues, write);
    case "wrongKey":
      return t("wrongKey", { key: w.key, id: w.id });
    default:
      return t(w.code);
  }
}

/** A damaged record's message: its key, then why. */
export function recordProblemText(tr: Translator, key: string, w: RecordWhy, write?: IssueWriter): string {
  return tr.ns(noteRecords)("damaged", { key, why: recordWhyText(tr, w, write) });
}

/** What carrying a note over left out, in words. */
export function migrationFlagText(tr: Translator, f: MigrationFlag): string {
  const t = tr.ns(noteRecords);
  if (f.code === "hazardNotText") return t("hazardNotText", { number: f.number });
  if (f.code === "seasonUnknown") return t("seasonUnknown", { season: f.season });
  return t("railUnknown", { season: f.season, word: f.word, rails: f.rails });
}

/** The library closed under the page: by an upgrade in another tab, or by the browser. */
export function notesClosedText(tr: Translator, reason: "upgrade" | "terminated"): string {
  return tr.ns(noteRecords)(reason === "upgrade" ? "closedUpgrade" : "closedTerminated");
}

/** An import whose conflicts were not all settled. */
export function noChoiceText(tr: Translator, id: string): string {
  return tr.ns(noteRecords)("noChoice", { id });
}

const ENGLISH = createTranslator("en", null);

/** The English of each, as the library's messages carry it. */
export const noteRecordEnglish = {
  problem: (key: string, w: RecordWhy) => recordProblemText(ENGLISH, key, w, (i) => i.message),
  migration: (f: MigrationFailure) => migrationFailureText(ENGLISH, f, (i) => i.message),
  flag: (f: MigrationFlag) => migrationFlagText(ENGLISH, f),
  closed: (reason: "upgrade" | "terminated") => notesClosedText(ENGLISH, reason),
  noChoice: (id: string) => noChoiceText(ENGLISH, id),
};
