/**
 * Invalid input files (tests/fixtures/in/invalid/*.json): each gives its expected field path and a message
 * naming the rule broken. Every fixture must have an entry here, so a new fixture cannot go unchecked.
 */
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { fileKind, parseJsonText, parseLocomotiveFile, parseStartCase, type FieldIssue } from "../../src/profiles/index.js";

const dir = fileURLToPath(new URL("../fixtures/in/invalid/", import.meta.url));

/** File → the one issue it must produce: its dotted field path and a pattern its message must match. */
const EXPECTED: Record<string, { path: string; message: RegExp }> = {
  "negative-mass.json": { path: "train.trailingMass_t", message: /^must be from 5 to 60000 t \(got -100\)$/ },
  "unknown-rail-condition.json": { path: "conditions.rail", message: /^must be one of "dry", "damp", "wet", "frost", "leaves", "greasy" \(got "icy"\)$/ },
  "curve-radius-50.json": { path: "location.curveRadius_m", message: /^must be 0 \(straight\) or at least 80 m/ },
  "gradient-75.json": { path: "location.gradient_permille", message: /^must be from -60 to 60 ‰ \(got 75\)$/ },
  "after-wagon-beyond-train.json": { path: "locomotives[1].position.afterWagon", message: /^must be less than the number of wagons \(40\) \(got 40\)$/ },
  "unknown-locomotive-profile.json": { path: "locomotives[0].profile", message: /^names no known locomotive profile \("illustrative-9axle-9999"; known: .*illustrative-6axle-1800/ },
  "segments-gap.json": { path: "location.segments[1].from_m", message: /^leaves a gap of 20 m after the previous segment \(which ends at 500 m\)$/ },
  "segments-overlap.json": { path: "location.segments[1].from_m", message: /^overlaps the previous segment by 50 m \(it ends at 500 m\)$/ },
  "train-does-not-fit.json": { path: "location.frontAt_m", message: /^puts the rear of the 579 m train at -78 m, before the profile starts \(0 m\)$/ },
  "adhesive-mass-above-mass.json": { path: "locomotives[0].profile.adhesiveMass_t", message: /^must not exceed mass_t$/ },
  "notch-power-wrong-length.json": { path: "notchPower", message: /^must have one entry per notch$/ },
  // The rest of the message comes from the JavaScript engine and differs between Node versions.
  "malformed-json.json": { path: "", message: /^is not valid JSON: / },
};

/** Parse a fixture the way the command line does: JSON text, then the schema its `schema` field names. */
function issuesOf(text: string): FieldIssue[] {
  const json = parseJsonText(text);
  if (!json.ok) return json.issues;
  const r = fileKind(json.value) === "taut/locomotive@1" ? parseLocomotiveFile(json.value) : parseStartCase(json.value, builtinLibrary());
  return r.ok ? [] : r.issues;
}

describe("invalid fixtures", () => {
  const files = readdirSync(dir).filter((f) => f.endsWith(".json")).sort();

  it("every fixture has an expectation and every expectation a fixture", () => {
    expect(files).toEqual(Object.keys(EXPECTED).sort());
  });

  for (const f of files) {
    it(`${f}: ${EXPECTED[f]?.path || "(whole file)"}`, () => {
      const issues = issuesOf(readFileSync(join(dir, f), "utf8"));
      const want = EXPECTED[f]!;
      expect(issues).toHaveLength(1);
      expect(issues[0]!.path).toBe(want.path);
      expect(issues[0]!.message).toMatch(want.message);
    });
  }
});
