/** German: short words for where a screen has little room (see en/compact.ts). */
import type { compact } from "../en/compact.js";
import { translation } from "../messages.js";

export const compactDe = translation<typeof compact.en>()({
  margin: "Reserve",
  largest: "höchstens",
  fileLine: "Zeile {line}",
});
