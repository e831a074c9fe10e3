/**
 * The import graph of `src`, read with a real parser (the oxc parser that Vite exports as `parseSync`),
 * and the house rules checked over it: no circle anywhere, the core's folders in their order, and the
 * layers (core → profiles/worker → cli/notes → app) never imported upward.
 */
import { existsSync, readdirSync, readFileSync } from "node:fs";
import { dirname, join, relative, resolve, sep } from "node:path";
import { parseSync } from "vite";

/** Module → the modules it imports (paths relative to the scanned root, "/"-separated). */
export type ImportGraph = Map<string, Set<string>>;

/** Every specifier a module names: static `import … from`, `import "…"`, `export … from`, `import("…")` with a literal. */
export function importSpecifiers(fileName: string, code: string): string[] {
  const parsed = parseSync(fileName, code);
  if (parsed.errors.length > 0) throw new Error(`${fileName}: cannot parse: ${parsed.errors[0]!.message}`);
  const m = parsed.module;
  const out = new Set<string>();
  for (const i of m.staticImports) out.add(i.moduleRequest.value);
  for (const e of m.staticExports) for (const entry of e.entries) if (entry.moduleRequest) out.add(entry.moduleRequest.value);
  for (const d of m.dynamicImports) {
    // Only a literal names a module; `import(variable)` cannot be followed and names none of ours.
    const text = code.slice(d.moduleRequest.start, d.moduleRequest.end).trim();
    const lit = /^(["'`])([^"'`$]*)\1$/.exec(text);
    if (lit) out.add(lit[2]!);
  }
  return [...out];
}

const SOURCE = /\.(ts|tsx|mjs)$/;

function walk(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = join(dir, e.name);
    if (e.isDirectory()) return e.name === "node_modules" ? [] : walk(p);
    return SOURCE.test(e.name) && !e.name.endsWith(".d.ts") ? [p] : [];
  });
}

/** The file a relative specifier names: `./x.js` is the TypeScript source `./x.ts` or `./x.tsx`. */
function resolveFile(fromFile: string, spec: string): string | null {
  const base = resolve(dirname(fromFile), spec);
  const candidates = [base, base.replace(/\.js$/, ".ts"), base.replace(/\.js$/, ".tsx"), base.replace(/\.mjs$/, ".mts")];
  return candidates.find((c) => existsSync(c) && SOURCE.test(c)) ?? null;
}

/** Read every source module under `root` and the modules of ours each one imports (packages are left out). */
export function readImportGraph(root: string): ImportGraph {
  const g: ImportGraph = new Map();
  const key = (abs: string) => relative(root, abs).split(sep).join("/");
  for (const file of walk(root)) {
    const deps = new Set<string>();
    for (const spec of importSpecifiers(file, readFileSync(file, "utf8"))) {
      if (!spec.startsWith(".")) continue;
      const target = resolveFile(file, spec);
      // Data and styles (JSON, CSS) import nothing back, so they cannot close a circle.
      if (target === null) continue;
      if (!target.startsWith(root + sep)) continue;
      deps.add(key(target));
    }
    g.set(key(file), deps);
  }
  return g;
}

/**
 * Every import circle: the strongly connected components of more than one module, and modules that
 * import themselves (Tarjan 1972, "Depth-first search and linear graph algorithms", SIAM J. Comput. 1(2)).
 */
export function importCircles(g: ImportGraph): string[][] {
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const onStack = new Set<string>();
  const stack: string[] = [];
  const out: string[][] = [];
  let next = 0;
  const visit = (v: string): void => {
    index.set(v, next);
    low.set(v, next);
    next++;
    stack.push(v);
    onStack.add(v);
    for (const w of g.get(v) ?? []) {
      if (!index.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v)!, low.get(w)!));
      } else if (onStack.has(w)) low.set(v, Math.min(low.get(v)!, index.get(w)!));
    }
    if (low.get(v) === index.get(v)) {
      const scc: string[] = [];
      let w: string;
      do {
        w = stack.pop()!;
        onStack.delete(w);
        scc.push(w);
      } while (w !== v);
      if (scc.length > 1 || g.get(v)?.has(v)) out.push(scc.sort());
    }
  };
  for (const v of [...g.keys()].sort()) if (!index.has(v)) visit(v);
  return out;
}

/** The core's folders, lowest first: each may import only from itself and the folders before it. */
export const CORE_FOLDERS = ["physics", "train", "dynamics", "planner", "dispatch"] as const;

/**
 * The layers of `src` and what each may import besides itself (DEVELOPERS.md "Dependency direction").
 * Nothing imports `cli` or `app`.
 */
export const LAYERS: Readonly<Record<string, readonly string[]>> = {
  core: [],
  // Message catalogs, number formats and rounding per language, and the renderers of the core's codes,
  // shared by files (English renderings in reports), the command line and the app.
  i18n: ["core"],
  profiles: ["core", "i18n"],
  // The workers carry no schema code: the app parses files and sends the core's SI form.
  worker: ["core"],
  notes: ["core", "profiles"],
  cli: ["core", "profiles", "i18n"],
  app: ["core", "profiles", "worker", "notes", "i18n"],
};

function coreFolder(path: string): string | null {
  const m = /^core\/([^/]+)\//.exec(path);
  return m ? m[1]! : null;
}

/** Modules out of place and imports that break the layer rules or the order of the core's folders, one line each. */
export function ruleViolations(g: ImportGraph): string[] {
  const out: string[] = [];
  const folders: readonly string[] = CORE_FOLDERS;
  for (const [from, deps] of g) {
    const fromLayer = from.split("/")[0]!;
    if (!LAYERS[fromLayer]) out.push(`${from}: ${fromLayer} is not a known layer of src`);
    const a = coreFolder(from);
    // The core's own index.ts re-exports every folder; every other core module lives in one of them.
    if (fromLayer === "core" && a === null && from !== "core/index.ts") out.push(`${from}: every core module belongs in one of ${folders.join(", ")}`);
    if (a !== null && !folders.includes(a)) out.push(`${from}: core/${a} is not one of ${folders.join(", ")}`);
    for (const to of deps) {
      const toLayer = to.split("/")[0]!;
      if (fromLayer !== toLayer) {
        const allowed = LAYERS[fromLayer];
        if (allowed && !allowed.includes(toLayer)) out.push(`${from} -> ${to}: ${fromLayer} may not import ${toLayer}`);
        continue;
      }
      if (a === null || !folders.includes(a)) continue;
      const b = coreFolder(to);
      if (b === null) out.push(`${from} -> ${to}: a core folder imports modules of the folders, never the core's own index`);
      else if (folders.indexOf(b) > folders.indexOf(a)) out.push(`${from} -> ${to}: core/${a} may not import core/${b}, which is above it`);
    }
  }
  return out.sort();
}
