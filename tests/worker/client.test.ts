import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import type { StartCase } from "../../src/core/train/types.js";
import { builtinCaseJson, builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { createPlannerClient, type WorkerLike } from "../../src/worker/client.js";
import { createPlannerHandler } from "../../src/worker/handler.js";
import type { WorkerRequest, WorkerResponse } from "../../src/worker/protocol.js";
import type { PlanResult } from "../../src/core/planner/types.js";

/** A scripted worker: the test decides what it answers and when. */
class ScriptedWorker implements WorkerLike {
  onmessage: WorkerLike["onmessage"] = null;
  onerror: WorkerLike["onerror"] = null;
  sent: WorkerRequest[] = [];
  terminated = false;
  postMessage(m: WorkerRequest) {
    this.sent.push(m);
  }
  terminate() {
    this.terminated = true;
  }
  answer(m: WorkerResponse) {
    this.onmessage?.({ data: m });
  }
}

const fakeResult = { verdict: "starts" } as unknown as PlanResult;
/** The client does not look inside the case; the scripted tests pass tokens. */
const token = (n: number) => ({ token: n }) as unknown as StartCase;
function resolved(json: unknown): StartCase {
  const r = parseStartCase(json, builtinLibrary());
  if (!r.ok) throw new Error("demo case invalid");
  return r.value;
}

describe("planner client (scripted worker)", () => {
  let workers: ScriptedWorker[];
  const make = (idleTimeoutMs = 1000) =>
    createPlannerClient({
      createWorker: () => {
        const w = new ScriptedWorker();
        workers.push(w);
        return w;
      },
      idleTimeoutMs,
    });

  beforeEach(() => {
    workers = [];
    vi.useFakeTimers();
  });
  afterEach(() => vi.useRealTimers());

  it("starts no worker until the first request, then resolves with the result and reports progress", async () => {
    const client = make();
    expect(client.alive).toBe(false);
    expect(workers).toHaveLength(0);
    const progress: number[] = [];
    const p = client.plan(token(1), { onProgress: (f) => progress.push(f) });
    expect(workers).toHaveLength(1);
    const req = workers[0]!.sent[0]!;
    expect(req).toMatchObject({ type: "plan", startCase: { token: 1 } });
    expect(req).not.toHaveProperty("options");
    workers[0]!.answer({ type: "progress", id: req.id, fraction: 0 });
    workers[0]!.answer({ type: "progress", id: req.id, fraction: 0.5 });
    workers[0]!.answer({ type: "result", id: req.id, request: "plan", result: fakeResult, elapsedMs: 12 });
    await expect(p).resolves.toEqual({ ok: true, result: fakeResult, elapsedMs: 12 });
    expect(progress).toEqual([0, 0.5, 1]);
  });

  it("returns field issues as data", async () => {
    const client = make();
    const p = client.plan(token(0));
    const id = workers[0]!.sent[0]!.id;
    workers[0]!.answer({ type: "error", id, kind: "invalid", issues: [{ path: "train", message: "is required (an object)" }], message: "x" });
    await expect(p).resolves.toMatchObject({ ok: false, kind: "invalid", issues: [{ path: "train" }] });
  });

  it("stops the worker after the idle time and starts a fresh one on the next request", async () => {
    const client = make(1000);
    const p = client.plan(token(0));
    workers[0]!.answer({ type: "result", id: workers[0]!.sent[0]!.id, request: "plan", result: fakeResult, elapsedMs: 1 });
    await p;
    vi.advanceTimersByTime(999);
    expect(workers[0]!.terminated).toBe(false);
    vi.advanceTimersByTime(2);
    expect(workers[0]!.terminated).toBe(true);
    expect(client.alive).toBe(false);
    void client.plan(token(0));
    expect(workers).toHaveLength(2);
  });

  it("can be warmed up before the first request, and a warm worker idles out like any other", () => {
    const client = make(1000);
    client.warm();
    expect(workers).toHaveLength(1);
    expect(workers[0]!.sent).toEqual([]);
    client.warm();
    expect(workers).toHaveLength(1);
    void client.plan(token(1));
    expect(workers).toHaveLength(1);
    expect(workers[0]!.sent).toHaveLength(1);
    const idle = make(1000);
    idle.warm();
    vi.advanceTimersByTime(1001);
    expect(workers[1]!.terminated).toBe(true);
  });

  it("does not stop the worker for idleness while a request is pending", () => {
    const client = make(1000);
    void client.plan(token(0));
    vi.advanceTimersByTime(10_000);
    expect(workers[0]!.terminated).toBe(false);
    expect(client.pending).toBe(1);
  });

  it("cancels a queued request with a message and keeps the worker", async () => {
    const client = make();
    const first = client.plan(token(1));
    const ctrl = new AbortController();
    const second = client.plan(token(2), { signal: ctrl.signal });
    const w = workers[0]!;
    w.answer({ type: "progress", id: w.sent[0]!.id, fraction: 0 }); // the first is running
    ctrl.abort();
    await expect(second).rejects.toMatchObject({ name: "AbortError" });
    expect(w.sent.at(-1)).toEqual({ type: "cancel", id: w.sent[1]!.id });
    expect(w.terminated).toBe(false);
    w.answer({ type: "result", id: w.sent[0]!.id, request: "plan", result: fakeResult, elapsedMs: 1 });
    await expect(first).resolves.toMatchObject({ ok: true });
  });

  it("stops a running request by terminating the worker and resends the queue to a fresh one", async () => {
    const client = make();
    const ctrl = new AbortController();
    const running = client.plan(token(1), { signal: ctrl.signal });
    const queued = client.plan(token(2), { skipMassSearch: true });
    const w0 = workers[0]!;
    w0.answer({ type: "progress", id: w0.sent[0]!.id, fraction: 0.3 });
    ctrl.abort();
    await expect(running).rejects.toMatchObject({ name: "AbortError" });
    expect(w0.terminated).toBe(true);
    expect(workers).toHaveLength(2);
    const w1 = workers[1]!;
    expect(w1.sent).toEqual([w0.sent[1]]);
    expect(w1.sent[0]).toMatchObject({ startCase: { token: 2 }, options: { skipMassSearch: true } });
    // A late answer from the stopped worker is ignored.
    w0.answer({ type: "result", id: w0.sent[1]!.id, request: "plan", result: { verdict: "marginal" } as unknown as PlanResult, elapsedMs: 1 });
    w1.answer({ type: "result", id: w1.sent[0]!.id, request: "plan", result: fakeResult, elapsedMs: 2 });
    await expect(queued).resolves.toEqual({ ok: true, result: fakeResult, elapsedMs: 2 });
  });

  it("rejects at once when the signal is already aborted, without starting a worker", async () => {
    const client = make();
    const ctrl = new AbortController();
    ctrl.abort();
    await expect(client.plan(token(0), { signal: ctrl.signal })).rejects.toMatchObject({ name: "AbortError" });
    expect(workers).toHaveLength(0);
  });

  it("reports a crashed worker for every pending request and recovers on the next", async () => {
    const client = make();
    const a = client.plan(token(0));
    const b = client.plan(token(0));
    workers[0]!.onerror?.({ message: "script failed to load" });
    await expect(a).resolves.toMatchObject({ ok: false, kind: "crashed", message: "script failed to load" });
    await expect(b).resolves.toMatchObject({ ok: false, kind: "crashed" });
    expect(client.alive).toBe(false);
    void client.plan(token(0));
    expect(workers).toHaveLength(2);
  });

  it("dispose aborts everything pending and stops the worker", async () => {
    const client = make();
    const a = client.plan(token(0));
    client.dispose();
    await expect(a).rejects.toMatchObject({ name: "AbortError" });
    expect(workers[0]!.terminated).toBe(true);
  });
});

describe("planner client with the real handler (in-process worker)", () => {
  /** A worker that runs the real handler, passing messages by structured clone on later ticks. */
  class InProcessWorker implements WorkerLike {
    onmessage: WorkerLike["onmessage"] = null;
    onerror: WorkerLike["onerror"] = null;
    terminated = false;
    private handle = createPlannerHandler((msg, transfer) => {
      const copy = structuredClone(msg, { transfer });
      setTimeout(() => {
        if (!this.terminated) this.onmessage?.({ data: copy });
      }, 0);
    });
    postMessage(m: WorkerRequest) {
      const copy = structuredClone(m);
      setTimeout(() => {
        if (!this.terminated) this.handle(copy);
      }, 0);
    }
    terminate() {
      this.terminated = true;
    }
  }

  it("plans the demo case end to end, typed arrays intact", async () => {
    const client = createPlannerClient({ createWorker: () => new InProcessWorker(), idleTimeoutMs: 50 });
    const out = await client.plan(resolved(builtinCaseJson[0]));
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    expect(["starts", "marginal", "needs-assistance"]).toContain(out.result.verdict);
    expect(out.result.series.timeS).toBeInstanceOf(Float64Array);
    expect(out.result.couplerPeaksN).toBeInstanceOf(Float64Array);
    expect(out.result.cautions.length).toBeGreaterThan(0);
    client.dispose();
  });

  it("answers each of several requests with its own outcome", async () => {
    const client = createPlannerClient({ createWorker: () => new InProcessWorker() });
    const good = client.plan(resolved(builtinCaseJson[1]));
    const bad = client.plan({ train: {} } as unknown as StartCase);
    const [g, b] = await Promise.all([good, bad]);
    expect(g.ok).toBe(true);
    expect(b).toMatchObject({ ok: false, kind: "invalid" });
    if (!b.ok) expect(b.issues.map((i) => i.path)).toEqual(expect.arrayContaining(["locomotives", "train.trailingMassKg", "location"]));
    client.dispose();
  });
});
