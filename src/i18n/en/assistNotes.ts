/** An assistance option's note (src/core/dispatch/assistance.ts AssistanceNote), in words. */
import { namespace } from "../messages.js";

export const assistNotes = namespace("assistNotes", {
  noteAllAtHead: "All power at the head: the head couplings carry the whole train's pull.",
  noteUnitsMany: "The units added ({list}) work {control}.",
  noteUnitOne: "The unit added {place} works {control}.",
  noteUnitsSame: "The {count} units added {place} work {control}.",
  noteCountAt: "{count} {place}",
  atHead: "at the head",
  atRear: "at the rear",
  atAfterWagon: "after wagon {wagon}",
  controlWithHead: "in step with the head (same notch)",
  controlRemote: "as remote power (own notch, set from the head cab)",
  controlHelper: "as a helper (own driver; each notch change called by radio from the head)",
  notePeak: "Peak compression {peak} {where} (coupling {coupling} of {couplings}).",
  nearHead: "near the head",
  midTrain: "mid-train",
  nearRear: "near the rear",
  noteShoving: "Shoving from the rear raises compression ahead of the pushing units: watch lateral forces on curves, especially with light wagons near the head.",
});
