/**
 * The German words of Assistance check and Start review: a chunk of their own, loaded with the first of
 * those screens (app/checkWords.ts), so the catalog loaded before the first plan stays small.
 */
import type { Catalog } from "../messages.js";
import { assistDe } from "./assist.js";
import { reviewDe } from "./review.js";
import { failuresDe } from "./failures.js";
import { sourcesDe } from "./sources.js";

export const deChecks: Catalog = { assist: assistDe, review: reviewDe, failures: failuresDe, sources: sourcesDe };
