/**
 * The app's sense of being online (createConnection, createOffline) against fakes: a check whose answer
 * the test gives, the browser's `online`/`offline` events, the page's visibility and a fake clock. The
 * status follows what was observed last, not `navigator.onLine` alone; checks stay few.
 */
import { render, screen, waitFor } from "@solidjs/testing-library";
import { createRoot } from "solid-js";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { OfflineStatus } from "../../src/app/components/OfflineStatus.js";
import { createConnection, type Connection, type ConnectionOptions, type Probe } from "../../src/app/state/createConnection.js";
import { createOffline, type RegisterSW } from "../../src/app/state/createOffline.js";

/** A check the test answers: each call waits until `answer` (true: the server answered; false: a network error). */
function fakeProbe() {
  const pending: Array<{ settle: (reached: boolean) => void; signal: AbortSignal }> = [];
  const probe: Probe = (signal) =>
    new Promise((resolve, reject) => {
      const settle = (reached: boolean) => (reached ? resolve(new Response(null, { status: 200 })) : reject(new TypeError("Failed to fetch")));
      signal.addEventListener("abort", () => reject(new DOMException("aborted", "AbortError")));
      pending.push({ settle, signal });
    });
  return {
    probe,
    calls: () => pending.length,
    /** Answer the oldest unanswered check. */
    answer: async (reached: boolean) => {
      const p = pending.find((x) => !x.signal.aborted && !("done" in x));
      if (!p) throw new Error("no check is waiting");
      Object.assign(p, { done: true });
      p.settle(reached);
      await flush();
    },
    aborted: () => pending.filter((p) => p.signal.aborted).length,
  };
}

const flush = async () => {
  for (let k = 0; k < 5; k++) await Promise.resolve();
};

let dispose: (() => void) | undefined;
function connect(options: ConnectionOptions): Connection {
  return createRoot((d) => {
    dispose = d;
    return createConnection(options);
  });
}

function setOnLine(v: boolean) {
  Object.defineProperty(navigator, "onLine", { value: v, configurable: true });
}
function setVisibility(v: DocumentVisibilityState) {
  Object.defineProperty(document, "visibilityState", { value: v, configurable: true });
  document.dispatchEvent(new Event("visibilitychange"));
}

beforeEach(() => {
  setOnLine(true);
  Object.defineProperty(document, "visibilityState", { value: "visible", configurable: true });
});
afterEach(() => {
  dispose?.();
  dispose = undefined;
  vi.useRealTimers();
  delete (navigator as unknown as { onLine?: boolean }).onLine;
  delete (document as unknown as { visibilityState?: string }).visibilityState;
});

describe("createConnection", () => {
  it("starts from the browser's word, checks only once the first plan is shown, and believes the check", async () => {
    const f = fakeProbe();
    let firstPlan!: () => void;
    const after = new Promise<void>((r) => (firstPlan = r));
    const c = connect({ probe: f.probe, after });
    expect(c.online()).toBe(true);
    expect(c.observation().source).toBe("browser");
    await flush();
    expect(f.calls()).toBe(0);
    firstPlan();
    await flush();
    expect(f.calls()).toBe(1);
    // navigator.onLine still says true; the server did not answer.
    await f.answer(false);
    expect(navigator.onLine).toBe(true);
    expect(c.online()).toBe(false);
    expect(c.observation()).toMatchObject({ source: "check", online: false });
  });

  it("comes back online when a check gets an answer, or when the browser says so", async () => {
    const f = fakeProbe();
    const c = connect({ probe: f.probe });
    await flush();
    await f.answer(false);
    expect(c.online()).toBe(false);
    const answered = c.check();
    await f.answer(true);
    expect(await answered).toBe(true);
    expect(c.online()).toBe(true);

    const unanswered = c.check();
    await f.answer(false);
    expect(await unanswered).toBe(false);
    expect(c.online()).toBe(false);
    // The `online` event: online at once, and a check to confirm it.
    dispatchEvent(new Event("online"));
    expect(c.online()).toBe(true);
    expect(c.observation().source).toBe("browser");
    await flush();
    expect(f.calls()).toBe(4);
    await f.answer(false); // a network with no route: the check says otherwise
    expect(c.online()).toBe(false);
  });

  it("goes offline on the browser's `offline` event; a check begun before it does not overrule it", async () => {
    const f = fakeProbe();
    const c = connect({ probe: f.probe });
    await flush();
    expect(f.calls()).toBe(1);
    dispatchEvent(new Event("offline"));
    expect(c.online()).toBe(false);
    expect(c.observation()).toMatchObject({ source: "browser", online: false });
    await f.answer(true);
    expect(c.online()).toBe(false);
  });

  it("counts requests made elsewhere (the service worker's update check)", () => {
    const c = connect({ probe: null });
    c.observe(false);
    expect(c.online()).toBe(false);
    expect(c.observation().source).toBe("check");
    c.observe(true);
    expect(c.online()).toBe(true);
  });

  it("checks at a modest pace: one at a time, none while the page is hidden, one when it shows again", async () => {
    vi.useFakeTimers();
    const f = fakeProbe();
    connect({ probe: f.probe, everyMs: 60_000 });
    await flush();
    expect(f.calls()).toBe(1);
    // Unanswered: the interval and a return to the page start no second check.
    await vi.advanceTimersByTimeAsync(5_000);
    setVisibility("visible");
    expect(f.calls()).toBe(1);
    await f.answer(true);
    await vi.advanceTimersByTimeAsync(60_000);
    expect(f.calls()).toBe(2);
    await f.answer(true);
    setVisibility("hidden");
    await vi.advanceTimersByTimeAsync(10 * 60_000);
    expect(f.calls()).toBe(2);
    setVisibility("visible");
    await flush();
    expect(f.calls()).toBe(3);
  });

  it("counts a check that gets no answer within its time as failed, and cancels it", async () => {
    vi.useFakeTimers();
    const f = fakeProbe();
    const c = connect({ probe: f.probe, timeoutMs: 10_000 });
    await flush();
    expect(c.online()).toBe(true);
    await vi.advanceTimersByTimeAsync(10_000);
    expect(f.aborted()).toBe(1);
    expect(c.online()).toBe(false);
  });

  it("stops listening and checking once disposed", async () => {
    const f = fakeProbe();
    const c = connect({ probe: f.probe });
    await flush();
    dispose!();
    dispose = undefined;
    dispatchEvent(new Event("offline"));
    expect(c.online()).toBe(true);
    setVisibility("visible");
    expect(f.calls()).toBe(1);
  });
});

describe("createOffline and the status", () => {
  function fakeRegistration(update: () => Promise<unknown>) {
    return { active: {}, update } as unknown as ServiceWorkerRegistration;
  }

  beforeEach(() => {
    // jsdom has no service workers: the little the offline state reads.
    Object.defineProperty(navigator, "serviceWorker", { value: { controller: {} }, configurable: true });
  });
  afterEach(() => {
    delete (navigator as unknown as { serviceWorker?: unknown }).serviceWorker;
  });

  it("shows 'Offline — working from the saved copy' when the check fails though navigator.onLine is true, and why", async () => {
    const f = fakeProbe();
    const register: RegisterSW = (o) => {
      o.onRegisteredSW?.("./sw.js", fakeRegistration(async () => undefined));
      return async () => undefined;
    };
    render(() => <OfflineStatus offline={createOffline(register, Promise.resolve(), { probe: f.probe })} />);
    const status = screen.getByRole("status");
    expect(status.textContent).toBe("Ready offline");
    await waitFor(() => expect(f.calls()).toBe(1));
    await f.answer(false);
    await waitFor(() => expect(status.textContent).toBe("Offline — working from the saved copy"));
    expect(status.getAttribute("title")).toMatch(/^No answer from the server at \d\d:\d\d$/);
    expect(status.classList.contains("away")).toBe(true);
    dispatchEvent(new Event("online"));
    await waitFor(() => expect(status.textContent).toBe("Ready offline"));
    expect(status.getAttribute("title")).toBe("The device reports a network connection");
  });

  it("says 'Offline' when the app is not saved yet and the server cannot be reached", async () => {
    Object.defineProperty(navigator, "serviceWorker", { value: { controller: null }, configurable: true });
    const f = fakeProbe();
    render(() => <OfflineStatus offline={createOffline(() => async () => undefined, Promise.resolve(), { probe: f.probe })} />);
    await waitFor(() => expect(f.calls()).toBe(1));
    await f.answer(false);
    await waitFor(() => expect(screen.getByRole("status").textContent).toBe("Offline"));
  });

  it("counts a failed update check as offline and a successful one as online", async () => {
    let fail = true;
    const register: RegisterSW = (o) => {
      o.onRegisteredSW?.("./sw.js", fakeRegistration(() => (fail ? Promise.reject(new TypeError("Failed to update a ServiceWorker")) : Promise.resolve())));
      return async () => undefined;
    };
    const state = createRoot((d) => {
      dispose = d;
      return createOffline(register, Promise.resolve(), { probe: null });
    });
    await flush();
    expect(state.online()).toBe(true);
    await state.check();
    expect(state.online()).toBe(false);
    expect(state.observation().source).toBe("check");
    fail = false;
    await state.check();
    expect(state.online()).toBe(true);
  });
});
