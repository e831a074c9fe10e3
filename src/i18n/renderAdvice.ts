/**
 * The planner's advice (src/core/planner/lines.ts AdviceLine) and the limits' descriptions (limitLines.ts) in
 * the translator's language and the reader's units: one renderer for the app, the command line and the
 * English text of reports.
 */
import type { AdviceLine, BandWhat, ChangeLine, LimitWhat, VehicleRef } from "../core/planner/lines.js";
import { advice } from "./en/advice.js";
import { asGiven, fixed, percent, whole, type Quantities } from "./renderLines.js";
import type { Translator } from "./translator.js";
import { wordsOf } from "./words.js";

/** A vehicle: "wagon 12 (24 t)", "unit 3 (locomotive)". */
export function vehicleText(tr: Translator, q: Quantities, v: VehicleRef): string {
  const t = tr.ns(advice);
  if (v.kind === "wagon") return t("vehicleWagon", { number: String(v.number), mass: q.mass(v.massKg) });
  return v.kind === "unit" ? t("vehicleUnit", { number: String(v.number) }) : t("vehicleOther", { number: String(v.number) });
}

/** What a limit checked. */
export function limitWhatText(tr: Translator, q: Quantities, w: LimitWhat): string {
  const t = tr.ns(advice);
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
  const t = tr.ns(advice);
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
  const t = tr.ns(advice);
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
  const t = tr.ns(advice);
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
