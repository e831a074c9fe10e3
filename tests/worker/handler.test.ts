import { describe, expect, it, vi } from "vitest";
import { planStart } from "../../src/core/planner/index.js";
import type { PlanResult } from "../../src/core/planner/types.js";
import type { StartCase } from "../../src/core/train/types.js";
import { builtinCaseJson, builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { createPlannerHandler, type JobsModule } from "../../src/worker/handler.js";
import * as jobsModule from "../../src/worker/jobs.js";
import { planTransferables, startCaseIssues, type WorkerResponse } from "../../src/worker/protocol.js";

function resolved(json: unknown): StartCase {
  const r = parseStartCase(json, builtinLibrary());
  if (!r.ok) throw new Error(`demo case invalid: ${JSON.stringify(r.issues)}`);
  return r.value;
}
/** The demo case as the app sends it: validated and resolved (SI), then structured-cloned. */
const demo = structuredClone(resolved(builtinCaseJson[0]));

/** A handler whose posts are collected and whose ticks run when the test says. */
function harness(deps: Parameters<typeof createPlannerHandler>[1] = {}) {
  const posted: Array<{ msg: WorkerResponse; transfer: ArrayBuffer[] }> = [];
  const ticks: Array<() => void> = [];
  const handle = createPlannerHandler((msg, transfer) => posted.push({ msg, transfer }), { schedule: (f) => ticks.push(f), ...deps });
  const flush = () => {
    while (ticks.length > 0) ticks.shift()!();
  };
  return { posted, handle, flush };
}

describe("planner worker handler", () => {
  it("plans the demo case: progress 0 first, then the same result the core gives, its largest masses with the later jobs' code", async () => {
    const h = harness();
    h.handle({ type: "plan", id: 7, startCase: demo });
    expect(h.posted).toHaveLength(0); // nothing runs before the next tick
    h.flush();
    expect(h.posted[0]!.msg).toEqual({ type: "progress", id: 7, fraction: 0 });
    // The mass search's code is in jobs.ts, imported on this first plan that asks for the masses.
    await vi.waitFor(() => expect(h.posted.at(-1)!.msg.type).toBe("result"), { timeout: 30_000 });
    const last = h.posted.at(-1)!.msg;
    expect(last.type).toBe("result");
    if (last.type !== "result" || last.request !== "plan") throw new Error("not a plan result");
    const direct = planStart(resolved(builtinCaseJson[0]));
    expect(last.result.verdict).toBe(direct.verdict);
    expect(last.result.margin).toBeCloseTo(direct.margin, 12);
    expect(last.result.steps.length).toBe(direct.steps.length);
    expect(last.result.maxStartableMassKg).toBe(direct.maxStartableMassKg);
    expect(Number.isFinite(last.result.maxStartableMassKg)).toBe(true);
    expect(last.elapsedMs).toBeGreaterThanOrEqual(0);
  });

  it("plans without the largest masses at once, loading no later code (the page's first plan)", () => {
    let loads = 0;
    const h = harness({ loadJobs: () => (loads++, import("../../src/worker/jobs.js")) });
    h.handle({ type: "plan", id: 3, startCase: demo, options: { skipMassSearch: true, skipVerification: true } });
    h.flush();
    const last = h.posted.at(-1)!.msg;
    if (last.type !== "result" || last.request !== "plan") throw new Error("not a plan result");
    const direct = planStart(resolved(builtinCaseJson[0]), { skipMassSearch: true, skipVerification: true });
    expect(last.result.margin).toBe(direct.margin);
    expect(Number.isNaN(last.result.maxStartableMassKg)).toBe(true);
    expect(last.result.massSearchCeilingKg).toBe(direct.massSearchCeilingKg);
    expect(loads).toBe(0);
  });

  it("answers a malformed case with field issues, not an exception", () => {
    const h = harness();
    const bad = { ...demo, train: { ...demo.train, trailingMassKg: -5 }, locomotives: [] };
    h.handle({ type: "plan", id: 1, startCase: bad });
    h.flush();
    const last = h.posted.at(-1)!.msg;
    expect(last.type).toBe("error");
    if (last.type !== "error") return;
    expect(last.kind).toBe("invalid");
    expect(last.issues.map((i) => i.path)).toEqual(["locomotives", "train.trailingMassKg"]);
  });

  it("passes the mass-search option through to the planner", () => {
    const seen: boolean[] = [];
    const h = harness({
      plan: (c, opts) => {
        seen.push(opts.skipMassSearch === true);
        return planStart(c, { skipMassSearch: true });
      },
    });
    h.handle({ type: "plan", id: 1, startCase: demo, options: { skipMassSearch: true } });
    h.handle({ type: "plan", id: 2, startCase: demo });
    h.flush();
    expect(seen).toEqual([true, false]);
  });

  it("reports a planner failure as an internal error with its message", () => {
    const h = harness({
      plan: () => {
        throw new RangeError("boom in the planner");
      },
    });
    h.handle({ type: "plan", id: 3, startCase: demo });
    h.flush();
    expect(h.posted.at(-1)!.msg).toMatchObject({ type: "error", id: 3, kind: "internal", message: "boom in the planner" });
  });

  it("drops a queued request when its cancel arrives first, and runs the others in order", () => {
    const h = harness();
    h.handle({ type: "plan", id: 1, startCase: demo, options: { skipMassSearch: true } });
    h.handle({ type: "plan", id: 2, startCase: demo, options: { skipMassSearch: true } });
    h.handle({ type: "cancel", id: 1 });
    h.flush();
    const ids = h.posted.filter((p) => p.msg.type === "result").map((p) => p.msg.id);
    expect(ids).toEqual([2]);
  });

  it("rejects a message it does not understand", () => {
    const h = harness();
    h.handle({ hello: "there" });
    expect(h.posted[0]!.msg).toMatchObject({ type: "error", id: -1, kind: "internal" });
  });

  it("finds no structural issue in any built-in demo case, and names each broken part of a bad one", () => {
    for (const j of builtinCaseJson) expect(startCaseIssues(structuredClone(resolved(j)))).toEqual([]);
    expect(startCaseIssues(null)).toEqual([{ path: "", message: "must be a start case object" }]);
    const broken = { ...demo, conditions: { ...demo.conditions, rail: "slush" }, target: { kind: "time" }, settings: {} } as unknown;
    expect(startCaseIssues(broken).map((i) => i.path)).toEqual(["conditions.rail", "target", "settings"]);
  });

  it("throttles progress messages and forwards the planner's fractions", () => {
    let t = 0;
    const h = harness({
      now: () => t,
      progressIntervalMs: 50,
      plan: (c, opts) => {
        for (const f of [0.1, 0.2, 0.3, 0.6, 1]) {
          t += 30;
          opts.onProgress?.(f);
        }
        return planStart(c, { skipMassSearch: true });
      },
    });
    h.handle({ type: "plan", id: 9, startCase: demo });
    h.flush();
    const fractions = h.posted.filter((p) => p.msg.type === "progress").map((p) => (p.msg as { fraction: number }).fraction);
    // 0 at the start; then only those at least 50 ms after the previous post (t = 60 and 120); never 1.
    expect(fractions).toEqual([0, 0.2, 0.6]);
  });
});

describe("jobs loaded on first use", () => {
  /** A load of jobs.ts that the test settles by hand, counting the loads. */
  function manualLoad() {
    const loads: Array<{ resolve: (m: JobsModule) => void; reject: (e: unknown) => void }> = [];
    const loadJobs = () => new Promise<JobsModule>((resolve, reject) => loads.push({ resolve, reject }));
    return { loads, loadJobs };
  }
  /** Tiny trains for the conditions-margins job: a quick answer. */
  const request = (id: number, type: "plan" | "conditionMargins" = "conditionMargins") =>
    type === "plan" ? ({ type, id, startCase: demo, options: { skipMassSearch: true } } as const) : ({ type, id, startCase: demo, options: { quick: true } } as const);
  const settle = () => new Promise((r) => setTimeout(r, 0));

  it("plans without loading the other jobs' code", () => {
    const m = manualLoad();
    const h = harness({ loadJobs: m.loadJobs });
    h.handle(request(1, "plan"));
    h.flush();
    expect(h.posted.at(-1)!.msg).toMatchObject({ type: "result", id: 1, request: "plan" });
    expect(m.loads).toHaveLength(0);
  });

  it("holds the queue while the code loads, then answers in order, loading it once", async () => {
    const m = manualLoad();
    const h = harness({ loadJobs: m.loadJobs });
    h.handle(request(1));
    h.handle(request(2, "plan"));
    h.handle(request(3));
    h.flush();
    // The first request has started (progress 0) and waits for its code; the plan behind it waits too.
    expect(h.posted.map((p) => p.msg.type)).toEqual(["progress"]);
    expect(m.loads).toHaveLength(1);
    m.loads[0]!.resolve(jobsModule);
    await settle();
    h.flush();
    const answers = h.posted.filter((p) => p.msg.type === "result").map((p) => [p.msg.id, (p.msg as { request: string }).request]);
    expect(answers).toEqual([
      [1, "conditionMargins"],
      [2, "plan"],
      [3, "conditionMargins"],
    ]);
    expect(m.loads).toHaveLength(1);
    // The same margins the job gives when called directly.
    const first = h.posted.find((p) => p.msg.type === "result" && p.msg.id === 1)!.msg as { result: unknown };
    expect(first.result).toEqual(jobsModule.runConditionMargins(demo, { quick: true }));
  });

  it("drops a request cancelled while the code loads", async () => {
    const m = manualLoad();
    const h = harness({ loadJobs: m.loadJobs });
    h.handle(request(1));
    h.handle(request(2));
    h.flush();
    h.handle({ type: "cancel", id: 2 });
    m.loads[0]!.resolve(jobsModule);
    await settle();
    h.flush();
    expect(h.posted.filter((p) => p.msg.type === "result").map((p) => p.msg.id)).toEqual([1]);
    expect(h.posted.some((p) => p.msg.id === 2)).toBe(false);
  });

  it("answers an internal error when the code cannot load, and tries again on the next request", async () => {
    const m = manualLoad();
    const h = harness({ loadJobs: m.loadJobs });
    h.handle(request(1));
    h.flush();
    m.loads[0]!.reject(new TypeError("Failed to fetch dynamically imported module"));
    await settle();
    expect(h.posted.at(-1)!.msg).toMatchObject({ type: "error", id: 1, kind: "internal", message: "Failed to fetch dynamically imported module" });
    h.handle(request(2));
    h.flush();
    expect(m.loads).toHaveLength(2);
    m.loads[1]!.resolve(jobsModule);
    await settle();
    h.flush();
    expect(h.posted.at(-1)!.msg).toMatchObject({ type: "result", id: 2, request: "conditionMargins" });
  });
});

describe("transfer list", () => {
  const fake = (arrays: Float64Array[]): PlanResult => {
    const [a, b, c, d, e, f] = arrays as [Float64Array, Float64Array, Float64Array, Float64Array, Float64Array, Float64Array];
    return { couplerPeaksN: a, series: { timeS: b, speedMps: c, notch: d, locoTravelM: e, maxTensionN: f } } as unknown as PlanResult;
  };

  it("lists each buffer once and skips empty ones, so postMessage cannot fail on duplicates", () => {
    const empty = new Float64Array(0);
    const shared = new Float64Array(10);
    const r = fake([new Float64Array(3), shared, shared.subarray(2), empty, empty, new Float64Array(4)]);
    const list = planTransferables(r);
    expect(list).toHaveLength(3);
    expect(new Set(list).size).toBe(3);
    // The structured clone accepts the list and moves the data (the sender's arrays are detached).
    const moved = structuredClone(r, { transfer: list }) as PlanResult;
    expect(moved.series.timeS.length).toBe(10);
    expect(moved.series.speedMps.length).toBe(8);
    expect(r.series.timeS.length).toBe(0);
  });

  it("would fail without deduplication (the failure the helper prevents)", () => {
    const shared = new Float64Array(4);
    expect(() => structuredClone({ a: shared, b: shared }, { transfer: [shared.buffer, shared.buffer] })).toThrow();
  });
});
