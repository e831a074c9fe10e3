/**
 * The demo plan worked out at build time, so a first visit shows a plan at once. It is the plan the app's
 * first request asks the planner for (the built-in demo case as the Start plan screen makes it, with the
 * default safety settings; no largest-mass search, no verifying run), made by the same functions the page and
 * the worker use. The page shows it while the worker works out the same plan live, which then replaces it
 * (tests/app/firstPlan.test.ts checks they are identical, and that the page's first request is this case).
 * The time series is left out (most of the size): the charts wait for the live plan.
 *
 * Runs in Node, in the build (the Vite plugin below); the page imports only the data it makes, through
 * the virtual module `virtual:taut/first-plan`.
 */
import type { Plugin } from "vite";
import { planStart } from "../core/planner/plan.js";
import type { PlanResult } from "../core/planner/types.js";
import { DEFAULT_SETTINGS } from "../core/train/types.js";
import { builtinCases, builtinLibrary, DEMO_CASE_ID } from "../profiles/builtin.js";
import { encodeExact, encodePlan } from "./planCodec.js";
import { draftFromFile, draftToFile } from "./state/caseDraft.js";
import { validateDraft } from "./state/validateDraft.js";

/**
 * What the build embeds: the request's key (the case as the plan run keys it), the plan, and the demo
 * case as the Start plan draft writes it with the checked case it resolves to (so the page need not load
 * the schemas to know the demo is valid), as text.
 */
export interface FirstPlanData {
  key: string;
  plan: string;
  caseJson: string;
  startCase: string;
}

/** The options of the page's first plan request (createPlanRun): a quick plan, nothing else. */
export const FIRST_PLAN_OPTIONS = { skipMassSearch: true, skipVerification: true } as const;

/** The plan without its time series (empty arrays in its place). */
export function withoutSeries(p: PlanResult): PlanResult {
  const none = new Float64Array(0);
  return { ...p, series: { timeS: none, speedMps: none, notch: none, locoTravelM: none, maxTensionN: none } };
}

/** Work out the demo's first plan as the page would ask for it. */
export function computeFirstPlan(): FirstPlanData {
  const lib = builtinLibrary();
  const file = builtinCases.find((c) => c.id === DEMO_CASE_ID) ?? builtinCases[0]!;
  const draft = draftFromFile(file, (id) => lib.wagons.get(id)?.coupling);
  const json = draftToFile(draft, {
    couplerSafetyFactor: DEFAULT_SETTINGS.couplerSafetyFactor,
    slipRiskThreshold: DEFAULT_SETTINGS.slipRiskThreshold,
    marginalSlipRisk: DEFAULT_SETTINGS.marginalSlipRisk,
  });
  const checked = validateDraft(json, draft, lib);
  if (!checked.ok) throw new Error(`the built-in demo case does not validate: ${JSON.stringify(checked.issues)}`);
  return {
    key: JSON.stringify(checked.value),
    // The worker's quick plan also skips the sensitivity table, which the page never shows.
    plan: encodePlan(withoutSeries(planStart(checked.value, { ...FIRST_PLAN_OPTIONS, skipSensitivity: true }))),
    caseJson: JSON.stringify(json),
    startCase: encodeExact(checked.value),
  };
}

const VIRTUAL_ID = "virtual:taut/first-plan";
const RESOLVED_ID = `\0${VIRTUAL_ID}`;

/**
 * The Vite plugin that serves `virtual:taut/first-plan`: `firstPlan = { plan, caseJson, startCase }`. The key
 * is left out: it is `JSON.stringify` of the decoded `startCase` (decodeExact gives back the same value), so
 * the page works it out instead of loading the case twice (0.9 KiB less before the verdict).
 */
export function firstPlanPlugin(): Plugin {
  let data: FirstPlanData | null = null;
  return {
    name: "taut:first-plan",
    resolveId: (id) => (id === VIRTUAL_ID ? RESOLVED_ID : null),
    load(id) {
      if (id !== RESOLVED_ID) return null;
      data ??= computeFirstPlan();
      const { key: _key, ...shipped } = data;
      return `export const firstPlan = ${JSON.stringify(shipped)};\n`;
    },
  };
}
