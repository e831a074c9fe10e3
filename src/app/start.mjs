#!/usr/bin/env node
/**
 * `npm start`: build the app when its sources have changed since the last build (and only then, quietly),
 * serve it on 127.0.0.1:4173, then print the built-in demo start plan below the address, so the plan is the
 * last thing on the screen. Ctrl-C stops the server.
 */
import { spawnSync } from "node:child_process";
import { existsSync, mkdirSync, readdirSync, readFileSync, statSync, writeFileSync } from "node:fs";
import { dirname, join, relative, sep } from "node:path";
import { fileURLToPath } from "node:url";

const root = fileURLToPath(new URL("../../", import.meta.url));
const configFile = join(root, "src/app/vite.config.ts");
const outDir = join(root, "dist");
/** Written after a build (outside dist/, which the build empties and the server serves): every file the app was built from and its time. */
const stampFile = join(root, "build", "app-inputs.json");
/** What the app is built from: its sources (with the core, profiles, worker and notes it imports), the data and static files, and the set-up. */
const INPUT_DIRS = ["src", "profiles", "public"];
const NOT_INPUTS = ["src/cli/"];
const INPUT_FILES = ["package.json", "package-lock.json"];

function walk(dir) {
  if (!existsSync(dir)) return [];
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = join(dir, e.name);
    return e.isDirectory() ? walk(p) : [p];
  });
}

/** Every input file (relative, "/"-separated) with its modification time. */
function inputs() {
  const files = {};
  for (const p of [...INPUT_DIRS.flatMap((d) => walk(join(root, d))), ...INPUT_FILES.map((f) => join(root, f))]) {
    const key = relative(root, p).split(sep).join("/");
    if (!NOT_INPUTS.some((x) => key.startsWith(x))) files[key] = statSync(p).mtimeMs;
  }
  return files;
}

/** The build in dist/ was made from exactly these inputs. */
function buildIsCurrent(now) {
  if (!existsSync(join(outDir, "index.html"))) return false;
  try {
    const { files } = JSON.parse(readFileSync(stampFile, "utf8"));
    const a = Object.keys(files);
    return a.length === Object.keys(now).length && a.every((k) => files[k] === now[k]);
  } catch {
    return false;
  }
}

const vite = await import("vite");
const now = inputs();
if (buildIsCurrent(now)) {
  console.log("The app is built and up to date (dist/).");
} else {
  process.stdout.write("Building the app… ");
  const t0 = performance.now();
  // Warnings and errors only: the list of files and the timing block are left out.
  await vite.build({ configFile, logLevel: "warn" });
  mkdirSync(dirname(stampFile), { recursive: true });
  writeFileSync(stampFile, JSON.stringify({ files: now }));
  console.log(`done in ${((performance.now() - t0) / 1000).toFixed(1)} s.`);
}

const server = await vite.preview({ configFile, logLevel: "warn" });
const url = server.resolvedUrls?.local[0] ?? "http://127.0.0.1:4173/";
console.log(`\nTaut is served at ${url}  (Ctrl-C stops it)\n`);

// The demo plan last, so it is what the terminal shows.
spawnSync(process.execPath, [join(root, "src/cli/taut.mjs"), "plan", "--demo"], { stdio: "inherit" });
