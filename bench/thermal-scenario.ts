/** Prints the TW-210 worked-example figures used on the thermal pages (run: npx tsx bench/thermal-scenario.ts). */
import { getCalculator } from '../src/calculators/registry.ts';
import { evaluate } from '../src/calculators/evaluate.ts';

const body = { D: 0.05, L: 0.35, orientation: 'horizontal', Tamb: 298.15, eps: 0.9 };
const run = (id: string, inputs: Record<string, unknown>) => {
  const r = evaluate(getCalculator(id)!, inputs);
  console.log(id, JSON.stringify(inputs), JSON.stringify(r.outputs), r.warnings);
};
run('body-cooling', { ...body, Ts: 353.15, V: 0 });
run('body-cooling', { ...body, Ts: 353.15, V: 20, flowFactor: 0.3 });
run('body-cooling', { ...body, Ts: 353.15, V: 0, orientation: 'vertical' });
run('steady-temperature', { ...body, P: 80.85, V: 20, flowFactor: 0.3 });
run('steady-temperature', { ...body, P: 80.85, V: 0 });
run('steady-temperature', { ...body, P: 5.05, V: 0 });
run('power-rating', { ...body, Tmax: 373.15, V: 0 });
run('power-rating', { ...body, Tmax: 373.15, V: 20, flowFactor: 0.3 });
run('warm-up', { P: 80.85, Cth: 0, mSteel: 2.0, mOil: 0.25, UA: 0.7457, Tamb: 298.15, Tlimit: 373.15, t: 1800 });
run('warm-up', { P: 80.85, Cth: 0, mSteel: 2.0, mOil: 0.25, UA: 0.7457, Tlimit: 373.15, t: 1800, loss: 'body', ...body, V: 0 });
run('warm-up', { P: 80.85, Cth: 0, mSteel: 2.0, mOil: 0.25, UA: 0.7457, Tamb: 298.15, Tlimit: 373.15, t: 1800, duty: 0.5, period: 600 });
run('oil-viscosity', { nu40: 20e-6, nu100: 4.5e-6, T: 353.15 });
run('oil-viscosity', { nu40: 20e-6, nu100: 4.5e-6, T: 263.15 });
run('damping-fade', { ...body, V: 0, cRef: 980, share: 0.3, duty: 'harmonic', X: 0.025, f: 2, Tlimit: 373.15, Cth: 1345 });
run('damping-fade', { ...body, V: 0, cRef: 980, share: 0.3, duty: 'harmonic', X: 0.04, f: 2, Tlimit: 373.15, Cth: 1345 });
run('damping-fade', { ...body, V: 20, flowFactor: 0.3, cRef: 980, share: 0.3, duty: 'random', P: 80.85, Tlimit: 373.15, Cth: 1345 });
run('damping-fade', { ...body, V: 0, cRef: 980, share: 0.3, duty: 'random', P: 80.85, Tlimit: 373.15, Cth: 1345 });
