/**
 * An opened start-case file read back (`taut/start-case@1`), validated with the same schema `taut plan`
 * uses, with what the app cannot keep from it said in words. Loaded when a file is opened: the schemas are
 * not part of the first screen.
 */
import type { FieldIssue } from "../../../profiles/issues.js";
import type { Library } from "../../../profiles/library.js";
import { fileKind, parseJsonText, parseStartCaseFile } from "../../../profiles/parse.js";
import type { StartCaseFile } from "../../../profiles/schemas.js";
import { percent } from "../../format.js";
import type { CaseSettings } from "../../state/caseDraft.js";

export type OpenedCase = { ok: true; file: StartCaseFile; notes: string[] } | { ok: false; message: string; issues: FieldIssue[] };

/** Read an opened file's text as a start case; `settings` are the app's (the ones its plans use). */
export function readCaseFile(name: string, text: string, lib: Library, settings: CaseSettings): OpenedCase {
  const json = parseJsonText(text);
  if (!json.ok) return { ok: false, message: `${name} is not a JSON file`, issues: json.issues };
  const kind = fileKind(json.value);
  if (kind !== undefined && kind !== "taut/start-case@1") return { ok: false, message: `${name} is a ${kind} file; a start case (taut/start-case@1) is needed here`, issues: [] };
  const r = parseStartCaseFile(json.value);
  if (!r.ok) return { ok: false, message: `${name} is not a valid start case`, issues: r.issues };
  const notes: string[] = [];
  for (const l of r.value.locomotives) {
    if (typeof l.profile !== "string" && !lib.locomotives.has(l.profile.id)) {
      notes.push(`The file carries its own locomotive profile "${l.profile.id}", which this app does not have: choose a locomotive before planning.`);
    }
  }
  const s = r.value.settings;
  if (s && ((s.couplerSafetyFactor !== undefined && s.couplerSafetyFactor !== settings.couplerSafetyFactor) || (s.slipRiskThreshold !== undefined && s.slipRiskThreshold !== settings.slipRiskThreshold))) {
    notes.push(
      `The file's safety settings (coupler factor ${s.couplerSafetyFactor ?? "–"}, slip risk ${s.slipRiskThreshold !== undefined ? percent(s.slipRiskThreshold, 0) : "–"}) are replaced by this app's (coupler factor ${settings.couplerSafetyFactor}, slip risk ${percent(settings.slipRiskThreshold, 0)}; see Settings).`,
    );
  }
  return { ok: true, file: r.value, notes };
}
