/**
 * Validate the draft where the user edits it: the same schema and resolution the worker and the command
 * line use (`src/profiles`), but where the file allows alternatives (target by speed or distance, a
 * location by note or by quick entry, a position by name or after a wagon) the issues are taken from the
 * alternative the user chose, so they land at the field being edited.
 */
import type { StartCase } from "../../core/train/types.js";
import { fail, fromZodIssues, type FieldIssue, type ParseResult, type RawIssue } from "../../profiles/issues.js";
import type { Library } from "../../profiles/library.js";
import { resolveStartCase } from "../../profiles/parse.js";
import { startCaseSchema, type StartCaseFile } from "../../profiles/schemas.js";
import type { CaseDraft } from "./caseDraft.js";

/** Check a start-case object made from `draft` against the schema and the library. */
export function validateDraft(json: unknown, draft: CaseDraft, lib: Library): ParseResult<StartCase> {
  const r = startCaseSchema.safeParse(json, { reportInput: true });
  if (!r.success) return fail(chooseBranches(r.error.issues as unknown as ReadonlyArray<RawIssue>, draft));
  return resolveStartCase(r.data as StartCaseFile, lib);
}

function chosenBranch(path: ReadonlyArray<PropertyKey>, d: CaseDraft): number | undefined {
  const p = path.map(String).join(".");
  if (p === "target") return d.targetKind === "speed" ? 0 : 1;
  if (p === "location") return d.locationMode === "note" ? 0 : d.locationMode === "profile" ? 1 : 2;
  const m = /^locomotives\.(\d+)\.position$/.exec(p);
  if (m) return d.locomotives[Number(m[1])]?.position === "after" ? 1 : 0;
  return undefined;
}

/** Field issues, taking each union's issues from the branch the draft chose. */
export function chooseBranches(raw: ReadonlyArray<RawIssue>, d: CaseDraft): FieldIssue[] {
  const out: FieldIssue[] = [];
  for (const issue of raw) {
    const k = issue.code === "invalid_union" ? chosenBranch(issue.path, d) : undefined;
    const branch = k !== undefined ? issue.errors?.[k] : undefined;
    if (branch && branch.length > 0) out.push(...fromZodIssues(branch, issue.path));
    else out.push(...fromZodIssues([issue]));
  }
  return out;
}
