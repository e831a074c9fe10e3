/**
 * Test runner configuration: one project per runtime. `npm test` runs them all.
 * - unit: architecture (import rules), core, reference checks, profiles, CLI, notes store, worker protocol (Node)
 * - app: Solid components (jsdom)
 * - e2e: the built app in Debian's Chromium (playwright-core); its global setup builds and serves the app
 */
import { fileURLToPath } from "node:url";
import solid from "vite-plugin-solid";
import { defineConfig } from "vitest/config";

const root = fileURLToPath(new URL("..", import.meta.url));

export default defineConfig({
  root,
  test: {
    projects: [
      {
        test: {
          name: "unit",
          root,
          environment: "node",
          include: ["tests/{architecture,core,reference,profiles,cli,notes,worker,i18n}/**/*.test.ts"],
          testTimeout: 60_000,
        },
      },
      {
        plugins: [solid()],
        resolve: { conditions: ["development", "browser"] },
        test: {
          name: "app",
          root,
          environment: "jsdom",
          include: ["tests/app/**/*.test.{ts,tsx}"],
          setupFiles: ["tests/app/setup.ts"],
          testTimeout: 30_000,
        },
      },
      {
        test: {
          name: "e2e",
          root,
          environment: "node",
          include: ["tests/e2e/**/*.test.ts"],
          globalSetup: ["tests/e2e/global-setup.ts"],
          testTimeout: 120_000,
          hookTimeout: 300_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
