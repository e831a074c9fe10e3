/** The shell: tabs generated from the screen registry, navigation, the moving lock, offline status. */
import { fireEvent, render, screen, waitFor } from "@solidjs/testing-library";
import { describe, expect, it } from "vitest";
import { App } from "../../src/app/App.js";
import { createAppState } from "../../src/app/createAppState.js";
import { SCREENS, type ScreenEntry } from "../../src/app/screens/registry.js";
import type { RegisterSW } from "../../src/app/state/createOffline.js";
import { SETTINGS_KEY } from "../../src/app/state/createSettings.js";
import { createPlannerClient } from "../../src/worker/client.js";
import { InProcessWorker, memoryStorage, renderWithApp } from "./harness.js";

describe("screen registry and tabs", () => {
  it("has the three screens of this app part, named as in NAMING.md, Settings last", () => {
    const ids = SCREENS.map((s) => s.id);
    expect(ids).toEqual(expect.arrayContaining(["start-plan", "cab-steps", "settings"]));
    expect(ids.at(-1)).toBe("settings");
    expect(SCREENS.find((s) => s.id === "start-plan")!.title).toBe("Start plan");
    expect(SCREENS.find((s) => s.id === "cab-steps")!.title).toBe("Cab steps");
  });

  it("makes one large tab per registry entry; a new entry is one more tab (a place reached from another screen has none)", () => {
    const extra: ScreenEntry = { id: "example-screen", title: "Example screen", icon: "table", component: () => <p>table screen</p> };
    const screens = [...SCREENS.slice(0, -1), extra, SCREENS.at(-1)!];
    renderWithApp(undefined, { screens });
    const tabs = screen.getAllByRole("link");
    // Each tab shows its words (the name, or a shorter word: i18n tabs.ts) and is named by the screen's full name.
    // The shown words are hidden from the accessibility tree; the name comes from hidden text holding the full name,
    // so the visible word is part of the name (label in name, WCAG 2.1 SC 2.5.3).
    expect(tabs.map((t) => t.querySelector(".tab-label")?.textContent)).toEqual(screens.filter((s) => !s.noTab).map((s) => s.tab ?? s.title));
    expect(tabs.every((t) => t.querySelector(".tab-label")?.getAttribute("aria-hidden") === "true")).toBe(true);
    expect(tabs.map((t) => t.querySelector(".visually-hidden")?.textContent)).toEqual(screens.filter((s) => !s.noTab).map((s) => s.title));
    expect(screen.getByRole("link", { name: "Assistance check" }).querySelector(".tab-label")?.textContent).toBe("Assis\u00ADtance");
    fireEvent.click(screen.getByRole("link", { name: "Example screen" }));
    expect(screen.getByText("table screen")).toBeTruthy();
    expect(location.hash).toBe("#/example-screen");
    expect(screen.getByRole("link", { name: "Example screen" }).getAttribute("aria-current")).toBe("page");
    expect(document.querySelector(".screen-title")?.textContent).toBe("Example screen");
  });

  it("shows Cab steps full screen, without the tabs, and comes back to Start plan", async () => {
    renderWithApp();
    fireEvent.click(screen.getByRole("link", { name: "Cab steps" }));
    expect(document.querySelector(".tabs")).toBeNull();
    expect(document.querySelector(".app")?.classList.contains("full-screen")).toBe(true);
    // Every screen but Start plan is loaded on demand: its controls appear once its code has arrived.
    fireEvent.click(await screen.findByRole("button", { name: /Start plan/ }, { timeout: 10_000 }));
    await waitFor(() => expect(document.querySelector('[data-screen="start-plan"]')).not.toBeNull());
  });

  it("switches units and theme from Settings, and every figure follows", async () => {
    const { harness } = renderWithApp();
    await waitFor(() => expect(document.querySelector("[data-verdict]")).not.toBeNull(), { timeout: 10_000 });
    fireEvent.click(screen.getByRole("link", { name: "Settings" }));
    fireEvent.click(await screen.findByRole("radio", { name: /US customary/ }, { timeout: 10_000 }));
    fireEvent.click(screen.getByRole("radio", { name: "Night" }));
    expect(document.documentElement.dataset.theme).toBe("night");
    expect(JSON.parse(harness.storage.getItem(SETTINGS_KEY)!)).toMatchObject({ units: "us", theme: "night" });
    fireEvent.click(screen.getByRole("link", { name: "Start plan" }));
    await waitFor(() => expect(document.querySelector("[data-verdict]")).not.toBeNull());
    const text = document.querySelector(".pane-plan")!.textContent!;
    expect(text).toContain("klbf");
    expect(text).not.toMatch(/\d kN/);
    const mass = screen.getByLabelText(/^Trailing mass/, { selector: "input" }) as HTMLInputElement;
    const tonnes = harness.state.draft.draft.train.trailingMass_t;
    expect(mass.value).toBe(String(Math.round((tonnes * 1000) / 907.18474)));
  });
});

describe("moving lock", () => {
  function fakeGeo() {
    let success: PositionCallback | null = null;
    const geo = {
      watchPosition: (s: PositionCallback) => {
        success = s;
        return 1;
      },
      clearWatch: () => {
        success = null;
      },
      getCurrentPosition: () => undefined,
    } as unknown as Geolocation;
    const fix = (speed: number | null) => success?.({ coords: { speed } } as GeolocationPosition);
    return { geo, fix, watching: () => success !== null };
  }

  it("hides every control behind a notice while the device moves, only when allowed", async () => {
    const g = fakeGeo();
    const storage = memoryStorage({ [SETTINGS_KEY]: JSON.stringify({ motionLock: false }) });
    let state!: ReturnType<typeof createAppState>;
    render(() => {
      state = createAppState({ planner: createPlannerClient({ createWorker: () => new InProcessWorker() }), registerSW: null, screenIds: SCREENS.map((s) => s.id), storage, geolocation: g.geo });
      return <App state={state} screens={SCREENS} />;
    });
    expect(g.watching()).toBe(false); // not allowed: the location is not read
    state.settings.update({ motionLock: true });
    await waitFor(() => expect(g.watching()).toBe(true));
    g.fix(15);
    await waitFor(() => expect(screen.getByRole("alertdialog", { name: "The train is moving" })).toBeTruthy());
    expect(document.querySelector(".app")?.hasAttribute("inert")).toBe(true);
    expect(screen.queryByRole("link", { name: "Settings" })).toBeNull(); // hidden from the accessibility tree
    state.settings.update({ motionLock: false });
    await waitFor(() => expect(screen.queryByRole("alertdialog")).toBeNull());
    expect(g.watching()).toBe(false);
  });
});

describe("offline status", () => {
  it("says when the app is not installed for offline use", () => {
    renderWithApp();
    expect(screen.getByRole("status").textContent).toMatch(/Online only|Saving for offline use/);
  });
});

describe("offline and updates", () => {
  it("shows 'Ready offline' once the service worker has the app, and asks before updating", async () => {
    const calls: Array<boolean | undefined> = [];
    let hooks!: Parameters<RegisterSW>[0];
    const register: RegisterSW = (opts) => {
      hooks = opts;
      return async (reload) => void calls.push(reload);
    };
    // jsdom has no service workers: give it the little the status needs.
    Object.defineProperty(navigator, "serviceWorker", { value: { controller: null }, configurable: true });
    try {
      render(() => {
        const state = createAppState({ planner: createPlannerClient({ createWorker: () => new InProcessWorker() }), registerSW: register, connectionProbe: async () => undefined, screenIds: SCREENS.map((s) => s.id), storage: memoryStorage() });
        return <App state={state} screens={SCREENS} />;
      });
      // Registration waits for the first plan on screen.
      await waitFor(() => expect(hooks).toBeDefined(), { timeout: 10_000 });
      expect(screen.getByRole("status").textContent).toBe("Saving for offline use…");
      hooks.onOfflineReady?.();
      await waitFor(() => expect(screen.getByRole("status").textContent).toBe("Ready offline"));
      expect(screen.queryByRole("alertdialog")).toBeNull();
      hooks.onNeedRefresh?.();
      const prompt = await screen.findByRole("alertdialog", { name: "A new version of Taut is ready" });
      expect(calls).toEqual([]); // nothing happens without the user's word
      fireEvent.click(screen.getByRole("button", { name: "Later" }));
      expect(screen.queryByRole("alertdialog")).toBeNull();
      hooks.onNeedRefresh?.();
      await screen.findByRole("alertdialog");
      fireEvent.click(screen.getByRole("button", { name: "Update now" }));
      expect(calls).toEqual([true]);
      expect(prompt).toBeTruthy();
    } finally {
      delete (navigator as unknown as { serviceWorker?: unknown }).serviceWorker;
    }
  });
});
