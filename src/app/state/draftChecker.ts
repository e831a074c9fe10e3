/**
 * The Start plan draft's checker (validateDraft and the schemas under it), loaded apart from the first
 * screen: the built-in demo the page opens with was checked at build time (firstPlan.ts), so the schema
 * code need not be in the first load. Once loaded it stays, and later drafts are checked at once.
 */
import type { validateDraft } from "./validateDraft.js";

export type DraftValidator = typeof validateDraft;

let loaded: DraftValidator | null = null;
let loading: Promise<DraftValidator> | null = null;

/** The checker when it has loaded, else null. */
export function loadedDraftChecker(): DraftValidator | null {
  return loaded;
}

/** Load the checker (once). */
export function loadDraftChecker(): Promise<DraftValidator> {
  loading ??= import("./validateDraft.js").then((m) => (loaded = m.validateDraft));
  return loading;
}
