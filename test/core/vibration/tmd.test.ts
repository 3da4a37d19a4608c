import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { abs } from '../../../src/core/complex/index.ts';
import { adaptiveSimpson } from '../../../src/core/numeric/index.ts';
import { tmdPeak, tmdResponse, tmdTuning, type TmdSystem } from '../../../src/core/vibration/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const amp = (s: TmdSystem, b: number, load: 'force' | 'base') => abs(tmdResponse(s, b, load).x1);

/** Frequencies where curves for two absorber damping values cross: Den Hartog's fixed points. */
function fixedPoints(mu: number, f: number, load: 'force' | 'base'): { beta: number; height: number }[] {
  const g = (b: number) => amp({ mu, f, zeta: 0.02, zeta1: 0 }, b, load) - amp({ mu, f, zeta: 0.6, zeta1: 0 }, b, load);
  const out: { beta: number; height: number }[] = [];
  const N = 4000;
  for (let i = 0; i < N; i++) {
    let a = 0.5 + i / N;
    let b = 0.5 + (i + 1) / N;
    if (Math.sign(g(a)) === Math.sign(g(b))) continue;
    for (let k = 0; k < 80; k++) { const m = 0.5 * (a + b); if (Math.sign(g(m)) === Math.sign(g(a))) a = m; else b = m; }
    const beta = 0.5 * (a + b);
    out.push({ beta, height: amp({ mu, f, zeta: 0.3, zeta1: 0 }, beta, load) });
  }
  return out;
}

/** Primary response variance under unit white noise, ∝ ∫|X₁(β)|² dβ (common practice, no source: Parseval). */
const variance = (s: TmdSystem, load: 'force' | 'base') => adaptiveSimpson((b) => amp(s, b, load) ** 2, 1e-6, 40, 1e-10);

describe('tmdTuning closed forms', () => {
  it('Den Hartog: f = 1/(1+μ) and both damping forms, μ = 0.1 (Den Hartog, Mechanical Vibrations 4th ed. 1956, ch. 3, damped vibration absorber; from memory)', () => {
    const t = tmdTuning(0.1, 'force');
    expectClose({ label: 'f', computed: t.f, expected: 0.909091, tol: 1e-6, why: '6 s.f.' });
    expectClose({ label: 'ζ (absorber frequency)', computed: t.zeta, expected: Math.sqrt(0.3 / 8.8), tol: 1e-14, why: 'pitfall 1: √(3μ/(8(1+μ)))' });
    expectClose({ label: 'c/c_c (primary frequency)', computed: t.zetaPrimary, expected: Math.sqrt(0.3 / (8 * 1.1 ** 3)), tol: 1e-14, why: 'pitfall 1: √(3μ/(8(1+μ)³))' });
  });
  for (const [mu, f, z] of [[0.01, 0.992571, 0.049814], [0.05, 0.964212, 0.109772], [0.2, 0.874007, 0.208712]] as const) {
    it(`Warburton white-noise force, μ = ${mu}: f = ${f}, ζ = ${z} (Warburton 1982 EESD 10:381, from memory; calc-confirmed)`, () => {
      const t = tmdTuning(mu, 'white-force');
      expectClose({ label: 'f', computed: t.f, expected: f, tol: 1e-6, why: '6 decimals' });
      expectClose({ label: 'ζ', computed: t.zeta, expected: z, tol: 1e-5, why: '6 decimals of a value ≈ 0.05' });
    });
  }
  it('refuses μ outside (0, 1]', () => {
    expect(() => tmdTuning(0, 'force')).toThrow(/'mu'/);
    expect(() => tmdTuning(1.5, 'force')).toThrow(/'mu'/);
  });
});

describe('exact two-degree-of-freedom response', () => {
  it('true peak with Den Hartog tuning at μ = 0.1 is 4.59022, above the fixed-point estimate √(1+2/μ) = 4.58258', () => {
    // reference: exact 2-DOF frequency scan (calc), Den Hartog 4th ed. ch. 3 fixed-point estimate (from memory)
    const t = tmdTuning(0.1, 'force');
    const p = tmdPeak({ mu: 0.1, f: t.f, zeta: t.zeta, zeta1: 0 }, 'force');
    expectClose({ label: 'peak', computed: p.amplification, expected: 4.59022, tol: 5e-6, why: '6 s.f.' });
    expect(p.amplification).toBeGreaterThan(Math.sqrt(1 + 2 / 0.1));
  });
  it('an undamped absorber tuned to the forcing frequency stops the primary (classical undamped absorber)', () => {
    // Den Hartog 4th ed. ch. 3, undamped absorber (from memory): X₁ = 0 when ω = ω_a for an undamped absorber
    expect(amp({ mu: 0.05, f: 1, zeta: 0, zeta1: 0 }, 1, 'force')).toBeLessThan(1e-12);
  });
  it('a locked absorber (huge damping) makes one mass (1+μ)m₁ on k₁', () => {
    fc.assert(fc.property(fc.double({ min: 0.01, max: 0.5, noNaN: true }), fc.double({ min: 0.1, max: 3, noNaN: true }), (mu, b) => {
      fc.pre(Math.abs(1 - (1 + mu) * b * b) > 0.05);
      const x = amp({ mu, f: 1, zeta: 1e9, zeta1: 0 }, b, 'force');
      return Math.abs(x * Math.abs(1 - (1 + mu) * b * b) - 1) < 1e-5;
    }), { seed: 1, numRuns: 100 });
  });
  it('Den Hartog tuning puts the two fixed points at equal height √(1+2/μ) for a harmonic force', () => {
    fc.assert(fc.property(fc.double({ min: 0.01, max: 0.3, noNaN: true }), (mu) => {
      const pts = fixedPoints(mu, 1 / (1 + mu), 'force');
      return pts.length === 2 && pts.every((p) => Math.abs(p.height / Math.sqrt(1 + 2 / mu) - 1) < 1e-6);
    }), { seed: 1, numRuns: 15 });
  });
  it('Warburton base tuning f = √(1−μ/2)/(1+μ) puts the fixed points of the relative response at equal height for base acceleration', () => {
    fc.assert(fc.property(fc.double({ min: 0.01, max: 0.3, noNaN: true }), (mu) => {
      const pts = fixedPoints(mu, tmdTuning(mu, 'base').f, 'base');
      return pts.length === 2 && Math.abs(pts[0]!.height / pts[1]!.height - 1) < 1e-6;
    }), { seed: 1, numRuns: 15 });
  });
  it('Warburton white-noise tunings minimise the response variance (perturbing f or ζ by 3 % raises it)', () => {
    for (const [exc, load] of [['white-force', 'force'], ['white-base', 'base']] as const) {
      for (const mu of [0.02, 0.1]) {
        const t = tmdTuning(mu, exc);
        const s: TmdSystem = { mu, f: t.f, zeta: t.zeta, zeta1: 0 };
        const v0 = variance(s, load);
        for (const [df, dz] of [[1.03, 1], [0.97, 1], [1, 1.03], [1, 0.97]]) {
          expect(variance({ ...s, f: t.f * df!, zeta: t.zeta * dz! }, load)).toBeGreaterThan(v0);
        }
      }
    }
  });
  it('the exact peak is never below either fixed-point height and tuning beats a mistuned absorber', () => {
    fc.assert(fc.property(fc.double({ min: 0.01, max: 0.3, noNaN: true }), (mu) => {
      const t = tmdTuning(mu, 'force');
      const tuned = tmdPeak({ mu, f: t.f, zeta: t.zeta, zeta1: 0 }, 'force').amplification;
      const off = tmdPeak({ mu, f: t.f * 1.1, zeta: t.zeta, zeta1: 0 }, 'force').amplification;
      return tuned >= Math.sqrt(1 + 2 / mu) * (1 - 1e-9) && off > tuned;
    }), { seed: 1, numRuns: 15 });
  });
});
