/**
 * Variance of a linear response on an ISO 8608 road in closed form, when the squared gain is
 * rational in ω²: the road's power law makes the integral a Mellin transform.
 */
import { ISO_8608_N0 } from '../constants.ts';
import { mellinRational, type MellinValue, type RationalSpectrum } from '../numeric/index.ts';
import type { RoadInput } from './roadPsd.ts';

/**
 * With $G_z(f) = G_d(n_0)\,n_0^w V^{w-1} f^{-w}$ (roadDisplacementPsd) and u = (2πf)², df = du/(4π√u):
 * $$\sigma^2 = \int_0^\infty R(u)\,G_z(f)\,df = \frac{G_d(n_0)\,n_0^w\,V^{w-1}(2\pi)^{w-1}}{2}\int_0^\infty u^{\sigma-1}R(u)\,du,\qquad \sigma = \frac{1-w}{2},$$
 * the integral by residues (mellinRational). For w = 2 and $R = k_t^2 m_s^2 u^3/|\Delta|^2$ this is the
 * white-road damper-velocity variance $\pi^2 k_t G_d(n_0) n_0^2 V / c$.
 *
 * @param spec squared gain in pole–zero form (quarterCarSpectra); road validated with checkRoad
 * @returns the variance in the response's units squared, with mellinRational's error bound and cancellation figure
 * @throws ComputationError when the integral diverges for this w (a gain that does not fall off fast enough)
 * @example roadResponseVariance(quarterCarSpectra({ ms: 240, mu: 36, ks: 16000, kt: 160000, c: 980 }, WEIGHTING_WK).damperVelocity, { Gd0: 256e-6, w: 2, V: 20 }).value // 0.0825018 (m/s)², as quarterCarWhiteVariances
 * @source iso8608 §5 (power-law PSD in time frequency; from memory); gradshteyn2007 3.222.2 (from memory); closed form
 */
export function roadResponseVariance(spec: RationalSpectrum, road: RoadInput): MellinValue {
  const m = mellinRational(spec, (1 - road.w) / 2);
  const scale = (road.Gd0 * ISO_8608_N0 ** road.w * road.V ** (road.w - 1) * (2 * Math.PI) ** (road.w - 1)) / 2;
  return { value: scale * m.value, relError: m.relError + 4 * Number.EPSILON, cancellation: m.cancellation };
}
