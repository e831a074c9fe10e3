/**
 * Vite configuration of the app: root is src/app, static assets from public/, the build in dist/. The
 * service worker (our own, sw/sw.ts; vite-plugin-pwa writes the manifest and the list of files into it)
 * precaches the app — the built-in profiles are bundled into it — and waits for the user before
 * updating. Nothing is loaded from another origin.
 *
 * Loading: the entry (main.tsx) only starts the planner worker and then imports the app (launch.tsx);
 * `preloadApp` lists that chunk and its imports in the page as modulepreload links, so the browser fetches
 * and compiles them while the entry runs rather than after.
 */
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { defineConfig, type HtmlTagDescriptor, type Plugin } from "vite";
import { VitePWA } from "vite-plugin-pwa";
import solid from "vite-plugin-solid";
import { builtinProfilesPlugin } from "./builtinProfiles.js";
import { firstPlanPlugin } from "./firstPlan.js";

const here = (p: string) => fileURLToPath(new URL(p, import.meta.url));
const pkg = JSON.parse(readFileSync(here("../../package.json"), "utf8")) as { version: string };

/** Modulepreload links for the chunk of `entry` (a module the HTML entry imports on demand) and the chunks it imports. */
function preloadApp(entry: string): Plugin {
  return {
    name: "taut:preload-app",
    apply: "build",
    transformIndexHtml: {
      order: "post",
      handler(_html, ctx) {
        const chunks = Object.values(ctx.bundle ?? {}).filter((c) => c.type === "chunk");
        const app = chunks.find((c) => c.facadeModuleId === entry || c.moduleIds.includes(entry));
        if (!app) return [];
        const html = chunks.filter((c) => c.isEntry).map((c) => c.fileName);
        const files = [app.fileName, ...app.imports].filter((f) => !html.includes(f));
        return files.map((f): HtmlTagDescriptor => ({ tag: "link", attrs: { rel: "modulepreload", crossorigin: true, href: `./${f}` }, injectTo: "head" }));
      },
    },
  };
}

/**
 * Chunking: every module the app needs to show its first plan (what `app` imports, statically) in one
 * chunk, instead of a shared chunk per module that a screen loaded on demand also uses; the entry's own
 * modules stay in the entry. Fewer, larger chunks: fewer requests, and less gzip and glue overhead.
 */
function oneAppChunk(entry: string, app: string, name: string): (id: string, ctx: { getModuleInfo(id: string): { importedIds: readonly string[] } | null }) => string | null {
  let inApp: Set<string> | null = null;
  let inEntry: Set<string> | null = null;
  const graph = (from: string, ctx: Parameters<ReturnType<typeof oneAppChunk>>[1]) => {
    const seen = new Set<string>();
    const todo = [from];
    while (todo.length > 0) {
      const id = todo.pop()!;
      if (seen.has(id)) continue;
      seen.add(id);
      todo.push(...(ctx.getModuleInfo(id)?.importedIds ?? []));
    }
    return seen;
  };
  return (id, ctx) => {
    inApp ??= graph(app, ctx);
    inEntry ??= graph(entry, ctx);
    return inApp.has(id) && !inEntry.has(id) ? name : null;
  };
}

export default defineConfig({
  root: here("."),
  base: "./",
  publicDir: here("../../public"),
  // __TAUT_APP__: the core's benchmark counters and switches are left out of the app (core/dynamics/benchOnly.ts).
  define: { __TAUT_VERSION__: JSON.stringify(pkg.version), __TAUT_APP__: "true" },
  build: {
    outDir: here("../../dist"),
    emptyOutDir: true,
    target: "es2022",
    reportCompressedSize: false,
    // Every browser the app supports preloads modules itself.
    modulePreload: { polyfill: false },
    rolldownOptions: {
      // The build's timing block (plugins that took over a second) is a note for whoever tunes the build,
      // not a warning for whoever starts the app.
      checks: { bundlerTimings: false },
      output: { codeSplitting: { groups: [{ name: oneAppChunk(here("main.tsx"), here("launch.tsx"), "launch"), debugName: "launch", includeDependenciesRecursively: false }] } },
    },
  },
  worker: {
    format: "es",
    // chart.js sets up each scale class with a static field that reads another object's property; read as
    // possibly effectful, the scales the app never registers (category, logarithmic, radial, time) would
    // stay in the chart worker. Our code and chart.js read no property with a getter that does work.
    rolldownOptions: { treeshake: { propertyReadSideEffects: false } },
    plugins: () => [builtinProfilesPlugin()],
  },
  plugins: [
    solid(),
    // The built-in profiles as checked at build time, without the schema code (builtinProfiles.ts).
    builtinProfilesPlugin(),
    // The demo's first plan, worked out now and shown at once on a first visit (firstPlan.ts).
    firstPlanPlugin(),
    preloadApp(here("launch.tsx")),
    VitePWA({
      registerType: "prompt",
      injectRegister: false,
      includeAssets: ["icon.svg"],
      manifest: {
        name: "Taut — start plan",
        short_name: "Taut",
        description: "Plans the start of a heavy freight train: notches, slack, slip risk and assistance. Advisory only.",
        id: "./",
        start_url: "./",
        scope: "./",
        display: "standalone",
        orientation: "any",
        background_color: "#0d1013",
        theme_color: "#1d2a36",
        categories: ["utilities", "productivity"],
        icons: [
          { src: "icon-192.png", sizes: "192x192", type: "image/png" },
          { src: "icon-512.png", sizes: "512x512", type: "image/png" },
          { src: "icon-maskable-512.png", sizes: "512x512", type: "image/png", purpose: "maskable" },
          { src: "icon.svg", sizes: "any", type: "image/svg+xml" },
        ],
      },
      // Our own small service worker (sw/sw.ts) with the list of files to keep written into it.
      strategies: "injectManifest",
      srcDir: "sw",
      filename: "sw.ts",
      injectManifest: { globPatterns: ["**/*.{js,css,html,svg,png,webmanifest}"], rollupFormat: "iife" },
      // Its build (a second, small Vite build) speaks only when something is wrong.
      integration: { configureCustomSWViteBuild: (c) => void (c.logLevel = "warn") },
      devOptions: { enabled: false },
    }),
  ],
  preview: { host: "127.0.0.1", port: 4173, strictPort: false },
});
