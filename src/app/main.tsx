/** The browser entry: build the state with the real worker and service worker, and render the app. */
import { render } from "solid-js/web";
import { registerSW } from "virtual:pwa-register";
import { createBrowserPlannerClient } from "../worker/client.js";
import { App } from "./App.js";
import { createAppState } from "./createAppState.js";
import { SCREENS } from "./screens/registry.js";
import "./styles.css";

const root = document.getElementById("root")!;
root.textContent = "";
render(() => {
  const state = createAppState({
    planner: createBrowserPlannerClient(),
    background: createBrowserPlannerClient(30_000),
    registerSW,
    screenIds: SCREENS.map((s) => s.id),
    // The time from load to the first plan on screen (and the planner's share), for the browser checks.
    onFirstPlan: (workerMs) => requestAnimationFrame(() => performance.mark("taut:first-plan", { detail: { workerMs } })),
  });
  // The first plan request has gone to the worker by now.
  performance.mark("taut:first-request");
  return <App state={state} screens={SCREENS} />;
}, root);
