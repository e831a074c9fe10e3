/** German: why a request to the planner gave no answer (see en/failures.ts, glossary.de.md). */
import type { failures } from "../en/failures.js";
import { translation } from "../messages.js";

export const failuresDe = translation<typeof failures.en>()({
  marginsFailed: "Reserven je Schienenzustand: {why}",
  searchFailed: "Suche nach Zusatzloks: {why}",
  caseRefused: "der Planer kann diesen Fall nicht prüfen",
  caseRefusedBecause: "der Planer kann diesen Fall nicht prüfen ({issues})",
  internalError: "interner Fehler: {detail}",
  plannerStopped: "der Planer hat unerwartet angehalten",
});
