/**
 * What every screen can reach: settings, the case being edited, its plan, the location notes, the
 * navigation, offline state, the theme and the moving lock. Made once in `App` (or in a test) and
 * provided through Solid's context; screens read it with `useApp()`.
 */
import { createContext, useContext, type Accessor } from "solid-js";
import type { PlannerClient } from "../worker/client.js";
import type { PlannerPool } from "../worker/pool.js";
import type { CaseDraftStore } from "./state/createCaseDraft.js";
import type { LocationsStore } from "./state/createLocations.js";
import type { MotionLock } from "./state/createMotionLock.js";
import type { Nav } from "./state/createNav.js";
import type { OfflineState } from "./state/createOffline.js";
import type { PlanRun } from "./state/createPlanRun.js";
import type { SettingsStore } from "./state/createSettings.js";
import type { Theme } from "./state/createTheme.js";

export interface AppContextValue {
  settings: SettingsStore;
  draft: CaseDraftStore;
  run: PlanRun;
  locations: LocationsStore;
  nav: Nav;
  offline: OfflineState;
  theme: Accessor<Theme>;
  motion: MotionLock;
  /** The planner worker's client (for screens that plan other cases, e.g. Assistance check). */
  planner: PlannerClient;
  /** A pool of planner workers for batch work: Departures, load tables, the Assistance check. */
  pool: PlannerPool;
}

export const AppContext = createContext<AppContextValue>();

export function useApp(): AppContextValue {
  const v = useContext(AppContext);
  if (!v) throw new Error("useApp() outside <AppContext.Provider>");
  return v;
}
