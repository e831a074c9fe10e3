/** Words for plan steps, shared by the step cards and Cab steps. */
import type { GroupStep, Phase, PlanStep } from "../core/planner/types.js";
import type { Target } from "../core/train/types.js";
import { formatNumber, show, type UnitSystem } from "./format.js";
import { steps } from "../i18n/en/steps.js";
import { tr } from "./i18n.js";
import { words } from "./words.js";
import { groupWords, helperCallWords, helperHoldWords } from "./lines.js";

const t = tr.ns(steps);

/** A phase's name ("Prepare"), in the language on screen. */
export const phaseWord = (p: Phase): string => words.phase(p);

/** What a phase is for, in a line. */
export const phaseLine = (p: Phase): string => words.phaseLine(p);

/** A distance moved: to the decimetre (or tenth of a foot) when short, else whole. */
function moved(m: number, units: UnitSystem): string {
  const shown = show("distance", m, units, 0);
  return Math.abs(m) < (units === "us" ? 3.048 : 10) ? show("distance", m, units, 1) : shown;
}

function targetText(tg: Target | undefined, units: UnitSystem): string {
  if (!tg) return t("theTarget");
  return tg.kind === "speed" ? show("speed", tg.speedMps, units) : t("travelled", { distance: show("distance", tg.distanceM, units) });
}

/** What to watch, with its verb: "Advance after 8 s", "Advance at 5.0 km/h", "Hold until 20.0 km/h". */
export function advanceLead(s: PlanStep, units: UnitSystem, target?: Target): string {
  const a = s.advanceWhen;
  switch (a.primary) {
    case "time":
      return t("advanceAfter", { time: formatNumber(a.afterS, 0) });
    case "moved":
      return t("advanceMoved", { distance: moved(a.movedM, units) });
    case "speed":
      return t("advanceAt", { speed: show("speed", a.speedMps, units) });
    case "target":
      return t("holdUntil", { target: targetText(target, units) });
  }
}

/** The other observable conditions of the step (those set and not leading). */
export function advanceOthers(s: PlanStep, units: UnitSystem): string[] {
  const a = s.advanceWhen;
  const out: string[] = [];
  if (a.primary !== "time" && a.afterS > 0) out.push(t("aboutInStep", { time: formatNumber(a.afterS, 0) }));
  if (a.primary !== "moved" && a.movedM > 0) out.push(t("moved", { distance: moved(a.movedM, units) }));
  if (a.primary !== "speed" && a.primary !== "target" && a.speedMps > 0) out.push(`${show("speed", a.speedMps, units)}`);
  return out;
}

/** Notch as shown: "0" reads as idle. */
export function notchText(n: number): string {
  return n <= 0 ? "0" : String(n);
}

/** Each control group's notch in a step, head first: "head 5 · rear 3". */
export function groupNotchesText(groups: readonly GroupStep[]): string {
  return groups.map((g) => `${groupWords(g.place)} ${notchText(g.notch)}`).join(" · ");
}

/**
 * What a helper's driver does in a step: the step's coordination when the helper's notch changes in it,
 * otherwise hold the notch until the head calls a change.
 */
export function helperLine(g: GroupStep): string {
  return g.coordination ? helperCallWords(g.coordination) : helperHoldWords(notchText(g.notch));
}

/**
 * What a step says to do when a slip keeps returning (the driver first holds the notch while the
 * protection acts): the fallback notch, or shut off when there is no lower notch to drop to.
 */
export function stillSlipping(s: Pick<PlanStep, "notch" | "fallbackNotch">): string {
  if (s.notch <= 0) return "—";
  if (s.fallbackNotch <= 0 || s.fallbackNotch >= s.notch) return t("shutOff");
  return t("dropTo", { notch: s.fallbackNotch });
}

/** The label beside `stillSlipping`. */
export const stillSlippingLabel = (): string => t("stillSlippingLabel");
