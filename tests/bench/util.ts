/** Small helpers for the benchmarks: timing, medians, memory sampling, aligned printing. */

export function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : 0.5 * (s[m - 1]! + s[m]!);
}

/** Time `fn` `runs` times after `warmup` unmeasured runs; returns the times in ms. */
export function timeRuns<T>(fn: () => T, runs: number, warmup = 1): { times: number[]; last: T } {
  let last: T = fn();
  for (let k = 1; k < warmup; k++) last = fn();
  const times: number[] = [];
  for (let k = 0; k < runs; k++) {
    const t0 = performance.now();
    last = fn();
    times.push(performance.now() - t0);
  }
  return { times, last };
}

/** Memory in MB the process holds in the JS heap and array buffers. */
export function memoryMB(): number {
  const m = process.memoryUsage();
  return (m.heapUsed + m.arrayBuffers) / 2 ** 20;
}

export function line(label: string, value: string, note = ""): void {
  console.log(`  ${label.padEnd(52)} ${value.padStart(14)}${note ? `   ${note}` : ""}`);
}

export function heading(text: string): void {
  console.log(`\n${text}`);
}

/** One target of issue 14 with the figure measured in this run. */
export interface TargetFigure {
  target: string;
  figure: string;
  /** Measured ÷ goal (≤ 1 meets a "≤" goal), or goal ÷ measured for a "≥" goal; null when not a ratio. */
  ratio: number | null;
  note?: string;
}

const targets: TargetFigure[] = [];

/** Record a target's figure for the summary at the end of the run (and print it where it was measured). */
export function target(t: TargetFigure): void {
  targets.push(t);
  line(`target: ${t.target}`, t.figure, `${t.ratio === null ? "" : `${t.ratio.toFixed(2)} of the goal`}${t.note ? `${t.ratio === null ? "" : "; "}${t.note}` : ""}`);
}

/** Every target recorded so far, as a closing table. */
export function printTargets(): void {
  heading("Targets (issue 14) — figures of this run; a ratio ≤ 1 meets the goal");
  for (const t of targets) console.log(`  ${t.target.padEnd(64)} ${t.figure.padStart(12)}  ${t.ratio === null ? "      " : `${t.ratio.toFixed(2).padStart(5)}×`}  ${t.note ?? ""}`);
}

/** This process's CPU time so far (user + system), ms. */
export function cpuMs(): number {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1000;
}
