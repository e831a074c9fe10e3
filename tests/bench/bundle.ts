/**
 * Bundle size: builds the app into a temporary folder and prints every JavaScript file with its gzipped
 * size (level 9), grouped by when the page needs it:
 * - before the verdict: the entry, what the page preloads (modulepreload links) and what those import, and
 *   the planner worker (target ≤ 90 KiB, issue 14);
 * - after the verdict: the charts' chunk (their frame's drawing half, legend and the Start plan's chart
 *   builders) and the chart worker, both loaded once the verdict is painted;
 * - on demand: the other screens and what only they use;
 * - service worker.
 * The budgets are printed beside the figures, not asserted.
 * Run: npx tsx tests/bench/bundle.ts [--modules]   (--modules: the largest source modules of each chunk)
 * Also part of `npm run bench`.
 */
import { mkdtempSync, readdirSync, readFileSync, rmSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, relative } from "node:path";
import { fileURLToPath } from "node:url";
import { gzipSync } from "node:zlib";
import { build, type Plugin } from "vite";
import { target } from "./util.js";

const BUDGET_KB = 120;
/** JavaScript the page loads before its verdict shows, KiB gzipped (issue 14). */
const BEFORE_VERDICT_KB = 90;
const root = fileURLToPath(new URL("../..", import.meta.url));

function walk(dir: string): string[] {
  return readdirSync(dir).flatMap((f) => {
    const p = join(dir, f);
    return statSync(p).isDirectory() ? walk(p) : [p];
  });
}

export type LoadGroup = "before the verdict" | "after the verdict" | "on demand" | "service worker";

export interface BundleFile {
  file: string;
  bytes: number;
  gzipBytes: number;
  serviceWorker: boolean;
  group: LoadGroup;
}

/** Largest source modules of one chunk, by their share of the minified output (before gzip). */
export type ModuleSizes = Map<string, Array<{ id: string; bytes: number }>>;

/** Collects, for every chunk of the app and of its workers, the rendered size of each source module. */
function moduleSizes(into: ModuleSizes): Plugin {
  return {
    name: "taut-bench:module-sizes",
    generateBundle(_options, bundle) {
      for (const chunk of Object.values(bundle)) {
        if (chunk.type !== "chunk") continue;
        const mods = Object.entries(chunk.modules)
          .map(([id, m]) => ({ id: id.replace(root, "").replace(/^.*node_modules\//, "npm:"), bytes: m.renderedLength }))
          .sort((a, b) => b.bytes - a.bytes);
        into.set(chunk.fileName.replace(/^.*\//, ""), mods);
      }
    },
  };
}

/** Files the page loads before its first plan: the HTML's scripts and preloads, and their static imports. */
function firstPlanFiles(out: string): Set<string> {
  const html = readFileSync(join(out, "index.html"), "utf8");
  const todo = [...html.matchAll(/(?:src|href)="\.\/(assets\/[^"]+\.js)"/g)].map((m) => m[1]!);
  const seen = new Set<string>();
  while (todo.length > 0) {
    const f = todo.pop()!;
    if (seen.has(f)) continue;
    seen.add(f);
    const code = readFileSync(join(out, f), "utf8");
    // Static imports only (`import … from "./x.js"`), not `import("./x.js")`.
    for (const m of code.matchAll(/(?:^|[;\s}])import\s*(?:[\w${},\s*]+from\s*)?["']\.\/([^"']+\.js)["']/g)) todo.push(`assets/${m[1]}`);
  }
  return seen;
}

/** Build the app and measure its JavaScript. */
export async function measureBundle(modules?: ModuleSizes): Promise<BundleFile[]> {
  const out = mkdtempSync(join(tmpdir(), "taut-bundle-"));
  try {
    const plugins = modules ? [moduleSizes(modules)] : [];
    await build({
      configFile: join(root, "src/app/vite.config.ts"),
      logLevel: "error",
      build: { outDir: out, emptyOutDir: true },
      plugins,
      ...(modules ? { worker: { plugins: () => [moduleSizes(modules)] } } : {}),
    });
    const first = firstPlanFiles(out);
    return walk(out)
      .filter((f) => f.endsWith(".js"))
      .map((f) => {
        const data = readFileSync(f);
        const rel = relative(out, f);
        const serviceWorker = !rel.startsWith("assets/");
        const group: LoadGroup = serviceWorker
          ? "service worker"
          : first.has(rel) || /planner\.worker-/.test(rel)
            ? "before the verdict"
            : /(chart\.worker|chartParts)-/.test(rel)
              ? "after the verdict"
              : "on demand";
        return { file: rel, bytes: data.length, gzipBytes: gzipSync(data, { level: 9 }).length, serviceWorker, group };
      })
      .sort((a, b) => b.gzipBytes - a.gzipBytes);
  } finally {
    rmSync(out, { recursive: true, force: true });
  }
}

const kb = (b: number) => (b / 1024).toFixed(1);

export async function run(showModules = false): Promise<void> {
  const modules: ModuleSizes | undefined = showModules ? new Map() : undefined;
  const files = await measureBundle(modules);
  console.log("\nJavaScript in the built app (gzip -9):");
  for (const group of ["before the verdict", "after the verdict", "on demand", "service worker"] as const) {
    const of = files.filter((f) => f.group === group);
    console.log(`  ${group}: ${kb(of.reduce((s, f) => s + f.gzipBytes, 0))} KB gzipped`);
    for (const f of of) {
      console.log(`    ${kb(f.gzipBytes).padStart(7)} KB  (${kb(f.bytes).padStart(7)} KB raw)  ${f.file}`);
      const mods = modules?.get(f.file.replace(/^.*\//, ""));
      for (const m of mods?.filter((x) => x.bytes >= 1024).slice(0, 12) ?? []) console.log(`               ${kb(m.bytes).padStart(7)} KB rendered  ${m.id}`);
    }
  }
  const total = files.reduce((s, f) => s + f.gzipBytes, 0);
  console.log(`  total JS: ${kb(total)} KB gzipped (budget ${BUDGET_KB} KB)`);
  const before = files.filter((f) => f.group === "before the verdict").reduce((s, f) => s + f.gzipBytes, 0);
  target({ target: `JavaScript before the verdict shows ≤ ${BEFORE_VERDICT_KB} KiB gzip`, figure: `${kb(before)} KiB`, ratio: before / 1024 / BEFORE_VERDICT_KB });
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) await run(process.argv.includes("--modules"));
