/**
 * The warm-up calculator's power-profile mode: the default (steady) keeps the published
 * behaviour and CLI keys; a profile equal to an on/off duty gives the on/off answers; a bad
 * profile is refused at its field naming the line. References: the on/off closed form
 * (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., 2007, §5.3, from memory;
 * closed form) through the steady mode of the same calculator.
 */
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../../src/calculators/evaluate.ts';
import { getCalculator } from '../../../src/calculators/registry.ts';
import { InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const warm = getCalculator('warm-up')!;
const BODY = { Cth: 1395, UA: 0.745664, Tamb: 298.15, Tlimit: 373.15, t: 5000 };

describe('warm-up with a power profile', () => {
  it('keeps its keys: power is a new choice defaulting to steady; P, duty and period apply to steady only', () => {
    expect(warm.inputs.find((d) => d.key === 'power')).toMatchObject({ kind: 'choice', default: 'steady' });
    expect(warm.inputs.find((d) => d.key === 'profile')).toMatchObject({ kind: 'text', fromUrl: true });
    for (const k of ['P', 'Cth', 'UA', 'Tamb', 'Tlimit', 't', 'duty', 'period', 'Ttouch']) expect(warm.inputs.map((d) => d.key)).toContain(k);
    for (const k of ['tau', 'Tss', 'tLimit', 'reached', 'T', 'Tpeak', 'CthTotal', 'tCool', 'Bi']) expect(warm.outputs.map((d) => d.key)).toContain(k);
    // the CLI still needs P in steady mode, and not in profile mode
    expect(() => evaluate(warm, { Cth: 1395, UA: 0.75 }, { fillDefaults: false })).toThrow(/'P'/);
    expect(evaluate(warm, { power: 'profile', profile: '0,120;600,0;1200', Cth: 1395, UA: 0.75 }, { fillDefaults: false }).outputs.Pmean).toBe(60);
  });

  it('gives the on/off answers for the same duty written as a profile (both loss models)', () => {
    for (const loss of ['constant', 'body'] as const) {
      const onOff = evaluate(warm, { ...BODY, loss, P: 150, duty: 0.4, period: 900 });
      const prof = evaluate(warm, { ...BODY, loss, power: 'profile', profile: '0,150\n360,0\n900', after: 'repeat' });
      for (const k of ['tau', 'Tss', 'tLimit', 'T', 'Tpeak', 'tCool', 'TssBody', 'tLimitBody']) {
        const e = onOff.outputs[k];
        if (typeof e !== 'number') { expect(prof.outputs[k], `${loss} ${k}`).toBe(e); continue; }
        // constant UA: the same exact solution (rounding); body model: the same RK4 grid and power function
        expectClose({ label: `${loss}: ${k}`, computed: prof.outputs[k] as number, expected: e, tol: k.endsWith('Body') ? 1e-9 : 1e-11, why: 'same solution, other arithmetic' });
      }
    }
  });

  it('refuses a malformed profile at the profile field, naming the line', () => {
    let err: unknown;
    try { evaluate(warm, { ...BODY, power: 'profile', profile: '0,120\n600,zero\n1200' }); } catch (e) { err = e; }
    expect(err).toBeInstanceOf(InputRangeError);
    expect((err as InputRangeError).input).toBe('profile');
    expect((err as Error).message).toMatch(/line 2/);
    expect(() => evaluate(warm, { ...BODY, power: 'profile', profile: '0,1;5'.padEnd(6001, ' ') })).toThrow(/longer than 6000/);
  });

  it('runs a long, finely divided profile at typing speed: the body-model cross-check is dropped with a warning', () => {
    const fine = `${Array.from({ length: 100 }, (_, i) => `${i * 0.2},${(i % 7) * 30}`).join(';')};20`;
    const r = evaluate(warm, { ...BODY, loss: 'body', power: 'profile', profile: fine });
    expect(typeof r.outputs.Tpeak).toBe('number');
    expect(r.warnings.join(' ')).toMatch(/Body model not run/);
    expect(r.outputs.tLimitBody).toBeUndefined();
  });
});
