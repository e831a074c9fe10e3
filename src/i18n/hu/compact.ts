/** Hungarian: short words for where a screen has little room (see en/compact.ts). */
import type { compact } from "../en/compact.js";
import { translation } from "../messages.js";

export const compactHu = translation<typeof compact.en>()({
  margin: "tartalék",
  largest: "legfeljebb",
  fileLine: "{line}. sor",
});
