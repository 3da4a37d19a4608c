/**
 * Timing of the fv-fit calculator on dyno sheets of 200 to 8 000 points (the text limit is 200 000 characters) (parse + fit + band
 * check, through the calculator, and with chart data), for each law. Target: 200 points ≤ 20 ms
 * (the whole calculator with charts, on every keystroke of the page).
 *
 *   npx tsx bench/fvfit.bench.ts
 *
 * Not part of npm test: timings depend on the machine and its load. Exits with status 1 when the
 * 200-point target is missed.
 */
import { evaluate } from '../src/calculators/evaluate.ts';
import { fvFitCalculator } from '../src/calculators/vibration/fv-fit.ts';
import { damperForce, type DamperLaw } from '../src/core/dampers/index.ts';
import { medianMs } from './lib/timing.ts';

/** Median wall-clock milliseconds per run after 3 warm-ups. */
const time = (fn: () => void, runs = 15): number => medianMs(fn, runs, 3);

/** A bilinear damper sampled both ways with ±1 % seeded scatter, as text. */
function sheet(n: number): string {
  const law: DamperLaw = { kind: 'bilinear', vknee: 0.1, rebound: { c1: 3200, c2: 1300 }, compression: { c1: 1280, c2: 520 } };
  let s = 7;
  const rnd = () => { s = (s * 16807) % 2147483647; return s / 2147483647; };
  const rows = ['v,F,T'];
  for (let i = 0; i < n; i++) {
    const v = (i % 2 ? -1 : 1) * (0.02 + (1.03 * Math.floor(i / 2)) / (n / 2));
    rows.push(`${v.toFixed(4)},${(damperForce(law, v) * (1 + 0.02 * (rnd() - 0.5))).toFixed(1)},${(293 + rnd()).toFixed(1)}`);
  }
  return rows.join('\n');
}

const TARGET_MS = 20;
let failed = false;
console.log('fv-fit calculator (text in, law out), with and without chart data');
console.log('points  law       ms (compute)  ms (+charts)');
for (const n of [200, 2000, 8000]) {
  const points = sheet(n);
  for (const law of ['linear', 'power', 'bilinear']) {
    // a new force offset on every call defeats the calculator's one-entry cache (charts reuse it, as on the page)
    let k = 0;
    const values = () => ({ points, law, F0: ++k * 1e-6 });
    const compute = time(() => { evaluate(fvFitCalculator, values()); }, n > 2000 ? 3 : 15);
    const withCharts = time(() => { const r = evaluate(fvFitCalculator, values()); fvFitCalculator.charts(r.values, r); }, n > 2000 ? 3 : 15);
    const mark = n === 200 && withCharts > TARGET_MS ? `  > ${TARGET_MS} ms target` : '';
    if (mark) failed = true;
    console.log(`${String(n).padStart(6)}  ${law.padEnd(8)}  ${compute.toFixed(2).padStart(12)}  ${withCharts.toFixed(2).padStart(12)}${mark}`);
  }
}
if (failed) process.exitCode = 1;
