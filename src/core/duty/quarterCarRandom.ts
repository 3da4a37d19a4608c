/**
 * RMS responses of a linear quarter car on an ISO 8608 road: in closed form by residues (the squared
 * gains are rational in ω², the road a power law), with frequency-domain quadrature as the fallback
 * when the partial fractions cancel too much to meet the tolerance.
 */
import { quarterCarCharacteristicFrequencies, quarterCarGains, type QuarterCar } from './quarterCar.ts';
import { maxOf, minOf } from '../numeric/extent.ts';
import { roadDisplacementPsd, type RoadInput } from './roadPsd.ts';
import { spectralIntegral, spectralIntegrals, type SpectralIntegral } from './spectralIntegral.ts';
import { WEIGHTING_WK, weightingSquared } from './comfortWeighting.ts';
import { quarterCarSpectra, type QuarterCarSpectra } from './quarterCarSpectra.ts';
import { roadResponseVariance } from './roadVariance.ts';
import { DampbookError } from '../errors.ts';

export interface QuarterCarRandom {
  /** Variances, each with its band and error statement. */
  readonly damperVelocity: SpectralIntegral;
  readonly travel: SpectralIntegral;
  readonly bodyAcceleration: SpectralIntegral;
  readonly tyreLoad: SpectralIntegral;
  /** Body acceleration weighted by ISO 2631-1 W_k, (m/s²)². */
  readonly weightedAcceleration: SpectralIntegral;
  /** How many of the five variances fell back to quadrature (0 when all are closed forms). */
  readonly fallbacks: number;
}

const KEYS = ['damperVelocity', 'travel', 'bodyAcceleration', 'tyreLoad', 'weightedAcceleration'] as const;

/**
 * One variance by residues, or undefined when its error bound exceeds relTol (near-repeated poles, i.e.
 * damping close to critical in some mode, make the partial fractions cancel) or the roots were not found.
 */
function byResidues(spectra: QuarterCarSpectra | undefined, key: (typeof KEYS)[number], road: RoadInput, band: readonly [number, number], relTol: number): SpectralIntegral | undefined {
  if (!spectra) return undefined;
  try {
    const r = roadResponseVariance(spectra[key], road);
    return r.relError <= relTol && r.value > 0 ? { value: r.value, band, tailFraction: 0, relError: r.relError, method: 'residues' } : undefined;
  } catch (e) {
    if (e instanceof DampbookError) return undefined;
    throw e;
  }
}

function spectraOf(q: QuarterCar): QuarterCarSpectra | undefined {
  try { return quarterCarSpectra(q, WEIGHTING_WK); } catch (e) { if (e instanceof DampbookError) return undefined; throw e; }
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
 * the ISO 2631-1 weighting W_k (weightingSquared). Each is first taken in closed form by residues
 * (quarterCarSpectra, roadResponseVariance), kept when its error bound is within relTol; the others
 * share the frequency points of one quadrature (spectralIntegrals), each to its own tolerance.
 *
 * @param q quarter car (validated); road validated with checkRoad
 * @param relTol accepted relative error: the closed form's bound must be within it, and the fallback quadrature's tolerance; default 1e-8
 * @example quarterCarRandom({ ms: 240, mu: 36, ks: 16000, kt: 160000, c: 980 }, { Gd0: 256e-6, w: 2, V: 20 }).damperVelocity.value // 0.0825018 (m/s)², by residues; the white-road closed form is 0.0825018
 * @source newland1993 ch. 7 (response spectra of linear systems; chapter from memory); wong2008 §7.2; gradshteyn2007 3.222.2 (from memory)
 */
export function quarterCarRandom(q: QuarterCar, road: RoadInput, relTol = 1e-8): QuarterCarRandom {
  const band = quarterCarBand(q);
  const spectra = spectraOf(q);
  const closed = KEYS.map((k) => byResidues(spectra, k, road, band, relTol));
  const fallbacks = closed.filter((c) => c === undefined).length;
  const quad = fallbacks === 0 ? undefined : spectralIntegrals((f) => {
    const h = quarterCarGains(q, f);
    const gz = roadDisplacementPsd(road, f);
    const acc = h.bodyAcceleration * gz;
    return [h.damperVelocity * gz, h.travel * gz, acc, h.tyreLoad * gz, weightingSquared(WEIGHTING_WK, f) * acc];
  }, band[0], band[1], relTol, 120, quarterCarCharacteristicFrequencies(q));
  const [damperVelocity, travel, bodyAcceleration, tyreLoad, weightedAcceleration] = closed.map((c, i) => c ?? quad![i]!) as [SpectralIntegral, SpectralIntegral, SpectralIntegral, SpectralIntegral, SpectralIntegral];
  return { damperVelocity, travel, bodyAcceleration, tyreLoad, weightedAcceleration, fallbacks };
}

/**
 * Damper-velocity variance alone, (m/s)²: by residues, or by quadrature (relTol, panels) when the
 * closed form's error bound exceeds relTol.
 */
export function damperVelocityVariance(q: QuarterCar, road: RoadInput, relTol = 1e-8, panels = 60): number {
  const band = quarterCarBand(q);
  const closed = byResidues(spectraOf(q), 'damperVelocity', road, band, relTol);
  if (closed) return closed.value;
  return spectralIntegral((f) => quarterCarGains(q, f).damperVelocity * roadDisplacementPsd(road, f), band[0], band[1], relTol, panels, quarterCarCharacteristicFrequencies(q)).value;
}
