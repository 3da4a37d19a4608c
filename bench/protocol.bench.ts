/**
 * Times the test-protocol calculator on a 2000-cycle wind prototype test (the Hall C demo damper,
 * power law, with the fade law on a silicone fluid and heat loss, compute + charts) in Node;
 * target ≤ 50 ms per run, as the page recomputes on every edit. Run: npx tsx bench/protocol.bench.ts
 */
import { evaluate } from '../src/calculators/evaluate.ts';
import { getCalculator } from '../src/calculators/registry.ts';
import { medianMs } from './lib/timing.ts';

const calc = getCalculator('test-protocol');
if (!calc) throw new Error('test-protocol is not registered');
const inputs = {
  protocol: 'N, X [mm], f [Hz], rest [s]\n2000, 3, 2, 0', law: 'power', Fref: 200e3, vref: 1, alpha: 0.4,
  fade: 'law', fluid: 'silicone', nu40: 3e-4, nu100: 1.2e-4, share: 0.2, Cth: 22.9e3, UA: 5, Tamb: 293.15,
};
let last: ReturnType<typeof evaluate> | undefined;
const ms = medianMs(() => {
  last = evaluate(calc, inputs);
  calc.charts?.(last.values, last);
}, 25, 3);
console.log(`test-protocol, 2000 cycles with fade law and heat loss: rise ${(Number(last!.outputs.dTpeak)).toFixed(2)} K, change ${(100 * Number(last!.outputs.change)).toFixed(2)} %`);
console.log(`compute + charts: median ${ms.toFixed(2)} ms; target ≤ 50 ms: ${ms <= 50 ? 'met' : 'NOT MET'}`);
