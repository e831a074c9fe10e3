/** Hungarian: the Departures screen's own errors (see en/departureErrors.ts, glossary.hu.md). */
import type { departureErrors } from "../en/departureErrors.js";
import { translation } from "../messages.js";

export const departureErrorsHu = translation<typeof departureErrors.en>()({
  cannotBeRead: "nem olvasható",
  cannotBeChecked: "nem ellenőrizhető",
  internalError: "belső hiba: {detail}",
  plannerStopped: "belső hiba: a tervező váratlanul leállt",
  pickOne: "egyszerre egy indulásfájlt válasszon (kiválasztva: {files})",
  nonePicked: "nincs kiválasztott fájl",
  noneAmong:
    "a(z) {files} között nincs indulásfájl: az indulásfájl CSV ({columns}) vagy indítási esetek JSON-listája ([ {open}...{close}, {open}...{close} ])",
});
