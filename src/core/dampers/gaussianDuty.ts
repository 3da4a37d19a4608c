import { ComputationError, POSITIVE, requireInRange } from '../errors.ts';
import { adaptiveSimpson } from '../numeric/adaptiveSimpson.ts';
import { gamma } from '../numeric/gamma.ts';
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
      const pdf = (v: number) => Math.exp((-0.5 * v * v) / (sigmaV * sigmaV)) / (sigmaV * Math.sqrt(2 * Math.PI));
      const f = (v: number) => damperForce(law, v) * v * pdf(v);
      const cuts = [-9 * sigmaV, ...lawBreakpoints(law).filter((b) => Math.abs(b) < 9 * sigmaV), 9 * sigmaV].sort((a, b) => a - b);
      let sum = 0;
      const scale = Math.abs(damperForce(law, sigmaV) * sigmaV) + Math.abs(damperForce(law, -sigmaV) * sigmaV);
      for (let i = 0; i + 1 < cuts.length; i++) sum += adaptiveSimpson(f, cuts[i]!, cuts[i + 1]!, scale * 1e-12, 40);
      return sum;
    }
  }
}
