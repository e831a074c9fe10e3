/** The bench's seeded all-different departures as start cases, for tests that compare answers on a sample. */
import type { StartCase } from "../../src/core/index.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { allDifferentDepartures } from "../bench/departures.js";

const lib = builtinLibrary();

/** The first `n` seeded departures of at most `maxWagons` wagons, as start cases. */
export function seededDepartures(n: number, maxWagons: number): StartCase[] {
  const out: StartCase[] = [];
  for (const d of allDifferentDepartures(200, 20261202)) {
    const r = parseStartCase(d, lib);
    if (!r.ok) throw new Error(`generated departure ${String(d.id)} does not parse`);
    if (r.value.train.wagons <= maxWagons) out.push(r.value);
    if (out.length >= n) break;
  }
  return out;
}

/** The first `n` seeded departures (the bench's seed), as start cases. */
export function allDifferentCases(n: number): StartCase[] {
  return allDifferentDepartures(n).map((d) => {
    const r = parseStartCase(d, lib);
    if (!r.ok) throw new Error(`generated departure ${String(d.id)} does not parse`);
    return r.value;
  });
}
