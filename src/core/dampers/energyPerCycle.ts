import { POSITIVE, requireInRange } from '../errors.ts';
import { adaptiveSimpson } from '../numeric/adaptiveSimpson.ts';
import { damperForce, lawBreakpoints } from './damperForce.ts';
import { lambdaAlpha } from './lambdaAlpha.ts';
import type { DamperLaw } from './laws.ts';
import { validateLaw } from './validateLaw.ts';

/**
 * Energy a damper dissipates in one cycle of harmonic motion x = X sin ωt, J (closed forms).
 *
 * $$E_D = \pi c\omega X^2\ (\text{linear}),\quad \lambda(\alpha) C\omega^\alpha X^{1+\alpha}\ (\text{power}),\quad
 *   4F_fX\ (\text{Coulomb}),\quad \pi\eta k X^2\ (\text{hysteretic})$$
 *
 * The bilinear law has no tidy closed form over a knee; it is integrated numerically
 * (energyPerCycleQuadrature), which tests check against every closed form above.
 *
 * @param law damper law
 * @param X displacement amplitude across the damper, m, (0, ∞)
 * @param omega circular frequency, rad/s, (0, ∞)
 * @source chopra2017 eq. 3.8.1 (linear; published) and §3.10 (Coulomb, hysteretic; from memory); fema274 §9.3 (power law; from memory)
 */
export function energyPerCycle(law: DamperLaw, X: number, omega: number): number {
  validateLaw(law);
  requireInRange('X', X, POSITIVE, 'm');
  requireInRange('f', omega, POSITIVE, 'rad/s');
  switch (law.kind) {
    case 'linear':
      return Math.PI * law.c * omega * X * X;
    case 'power':
      return lambdaAlpha(law.alpha) * law.C * Math.pow(omega, law.alpha) * Math.pow(X, 1 + law.alpha);
    case 'coulomb':
      return 4 * law.Ff * X;
    case 'hysteretic':
      return Math.PI * law.eta * law.k * X * X;
    case 'bilinear':
      return energyPerCycleQuadrature(law, X, omega);
  }
}

/**
 * Energy per cycle by quadrature of the power over one period, for any law:
 *
 * $$E_D = \oint F\,dx = \int_0^{2\pi} F(X\omega\cos\theta)\,X\cos\theta\,d\theta$$
 *
 * split at the phase angles where the law kinks, so adaptive Simpson converges fast.
 * Relative accuracy about 1e-10.
 *
 * @source lyness1969 (quadrature)
 */
export function energyPerCycleQuadrature(law: DamperLaw, X: number, omega: number): number {
  validateLaw(law);
  requireInRange('X', X, POSITIVE, 'm');
  requireInRange('f', omega, POSITIVE, 'rad/s');
  const V = X * omega;
  // the force is integrated in units of its peaks and the amplitude multiplied in at the end, so a
  // tiny X (or force) cannot turn the integrand into subnormal noise that no tolerance can meet
  const Fs = Math.abs(damperForce(law, V, omega)) + Math.abs(damperForce(law, -V, omega));
  if (!(Fs > 0)) return 0;
  const integrand = (th: number): number => {
    const c = Math.cos(th);
    return (damperForce(law, V * c, omega) / Fs) * c;
  };
  // phase angles in [0, π] where v = V cos θ crosses a breakpoint; the cycle is symmetric in θ → 2π − θ
  const cuts = [0, Math.PI];
  for (const b of lawBreakpoints(law)) if (Math.abs(b) < V) cuts.push(Math.acos(b / V));
  cuts.sort((a, b) => a - b);
  let half = 0;
  for (let i = 0; i + 1 < cuts.length; i++) {
    const a = cuts[i]!;
    const b = cuts[i + 1]!;
    if (b - a > 1e-15) half += adaptiveSimpson(integrand, a, b, 1e-13, 40);
  }
  return 2 * half * X * Fs;
}
