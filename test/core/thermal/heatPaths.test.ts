/**
 * Mount conduction (fins) and solar gain in the body heat balance: the fin check against the
 * closed form of the textbook table, and the steady balance closing over every path.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { bodyCooling, mountConductance, solarGain, steadyTemperature, type Body } from '../../../src/core/thermal/index.ts';
import { InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const TW210: Body = { D: 0.05, L: 0.35, orientation: 'horizontal', ends: false, eps: 0.9, Tamb: 298.15, V: 0 };

describe('mountConductance: round stubs as fins with an insulated tip', () => {
  it('steel stub D = 20 mm, L = 0.1 m, k = 50, h = 10 → 0.0556 W/K (Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, 6th ed., Table 3.4 case B; closed form)', () => {
    const r = mountConductance({ D: 0.02, L: 0.1, k: 50, h: 10 }, 1);
    // by hand: P = 0.0628319 m, A_c = 3.14159e-4 m², m = √40 = 6.32456 1/m, √(hPkA_c) = 0.0993459 W/K, tanh(0.632456) = 0.559739
    expectClose({ label: 'G', computed: r.G, expected: 0.0556079, tol: 2e-6, why: 'hand evaluation to 6 s.f.' });
    expectClose({ label: 'm', computed: r.m, expected: Math.sqrt(40), tol: 1e-12, why: 'closed form' });
  });
  it('n stubs conduct n times one; a long stub tends to the infinite fin √(hPkA_c) (Table 3.4 case D, closed form)', () => {
    const one = mountConductance({ D: 0.02, L: 0.1, k: 50, h: 10 }, 1).G;
    expectClose({ label: '4 stubs', computed: mountConductance({ D: 0.02, L: 0.1, k: 50, h: 10 }, 4).G, expected: 4 * one, tol: 1e-14, why: 'parallel paths' });
    expectClose({ label: 'long fin', computed: mountConductance({ D: 0.02, L: 5, k: 50, h: 10 }, 1).G, expected: 0.0993459, tol: 1e-5, why: 'tanh(31.6) = 1 to 1e-27; √(hPkA_c) by hand to 6 s.f.' });
  });
  it('conducts no more than a fully efficient stub h·πD·L, and efficiency lies in (0, 1] (property)', () => {
    fc.assert(fc.property(
      fc.double({ min: 0.002, max: 0.2, noNaN: true }), fc.double({ min: 0.005, max: 2, noNaN: true }),
      fc.double({ min: 0.1, max: 500, noNaN: true }), fc.double({ min: 0, max: 1000, noNaN: true }),
      (D, L, k, h) => {
        const r = mountConductance({ D, L, k, h }, 1);
        return r.G <= h * Math.PI * D * L * (1 + 1e-12) && r.efficiency > 0 && r.efficiency <= 1 + 1e-15;
      }), { seed: 1, numRuns: 300 });
  });
  it('refuses a stub of zero diameter with a typed error naming the input', () => {
    expect(() => mountConductance({ D: 0, L: 0.1, k: 50, h: 10 }, 1)).toThrow(/dMount/);
    expect(() => mountConductance({ D: 0.02, L: 0.1, k: 50, h: 10 }, -1)).toThrow(InputRangeError);
  });
});

describe('solarGain: α·G·A_p', () => {
  it('a 0.3 × 2 m body, α = 0.6, 1000 W/m² absorbs 360 W (closed form)', () => {
    expectClose({ label: 'Qsun', computed: solarGain(0.6, 1000, 0.3 * 2), expected: 360, tol: 1e-15, why: 'exact product' });
  });
});

describe('the steady heat balance closes over every path', () => {
  it('heat in (P) = convection + radiation + mounts − sun to 1e-9 of the flows (property)', () => {
    fc.assert(fc.property(
      fc.double({ min: 0, max: 400, noNaN: true }), fc.double({ min: 0, max: 2, noNaN: true }), fc.double({ min: 0, max: 150, noNaN: true }),
      fc.double({ min: 0.02, max: 0.3, noNaN: true }), fc.double({ min: 0.1, max: 2, noNaN: true }), fc.double({ min: 0, max: 20, noNaN: true }),
      (P, Gmount, Qsun, D, L, V) => {
        const body: Body = { ...TW210, D, L, V, Gmount, Qsun };
        let r;
        try { r = steadyTemperature(body, P); } catch { return true; } // beyond 700 K: refused, not wrong
        const sum = r.Qconv + r.Qrad + r.Qmount - r.Qsun;
        // floor 1 W: the root is located to 1e-9 K, so for flows of milliwatts the balance holds to ~1e-9 W absolute, not relative
        const scale = Math.max(P, Math.abs(r.Qconv), Math.abs(r.Qrad), r.Qmount, r.Qsun, 1);
        return Math.abs(P - sum) <= 1e-9 * scale && Math.abs(r.Qmount - Gmount * (r.Ts - body.Tamb)) <= 1e-12 * Math.max(1, r.Qmount);
      }), { seed: 1, numRuns: 200 });
  });
  it('without mounts and sun, Q and UA are exactly the convection-and-radiation values (existing results unchanged)', () => {
    const a = bodyCooling(TW210, 353.15);
    const b = bodyCooling({ ...TW210, Gmount: 0, Qsun: 0 }, 353.15);
    expect(b.Q).toBe(a.Qconv + a.Qrad);
    expect(b.UA).toBe(a.UA);
    expect(a.Qmount).toBe(0);
  });
  it('sun on a body with no power lifts it above the air: 10 W of sun ≡ 10 W of damper power (closed form of the balance)', () => {
    const sun = steadyTemperature({ ...TW210, Qsun: 10 }, 0).Ts;
    const power = steadyTemperature(TW210, 10).Ts;
    expectClose({ label: 'Ts', computed: sun, expected: power, tol: 1e-11, why: 'the same root of the same equation; Brent to 1e-9 K' });
  });
});
