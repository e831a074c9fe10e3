/** German: the Departures screen's own errors (see en/departureErrors.ts, glossary.de.md). */
import type { departureErrors } from "../en/departureErrors.js";
import { translation } from "../messages.js";

export const departureErrorsDe = translation<typeof departureErrors.en>()({
  cannotBeRead: "nicht lesbar",
  cannotBeChecked: "nicht prüfbar",
  internalError: "interner Fehler: {detail}",
  plannerStopped: "interner Fehler: der Planer hat unerwartet angehalten",
  pickOne: "bitte nur eine Abfahrtsdatei auf einmal wählen (gewählt: {files})",
  nonePicked: "keine Datei gewählt",
  noneAmong:
    "keine Abfahrtsdatei unter {files}: eine Abfahrtsdatei ist eine CSV ({columns}) oder eine JSON-Liste von Anfahrfällen ([ {open}...{close}, {open}...{close} ])",
});
