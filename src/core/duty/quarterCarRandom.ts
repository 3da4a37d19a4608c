/**
 * RMS responses of a linear quarter car on an ISO 8608 road, by frequency-domain integration of
 * the exact transfer functions.
 */
import { quarterCarCharacteristicFrequencies, quarterCarGains, type QuarterCar } from './quarterCar.ts';
import { maxOf, minOf } from '../numeric/extent.ts';
import { roadDisplacementPsd, type RoadInput } from './roadPsd.ts';
import { spectralIntegral, spectralIntegrals, type SpectralIntegral } from './spectralIntegral.ts';
import { WEIGHTING_WK, weightingSquared } from './comfortWeighting.ts';

export interface QuarterCarRandom {
  /** Variances, each with its band and error statement. */
  readonly damperVelocity: SpectralIntegral;
  readonly travel: SpectralIntegral;
  readonly bodyAcceleration: SpectralIntegral;
  readonly tyreLoad: SpectralIntegral;
  /** Body acceleration weighted by ISO 2631-1 W_k, (m/s²)². */
  readonly weightedAcceleration: SpectralIntegral;
}

/** Quadrature band: three decades below the lowest characteristic frequency to three above the highest. */
export function quarterCarBand(q: QuarterCar): [number, number] {
  const f = quarterCarCharacteristicFrequencies(q);
  return [minOf(f) / 1000, maxOf(f) * 1000];
}

/**
 * Variance of each response:
 *
 * $$\sigma_y^2 = \int_0^\infty |H_y(f)|^2\, G_z(f)\, df,\qquad a_{w}^2 = \int_0^\infty |W_k(f)|^2 |H_{\ddot z_s}(f)|^2 G_z(f)\, df$$
 *
 * with the exact quarter-car gains (quarterCarGains), the ISO 8608 road PSD (roadDisplacementPsd) and
 * the ISO 2631-1 weighting W_k (weightingSquared). The five integrals share their frequency points
 * (spectralIntegrals): one evaluation of the gains per point, each integral to its own tolerance.
 *
 * @param q quarter car (validated); road validated with checkRoad
 * @param relTol quadrature tolerance (relative), default 1e-8
 * @example quarterCarRandom({ ms: 240, mu: 36, ks: 16000, kt: 160000, c: 980 }, { Gd0: 256e-6, w: 2, V: 20 }).damperVelocity.value // 0.082502 (m/s)², quadrature; closed form 0.0825018
 * @source newland1993 ch. 7 (response spectra of linear systems; chapter from memory); wong2008 §7.2
 */
export function quarterCarRandom(q: QuarterCar, road: RoadInput, relTol = 1e-8): QuarterCarRandom {
  const [f1, f2] = quarterCarBand(q);
  const peaks = quarterCarCharacteristicFrequencies(q);
  const all = spectralIntegrals((f) => {
    const h = quarterCarGains(q, f);
    const gz = roadDisplacementPsd(road, f);
    const acc = h.bodyAcceleration * gz;
    return [h.damperVelocity * gz, h.travel * gz, acc, h.tyreLoad * gz, weightingSquared(WEIGHTING_WK, f) * acc];
  }, f1, f2, relTol, 120, peaks);
  const [damperVelocity, travel, bodyAcceleration, tyreLoad, weightedAcceleration] = all as [SpectralIntegral, SpectralIntegral, SpectralIntegral, SpectralIntegral, SpectralIntegral];
  return { damperVelocity, travel, bodyAcceleration, tyreLoad, weightedAcceleration };
}

/** Damper-velocity variance alone, (m/s)², with a looser tolerance for iterations. */
export function damperVelocityVariance(q: QuarterCar, road: RoadInput, relTol = 1e-8, panels = 60): number {
  const [f1, f2] = quarterCarBand(q);
  return spectralIntegral((f) => quarterCarGains(q, f).damperVelocity * roadDisplacementPsd(road, f), f1, f2, relTol, panels, quarterCarCharacteristicFrequencies(q)).value;
}
