/**
 * The pool of planner workers: how many run at once, the order, cancelling a waiting or a running
 * request, a bad request among good ones, disposal; and the client's new typed calls (rows as they come,
 * options on the wire, an answer of the wrong kind).
 */
import { readFileSync } from "node:fs";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import type { StartCase } from "../../src/core/train/types.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { abortError, createPlannerClient, type Outcome, type PlannerClient, type WorkerLike } from "../../src/worker/client.js";
import { createPlannerHandler } from "../../src/worker/handler.js";
import { createPlannerPool, defaultPoolSize, MAX_POOL_SIZE } from "../../src/worker/pool.js";
import type { CheckAnswer, WorkerRequest, WorkerResponse } from "../../src/worker/protocol.js";

const token = (n: number) => ({ token: n }) as unknown as StartCase;

/** A client whose calls the test answers by hand. */
function manualClient(log: Array<{ client: number; token: number }>, index: number) {
  const calls: Array<{ token: number; resolve: (o: Outcome<unknown>) => void; signal?: AbortSignal }> = [];
  let disposed = false;
  const call = (c: StartCase, o: { signal?: AbortSignal } = {}) =>
    new Promise<Outcome<never>>((resolve, reject) => {
      const t = (c as unknown as { token: number }).token;
      log.push({ client: index, token: t });
      o.signal?.addEventListener("abort", () => reject(abortError()));
      calls.push({ token: t, resolve: resolve as (o: Outcome<unknown>) => void, ...(o.signal ? { signal: o.signal } : {}) });
    });
  const client = {
    plan: call,
    assistance: call,
    conditionMargins: call,
    loadTable: call,
    check: call,
    warm: () => undefined,
    alive: true,
    pending: 0,
    dispose: () => {
      disposed = true;
    },
  } as unknown as PlannerClient;
  return { client, calls, disposed: () => disposed };
}

const answer = { ok: true as const, result: { verdict: "starts" } as unknown as CheckAnswer, elapsedMs: 1 };
const tick = () => new Promise((r) => setTimeout(r, 0));

describe("pool size", () => {
  it("follows the device's processors, at least 1, at most 4, and 2 when unknown", () => {
    expect(defaultPoolSize(1)).toBe(1);
    expect(defaultPoolSize(3)).toBe(3);
    expect(defaultPoolSize(16)).toBe(MAX_POOL_SIZE);
    expect(MAX_POOL_SIZE).toBe(4);
    expect(defaultPoolSize(undefined)).toBe(2);
    expect(defaultPoolSize(0)).toBe(2);
    expect(defaultPoolSize(Number.NaN)).toBe(2);
  });
});

describe("planner pool (scripted clients)", () => {
  let log: Array<{ client: number; token: number }>;
  let clients: Array<ReturnType<typeof manualClient>>;
  const make = (size: number) =>
    createPlannerPool({
      size,
      createClient: () => {
        const c = manualClient(log, clients.length);
        clients.push(c);
        return c.client;
      },
    });
  beforeEach(() => {
    log = [];
    clients = [];
  });

  it("runs at most `size` requests at once, one per client, the rest in order as clients free up", async () => {
    const pool = make(2);
    const outs = [1, 2, 3, 4, 5].map((n) => pool.check(token(n)));
    expect(clients).toHaveLength(2);
    expect(log).toEqual([
      { client: 0, token: 1 },
      { client: 1, token: 2 },
    ]);
    expect(pool.running).toBe(2);
    expect(pool.waiting).toBe(3);
    clients[1]!.calls[0]!.resolve(answer);
    await tick();
    expect(log.at(-1)).toEqual({ client: 1, token: 3 });
    clients[0]!.calls[0]!.resolve(answer);
    await tick();
    expect(log.at(-1)).toEqual({ client: 0, token: 4 });
    clients[1]!.calls[1]!.resolve(answer);
    clients[0]!.calls[1]!.resolve(answer);
    await tick();
    expect(log.at(-1)!.token).toBe(5);
    expect(clients).toHaveLength(2);
    (clients[0]!.calls[2] ?? clients[1]!.calls[2])!.resolve(answer);
    await expect(Promise.all(outs)).resolves.toHaveLength(5);
    expect(pool.running).toBe(0);
  });

  it("starts clients only as the queue needs them", () => {
    const pool = make(4);
    void pool.check(token(1));
    expect(clients).toHaveLength(1);
    void pool.check(token(2));
    expect(clients).toHaveLength(2);
  });

  it("takes a waiting request out of the queue when it is cancelled; it never reaches a worker", async () => {
    const pool = make(1);
    const first = pool.check(token(1));
    const ctrl = new AbortController();
    const second = pool.check(token(2), { signal: ctrl.signal });
    const third = pool.check(token(3));
    ctrl.abort();
    await expect(second).rejects.toMatchObject({ name: "AbortError" });
    expect(pool.waiting).toBe(1);
    clients[0]!.calls[0]!.resolve(answer);
    await first;
    await tick();
    expect(log.map((l) => l.token)).toEqual([1, 3]);
    clients[0]!.calls[1]!.resolve(answer);
    await expect(third).resolves.toMatchObject({ ok: true });
  });

  it("frees the worker of a running request that is cancelled, for the next one", async () => {
    const pool = make(1);
    const ctrl = new AbortController();
    const running = pool.check(token(1), { signal: ctrl.signal });
    const next = pool.check(token(2));
    expect(clients[0]!.calls[0]!.signal).toBe(ctrl.signal);
    ctrl.abort();
    await expect(running).rejects.toMatchObject({ name: "AbortError" });
    await tick();
    expect(log.map((l) => l.token)).toEqual([1, 2]);
    clients[0]!.calls[1]!.resolve(answer);
    await expect(next).resolves.toMatchObject({ ok: true });
  });

  it("rejects at once a request whose signal is already aborted", async () => {
    const pool = make(1);
    const ctrl = new AbortController();
    ctrl.abort();
    await expect(pool.check(token(1), { signal: ctrl.signal })).rejects.toMatchObject({ name: "AbortError" });
    expect(clients).toHaveLength(0);
  });

  it("hands a failed request its own outcome while the others are answered", async () => {
    const pool = make(2);
    const good = pool.check(token(1));
    const bad = pool.check(token(2));
    clients[1]!.calls[0]!.resolve({ ok: false, kind: "invalid", issues: [{ path: "train", message: "is required" }], message: "The start case is malformed." });
    clients[0]!.calls[0]!.resolve(answer);
    await expect(bad).resolves.toMatchObject({ ok: false, kind: "invalid" });
    await expect(good).resolves.toMatchObject({ ok: true });
  });

  it("dispose rejects what waits and stops every client", async () => {
    const pool = make(1);
    void pool.check(token(1)).catch(() => undefined);
    const waiting = pool.check(token(2));
    pool.dispose();
    await expect(waiting).rejects.toMatchObject({ name: "AbortError" });
    expect(clients[0]!.disposed()).toBe(true);
    await expect(pool.check(token(3))).rejects.toMatchObject({ name: "AbortError" });
  });
});

describe("planner pool with in-process workers", () => {
  class InProcessWorker implements WorkerLike {
    onmessage: WorkerLike["onmessage"] = null;
    onerror: WorkerLike["onerror"] = null;
    terminated = false;
    private handle = createPlannerHandler((msg, transfer) => {
      const copy = structuredClone(msg, { transfer });
      setTimeout(() => !this.terminated && this.onmessage?.({ data: copy }), 0);
    });
    postMessage(m: WorkerRequest) {
      const copy = structuredClone(m);
      setTimeout(() => !this.terminated && this.handle(copy), 0);
    }
    terminate() {
      this.terminated = true;
    }
  }

  it("checks departures side by side: each gets its own answer, a malformed one its issues", async () => {
    const lib = builtinLibrary();
    const day = JSON.parse(readFileSync(new URL("../../profiles/departures/demo-day.json", import.meta.url), "utf8")) as Array<{ id: string }>;
    const dep = (id: string) => {
      const r = parseStartCase(day.find((d) => d.id === id), lib);
      if (!r.ok) throw new Error(id);
      return r.value;
    };
    const pool = createPlannerPool({ size: 2, createClient: () => createPlannerClient({ createWorker: () => new InProcessWorker(), idleTimeoutMs: 50 }) });
    const progress: number[] = [];
    const [a, b, bad] = await Promise.all([
      pool.check(dep("agg-0930"), { onProgress: (f) => progress.push(f) }),
      pool.check(dep("agg-1415")),
      pool.check({ train: {} } as unknown as StartCase),
    ]);
    expect(a).toMatchObject({ ok: true, result: { verdict: "starts", assistance: null } });
    expect(b).toMatchObject({ ok: true, result: { verdict: "needs-assistance" } });
    if (b.ok) expect(b.result.assistance?.verdict).toBe("starts");
    expect(bad).toMatchObject({ ok: false, kind: "invalid" });
    expect(progress[0]).toBe(0);
    expect(progress.at(-1)).toBe(1);
    pool.dispose();
  });
});

describe("client calls", () => {
  class ScriptedWorker implements WorkerLike {
    onmessage: WorkerLike["onmessage"] = null;
    onerror: WorkerLike["onerror"] = null;
    sent: WorkerRequest[] = [];
    postMessage(m: WorkerRequest) {
      this.sent.push(m);
    }
    terminate() {}
    answer(m: WorkerResponse) {
      this.onmessage?.({ data: m });
    }
  }
  let w: ScriptedWorker;
  let client: PlannerClient;
  beforeEach(() => {
    vi.useFakeTimers();
    w = new ScriptedWorker();
    client = createPlannerClient({ createWorker: () => w });
  });
  afterEach(() => {
    client.dispose();
    vi.useRealTimers();
  });

  it("sends each kind with only the options given", () => {
    // Left unanswered: dispose() after the test aborts them.
    const quiet = (p: Promise<unknown>) => void p.catch(() => undefined);
    quiet(client.check(token(1)));
    quiet(client.check(token(2), { helper: { id: "h" } as never }));
    quiet(client.assistance(token(3), { budget: 8, maxUnits: 1 }));
    quiet(client.conditionMargins(token(4), { quick: false }));
    quiet(client.loadTable(token(5), { cells: [{ rail: "dry", sand: true }] }));
    expect(w.sent.map((m) => ("options" in m ? [m.type, m.options] : [m.type]))).toEqual([
      ["check"],
      ["check", { helper: { id: "h" } }],
      ["assistance", { budget: 8, maxUnits: 1 }],
      ["conditionMargins"],
      ["loadTable", { cells: [{ rail: "dry", sand: true }] }],
    ]);
  });

  it("hands load-table rows over as they come, then the whole table", async () => {
    const rows: unknown[] = [];
    const p = client.loadTable(token(1), { onRow: (r) => rows.push(r) });
    const id = w.sent[0]!.id;
    const row = { rail: "dry" as const, sand: false, maxTrailingMassKg: 1.5e6 };
    w.answer({ type: "progress", id, fraction: 0 });
    w.answer({ type: "progress", id, fraction: 1 / 12, row });
    expect(rows).toEqual([row]);
    w.answer({ type: "result", id, request: "loadTable", result: [row], elapsedMs: 3 });
    await expect(p).resolves.toEqual({ ok: true, result: [row], elapsedMs: 3 });
  });

  it("reports an answer of another kind than asked for, rather than handing it on", async () => {
    const p = client.check(token(1));
    w.answer({ type: "result", id: w.sent[0]!.id, request: "plan", result: {} as never, elapsedMs: 1 });
    await expect(p).resolves.toMatchObject({ ok: false, kind: "internal", message: expect.stringContaining("check request with a plan result") });
  });
});
