/** German: unit names written out (see en/units.ts). */
import type { units } from "../en/units.js";
import { translation } from "../messages.js";

// "US-Tonnen" (short tons of 2000 lb); "amerikanische Tonnen" also heard; from memory.
export const unitsDe = translation<typeof units.en>()({
  shortTon: "US-Tonnen",
});
