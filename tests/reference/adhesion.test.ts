/**
 * Adhesion and slip risk against published values and an independent statistics library
 * (PHYSICS.md §2). Marks as in PHYSICS.md; each check names its source.
 */
import jStat from "jstat";
import { describe, expect, it } from "vitest";
import {
  adhesionLimitN,
  adhesionQuantile,
  adhesionSpeedFactor,
  curtiusKniffler,
  GRAVITY_MPS2,
  kmhToMps,
  medianAdhesion,
  normalCdf,
  normalQuantile,
  slipRisk,
} from "../../src/core/index.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";

const round4 = (x: number): number => Math.round(x * 1e4) / 1e4;

describe("Curtius–Kniffler speed dependence", () => {
  // [S] E. W. Curtius & A. Kniffler, Elektrische Bahnen 20 (1950) 201–210: μ(v) = 7.5/(v + 44) + 0.161, v in km/h.
  // Check values (4 decimals) as listed in PHYSICS.md §2 and issue 2.
  const table: Array<[number, number]> = [
    [0, 0.3315],
    [5, 0.3141],
    [10, 0.2999],
    [20, 0.2782],
    [40, 0.2503],
    [50, 0.2408],
    [100, 0.2131],
  ];
  for (const [v, mu] of table) {
    it(`μ(${v} km/h) = ${mu} [S]`, () => {
      expect(round4(curtiusKniffler(v))).toBe(mu);
    });
  }

  it("other conditions keep the shape, scaled by their standstill value [M: PHYSICS.md §2]", () => {
    const lib = builtinLibrary();
    for (const v of [0, 10, 40]) {
      const f = curtiusKniffler(v) / curtiusKniffler(0);
      expect(adhesionSpeedFactor(kmhToMps(v))).toBeCloseTo(f, 12);
      expect(medianAdhesion(lib.adhesion, "wet", false, kmhToMps(v))).toBeCloseTo(lib.adhesion.wet.median * f, 12);
    }
  });
});

describe("standard normal distribution against the independent jstat package", () => {
  // jstat's normal CDF is built on its own erf series and loses relative accuracy far in the tails
  // (≈ 2e-8 at z = −6, measured): compare absolutely everywhere, relatively in the lower tail with 1e-6.
  it("Φ(z) over z ∈ [−6, 6]", () => {
    for (let k = -600; k <= 600; k++) {
      const z = k / 100;
      const ours = normalCdf(z);
      const ref = jStat.normal.cdf(z, 0, 1);
      expect(Math.abs(ours - ref)).toBeLessThan(1e-12);
      if (z <= 0) expect(Math.abs(ours - ref) / ref).toBeLessThan(1e-6);
      // Symmetry Φ(z) + Φ(−z) = 1 (exact identity).
      expect(ours + normalCdf(-z)).toBeCloseTo(1, 14);
    }
  });

  it("Φ⁻¹(p) and round trips", () => {
    for (const p of [1e-9, 1e-6, 1e-4, 0.001, 0.01, 0.02425, 0.05, 0.1, 0.3, 0.5, 0.7, 0.9, 0.975, 0.99, 0.999]) {
      const z = normalQuantile(p);
      expect(Math.abs(z - jStat.normal.inv(p, 0, 1))).toBeLessThan(1e-7);
      expect(Math.abs(normalCdf(z) - p) / p).toBeLessThan(1e-12);
    }
    // Textbook value (common statistical tables): the 97.5 % point is 1.959964.
    expect(normalQuantile(0.975)).toBeCloseTo(1.959964, 6);
  });

  // [P] S. Johnsson, "Adhesion as a statistical problem", IMechE 1963: slip risk of a demand μ_d with
  // lognormal adhesion is Φ((ln μ_d − ln μ_median)/σ). Reference: jstat's lognormal CDF.
  it("slip risk is the lognormal CDF of the demanded adhesion [P]", () => {
    for (const [muD, muMed, sigma] of [
      [0.15, 0.2, 0.18],
      [0.33, 0.33, 0.12],
      [0.05, 0.06, 0.4],
      [0.3, 0.12, 0.3],
    ] as const) {
      const ref = jStat.lognormal.cdf(muD, Math.log(muMed), sigma);
      expect(slipRisk(muD, muMed, sigma)).toBeCloseTo(ref, 10);
    }
    expect(slipRisk(0.33, 0.33, 0.12)).toBeCloseTo(0.5, 12); // designing to the median: slips half the time
    expect(slipRisk(0, 0.2, 0.18)).toBe(0);
  });

  it("the design adhesion at slip risk p is the lognormal p-quantile (jstat) [D]", () => {
    for (const p of [0.01, 0.1, 0.25]) {
      expect(adhesionQuantile(0.2, 0.18, p)).toBeCloseTo(jStat.lognormal.inv(p, Math.log(0.2), 0.18), 9);
      expect(slipRisk(adhesionQuantile(0.2, 0.18, p), 0.2, 0.18)).toBeCloseTo(p, 12);
    }
  });
});

describe("adhesion-limited tractive effort", () => {
  // [D] PHYSICS.md §2–3: the most the rails transmit is u·μ·m_adh·g.
  it("u·μ·m_adh·g", () => {
    expect(adhesionLimitN(120_000, 1, 0.33)).toBeCloseTo(0.33 * 120_000 * 9.80665, 6);
    expect(adhesionLimitN(120_000, 1, 0.33) / 1000).toBeCloseTo(388.34, 2);
    expect(adhesionLimitN(84_000, 0.85, 0.2)).toBeCloseTo(0.85 * 0.2 * 84_000 * GRAVITY_MPS2, 6);
  });
});
