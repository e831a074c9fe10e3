/**
 * Vite configuration of the app: root is src/app, static assets from public/, the build in dist/. The
 * service worker (vite-plugin-pwa, Workbox) precaches the app — the built-in profiles are bundled into
 * it — and waits for the user before updating. Nothing is loaded from another origin.
 */
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { defineConfig } from "vite";
import { VitePWA } from "vite-plugin-pwa";
import solid from "vite-plugin-solid";

const here = (p: string) => fileURLToPath(new URL(p, import.meta.url));
const pkg = JSON.parse(readFileSync(here("../../package.json"), "utf8")) as { version: string };

export default defineConfig({
  root: here("."),
  base: "./",
  publicDir: here("../../public"),
  define: { __TAUT_VERSION__: JSON.stringify(pkg.version) },
  build: {
    outDir: here("../../dist"),
    emptyOutDir: true,
    target: "es2022",
    reportCompressedSize: false,
  },
  worker: { format: "es" },
  plugins: [
    solid(),
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
      workbox: {
        globPatterns: ["**/*.{js,css,html,svg,png,webmanifest}"],
        navigateFallback: "index.html",
        cleanupOutdatedCaches: true,
        clientsClaim: false,
        skipWaiting: false,
      },
      devOptions: { enabled: false },
    }),
  ],
  preview: { host: "127.0.0.1", port: 4173, strictPort: false },
});
