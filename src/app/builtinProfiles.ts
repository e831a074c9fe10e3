/**
 * The built-in profiles checked at build time. `src/profiles/builtin.ts` reads the shipped JSON with the
 * schemas (zod) when it loads: right for the command line, but in the page it would pull the schema code
 * into the first load for files that never change. In the app's build this plugin puts a module in its
 * place that holds the same files as the schemas returned them (checked now, in Node, by builtin.ts
 * itself) and makes the library with the same function (builtinSet.ts). The schemas then load with what
 * really needs them: an edited case, an opened file, a note being saved.
 * tests/profiles/builtinEmbedded.test.ts checks the module exports what builtin.ts exports, with equal files.
 */
import { dirname, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import type { Plugin } from "vite";
import { builtinFiles } from "../profiles/builtin.js";

const BUILTIN = fileURLToPath(new URL("../profiles/builtin.ts", import.meta.url));
const BUILTIN_SET = fileURLToPath(new URL("../profiles/builtinSet.ts", import.meta.url));
const RESOLVED_ID = "\0taut:builtin-profiles";

/** The module that stands in for builtin.ts: the files as data, the same exports. */
export function builtinModuleCode(): string {
  return [
    `import { DEMO_CASE_ID, libraryOf } from ${JSON.stringify(BUILTIN_SET)};`,
    `export { DEMO_CASE_ID };`,
    // JSON.parse of a string literal: smaller and faster to load than the same object as code.
    `export const builtinFiles = JSON.parse(${JSON.stringify(JSON.stringify(builtinFiles))});`,
    `export const builtinRailConditions = builtinFiles.railConditions;`,
    `export const builtinLocations = builtinFiles.locations;`,
    `export const builtinTrains = builtinFiles.trains;`,
    `export const builtinCases = builtinFiles.cases;`,
    `export const builtinCaseJson = builtinFiles.caseJson;`,
    `export function builtinLibrary() { return libraryOf(builtinFiles); }`,
    "",
  ].join("\n");
}

export function builtinProfilesPlugin(): Plugin {
  return {
    name: "taut:builtin-profiles",
    apply: "build",
    enforce: "pre",
    resolveId(source, importer) {
      if (!importer || !/(^|\/)builtin\.js$/.test(source)) return null;
      const path = resolve(dirname(importer), source).replace(/\.js$/, ".ts");
      return path === BUILTIN ? RESOLVED_ID : null;
    },
    load: (id) => (id === RESOLVED_ID ? builtinModuleCode() : null),
  };
}
