/**
 * The demo plan worked out at build time (src/app/firstPlan.ts) is the plan the page's first request gets
 * live: the page asks first for exactly the case the build planned (same key), the embedded plan decodes to
 * the worker's answer to that request field for field (the time series aside, which it leaves out), and the
 * page shows it at once and then takes the live plan.
 */
import { waitFor } from "@solidjs/testing-library";
import { createRoot } from "solid-js";
import { describe, expect, it } from "vitest";
import { createAppState } from "../../src/app/createAppState.js";
import { computeFirstPlan, FIRST_PLAN_OPTIONS, withoutSeries } from "../../src/app/firstPlan.js";
import { decodeExact, decodePlan, encodePlan } from "../../src/app/planCodec.js";
import { SCREENS } from "../../src/app/screens/registry.js";
import type { PlanResult } from "../../src/core/planner/types.js";
import type { StartCase } from "../../src/core/train/types.js";
import { createPlannerClient } from "../../src/worker/client.js";
import { createPlannerHandler } from "../../src/worker/handler.js";
import type { WorkerResponse } from "../../src/worker/protocol.js";
import { InProcessWorker, memoryStorage } from "./harness.js";

const built = computeFirstPlan();

/** Two plans are the same: the same text when encoded (typed arrays tagged, NaN kept, numbers exact). */
function same(a: PlanResult, b: PlanResult): boolean {
  const ta = encodePlan(a);
  const tb = encodePlan(b);
  if (ta !== tb) expect(JSON.parse(ta)).toEqual(JSON.parse(tb)); // shows where they differ
  return ta === tb;
}

/** The worker's answer to a plan request, through the real handler and a structured clone (as postMessage sends it). */
function liveAnswer(c: StartCase): PlanResult {
  let answer: PlanResult | null = null;
  const handle = createPlannerHandler(
    (msg: WorkerResponse, transfer) => {
      const copy = structuredClone(msg, { transfer });
      if (copy.type === "result") answer = copy.result as PlanResult;
    },
    { schedule: (f) => f() },
  );
  handle(structuredClone({ type: "plan", id: 1, startCase: c, options: { ...FIRST_PLAN_OPTIONS } }));
  if (!answer) throw new Error("the worker gave no plan");
  return answer;
}

describe("the demo plan worked out at build time", () => {
  it("is the plan the worker gives for the page's first request, field for field", () => {
    const c = JSON.parse(built.key) as StartCase;
    // The key is the case in the core's SI form, as the plan run keys its requests.
    expect(c.train.trailingMassKg).toBeGreaterThan(0);
    // Compared as exact text (every number to the last bit, every array by its kind): the test environment's
    // typed arrays and the structured clone's come from different realms, which a deep equality would count.
    expect(same(decodePlan(built.plan), withoutSeries(liveAnswer(c)))).toBe(true);
  });

  it("ships no key: the page's key, JSON.stringify of the decoded checked case, is the build's key", () => {
    // launch.tsx works the key out from startCase; the build's key is JSON.stringify of the case it planned.
    expect(JSON.stringify(decodeExact(built.startCase))).toBe(built.key);
    expect(built.key.length).toBeGreaterThan(100);
  });

  it("survives its text form exactly: typed arrays and NaN included", () => {
    const live = liveAnswer(JSON.parse(built.key) as StartCase);
    expect(Number.isNaN(live.maxStartableMassKg)).toBe(true);
    const back = decodePlan(encodePlan(live));
    expect(same(back, live)).toBe(true);
    expect(Object.prototype.toString.call(back.couplerPeaksN)).toBe("[object Float64Array]");
    expect(back.couplerPeaksN).toHaveLength(live.couplerPeaksN.length);
    expect(Object.is(back.maxStartableMassKg, live.maxStartableMassKg)).toBe(true);
  });

  it("is asked for by the page's first request, shown at once, and replaced by the live plan", async () => {
    const requests: StartCase[] = [];
    const client = createPlannerClient({ createWorker: () => new InProcessWorker() });
    const spy = {
      ...client,
      plan: (c: StartCase, o?: Parameters<typeof client.plan>[1]) => {
        requests.push(c);
        return client.plan(c, o);
      },
    };
    const shown: boolean[] = [];
    const embedded = decodePlan(built.plan);
    const state = createRoot(() =>
      createAppState({
        planner: spy,
        registerSW: null,
        screenIds: SCREENS.map((s) => s.id),
        storage: memoryStorage(),
        debounceMs: 0,
        firstPlan: { key: built.key, result: embedded },
        onFirstPlan: (_ms, fromBuild) => shown.push(fromBuild),
      }),
    );
    // On screen before the worker has answered anything.
    expect(state.run.result()).toBe(embedded);
    expect(state.run.current()).toBe(true);
    expect(shown).toEqual([true]);
    expect(requests).toHaveLength(1);
    expect(JSON.stringify(requests[0])).toBe(built.key);
    await waitFor(() => expect(shown).toEqual([true, false]), { timeout: 20_000 });
    const live = state.run.result()!;
    expect(live).not.toBe(embedded);
    expect(same(withoutSeries(live), embedded)).toBe(true);
    expect(live.series.timeS.length).toBeGreaterThan(0);
  });

  it("is not shown for any other first case", () => {
    const storage = memoryStorage();
    const state = createRoot(() =>
      createAppState({
        planner: createPlannerClient({ createWorker: () => new InProcessWorker() }),
        registerSW: null,
        screenIds: SCREENS.map((s) => s.id),
        storage,
        debounceMs: 0,
        firstPlan: { key: `${built.key} `, result: decodePlan(built.plan) },
      }),
    );
    expect(state.run.result()).toBeNull();
    expect(state.run.status()).toBe("running");
  });
});
