/** Median wall time (ms) of `repeat` runs after `warmup` unmeasured runs; the last result is returned too. */
export function timeMedian<T>(
  fn: () => T,
  { repeat = 5, warmup = 1 }: { repeat?: number; warmup?: number } = {},
): { ms: number; result: T } {
  let result = undefined as T;
  for (let i = 0; i < warmup; i++) result = fn();
  const times: number[] = [];
  for (let i = 0; i < repeat; i++) {
    const t0 = performance.now();
    result = fn();
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  return { ms: times[Math.floor(times.length / 2)], result };
}
