/**
 * The service worker's registration as the app's offline state uses it, against a fake of the browser's
 * ServiceWorkerContainer (jsdom has none): the first copy installed reads "offline ready"; a new version
 * installed while a page is controlled waits and says so; updating lets it take over, then reloads.
 */
import { afterEach, describe, expect, it, vi } from "vitest";
import type { RegisterOptions } from "../../src/app/state/createOffline.js";
import { registerSW } from "../../src/app/sw/register.js";

class FakeWorker extends EventTarget {
  state = "installing";
  posted: unknown[] = [];
  postMessage(m: unknown): void {
    this.posted.push(m);
  }
  become(state: string): void {
    this.state = state;
    this.dispatchEvent(new Event("statechange"));
  }
}

class FakeRegistration extends EventTarget {
  installing: FakeWorker | null = null;
  waiting: FakeWorker | null = null;
  active: FakeWorker | null = null;
  /** A new version starts installing. */
  found(): FakeWorker {
    this.installing = new FakeWorker();
    this.dispatchEvent(new Event("updatefound"));
    return this.installing;
  }
  /** The installing version has installed and waits. */
  installed(): void {
    const w = this.installing!;
    this.installing = null;
    this.waiting = w;
    w.become("installed");
  }
}

class FakeContainer extends EventTarget {
  controller: object | null = null;
  registered: Array<{ url: string; scope: string | undefined }> = [];
  constructor(readonly registration: FakeRegistration) {
    super();
  }
  register(url: string, opts?: { scope?: string }): Promise<FakeRegistration> {
    this.registered.push({ url, scope: opts?.scope });
    return Promise.resolve(this.registration);
  }
}

function setup(controlled: boolean) {
  const reg = new FakeRegistration();
  const container = new FakeContainer(reg);
  container.controller = controlled ? {} : null;
  Object.defineProperty(navigator, "serviceWorker", { value: container, configurable: true });
  const seen: string[] = [];
  const options: RegisterOptions = {
    onOfflineReady: () => seen.push("offline ready"),
    onNeedRefresh: () => seen.push("need refresh"),
    onRegisteredSW: (url) => seen.push(`registered ${url}`),
    onRegisterError: () => seen.push("error"),
  };
  const update = registerSW(options);
  return { reg, container, seen, update };
}

const settle = () => new Promise((r) => setTimeout(r, 0));

afterEach(() => {
  delete (navigator as unknown as { serviceWorker?: unknown }).serviceWorker;
  vi.restoreAllMocks();
});

describe("service worker registration", () => {
  it("registers sw.js beside the page, and reads 'offline ready' when the first copy is installed", async () => {
    const { reg, container, seen } = setup(false);
    await settle();
    expect(container.registered).toEqual([{ url: "./sw.js", scope: "./" }]);
    reg.found();
    reg.installed();
    expect(seen).toEqual(["registered ./sw.js", "offline ready"]);
  });

  it("says a new version is waiting when one installs under a controlled page, and updates only when asked", async () => {
    const { reg, container, seen, update } = setup(true);
    await settle();
    const next = reg.found();
    expect(seen).toEqual(["registered ./sw.js"]);
    reg.installed();
    expect(seen).toEqual(["registered ./sw.js", "need refresh"]);
    expect(next.posted).toEqual([]); // nothing happens without the user's word
    const reload = vi.fn();
    vi.spyOn(window, "location", "get").mockReturnValue({ ...window.location, reload } as Location);
    await update(true);
    expect(next.posted).toEqual([{ type: "SKIP_WAITING" }]);
    expect(reload).not.toHaveBeenCalled();
    container.dispatchEvent(new Event("controllerchange"));
    expect(reload).toHaveBeenCalledTimes(1);
  });

  it("finds a version already waiting when the page registers", async () => {
    const reg = new FakeRegistration();
    reg.waiting = new FakeWorker();
    const container = new FakeContainer(reg);
    container.controller = {};
    Object.defineProperty(navigator, "serviceWorker", { value: container, configurable: true });
    const seen: string[] = [];
    registerSW({ onNeedRefresh: () => seen.push("need refresh") });
    await settle();
    expect(seen).toEqual(["need refresh"]);
  });
});
