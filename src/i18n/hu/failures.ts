/** Hungarian: why a request to the planner gave no answer (see en/failures.ts, glossary.hu.md). */
import type { failures } from "../en/failures.js";
import { translation } from "../messages.js";

export const failuresHu = translation<typeof failures.en>()({
  marginsFailed: "Tartalékok sínállapotonként: {why}",
  searchFailed: "Rásegítés keresése: {why}",
  caseRefused: "a tervező nem tudja ellenőrizni ezt az esetet",
  caseRefusedBecause: "a tervező nem tudja ellenőrizni ezt az esetet ({issues})",
  internalError: "belső hiba: {detail}",
  plannerStopped: "a tervező váratlanul leállt",
});
