/** The labels drawn on a location's profile (the card's sketch and the editor's chart): the front, the clear distance, the legend. */
import { namespace } from "../messages.js";

export const sketch = namespace("sketch", {
  front: "front {distance}",
  clear: "clear {distance} →",
  stretched: "couplings stretched",
  bunched: "couplings bunched",
  hazard: "hazard (numbered below)",
});
