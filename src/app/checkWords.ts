/**
 * The words of Assistance check and Start review (and of Settings' list of sources) in Hungarian and German: a chunk per language of their
 * own, loaded with the first of those screens (its module awaits `checkWords`), so neither the first plan
 * nor the catalog loaded before it carries them. English is in each screen's own chunk.
 */
import { addCatalogPart } from "./i18n.js";

export const checkWords: Promise<void> = addCatalogPart(async (l) => {
  if (l === "hu") return (await import("../i18n/hu/checks.js")).huChecks;
  if (l === "de") return (await import("../i18n/de/checks.js")).deChecks;
  return null;
});
