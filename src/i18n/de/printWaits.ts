/** German: what a screen printed too early waits for (see en/printWaits.ts; "warten auf: {what}"). */
import type { printWaits } from "../en/printWaits.js";
import { translation } from "../messages.js";

export const printWaitsDe = translation<typeof printWaits.en>()({
  plan: "den Plan",
  loadTable: "die Lasttafel",
  departures: "die Prüfung aller Abfahrten",
});
