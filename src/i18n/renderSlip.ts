/**
 * The "If wheels slip" card (src/core/planner/slip.ts) and its headline for a step, in the translator's
 * language: one renderer for the app's card (Cab steps) and the command line's printout.
 */
import type { SlipHeadline } from "../core/planner/lines.js";
import type { SlipGuidance } from "../core/planner/types.js";
import { guidance } from "./en/guidance.js";
import type { Translator } from "./translator.js";

const pascal = (code: string) => code.replace(/(^|-)([a-z])/g, (_m, _d: string, c: string) => c.toUpperCase());

/** The card in words: what the driver does, what the protection does, what to do on a stall. */
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

