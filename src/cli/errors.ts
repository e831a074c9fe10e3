/** Errors the command line reports without a stack trace, with their exit codes. */
import { readerMessage } from "../i18n/renderReaders.js";
import { issueMessage } from "../profiles/issueText.js";
import { formatIssues, MAX_LISTED_ISSUES, type FieldIssue } from "../profiles/issues.js";
import { cliFieldWords, cliTr } from "./lang.js";
import { cliErrors } from "../i18n/en/cliErrors.js";
import type { MessageFn, Translator } from "../i18n/translator.js";
import { cliHelp } from "../i18n/en/cliHelp.js";

/** The command line's error words in this run's language. */
export function errorWords(): MessageFn<typeof cliErrors.en> {
  return cliTr().ns(cliErrors);
}

/** "usage:" before a usage line in an error, in this run's language. */
export function usageWord(): string {
  return errorWords()("usage");
}

/** "usage: taut …" in an error, in this run's language (usageText). */
export function usageLine(usage: string): string {
  return `${usageWord()} ${usageText(usage)}`;
}

/** The usage lines' placeholders that are words, and their keys in the catalog (NOTE-ID before the others). */
const METAVARIABLES = { "NOTE-ID": "metaNoteId", FILE: "metaFile", CASE: "metaCase", DEPARTURES: "metaDepartures", LOCATION: "metaLocation", RECORDING: "metaRecording", TEXT: "metaText", PERMILLE: "metaPermille" } as const;
const METAVARIABLE = new RegExp(`(?<![\\w-])(${Object.keys(METAVARIABLES).join("|")})(?![\\w-])`, "g");

/**
 * A usage line in this run's language: the placeholders that are words (FILE, CASE.json, PERMILLE…) in the
 * language's words, as the translated help names them; option names, their values and file extensions as
 * they are (the command line's contract). English: the line itself.
 */
export function usageText(usage: string, tr: Translator = cliTr()): string {
  if (tr.lang === "en") return usage;
  const t = tr.ns(cliHelp);
  return usage.replace(METAVARIABLE, (w) => t(METAVARIABLES[w as keyof typeof METAVARIABLES]));
}

export const EXIT_OK = 0;
export const EXIT_INTERNAL = 1;
export const EXIT_BAD_INPUT = 2;

/** Bad input: a file, field or option the user can fix. Exit code 2. */
export class InputError extends Error {
  constructor(
    message: string,
    readonly issues: FieldIssue[] = [],
  ) {
    super(message);
  }
  describe(): string {
    return this.issues.length > 0 ? `${this.message}\n${indent(issueLines(this.issues))}` : this.message;
  }
}

/** The issues in this run's language (English: formatIssues' own lines, byte for byte). */
function issueLines(issues: readonly FieldIssue[]): string {
  const tr = cliTr();
  if (tr.lang === "en") return formatIssues(issues);
  const shown = issues.slice(0, MAX_LISTED_ISSUES).map((i) => ({ path: i.path, message: i.reader ? readerMessage(tr, i.reader) : issueMessage(tr, i) }));
  const more = issues.length - MAX_LISTED_ISSUES;
  return formatIssues(shown) + (more > 0 ? `\n${cliFieldWords()("andMore", { count: more })}` : "");
}

function indent(s: string): string {
  return s
    .split("\n")
    .map((l) => `  ${l}`)
    .join("\n");
}

/**
 * An option-parsing error (node:util parseArgs) in this run's language: English as Node words it (as it
 * always printed); the others from its code, naming the option.
 */
export function parseErrorText(e: Error & { code?: string }, english: string): string {
  if (cliTr().lang === "en") return english;
  const option = /'(-[^' ]+)/.exec(e.message)?.[1];
  if (option === undefined) return english;
  const t = errorWords();
  if (e.code === "ERR_PARSE_ARGS_UNKNOWN_OPTION") return t("unknownOption", { option });
  if (e.code === "ERR_PARSE_ARGS_INVALID_OPTION_VALUE") return /does not take an argument/.test(e.message) ? t("optionTakesNoValue", { option }) : t("optionNeedsValue", { option });
  return english;
}
