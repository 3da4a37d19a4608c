/**
 * A damper in series with a spring (Maxwell model). Sources:
 * - Closed form K′ = k_s(ωτ)²/(1+(ωτ)²), K″ = k_s·ωτ/(1+(ωτ)²), τ = c/k_s, c_eq = K″/ω
 *   (Christopoulos & Filiatrault, Principles of Passive Supplemental Damping and Seismic Isolation,
 *   2006, chapter on fluid viscous dampers, from memory; Lakes, Viscoelastic Materials, 2009, ch. 2,
 *   from memory). Check value worked by hand: k_s = 10 MN/m, c = 1 MN·s/m, 1 Hz → ωτ = 0.6283,
 *   K′ = 2.830 MN/m, K″ = 4.505 MN/m, c_eq = 0.717 MN·s/m (provenance: closed form).
 * - Rigid limit k_s → ∞: the energy-per-cycle closed forms of Chopra, Dynamics of Structures, 5th ed.,
 *   eq. 3.8.1 (published) and §3.10 (from memory), as harmonicDuty computes them.
 * - Time simulation with k_s and a linear damper: the settled energy per cycle equals π·K″·X² of the
 *   closed form (provenance: closed form), to 1e-6 relative (integrator at rtol 1e-10, transient
 *   decayed to below 1e-9).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { harmonicDuty, maxwellStiffness, seriesHarmonic, type DamperLaw } from '../../../src/core/dampers/index.ts';
import { simulateSdof } from '../../../src/core/simulation/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('Maxwell storage and loss stiffness', () => {
  it('k_s = 10 MN/m, c = 1 MN·s/m, 1 Hz: K′ = 2.830, K″ = 4.505 MN/m, c_eq = 0.717 MN·s/m (closed form, by hand)', () => {
    const m = maxwellStiffness(1e7, 1e6, 2 * Math.PI);
    expectClose({ label: 'K′', computed: m.Kstorage, expected: 2.830e6, tol: 2e-4, why: '4 digits' });
    expectClose({ label: 'K″', computed: m.Kloss, expected: 4.505e6, tol: 2e-4, why: '4 digits' });
    expectClose({ label: 'c_eq', computed: m.ceq, expected: 0.717e6, tol: 7e-4, why: '3 digits as quoted' });
    expectClose({ label: 'stroke share', computed: m.strokeShare, expected: 1 / Math.sqrt(1 + (0.2 * Math.PI) ** 2), tol: 1e-14, why: 'same closed form' });
  });

  it('refuses a zero series stiffness, naming ks', () => expect(() => maxwellStiffness(0, 1, 1)).toThrow(/'ks'/));

  it('linear law: seriesHarmonic equals the closed form exactly and E = π·K″·X²', () => {
    fc.assert(fc.property(fc.double({ min: 1e2, max: 1e9, noNaN: true }), fc.double({ min: 1, max: 1e7, noNaN: true }), fc.double({ min: 0.05, max: 200, noNaN: true }), (ks, c, f) => {
      const w = 2 * Math.PI * f;
      const m = maxwellStiffness(ks, c, w);
      const s = seriesHarmonic({ kind: 'linear', c }, ks, 0.01, w);
      return Math.abs(s.Kloss / m.Kloss - 1) < 1e-9 && Math.abs(s.Kstorage / m.Kstorage - 1) < 1e-8 && Math.abs(s.E / (Math.PI * m.Kloss * 1e-4) - 1) < 1e-9;
    }), { seed: 1, numRuns: 200 });
  });
});

describe('rigid limit k_s → ∞', () => {
  const laws: DamperLaw[] = [
    { kind: 'linear', c: 1500 },
    { kind: 'power', C: 800, alpha: 0.5 },
    { kind: 'coulomb', Ff: 200 },
    { kind: 'bilinear', rebound: { c1: 2000, c2: 600 }, compression: { c1: 800, c2: 240 }, vknee: 0.1 },
    { kind: 'hysteretic', eta: 0.1, k: 16000 },
  ];
  it.each(laws.map((l) => [l.kind, l] as const))('%s: energy per cycle with k_s = 10⁶·(force scale/X) is the rigid one to 1e-5', (_k, law) => {
    fc.assert(fc.property(fc.double({ min: 1e-3, max: 0.1, noNaN: true }), fc.double({ min: 0.2, max: 20, noNaN: true }), (X, f) => {
      const w = 2 * Math.PI * f;
      const rigid = harmonicDuty(law, X, w);
      const ks = (1e6 * rigid.Fmax) / X;
      const s = seriesHarmonic(law, ks, X, w);
      return Math.abs(s.E / rigid.E - 1) < 1e-5 && Math.abs(s.ceq / rigid.ceq - 1) < 1e-5;
    }), { seed: 1, numRuns: 40 });
  });

  it('a friction damper whose slip force exceeds k_s·X never slips: nothing dissipated, K′ = k_s', () => {
    const s = seriesHarmonic({ kind: 'coulomb', Ff: 1000 }, 1e4, 0.01, 10);
    expect(s.stuck).toBe(true);
    expect(s.E).toBe(0);
    expect(s.Kstorage).toBe(1e4);
  });
});

describe('time simulation with a series spring', () => {
  // 1 kg on 100 N/m, c = 4 N·s/m behind k_s = 400 N/m, F₀ = 1 N at ω = 10 rad/s
  const model = (ks: number | undefined, law: DamperLaw = { kind: 'linear', c: 4 }) => ({ m: 1, k: 100, law, excitation: { kind: 'force' as const, F0: 1, omega: 10 }, x0: 0, v0: 0, ks });

  it('linear: settled energy per cycle equals π·K″·X² and the amplitude F₀/|k + K* − mω²| (closed form)', () => {
    const r = simulateSdof(model(400), { duration: 40, rtol: 1e-10 });
    const m = maxwellStiffness(400, 4, 10);
    const X = 1 / Math.hypot(100 + m.Kstorage - 100, m.Kloss);
    expectClose({ label: 'amplitude', computed: r.xLastPeriod, expected: X, tol: 1e-6, why: 'transient decayed' });
    const ePerCycle = r.powerLastPeriod * (2 * Math.PI / 10);
    expectClose({ label: 'E per cycle', computed: ePerCycle, expected: Math.PI * m.Kloss * X * X, tol: 1e-6, why: 'one settled period' });
    expect(r.closure).toBeLessThan(1e-7);
  });

  it('the energy audit closes (spring energy counted) for the power, bilinear and hysteretic laws', () => {
    for (const law of [{ kind: 'power', C: 6, alpha: 0.5 }, { kind: 'power', C: 6, alpha: 1.6 }, { kind: 'bilinear', rebound: { c1: 8, c2: 2 }, compression: { c1: 4, c2: 1 }, vknee: 0.05 }, { kind: 'hysteretic', eta: 0.2, k: 100 }] as DamperLaw[]) {
      const r = simulateSdof(model(400, law), { duration: 10 });
      expect(r.closure, law.kind).toBeLessThan(1e-6);
    }
  });

  it('k_s → ∞ recovers the rigid run: the difference falls as 1/k_s (first order in τ = c/k_s)', () => {
    const rigid = simulateSdof(model(undefined), { duration: 2 });
    const dev = (ks: number) => Math.abs(simulateSdof(model(ks), { duration: 2 }).xEnd - rigid.xEnd) / rigid.xMax;
    const d4 = dev(1e4);
    const d5 = dev(1e5);
    expect(d5).toBeLessThan(5e-4);
    expect(d4 / d5).toBeGreaterThan(8);
    expect(d4 / d5).toBeLessThan(12);
  });

  it('refuses a friction damper behind a spring, naming ks', () => {
    expect(() => simulateSdof(model(400, { kind: 'coulomb', Ff: 0.1 }), { duration: 1 })).toThrow(/'ks'/);
  });
});
