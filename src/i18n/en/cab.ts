/** Cab steps' choice of driver when a helper has its own (loaded with Cab steps). */
import { namespace } from "../messages.js";

export const cab = namespace("cab", {
  stepsFor: "Steps for",
  headDriver: "Head driver",
  groupDriver: "{name} driver",
  notchOfGroup: "Notch, {name}",
});
