/**
 * The screens of the app, in the order of the tab bar. A screen is a folder `screens/<Name>/` whose
 * `index.tsx` default-exports a component that reads the app state with `useApp()`. To add one, add one
 * line here, before Settings. Every screen but Start plan is loaded on demand, so the page that shows the
 * first plan carries only what it needs:
 *   { id: "location-notes", title: "Location notes", icon: "notes", component: lazy(() => import("./LocationNotes/index.js")) },
  { id: "start-review", title: "Start review", icon: "notes", component: lazy(() => import("./StartReview/index.js")), noTab: true },
 * Once the first plan is on screen, the app fetches the lazy screens in the background (`preloadScreens`),
 * so a tab opens at once and offline. Icons drawn for the screens to come: "assist" (Assistance
 * check), "departures" (Departures), "table" (Load table), "notes" (Location notes).
 */
import { lazy, type Component, type JSX } from "solid-js";
import type { IconName } from "../components/Icon.js";
import StartPlan from "./StartPlan/index.js";

export interface ScreenEntry {
  /** The hash route: #/<id>. */
  id: string;
  /** Name on the tab and in the top bar (NAMING.md). */
  title: string;
  icon: IconName | (() => JSX.Element);
  component: Component;
  /** Hides the top bar and the tabs (Cab steps). */
  fullScreen?: boolean;
  /** Reached from another screen, not from a tab (Start review, from a location note). */
  noTab?: boolean;
}

export const SCREENS: readonly ScreenEntry[] = [
  { id: "start-plan", title: "Start plan", icon: "plan", component: StartPlan },
  { id: "cab-steps", title: "Cab steps", icon: "steps", component: lazy(() => import("./CabSteps/index.js")), fullScreen: true },
  { id: "assistance-check", title: "Assistance check", icon: "assist", component: lazy(() => import("./AssistanceCheck/index.js")) },
  { id: "departures", title: "Departures", icon: "departures", component: lazy(() => import("./Departures/index.js")) },
  { id: "load-table", title: "Load table", icon: "table", component: lazy(() => import("./LoadTable/index.js")) },
  { id: "location-notes", title: "Location notes", icon: "notes", component: lazy(() => import("./LocationNotes/index.js")) },
  { id: "start-review", title: "Start review", icon: "notes", component: lazy(() => import("./StartReview/index.js")), noTab: true },
  { id: "settings", title: "Settings", icon: "settings", component: lazy(() => import("./Settings/index.js")) },
];

/** Fetch every screen loaded on demand (Solid's `lazy(...).preload()`), e.g. when the page is idle. */
export function preloadScreens(screens: readonly ScreenEntry[]): Promise<unknown> {
  return Promise.allSettled(screens.map((x) => (x.component as { preload?: () => Promise<unknown> }).preload?.()));
}
