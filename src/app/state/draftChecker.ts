/**
 * The Start plan draft's checker (validateDraft and the schemas under it) and the words of its issues
 * (fieldWords.ts), loaded apart from the first screen: the built-in demo the page opens with was checked
 * at build time (firstPlan.ts), so neither the schema code nor the field words need be in the first load.
 * Once loaded they stay, and later drafts are checked at once.
 */
import type { localiseIssue } from "../fieldWords.js";
import type { validateDraft } from "./validateDraft.js";

export type DraftValidator = typeof validateDraft;

/** The checker and the renderer of its issues in the user's language and units. */
export interface DraftChecker {
  validate: DraftValidator;
  localise: typeof localiseIssue;
}

let loaded: DraftChecker | null = null;
let loading: Promise<DraftChecker> | null = null;

/** The checker when it has loaded, else null. */
export function loadedDraftChecker(): DraftChecker | null {
  return loaded;
}

/** Load the checker and its words (once). */
export function loadDraftChecker(): Promise<DraftChecker> {
  loading ??= Promise.all([import("./validateDraft.js"), import("../fieldWords.js").then(async (m) => (await m.fieldWords, m))]).then(
    ([v, w]) => (loaded = { validate: v.validateDraft, localise: w.localiseIssue }),
  );
  return loading;
}
