/** German: the sensitivity table's rows (see en/sensitivity.ts, glossary.de.md). */
import type { sensitivity } from "../en/sensitivity.js";
import { translation } from "../messages.js";

export const sensitivityDe = translation<typeof sensitivity.en>()({
  mass: "Anhängelast {change}",
  adhesion: "Kraftschluss {change}",
  grade: "Neigung {change}",
  slack: "Kupplungsspiel je Kupplung {change}",
});
