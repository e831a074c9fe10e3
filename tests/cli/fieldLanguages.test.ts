/**
 * An invalid file's messages in three languages: `taut` names the same fields with the same figures in
 * Hungarian and German as in English, the English unchanged byte for byte; a long list is cut the same way.
 */
import { writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { fieldsDe } from "../../src/i18n/de/fields.js";
import { fieldsHu } from "../../src/i18n/hu/fields.js";
import { taut } from "../tools/cli.js";

const paths = (s: string) => s.split("\n").slice(1).map((l) => /^ {2}([\w.[\]]*):/.exec(l)?.[1]);
const numbers = (s: string) => [...s.matchAll(/-?\d+(?:[.,]\d+)?/g)].map((m) => Number(m[0].replace(",", ".")));
const sorted = (xs: number[]) => [...xs].sort((a, b) => a - b);
/** The same command in English, Hungarian and German, one after the other (the command line runs in-process here). */
async function inEach(...args: string[]) {
  const out = [];
  for (const l of ["en", "hu", "de"]) out.push(await taut(...args, "--lang", l));
  return out as [Awaited<ReturnType<typeof taut>>, Awaited<ReturnType<typeof taut>>, Awaited<ReturnType<typeof taut>>];
}

describe("an invalid file's messages in Hungarian and German", () => {
  it("a start case out of range: the same field, the same figures, the headline and the rule translated", async () => {
    const file = "tests/fixtures/in/invalid/negative-mass.json";
    const [en, hu, de] = await inEach("plan", file);
    for (const r of [en, hu, de]) expect(r.code).toBe(2);
    expect(en.stderr).toBe(`taut plan: ${file}: the start case is not valid\n  train.trailingMass_t: must be from 5 to 60000 t (got -100)`);
    expect(hu.stderr).toContain(`${file}: az indítási eset nem érvényes`);
    expect(de.stderr).toContain(`${file}: der Anfahrfall ist ungültig`);
    expect(hu.stderr).toContain("train.trailingMass_t: 5 és 60000 t között kell legyen (megadva: -100)");
    expect(de.stderr).toContain("train.trailingMass_t: muss zwischen 5 und 60000 t liegen (angegeben: -100)");
    for (const r of [hu, de]) {
      expect(paths(r.stderr)).toEqual(paths(en.stderr));
      expect(sorted(numbers(r.stderr))).toEqual(sorted(numbers(en.stderr)));
    }
  });

  it("a gap between segments, and broken JSON, in words of each language with a decimal comma", async () => {
    const dir = tmpdir();
    const gap = join(dir, `taut-gap-${process.pid}.json`);
    writeFileSync(
      gap,
      JSON.stringify({
        schema: "taut/start-case@1",
        locomotives: [{ profile: "illustrative-4axle-1100" }],
        train: { trailingMass_t: 600, wagons: 20, length_m: 300, couplerSlack_mm: 5, bearing: "roller", couplerLimit_kN: 900 },
        location: { segments: [{ from_m: 0, length_m: 500.5, gradient_permille: 2, curveRadius_m: 0 }, { from_m: 520, length_m: 400, gradient_permille: 2, curveRadius_m: 0 }], frontAt_m: 900, clearAhead_m: 500 },
        conditions: { rail: "dry", sand: true, temperature_C: 10 },
        target: { speed_kmh: 10 },
      }),
    );
    const [en, hu, de] = await inEach("plan", gap);
    expect(en.stderr).toContain("location.segments[1].from_m: leaves a gap of 19.5 m after the previous segment (which ends at 500.5 m)");
    expect(hu.stderr).toContain("location.segments[1].from_m: 19,5 m hézagot hagy az előző szakasz után (amely itt ér véget: 500,5 m)");
    expect(de.stderr).toContain("location.segments[1].from_m: lässt eine Lücke von 19,5 m nach dem vorigen Abschnitt (der bei 500,5 m endet)");
    const broken = join(dir, `taut-broken-${process.pid}.json`);
    writeFileSync(broken, '{ "schema": "taut/start-case@1", }');
    const b = await inEach("plan", broken);
    expect(b[0]!.stderr).toContain("is not valid JSON: a comma before a closing } is not allowed in JSON (line 1, column 34)");
    expect(b[1]!.stderr).toContain("nem érvényes JSON: záró } előtt a JSON nem enged vesszőt (1. sor, 34. oszlop)");
    expect(b[2]!.stderr).toContain("ist kein gültiges JSON: ein Komma vor einer schließenden } ist in JSON nicht erlaubt (Zeile 1, Spalte 34)");
  });

  it("a long list is cut after twelve with the count of the rest in each language", async () => {
    const many = join(tmpdir(), `taut-many-${process.pid}.json`);
    writeFileSync(many, JSON.stringify({ schema: "taut/start-case@1", locomotives: [{}, {}, {}, {}], train: {}, location: {}, conditions: {}, target: {} }));
    const [en, hu, de] = await inEach("plan", many);
    const more = /…and (\d+) more/.exec(en.stderr);
    expect(more).not.toBeNull();
    expect(hu.stderr).toContain((fieldsHu.andMore as string).replace("{count}", more![1]!));
    expect(de.stderr).toContain((fieldsDe.andMore as string).replace("{count}", more![1]!));
    for (const r of [hu, de]) expect(paths(r.stderr)).toEqual(paths(en.stderr));
  });
});
