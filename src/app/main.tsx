/**
 * The browser entry, kept tiny: start the planner worker first, so its thread, script and JIT warm up
 * while the page loads and renders, then load the app (`launch.tsx`, a chunk of its own that the page
 * preloads, see vite.config.ts) and hand it the worker.
 */
import "./styles.css";

const worker = new Worker(new URL("../worker/planner.worker.ts", import.meta.url), { type: "module", name: "taut-planner" });
performance.mark("taut:worker-created");

import("./launch.js").then(
  (m) => m.launch(worker),
  (e: unknown) => {
    // The app's code could not be loaded (offline before it was ever saved, or a broken update).
    const root = document.getElementById("root");
    if (root) root.textContent = `Taut could not load (${e instanceof Error ? e.message : String(e)}). Reload the page when online.`;
    throw e;
  },
);
