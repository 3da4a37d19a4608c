/** Fallback rate of road-power's closed form on the bench's random valid inputs (bench/evaluate.bench.ts). */
import fc from 'fast-check';
import { evaluate } from '../src/calculators/evaluate.ts';
import { roadPowerCalculator } from '../src/calculators/duty/road-power.ts';
import { validRecord } from '../test/calculators/hostile.arbitraries.ts';

const raw = fc.sample(validRecord(roadPowerCalculator), { numRuns: Number(process.env.N ?? 4000), seed: 42 });
let ok = 0; let fell = 0; const times: number[] = []; const slow: unknown[] = [];
for (const r of raw) {
  let res;
  const t0 = performance.now();
  try { res = evaluate(roadPowerCalculator, r, { fillDefaults: false }); } catch { continue; }
  const t = performance.now() - t0;
  ok++; times.push(t);
  const band = String(res.outputs.band);
  if (!band.startsWith('none')) { fell++; if (slow.length < 8) slow.push({ band, t: t.toFixed(1), ceq: res.outputs.ceq, Gd0: res.outputs.Gd0Used, r: Object.fromEntries(['w', 'V', 'ms', 'mu', 'ks', 'kt', 'law', 'c', 'Fref', 'vref', 'alpha', 'MR'].map((k) => [k, r[k]])) }); }
}
times.sort((a, b) => a - b);
console.log(`answered ${ok}; fell back ${fell} (${((100 * fell) / ok).toFixed(2)} %); p99 ${times[Math.floor(0.99 * times.length)]!.toFixed(2)} ms`);
for (const s of slow) console.log(JSON.stringify(s));
