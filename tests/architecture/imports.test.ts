/**
 * The house as DEVELOPERS.md draws it: no import circle anywhere in `src`, the core's folders imported
 * only downward (physics ← train ← dynamics ← planner ← dispatch), and the layers never imported upward.
 * The checks are first shown to catch a violation on small graphs, then run over the real tree.
 */
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { importCircles, importSpecifiers, readImportGraph, ruleViolations, type ImportGraph } from "./importGraph.js";

const src = fileURLToPath(new URL("../../src", import.meta.url));

function graph(edges: Record<string, string[]>): ImportGraph {
  const g: ImportGraph = new Map();
  for (const [from, to] of Object.entries(edges)) {
    g.set(from, new Set(to));
    for (const t of to) if (!g.has(t)) g.set(t, new Set());
  }
  return g;
}

/** A copy of a graph with one more edge. */
function withEdge(g: ImportGraph, from: string, to: string): ImportGraph {
  const copy: ImportGraph = new Map([...g].map(([k, v]) => [k, new Set(v)]));
  copy.get(from)!.add(to);
  return copy;
}

describe("reading the specifiers a module names", () => {
  it("finds static, type-only, re-exported, side-effect and literal dynamic imports", () => {
    const code = [
      'import { a } from "./a.js";',
      'import type { B } from "./b.js";',
      "import {",
      "  c,",
      "  type C,",
      '} from "./c.js";',
      'export * from "./d.js";',
      'export { e } from "./e.js";',
      'export type { F } from "./f.js";',
      'import "./g.css";',
      'const h = () => import("./h.js");',
      "const Tsx = (p: { x: number }) => <div>{p.x}</div>;",
    ].join("\n");
    expect(importSpecifiers("m.tsx", code).sort()).toEqual(["./a.js", "./b.js", "./c.js", "./d.js", "./e.js", "./f.js", "./g.css", "./h.js"]);
  });

  it("ignores comments, strings and dynamic imports of a computed name", () => {
    const code = [
      '// import { x } from "./commented.js";',
      '/* export * from "./block.js"; */',
      'const text = \'import { y } from "./quoted.js"\';',
      "const name = './computed.js';",
      "void import(name);",
      'const re = /"\\/\\//g; // a regex with a quote',
      'import { z } from "./real.js";',
    ].join("\n");
    expect(importSpecifiers("m.ts", code)).toEqual(["./real.js"]);
  });
});

describe("finding import circles", () => {
  it("finds a circle of three modules and a module that imports itself", () => {
    const g = graph({ "a.ts": ["b.ts"], "b.ts": ["c.ts"], "c.ts": ["a.ts", "d.ts"], "d.ts": [], "e.ts": ["e.ts"] });
    expect(importCircles(g)).toEqual([["a.ts", "b.ts", "c.ts"], ["e.ts"]]);
  });

  it("finds none in a diamond (two paths to one module are not a circle)", () => {
    const g = graph({ "top.ts": ["left.ts", "right.ts"], "left.ts": ["bottom.ts"], "right.ts": ["bottom.ts"] });
    expect(importCircles(g)).toEqual([]);
  });
});

describe("the folder and layer rules", () => {
  it("lets a core folder import its own modules and the folders below it", () => {
    const g = graph({
      "core/index.ts": ["core/dispatch/index.ts", "core/physics/index.ts"],
      "core/dispatch/index.ts": ["core/dispatch/load.ts"],
      "core/dispatch/load.ts": ["core/planner/plan.ts", "core/physics/units.ts"],
      "core/planner/plan.ts": ["core/dynamics/run.ts", "core/train/model.ts"],
      "core/dynamics/run.ts": ["core/train/model.ts"],
      "core/train/model.ts": ["core/physics/units.ts"],
      "profiles/parse.ts": ["core/train/model.ts"],
      "cli/main.ts": ["profiles/parse.ts", "core/index.ts"],
      "app/App.tsx": ["worker/client.ts", "notes/store.ts", "profiles/parse.ts"],
      "worker/client.ts": ["core/planner/plan.ts"],
      "notes/store.ts": ["profiles/parse.ts"],
    });
    expect(ruleViolations(g)).toEqual([]);
  });

  it("fails an upward import between core folders", () => {
    const g = graph({ "core/dynamics/slip.ts": ["core/planner/types.ts"], "core/physics/units.ts": ["core/dispatch/rating.ts"] });
    expect(ruleViolations(g)).toEqual([
      "core/dynamics/slip.ts -> core/planner/types.ts: core/dynamics may not import core/planner, which is above it",
      "core/physics/units.ts -> core/dispatch/rating.ts: core/physics may not import core/dispatch, which is above it",
    ]);
  });

  it("fails a core module outside the folders, a folder importing the core's index, and an unknown folder", () => {
    const g = graph({
      "core/loose.ts": [],
      "core/train/model.ts": ["core/index.ts"],
      "core/misc/thing.ts": ["core/physics/units.ts"],
    });
    expect(ruleViolations(g)).toEqual([
      "core/loose.ts: every core module belongs in one of physics, train, dynamics, planner, dispatch",
      "core/misc/thing.ts: core/misc is not one of physics, train, dynamics, planner, dispatch",
      "core/train/model.ts -> core/index.ts: a core folder imports modules of the folders, never the core's own index",
    ]);
  });

  it("fails the core importing any other layer, and anything importing cli or app", () => {
    const g = graph({
      "core/physics/units.ts": ["profiles/convert.ts"],
      "profiles/parse.ts": ["cli/files.ts"],
      "notes/store.ts": ["app/format.ts"],
      "worker/jobs.ts": ["profiles/parse.ts"],
    });
    expect(ruleViolations(g)).toEqual([
      "core/physics/units.ts -> profiles/convert.ts: core may not import profiles",
      "notes/store.ts -> app/format.ts: notes may not import app",
      "profiles/parse.ts -> cli/files.ts: profiles may not import cli",
      "worker/jobs.ts -> profiles/parse.ts: worker may not import profiles",
    ]);
  });
});

describe("the real tree under src", () => {
  const g = readImportGraph(src);

  it("is read whole: every layer, the core's folders, and edges known to exist", () => {
    const layers = new Set([...g.keys()].map((k) => k.split("/")[0]));
    expect([...layers].sort()).toEqual(["app", "cli", "core", "i18n", "notes", "profiles", "worker"]);
    expect(g.get("core/index.ts")).toEqual(new Set(["core/physics/index.ts", "core/train/index.ts", "core/dynamics/index.ts", "core/planner/index.ts", "core/dispatch/index.ts"]));
    expect(g.get("cli/main.ts")?.has("cli/commands/plan.ts")).toBe(true);
    expect(g.get("cli/taut.mjs")?.has("cli/main.ts")).toBe(true);
    // A dynamic import of a lazily loaded screen counts as an edge too.
    expect(g.get("app/screens/registry.ts")?.has("app/screens/LoadTable/index.tsx")).toBe(true);
  });

  it("has no import circle", () => {
    expect(importCircles(g)).toEqual([]);
  });

  it("keeps the core's folder order and the layers", () => {
    expect(ruleViolations(g)).toEqual([]);
  });

  it("would be caught by the same checks if the command line's circle came back or the physics reached up", () => {
    expect(importCircles(withEdge(g, "cli/command.ts", "cli/main.ts")).length).toBe(1);
    expect(ruleViolations(withEdge(g, "core/physics/units.ts", "core/planner/plan.ts"))).toEqual([
      "core/physics/units.ts -> core/planner/plan.ts: core/physics may not import core/planner, which is above it",
    ]);
  });
});
