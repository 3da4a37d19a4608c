import { describe, expect, it } from 'vitest';
import { damperSimulationCalculator } from '../../../src/calculators/vibration/damper-simulation.ts';
import { evaluate, defaults } from '../../../src/calculators/evaluate.ts';

const run = (inputs: Record<string, unknown>) => evaluate(damperSimulationCalculator, { ...defaults(damperSimulationCalculator), ...inputs });

describe('damper-simulation calculator', () => {
  it('closes the energy audit below 1e-6 at the defaults for every law', () => {
    // common practice, no source: the audit requirement of the handbook
    for (const law of ['linear', 'power', 'coulomb', 'bilinear', 'hysteretic']) {
      const r = run({ law });
      expect(r.outputs.closure as number).toBeLessThan(1e-6);
    }
  });

  it('says when hysteretic damping is simulated as its viscous equivalent', () => {
    const r = run({ law: 'hysteretic', eta: 0.2 });
    expect(r.warnings.join(' ')).toMatch(/ηk_h\/ω/);
    // c = ηk_h/ω = 0.2 · 16000 / (2π · 1.5), k_h at its default 16 kN/m (Chopra, Dynamics of Structures 5th ed. §3.10, from memory)
    expect(r.outputs.ceqHyst as number).toBeCloseTo((0.2 * 16000) / (3 * Math.PI), 9);
  });

  it('reports time stuck only for the Coulomb law', () => {
    expect(run({ law: 'linear' }).outputs.stuckTime).toBeUndefined();
    expect(run({ law: 'coulomb', Ff: 5000 }).outputs.stuckTime).toBe(10);
  });

  it('draws four charts and the law\'s force–velocity curve, with the energy balance flat at E₀', () => {
    const r = run({ law: 'bilinear', excitation: 'none', x0: 0.05 });
    const charts = damperSimulationCalculator.charts!(r.values);
    expect(charts.map((c) => c.id)).toEqual(['displacement', 'force', 'loop', 'energy', 'law']);
    const balance = charts[3]!.series[3]!.y;
    const E0 = r.outputs.E0 as number;
    for (const b of balance) expect(Math.abs(b - E0)).toBeLessThan(1e-6 * E0);
  });

  it('refuses a duration of zero naming duration', () => expect(() => run({ duration: 0 })).toThrow(/'duration'/));
});
