/**
 * Why a request to the planner gave no answer, as the Assistance check says it (loaded with it): the part
 * that failed, then why — a case the planner refused (its issues: the work cap's refusal), a failure inside
 * the program (its own words, {detail}, shown as they are), or a planner that stopped.
 */
import { namespace } from "../messages.js";

export const failures = namespace("failures", {
  marginsFailed: "Margins per rail condition: {why}",
  searchFailed: "Assistance search: {why}",
  caseRefused: "the planner cannot check this case",
  caseRefusedBecause: "the planner cannot check this case ({issues})",
  internalError: "internal error: {detail}",
  plannerStopped: "the planner stopped unexpectedly",
});
