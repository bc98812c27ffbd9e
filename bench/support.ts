// Shared timing helpers of the benchmarks: they print figures, they never assert.

/** Median of a sample (mean of the two middle values for an even count). */
export function median(values: readonly number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 === 1 ? (s[m] as number) : 0.5 * ((s[m - 1] as number) + (s[m] as number));
}

/** Wall times (ms) of `rounds` calls of `run`, after `warmup` untimed calls. */
export function timeSamples(run: () => unknown, warmup: number, rounds: number): number[] {
  for (let i = 0; i < warmup; i++) run();
  const samples: number[] = [];
  for (let i = 0; i < rounds; i++) {
    const t0 = performance.now();
    run();
    samples.push(performance.now() - t0);
  }
  return samples;
}

/** Median wall time (ms) of `rounds` calls after `warmup` calls. */
export function medianTime(run: () => unknown, warmup: number, rounds: number): number {
  return median(timeSamples(run, warmup, rounds));
}
