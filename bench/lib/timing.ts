/** Timing helpers shared by the benchmarks (never part of npm test). */

export function median(xs: readonly number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

/** Median wall-clock milliseconds per run after `warmups` runs (JIT). */
export function medianMs(fn: () => void, runs = 15, warmups = 3): number {
  for (let i = 0; i < warmups; i++) fn();
  const wall: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    fn();
    wall.push(performance.now() - t0);
  }
  return median(wall);
}
