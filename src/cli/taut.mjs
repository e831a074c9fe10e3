#!/usr/bin/env node
// The `taut` command. It runs the plain JavaScript build of the command line (build/cli/main.cjs, made at
// install by the `prepare` script, src/cli/build.mjs), so it starts without compiling TypeScript. When a
// source file has changed since that build, the build is made again first (esbuild, a fraction of a second);
// should that fail, the sources run through the TypeScript loader (tsx), as in development.
// Node's built-ins are taken with require(): importing them as ES modules builds a facade of each (node:fs
// alone costs tens of milliseconds at every start).
import { createRequire } from "node:module";

const require = createRequire(import.meta.url);
const root = new URL("../../", import.meta.url);

/** The build exists whole and every file it was made from is as it was then. */
function buildIsCurrent() {
  const { readFileSync, statSync } = require("node:fs");
  try {
    for (const out of ["build/cli/main.cjs", "build/cli/worker.mjs"]) statSync(new URL(out, root));
    const { files } = JSON.parse(readFileSync(new URL("build/cli/inputs.json", root), "utf8"));
    for (const path in files) if (statSync(new URL(path, root)).mtimeMs !== files[path]) return false;
    return true;
  } catch {
    return false;
  }
}

async function loadMain() {
  if (!buildIsCurrent()) {
    try {
      const { buildCli } = await import("./build.mjs");
      await buildCli();
    } catch (e) {
      if (process.env.TAUT_DEBUG) process.stderr.write(`taut: could not build the command line (${e instanceof Error ? e.message : String(e)}); running the sources\n`);
      const { register } = await import("tsx/esm/api");
      register();
      return (await import("./main.ts")).main;
    }
  }
  return require("../../build/cli/main.cjs").main;
}

const main = await loadMain();
process.exitCode = await main(process.argv.slice(2));
