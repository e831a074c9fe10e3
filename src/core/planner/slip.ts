/**
 * The "If wheels slip" card, in our own words, from PRACTICE.md "Wheel slip" and "Starting". It leads
 * with what the driver does, in the order it is done — hold the notch while the protection acts, sand,
 * drop to the step's fallback notch only if the slip keeps returning, wait for the current to settle —
 * and gives what the locomotive's protection does as the reason for holding. The headline for a step
 * (`slipHeadline`) says the same thing in one line, so the card never tells the driver two things at once.
 */
import type { SlipGuidance } from "./types.js";
import type { SlipDriverLine, SlipHeadline, SlipProtectionLine, SlipStallLine } from "./lines.js";

export interface SlipContext {
  sand: boolean;
  sanders: boolean;
  risingGrade: boolean;
  /** Points or crossings ahead where sand must not be laid. */
  pointsAhead: boolean;
}

export function slipGuidance(ctx: SlipContext): SlipGuidance {
  // What you do, in order (PRACTICE.md: hold the notch and sand on electronically controlled units; reduce
  // the throttle on continued slip; a lower notch sometimes pulls better; never advance while the current rises):
  // hold the notch while the protection acts; sand (or, without sanders, be ready to ease off sooner); drop to
  // the fallback notch if the slip keeps returning; wait for the current to settle; never spin at a standstill.
  const driver: SlipDriverLine[] = ["hold-notch", ctx.sanders ? (ctx.sand ? "keep-sanding" : "sand-now") : "no-sanders-ease", "drop-fallback", "wait-settle", "no-spin"];
  // No sand over points and crossings (track circuits).
  if (ctx.pointsAhead) driver.push("stop-sanding-points");
  // Why you hold: the protection is already reducing power (builder's manual [S], PRACTICE.md): it sands by
  // itself where fitted, cuts power sharply, then reapplies it near where the slip began.
  const protection: SlipProtectionLine[] = [ctx.sanders ? "sands-itself" : "no-sanders-only-power", "cuts-power", "reapplies"];
  // A stall: secure the train first (on a rising grade with both brakes), suspect a brake not released, restart
  // from the prepare step; never bunch the slack on a rising grade; then assistance or dividing, as the rules require.
  const stall: SlipStallLine[] = ctx.risingGrade
    ? ["grade-secure", "grade-suspect-brake", "grade-restart", "grade-no-bunching", "ask-assistance"]
    : ["level-shut-off", "level-suspect-brake", "level-restart", "ask-assistance"];
  return { driver, protection, stall };
}

/**
 * One line for a step: hold the step's notch while the protection acts, and only if the slip keeps
 * returning, drop to its fallback notch (or shut off when there is none lower). The same words on the app's
 * card and in the command line (src/i18n/renderLines.ts).
 */
export function slipHeadline(notch: number, fallbackNotch: number, sanders = true): SlipHeadline {
  if (notch <= 0) return { hold: { code: "no-power" }, then: { code: "take-power", sand: sanders } };
  const hold = { code: "hold", notch, sand: sanders } as const;
  if (fallbackNotch >= notch || fallbackNotch <= 0) return { hold, then: { code: "shut-off", notch } };
  return { hold, then: { code: "drop", notch: fallbackNotch } };
}
