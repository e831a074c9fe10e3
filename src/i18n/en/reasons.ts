/**
 * The planner's reasons in words (src/core/planner/lines.ts, limitLines.ts; the assistance notes of
 * src/core/dispatch/assistance.ts): a step's why line, the limits' descriptions, the advice, group and
 * vehicle names. Figures come in already written with their units ({force}, {speed}, {distance}, {mass}) so
 * the app can show its own units; seconds, m/s² and percentages are written here.
 */
import { namespace } from "../messages.js";

export const reasons = namespace("reasons", {
  percent: "{value} %",
  percentBelowOne: "< 1 %",
  // A step's why line.
  release: "the train brake releases along {length} in about {seconds} s",
  sandBefore: "; sand before the wheels turn",
  whyPrepareHoldBack: "Grade pulls the train back with {pull} more than its brakes-off resistance holds: notch {notch} ({notchForce}) with the locomotive brake ({locoBrake}) holds it while {release}{sand}.",
  whyPrepareGravityLocoBrake:
    "On this falling grade the released train pulls forward with {pull}; the locomotive brake holds up to {locoBrake}, enough: keep it applied while {release}. No power is needed: easing the locomotive brake off starts the train.",
  whyPrepareGravityTrainBrake:
    "On this falling grade the released train pulls forward with {pull}; the locomotive brake holds only {locoBrake} of it, so it cannot hold the train. Keep the train brake applied and release it in stages where the brake allows it (graduated release): the train starts once about {share} % of the train brake's {trainBrake} is left. No power is needed.",
  whyPrepareBrakesOff: "No power on a standing train until its brakes are off: the locomotive brake holds while {release}{sand}.",
  stretchTravel: "the last vehicle moves after about {travel} of locomotive travel",
  stretchWagonByWagon: "the slack comes out wagon by wagon",
  stretchTooFast: " The locomotive runs faster than {speed} here even in the lowest notch that moves the train: check it with the locomotive brake.",
  whyStretch: "Notch {notch} gives {effort} against {resistance} to start the whole train at once: wagons break away one by one at walking pace and {travel}; peak coupler {peak} of {allowance} allowed.{tooFast}",
  buildDwell: " — at least {seconds} s per notch",
  whyBuild: "At {speed} notch {notch} asks {effort}, {use} of the median adhesion there (slip risk {risk}); advance only once the current has settled{dwell}; peak coupler {peak} of {allowance} allowed.",
  toSpeed: "to {speed}",
  untilCleared: "until the train has cleared {distance}",
  higherNoMore: " A higher notch would ask more than a poor rail gives, or is not needed.",
  whyAccelerate: "Hold notch {notch} {to}: {effort} against the running, grade and curve resistance accelerates the stretched train; slip risk {risk}.{higher}",
  rollControl: "control the speed with the train brake and the locomotive brake",
  rollControlStaged: "control the speed with the train brake (eased in stages) and the locomotive brake",
  rollTargetDistance: "the {distance} target",
  whyRollThenPower: "No power yet: gravity accelerates the train at about {accel} m/s² to {speed} after about {travel}; {control}. Beyond that it needs power to reach {target}.",
  rollWithin: "within the {clear} clear ahead",
  rollBeyond: "beyond the {clear} clear ahead: have it under control before then",
  whyRollToTarget: "No power: gravity accelerates the train at about {accel} m/s²; {control}. It reaches {target} after about {travel} of travel, {within}; then hold the speed on the brakes.",
  protection: " It asks {asks}, more than a poor rail gives ({gives}): the slip protection may act (chance {risk}), holding the effort there; expect slips, hold the notch and sand.{still}",
  protectionStill: " No wheelspin at a standstill: it burns the rail.",
  groupNotches: " Notches {notches} ({shares} of the effort).",
  placeHead: "head",
  placeRear: "rear",
  placeAfterWagon: "after wagon {wagon}",
  placeHelper: "{place} helper",
  allUnits: "all units",
  // A helper's notch change, and a helper's standing order.
  helperCall: "The head takes notch {head} first and calls the {name} by radio; the {name} {act} about {seconds} s later, and confirms.",
  helperCallStretch: "The head takes notch {head} first and calls the {name} by radio; the {name} {act} about {seconds} s later, or as soon as the head reports the train moving, whichever comes first, and confirms.",
  actTake: "takes notch {notch}",
  actShutOff: "shuts off",
  actEase: "eases to notch {notch}",
  helperHold: "Hold notch {notch}; the head driver calls any change by radio.",
});
