/**
 * Times the two-node warm-up (oil and body) over a 100-block power profile, the longest profile a
 * duty page hands over (blockPower keeps at most 100 blocks): the warm-up calculator with two nodes
 * and constant UA (exact segment by segment, `twoNodeLinear`; target ≤ 20 ms per evaluate), the core
 * run alone, and for information the integrated run the body model uses (`twoNodeWarmUp`,
 * Dormand–Prince per segment). Run: npx tsx bench/twoNode.bench.ts
 */
import { evaluate } from '../src/calculators/evaluate.ts';
import { getCalculator } from '../src/calculators/registry.ts';
import { formatPowerProfile, twoNodeLinear, twoNodeWarmUp, type PowerProfile } from '../src/core/thermal/index.ts';
import { medianMs } from './lib/timing.ts';

const TARGET_MS = 20;
/** 100 blocks over 20 min, power between 0 and 240 W (a road duty's block powers, invented). */
const blocks = 100;
const period = 1200;
const profile: PowerProfile = {
  t: Array.from({ length: blocks + 1 }, (_, i) => (period * i) / blocks),
  P: Array.from({ length: blocks }, (_, i) => 120 + 120 * Math.sin((2 * Math.PI * i) / 17) * Math.cos(i / 7)),
};
const UA = 0.745664;
const NODES = { Coil: 475, Cbody: 920, Gob: 8, T0: 298.15 };
const core = medianMs(() => { twoNodeLinear(NODES, UA, profile, 'repeat', 5 * 1395 / UA); });
const ode = medianMs(() => { twoNodeWarmUp((T) => UA * (T - 298.15), NODES, profile, 'repeat', 5 * 1395 / UA); }, 5, 1);
const calc = getCalculator('warm-up')!;
const text = formatPowerProfile(profile);
let closure = 0;
const page = medianMs(() => {
  const r = evaluate(calc, { power: 'profile', profile: text, after: 'repeat', Cth: 1395, UA, nodes: 'two', Gob: 8, Coil: 475, t: 3600 });
  closure = r.outputs.closure as number;
});
const verdict = (ms: number) => (ms <= TARGET_MS ? 'met' : 'NOT MET');
console.log(`two-node warm-up, 100-block profile repeated over 5τ (${(5 * 1395 / UA / period).toFixed(1)} periods): exact core run median ${core.toFixed(2)} ms (target ≤ ${TARGET_MS} ms: ${verdict(core)}); integrated (body-model path) ${ode.toFixed(1)} ms, for information`);
console.log(`warm-up calculator with two nodes, same profile: median ${page.toFixed(2)} ms per evaluate (target ≤ ${TARGET_MS} ms: ${verdict(page)}); energy audit closure ${closure.toExponential(1)}`);
