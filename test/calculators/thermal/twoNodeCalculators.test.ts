/**
 * The two-node model, mount conduction and solar gain on steady-temperature, warm-up, damping-fade
 * and power-rating: the defaults keep every earlier result, the oil–body note has its threshold,
 * the path shares close, and the warm-up run carries an energy audit. References: closed forms
 * (T_oil = T_s + P/G_ob, Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., eq. 3.19,
 * from memory; fin with an adiabatic tip, Table 3.4 case B) and the calculators' own one-node results.
 */
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../../src/calculators/evaluate.ts';
import { getCalculator } from '../../../src/calculators/registry.ts';
import { OIL_BODY_NOTE_K } from '../../../src/core/thermal/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const steady = getCalculator('steady-temperature')!;
const warm = getCalculator('warm-up')!;
const fade = getCalculator('damping-fade')!;
const rating = getCalculator('power-rating')!;
const TW210 = { D: 0.05, L: 0.35, P: 40 };

describe('one node, no mounts, no sun stay the defaults', () => {
  it('steady-temperature: oil = body, no mount or sun rows, the shares of convection and radiation close to 1', () => {
    const r = evaluate(steady, TW210);
    expect(r.outputs.Toil).toBe(r.outputs.Ts);
    expect(r.outputs.Qmount).toBeUndefined();
    expect(r.outputs.Qsun).toBeUndefined();
    expectClose({ label: 'shares', computed: (r.outputs.shareConv as number) + (r.outputs.shareRad as number), expected: 1, tol: 1e-9, why: 'the steady balance closes to 1e-9' });
  });
  it('warm-up and damping-fade give no two-node outputs unless asked', () => {
    expect(evaluate(warm, { P: 50, Cth: 1395, UA: 0.75 }).outputs.ToilT).toBeUndefined();
    const f = evaluate(fade, { D: 0.05, L: 0.35, cRef: 980 });
    expect(f.outputs.ToilEq).toBe(f.outputs.Teq);
  });
});

describe('two nodes', () => {
  it(`warns when the oil runs more than ${OIL_BODY_NOTE_K} K above the body, not below that`, () => {
    const hot = evaluate(steady, { ...TW210, nodes: 'two', Gob: 4 }); // 40 W / 4 W/K = 10 K
    const cool = evaluate(steady, { ...TW210, nodes: 'two', Gob: 20 }); // 2 K
    expect(hot.warnings.join(' ')).toMatch(/oil runs 10\.0 K above the body/);
    expect(cool.warnings.join(' ')).not.toMatch(/oil runs/);
    expectClose({ label: 'Toil', computed: hot.outputs.Toil as number, expected: (hot.outputs.Ts as number) + 10, tol: 1e-14, why: 'T_s + P/G_ob' });
  });
  it('warm-up: the two-node run closes its energy audit (stored + shed = put in) to 1e-8, profile repeated', () => {
    const r = evaluate(warm, { power: 'profile', profile: '0, 120\n600, 0\n1200', Cth: 1395, UA: 0.745664, nodes: 'two', Gob: 8, Coil: 475 });
    expect(Math.abs(r.outputs.closure as number)).toBeLessThan(1e-8);
    expect(r.outputs.ToilPeak as number).toBeGreaterThan(r.outputs.Tpeak as number);
  });
  it('warm-up refuses an oil heat capacity not below the total, naming Coil', () => {
    expect(() => evaluate(warm, { P: 50, Cth: 400, UA: 0.75, nodes: 'two', Coil: 475 })).toThrow(/Coil/);
  });
  it('damping-fade: a lower G_ob makes the oil hotter and the damping lower at equilibrium', () => {
    const base = { D: 0.05, L: 0.35, cRef: 980, share: 0.5, X: 0.02, f: 1.5 };
    const one = evaluate(fade, base).outputs;
    const two = evaluate(fade, { ...base, nodes: 'two', Gob: 2, Coil: 475 }).outputs;
    expect(two.ToilEq as number).toBeGreaterThan(two.Teq as number);
    expect(two.cEq as number).toBeLessThan(one.cEq as number);
  });
  it('damping-fade: with no equilibrium the two-node oil reaches the limit sooner than the one-node body', () => {
    const base = { D: 0.05, L: 0.35, cRef: 980, share: 0, duty: 'random', P: 80.85, Cth: 1395 };
    const one = evaluate(fade, base).outputs.tLimit as number;
    const two = evaluate(fade, { ...base, nodes: 'two', Gob: 8, Coil: 475 }).outputs.tLimit as number;
    expect(two).toBeGreaterThan(0);
    expect(two).toBeLessThan(one);
  });
});

describe('mounts and sun', () => {
  it('steady-temperature: shares of P close: convection + radiation + mounts − sun = 1 (to 1e-9)', () => {
    const r = evaluate(steady, { ...TW210, mounts: 'stubs', sun: 'sun', alphaSun: 0.3, irradiance: 800 }).outputs;
    const sum = (r.shareConv as number) + (r.shareRad as number) + (r.shareMount as number) + (r.shareSun as number);
    expectClose({ label: 'sum of shares', computed: sum, expected: 1, tol: 1e-9, why: 'steady balance closes to 1e-9' });
    expectClose({ label: 'Gmount', computed: r.Gmount as number, expected: 2 * 0.0556079, tol: 1e-5, why: 'two default stubs, Table 3.4 case B by hand' });
    expect(r.Qsun as number).toBeCloseTo(0.3 * 800 * 0.05 * 0.35, 12);
  });
  it('power-rating: the sun lowers the rating by what it puts in; mounts raise it by G_m(T_max − T∞)', () => {
    const base = { D: 0.05, L: 0.35, Tmax: 373.15 };
    const p0 = evaluate(rating, base).outputs.Pmax as number;
    const sun = evaluate(rating, { ...base, sun: 'sun', alphaSun: 0.5, irradiance: 1000 }).outputs.Pmax as number;
    const mnt = evaluate(rating, { ...base, mounts: 'stubs', nMount: 1 }).outputs.Pmax as number;
    expectClose({ label: 'sun', computed: p0 - sun, expected: 0.5 * 1000 * 0.05 * 0.35, tol: 1e-12, why: 'α·G·D·L' });
    expectClose({ label: 'mount', computed: mnt - p0, expected: 0.0556079 * 75, tol: 1e-5, why: 'G_m·75 K' });
  });
});
