/**
 * Start the app with the planner worker the entry has already started (the planner client's first
 * worker; later ones, after an idle stop or a cancel, it starts itself), in three steps:
 * 1. build the state, which sends the first plan request at once;
 * 2. render the app once the worker has taken the request (its first message), or after a short wait.
 *    A message posted to a worker whose script is still loading is held by the page and handed over in
 *    a turn of the main thread after that script has run; rendering first would hold the request back
 *    until the render is done. This way the planner and the render run side by side. When the first case
 *    is the demo, its plan was worked out at build time (firstPlan.ts): the app renders at once with it,
 *    and the live plan replaces it when the worker has it;
 * 3. once the verdict is painted, let the charts start their worker; once the live plan is on screen and
 *    the page is idle, fetch the screens loaded on demand.
 */
import { createRoot } from "solid-js";
import { render } from "solid-js/web";
import { firstPlan } from "virtual:taut/first-plan";
import { createBrowserPlannerClient, createPlannerClient, type WorkerLike } from "../worker/client.js";
import { App } from "./App.js";
import { holdChartsUntil } from "./components/Chart.js";
import { createAppState } from "./createAppState.js";
import { decodeExact, decodePlan } from "./planCodec.js";
import type { StartCase } from "../core/train/types.js";
import { preloadScreens, SCREENS } from "./screens/registry.js";
import { preloadWagonGroups } from "./screens/StartPlan/TrainSection.js";
import { registerSW } from "./sw/register.js";
import { resolveLanguage, setAppLanguage } from "./i18n.js";

/** The longest the first render waits for the worker to take the first request, ms. */
const RENDER_WAIT_MS = 600;

const delay = (ms: number) => new Promise<void>((resolve) => setTimeout(resolve, ms));

function whenIdle(f: () => void): void {
  if (typeof requestIdleCallback === "function") requestIdleCallback(f, { timeout: 3000 });
  else setTimeout(f, 500);
}

export async function launch(firstWorker: Worker): Promise<void> {
  const answered = new Promise<void>((resolve) => firstWorker.addEventListener("message", () => resolve(), { once: true }));
  // The chart worker (chart.js) starts once the verdict is painted, not before: it is not what the page waits for.
  let verdictPainted!: () => void;
  holdChartsUntil(new Promise<void>((resolve) => (verdictPainted = resolve)));
  let fromBuildShown = false;
  let first: Worker | null = firstWorker;
  const planner = createPlannerClient({
    createWorker: () => {
      const w = first ?? new Worker(new URL("../worker/planner.worker.ts", import.meta.url), { type: "module", name: "taut-planner" });
      first = null;
      return w as unknown as WorkerLike;
    },
  });
  const startCase = decodeExact(firstPlan.startCase) as StartCase;
  const state = createRoot(() =>
    createAppState({
      planner,
      background: createBrowserPlannerClient(30_000),
      registerSW,
      screenIds: SCREENS.map((s) => s.id),
      // The key is the checked case as text, as the plan run keys its requests (firstPlan.ts).
      firstPlan: { key: JSON.stringify(startCase), result: decodePlan(firstPlan.plan) },
      prechecked: { caseJson: firstPlan.caseJson, value: startCase },
      // The time from load to the first plan on screen (and the planner's share), for the browser checks:
      // the build-time plan when the first case is the demo, then the live one.
      onFirstPlan: (workerMs, fromBuild) =>
        requestAnimationFrame(() => {
          if (fromBuild) fromBuildShown = true;
          if (fromBuild || !fromBuildShown) performance.mark("taut:first-plan", { detail: { workerMs, fromBuild } });
          if (!fromBuild) performance.mark("taut:first-live-plan", { detail: { workerMs } });
          // After this frame is painted.
          setTimeout(verdictPainted, 0);
          if (!fromBuild) whenIdle(() => void Promise.allSettled([preloadScreens(SCREENS), preloadWagonGroups()]));
        }),
    }),
  );
  if (state.run.status() === "running") {
    // The first plan request has gone to the worker.
    performance.mark("taut:first-request");
    await Promise.race([answered, delay(RENDER_WAIT_MS)]);
  }
  // A language other than English: its catalog (a small chunk) before the first render, so nothing shows in two languages.
  await setAppLanguage(resolveLanguage(state.settings.settings().language));
  const root = document.getElementById("root")!;
  root.textContent = "";
  render(() => <App state={state} screens={SCREENS} />, root);
}
