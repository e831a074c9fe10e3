/**
 * The planner's lines in words (src/core/planner/lines.ts): a step's why line, a helper's call, the limits'
 * descriptions, the advice, the "If wheels slip" card and its headline, an assistance option's note. One
 * renderer for the app, the command line and the English text of reports; figures with units go through
 * `Quantities` (SI here; the app passes its own units), so the same line reads in metric or US units.
 */
import type { AssistanceNote } from "../core/dispatch/assistance.js";
import type { AddedUnits } from "../core/dispatch/assistPlacement.js";
import type { AdviceLine, BandWhat, ChangeLine, GroupPlace, HelperCall, LimitWhat, SlipHeadline, StepWhy, TargetRef, VehicleRef, WhyLine } from "../core/planner/lines.js";
import type { SlipGuidance } from "../core/planner/types.js";
import { guidance } from "./en/guidance.js";
import { reasons } from "./en/reasons.js";
import type { Translator } from "./translator.js";
import { wordsOf } from "./words.js";

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
    force: (n) => `${tr.num(Math.round(n / 1000), 0)} kN`,
    speed: (mps) => `${tr.num(Number((mps * 3.6).toFixed(1)), 1)} km/h`,
    length: (m, d = 0) => `${tr.num(d === 0 ? Math.round(m) : Number(m.toFixed(d)), d)} m`,
    mass: (kg) => `${tr.num(Math.round(kg / 1000), 0)} t`,
    massAtMost: (kg) => `${tr.num(Math.floor(kg / 1000), 0)} t`,
  };
}

/** A fraction as whole percent ("< 1 %" above zero where it would read 0 when `belowOne`). */
function percent(tr: Translator, x: number, belowOne = false): string {
  const t = tr.ns(reasons);
  return belowOne && x > 0 && x < 0.005 ? t("percentBelowOne") : t("percent", { value: tr.num(Math.round(x * 100), 0) });
}

/** `x` to `d` decimals, rounded as toFixed rounds it (the digits the English text always had). */
const fixed = (tr: Translator, x: number, d: number) => tr.num(Number(x.toFixed(d)), d);
/** A figure with the decimals it has (a factor such as 1.2). */
const asGiven = (tr: Translator, x: number) => tr.num(x, Number.isInteger(x) ? 0 : Math.min(6, String(x).split(".")[1]?.length ?? 0));
const whole = (tr: Translator, x: number) => tr.num(Math.round(x), 0);

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

/** A vehicle: "wagon 12 (24 t)", "unit 3 (locomotive)". */
export function vehicleText(tr: Translator, q: Quantities, v: VehicleRef): string {
  const t = tr.ns(reasons);
  if (v.kind === "wagon") return t("vehicleWagon", { number: String(v.number), mass: q.mass(v.massKg) });
  return v.kind === "unit" ? t("vehicleUnit", { number: String(v.number) }) : t("vehicleOther", { number: String(v.number) });
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
  const t = tr.ns(guidance);
  const name = groupName(tr, c.place);
  const act = c.act === "take" ? t("actTake", { notch: String(c.notch) }) : c.act === "shut-off" ? t("actShutOff") : t("actEase", { notch: String(c.notch) });
  return t(c.stretch ? "helperCallStretch" : "helperCall", { head: String(c.headNotch), name, act, seconds: asGiven(tr, c.followS) });
}

/** A helper's standing order in a step where its notch does not change. */
export function helperHoldText(tr: Translator, notch: string): string {
  return tr.ns(guidance)("helperHold", { notch });
}

/** What a limit checked. */
export function limitWhatText(tr: Translator, q: Quantities, w: LimitWhat): string {
  const t = tr.ns(reasons);
  const f = q.force;
  switch (w.code) {
    case "gravity":
      return t("whatGravity");
    case "adhesion-path":
      return t("whatAdhesion", { quantile: percent(tr, w.quantile), available: f(w.availableN), need: f(w.needN), speed: q.speed(w.speedMps), travel: q.length(w.travelM) });
    case "power-path":
      return t("whatPower", { available: f(w.availableN), need: f(w.needN), speed: q.speed(w.speedMps), travel: q.length(w.travelM) });
    case "hold-rising":
      return t("whatHoldRising", { locoBrake: f(w.locoBrakeN), power: f(w.powerN), pull: f(w.pullN) });
    case "hold-falling":
      return t("whatHoldFalling", { trainBrake: f(w.trainBrakeN), locoBrake: f(w.locoBrakeN), pull: f(w.pullN) });
    case "coupler-tension":
      return t("whatCouplerTension", { peak: f(w.peakN), limit: f(w.limitN), factor: asGiven(tr, w.factor) });
    case "coupler-compression":
      return t("whatCouplerCompression", { peak: f(w.peakN), limit: f(w.limitN), factor: asGiven(tr, w.factor) });
    case "wheel-climb":
      return t("whatWheelClimb", {
        ratio: fixed(tr, w.ratio, 2),
        vehicle: vehicleText(tr, q, w.vehicle),
        force: f(w.forceN),
        radius: q.length(w.radiusM),
        allowance: fixed(tr, w.allowance, 2),
        nadal: fixed(tr, w.nadal, 2),
        margin: asGiven(tr, w.nadalMargin),
      });
    case "wheel-climb-none":
      return t("whatWheelClimbNone");
    case "distance": {
      const key = w.power ? (w.orTarget ? "whatDistancePowerOrTarget" : "whatDistancePower") : w.orTarget ? "whatDistanceGravityOrTarget" : "whatDistanceGravity";
      return t(key, { travel: q.length(w.travelM), clear: q.length(w.clearM) });
    }
    case "target-reached":
      return t("whatTargetReached", { seconds: whole(tr, w.afterS) });
    case "target-not-reached":
      return t("whatTargetNotReached", { share: percent(tr, w.share) });
  }
}

/** The band within which a limit exceeded is marginal. */
export function bandWhatText(tr: Translator, b: BandWhat): string {
  const t = tr.ns(reasons);
  switch (b.code) {
    case "rail-quantile":
      return t("bandRail", { quantile: percent(tr, b.quantile) });
    case "no-reserve":
      return t("bandNoReserve");
    case "no-reserve-bound":
      return t("bandNoReserveBound");
    case "working-limit":
      return t("bandWorkingLimit");
    case "stretch-within-clear":
      return t("bandStretch");
    case "nadal-itself":
      return t("bandNadal");
  }
}

function changeText(tr: Translator, q: Quantities, c: ChangeLine): string {
  const t = tr.ns(reasons);
  switch (c.code) {
    case "sand":
      return t("changeSand", { margin: fixed(tr, c.margin, 2) });
    case "better-rail":
      return t(c.sand ? "changeBetterRailSand" : "changeBetterRail", { margin: fixed(tr, c.margin, 2) });
    case "less-load":
      return t("changeLessLoad", {
        starts: q.massAtMost(c.startsKg),
        marginal: c.marginalKg !== null ? t("lessLoadMarginal", { mass: q.massAtMost(c.marginalKg) }) : "",
        scaled: c.scaled ? t("lessLoadScaled") : "",
      });
    case "less-load-none":
      return t("changeLessLoadNone");
    case "less-load-unsearched":
      return t("changeLessLoadUnsearched");
    case "assistance":
      return t("changeAssistance");
  }
}

/** A line of advice. */
export function adviceText(tr: Translator, q: Quantities, a: AdviceLine): string {
  const t = tr.ns(reasons);
  const w = wordsOf(tr);
  switch (a.code) {
    case "limited-by":
      return t("adviceLimitedBy", { limit: w.limit(a.limit), margin: fixed(tr, a.margin, 2), what: limitWhatText(tr, q, a.what) });
    case "within-band":
      return t("adviceWithinBand", { list: a.limits.map((l) => t("bandItem", { limit: w.limit(l.limit), band: bandWhatText(tr, l.band) })).join("; ") });
    case "relaxed":
      return t("adviceRelaxed", { quantile: percent(tr, a.quantile), oneIn: String(a.oneIn) });
    case "changes":
      return t("adviceChanges", { list: a.changes.map((c) => changeText(tr, q, c)).join("; ") });
  }
}

const pascal = (code: string) => code.replace(/(^|-)([a-z])/g, (_m, _d: string, c: string) => c.toUpperCase());

/** The "If wheels slip" card in words: what the driver does, what the protection does, what to do on a stall. */
export function slipGuidanceText(tr: Translator, g: SlipGuidance): { driver: string[]; protection: string[]; stall: string[] } {
  const t = tr.ns(guidance) as (key: string) => string;
  return {
    driver: g.driver.map((c) => t(`driver${pascal(c)}`)),
    protection: g.protection.map((c) => t(`protection${pascal(c)}`)),
    stall: g.stall.map((c) => t(`stall${pascal(c)}`)),
  };
}

/** The headline for a step: hold, then what next if the slip keeps returning. */
export function slipHeadlineText(tr: Translator, h: SlipHeadline): { hold: string; then: string } {
  const t = tr.ns(guidance);
  const hold = h.hold.code === "no-power" ? t("headNoPower") : t(h.hold.sand ? "headHoldSand" : "headHold", { notch: String(h.hold.notch) });
  const then = h.then.code === "take-power" ? t(h.then.sand ? "headTakePowerSand" : "headTakePower") : t(h.then.code === "shut-off" ? "headShutOff" : "headDrop", { notch: String(h.then.notch) });
  return { hold, then };
}

/** An assistance option's note: how the added units are driven, the peak compression, shoving from the rear. */
export function assistanceNoteText(tr: Translator, q: Quantities, n: AssistanceNote): string {
  const t = tr.ns(reasons);
  if (n.code === "all-at-head") return t("noteAllAtHead");
  const place = (a: AddedUnits) => (a.position === "head" ? t("atHead") : a.position === "rear" ? t("atRear") : t("atAfterWagon", { wagon: String(a.position.afterWagon) }));
  const control = t(n.control === "with-head" ? "controlWithHead" : n.control === "remote" ? "controlRemote" : "controlHelper");
  const units = n.added.reduce((s, a) => s + a.count, 0);
  const who =
    n.added.length > 1
      ? t("noteUnitsMany", { list: n.added.map((a) => t("noteCountAt", { count: String(a.count), place: place(a) })).join(", "), control })
      : units === 1
        ? t("noteUnitOne", { place: place(n.added[0]!), control })
        : t("noteUnitsSame", { count: String(units), place: place(n.added[0]!), control });
  const where = n.where === null ? "" : t(n.where === "head" ? "nearHead" : n.where === "mid" ? "midTrain" : "nearRear");
  return [who, t("notePeak", { peak: q.force(n.peakN), where, coupling: String(n.coupling), couplings: String(n.couplings) }), n.rear ? t("noteShoving") : ""].filter((s) => s.length > 0).join(" ");
}
