/**
 * The Mellin transform of a rational function by residues (src/core/numeric/mellinRational.ts),
 * against textbook closed forms and against quadrature (the project's Gauss–Legendre rule on many panels), and the
 * root finder and double-double refinement it relies on.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { gaussLegendre, ddAdd, ddProduct, mellinRational, polynomialRoots, refineRoot, type RationalSpectrum } from '../../../src/core/numeric/index.ts';
import { ComputationError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

/** ∫₀^∞ u^(σ−1) R(u) du by 8-point Gauss–Legendre in ln u on 10 000 panels over ±100 (the oracle; the tails beyond are below 1e-12 for 0.3 ≤ σ ≤ 0.7 and the strips used here), R evaluated directly. */
function quad(r: RationalSpectrum, sigma: number): number {
  const R = (u: number) => {
    let re = r.gain * u ** r.zeroOrder; let im = 0;
    const f = (c: { re: number; im: number }, inv: boolean) => {
      // u + c² as a complex number
      const ar = u + c.re * c.re - c.im * c.im; const ai = 2 * c.re * c.im;
      if (!inv) { const t = re * ar - im * ai; im = re * ai + im * ar; re = t; return; }
      const m = ar * ar + ai * ai; const t = (re * ar + im * ai) / m; im = (im * ar - re * ai) / m; re = t;
    };
    r.zeros.forEach((z) => f(z, false));
    r.poles.forEach((p) => f(p.p, true));
    return re;
  };
  return gaussLegendre((t) => [Math.exp(sigma * t) * R(Math.exp(t))], -100, 100, 10000)[0]!;
}

describe('mellinRational', () => {
  it('gives π a^(μ−1)/sin(μπ) for 1/(u + a) [Gradshteyn & Ryzhik, Table of Integrals, 7th ed., 3.222.2 (from memory); closed form]', () => {
    for (const [a, mu] of [[1, 0.5], [4, 0.3], [0.01, 0.8]] as const) {
      const v = mellinRational({ gain: 1, zeroOrder: 0, zeros: [], poles: [{ p: { re: Math.sqrt(a), im: 0 } }] }, mu);
      expectClose({ label: `a = ${a}, μ = ${mu}`, computed: v.value, expected: (Math.PI * a ** (mu - 1)) / Math.sin(mu * Math.PI), tol: 1e-13, why: 'one residue, rounding only' });
      expect(v.relError).toBeLessThan(1e-13);
    }
  });

  it('gives π/(2ω₀³·2ζ) for the squared oscillator at σ = 1/2 [closed form: ∫₀^∞ dω/|ω₀² − ω² + 2iζω₀ω|² = π/(4ζω₀³)]', () => {
    // u = ω²: dω = u^{−1/2} du/2, so the Mellin transform at σ = 1/2 is twice the ω integral
    for (const zeta of [0.7, 0.05, 1e-4, 3]) {
      const w0 = 2.5;
      const s = zeta < 1 ? { re: zeta * w0, im: w0 * Math.sqrt(1 - zeta * zeta) } : { re: w0 * (zeta + Math.sqrt(zeta * zeta - 1)), im: 0 };
      const poles = zeta < 1 ? [{ p: s }, { p: { re: s.re, im: -s.im } }] : [{ p: s }, { p: { re: (w0 * w0) / s.re, im: 0 } }];
      const v = mellinRational({ gain: 1, zeroOrder: 0, zeros: [], poles }, 0.5);
      expectClose({ label: `ζ = ${zeta}`, computed: v.value, expected: (2 * Math.PI) / (4 * zeta * w0 ** 3), tol: 1e-12, why: 'two residues; the error bound covers the light damping' });
    }
  });

  it('takes the log-term limit at an integer σ and matches quadrature on either side [closed form vs Gauss–Legendre quadrature]', () => {
    // u²·(u + 9)/((u + 1)(u + 4)(u² + 0.2u + 25)): zero of order 2 at 0, falls as u^{−1} — strip (−2, 1)
    const r: RationalSpectrum = { gain: 3, zeroOrder: 2, zeros: [{ re: 3, im: 0 }], poles: [{ p: { re: 1, im: 0 } }, { p: { re: 2, im: 0 } }, { p: { re: 0.1, im: 4.999 } }, { p: { re: 0.1, im: -4.999 } }] };
    for (const sigma of [-1, -1 + 1e-9, -1 - 1e-6, -1.2, 0, 1e-12, 0.5, -0.5]) {
      const v = mellinRational(r, sigma);
      expectClose({ label: `σ = ${sigma}`, computed: v.value, expected: quad(r, sigma), tol: 1e-10, why: 'the quadrature converged to about 1e-13 (panels 0.02 wide in ln u); the closed form to rounding' });
      expect(v.relError).toBeLessThan(1e-12);
    }
  });

  it('refuses σ outside the strip of convergence and a pole on the imaginary axis', () => {
    const r: RationalSpectrum = { gain: 1, zeroOrder: 1, zeros: [], poles: [{ p: { re: 1, im: 0 } }, { p: { re: 2, im: 0 } }] };
    expect(() => mellinRational(r, 1.5)).toThrow(ComputationError);
    expect(() => mellinRational(r, -1)).toThrow(/strip/);
    expect(() => mellinRational({ ...r, poles: [{ p: { re: 0, im: 1 } }, { p: { re: 0, im: -1 } }] }, 0.5)).toThrow(ComputationError);
  });

  it('reports the cancellation of nearly repeated poles in its bound, which then grows past any tolerance', () => {
    // (u + 1)(u + (1 + h)²): the residues grow as 1/h and cancel; stated poles to 1e-12 each
    for (const h of [1e-2, 1e-5, 1e-8]) {
      const e = { re: 1e-12, im: 0 };
      const v = mellinRational({ gain: 1, zeroOrder: 0, zeros: [], poles: [{ p: { re: 1, im: 0 }, error: e }, { p: { re: 1 + h, im: 0 }, error: e }] }, 0.5);
      // ∫ u^{−1/2}/((u + a²)(u + b²)) du = π/(ab(a + b))
      expectClose({ label: `h = ${h}`, computed: v.value, expected: Math.PI / ((1 + h) * (2 + h)), tol: Math.max(1e-12, 10 * v.relError), why: 'within ten times its own bound' });
      expect(v.cancellation).toBeGreaterThan(0.5 / h);
      expect(v.relError).toBeGreaterThan(1e-12 / h);
    }
  });

  it('agrees with quadrature on random rational functions (bound respected) [Gauss–Legendre oracle]', () => {
    const pole = fc.record({ re: fc.double({ min: 0.3, max: 20, noNaN: true }), im: fc.double({ min: 0, max: 20, noNaN: true }) });
    // distinct poles (repeated ones are the fallback's case, tested above)
    const distinct = fc.array(pole, { minLength: 1, maxLength: 3 }).filter((ps) => ps.every((a, i) => ps.every((b, j) => i === j || Math.hypot(a.re - b.re, a.im - b.im) > 0.1)));
    fc.assert(fc.property(distinct, fc.double({ min: 0.3, max: 0.7, noNaN: true }), (ps, sigma) => {
      const poles = ps.flatMap((p) => (p.im > 0.5 ? [{ p }, { p: { re: p.re, im: -p.im } }] : [{ p: { re: p.re, im: 0 } }]));
      const r: RationalSpectrum = { gain: 1, zeroOrder: 0, zeros: [], poles };
      const v = mellinRational(r, sigma);
      const q = quad(r, sigma);
      // the oracle resolves a peak of ζ ≥ 0.015 on panels 0.02 wide in ln u to about 1e-10
      expect(Math.abs(v.value / q - 1)).toBeLessThan(1e-9 + 10 * v.relError);
    }), { seed: 1, numRuns: 25 });
  });
});

describe('polynomialRoots and refineRoot', () => {
  it('finds the roots of (z − 1)(z − 2)(z² + 1) and of a quartic with roots a decade apart [closed form]', () => {
    const r = polynomialRoots([2, -3, 3, -3, 1]).map((x) => x.z);
    const want = [{ re: 1, im: 0 }, { re: 2, im: 0 }, { re: 0, im: 1 }, { re: 0, im: -1 }];
    for (const w of want) expect(Math.min(...r.map((z) => Math.hypot(z.re - w.re, z.im - w.im)))).toBeLessThan(1e-13);
    // (z + 1e-3)(z + 1)(z + 1e3)(z + 1e6): Newton-polygon starts put one start near each
    const q = polynomialRoots([1e6, 1e9 + 1e6 + 1e3, 1e9 + 1e6 + 1e3 + 1, 1e6 + 1e3 + 1 + 1e-3, 1].map((x, i) => (i === 4 ? 1 : x)));
    expect(q).toHaveLength(4);
  });
  it('refines √2 to double-double precision, and a lightly damped pole to its exact tiny real part [closed form]', () => {
    expectClose({ label: '√2', computed: refineRoot([[-2, 0], [0, 0], [1, 0]], { re: 1.4142, im: 0 }).z.re, expected: Math.SQRT2, tol: 1e-16 });
    // s² + 2ζs + 1 with ζ = 1e-14: s = −ζ ± i√(1 − ζ²); the double-precision root has Re s only to ~1e-16
    const z = 1e-14;
    const c = [[1, 0], ddProduct(2, z), [1, 0]] as const;
    const r = refineRoot(c, { re: -z * 1.3, im: 1 });
    expectClose({ label: 'Re s', computed: r.z.re, expected: -z, tol: 1e-14, why: 'double-double Newton steps' });
    expect(ddAdd([1, 1e-20], [-1, 0])[0]).toBe(1e-20);
  });
});
