/** Hungarian: cab steps' choice of driver when a helper has its own (loaded with Cab steps) (see en/cab.ts). */
import type { cab } from "../en/cab.js";
import { translation } from "../messages.js";

export const cabHu = translation<typeof cab.en>()({
  stepsFor: "Kinek a lépései",
  headDriver: "Vezető mozdony mozdonyvezetője",
  groupDriver: "{name} mozdonyvezetője",
  notchOfGroup: "Fokozat, {name}",
});
