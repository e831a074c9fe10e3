/** App state: settings persist and reject bad values; the plan run cancels superseded plans. */
import { render, waitFor } from "@solidjs/testing-library";
import { createRoot, createSignal } from "solid-js";
import { describe, expect, it } from "vitest";
import { createCaseDraft, demoCaseFile, DRAFT_KEY } from "../../src/app/state/createCaseDraft.js";
import { createPlanRun } from "../../src/app/state/createPlanRun.js";
import { createSettings, DEFAULT_APP_SETTINGS, readSettings, SETTINGS_KEY } from "../../src/app/state/createSettings.js";
import { MOVING_ABOVE_MPS, nextMotion, STILL } from "../../src/app/state/motion.js";
import type { PlanResult } from "../../src/core/planner/types.js";
import type { StartCase } from "../../src/core/train/types.js";
import { DEFAULT_SETTINGS } from "../../src/core/train/types.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import type { PlanCallOptions, PlannerClient, PlanOutcome } from "../../src/worker/client.js";
import { memoryStorage } from "./harness.js";
import { demoCase } from "./fixtures.js";

describe("settings", () => {
  it("default to metric, follow the system theme, and the core's safety defaults", () => {
    expect(DEFAULT_APP_SETTINGS).toMatchObject({ units: "metric", theme: "system", couplerSafetyFactor: DEFAULT_SETTINGS.couplerSafetyFactor, slipRiskThreshold: DEFAULT_SETTINGS.slipRiskThreshold });
    expect(DEFAULT_APP_SETTINGS.couplerSafetyFactor).toBe(1.2);
    expect(DEFAULT_APP_SETTINGS.slipRiskThreshold).toBe(0.1);
  });

  it("persist and come back", () => {
    const storage = memoryStorage();
    createRoot((dispose) => {
      const s = createSettings(storage);
      s.update({ units: "us", theme: "night", couplerSafetyFactor: 1.5 });
      dispose();
    });
    createRoot((dispose) => {
      const s = createSettings(storage);
      expect(s.settings()).toMatchObject({ units: "us", theme: "night", couplerSafetyFactor: 1.5, slipRiskThreshold: 0.1 });
      s.resetSafety();
      expect(s.settings().couplerSafetyFactor).toBe(1.2);
      dispose();
    });
  });

  it("keep the good fields of a damaged entry and drop the rest", () => {
    expect(readSettings("{not json")).toEqual(DEFAULT_APP_SETTINGS);
    expect(readSettings(JSON.stringify({ units: "imperial", theme: "night", couplerSafetyFactor: 9, slipRiskThreshold: 0.2, motionLock: "yes" }))).toEqual({
      ...DEFAULT_APP_SETTINGS,
      theme: "night",
      slipRiskThreshold: 0.2,
    });
  });

  it("go into the case the planner gets", () => {
    const storage = memoryStorage({ [SETTINGS_KEY]: JSON.stringify({ couplerSafetyFactor: 1.4, slipRiskThreshold: 0.05 }) });
    createRoot((dispose) => {
      const s = createSettings(storage);
      const lib = builtinLibrary();
      const d = createCaseDraft({ library: () => lib, settings: s.settings, storage });
      // The marginal bound not stored: its default goes with the others.
      expect(d.caseJson().settings).toEqual({ couplerSafetyFactor: 1.4, slipRiskThreshold: 0.05, marginalSlipRisk: 0.25 });
      const c = d.checked();
      expect(c.ok && c.value.settings).toMatchObject({ couplerSafetyFactor: 1.4, slipRiskThreshold: 0.05 });
      dispose();
    });
  });
});

describe("case draft", () => {
  it("opens with the demo case, keeps edits across a reload, and ignores a foreign stored value", async () => {
    const storage = memoryStorage();
    const lib = builtinLibrary();
    const first = createRoot((dispose) => {
      const s = createSettings(storage);
      const d = createCaseDraft({ library: () => lib, settings: s.settings, storage });
      expect(d.draft.id).toBe("demo-aggregate-ashvale");
      // The coupling comes from the demo's wagon type when the case does not name it.
      expect(d.draft.train.coupling).toBe(demoCaseFile().train.coupling ?? lib.wagons.get(demoCaseFile().train.wagonType!)!.coupling);
      d.set("train", "trailingMass_t", 1750.5);
      expect(d.edited()).toBe(true);
      return dispose;
    });
    await Promise.resolve(); // effects (the save) run after the synchronous edit
    first();
    createRoot((dispose) => {
      const d = createCaseDraft({ library: () => lib, settings: createSettings(storage).settings, storage });
      expect(d.draft.train.trailingMass_t).toBe(1750.5);
      dispose();
    });
    storage.setItem(DRAFT_KEY, JSON.stringify({ hello: 1 }));
    createRoot((dispose) => {
      const d = createCaseDraft({ library: () => lib, settings: createSettings(storage).settings, storage });
      expect(d.draft.train.trailingMass_t).toBe(demoCaseFile().train.trailingMass_t);
      dispose();
    });
  });

  it("resolves to the same SI case as the demo file", () => {
    createRoot((dispose) => {
      const lib = builtinLibrary();
      const d = createCaseDraft({ library: () => lib, settings: createSettings(null).settings, storage: null });
      const c = d.checked();
      expect(c.ok).toBe(true);
      if (c.ok) expect(JSON.stringify(c.value)).toBe(JSON.stringify(demoCase()));
      dispose();
    });
  });
});

/** A client whose answers the test releases by hand. */
function manualClient() {
  const calls: Array<{ c: StartCase; opts: PlanCallOptions; resolve: (o: PlanOutcome) => void }> = [];
  const client: Pick<PlannerClient, "plan" | "alive" | "pending" | "warm" | "dispose"> = {
    plan: (c, opts = {}) =>
      new Promise((resolve, reject) => {
        opts.signal?.addEventListener("abort", () => reject(Object.assign(new Error("aborted"), { name: "AbortError" })));
        calls.push({ c, opts, resolve });
      }),
    alive: true,
    pending: 0,
    warm: () => undefined,
    dispose: () => undefined,
  };
  return { client, calls };
}

const planOf = (verdict: PlanResult["verdict"]) => ({ ok: true as const, result: { verdict } as PlanResult, elapsedMs: 5 });

describe("plan run", () => {
  it("plans at once on open, waits for typing to settle after, and aborts a superseded plan", async () => {
    const { client, calls } = manualClient();
    const [c, setC] = createSignal<StartCase | null>(demoCase());
    let run!: ReturnType<typeof createPlanRun>;
    render(() => {
      run = createPlanRun({ client, startCase: c, debounceMs: 30 });
      return null;
    });
    await waitFor(() => expect(calls).toHaveLength(1));
    expect(run.status()).toBe("running");
    calls[0]!.resolve(planOf("starts"));
    await waitFor(() => expect(run.status()).toBe("done"));
    expect(run.result()?.verdict).toBe("starts");
    expect(run.current()).toBe(true);

    // Two quick edits: one request after the pause; the plan on screen is marked out of date meanwhile.
    const heavier = (kg: number): StartCase => ({ ...demoCase(), train: { ...demoCase().train, trailingMassKg: demoCase().train.trailingMassKg + kg } });
    setC(heavier(1000));
    expect(run.current()).toBe(false);
    setC(heavier(2000));
    await waitFor(() => expect(calls).toHaveLength(2));
    expect(calls[1]!.c.train.trailingMassKg).toBe(demoCase().train.trailingMassKg + 2000);

    // A further edit while that plan runs aborts it.
    setC(heavier(3000));
    expect(calls[1]!.opts.signal?.aborted).toBe(true);
    await waitFor(() => expect(calls).toHaveLength(3));
    calls[1]!.resolve(planOf("marginal")); // too late: ignored
    calls[2]!.resolve(planOf("needs-assistance"));
    await waitFor(() => expect(run.result()?.verdict).toBe("needs-assistance"));
    expect(run.current()).toBe(true);

    // Invalid inputs: nothing is planned, the last plan stays (out of date).
    setC(null);
    expect(run.status()).toBe("invalid");
    expect(run.current()).toBe(false);
    expect(calls).toHaveLength(3);
  });

  it("asks for the plan without the mass search first, then the full plan on the background worker", async () => {
    const fg = manualClient();
    const bg = manualClient();
    let run!: ReturnType<typeof createPlanRun>;
    const [c, setC] = createSignal<StartCase | null>(demoCase());
    render(() => {
      run = createPlanRun({ client: fg.client, background: bg.client, startCase: c, debounceMs: 0 });
      return null;
    });
    // The first request goes out while the page is still being built.
    expect(fg.calls).toHaveLength(1);
    expect(fg.calls[0]!.opts.skipMassSearch).toBe(true);
    fg.calls[0]!.resolve({ ok: true, result: { verdict: "starts", maxStartableMassKg: Number.NaN } as PlanResult, elapsedMs: 1 });
    await waitFor(() => expect(bg.calls).toHaveLength(1));
    expect(bg.calls[0]!.opts.skipMassSearch).toBeUndefined();
    expect(run.massPending()).toBe(true);
    bg.calls[0]!.resolve({ ok: true, result: { verdict: "starts", maxStartableMassKg: 1_234_000 } as PlanResult, elapsedMs: 9 });
    await waitFor(() => expect(run.result()?.maxStartableMassKg).toBe(1_234_000));
    expect(run.massPending()).toBe(false);
    // An edit aborts a background search still running for the old case.
    setC({ ...demoCase(), train: { ...demoCase().train, trailingMassKg: 1 } });
    await waitFor(() => expect(fg.calls).toHaveLength(2));
    fg.calls[1]!.resolve({ ok: true, result: { verdict: "marginal", maxStartableMassKg: Number.NaN } as PlanResult, elapsedMs: 1 });
    await waitFor(() => expect(bg.calls).toHaveLength(2));
    setC(demoCase());
    expect(bg.calls[1]!.opts.signal?.aborted).toBe(true);
    expect(run.massPending()).toBe(false);
  });

  it("reports a failed planner and can try again", async () => {
    const { client, calls } = manualClient();
    let run!: ReturnType<typeof createPlanRun>;
    render(() => {
      run = createPlanRun({ client, startCase: () => demoCase(), debounceMs: 0 });
      return null;
    });
    await waitFor(() => expect(calls).toHaveLength(1));
    calls[0]!.resolve({ ok: false, kind: "crashed", issues: [], message: "out of memory" });
    await waitFor(() => expect(run.status()).toBe("failed"));
    // A planner that stopped is said in the app's words, with the browser's own words on why beside them.
    expect(run.error()).toBe("the planner stopped unexpectedly (out of memory).");
    run.retry();
    await waitFor(() => expect(calls).toHaveLength(2));
  });
});

describe("moving lock rule", () => {
  it("locks above 5 km/h and lifts only after 10 s below it", () => {
    let s = nextMotion(STILL, 1.0, 0);
    expect(s.moving).toBe(false);
    s = nextMotion(s, MOVING_ABOVE_MPS + 0.1, 1000);
    expect(s.moving).toBe(true);
    s = nextMotion(s, 0.2, 2000);
    expect(s.moving).toBe(true);
    s = nextMotion(s, null, 5000); // no speed in the fix: no change
    expect(s.moving).toBe(true);
    s = nextMotion(s, 3, 4000); // a fast fix restarts the wait
    expect(s).toEqual({ moving: true, slowSinceMs: null });
    s = nextMotion(s, 0, 6000);
    s = nextMotion(s, 0, 15_999);
    expect(s.moving).toBe(true);
    s = nextMotion(s, 0, 16_000);
    expect(s.moving).toBe(false);
  });
});
