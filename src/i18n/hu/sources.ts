/** Hungarian: where the numbers come from, as Settings lists it (see en/sources.ts, glossary.hu.md). */
import type { sources } from "../en/sources.js";
import { translation } from "../messages.js";

export const sourcesHu = translation<typeof sources.en>()({
  adhesionSpeed: "A tapadás a sebesség függvényében: {work}",
  adhesionStatistics: "A tapadás mint statisztikai kérdés: {work}",
  runningResistance: "Menetellenállás: {work}",
  curveResistance: "Ívellenállás: a {formula}-képlet, az amerikai gyakorlat fokonkénti szabályával egybevetve.",
  startingResistance: "Indítási ellenállás: {work}",
  traction: "Dízel-elektromos vontatás: {work}",
  trainDynamics: "Hosszirányú vonatdinamika: {work}",
  railCondition: "Sínállapot: {rail} (medián μ {median}, homokolással {sanded}): {source}",
  railNoteMemory: "Emlékezetből [M].",
  railNoteDry: "Emlékezetből [M]; a száraz medián egyezik ezzel: {authors} μ(0) = {mu} ({work}).",
  railNoteDamp: "Emlékezetből [M]; a harmat, a szitálás és a kezdődő eső rosszabb az erős esőnél ({work}).",
  railNoteWet: "Emlékezetből [M]; nedves ≈ {factor} × száraz ({work}).",
  railNoteLeaves: "Emlékezetből [M]; a lomb okozta réteg a súrlódást nagyjából negyedére csökkenti ({work}).",
});
