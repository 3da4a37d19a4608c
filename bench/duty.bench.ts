/**
 * Times the recorded-motion calculator on a 10,000-row CSV (target < 200 ms per run, as the page
 * recomputes on every edit). Run: npx tsx bench/duty.bench.ts
 */
import { evaluate } from '../src/calculators/evaluate.ts';
import { getCalculator } from '../src/calculators/registry.ts';

function record(rows: number): string {
  const out = ['# bench record', 'time [s],stroke [mm],force [kN]', 's,mm,kN'];
  let t = 0;
  for (let i = 0; i < rows; i++) {
    t += 0.001 * (1 + 0.2 * Math.sin(1.7 * i)); // uneven sampling
    const x = 25 * Math.sin(2 * Math.PI * 1.3 * t) + 3 * Math.sin(2 * Math.PI * 11 * t);
    const F = 1.2 * Math.cos(2 * Math.PI * 1.3 * t) + 0.05 * Math.sin(97 * t);
    out.splice(out.length, 0, `${t.toFixed(6)},${x.toFixed(4)},${F.toFixed(5)}`);
  }
  return out.join('\n');
}

const calc = getCalculator('recorded-motion');
if (!calc) throw new Error('recorded-motion is not registered');
const csv = record(10_000);
const runs: number[] = [];
for (let k = 0; k < 25; k++) {
  const t0 = performance.now();
  const r = evaluate(calc, { csv, layout: 'auto' });
  if (calc.charts) calc.charts(r.values, r);
  runs.push(performance.now() - t0);
  if (k === 0) console.log(`rows used ${String(r.outputs.rowsUsed)}, mean power ${Number(r.outputs.P).toFixed(3)} W, cycles ${String(r.outputs.cycles)}`);
}
runs.sort((a, b) => a - b);
const median = runs[Math.floor(runs.length / 2)]!;
console.log(`recorded-motion, 10,000 rows, compute + charts: worst ${runs[runs.length - 1]!.toFixed(1)} ms (first, unwarmed), median ${median.toFixed(1)} ms, best ${runs[0]!.toFixed(1)} ms; target < 200 ms: ${median < 200 ? 'met' : 'NOT MET'}`);

const road = getCalculator('road-power');
if (road) {
  const t0 = performance.now();
  const r = evaluate(road, {});
  road.charts?.(r.values, r);
  console.log(`road-power at defaults, compute + charts: ${(performance.now() - t0).toFixed(1)} ms`);
}
