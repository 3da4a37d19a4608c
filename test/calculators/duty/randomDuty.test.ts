/** random-duty: long Gaussian duty of a damper (Rice's level crossings, Gaussian moments). */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { evaluate } from '../../../src/calculators/evaluate.ts';
import { randomDutyCalculator } from '../../../src/calculators/duty/random-duty.ts';
import { narrowBandStroke, spectralStroke } from '../../../src/core/duty/index.ts';
import { InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const CHECK = { spectrum: 'narrow', sx: 0.002, fn: 0.2, law: 'linear', c: 1e6, duration: 3600, n: 1 };

/**
 * σ_x = 2 mm at 0.2 Hz, linear 1 MN·s/m, 1 h. Source: S. O. Rice, Mathematical analysis of random
 * noise, Bell Syst. Tech. J. 23–24 (1944–45), §3.3 expected zeros per second; D. E. Newland, An
 * Introduction to Random Vibration, Spectral and Wavelet Analysis, 3rd ed., ch. 8 level crossings
 * (chapter from memory). Values worked from the closed forms (closed form).
 */
const TABLE = [
  { out: 'vRms', expected: 2.513e-3, tol: 2e-4, why: 'σ_v = 2πf_nσ_x, reference to 4 s.f.' },
  { out: 'P', expected: 6.32, tol: 1e-3, why: 'P = cσ_v², reference to 3 s.f.' },
  { out: 'cycles', expected: 720, tol: 1e-12, why: 'ν₀⁺·t = f_n·t exactly' },
  { out: 'travel', expected: 7.22, tol: 1e-3, why: '√(2/π)·σ_v·t, reference to 3 s.f.' },
  { out: 'E', expected: 6.3165468 * 3600, tol: 1e-6, why: 'P·t' },
] as const;

describe('random-duty', () => {
  it.each(TABLE)('$out of the narrow-band check (Rice; Newland 3rd ed. ch. 8, from memory)', (row) => {
    const r = evaluate(randomDutyCalculator, CHECK, { fillDefaults: false });
    expectClose({ label: row.out, computed: r.outputs[row.out] as number, expected: row.expected, tol: row.tol, why: row.why });
  });
  it('power law: P = C·E|v|^(1+α) with E|z|^(1+α) = 2^((1+α)/2)Γ(1+α/2)/√π (Abramowitz & Stegun, Handbook of Mathematical Functions, 1964, eq. 26.2 moments, from memory); α = 1 equals the linear law', () => {
    const r = evaluate(randomDutyCalculator, { ...CHECK, law: 'power', Fref: 1e6, vref: 1, alpha: 1 });
    expectClose({ label: 'α = 1', computed: r.outputs.P as number, expected: 6.3165468, tol: 1e-6, why: 'κ(1) = 1' });
    // α = 0: E|z| = √(2/π), a friction damper of force C
    const f = evaluate(randomDutyCalculator, { ...CHECK, law: 'coulomb', Ff: 1e4 });
    expectClose({ label: 'friction work = F_f × travel', computed: f.outputs.E as number, expected: 1e4 * (f.outputs.travel as number), tol: 1e-12, why: 'same expectation E|v|' });
  });
  it('a PSD table gives σ_x and σ_v by trapezoids; a narrow triangle at f_n counts f_n cycles per second', () => {
    const r = evaluate(randomDutyCalculator, { ...CHECK, spectrum: 'psd', psd: 'f [Hz], S [m²/Hz]\n0.199, 0\n0.2, 4e-3\n0.201, 0' });
    expectClose({ label: 'sxUsed', computed: r.outputs.sxUsed as number, expected: 0.002, tol: 1e-9, why: 'area of the triangle' });
    expectClose({ label: 'cycles', computed: r.outputs.cycles as number, expected: 720, tol: 1e-5, why: 'ω² over a ±0.5 % band' });
    expect(() => evaluate(randomDutyCalculator, { ...CHECK, spectrum: 'psd', psd: '0.2, 1e-6\n0.1, 1e-6' })).toThrow(InputRangeError);
    expect(() => evaluate(randomDutyCalculator, { ...CHECK, spectrum: 'psd', psd: '0.2, 0\n0.3, 0' })).toThrow(/variance/);
  });
  it('bilinear law: equal slopes give cσ_v² (closed form); zero slopes below a knee far above σ_v give 0, and a denormal stroke does not stall the quadrature', () => {
    const r = evaluate(randomDutyCalculator, { ...CHECK, law: 'bilinear', c1: 1e6, c2: 1e6, c1c: 1e6, c2c: 1e6, vknee: 0.001 });
    expectClose({ label: 'P', computed: r.outputs.P as number, expected: 1e6 * (2 * Math.PI * 0.2 * 0.002) ** 2, tol: 1e-9, why: 'quadrature to 1e-12 of the largest |F·v|' });
    const z = evaluate(randomDutyCalculator, { ...CHECK, law: 'bilinear', c1: 0, c2: 1e6, c1c: 0, c2c: 1e6, vknee: 1 });
    expect(z.outputs.P).toBe(0);
    const tiny = evaluate(randomDutyCalculator, { ...CHECK, sx: 5e-324, law: 'bilinear', c1: 0, c2: 1200, c1c: 1200, c2c: 1e-90, vknee: 5e-324 });
    expect(Number.isFinite(tiny.outputs.P)).toBe(true);
  });
  it('the hysteretic law is not offered (it has no meaning for random motion)', () => {
    const law = randomDutyCalculator.inputs.find((i) => i.key === 'law');
    expect(law && 'options' in law ? law.options.map((o) => o.value) : []).not.toContain('hysteretic');
  });
  it('a PSD of one narrow band agrees with the narrow-band formulas for any σ_x and f_n', () => {
    fc.assert(fc.property(fc.double({ min: 1e-5, max: 0.1, noNaN: true }), fc.double({ min: 0.05, max: 50, noNaN: true }), (sx, fn) => {
      const w = fn * 1e-4;
      const s = spectralStroke([fn - w, fn, fn + w], [0, (sx * sx) / w, 0]);
      const n = narrowBandStroke(sx, fn);
      return Math.abs(s.sigmaX / n.sigmaX - 1) < 1e-9 && Math.abs(s.sigmaV / n.sigmaV - 1) < 1e-7 && Math.abs(s.nu0 / n.nu0 - 1) < 1e-7;
    }), { seed: 1, numRuns: 200 });
  });
  it('hands its mean power to the thermal pages and publishes it to a study', () => {
    const P = randomDutyCalculator.outputs.find((o) => o.key === 'P');
    expect(P?.feeds?.map((f) => f.page)).toEqual(expect.arrayContaining(['steady-temperature', 'warm-up', 'damping-fade']));
    expect(randomDutyCalculator.study?.publishes).toEqual({ P: 'meanPower' });
  });
});
