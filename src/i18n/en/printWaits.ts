/**
 * What a screen printed too early waits for, as the print stamp says it ("Incomplete — wait for {what}.",
 * shell.ts): in the first catalog, as Start plan and Cab steps print it.
 */
import { namespace } from "../messages.js";

export const printWaits = namespace("printWaits", {
  plan: "the plan",
  loadTable: "the load table",
  departures: "every departure to be checked",
});
