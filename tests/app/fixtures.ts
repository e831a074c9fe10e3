/**
 * A plan for view tests: the real planner's result for the demo case, with steps, slip guidance and a
 * series set by the test so that the views' handling of 4–12 steps is exercised whatever the planner
 * currently returns. These are view inputs, not expected planner output.
 */
import { planStart } from "../../src/core/planner/index.js";
import type { PlanResult, PlanStep, SlipGuidance } from "../../src/core/planner/types.js";
import type { StartCase } from "../../src/core/train/types.js";
import { builtinCaseJson, builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";

export function demoCase(k = 0): StartCase {
  const r = parseStartCase(builtinCaseJson[k], builtinLibrary());
  if (!r.ok) throw new Error("demo case invalid");
  return r.value;
}

const base = planStart(demoCase(), { skipMassSearch: true });

export function step(p: Partial<PlanStep> & Pick<PlanStep, "notch">): PlanStep {
  return {
    phase: "build",
    advanceWhen: { afterS: 0, movedM: 0, speedMps: 0, primary: "time" },
    startS: 0,
    speedMps: 0,
    tractiveEffortN: 0,
    adhesionUse: 0,
    adhesionUseAt: { speedMps: p.speedMps ?? 0, tractiveEffortN: p.tractiveEffortN ?? 0 },
    slipRisk: 0,
    protectionActs: false,
    peakCouplerForceN: 0,
    fallbackNotch: Math.max(0, p.notch - 1),
    // A why line as the core gives it: codes with figures (src/core/planner/lines.ts).
    why: { line: { code: "stretch", notch: p.notch, effortN: p.tractiveEffortN ?? 0, resistanceN: 100_000, stretchTravelM: 8, peakN: 150_000, allowanceN: 708_000, fastOverMps: null }, protection: null, groups: null },
    ...p,
  };
}

export const FIXTURE_STEPS: PlanStep[] = [
  step({ phase: "prepare", notch: 0, advanceWhen: { afterS: 60, movedM: 0, speedMps: 0, primary: "time" }, why: { line: { code: "prepare-brakes-off", lengthM: 414, releaseS: 38, sand: false }, protection: null, groups: null } }),
  step({ phase: "stretch", notch: 1, advanceWhen: { afterS: 12, movedM: 8, speedMps: 0, primary: "moved" }, speedMps: 0.4, tractiveEffortN: 45_600, slipRisk: 0.0002, fallbackNotch: 1 }),
  step({ phase: "build", notch: 3, advanceWhen: { afterS: 6, movedM: 0, speedMps: 5 / 3.6, primary: "speed" }, speedMps: 5 / 3.6, tractiveEffortN: 144_400, slipRisk: 0.04, fallbackNotch: 2 }),
  // Over the working limit ÷ 1.2 of the demo's couplings.
  step({ phase: "build", notch: 5, advanceWhen: { afterS: 10, movedM: 0, speedMps: 10 / 3.6, primary: "speed" }, speedMps: 10 / 3.6, tractiveEffortN: 190_000, slipRisk: 0.14, fallbackNotch: 4, peakCouplerForceN: demoCase().train.couplerLimitN * 0.9 }),
  step({ phase: "accelerate", notch: 8, advanceWhen: { afterS: 40, movedM: 0, speedMps: 20 / 3.6, primary: "target" }, speedMps: 20 / 3.6, tractiveEffortN: 200_000, slipRisk: 0.08, fallbackNotch: 6 }),
];

export const FIXTURE_GUIDANCE: SlipGuidance = {
  driver: ["hold-notch", "sand-now", "drop-fallback"],
  protection: ["sands-itself", "cuts-power"],
  stall: ["grade-secure", "grade-restart"],
};

export function fixturePlan(over: Partial<PlanResult> = {}): PlanResult {
  const n = 50;
  const t = Float64Array.from({ length: n }, (_, i) => i * 2);
  return {
    ...base,
    steps: FIXTURE_STEPS,
    slipGuidance: FIXTURE_GUIDANCE,
    couplerPeaksN: Float64Array.from({ length: 30 }, (_, j) => 200_000 - j * 6000),
    series: {
      timeS: t,
      speedMps: t.map((x) => Math.min(20 / 3.6, x * 0.06)),
      notch: t.map((x) => Math.min(8, Math.floor(x / 10) + 1)),
      locoTravelM: t.map((x) => x * x * 0.03),
      maxTensionN: t.map(() => 180_000),
    },
    timeToTargetS: 96,
    maxStartableMassKg: 1_580_000,
    ...over,
  };
}
