/**
 * The line naming outputs that these inputs do not give (behaviour, common practice, no source):
 * sdof above critical damping has no logarithmic decrement and no Q (Rao, Mechanical Vibrations,
 * 6th ed., §2.6: δ and the damped period are defined for ζ < 1 only — from memory).
 */
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/calculators/evaluate.ts';
import { getCalculator } from '../../src/calculators/registry.ts';
import { absentOutputsLine } from '../../src/components/render/absentOutputs.ts';

describe('absentOutputsLine', () => {
  const calc = getCalculator('sdof')!;
  it('names the outputs an overdamped oscillator does not have', () => {
    const r = evaluate(calc, { m: 1, k: 100, c: 40, x0: 0.01, v0: 0 }); // ζ = 40/(2·√100) = 2
    expect(absentOutputsLine(calc, r.outputs)).toBe('Not given for these inputs: Logarithmic decrement δ; Quality factor Q.');
  });
  it('is empty when every output is given', () => {
    const r = evaluate(calc, { m: 1, k: 100, c: 2, x0: 0.01, v0: 0 }); // ζ = 0.1
    expect(absentOutputsLine(calc, r.outputs)).toBe('');
  });
});
