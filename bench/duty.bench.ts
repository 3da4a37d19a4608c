/**
 * Times the recorded-motion calculator on a 10,000-row loop record (measured force: power, loop
 * metrics, work-loop and force–velocity charts) in Node (target < 200 ms per run, as the page
 * recomputes on every edit). The browser figure is measured by `npm run bench`
 * (bench/run.ts, "csvInBrowser"). Run: npx tsx bench/duty.bench.ts
 */
import { evaluate } from '../src/calculators/evaluate.ts';
import { getCalculator } from '../src/calculators/registry.ts';
import { motionRecord } from './lib/motionRecord.ts';

const calc = getCalculator('recorded-motion');
if (!calc) throw new Error('recorded-motion is not registered');
const csv = motionRecord(10_000);
const runs: number[] = [];
for (let k = 0; k < 25; k++) {
  const t0 = performance.now();
  const r = evaluate(calc, { csv, layout: 'autoF' });
  if (r.outputs.Eloop === undefined) throw new Error('the bench record gave no loop metrics');
  if (calc.charts) calc.charts(r.values, r);
  runs.push(performance.now() - t0);
  if (k === 0) console.log(`rows used ${String(r.outputs.rowsUsed)}, mean power ${Number(r.outputs.P).toFixed(3)} W, cycles ${String(r.outputs.cycles)}, loop energy ${Number(r.outputs.Eloop).toFixed(3)} J, k_eff ${Number(r.outputs.keff).toFixed(1)} N/m`);
}
runs.sort((a, b) => a - b);
const median = runs[Math.floor(runs.length / 2)]!;
console.log(`recorded-motion, 10,000-row loop record, compute + loop metrics + charts: worst ${runs[runs.length - 1]!.toFixed(1)} ms (first, unwarmed), median ${median.toFixed(1)} ms, best ${runs[0]!.toFixed(1)} ms; target < 200 ms: ${median < 200 ? 'met' : 'NOT MET'}`);

const road = getCalculator('road-power');
if (road) {
  const t0 = performance.now();
  const r = evaluate(road, {});
  road.charts?.(r.values, r);
  console.log(`road-power at defaults, compute + charts: ${(performance.now() - t0).toFixed(1)} ms`);
}
