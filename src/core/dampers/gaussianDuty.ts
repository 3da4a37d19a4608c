import { ComputationError, POSITIVE, requireInRange } from '../errors.ts';
import { adaptiveSimpson } from '../numeric/adaptiveSimpson.ts';
import { gamma } from '../numeric/gamma.ts';
import { maxOf } from '../numeric/index.ts';
import { damperForce, lawBreakpoints } from './damperForce.ts';
import type { DamperLaw } from './laws.ts';
import { validateLaw } from './validateLaw.ts';

/**
 * Gaussian absolute moment factor: E|v|^{1+α} = κ(α) σ^{1+α} for zero-mean Gaussian v.
 *
 * $$\kappa(\alpha) = \frac{2^{(1+\alpha)/2}\,\Gamma(1+\alpha/2)}{\sqrt\pi}$$
 *
 * κ(0) = √(2/π), κ(1) = 1.
 *
 * @param alpha exponent, [0, 2]
 * @source abramowitz1964 eq. 26.2 (moments of the normal distribution; from memory)
 */
export function gaussianMomentFactor(alpha: number): number {
  requireInRange('alpha', alpha, { min: 0, max: 2 });
  return (Math.pow(2, (1 + alpha) / 2) * gamma(1 + alpha / 2)) / Math.sqrt(Math.PI);
}

/**
 * Mean power of a damper whose velocity is zero-mean Gaussian with RMS σ_v:
 *
 * $$\bar P = E[F(v)\,v] = c\sigma_v^2\ (\text{linear}),\quad C\kappa(\alpha)\sigma_v^{1+\alpha}\ (\text{power}),\quad F_f\sqrt{2/\pi}\,\sigma_v\ (\text{Coulomb})$$
 *
 * other laws by quadrature over the normal density (±9σ). The hysteretic law has no meaning
 * for broadband motion and is refused.
 *
 * @param law damper law
 * @param sigmaV RMS velocity, m/s, (0, ∞)
 * @source abramowitz1964 eq. 26.2 (from memory); lyness1969 (quadrature)
 */
export function gaussianMeanPower(law: DamperLaw, sigmaV: number): number {
  validateLaw(law);
  requireInRange('sigmaV', sigmaV, POSITIVE, 'm/s');
  switch (law.kind) {
    case 'linear':
      return law.c * sigmaV * sigmaV;
    case 'power':
      return law.C * gaussianMomentFactor(law.alpha) * Math.pow(sigmaV, 1 + law.alpha);
    case 'coulomb':
      return law.Ff * gaussianMomentFactor(0) * sigmaV;
    case 'hysteretic':
      throw new ComputationError('a hysteretic (loss-factor) law is defined for harmonic motion only');
    case 'bilinear': {
      // in u = v/σ_v and scaled by the largest |F·v| at ±σ, ±3σ, ±9σ, so the tolerance can neither
      // underflow (a tiny σ_v or slope) nor be zero (zero low-speed slopes): the integrand is O(1)
      const scale = maxOf([1, 3, 9].flatMap((k) => [k, -k]).map((u) => Math.abs(damperForce(law, u * sigmaV) * u * sigmaV)));
      if (!(scale > 0)) return 0;
      const g = (u: number) => ((damperForce(law, u * sigmaV) * u * sigmaV) / scale) * Math.exp(-0.5 * u * u) / Math.sqrt(2 * Math.PI);
      const cuts = [-9, ...lawBreakpoints(law).map((b) => b / sigmaV).filter((u) => Math.abs(u) < 9), 9].sort((a, b) => a - b);
      let sum = 0;
      for (let i = 0; i + 1 < cuts.length; i++) sum += adaptiveSimpson(g, cuts[i]!, cuts[i + 1]!, 1e-12, 40);
      return sum * scale;
    }
  }
}
