/** Errors the command line reports without a stack trace, with their exit codes. */
import { formatIssues, type FieldIssue } from "../profiles/issues.js";

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
    return this.issues.length > 0 ? `${this.message}\n${indent(formatIssues(this.issues))}` : this.message;
  }
}

function indent(s: string): string {
  return s
    .split("\n")
    .map((l) => `  ${l}`)
    .join("\n");
}
