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
