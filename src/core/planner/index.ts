/**
 * The start planner: from a start case to a notch sequence with slip risk, coupler forces and a
 * verdict. (Until the dynamics-verified search lands, the verdict comes from the static check and the
 * step list is empty.)
 */
import { caseCautions, STANDARD_CAUTIONS } from "../cautions.js";
import { largestStartableMassKg } from "../startableMass.js";
import { staticCheck } from "../staticCheck.js";
import type { StartCase } from "../types.js";
import type { PlanOptions, PlanResult } from "./types.js";

export * from "./types.js";

export function planStart(c: StartCase, opts: PlanOptions = {}): PlanResult {
  const s = staticCheck(c);
  const maxKg = opts.skipMassSearch ? Number.NaN : largestStartableMassKg(c, (x) => planStart(x, { skipMassSearch: true }).verdict === "starts");
  opts.onProgress?.(1);
  const empty = new Float64Array(0);
  return {
    verdict: s.verdict,
    reasons: s.reasons,
    margin: s.margin,
    margins: s.margins,
    static: s,
    steps: [],
    peakCouplerForceN: s.peakTensionN,
    peakCompressionN: s.peakCompressionN,
    couplerPeaksN: empty,
    timeToTargetS: null,
    maxStartableMassKg: maxKg,
    slipGuidance: { protection: [], driver: [], stall: [] },
    cautions: [...STANDARD_CAUTIONS, ...caseCautions(c, s.resistance.totalN)],
    series: { timeS: empty, speedMps: empty, notch: empty, locoTravelM: empty, maxTensionN: empty },
  };
}
