/**
 * Wheel climb under buff. On a curve a compressed coupler pushes the ends of the vehicles it joins towards
 * the outside of the curve; a light vehicle (an empty wagon) has little weight to hold its flange down.
 *
 * The criterion is Nadal's limit on the ratio of lateral to vertical force at a flanging wheel,
 *   L/V = (tan δ − μ) / (1 + μ tan δ),
 * δ the flange angle and μ the friction at the flange [S: M. J. Nadal, 1908, as reproduced in every
 * vehicle-dynamics text; PHYSICS.md "Wheel climb under buff"].
 * We take δ = 60° and μ = 0.5, the low end of the range PHYSICS.md gives (worn flange, dry flange face):
 * L/V = 0.66. The allowance keeps a margin of 1.2 below it (0.55), the same factor the couplers keep
 * below their working limit [M]; between 0.55 and 0.66 the start is marginal, above Nadal's limit it is not.
 *
 * The lateral force: for like neighbours the coupler lies along the track's tangent at the joint, and each
 * vehicle's body (the chord between its bogie centres) is turned from that tangent by half its length over
 * couplers ÷ the radius. A buff force F then pushes that end outwards with F · (length / 2R) [common
 * practice: small-angle geometry of a vehicle on a curve]. That end's bogie carries it, and we put all of it
 * on the bogie's flanging wheel (the leading outer wheel, conservatively), whose vertical load is the
 * vehicle's weight shared over its wheels. Cant, wheel unloading and unlike neighbours' coupler angles are
 * not modelled: the figure is an estimate to flag the classic case, not a vehicle-dynamics simulation.
 */
import { GRAVITY_MPS2 } from "./constants.js";

/** Flange angle δ, rad: 60° [S: Nadal; low end of the usual 60–70°]. */
export const FLANGE_ANGLE_RAD = (60 * Math.PI) / 180;
/** Flange friction μ [S: Nadal; 0.5 is the usual dry-flange figure]. */
export const FLANGE_FRICTION = 0.5;

/** Nadal's limit on L/V for a flange angle and flange friction. */
export function nadalLimit(flangeAngleRad = FLANGE_ANGLE_RAD, mu = FLANGE_FRICTION): number {
  const t = Math.tan(flangeAngleRad);
  return (t - mu) / (1 + mu * t);
}

/** The margin kept below Nadal's limit [M]: the same 1.2 the couplers keep below their working limit. */
export const WHEEL_CLIMB_MARGIN = 1.2;
/** The L/V a start may reach: Nadal's limit ÷ the margin. */
export const WHEEL_CLIMB_ALLOWANCE = nadalLimit() / WHEEL_CLIMB_MARGIN;

/**
 * L/V at the flanging wheel of a vehicle that has a buff force `forceN` at one end on a curve of radius
 * `radiusM` (0: straight, no lateral force).
 */
export function buffLateralRatio(forceN: number, radiusM: number, lengthM: number, axles: number, massKg: number): number {
  if (radiusM <= 0 || forceN <= 0) return 0;
  const lateralN = (forceN * lengthM) / (2 * radiusM);
  const wheelN = (massKg * GRAVITY_MPS2) / (2 * axles);
  return lateralN / wheelN;
}

/** The buff force at which a vehicle's flanging wheel reaches L/V = `ratio` on a curve of radius `radiusM`, N (∞ on straight track). */
export function buffForceAtRatioN(ratio: number, radiusM: number, lengthM: number, axles: number, massKg: number): number {
  if (radiusM <= 0) return Infinity;
  return ratio / buffLateralRatio(1, radiusM, lengthM, axles, massKg);
}
