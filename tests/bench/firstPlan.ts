/**
 * First plan on screen in a fresh browser (issue 14, target 3): the app built into a temporary folder and
 * served by `vite preview`, Debian's Chromium started on a new profile each time (cold caches), the time
 * from navigation to the first plan on screen (the app's `taut:first-plan` mark) and to the live plan from
 * the worker. Median of three fresh starts.
 */
import { existsSync, mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { build, preview } from "vite";
import { launch } from "../e2e/browser.js";
import { heading, line, median, target } from "./util.js";

const root = fileURLToPath(new URL("../..", import.meta.url));
const CHROMIUM = "/usr/bin/chromium";

export async function run(): Promise<void> {
  heading("First plan in a fresh browser — built app, vite preview, Chromium on a new profile each time");
  if (!existsSync(CHROMIUM)) {
    line("skipped", "—", `no Chromium at ${CHROMIUM}`);
    return;
  }
  const configFile = join(root, "src/app/vite.config.ts");
  const out = mkdtempSync(join(tmpdir(), "taut-bench-app-"));
  const server = await (async () => {
    await build({ configFile, logLevel: "error", build: { outDir: out, emptyOutDir: true } });
    return preview({ configFile, logLevel: "error", build: { outDir: out }, preview: { port: 0, strictPort: false } });
  })();
  const url = server.resolvedUrls?.local[0];
  const firsts: number[] = [];
  const lives: number[] = [];
  let fromBuild = true;
  try {
    if (!url) throw new Error("vite preview gave no address");
    for (let k = 0; k < 3; k++) {
      const profile = mkdtempSync(join(tmpdir(), "taut-bench-chromium-"));
      const b = await launch(CHROMIUM, profile);
      try {
        await b.page.goto(url);
        await b.page.waitForFunction(() => performance.getEntriesByName("taut:first-live-plan").length > 0, undefined, { timeout: 60_000 });
        const m = await b.page.evaluate(() => {
          const first = performance.getEntriesByName("taut:first-plan")[0] as PerformanceMark;
          const live = performance.getEntriesByName("taut:first-live-plan")[0] as PerformanceMark;
          return { first: first.startTime, live: live.startTime, fromBuild: (first.detail as { fromBuild?: boolean }).fromBuild === true };
        });
        firsts.push(m.first);
        lives.push(m.live);
        fromBuild &&= m.fromBuild;
      } finally {
        await b.context.close();
        rmSync(profile, { recursive: true, force: true });
      }
    }
  } finally {
    await server.close();
    rmSync(out, { recursive: true, force: true });
  }
  const first = median(firsts);
  line("load to first plan on screen", `${first.toFixed(0)} ms`, `runs: ${firsts.map((x) => x.toFixed(0)).join(", ")} ms; ${fromBuild ? "the demo plan worked out at build time" : "from the worker"}`);
  line("load to the live plan from the worker", `${median(lives).toFixed(0)} ms`, `runs: ${lives.map((x) => x.toFixed(0)).join(", ")} ms`);
  target({ target: "first plan on screen in a fresh browser ≤ 1.0 s", figure: `${first.toFixed(0)} ms`, ratio: first / 1000, note: fromBuild ? "build-time plan, replaced by the live one" : "" });
}
