/** The CLI contracts of the issue: ids, input and output keys, SI units. Other tools rely on them. */
import { describe, expect, it } from 'vitest';
import { getCalculator } from '../../../src/calculators/registry.ts';
import { evaluate } from '../../../src/calculators/evaluate.ts';
import { InputRangeError } from '../../../src/core/errors.ts';

const keys = (id: string, side: 'inputs' | 'outputs') => getCalculator(id)![side].map((d) => d.key);

describe('vibration calculator contracts', () => {
  it('forced-response keeps m, k, c, f, excitation, F0, Y → r, X, phase, TR, Z, vrel, P, and P feeds steady-temperature', () => {
    expect(keys('forced-response', 'inputs')).toEqual(expect.arrayContaining(['m', 'k', 'c', 'f', 'excitation', 'F0', 'Y']));
    expect(keys('forced-response', 'outputs')).toEqual(expect.arrayContaining(['r', 'X', 'phase', 'TR', 'Z', 'vrel', 'P']));
    const P = getCalculator('forced-response')!.outputs.find((o) => o.key === 'P')!;
    expect(P.feeds).toContainEqual({ page: 'steady-temperature', input: 'P', label: 'Check damper body temperature' });
  });
  it('log-decrement keeps x1, xn, n → delta, zeta, zetaSmall', () => {
    expect(keys('log-decrement', 'inputs')).toEqual(expect.arrayContaining(['x1', 'xn', 'n']));
    expect(keys('log-decrement', 'outputs')).toEqual(expect.arrayContaining(['delta', 'zeta', 'zetaSmall']));
  });
  it('tmd-tuning keeps mu, m1, k1, excitation → fopt, zeta, md, kd, cd, peak', () => {
    expect(keys('tmd-tuning', 'inputs')).toEqual(expect.arrayContaining(['mu', 'm1', 'k1', 'excitation']));
    expect(keys('tmd-tuning', 'outputs')).toEqual(expect.arrayContaining(['fopt', 'zeta', 'md', 'kd', 'cd', 'peak']));
    const exc = getCalculator('tmd-tuning')!.inputs.find((i) => i.key === 'excitation')!;
    expect(exc.kind === 'choice' && exc.options.map((o) => o.value)).toEqual(['force', 'base', 'white-force', 'white-base']);
  });
  it('the CLI must be given the design quantities (no silent defaults)', () => {
    expect(() => evaluate(getCalculator('forced-response')!, { k: 1, c: 1, f: 1 }, { fillDefaults: false })).toThrow(/'m'/);
    expect(() => evaluate(getCalculator('forced-response')!, { m: 1, k: 1, c: 1, f: 1, excitation: 'base' }, { fillDefaults: false })).toThrow(/'Y'/);
    expect(() => evaluate(getCalculator('tmd-tuning')!, { mu: 0.02, m1: 1000 }, { fillDefaults: false })).toThrow(/'k1'/);
  });
  it('ring-down names the line of a malformed row and explains a record without peaks', () => {
    const calc = getCalculator('ring-down')!;
    expect(() => evaluate(calc, { record: 't;x\n0;1\n0,01;0,9\n0,02;x\n' })).toThrow(InputRangeError);
    expect(() => evaluate(calc, { record: 't;x\n0;1\n0,01;0,9\n0,02;x\n' })).toThrow(/line 4/);
    expect(() => evaluate(calc, { record: 't,x\n0,1\n1,0.5\n2,0.25\n3,0.125\n4,0.0625\n5,0.03\n6,0.015\n7,0.007\n8,0.003\n' })).toThrow(InputRangeError);
  });
  it('ring-down reads a millisecond time column', () => {
    const calc = getCalculator('ring-down')!;
    const lines = ['t_ms,x'];
    for (let i = 0; i < 600; i++) { const t = i * 5e-3; lines.push(`${(t * 1000).toFixed(3)},${(Math.exp(-0.05 * 20 * t) * Math.cos(20 * Math.sqrt(1 - 0.0025) * t)).toFixed(8)}`); }
    const r = evaluate(calc, { record: lines.join('\n'), timeUnit: 'ms' });
    expect(Math.abs((r.outputs.fn as number) - 20 / (2 * Math.PI))).toBeLessThan(1e-3);
    expect(Math.abs((r.outputs.zeta as number) / 0.05 - 1)).toBeLessThan(2e-3);
  });
});
