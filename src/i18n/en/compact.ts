/**
 * Short words for where a screen has little room: the label before a figure in Departures' compact cards
 * (portrait), where the table's column heading would take a line of its own; a departure's line in its CSV.
 */
import { namespace } from "../messages.js";

export const compact = namespace("compact", {
  margin: "margin",
  largest: "largest",
  fileLine: "line {line}",
});
