/**
 * The power-law coefficient C (N·(s/m)^α) takes SI base units only: a damping unit such as
 * lbf·s/in converts C correctly only at α = 1, because its length part is raised to α.
 * Conversion factors: NIST SP 811 (2008), Appendix B (lbf = 4.448222 N, in = 0.0254 m).
 * The energy check: E = λ(α)·C·ω^α·X^(1+α) with λ(0.5) = 3.49608 (FEMA 274 §9.3, from memory).
 */
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../../src/calculators/evaluate.ts';
import { getCalculator } from '../../../src/calculators/registry.ts';
import { readField } from '../../../src/components/internal/fieldState.ts';
import { InputRangeError } from '../../../src/core/errors.ts';

const calc = getCalculator('energy-per-cycle')!;
const cDef = calc.inputs.find((d) => d.key === 'c')!;

describe('power-law coefficient units', () => {
  it('refuses C with a unit for the power law, naming the input', () => {
    const attempt = () => evaluate(calc, { law: 'power', c: '800 lbf.s/in', alpha: 0.5, X: 0.025, f: 1.5 }, { fillDefaults: false });
    expect(attempt).toThrow(InputRangeError);
    expect(attempt).toThrow(/'c'.*SI base units/);
  });

  it('accepts a plain SI number for the power law and gives λ(α)·C·ω^α·X^(1+α)', () => {
    const r = evaluate(calc, { law: 'power', c: '800', alpha: 0.5, X: 0.025, f: 1.5 }, { fillDefaults: false });
    const omega = 2 * Math.PI * 1.5;
    expect(Number(r.outputs.E)).toBeCloseTo(3.49608 * 800 * omega ** 0.5 * 0.025 ** 1.5, 3);
  });

  it('still converts other damping units for the linear law (10 lbf·s/in = 1751.27 N·s/m)', () => {
    const r = evaluate(calc, { law: 'linear', c: '10 lbf.s/in', X: 0.02, f: 2 }, { fillDefaults: false });
    expect(Number(r.values.c)).toBeCloseTo(10 * 4.4482216152605 / 0.0254, 6);
  });

  it('in the page field: a non-SI unit is refused with a message while the power law is chosen, accepted for the linear law', () => {
    const power = readField(cDef, '800', 'lbf.s/in', { law: 'power' });
    expect(power.ok).toBe(false);
    if (!power.ok) expect(power.message).toMatch(/SI unit/);
    expect(readField(cDef, '800', 'N.s/m', { law: 'power' }).ok).toBe(true);
    expect(readField(cDef, '10', 'lbf.s/in', { law: 'linear' }).ok).toBe(true);
  });
});
