import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { bodyCooling, powerFor, steadyTemperature, type Body } from './bodyFixtures.ts';
import { bodyHeatLoss } from '../../../src/core/thermal/index.ts';
import { ComputationError, InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const TW: Body = { D: 0.05, L: 0.35, orientation: 'horizontal', ends: false, eps: 0.9, Tamb: 298.15, V: 0 };

describe('bodyCooling: Ø50 × 350 mm body at 80 °C in 25 °C air, ε = 0.9', () => {
  // Independent evaluation (numpy) of Incropera 6th ed. eqs. 9.34, 7.54, 1.9 with Table A.4 at 325.65 K;
  // provenance: reference library numpy (version not recorded).
  const r = bodyCooling(TW, 353.15);
  it('matches Ra, h_N, h_r and Q in still air', () => {
    expectClose({ label: 'Ra_D', computed: r.Ra, expected: 4.2640e5, tol: 5e-4, why: 'α interpolated vs derived from ν/Pr moves Ra by 0.03 %' });
    expectClose({ label: 'Nu_D', computed: (r.hNatural * 0.05) / 0.028198, expected: 11.4601, tol: 2e-4, why: 'Nu ∝ Ra^{1/6}: 0.03 % in Ra is 0.005 % in Nu' });
    expectClose({ label: 'h_N', computed: r.hNatural, expected: 6.4631, tol: 2e-4, why: '5 s.f.' });
    expectClose({ label: 'h_r', computed: r.hRad, expected: 7.0999, tol: 2e-5, why: '5 s.f.' });
    expectClose({ label: 'Q', computed: r.Q, expected: 41.01, tol: 2e-4, why: '4 s.f.' });
  });
  it('matches the forced-convection coefficients at 5, 10 and 20 m/s', () => {
    for (const [V, h, Q] of [[5, 35.67, 129.3], [10, 53.19, 182.3], [20, 81.20, 267.0]] as const) {
      const f = bodyCooling({ ...TW, V }, 353.15);
      expectClose({ label: `h_F(${V})`, computed: f.hForced, expected: h, tol: 2e-4, why: '4 s.f.' });
      expectClose({ label: `Q_F+rad(${V})`, computed: (f.hForced + f.hRad) * f.area * 55, expected: Q, tol: 5e-4, why: '4 s.f.; reference is forced + radiation without the mixed rule' });
      expect(f.hConv).toBeGreaterThan(f.hForced); // the mixed rule adds the free part
    }
  });
  it('warns that the vertical-plate method is outside its slenderness range for this body', () => {
    const v = bodyCooling({ ...TW, orientation: 'vertical' }, 353.15);
    expect(v.warnings.join(' ')).toMatch(/slender/);
    expect(r.warnings).toEqual([]);
  });
  it('sheds no heat at air temperature and absorbs heat below it', () => {
    expect(bodyCooling(TW, 298.15).Q).toBe(0);
    expect(bodyCooling(TW, 280).Q).toBeLessThan(0);
  });
  it('adds the two end faces to the area when asked', () => {
    const e = bodyCooling({ ...TW, ends: true }, 353.15);
    expectClose({ label: 'area', computed: e.area, expected: Math.PI * 0.05 * 0.35 + Math.PI * 0.05 ** 2 / 2, tol: 1e-14, why: 'closed form' });
  });
  it('refuses inputs outside the air table and bad geometry', () => {
    expect(() => bodyCooling(TW, 800)).toThrow(InputRangeError);
    expect(() => bodyCooling({ ...TW, D: 0 }, 350)).toThrow(/D/);
    expect(() => bodyCooling({ ...TW, V: -1 }, 350)).toThrow(/V/);
  });
});

describe('steady temperature and rating', () => {
  it('inverts the heat flow: 41.01 W gives 80 °C', () => {
    expectClose({ label: 'Ts', computed: steadyTemperature(TW, 41.01).Ts, expected: 353.15, tol: 1e-4, why: 'Q to 4 s.f.' });
  });
  it('says clearly when the body cannot shed the power below 700 K', () => {
    expect(() => steadyTemperature(TW, 5000)).toThrow(ComputationError);
  });
  const body = fc.record({
    D: fc.double({ min: 0.01, max: 0.2, noNaN: true }),
    L: fc.double({ min: 0.05, max: 1, noNaN: true }),
    orientation: fc.constantFrom('horizontal' as const, 'vertical' as const),
    ends: fc.boolean(),
    eps: fc.double({ min: 0, max: 1, noNaN: true }),
    Tamb: fc.double({ min: 250, max: 320, noNaN: true }),
    V: fc.double({ min: 0, max: 40, noNaN: true }),
  });
  const power = fc.double({ min: 1, max: 200, noNaN: true });
  const safe = (b: Body, P: number) => P < 0.9 * bodyCooling(b, 690).Q;
  it('steady temperature rises with power', () => {
    fc.assert(fc.property(body, power, (b, P) => !safe(b, P * 1.2) || steadyTemperature(b, P * 1.2).Ts > steadyTemperature(b, P).Ts), { seed: 1, numRuns: 60 });
  });
  it('steady temperature falls with air speed', () => {
    fc.assert(fc.property(body, power, (b, P) => !safe(b, P) || steadyTemperature({ ...b, V: b.V + 2 }, P).Ts < steadyTemperature(b, P).Ts), { seed: 1, numRuns: 60 });
  });
  it('steady temperature falls with area (longer or thicker body)', () => {
    fc.assert(fc.property(body, power, (b, P) => !safe(b, P) ||
      (steadyTemperature({ ...b, L: b.L * 1.3 }, P).Ts < steadyTemperature(b, P).Ts && steadyTemperature({ ...b, D: b.D * 1.3 }, P).Ts < steadyTemperature(b, P).Ts)), { seed: 1, numRuns: 60 });
  });
  it('bodyHeatLoss, the ODEs\' fast path, gives bodyCooling\'s Q bit for bit, mounts and sun included (property)', () => {
    const withPaths = fc.record({ Gmount: fc.double({ min: 0, max: 5, noNaN: true }), Qsun: fc.double({ min: 0, max: 50, noNaN: true }) });
    fc.assert(fc.property(body, withPaths, fc.double({ min: 200, max: 700, noNaN: true }), (b, paths, T) => {
      const full = { ...b, ...paths };
      return bodyHeatLoss(full)(T) === bodyCooling(full, T).Q && bodyHeatLoss(b)(T) === bodyCooling(b, T).Q;
    }), { seed: 4, numRuns: 300 });
    expect(() => bodyHeatLoss(TW)(199)).toThrow(InputRangeError);
    expect(() => bodyHeatLoss({ ...TW, D: 0 })).toThrow(InputRangeError);
  });
  it('the rating rises with the allowed temperature', () => {
    fc.assert(fc.property(body, fc.double({ min: 330, max: 600, noNaN: true }), (b, T) => powerFor(b, T + 5) > powerFor(b, T)), { seed: 1, numRuns: 80 });
  });
});
