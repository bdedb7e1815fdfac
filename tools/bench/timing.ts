/** Timing for the in-process benchmarks: the median of several runs after a warm-up. */

/** Median of the values (the upper one of the middle pair for an even count). */
export function median(values: readonly number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

/** Runs `fn` `warmup` times untimed, then `runs` times; returns the median time of one run [ms]. */
export function medianRunMs(fn: () => void, runs: number, warmup: number): number {
  for (let i = 0; i < warmup; i++) fn();
  const t: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    fn();
    t.push(performance.now() - t0);
  }
  return median(t);
}
