/**
 * What the railML reader, the stretch and the import worker say (the railmlText namespace), in Hungarian
 * and German: a small chunk per language, loaded with the Location notes screen (it awaits this), so the
 * import's problems, warnings and the words it writes into a note read in the language on screen. English
 * is in the screen's own chunk (profiles/railml/text.ts).
 */
import { addCatalogPart } from "../../../i18n.js";

export const railmlTextWords: Promise<void> = addCatalogPart(async (l) => {
  if (l === "hu") return { railmlText: (await import("../../../../i18n/hu/railmlText.js")).railmlTextHu };
  if (l === "de") return { railmlText: (await import("../../../../i18n/de/railmlText.js")).railmlTextDe };
  return null;
});
