/** Hungarian: what a screen printed too early waits for (see en/printWaits.ts; "várjon: {what}"). */
import type { printWaits } from "../en/printWaits.js";
import { translation } from "../messages.js";

export const printWaitsHu = translation<typeof printWaits.en>()({
  plan: "a tervre",
  loadTable: "a terhelési táblázatra",
  departures: "minden indulás ellenőrzésére",
});
