/**
 * Hungarian: the words on the tab bar (see en/tabs.ts). Soft hyphens at Hungarian syllable boundaries, in one-word
 * labels only (be-ál-lí-tá-sok, in-du-lá-sok): in a label of two words a line breaks between them; "Lépések"
 * (steps) for the tab of Lépésenként, whose name heads the screen.
 */
import type { tabs } from "../en/tabs.js";
import { translation } from "../messages.js";

export const tabsHu = translation<typeof tabs.en>()({
  startPlan: "Indítási terv",
  cabSteps: "Lépések",
  assistanceCheck: "Rá\u00ADse\u00ADgí\u00ADtés",
  departures: "Indu\u00ADlá\u00ADsok",
  loadTable: "Terhelési táblázat",
  locationNotes: "Helyszíni jegyzetek",
  settings: "Be\u00ADál\u00ADlí\u00ADtá\u00ADsok",
});
