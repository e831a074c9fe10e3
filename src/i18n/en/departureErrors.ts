/**
 * The Departures screen's own errors (loaded with it): a row the planner could not answer, and picked
 * files that hold no departures file. The row's place comes first ("line 4", "[3]"), as in the file's
 * own errors (readers.ts); {open} and {close} are an object's braces, {columns} a CSV header.
 */
import { namespace } from "../messages.js";

export const departureErrors = namespace("departureErrors", {
  // A row without an answer.
  cannotBeRead: "cannot be read",
  cannotBeChecked: "cannot be checked",
  // {detail}: the program's own words for a failure that should not happen (a programming error), as they are.
  internalError: "internal error: {detail}",
  plannerStopped: "internal error: the planner stopped unexpectedly",
  // The picked files.
  pickOne: "pick one departures file at a time (got {files})",
  nonePicked: "no file picked",
  noneAmong:
    "no departures file among {files}: a departures file is a CSV ({columns}) or a JSON list of start cases ([ {open}...{close}, {open}...{close} ])",
});
