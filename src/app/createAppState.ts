/** Build the app's state from its parts (the browser wiring in launch.tsx; fakes in tests). */
import { createEffect, createMemo, on } from "solid-js";
import type { PlanResult } from "../core/planner/types.js";
import type { StartCase } from "../core/train/types.js";
import type { PlannerClient } from "../worker/client.js";
import { createBrowserPlannerPool, type PlannerPool } from "../worker/pool.js";
import type { AppContextValue } from "./context.js";
import { createCaseDraft } from "./state/createCaseDraft.js";
import { createLocations } from "./state/createLocations.js";
import { createMotionLock } from "./state/createMotionLock.js";
import { createNav } from "./state/createNav.js";
import type { Probe } from "./state/createConnection.js";
import { createOffline, type RegisterSW } from "./state/createOffline.js";
import { createPlanRun } from "./state/createPlanRun.js";
import { createSettings } from "./state/createSettings.js";
import { createTheme } from "./state/createTheme.js";
import { resolveLanguage, setAppLanguage } from "./i18n.js";

export interface AppDeps {
  planner: PlannerClient;
  /** A second worker for the slower largest-startable-mass search after each plan. */
  background?: PlannerClient;
  registerSW: RegisterSW | null;
  /** Whether the server can be reached (default: a HEAD request for the app's address; see createConnection). */
  connectionProbe?: Probe | null;
  screenIds: readonly string[];
  storage?: Storage | null;
  debounceMs?: number;
  /** Called when the first plan is on screen (the build-time one, then the first live one): the planner's time in the worker, and which it is. */
  onFirstPlan?: (workerMs: number, fromBuild: boolean) => void;
  /** A plan worked out at build time for the first request (see createPlanRun's `initial`). */
  firstPlan?: { key: string; result: PlanResult };
  /** The demo case checked at build time: the draft's JSON text and the case (see createCaseDraft). */
  prechecked?: { caseJson: string; value: StartCase };
  geolocation?: Geolocation;
  /** Workers for batch work (default: the browser's pool, started on first use). */
  pool?: PlannerPool;
  /**
   * List the device's saved location notes in the location pickers from the start (default: when the
   * browser has IndexedDB). The notes store is loaded on demand, after the first render.
   */
  deviceNotes?: boolean;
}

/**
 * Point the location pickers at the device's notes store: a chunk of its own (idb and the store), loaded on
 * demand, so neither idb nor the store is part of the entry.
 */
function installDeviceNotesLater(): void {
  setTimeout(() => {
    import("./screens/LocationNotes/source.js").then(
      (m) => m.installNotesLocationSource(),
      () => undefined, // Offline before the chunk was cached: the built-in notes and quick entry still work.
    );
  }, 0);
}

export function createAppState(deps: AppDeps): AppContextValue {
  const settings = createSettings(deps.storage === undefined ? undefined : deps.storage);
  const locations = createLocations();
  const draft = createCaseDraft({
    library: locations.library,
    settings: settings.settings,
    ...(deps.storage !== undefined ? { storage: deps.storage } : {}),
    ...(deps.prechecked ? { prechecked: deps.prechecked } : {}),
  });
  // The service worker registers once the first plan is on screen (or after a few seconds without one).
  let firstShown!: () => void;
  const firstPlanShown = new Promise<void>((resolve) => (firstShown = resolve));
  const fallback = setTimeout(() => firstShown(), 5000);
  // undefined while the draft's checker loads: the plan waits rather than calling the inputs invalid.
  const validCase = createMemo(() => {
    const c = draft.checked();
    return c.ok ? c.value : "pending" in c ? undefined : null;
  });
  const run = createPlanRun({
    client: deps.planner,
    ...(deps.background ? { background: deps.background } : {}),
    startCase: validCase,
    ...(deps.debounceMs !== undefined ? { debounceMs: deps.debounceMs } : {}),
    ...(deps.firstPlan ? { initial: deps.firstPlan } : {}),
    onFirstResult: (ms, fromBuild) => {
      // What waits for the first plan (the service worker, the reachability check, the device's notes)
      // waits for the live one: it would compete with the worker still starting.
      if (!fromBuild) {
        clearTimeout(fallback);
        firstShown();
      }
      deps.onFirstPlan?.(ms, fromBuild);
    },
  });
  if (deps.deviceNotes ?? typeof indexedDB !== "undefined") {
    // A case that names a note saved on this device cannot be planned before the store is read: read it at
    // once. Otherwise wait until the first plan is on screen, so the store does not compete with it.
    const d = draft.draft;
    if (d.locationMode === "note" && !locations.library().locations.has(d.noteId)) installDeviceNotesLater();
    else void firstPlanShown.then(installDeviceNotesLater);
  }
  // The language on screen follows Settings (or the device's languages); a catalog loads on demand.
  createEffect(on(() => settings.settings().language, (choice) => void setAppLanguage(resolveLanguage(choice))));
  return {
    settings,
    draft,
    run,
    locations,
    nav: createNav(deps.screenIds, deps.screenIds[0] ?? ""),
    offline: createOffline(deps.registerSW, firstPlanShown, deps.connectionProbe !== undefined ? { probe: deps.connectionProbe } : {}),
    theme: createTheme(() => settings.settings().theme),
    motion: createMotionLock(() => settings.settings().motionLock, deps.geolocation ?? (typeof navigator !== "undefined" ? navigator.geolocation : undefined)),
    planner: deps.planner,
    pool: deps.pool ?? createBrowserPlannerPool(),
  };
}
