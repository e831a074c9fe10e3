/**
 * Standard normal distribution: cumulative probability and its inverse, for slip risk.
 * CDF via erfc (W. J. Cody's rational Chebyshev approximations, Math. Comp. 23, 1969; |rel. error| < 1e-14
 * in the form used by many libraries); inverse via P. J. Acklam's algorithm refined by one Halley step.
 */

/** Complementary error function erfc(x) (Cody 1969 rational approximations). */
export function erfc(x: number): number {
  const z = Math.abs(x);
  let r: number;
  if (z < 0.5) {
    r = 1 - erfSmall(z);
  } else if (z < 4) {
    r = (Math.exp(-z * z) * horner(MID_P, z)) / horner(MID_Q, z);
  } else {
    const zi = 1 / (z * z);
    const frac = (zi * horner(TAIL_P, zi)) / horner(TAIL_Q, zi);
    r = (Math.exp(-z * z) / z) * (1 / Math.sqrt(Math.PI) - frac);
  }
  return x < 0 ? 2 - r : r;
}

function erfSmall(z: number): number {
  const t = z * z;
  return (z * horner(SMALL_P, t)) / horner(SMALL_Q, t);
}

// Cody's coefficients, lowest order first (made once, not at every call).
const SMALL_P: readonly number[] = [3.20937758913846947e3, 3.77485237685302021e2, 1.13864154151050156e2, 3.16112374387056560, 1.85777706184603153e-1];
const SMALL_Q: readonly number[] = [2.84423683343917062e3, 1.28261652607737228e3, 2.44024637934444173e2, 2.36012909523441209e1, 1];
const MID_P: readonly number[] = [1230.33935479799725, 2051.07837782607147, 1712.04761263407058, 881.952221241769090, 298.635138197400131, 66.1191906371416295, 8.88314979438837594, 0.564188496988670089, 2.15311535474403846e-8];
const MID_Q: readonly number[] = [1230.33935480374942, 3439.36767414372164, 4362.61909014324716, 3290.79923573345963, 1621.38957456669019, 537.181101862009858, 117.693950891312499, 15.7449261107098347, 1];
const TAIL_P: readonly number[] = [6.58749161529837803e-4, 1.60837851487422766e-2, 1.25781726111229246e-1, 3.60344899949804439e-1, 3.05326634961232344e-1, 1.63153871373020978e-2];
const TAIL_Q: readonly number[] = [2.33520497626869185e-3, 6.05183413124413191e-2, 5.27905102951428412e-1, 1.87295284992346725, 2.56852019228982242, 1];

/** Polynomial Σ c[i]·x^i, coefficients lowest order first. */
function horner(c: readonly number[], x: number): number {
  let s = 0;
  for (let i = c.length - 1; i >= 0; i--) s = s * x + (c[i] as number);
  return s;
}

/** Standard normal cumulative probability Φ(z). */
export function normalCdf(z: number): number {
  return 0.5 * erfc(-z / Math.SQRT2);
}

/** Inverse of Φ: the z with Φ(z) = p, for 0 < p < 1 (Acklam, refined by one Halley step). */
export function normalQuantile(p: number): number {
  if (!(p > 0 && p < 1)) {
    if (p === 0) return -Infinity;
    if (p === 1) return Infinity;
    throw new RangeError(`probability ${p} outside 0..1`);
  }
  const a = [-3.969683028665376e1, 2.209460984245205e2, -2.759285104469687e2, 1.38357751867269e2, -3.066479806614716e1, 2.506628277459239];
  const b = [-5.447609879822406e1, 1.615858368580409e2, -1.556989798598866e2, 6.680131188771972e1, -1.328068155288572e1];
  const c = [-7.784894002430293e-3, -3.223964580411365e-1, -2.400758277161838, -2.549732539343734, 4.374664141464968, 2.938163982698783];
  const d = [7.784695709041462e-3, 3.224671290700398e-1, 2.445134137142996, 3.754408661907416];
  const pLow = 0.02425;
  let x: number;
  if (p < pLow) {
    const q = Math.sqrt(-2 * Math.log(p));
    x = (((((c[0]! * q + c[1]!) * q + c[2]!) * q + c[3]!) * q + c[4]!) * q + c[5]!) / ((((d[0]! * q + d[1]!) * q + d[2]!) * q + d[3]!) * q + 1);
  } else if (p <= 1 - pLow) {
    const q = p - 0.5;
    const r = q * q;
    x = ((((((a[0]! * r + a[1]!) * r + a[2]!) * r + a[3]!) * r + a[4]!) * r + a[5]!) * q) / (((((b[0]! * r + b[1]!) * r + b[2]!) * r + b[3]!) * r + b[4]!) * r + 1);
  } else {
    const q = Math.sqrt(-2 * Math.log(1 - p));
    x = -(((((c[0]! * q + c[1]!) * q + c[2]!) * q + c[3]!) * q + c[4]!) * q + c[5]!) / ((((d[0]! * q + d[1]!) * q + d[2]!) * q + d[3]!) * q + 1);
  }
  // One Halley step brings the error to machine precision.
  const e = normalCdf(x) - p;
  const u = e * Math.sqrt(2 * Math.PI) * Math.exp((x * x) / 2);
  return x - u / (1 + (x * u) / 2);
}
