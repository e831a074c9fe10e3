/** Hungarian: the sensitivity table's rows (see en/sensitivity.ts, glossary.hu.md). */
import type { sensitivity } from "../en/sensitivity.js";
import { translation } from "../messages.js";

export const sensitivityHu = translation<typeof sensitivity.en>()({
  mass: "vontatott tömeg {change}",
  adhesion: "tapadás {change}",
  grade: "lejtviszony {change}",
  slack: "kapcsolási hézag kapcsolatonként {change}",
});
