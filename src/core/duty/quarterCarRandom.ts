/**
 * RMS responses of a linear quarter car on an ISO 8608 road, by frequency-domain integration of
 * the exact transfer functions.
 */
import { quarterCarCharacteristicFrequencies, quarterCarGains, type QuarterCar } from './quarterCar.ts';
import { maxOf, minOf } from '../numeric/extent.ts';
import { roadDisplacementPsd, type RoadInput } from './roadPsd.ts';
import { spectralIntegral, type SpectralIntegral } from './spectralIntegral.ts';

export interface QuarterCarRandom {
  /** Variances, each with its band and error statement. */
  readonly damperVelocity: SpectralIntegral;
  readonly travel: SpectralIntegral;
  readonly bodyAcceleration: SpectralIntegral;
  readonly tyreLoad: SpectralIntegral;
}

/** Quadrature band: three decades below the lowest characteristic frequency to three above the highest. */
export function quarterCarBand(q: QuarterCar): [number, number] {
  const f = quarterCarCharacteristicFrequencies(q);
  return [minOf(f) / 1000, maxOf(f) * 1000];
}

/**
 * Variance of each response:
 *
 * $$\sigma_y^2 = \int_0^\infty |H_y(f)|^2\, G_z(f)\, df$$
 *
 * with the exact quarter-car gains (quarterCarGains) and the ISO 8608 road PSD (roadDisplacementPsd).
 *
 * @param q quarter car (validated); road validated with checkRoad
 * @param relTol quadrature tolerance (relative), default 1e-8
 * @example quarterCarRandom({ ms: 240, mu: 36, ks: 16000, kt: 160000, c: 980 }, { Gd0: 256e-6, w: 2, V: 20 }).damperVelocity.value // 0.082502 (m/s)², quadrature; closed form 0.0825018
 * @source newland1993 ch. 7 (response spectra of linear systems; chapter from memory); wong2008 §7.2
 */
export function quarterCarRandom(q: QuarterCar, road: RoadInput, relTol = 1e-8): QuarterCarRandom {
  const [f1, f2] = quarterCarBand(q);
  const peaks = quarterCarCharacteristicFrequencies(q);
  const gz = (f: number) => roadDisplacementPsd(road, f);
  return {
    damperVelocity: spectralIntegral((f) => quarterCarGains(q, f).damperVelocity * gz(f), f1, f2, relTol, 120, peaks),
    travel: spectralIntegral((f) => quarterCarGains(q, f).travel * gz(f), f1, f2, relTol, 120, peaks),
    bodyAcceleration: spectralIntegral((f) => quarterCarGains(q, f).bodyAcceleration * gz(f), f1, f2, relTol, 120, peaks),
    tyreLoad: spectralIntegral((f) => quarterCarGains(q, f).tyreLoad * gz(f), f1, f2, relTol, 120, peaks),
  };
}

/** Damper-velocity variance alone, (m/s)², with a looser tolerance for iterations. */
export function damperVelocityVariance(q: QuarterCar, road: RoadInput, relTol = 1e-8, panels = 60): number {
  const [f1, f2] = quarterCarBand(q);
  return spectralIntegral((f) => quarterCarGains(q, f).damperVelocity * roadDisplacementPsd(road, f), f1, f2, relTol, panels, quarterCarCharacteristicFrequencies(q)).value;
}
