/**
 * The planner's lines in words (src/core/planner/lines.ts): a step's why line, a helper's call (the limits'
 * descriptions and the advice are in renderAdvice.ts, the If wheels slip card in renderSlip.ts, an
 * assistance option's note in renderAssistNote.ts — apart, so their words load with what shows them). One
 * renderer for the app, the command line and the English text of reports; figures with units go through
 * `Quantities` (SI here; the app passes its own units), so the same line reads in metric or US units.
 */
import type { GroupPlace, HelperCall, StepWhy, TargetRef, WhyLine } from "../core/planner/lines.js";
import { reasons } from "./en/reasons.js";
import type { Translator } from "./translator.js";
import { forceKN, wholePercent } from "./rounding.js";

/** Figures with their units, as the reader's units write them. */
export interface Quantities {
  /** A force: "115 kN". */
  force(n: number): string;
  /** A speed to a tenth: "12.3 km/h". */
  speed(mps: number): string;
  /** A length, whole or to `decimals`: "414 m". */
  length(m: number, decimals?: number): string;
  /** A mass, whole: "24 t". */
  mass(kg: number): string;
  /** A largest mass, rounded down: "2419 t". */
  massAtMost(kg: number): string;
}

/** SI figures in the translator's language: kN, km/h, m, t (as the command line and the reports write them). */
export function siQuantities(tr: Translator): Quantities {
  return {
    force: (n) => `${tr.num(forceKN(n), 0)} kN`,
    speed: (mps) => `${tr.num(Number((mps * 3.6).toFixed(1)), 1)} km/h`,
    length: (m, d = 0) => `${tr.num(d === 0 ? Math.round(m) : Number(m.toFixed(d)), d)} m`,
    mass: (kg) => `${tr.num(Math.round(kg / 1000), 0)} t`,
    massAtMost: (kg) => `${tr.num(Math.floor(kg / 1000), 0)} t`,
  };
}

/** A fraction as whole percent ("< 1 %" above zero where it would read 0 when `belowOne`). */
export function percent(tr: Translator, x: number, belowOne = false): string {
  const t = tr.ns(reasons);
  const p = wholePercent(x);
  return p === null ? (belowOne ? t("percentBelowOne") : t("percent", { value: tr.num(0, 0) })) : t("percent", { value: tr.num(p, 0) });
}

/** `x` to `d` decimals, rounded as toFixed rounds it (the digits the English text always had). */
export const fixed = (tr: Translator, x: number, d: number) => tr.num(Number(x.toFixed(d)), d);
/** A figure with the decimals it has (a factor such as 1.2). */
export const asGiven = (tr: Translator, x: number) => tr.num(x, Number.isInteger(x) ? 0 : Math.min(6, String(x).split(".")[1]?.length ?? 0));
export const whole = (tr: Translator, x: number) => tr.num(Math.round(x), 0);

/** A control group's name: "head", "rear", "after wagon 30", "rear helper". */
export function groupName(tr: Translator, p: GroupPlace): string {
  const t = tr.ns(reasons);
  const place = p.at === "head" ? t("placeHead") : p.at === "rear" ? t("placeRear") : t("placeAfterWagon", { wagon: String(p.at.afterWagon) });
  return p.helper ? t("placeHelper", { place }) : place;
}

/** An effort split's name: a group's, or "all units". */
export function splitName(tr: Translator, p: GroupPlace | "all"): string {
  return p === "all" ? tr.ns(reasons)("allUnits") : groupName(tr, p);
}

function targetWords(tr: Translator, q: Quantities, tg: TargetRef, roll: boolean): string {
  const t = tr.ns(reasons);
  if (tg.kind === "speed") return roll ? q.speed(tg.speedMps) : t("toSpeed", { speed: q.speed(tg.speedMps) });
  return roll ? t("rollTargetDistance", { distance: q.length(tg.distanceM) }) : t("untilCleared", { distance: q.length(tg.distanceM) });
}

/** The line of a step's why, without its protection and group parts. */
export function whyLineText(tr: Translator, q: Quantities, w: WhyLine): string {
  const t = tr.ns(reasons);
  const f = q.force;
  const release = (lengthM: number, releaseS: number) => t("release", { length: q.length(lengthM), seconds: whole(tr, releaseS) });
  switch (w.code) {
    case "prepare-hold-back":
      return t("whyPrepareHoldBack", { pull: f(w.pullN), notch: String(w.notch), notchForce: f(w.notchN), locoBrake: f(w.locoBrakeN), release: release(w.lengthM, w.releaseS), sand: w.sand ? t("sandBefore") : "" });
    case "prepare-gravity-loco-brake":
      return t("whyPrepareGravityLocoBrake", { pull: f(w.pullN), locoBrake: f(w.locoBrakeN), release: release(w.lengthM, w.releaseS) });
    case "prepare-gravity-train-brake":
      return t("whyPrepareGravityTrainBrake", { pull: f(w.pullN), locoBrake: f(w.locoBrakeN), share: whole(tr, w.sharePercent), trainBrake: f(w.trainBrakeN) });
    case "prepare-brakes-off":
      return t("whyPrepareBrakesOff", { release: release(w.lengthM, w.releaseS), sand: w.sand ? t("sandBefore") : "" });
    case "stretch":
      return t("whyStretch", {
        notch: String(w.notch),
        effort: f(w.effortN),
        resistance: f(w.resistanceN),
        travel: w.stretchTravelM !== null ? t("stretchTravel", { travel: q.length(w.stretchTravelM, 1) }) : t("stretchWagonByWagon"),
        peak: f(w.peakN),
        allowance: f(w.allowanceN),
        tooFast: w.fastOverMps !== null ? t("stretchTooFast", { speed: q.speed(w.fastOverMps) }) : "",
      });
    case "build":
      return t("whyBuild", {
        speed: q.speed(w.atMps),
        notch: String(w.notch),
        effort: f(w.asksN),
        use: percent(tr, w.use, true),
        risk: percent(tr, w.risk, true),
        dwell: w.dwellS !== null ? t("buildDwell", { seconds: whole(tr, w.dwellS) }) : "",
        peak: f(w.peakN),
        allowance: f(w.allowanceN),
      });
    case "accelerate":
      return t("whyAccelerate", { notch: String(w.notch), to: targetWords(tr, q, w.target, false), effort: f(w.effortN), risk: percent(tr, w.risk, true), higher: w.higherNoMore ? t("higherNoMore") : "" });
    case "roll-then-power":
      return t("whyRollThenPower", { accel: fixed(tr, w.accelMps2, 2), speed: q.speed(w.toMps), travel: q.length(w.travelM), control: t(w.staged ? "rollControlStaged" : "rollControl"), target: targetWords(tr, q, w.target, true) });
    case "roll-to-target":
      return t("whyRollToTarget", {
        accel: fixed(tr, w.accelMps2, 2),
        control: t(w.staged ? "rollControlStaged" : "rollControl"),
        target: targetWords(tr, q, w.target, true),
        travel: q.length(w.travelM),
        within: t(w.travelM <= w.clearM ? "rollWithin" : "rollBeyond", { clear: q.length(w.clearM) }),
      });
  }
}

/** A step's why in full: its line, then the slip protection where it acts, then each group's notch and share. */
export function stepWhyText(tr: Translator, q: Quantities, w: StepWhy): string {
  const t = tr.ns(reasons);
  let out = whyLineText(tr, q, w.line);
  const p = w.protection;
  if (p) out += t("protection", { asks: q.force(p.asksN), gives: q.force(p.givesN), risk: percent(tr, p.risk, true), still: p.standstill ? t("protectionStill") : "" });
  if (w.groups) {
    out += t("groupNotches", {
      notches: w.groups.map((g) => `${groupName(tr, g.place)} ${g.notch}`).join(" · "),
      shares: w.groups.map((g) => `${groupName(tr, g.place)} ${percent(tr, g.share, true)}`).join(", "),
    });
  }
  return out;
}

/** A helper's call: the head takes its notch and calls the helper, who follows a few seconds later. */
export function helperCallText(tr: Translator, c: HelperCall): string {
  const t = tr.ns(reasons);
  const name = groupName(tr, c.place);
  const act = c.act === "take" ? t("actTake", { notch: String(c.notch) }) : c.act === "shut-off" ? t("actShutOff") : t("actEase", { notch: String(c.notch) });
  return t(c.stretch ? "helperCallStretch" : "helperCall", { head: String(c.headNotch), name, act, seconds: asGiven(tr, c.followS) });
}

/** A helper's standing order in a step where its notch does not change. */
export function helperHoldText(tr: Translator, notch: string): string {
  return tr.ns(reasons)("helperHold", { notch });
}
