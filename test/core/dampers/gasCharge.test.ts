/**
 * Gas charge of a monotube damper against hand-worked closed forms (ideal gas with the oil
 * expansion shrinking the gas space; Boyle and adiabatic rod strokes) and the check.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { gasCharge, gasStoredEnergy } from '../../../src/core/dampers/index.ts';
import { ComputationError, InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const TW210 = { p0: 2.5e6, T0: 293.15, Vg0: 50e-6, Voil: 300e-6, beta: 0.7e-3, dRod: 0.014, dPiston: 0.046, x: 0, n: 1 };

// expected, source, provenance
const CASES: readonly (readonly [string, Partial<typeof TW210> & { T: number }, Record<string, number>, string, string])[] = [
  ['80 °C: oil expansion 12.6 cm³ leaves 37.4 cm³ of gas', { T: 353.15 }, { p: 4026314.757, Fext: 604.2052, dVoil: 12.6e-6, Vg: 37.4e-6, kg: 2551.103, FcMax: 6675.745 },
    'p = p0·(T/T0)·Vg0/(Vg0 − ΔV_oil), Çengel & Boles, Thermodynamics, 8th ed., §3-8 ideal gas (from memory); worked by hand, 4.03 MPa and 604 N as the issue states', 'closed form'],
  ['−20 °C: the oil shrinks 8.4 cm³', { T: 253.15 }, { p: 1848354.202, Fext: 268.9343, dVoil: -8.4e-6, kg: 750.0052 },
    'same closed form; 1.85 MPa and 269 N as the issue states', 'closed form'],
  ['isothermal stroke of 50 mm at the charge temperature (Boyle)', { T: 293.15, x: 0.05 }, { p: 2954866.332, Fext: 439.2686 },
    'p·V = const (n = 1), Çengel & Boles §4-1 polytropic process (from memory)', 'closed form'],
  ['adiabatic stroke of 50 mm (n = 1.4)', { T: 293.15, x: 0.05, n: 1.4 }, { p: 3159198.918, kg: 2477.563 },
    'p·V^1.4 = const, k = n·p·A²/V, Çengel & Boles §4-1 (from memory)', 'closed form'],
];

describe('gasCharge', () => {
  it.each(CASES)('%s', (_name, inp, expected, why) => {
    const r = gasCharge({ ...TW210, ...inp });
    for (const [k, v] of Object.entries(expected)) {
      expectClose({ label: k, computed: r[k as keyof typeof r], expected: v, tol: 1e-6, why: `${why}; evaluated independently in float64 to 7 s.f.` });
    }
  });

  it('FcMax is the extension force plus p over the annulus (the rebound side at zero absolute pressure)', () => {
    const r = gasCharge({ ...TW210, T: 353.15 });
    const annulus = (Math.PI / 4) * (0.046 ** 2 - 0.014 ** 2);
    expectClose({ label: 'FcMax', computed: r.FcMax, expected: r.Fext + r.p * annulus, tol: 1e-12, why: 'the same force balance written two ways (closed form)' });
  });

  it('refuses a full gas space (hydraulic lock) and a rod as wide as the piston', () => {
    expect(() => gasCharge({ ...TW210, T: 293.15 + 250 })).toThrow(ComputationError); // 300·0.7e-3·250 = 52.5 cm³ > 50 cm³
    expect(() => gasCharge({ ...TW210, T: 293.15, dRod: 0.046 })).toThrow(InputRangeError);
    expect(() => gasCharge({ ...TW210, T: 293.15, p0: 1e5 })).toThrow(/p0/);
  });

  it('pressure rises with temperature and with rod insertion (property)', () => {
    fc.assert(fc.property(fc.double({ min: 230, max: 400, noNaN: true }), fc.double({ min: 1, max: 30, noNaN: true }), fc.double({ min: 0, max: 0.08, noNaN: true }), (T, dT, x) => {
      const a = gasCharge({ ...TW210, T, x });
      const b = gasCharge({ ...TW210, T: T + dT, x });
      const c = gasCharge({ ...TW210, T, x: x + 0.01 });
      return b.p > a.p && c.p > a.p && a.Fext < a.FcMax;
    }), { seed: 1, numRuns: 200 });
  });
});

describe('gasStoredEnergy', () => {
  it('50 cm³ at 2.5 MPa abs expanding isentropically to 1 atm gives 187.45 J', () => {
    // E = pV/(γ−1)·[1 − (p_atm/p)^((γ−1)/γ)], γ = 1.4; Çengel & Boles §7-9 isentropic ideal gas (from memory); closed form evaluated by hand in float64
    expectClose({ label: 'E', computed: gasStoredEnergy(2.5e6, 50e-6), expected: 187.4533941, tol: 1e-8, why: 'closed form, 10 s.f.' });
  });
  it('is zero at the atmosphere and below the ideal-gas bound p·V/(γ−1) (property)', () => {
    expect(gasStoredEnergy(101325, 1e-4)).toBe(0);
    fc.assert(fc.property(fc.double({ min: 2e5, max: 5e7, noNaN: true }), fc.double({ min: 1e-6, max: 1e-2, noNaN: true }), (p, V) => {
      const E = gasStoredEnergy(p, V);
      return E > 0 && E < (p * V) / 0.4;
    }), { seed: 1, numRuns: 200 });
  });
});
