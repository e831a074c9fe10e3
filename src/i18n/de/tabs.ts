/**
 * German: the words on the tab bar (see en/tabs.ts). Soft hyphens at compound and syllable boundaries
 * (Anfahr-plan, Orts-notizen, Ein-stel-lungen); "Schritte" for the tab of Schritt für Schritt and
 * "Zusatzlok" for Zusatzlok-Prüfung, whose full names head their screens.
 */
import type { tabs } from "../en/tabs.js";
import { translation } from "../messages.js";

export const tabsDe = translation<typeof tabs.en>()({
  startPlan: "Anfahr\u00ADplan",
  cabSteps: "Schritte",
  assistanceCheck: "Zusatz\u00ADlok",
  departures: "Ab\u00ADfahr\u00ADten",
  loadTable: "Last\u00ADtafel",
  locationNotes: "Orts\u00ADnotizen",
  settings: "Ein\u00ADstel\u00ADlungen",
});
