/**
 * The power-law coefficient is entered as a force F_ref at a reference velocity v_ref, so it
 * converts between unit systems like any force and velocity (C = F_ref/v_ref^α, N·(s/m)^α); no
 * field is SI-only any more. Conversion factors: NIST SP 811 (2008), Appendix B.8 (published):
 * lbf = 4.4482216152605 N, in = 0.0254 m, ft = 0.3048 m.
 * The energy check: E = λ(α)·C·ω^α·X^(1+α) with λ(0.5) = 3.49608 (FEMA 274 §9.3, from memory).
 */
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../../src/calculators/evaluate.ts';
import { getCalculator } from '../../../src/calculators/registry.ts';
import { readField } from '../../../src/components/render/fieldState.ts';

const calc = getCalculator('energy-per-cycle')!;
const LBF = 4.4482216152605;
const omega = 2 * Math.PI * 1.5;

describe('power-law coefficient units', () => {
  it('reads F_ref in lbf and v_ref in ft/s and gives λ(α)·C·ω^α·X^(1+α) with C = F_ref/v_ref^α', () => {
    const r = evaluate(calc, { law: 'power', Fref: '100 lbf', vref: '1 ft/s', alpha: 0.5, X: 0.025, f: 1.5 }, { fillDefaults: false });
    const C = (100 * LBF) / 0.3048 ** 0.5;
    expect(Number(r.outputs.E)).toBeCloseTo(3.49608 * C * omega ** 0.5 * 0.025 ** 1.5, 3);
  });

  it('gives the same energy for the same damper written in SI and in US units', () => {
    const si = evaluate(calc, { law: 'power', Fref: 100 * LBF, vref: 0.0254 * 10, alpha: 0.4, X: 0.02, f: 2 }, { fillDefaults: false });
    const us = evaluate(calc, { law: 'power', Fref: '100 lbf', vref: '10 in/s', alpha: 0.4, X: 0.02, f: 2 }, { fillDefaults: false });
    expect(Number(us.outputs.E)).toBeCloseTo(Number(si.outputs.E), 10);
  });

  it('still converts other damping units for the linear law (10 lbf·s/in = 1751.27 N·s/m)', () => {
    const r = evaluate(calc, { law: 'linear', c: '10 lbf.s/in', X: 0.02, f: 2 }, { fillDefaults: false });
    expect(Number(r.values.c)).toBeCloseTo((10 * LBF) / 0.0254, 6);
  });

  it('in the page field: F_ref takes any force unit while the power law is chosen', () => {
    const fref = calc.inputs.find((d) => d.key === 'Fref')!;
    const r = readField(fref, '100', 'lbf', { law: 'power' });
    expect(r.ok && r.value).toBeCloseTo(100 * LBF, 9);
  });
});
