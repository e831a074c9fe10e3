/**
 * An independent statement of the chain equations (elastic couplings: loading curve only, no
 * hysteresis state) as a first-order ODE system, for integration by a general-purpose solver.
 * Written from PHYSICS.md §4–§5 directly, not from the engine's code.
 */
export interface RefChain {
  masses: number[];
  effMasses: number[];
  davisA: number[];
  davisB: number[];
  davisC: number[];
  breakawayExcess: number[];
  fadeSpeed: number;
  sinTheta: number;
  halfSlack: number;
  ext0: number[];
  travel: number;
  rated: number;
  linear: number;
  endStopK: number;
  damping: number;
  /** Powered vehicle, its current-limited effort, rail power and effort time constants. */
  loco: number;
  effortN: number;
  powerW: number;
  riseS: number;
  fallS: number;
}

const G = 9.80665;

/** Loading force of the gear at deflection e ≥ 0, with the end stop beyond full travel, N. */
function gearLoad(c: RefChain, e: number): number {
  const xi = Math.min(e / c.travel, 1);
  return c.rated * xi * (c.linear + (1 - c.linear) * xi) + (e > c.travel ? c.endStopK * (e - c.travel) : 0);
}

/** Coupler force for extension `ext` and closing speed `w` (tension positive). */
export function refCouplerForce(c: RefChain, ext: number, w: number): number {
  if (ext > c.halfSlack) return Math.max(0, gearLoad(c, ext - c.halfSlack) + c.damping * w);
  if (ext < -c.halfSlack) return Math.min(0, -gearLoad(c, -ext - c.halfSlack) + c.damping * w);
  return 0;
}

/**
 * y = [x_0..x_{n-1}, v_0..v_{n-1}, effort]; every vehicle assumed moving forward (v > 0). The function
 * allocates nothing per call: it writes into one derivative array and one array of coupling forces made
 * here, and returns the same derivative array each time (a solver copies what it needs before the next call;
 * odex copies it into its own storage at once).
 */
export function refDerivative(c: RefChain): (t: number, y: number[]) => number[] {
  const n = c.masses.length;
  const d = new Array<number>(2 * n + 1).fill(0);
  const F = new Array<number>(Math.max(0, n - 1)).fill(0);
  return (_t, y) => {
    for (let j = 0; j < n - 1; j++) F[j] = refCouplerForce(c, c.ext0[j]! + y[j]! - y[j + 1]!, y[n + j]! - y[n + j + 1]!);
    const effort = y[2 * n]!;
    for (let i = 0; i < n; i++) {
      const v = y[n + i]!;
      const res =
        c.davisA[i]! + c.davisB[i]! * v + c.davisC[i]! * v * v + c.breakawayExcess[i]! * Math.max(0, 1 - v / c.fadeSpeed);
      const net = (i > 0 ? F[i - 1]! : 0) - (i < n - 1 ? F[i]! : 0) + (i === c.loco ? effort : 0) - c.masses[i]! * G * c.sinTheta - res;
      d[i] = v;
      d[n + i] = net / c.effMasses[i]!;
    }
    const v = Math.max(y[n + c.loco]!, 1e-3);
    const target = Math.min(c.effortN, c.powerW / v);
    d[2 * n] = (target - effort) / (target > effort ? c.riseS : c.fallS);
    return d;
  };
}
