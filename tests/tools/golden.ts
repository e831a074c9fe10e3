/**
 * Golden files: a computed result is compared with a stored one under tests/fixtures/out, after rounding
 * every number to a few significant digits (so last-bit floating-point noise is not a difference). A change
 * of physics shows up as a failing test and, once accepted, as a visible diff of the stored file.
 *
 * To accept new results: `REGEN=1 npm test` (or `REGEN=1 npx vitest run --config tests/vitest.config.ts
 * --project unit tests/cli/golden.test.ts`) rewrites the files; review the diff before committing.
 */
import { existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { expect } from "vitest";

/** Root of the stored outputs. */
export const GOLDEN_OUT = fileURLToPath(new URL("../fixtures/out/", import.meta.url));

/** True when golden files are being rewritten (REGEN=1). */
export const regenerating = (): boolean => process.env.REGEN === "1";

/** Round every number in a JSON-like value to `digits` significant digits; other values unchanged. */
export function roundDeep(value: unknown, digits = 6): unknown {
  if (typeof value === "number") return Number.isFinite(value) && value !== 0 ? Number(value.toPrecision(digits)) : value;
  if (Array.isArray(value)) return value.map((v) => roundDeep(v, digits));
  if (value !== null && typeof value === "object") {
    return Object.fromEntries(Object.entries(value as Record<string, unknown>).map(([k, v]) => [k, roundDeep(v, digits)]));
  }
  return value;
}

/**
 * Compare `actual` with the golden file `name` (relative to tests/fixtures/out), both rounded; with REGEN=1
 * write `actual` (rounded) to the file instead. A missing file is a failure unless regenerating.
 */
export function expectGolden(name: string, actual: unknown, digits = 6): void {
  const file = join(GOLDEN_OUT, name);
  const rounded = roundDeep(JSON.parse(JSON.stringify(actual)), digits);
  if (regenerating()) {
    mkdirSync(dirname(file), { recursive: true });
    writeFileSync(file, `${JSON.stringify(rounded, null, 2)}\n`);
    return;
  }
  if (!existsSync(file)) throw new Error(`golden file ${name} is missing: run the tests once with REGEN=1 and review it`);
  const stored = roundDeep(JSON.parse(readFileSync(file, "utf8")), digits);
  expect(rounded, `differs from tests/fixtures/out/${name} (rewrite with REGEN=1 if the change is intended)`).toEqual(stored);
}
