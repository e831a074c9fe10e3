/**
 * The planner's advice in words (src/core/planner/lines.ts AdviceLine): why the verdict is what it is and what
 * would change it, with the limits' descriptions (limitLines.ts) and the plan printout's lines around them.
 * Apart from reasons.ts: the app loads these words only when a plan has advice to show.
 */
import { namespace } from "../messages.js";

export const advice = namespace("advice", {
  scalingLoads: " (scaling the load above tare of every wagon group, in proportion)",
  wheelClimbLine: "Wheel climb: L/V {ratio} at {vehicle} under {force} of buff on a {radius} curve (allowed {allowance}: Nadal's limit {nadal} ÷ 1.2)",
  vehicleWagon: "wagon {number} ({mass})",
  vehicleUnit: "unit {number} (locomotive)",
  vehicleOther: "vehicle {number}",
  whatGravity: "no effort needed: gravity alone takes the train to its target",
  whatAdhesion: "rail at its {quantile} quantile: {available} against {need} needed at {speed} after {travel}",
  whatPower: "full notch: {available} against {need} needed at {speed} after {travel} (10 % kept in hand)",
  whatHoldRising: "rising grade: locomotive brake {locoBrake} and power {power} hold against {pull} pulling back (10 % kept in hand)",
  whatHoldFalling: "falling grade: train brake {trainBrake} and locomotive brake {locoBrake} hold against {pull} pulling forward (10 % kept in hand)",
  whatCouplerTension: "peak pull {peak} against {limit} ÷ {factor}",
  whatCouplerCompression: "peak push {peak} against {limit} ÷ {factor}",
  whatWheelClimb: "L/V {ratio} at {vehicle} under {force} of buff on a {radius} curve, against {allowance} (Nadal's limit {nadal} ÷ {margin})",
  whatWheelClimbNone: "no coupling in buff on a curve",
  whatDistancePower: "{travel} of travel to the running notch, {clear} clear ahead",
  whatDistancePowerOrTarget: "{travel} of travel to the running notch or the target, {clear} clear ahead",
  whatDistanceGravity: "{travel} of travel to the whole train moving, {clear} clear ahead",
  whatDistanceGravityOrTarget: "{travel} of travel to the whole train moving or the target, {clear} clear ahead",
  whatTargetReached: "target reached {seconds} s after taking power",
  whatTargetNotReached: "target not reached: {share} of it at best",
  bandRail: "the rail at its {quantile} quantile",
  bandNoReserve: "no reserve",
  bandNoReserveBound: "no reserve, the rail at the marginal bound",
  bandWorkingLimit: "the working limit",
  bandStretch: "the stretch within the clear distance",
  bandNadal: "Nadal's limit itself",
  adviceLimitedBy: "Limited by {limit} (margin {margin}): {what}.",
  adviceWithinBand: "Exceeded within its band: {list}. Brief the start carefully.",
  bandItem: "{limit} (marginal up to {band})",
  adviceRelaxed:
    "The plan shown assumes the rail gives at least its {quantile} quantile: about one start in {oneIn} the rail gives less, the slip protection keeps acting and the train may stall. Have help arranged.",
  adviceChanges: "What would change it: {list}.",
  changeSand: "sand (adhesion and power margin with sand {margin})",
  changeBetterRail: "a better rail (dry: margin {margin})",
  changeBetterRailSand: "a better rail (dry with sand: margin {margin})",
  changeLessLoad: "less load: {starts} or less starts{marginal}{scaled}",
  lessLoadMarginal: ", {mass} or less is at least marginal",
  lessLoadScaled: " (every wagon group's load above tare scaled in proportion)",
  changeLessLoadNone: "less load will not do it: not even a lightly loaded train of these wagons starts here",
  changeLessLoadUnsearched: "less load",
  changeAssistance: "assistance (more units at the head, mid-train or at the rear)",
});
