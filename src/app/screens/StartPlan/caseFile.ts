/**
 * A start case as a file, in the command line's schema (`taut/start-case@1`): the text to save for the case
 * on screen. Reading an opened file back is in openCaseFile.ts (it needs the schemas, loaded when a file is
 * opened).
 */

/** The file name to save a case under: its id, or "start-case". */
export function caseFileName(json: Record<string, unknown>): string {
  const id = typeof json.id === "string" && json.id.trim() !== "" ? json.id.trim() : "start-case";
  return `${id.replace(/[^A-Za-z0-9._-]+/g, "-")}.json`;
}

/** The text saved: the case as `taut plan` reads it, two-space indented. */
export function caseFileText(json: Record<string, unknown>): string {
  return `${JSON.stringify(json, null, 2)}\n`;
}
