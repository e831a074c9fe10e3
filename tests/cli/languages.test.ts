/**
 * The command line in three languages: `LANG=hu_HU.UTF-8 taut plan --demo` and `--lang de` print the plan
 * in Hungarian and German with the same figures as English (a decimal comma instead of a point); `--json`
 * and CSV are the same bytes in every language; `--lang` beats the environment, and a language Taut does
 * not speak is a usage error (exit 2). `taut review` likewise: its sentences and the recording's notices and
 * refusals translated, the same figures, the same JSON.
 */
import { describe, expect, it } from "vitest";
import { cli } from "../../src/i18n/en/cli.js";
import { cliDe } from "../../src/i18n/de/cli.js";
import { cliHu } from "../../src/i18n/hu/cli.js";
import { taut, tautWithEnv } from "../tools/cli.js";
import { cautions } from "../../src/i18n/en/cautions.js";
import { cautionsDe } from "../../src/i18n/de/cautions.js";
import { cautionsHu } from "../../src/i18n/hu/cautions.js";
import { review } from "../../src/i18n/en/review.js";
import { reviewDe } from "../../src/i18n/de/review.js";
import { reviewHu } from "../../src/i18n/hu/review.js";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";

const repo = fileURLToPath(new URL("../../", import.meta.url));

/** The figures of a printout, as numbers, in order (a decimal comma read as a point). */
function figures(text: string): number[] {
  return [...text.matchAll(/\d+(?:[.,]\d+)?/g)].map((m) => Number(m[0].replace(",", ".")));
}

/** The printout down to the "Why:" lines (the planner's own lines, from there on, are checked line by line in languagesLines.test.ts). */
const head = (text: string) => text.split(/\n(?:Why|Miért|Warum):\n/)[0]!;

describe("taut in Hungarian and German", () => {
  it("LANG=hu_HU.UTF-8 and --lang de print the plan translated, with the same figures as English", async () => {
    const en = await tautWithEnv({ LANG: "C" }, "plan", "--demo");
    const hu = await tautWithEnv({ LANG: "hu_HU.UTF-8" }, "plan", "--demo");
    const de = await tautWithEnv({ LANG: "hu_HU.UTF-8" }, "plan", "--demo", "--lang", "de");
    for (const r of [en, hu, de]) expect(r.code).toBe(0);
    expect(en.stdout).toContain(`Verdict: ${cli.en.verdictStarts}`);
    expect(hu.stdout).toContain(`Eredmény: ${cliHu.verdictStarts}`);
    expect(de.stdout).toContain(`Ergebnis: ${cliDe.verdictStarts}`);
    expect(hu.stdout).not.toContain("Verdict:");
    expect(de.stdout).not.toContain("Verdict:");
    // A decimal comma in both: the median adhesion "0,330".
    expect(hu.stdout).toMatch(/μ 0,\d{3} /);
    expect(de.stdout).toMatch(/μ 0,\d{3} /);
    // The same figures: the same multiset of numbers down to the why lines (word order may move them).
    const sorted = (t: string) => figures(head(t)).sort((a, b) => a - b);
    expect(sorted(hu.stdout)).toEqual(sorted(en.stdout));
    expect(sorted(de.stdout)).toEqual(sorted(en.stdout));
    // The step table's rows carry the same figures in the same order.
    const rows = (t: string) => head(t).split("\n").filter((l) => /^\d  \S/.test(l)).map(figures);
    expect(rows(hu.stdout)).toEqual(rows(en.stdout));
    expect(rows(de.stdout).length).toBeGreaterThan(0);
    expect(rows(de.stdout)).toEqual(rows(en.stdout));
    // The cautions (codes from the planner) in each language: the first words of the advisory-only caution.
    const start = (x: string) => x.split(" ").slice(0, 4).join(" ");
    expect(hu.stdout).toContain(start(cautionsHu.advisory as string));
    expect(de.stdout).toContain(start(cautionsDe.advisory as string));
    expect(en.stdout).toContain(start(cautions.en.advisory));
  });

  it("--json is the same in every language (LANG, LC_ALL or --lang)", async () => {
    const en = await tautWithEnv({ LANG: "en_GB.UTF-8" }, "plan", "--demo", "--json");
    const hu = await tautWithEnv({ LANG: "hu_HU.UTF-8" }, "plan", "--demo", "--json");
    const de = await tautWithEnv({ LC_ALL: "de_DE.UTF-8" }, "plan", "--demo", "--json", "--lang", "de");
    expect(en.code).toBe(0);
    expect(hu.stdout).toBe(en.stdout);
    expect(de.stdout).toBe(en.stdout);
  });

  it("a table's CSV is the same in every language", async () => {
    const args = ["table", "cinderfield-yard", "--loco", "illustrative-4axle-1100", "--count", "2", "--wagons", "10", "--limit", "500", "--quiet", "--csv"];
    const en = await taut(...args);
    if (en.code !== 0) return expect.fail(`taut ${args.join(" ")}: ${en.stderr}`);
    const de = await taut(...args, "--lang", "de");
    expect(de.stdout).toBe(en.stdout);
  }, 120_000);

  it("--lang beats the environment; --lang before the command works; a language not ours is exit 2", async () => {
    const r = await tautWithEnv({ LC_ALL: "de_DE.UTF-8" }, "--lang", "hu", "plan", "--demo", "--no-assistance");
    expect(r.code).toBe(0);
    expect(r.stdout).toContain("Eredmény:");
    const bad = await taut("plan", "--demo", "--lang", "fr");
    expect(bad.code).toBe(2);
    expect(bad.stderr).toContain("--lang");
    const help = await tautWithEnv({ LANG: "de_DE.UTF-8" }, "--help");
    expect(help.stdout).toContain(cliDe.commandsTitle);
  });

  it("taut review prints its sentences in Hungarian and German with the same figures as English; its JSON is the same", async () => {
    const args = ["review", `${repo}profiles/cases/demo-aggregate-ashvale.json`, `${repo}profiles/recordings/demo-aggregate-ashvale-heavier.gpx`];
    const en = await tautWithEnv({ LANG: "C" }, ...args);
    const hu = await tautWithEnv({ LANG: "hu_HU.UTF-8" }, ...args);
    const de = await taut(...args, "--lang", "de");
    for (const r of [en, hu, de]) expect(r.code, r.stderr).toBe(0);
    // The first words of the mass-factor sentence and of the notice on the speed, in each language.
    const start = (x: string, n = 5) => x.split(" ").slice(0, n).join(" ");
    const heavier = { en: review.en.heavier, hu: reviewHu.heavier as string, de: reviewDe.heavier as string };
    expect(en.stdout).toContain(start(heavier.en));
    expect(hu.stdout).toContain(start(heavier.hu));
    expect(de.stdout).toContain(start(heavier.de));
    expect(hu.stdout).toContain(reviewHu.gpxSpeedDerived as string);
    expect(de.stdout).toContain(reviewDe.gpxSpeedDerived as string);
    expect(hu.stdout).not.toContain("The train behaved");
    expect(de.stdout).not.toContain("The train behaved");
    // A decimal comma: the mass factor "1,13".
    expect(de.stdout).toMatch(/\b1,\d\d\b/);
    const sorted = (t: string) => figures(t).sort((a, b) => a - b);
    expect(sorted(hu.stdout)).toEqual(sorted(en.stdout));
    expect(sorted(de.stdout)).toEqual(sorted(en.stdout));
    const json = await Promise.all([taut(...args, "--json"), taut(...args, "--json", "--lang", "hu"), tautWithEnv({ LC_ALL: "de_DE.UTF-8" }, ...args, "--json")]);
    expect(json[1].stdout).toBe(json[0].stdout);
    expect(json[2].stdout).toBe(json[0].stdout);
  }, 120_000);

  it("taut review refuses a recording in the language chosen", async () => {
    const dir = mkdtempSync(join(tmpdir(), "taut-review-lang-"));
    try {
      writeFileSync(join(dir, "few.csv"), "time_s,speed_kmh\n0,0\n1,2\n");
      const args = ["review", `${repo}profiles/cases/demo-aggregate-ashvale.json`, join(dir, "few.csv")];
      const [en, hu, de] = await Promise.all([taut(...args), taut(...args, "--lang", "hu"), taut(...args, "--lang", "de")]);
      for (const r of [en, hu, de]) expect(r.code).toBe(2);
      expect(en.stderr).toContain("The recording holds 2 samples: too few");
      expect(hu.stderr).toContain((reviewHu.tooFew as { other: string }).other.replace("{count}", "2"));
      expect(de.stderr).toContain((reviewDe.tooFew as { other: string }).other.replace("{count}", "2"));
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }, 120_000);
});
