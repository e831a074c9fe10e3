/**
 * The screens of the app, in the order of the tab bar. A screen is a folder `screens/<Name>/` whose
 * `index.tsx` default-exports a component that reads the app state with `useApp()`. To add one, add one
 * line here, before Settings — for a large screen, load it on demand:
 *   { id: "location-notes", title: "Location notes", icon: "notes", component: lazy(() => import("./LocationNotes/index.js")) },
 * (with `import { lazy } from "solid-js"`). Icons drawn for the screens to come: "assist" (Assistance
 * check), "departures" (Departures), "table" (Load table), "notes" (Location notes).
 */
import { lazy, type Component, type JSX } from "solid-js";
import type { IconName } from "../components/Icon.js";
import CabSteps from "./CabSteps/index.js";
import Settings from "./Settings/index.js";
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
}

export const SCREENS: readonly ScreenEntry[] = [
  { id: "start-plan", title: "Start plan", icon: "plan", component: StartPlan },
  { id: "cab-steps", title: "Cab steps", icon: "steps", component: CabSteps, fullScreen: true },
  { id: "location-notes", title: "Location notes", icon: "notes", component: lazy(() => import("./LocationNotes/index.js")) },
  { id: "settings", title: "Settings", icon: "settings", component: Settings },
];
