/**
 * The Hungarian words of Assistance check and Start review: a chunk of their own, loaded with the first of
 * those screens (app/checkWords.ts), so the catalog loaded before the first plan stays small.
 */
import type { Catalog } from "../messages.js";
import { assistHu } from "./assist.js";
import { reviewHu } from "./review.js";
import { failuresHu } from "./failures.js";
import { sourcesHu } from "./sources.js";

export const huChecks: Catalog = { assist: assistHu, review: reviewHu, failures: failuresHu, sources: sourcesHu };
