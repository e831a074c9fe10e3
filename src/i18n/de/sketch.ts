/** German: the labels drawn on a location's profile (see en/sketch.ts). */
import type { sketch } from "../en/sketch.js";
import { translation } from "../messages.js";

export const sketchDe = translation<typeof sketch.en>()({
  front: "Spitze {distance}",
  clear: "frei {distance} →",
  stretched: "Kupplungen gestreckt",
  bunched: "Kupplungen gestaucht",
  hazard: "Gefahrenstelle (unten nummeriert)",
});
