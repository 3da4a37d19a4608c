/**
 * Road-power's variances in closed form by residues (quarterCarSpectra + roadResponseVariance, used by
 * quarterCarRandom and roadDuty) against two references: the white-road (w = 2) closed forms from the
 * Lyapunov equation (quarterCarWhiteVariances; same as Gobbi & Mastinu 2001, equation numbers from
 * memory) and the adaptive-Simpson quadrature of the same spectra (spectralIntegrals, the fallback).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  quarterCarBand, quarterCarCharacteristicFrequencies, quarterCarGains, quarterCarRandom, quarterCarSpectra, quarterCarWhiteVariances,
  roadDisplacementPsd, roadDuty, roadResponseVariance, roadVelocityWhiteLevel, spectralIntegrals, weightingSquared, WEIGHTING_WK,
  type QuarterCar, type RoadInput,
} from '../../../src/core/duty/index.ts';

const KEYS = ['damperVelocity', 'travel', 'bodyAcceleration', 'tyreLoad', 'weightedAcceleration'] as const;

/** The five variances by the quadrature alone (the method the closed form replaces), relTol 1e-10. */
function byQuadrature(q: QuarterCar, road: RoadInput): number[] {
  const [f1, f2] = quarterCarBand(q);
  return spectralIntegrals((f) => {
    const h = quarterCarGains(q, f);
    const gz = roadDisplacementPsd(road, f);
    return [h.damperVelocity * gz, h.travel * gz, h.bodyAcceleration * gz, h.tyreLoad * gz, weightingSquared(WEIGHTING_WK, f) * h.bodyAcceleration * gz];
  }, f1, f2, 1e-10, 120, quarterCarCharacteristicFrequencies(q)).map((r) => r.value);
}

const car = fc.record({
  ms: fc.double({ min: 100, max: 2000, noNaN: true }), mu: fc.double({ min: 10, max: 300, noNaN: true }),
  ks: fc.double({ min: 5e3, max: 2e5, noNaN: true }), kt: fc.double({ min: 5e4, max: 2e6, noNaN: true }),
});
// w on [1.5, 3.5] with the integer-σ point w = 3 (σ = −1, log-term limit) and its close neighbours drawn often
const waviness = fc.oneof(fc.double({ min: 1.5, max: 3.5, noNaN: true }), fc.constantFrom(3, 3 + 1e-9, 3 - 1e-7, 2, 1.5, 3.5));
// body-mode damping ratio, including the neighbourhood of critical damping
const zeta = fc.oneof(fc.double({ min: 0.05, max: 3, noNaN: true }), fc.double({ min: 0.98, max: 1.02, noNaN: true }));

describe('quarter-car variances by residues', () => {
  it('match the white-road Lyapunov closed forms to 1e-12 and stay within their stated bound [closed form; gobbi2001]', () => {
    fc.assert(fc.property(car, zeta, (k, z) => {
      const q = { ...k, c: 2 * z * Math.sqrt(k.ks * k.ms) };
      const road = { Gd0: 256e-6, w: 2, V: 20 };
      const s = quarterCarSpectra(q, WEIGHTING_WK);
      const cf = quarterCarWhiteVariances(q, roadVelocityWhiteLevel(road.Gd0, road.V));
      for (const key of ['damperVelocity', 'travel', 'bodyAcceleration', 'tyreLoad'] as const) {
        const r = roadResponseVariance(s[key], road);
        const d = Math.abs(r.value / cf[key] - 1);
        // reference: white-noise response of a linear system by the Lyapunov equation (Newland, An
        // Introduction to Random Vibrations, Spectral and Wavelet Analysis, 3rd ed., ch. 7, from memory;
        // the quarter-car forms as Gobbi & Mastinu 2001, from memory); road input ISO 8608 class C mean
        // G_d(n0) = 256e-6 m³ (ISO 8608:2016 Table 1, from memory)
        expect(d).toBeLessThan(1e-12);
        // the closed forms themselves round: allow 1e-14 on top of the bound
        expect(d).toBeLessThan(r.relError + 1e-14);
      }
    }), { seed: 1, numRuns: 60 });
  });

  it('agree with the adaptive-Simpson quadrature to 1e-6 (in fact ~1e-9) for random cars, w in [1.5, 3.5] incl. w = 3 and near-critical damping [quadrature oracle, lyness1969]', () => {
    fc.assert(fc.property(car, zeta, waviness, (k, z, w) => {
      const q = { ...k, c: 2 * z * Math.sqrt(k.ks * k.ms) };
      const road = { Gd0: 256e-6, w, V: 20 };
      const closed = quarterCarRandom(q, road);
      const quad = byQuadrature(q, road);
      // reference: adaptive-Simpson quadrature of the same spectra (Lyness, J. ACM 16 (1969) 483–495);
      // the residue sum it is checked against: Gradshteyn & Ryzhik, Table of Integrals, 7th ed., 3.222.2 (from memory)
      KEYS.forEach((key, i) => expect(Math.abs(closed[key].value / quad[i]! - 1)).toBeLessThan(1e-6));
    }), { seed: 1, numRuns: 30 });
  });

  it('give roadDuty the quadrature\'s power and RMS velocity for both damper laws (1e-6) [quadrature oracle; roberts2003 ch. 5 linearisation]', () => {
    const law = fc.oneof(
      fc.record({ kind: fc.constant('linear' as const), c: fc.double({ min: 200, max: 2e4, noNaN: true }) }),
      fc.record({ kind: fc.constant('power' as const), C: fc.double({ min: 200, max: 5000, noNaN: true }), alpha: fc.double({ min: 0.2, max: 2, noNaN: true }) }),
    );
    fc.assert(fc.property(car, waviness, law, (k, w, d) => {
      const road = { Gd0: 256e-6, w, V: 20 };
      const r = roadDuty(k, road, d);
      // the quadrature at the damping roadDuty settled on: same σ_v (and so the same fixed point)
      const quad = byQuadrature({ ...k, c: r.c }, road);
      // reference: the quadrature as above (Lyness 1969) at the linearised damping (Roberts & Spanos,
      // Random Vibration and Statistical Linearization, 2003, ch. 5, from memory)
      expect(Math.abs(r.vRms / Math.sqrt(quad[0]!) - 1)).toBeLessThan(1e-6);
      expect(Math.abs(r.awWk / Math.sqrt(quad[4]!) - 1)).toBeLessThan(1e-6);
      expect(r.fallbacks).toBe(0);
      expect(r.relError).toBeLessThan(1e-10);
    }), { seed: 1, numRuns: 20 });
  });

  it('stay right across critical damping of a car with equal masses and rates (closed form, or the fallback where the residues cancel) [quadrature oracle]', () => {
    // equal masses and rates: as c grows the complex pole pairs meet on the real axis (double poles)
    const k = { ms: 240, mu: 240, ks: 16000, kt: 16000 };
    let worst = 0;
    for (let c = 100; c < 20000; c *= 1.02) {
      const q = { ...k, c };
      const r = quarterCarRandom(q, { Gd0: 256e-6, w: 2.5, V: 20 });
      const quad = byQuadrature(q, { Gd0: 256e-6, w: 2.5, V: 20 });
      KEYS.forEach((key, i) => { worst = Math.max(worst, Math.abs(r[key].value / quad[i]! - 1)); expect(r[key].relError).toBeLessThan(1e-8); });
    }
    // reference: the quadrature (Lyness 1969); double poles at critical damping are where partial
    // fractions cancel (common practice, no source), so this sweep crosses them on purpose
    expect(worst).toBeLessThan(1e-7);
  });
});
