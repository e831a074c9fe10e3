/**
 * The screens of the app, in the order of the tab bar. A screen is a folder `screens/<Name>/` whose
 * `index.tsx` default-exports a component that reads the app state with `useApp()`. To add one, add one
 * line here, before Settings. Every screen but Start plan is loaded on demand, so the page that shows the
 * first plan carries only what it needs:
 *   screen({ id: "location-notes", icon: "notes", component: lazy(() => import("./LocationNotes/index.js")) }, () => t("screenLocationNotes"), () => tt("locationNotes")),
 * Once the first plan is on screen, the app fetches the lazy screens in the background (`preloadScreens`),
 * so a tab opens at once and offline. Icons drawn for the screens to come: "assist" (Assistance
 * check), "departures" (Departures), "table" (Load table), "notes" (Location notes).
 */
import { lazy, type Component, type JSX } from "solid-js";
import { shell } from "../../i18n/en/shell.js";
import { tabs } from "../../i18n/en/tabs.js";
import { tr } from "../i18n.js";
import type { IconName } from "../components/Icon.js";
import StartPlan from "./StartPlan/index.js";

export interface ScreenEntry {
  /** The hash route: #/<id>. */
  id: string;
  /** Name in the top bar (NAMING.md), in the language on screen. */
  readonly title: string;
  /** Words on its tab: the name, or a shorter word where the name would not fit a tab (i18n tabs.ts); the name when absent. */
  readonly tab?: string;
  icon: IconName | (() => JSX.Element);
  component: Component;
  /** Hides the top bar and the tabs (Cab steps). */
  fullScreen?: boolean;
  /** Reached from another screen, not from a tab (Start review, from a location note). */
  noTab?: boolean;
}

const t = tr.ns(shell);
const tt = tr.ns(tabs);

/** A screen whose name (and its tab's words, when given) follow the language on screen. */
function screen(e: Omit<ScreenEntry, "title" | "tab">, title: () => string, tab?: () => string): ScreenEntry {
  Object.defineProperty(e, "title", { get: title, enumerable: true });
  if (tab) Object.defineProperty(e, "tab", { get: tab, enumerable: true });
  return e as ScreenEntry;
}

export const SCREENS: readonly ScreenEntry[] = [
  screen({ id: "start-plan", icon: "plan", component: StartPlan }, () => t("screenStartPlan"), () => tt("startPlan")),
  screen({ id: "cab-steps", icon: "steps", component: lazy(() => import("./CabSteps/index.js")), fullScreen: true }, () => t("screenCabSteps"), () => tt("cabSteps")),
  screen({ id: "assistance-check", icon: "assist", component: lazy(() => import("./AssistanceCheck/index.js")) }, () => t("screenAssistanceCheck"), () => tt("assistanceCheck")),
  screen({ id: "departures", icon: "departures", component: lazy(() => import("./Departures/index.js")) }, () => t("screenDepartures"), () => tt("departures")),
  screen({ id: "load-table", icon: "table", component: lazy(() => import("./LoadTable/index.js")) }, () => t("screenLoadTable"), () => tt("loadTable")),
  screen({ id: "location-notes", icon: "notes", component: lazy(() => import("./LocationNotes/index.js")) }, () => t("screenLocationNotes"), () => tt("locationNotes")),
  screen({ id: "start-review", icon: "notes", component: lazy(() => import("./StartReview/index.js")), noTab: true }, () => t("screenStartReview")),
  screen({ id: "settings", icon: "settings", component: lazy(() => import("./Settings/index.js")) }, () => t("screenSettings"), () => tt("settings")),
];

/** Fetch every screen loaded on demand (Solid's `lazy(...).preload()`), e.g. when the page is idle. */
export function preloadScreens(screens: readonly ScreenEntry[]): Promise<unknown> {
  return Promise.allSettled(screens.map((x) => (x.component as { preload?: () => Promise<unknown> }).preload?.()));
}
