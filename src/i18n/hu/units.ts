/** Hungarian: unit names written out (see en/units.ts). */
import type { units } from "../en/units.js";
import { translation } from "../messages.js";

// "rövid tonna" (2000 font), the usual Hungarian name of the US ton; from memory.
export const unitsHu = translation<typeof units.en>()({
  shortTon: "rövid tonna",
});
