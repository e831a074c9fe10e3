/**
 * How a figure is rounded for people, in one place for the app and the command line: half away from zero,
 * decided on the number's shortest decimal form (as a person reading "1.005" expects "1.01"), not on its
 * binary value (which `toFixed` uses, giving "1.00" for 1.005). The app and `taut` then print the same
 * digits for the same figure.
 */

/** `|x|` rounded half away from zero to `d` decimals, as digits (no sign, no grouping). */
export function fixedDigits(x: number, d: number): string {
  const s = Math.abs(x).toString();
  // An exponent form (below 1e-6 or from 1e21): no ties at the few decimals shown.
  if (s.includes("e")) return Math.abs(x).toFixed(d);
  const dot = s.indexOf(".");
  const whole = dot < 0 ? s : s.slice(0, dot);
  const frac = dot < 0 ? "" : s.slice(dot + 1);
  if (frac.length <= d) return d === 0 ? whole : `${whole}.${frac.padEnd(d, "0")}`;
  const digits = (whole + frac.slice(0, d)).split("");
  if (frac.charCodeAt(d) >= 53 /* "5" */) {
    let k = digits.length - 1;
    while (k >= 0 && digits[k] === "9") digits[k--] = "0";
    if (k >= 0) digits[k] = String(Number(digits[k]) + 1);
    else digits.unshift("1");
  }
  const cut = digits.length - d;
  return d === 0 ? digits.join("") : `${digits.slice(0, cut).join("")}.${digits.slice(cut).join("")}`;
}

/** `x` rounded half away from zero to `d` decimals (0 ≤ d ≤ 20), as a number. */
export function roundHalfAway(x: number, d: number): number {
  if (!Number.isFinite(x)) return x;
  const v = Number(fixedDigits(x, Math.max(0, Math.min(20, Math.trunc(d)))));
  return x < 0 && v !== 0 ? -v : v;
}

/**
 * A force in newtons as the kilonewtons every surface prints (whole unless `d` is given), rounded once from
 * the SI value: the limits, the why lines, the plan's header and the app's figures all go through here, so the
 * same force never reads 206 kN in one place and 207 kN in another.
 */
export function forceKN(n_N: number, d = 0): number {
  return roundHalfAway(n_N / 1000, d);
}

/**
 * A fraction (slip risk, adhesion used) as the whole percent every surface prints, rounded once; `null` when it
 * is above zero but would read 0 (the surfaces write "< 1 %" there). The steps table, the why lines and the app's
 * step card read the same figure for the same step.
 */
export function wholePercent(fraction: number): number | null {
  const p = fraction * 100;
  return p > 0 && p < 0.5 ? null : roundHalfAway(p, 0);
}

/** Plain text of a figure with `d` decimals ("-" for negatives, no grouping): the command line's form. */
export function fixedText(x: number, d: number): string {
  const body = fixedDigits(x, Math.max(0, Math.min(20, Math.trunc(d))));
  return x < 0 && /[1-9]/.test(body) ? `-${body}` : body;
}

/**
 * Parts of a total, each rounded to `d` decimals so that they add up to the total rounded the same way: a
 * printed breakdown ("187 kN (13 + 25 + 121 + 28)") never contradicts its own sum. The largest-remainder
 * method (Hamilton's; Balinski & Young, "Fair Representation", 1982): every part is first rounded down, then
 * the units still missing go to the parts that lost the most. Each part stays within one unit of its exact
 * value, and where rounding each part on its own already gives the rounded sum, those are the parts returned.
 */
export function partsSummingTo(parts: readonly number[], d = 0): number[] {
  const scale = 10 ** Math.max(0, Math.min(20, Math.trunc(d)));
  const alone = parts.map((p) => roundHalfAway(p, d));
  const total = roundHalfAway(parts.reduce((s, p) => s + p, 0), d);
  const sumAlone = alone.reduce((s, p) => s + p, 0);
  if (!parts.every(Number.isFinite) || Math.abs(sumAlone - total) < 0.5 / scale) return alone;
  const scaled = parts.map((p) => p * scale);
  const floors = scaled.map(Math.floor);
  let missing = Math.round(total * scale - floors.reduce((s, f) => s + f, 0));
  const order = scaled.map((x, i) => ({ i, rest: x - floors[i]! })).sort((a, b) => b.rest - a.rest || a.i - b.i);
  for (const { i } of order) {
    if (missing <= 0) break;
    floors[i]! += 1;
    missing -= 1;
  }
  return floors.map((f) => roundHalfAway(f / scale, d));
}
