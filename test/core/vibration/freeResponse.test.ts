import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { InputRangeError } from '../../../src/core/errors.ts';
import { energyAudit, energyHistory, freeResponse, responseWindow } from '../../../src/core/vibration/index.ts';
import { FREE_RESPONSE_ROWS } from './freeResponse.fixtures.ts';

describe('freeResponse', () => {
  it('rejects a non-positive mass naming m', () => {
    expect(() => freeResponse({ m: 0, k: 1, c: 1, x0: 0, v0: 0 })).toThrow(InputRangeError);
    expect(() => freeResponse({ m: 0, k: 1, c: 1, x0: 0, v0: 0 })).toThrow(/'m'/);
  });

  // Source: Rao, Mechanical Vibrations 6th ed. §2.6 closed forms vs scipy solve_ivp (reference library scipy, table SDOF-D).
  // Tolerance 1e-9 m absolute: the table carries 7 significant figures of values ~1e-3 m.
  for (const row of FREE_RESPONSE_ROWS) {
    it(`matches the scipy reference at c = ${row.c} N·s/m, t = ${row.t} s`, () => {
      const { x } = freeResponse({ m: 1, k: 100, c: row.c, x0: 0.01, v0: 0 })(row.t);
      expect(Math.abs(x - row.x)).toBeLessThan(1e-9);
    });
  }

  it('is continuous across critical damping (cosh/sinh form has no cancellation)', () => {
    // common practice, no source: the response is a continuous function of c
    const at = (c: number) => freeResponse({ m: 1, k: 100, c, x0: 0.01, v0: 0.3 })(0.37).x;
    const crit = at(20);
    expect(Math.abs(at(20 * (1 + 1e-7)) - crit)).toBeLessThan(1e-9);
    expect(Math.abs(at(20 * (1 - 1e-7)) - crit)).toBeLessThan(1e-9);
  });

  it('velocity is the derivative of displacement (central difference)', () => {
    // closed form, no source needed beyond calculus; tolerance set by the O(h²) difference
    fc.assert(fc.property(
      fc.double({ min: 0.01, max: 100, noNaN: true }), fc.double({ min: 0.01, max: 4, noNaN: true }), fc.double({ min: 0, max: 2, noNaN: true }),
      (m, zeta, t) => {
        const k = 1000;
        const c = 2 * zeta * Math.sqrt(k * m);
        const s = freeResponse({ m, k, c, x0: 0.01, v0: 0.05 });
        const h = 1e-6;
        const dx = (s(t + h).x - s(t - h).x) / (2 * h);
        return Math.abs(dx - s(t).v) <= 1e-5 * (1 + Math.abs(s(t).v));
      }), { seed: 1, numRuns: 100 });
  });
});

describe('energyHistory', () => {
  it('closes the energy balance to 1e-8 for any passive oscillator', () => {
    fc.assert(fc.property(
      fc.double({ min: 0.01, max: 1e4, noNaN: true }), fc.double({ min: 1, max: 1e7, noNaN: true }), fc.double({ min: 1e-3, max: 5, noNaN: true }),
      fc.double({ min: -0.1, max: 0.1, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true }),
      (m, k, zeta, x0, v0) => {
        fc.pre(Math.abs(x0) + Math.abs(v0) > 1e-6);
        const c = 2 * zeta * Math.sqrt(k * m);
        const wn = Math.sqrt(k / m);
        const h = energyHistory({ m, k, c, x0, v0 }, responseWindow(wn, zeta), 61);
        return h.closure < 1e-8;
      }), { seed: 1, numRuns: 60 });
  });

  it('closes to 1e-10 for heavily overdamped releases too (ζ = 50, 500: a transient hundreds of times faster than the window)', () => {
    for (const zeta of [50, 500]) {
      const m = 1, k = 100;
      const h = energyHistory({ m, k, c: 2 * zeta * Math.sqrt(k * m), x0: 0.01, v0: 0.3 }, responseWindow(Math.sqrt(k / m), zeta), 401);
      expect(h.closure, `ζ = ${zeta}`).toBeLessThan(1e-10);
    }
  });

  it('closes to 1e-12 for a stiff, very heavily overdamped release (ζ ≈ 1.6e4), where equal panels of the fast rate gave 0.88', () => {
    // m = 1000 kg, k = 1 N/m, c = 1e6 N·s/m: the fast rate 2s₁ is 2e3 /s and the window ~4.6e3 s, so one
    // step spans 2e4 e-folds of the fast part; the graded panels (stepDissipation) follow it down
    const h = energyHistory({ m: 1000, k: 1, c: 1e6, x0: -10, v0: -100 }, responseWindow(Math.sqrt(1 / 1000), 1e6 / (2 * Math.sqrt(1000))), 401);
    expect(h.closure).toBeLessThan(1e-12);
  });

  it('dissipated energy never decreases and never exceeds the initial energy', () => {
    const h = energyHistory({ m: 1, k: 100, c: 4, x0: 0.01, v0: 0 }, 3, 301);
    for (let i = 1; i < h.t.length; i++) expect(h.dissipated[i]!).toBeGreaterThanOrEqual(h.dissipated[i - 1]!);
    expect(h.dissipated.at(-1)!).toBeLessThanOrEqual(h.initial * (1 + 1e-12));
  });

  it('energyAudit: the same initial energy and closure as energyHistory, without the samples', () => {
    // initial = ½ k x₀² = ½·100·0.01² = 0.005 J (closed form); the closure is the same walk's
    for (const c of [4, 20, 200]) {
      const p = { m: 1, k: 100, c, x0: 0.01, v0: 0 };
      const h = energyHistory(p, 3, 301);
      const a = energyAudit(p, 3, 301);
      expect(a.initial).toBe(0.005);
      expect(a.initial).toBe(h.initial);
      expect(a.closure).toBe(h.closure);
    }
    expect(() => energyAudit({ m: 1, k: 1, c: 1, x0: 1, v0: 0 }, 0)).toThrow(/duration/);
  });
});
