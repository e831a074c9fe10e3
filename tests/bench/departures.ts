/**
 * A seeded day of departures that are all different, for the batch benchmark: every departure varies in mass
 * and length (three wagon families: loaded hoppers, empty hoppers, covered vans with screw couplings), in
 * its locomotives (1–3 units of three profiles, at the head, some with one at the rear or mid-train), in the
 * gradient and curvature under it (uniform, or a change of grade under the train), in the rail condition
 * (every one), sand, temperature (−20…30 °C), bearings, slack, coupler limit and target. Invented values in
 * plausible ranges (illustrative), as start-case JSON a user could write.
 */
import { RAIL_CONDITIONS } from "../../src/core/physics/types.js";

/** A small seeded generator (Park–Miller), so every run checks the same departures. */
export function seeded(seed: number): () => number {
  let s = seed % 2147483647;
  if (s <= 0) s += 2147483646;
  return () => (s = (s * 48271) % 2147483647) / 2147483647;
}

interface Family {
  wagonType: string;
  /** Gross mass per wagon, t. */
  massT: [number, number];
  wagons: [number, number];
  lengthM: number;
  slackMm: [number, number];
  limitKN: [number, number];
}

const FAMILIES: Family[] = [
  { wagonType: "bogie-hopper-loaded", massT: [60, 100], wagons: [15, 120], lengthM: 14, slackMm: [25, 75], limitKN: [850, 1100] },
  { wagonType: "bogie-hopper-empty", massT: [22, 28], wagons: [20, 150], lengthM: 14, slackMm: [25, 75], limitKN: [850, 1100] },
  { wagonType: "bogie-van-buffered", massT: [30, 85], wagons: [10, 60], lengthM: 16, slackMm: [0, 15], limitKN: [700, 950] },
];
const LOCOS = ["illustrative-4axle-1100", "illustrative-6axle-1800", "illustrative-6axle-3000"];

/** `count` start cases, all different, from `seed`. */
export function allDifferentDepartures(count: number, seed = 20261202): Array<Record<string, unknown>> {
  const rnd = seeded(seed);
  const pick = <T>(xs: readonly T[]): T => xs[Math.floor(rnd() * xs.length)]!;
  const between = ([lo, hi]: [number, number]) => lo + (hi - lo) * rnd();
  const whole = (r: [number, number]) => Math.round(between(r));
  return Array.from({ length: count }, (_, k) => {
    const fam = pick(FAMILIES);
    const wagons = whole(fam.wagons);
    const massT = Math.round(wagons * between(fam.massT));
    const units = 1 + Math.floor(rnd() * 3);
    const profile = pick(LOCOS);
    // Most trains have every unit at the head; some put one at the rear or mid-train.
    const place = rnd();
    const locomotives =
      units > 1 && place < 0.15
        ? [{ profile, count: units - 1, position: "head" }, { profile, count: 1, position: "rear" }]
        : units > 1 && place < 0.3
          ? [{ profile, count: units - 1, position: "head" }, { profile, count: 1, position: { afterWagon: Math.max(1, Math.round(wagons / 2)) } }]
          : [{ profile, count: units, position: "head" }];
    const trainLengthM = Math.round(wagons * fam.lengthM);
    // Grades: mostly rising (where starting is hard), some level or falling; a third of the curves are sharp.
    const grade = Math.round(10 * between([-6, 14])) / 10;
    const curve = rnd() < 0.5 ? 0 : Math.round(between(rnd() < 0.33 ? [250, 400] : [400, 1500]));
    const distance = rnd() < 0.3 ? Math.round(between([100, 800])) : null;
    const clearAhead = Math.round((distance ?? 300) + between([100, 1500]));
    // Half the places have a change of grade under the train: its rear on another gradient.
    const location =
      rnd() < 0.5
        ? { gradient_permille: grade, curveRadius_m: curve, clearAhead_m: clearAhead }
        : {
            segments: [
              { from_m: 0, length_m: 4000, gradient_permille: Math.round(10 * between([-8, 10])) / 10, curveRadius_m: 0 },
              { from_m: 4000, length_m: 6000, gradient_permille: grade, curveRadius_m: curve },
            ],
            frontAt_m: 4000 + Math.round(between([0.2, 0.8]) * trainLengthM),
            clearAhead_m: clearAhead,
          };
    return {
      schema: "taut/start-case@1",
      id: `all-different-${String(k + 1).padStart(3, "0")}`,
      label: "Generated departure for the batch benchmark (illustrative)",
      illustrative: true,
      locomotives,
      train: {
        trailingMass_t: massT,
        wagons,
        length_m: trainLengthM,
        couplerSlack_mm: whole(fam.slackMm),
        bearing: rnd() < 0.85 ? "roller" : "plain",
        couplerLimit_kN: whole(fam.limitKN),
        wagonType: fam.wagonType,
      },
      location,
      conditions: { rail: RAIL_CONDITIONS[k % RAIL_CONDITIONS.length], sand: rnd() < 0.5, temperature_C: Math.round(between([-20, 30])) },
      target: distance === null ? { speed_kmh: whole([10, 30]) } : { distance_m: distance },
    };
  });
}
