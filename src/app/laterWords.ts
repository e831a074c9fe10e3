/**
 * The words of the screens opened later (Departures, Location notes) in Hungarian and German: a chunk per
 * language, loaded with the first of those screens (its module awaits `laterWords`), so neither the first
 * plan nor the catalog loaded before it carries them. English is in each screen's own chunk.
 */
import { addCatalogPart } from "./i18n.js";

export const laterWords: Promise<void> = addCatalogPart(async (l) => {
  if (l === "hu") return (await import("../i18n/hu/later.js")).huLater;
  if (l === "de") return (await import("../i18n/de/later.js")).deLater;
  return null;
});
