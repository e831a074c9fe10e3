/** What every section of the start plan's inputs receives, and how a section finds a field's issue. */
import type { UnitSystem } from "../../format.js";
import type { CaseDraftStore } from "../../state/createCaseDraft.js";

export interface InputSectionProps {
  store: CaseDraftStore;
  units: UnitSystem;
}

/** The message of the first issue at any of these field paths. */
export function issueFinder(store: CaseDraftStore): (...paths: string[]) => string | undefined {
  return (...paths) => store.issueAt(...paths)?.message;
}
