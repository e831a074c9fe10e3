/**
 * Bundle size: builds the app into a temporary folder and prints every JavaScript file with its gzipped
 * size (level 9), the page's total (app, workers, chunks loaded on demand) and the service worker's.
 * The budget (ISSUE 6: total JS ≤ 120 KB gzipped) is printed beside the figure, not asserted.
 * Run: npx tsx tests/bench/bundle.ts
 */
import { mkdtempSync, readdirSync, readFileSync, rmSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, relative } from "node:path";
import { fileURLToPath } from "node:url";
import { gzipSync } from "node:zlib";
import { build } from "vite";

const BUDGET_KB = 120;
const root = fileURLToPath(new URL("../..", import.meta.url));

function walk(dir: string): string[] {
  return readdirSync(dir).flatMap((f) => {
    const p = join(dir, f);
    return statSync(p).isDirectory() ? walk(p) : [p];
  });
}

export interface BundleFile {
  file: string;
  bytes: number;
  gzipBytes: number;
  serviceWorker: boolean;
}

/** Build the app and measure its JavaScript. */
export async function measureBundle(): Promise<BundleFile[]> {
  const out = mkdtempSync(join(tmpdir(), "taut-bundle-"));
  try {
    await build({ configFile: join(root, "src/app/vite.config.ts"), logLevel: "error", build: { outDir: out, emptyOutDir: true } });
    return walk(out)
      .filter((f) => f.endsWith(".js"))
      .map((f) => {
        const data = readFileSync(f);
        const rel = relative(out, f);
        return { file: rel, bytes: data.length, gzipBytes: gzipSync(data, { level: 9 }).length, serviceWorker: !rel.startsWith("assets/") };
      })
      .sort((a, b) => b.gzipBytes - a.gzipBytes);
  } finally {
    rmSync(out, { recursive: true, force: true });
  }
}

const kb = (b: number) => (b / 1024).toFixed(1);

async function main(): Promise<void> {
  const files = await measureBundle();
  console.log("JavaScript in the built app (gzip -9):");
  for (const f of files) console.log(`  ${kb(f.gzipBytes).padStart(7)} KB  (${kb(f.bytes).padStart(7)} KB raw)  ${f.file}${f.serviceWorker ? "  [service worker]" : ""}`);
  const page = files.filter((f) => !f.serviceWorker).reduce((s, f) => s + f.gzipBytes, 0);
  const sw = files.filter((f) => f.serviceWorker).reduce((s, f) => s + f.gzipBytes, 0);
  console.log(`  page JS (entry, chunks, workers): ${kb(page)} KB gzipped`);
  console.log(`  service worker JS:                ${kb(sw)} KB gzipped`);
  console.log(`  total JS:                         ${kb(page + sw)} KB gzipped (budget ${BUDGET_KB} KB)`);
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) await main();
