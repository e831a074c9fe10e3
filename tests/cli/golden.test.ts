/**
 * Golden outputs of `taut plan --json`: the three demo cases and the test cases in tests/fixtures/in/cases.
 * They pin today's results so that any change of physics or planning shows as a diff of
 * tests/fixtures/out/plan/*.json. Rewrite them with REGEN=1 when a change is intended (DEVELOPERS.md).
 */
import { readdirSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { taut } from "../tools/cli.js";
import { expectGolden } from "../tools/golden.js";

const demoDir = fileURLToPath(new URL("../../profiles/cases/", import.meta.url));
const testDir = fileURLToPath(new URL("../fixtures/in/cases/", import.meta.url));
const inputs = [
  ...readdirSync(demoDir).map((f) => ({ name: f, path: demoDir + f })),
  ...readdirSync(testDir).map((f) => ({ name: f, path: testDir + f })),
].filter((x) => x.name.endsWith(".json"));

describe("golden plan outputs", () => {
  it("cover the three demo cases", () => {
    expect(inputs.filter((x) => x.path.startsWith(demoDir)).length).toBeGreaterThanOrEqual(3);
  });
  for (const { name, path } of inputs) {
    it(`plan ${name} --json`, async () => {
      const r = await taut("plan", path, "--json");
      expect(r.stderr).toBe("");
      expect(r.code).toBe(0);
      expectGolden(`plan/${name}`, JSON.parse(r.stdout));
    });
  }
});
