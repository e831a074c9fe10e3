/** Hungarian: the labels drawn on a location's profile (see en/sketch.ts). */
import type { sketch } from "../en/sketch.js";
import { translation } from "../messages.js";

export const sketchHu = translation<typeof sketch.en>()({
  front: "eleje {distance}",
  clear: "szabad {distance} →",
  stretched: "kifeszített kapcsolatok",
  bunched: "összetolt kapcsolatok",
  hazard: "veszély (számozva lent)",
});
