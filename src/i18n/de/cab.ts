/** German: cab steps' choice of driver when a helper has its own (loaded with Cab steps) (see en/cab.ts). */
import type { cab } from "../en/cab.js";
import { translation } from "../messages.js";

export const cabDe = translation<typeof cab.en>()({
  stepsFor: "Schritte für",
  headDriver: "Lokführer an der Spitze",
  groupDriver: "Lokführer {name}",
  notchOfGroup: "Fahrstufe, {name}",
});
