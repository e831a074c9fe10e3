/** The cautions the core gives as codes (src/core/planner/cautions.ts), in words. */
import { namespace } from "../messages.js";

export const cautions = namespace("cautions", {
  advisory: "Advisory only. Operating rules, timetables, special and local instructions, the locomotive's own instructions and the driver's judgement always prevail. Taut never authorises a movement.",
  decisions: "Decisions on assistance, dividing the train or reducing the load belong to those your railway's rules name.",
  statistical: "Adhesion is statistical and every figure here is an estimate with wide uncertainty: read the margins, not a single 'safe' number.",
  brief: "Plan and brief before departure. Use of a device in the cab follows local rules; nothing here needs input while the train moves.",
  fallingGrade: "On this falling grade the train will move when its brakes release: control the start with the brakes, not with power.",
  locoBrakeCannotHold:
    "The locomotive brake alone cannot hold this train here: a heavy train on a falling grade is held on the train brake. Ease the train brake in stages only where it allows graduated release; a brake that releases fully once released (direct release) cannot be eased that way: follow the local instructions for starting on this grade.",
  sandPoints: "Do not sand over points or crossings; heavy sanding can insulate track circuits. Check the sand boxes before departure.",
  risingGrade: "Rising grade: hold on the locomotive brake in a low notch while the train brake releases; do not start by first bunching the slack.",
  sharpCurve: "Sharp curve under or ahead of the train: take power one notch at a time; a sudden pull can lift light wagons off the inside rail.",
  protectionActs: {
    one: "In one step the notch asks for more than the rail may give: the slip protection is expected to act (it trims the effort to what the rails give and reapplies). Expect repeated slips there; hold the notch and sand while it copes, and drop a notch only if the slipping keeps returning.",
    other: "In {count} steps the notch asks for more than the rail may give: the slip protection is expected to act (it trims the effort to what the rails give and reapplies). Expect repeated slips there; hold the notch and sand while it copes, and drop a notch only if the slipping keeps returning.",
  },
  protectionStandstill: " At a standstill never let the wheels spin: it burns the rail and the wheels.",
  heating: "The plan holds traction current above the continuous rating at low speed for up to {time} s: keep within the locomotive's short-time ratings and do not hold power on a train that is not moving.",
});
