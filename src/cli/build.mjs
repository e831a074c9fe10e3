#!/usr/bin/env node
/**
 * Builds the command line into plain JavaScript, so `taut` starts without compiling TypeScript: esbuild
 * bundles src/cli/main.ts and the batch worker (src/cli/batch/workerMain.ts) with everything they import into
 * build/cli/main.cjs and build/cli/worker.mjs. It runs at install (`prepare`) and again from the `taut` launcher
 * whenever a source file has changed since (build/cli/inputs.json records each input file and its time).
 *   node src/cli/build.mjs
 */
import { mkdirSync, renameSync, statSync, writeFileSync } from "node:fs";
import { dirname, join, relative, sep } from "node:path";
import { fileURLToPath } from "node:url";

const root = fileURLToPath(new URL("../../", import.meta.url));
export const CLI_BUILD_DIR = join(root, "build", "cli");
/** Besides the modules the bundle is made of: the lock file, which changes when a dependency does. */
const EXTRA_INPUTS = ["package-lock.json"];

/** Write a file whole or not at all (another `taut` may be reading or building at the same moment). */
function writeAtomically(path, contents) {
  mkdirSync(dirname(path), { recursive: true });
  const tmp = `${path}.${process.pid}.tmp`;
  writeFileSync(tmp, contents);
  renameSync(tmp, path);
}

/** Bundle the command line; returns the time it took, ms. */
export async function buildCli() {
  const t0 = performance.now();
  const { build } = await import("esbuild");
  const common = {
    absWorkingDir: root,
    bundle: true,
    platform: "node",
    target: "node20.19",
    write: false,
    metafile: true,
    legalComments: "none",
    logLevel: "warning",
    // Smaller to parse at every start; names are kept, so a stack trace (TAUT_DEBUG=1) still reads.
    minifySyntax: true,
    minifyWhitespace: true,
  };
  const [main, worker] = await Promise.all([
    // CommonJS, loaded with require(): Node's ES module loader would build a module facade for every
    // built-in the bundle imports (node:fs alone costs tens of milliseconds), and the bundle has no
    // top-level await. The batch pool finds its worker from `import.meta.url`: here the bundle's own file.
    build({
      ...common,
      entryPoints: ["src/cli/main.ts"],
      outfile: join(CLI_BUILD_DIR, "main.cjs"),
      format: "cjs",
      define: { "import.meta.url": "__tautModuleUrl" },
      banner: { js: 'const __tautModuleUrl = require("node:url").pathToFileURL(__filename).href;' },
    }),
    // The worker thread's entry, next to main.cjs where the pool looks for it.
    build({ ...common, entryPoints: ["src/cli/batch/workerMain.ts"], outfile: join(CLI_BUILD_DIR, "worker.mjs"), format: "esm" }),
  ]);
  for (const r of [main, worker]) for (const f of r.outputFiles) writeAtomically(f.path, f.contents);
  const files = {};
  const inputs = [main, worker].flatMap((r) => Object.keys(r.metafile.inputs));
  for (const p of [...inputs.filter((p) => !p.startsWith("node_modules/")), ...EXTRA_INPUTS]) {
    files[p.split(sep).join("/")] = statSync(join(root, p)).mtimeMs;
  }
  writeAtomically(join(CLI_BUILD_DIR, "inputs.json"), JSON.stringify({ files }, null, 1));
  return performance.now() - t0;
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const ms = await buildCli();
  console.log(`taut: command line built into ${relative(process.cwd(), CLI_BUILD_DIR) || "."} (${Math.round(ms)} ms)`);
}
