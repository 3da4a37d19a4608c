/**
 * Timing of the record and absorber calculations that run on every keystroke of a page:
 * ring-down analysis of records of 1 000 to 200 000 samples (parse + peaks + fit, through the
 * calculator), and the exact TMD peak search. Target: under 50 ms for records a reader pastes
 * (a few thousand rows) and for the TMD calculator.
 *
 *   npx tsx bench/vibration.bench.ts
 *
 * Not part of npm test: timings depend on the machine and its load.
 */
import { evaluate } from '../src/calculators/evaluate.ts';
import { ringDownCalculator } from '../src/calculators/vibration/ring-down.ts';
import { syntheticRingDown } from '../src/calculators/vibration/ring-down.records.ts';
import { tmdTuningCalculator } from '../src/calculators/vibration/tmd-tuning.ts';
import { tmdPeak, tmdTuning } from '../src/core/vibration/index.ts';
import { medianMs } from './lib/timing.ts';

/** Median wall-clock milliseconds per run after 2 warm-ups. */
const time = (fn: () => void, runs = 9): number => medianMs(fn, runs, 2);

console.log('ring-down calculator (CSV text in, ζ out), ζ = 0.01, 50 samples per cycle, 0.5 % noise');
console.log('samples   text kB   ms     ζ found');
for (const cycles of [20, 200, 2000]) { // 2000 cycles ≈ 1.9 MB, near the 2 MB text limit
  const record = syntheticRingDown({ wn: 2 * Math.PI * 5, zeta: 0.01, amplitude: 1, offset: 0.2, phase: 0.3, cycles, samplesPerCycle: 50, noise: 0.005, jitter: 0.3, seed: 1, header: 't,x', delimiter: ',', digits: 6 });
  let zeta = 0;
  const ms = time(() => { zeta = evaluate(ringDownCalculator, { record }).outputs.zeta as number; }, 5);
  console.log(`${String(cycles * 50).padStart(7)}  ${(record.length / 1000).toFixed(0).padStart(7)}  ${ms.toFixed(1).padStart(6)}  ${zeta.toFixed(5)}`);
}

console.log('\nTMD exact peak search (Den Hartog tuning) and the whole calculator');
for (const mu of [0.005, 0.02, 0.1]) {
  const t = tmdTuning(mu, 'force');
  const core = time(() => { tmdPeak({ mu, f: t.f, zeta: t.zeta, zeta1: 0 }, 'force'); });
  const calc = time(() => { evaluate(tmdTuningCalculator, { mu, m1: 14_000, k1: 2.44e6, excitation: 'force' }); });
  console.log(`μ = ${mu}: tmdPeak ${core.toFixed(2)} ms, calculator ${calc.toFixed(2)} ms`);
}
