/**
 * The draft's checker loads apart from the first screen (the schemas are not in the first load; issue 14,
 * first plan ≤ 90 KiB). Before it has loaded, the built-in demo is known valid from the build's check
 * (firstPlan.ts), so the first plan is still asked for at once; any other stored draft waits for the
 * checker — shown as waiting, never as invalid inputs — and is planned once it is checked.
 * Each test takes fresh modules, so the checker the setup file loaded is not there yet.
 */
import { waitFor } from "@solidjs/testing-library";
import { createRoot } from "solid-js";
import { describe, expect, it, vi } from "vitest";
import { computeFirstPlan } from "../../src/app/firstPlan.js";
import { decodeExact, encodeExact } from "../../src/app/planCodec.js";
import type { StartCase } from "../../src/core/train/types.js";
import { memoryStorage } from "./harness.js";

const built = computeFirstPlan();

async function freshApp(storage: Storage) {
  vi.resetModules();
  const { createAppState } = await import("../../src/app/createAppState.js");
  const { SCREENS } = await import("../../src/app/screens/registry.js");
  const { createPlannerClient } = await import("../../src/worker/client.js");
  const { InProcessWorker } = await import("./harness.js");
  const { loadedDraftChecker } = await import("../../src/app/state/draftChecker.js");
  const requests: StartCase[] = [];
  const client = createPlannerClient({ createWorker: () => new InProcessWorker() });
  const planner = { ...client, plan: (c: StartCase, o?: Parameters<typeof client.plan>[1]) => (requests.push(c), client.plan(c, o)) };
  const loadedAtStart = loadedDraftChecker() !== null;
  const state = createRoot(() =>
    createAppState({
      planner,
      registerSW: null,
      screenIds: SCREENS.map((s) => s.id),
      storage,
      debounceMs: 0,
      prechecked: { caseJson: built.caseJson, value: decodeExact(built.startCase) as StartCase },
    }),
  );
  return { state, requests, loadedAtStart };
}

describe("the draft's checker, loaded apart", () => {
  it("the build's check of the demo is the checker's own: same case, same JSON as the page writes it", async () => {
    const { state } = await freshApp(memoryStorage());
    expect(JSON.stringify(state.draft.caseJson())).toBe(built.caseJson);
    await waitFor(() => expect("pending" in state.draft.checked()).toBe(false));
    const c = state.draft.checked();
    expect(c.ok).toBe(true);
    if (c.ok) expect(encodeExact(c.value)).toBe(built.startCase);
  });

  it("the demo is planned at once, before the checker has loaded", async () => {
    const { state, requests, loadedAtStart } = await freshApp(memoryStorage());
    expect(loadedAtStart).toBe(false);
    expect(requests).toHaveLength(1);
    expect(JSON.stringify(requests[0])).toBe(built.key);
    expect(state.run.status()).toBe("running");
  });

  it("another stored draft waits for the checker (not invalid), then is planned", async () => {
    // The stored draft is the app's own form of a case; make one from the demo with a heavier train.
    vi.resetModules();
    const { builtinCases, builtinLibrary, DEMO_CASE_ID } = await import("../../src/profiles/builtin.js");
    const { draftFromFile } = await import("../../src/app/state/caseDraft.js");
    const lib = builtinLibrary();
    const d = draftFromFile(builtinCases.find((c) => c.id === DEMO_CASE_ID)!, (id) => lib.wagons.get(id)?.coupling);
    d.train.trailingMass_t += 100;
    const { state, requests } = await freshApp(memoryStorage({ "taut.case.v1": JSON.stringify(d) }));
    expect(requests).toHaveLength(0);
    expect(state.run.status()).toBe("waiting");
    expect(state.draft.issues()).toEqual([]);
    await waitFor(() => expect(requests).toHaveLength(1));
    expect(requests[0]!.train.trailingMassKg).toBeCloseTo((JSON.parse(built.key) as StartCase).train.trailingMassKg + 100_000, 3);
  });
});
