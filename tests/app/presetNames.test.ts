/**
 * Quick fill's demo case cards: a short name in bold and the rest of the label beneath it, no word lost — a
 * card whose whole sentence is the bold name reads as a wall of text on a tablet (common practice: a title
 * of a few words over its detail).
 */
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { caseDetail, caseName } from "../../src/app/screens/StartPlan/PresetsSection.js";

const dir = join(process.cwd(), "profiles/cases/");
const labels = readdirSync(dir).filter((f) => f.endsWith(".json")).map((f) => (JSON.parse(readFileSync(dir + f, "utf8")) as { label: string }).label);

describe("demo case cards", () => {
  it.each(labels)("%s: a short name and its detail", (label) => {
    const name = caseName(label), detail = caseDetail(label);
    expect(name.split(" ").length).toBeLessThanOrEqual(3);
    expect(detail.length).toBeGreaterThan(0);
    expect(`${name} ${detail} (illustrative)`).toBe(label);
  });
});
