import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { adaptiveSimpson, adaptiveSimpsonVector } from '../../../src/core/numeric/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('adaptive Simpson on several integrands at once', () => {
  // closed forms of elementary integrals (any calculus table, e.g. Abramowitz & Stegun, Handbook of
  // Mathematical Functions, 1964, §4.3 and §4.2; from memory)
  it('∫₀^π sin = 2, ∫₀^π x² = π³/3, ∫₀^π e^{−x} = 1 − e^{−π} [closed form]', () => {
    const r = adaptiveSimpsonVector((x) => [Math.sin(x), x * x, Math.exp(-x)], 0, Math.PI, [1e-12, 1e-12, 1e-12]);
    expectClose({ label: 'sin', computed: r[0]!, expected: 2, tol: 1e-11 });
    expectClose({ label: 'x²', computed: r[1]!, expected: Math.PI ** 3 / 3, tol: 1e-12, why: 'Simpson is exact for cubics' });
    expectClose({ label: 'exp', computed: r[2]!, expected: 1 - Math.exp(-Math.PI), tol: 1e-11 });
  });
  it('each component meets its tolerance against the closed form, as the scalar rule does alone (within 100 × the target: the /15 stopping rule is an estimate)', () => {
    fc.assert(fc.property(fc.double({ min: 0.5, max: 20, noNaN: true }), fc.double({ min: 0.01, max: 1, noNaN: true }), (k, w) => {
      const f1 = (x: number) => Math.cos(k * x) ** 2;
      const f2 = (x: number) => 1 / (w * w + (x - 1) ** 2); // a peak of width w at x = 1
      // closed forms: ∫₀² cos²(kx) dx = 1 + sin(4k)/(4k); ∫₀² dx/(w² + (x−1)²) = 2·atan(1/w)/w
      // (Gradshteyn & Ryzhik, Table of Integrals, 7th ed., 2.513 and 2.172; from memory)
      const exact1 = 1 + Math.sin(4 * k) / (4 * k);
      const exact2 = (Math.atan(1 / w) + Math.atan(1 / w)) / w;
      const [v1, v2] = adaptiveSimpsonVector((x) => [f1(x), f2(x)], 0, 2, [1e-9, 1e-9]);
      expect(Math.abs(v1! - exact1)).toBeLessThanOrEqual(1e-7);
      expect(Math.abs(v2! - exact2)).toBeLessThanOrEqual(1e-7 * exact2);
      expect(Math.abs(v2! - adaptiveSimpson(f2, 0, 2, 1e-9))).toBeLessThanOrEqual(2e-7 * exact2);
    }), { seed: 1, numRuns: 100 });
  });
});
