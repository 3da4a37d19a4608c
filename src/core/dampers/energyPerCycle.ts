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
 * The bilinear law integrates in closed form too (bilinearEnergyPerCycle); the quadrature
 * (energyPerCycleQuadrature) is kept as the independent check of every closed form here.
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
      return bilinearEnergyPerCycle(law, X, omega);
  }
}

/**
 * Energy per cycle of the bilinear law in closed form. Each half cycle (rebound v > 0,
 * compression v < 0) with peak velocity V = ωX above the knee v_k strokes above it for the phase
 * angles |θ| < θ_k = arccos(v_k/V); integrating |F| = c₂V cos θ + (c₁ − c₂)v_k there and c₁V cos θ
 * elsewhere against X cos θ dθ gives, per side,
 *
 * $$E_{side} = XV\left[\frac{\pi}{2}c_1 + (c_2 - c_1)\left(\theta_k - \frac{v_k}{V}\sin\theta_k\right)\right],\qquad
 *   E_{side} = \frac{\pi}{2}c_1 V X\ \ (V \le v_k)$$
 *
 * With c₁ = c₂ = c both sides sum to π c ω X² (Chopra eq. 3.8.1); with v_k → 0 to π c₂ ω X².
 * Written as c₁B + c₂A with A = θ_k − ½ sin 2θ_k (the phase share above the knee) and
 * B = π/2 − A = arcsin(v_k/V) + (v_k/V) sin θ_k, each computed without cancellation (A by its
 * series when θ_k is small), so a knee just below the peak velocity, or far below it with one slope
 * zero, keeps full relative accuracy.
 *
 * @param law the bilinear law
 * @param X displacement amplitude, m (validated by energyPerCycle)
 * @param omega circular frequency, rad/s
 * @example bilinearEnergyPerCycle({ kind: 'bilinear', rebound: { c1: 3600, c2: 1080 }, compression: { c1: 1200, c2: 360 }, vknee: 0.1 }, 0.05, 4 * Math.PI) // 104.51876 J (quadrature: the same to 4e-16)
 * @source integral of the piecewise-linear law over one cycle (common practice, no source); checked against energyPerCycleQuadrature and, in its limits, chopra2017 eq. 3.8.1
 */
export function bilinearEnergyPerCycle(law: Extract<DamperLaw, { kind: 'bilinear' }>, X: number, omega: number): number {
  const V = X * omega;
  const ck = law.vknee / V; // cos θ_k
  let A = 0; // θ_k − ½ sin 2θ_k: the share of the phase above the knee (0 when V never reaches it)
  let B = Math.PI / 2; // π/2 − A
  if (ck < 1) {
    const sk = Math.sqrt((1 - ck) * (1 + ck)); // sin θ_k
    A = xMinusSin(2 * Math.atan2(sk, ck)) / 2;
    B = Math.atan2(ck, sk) + ck * sk;
  }
  const side = (c: { readonly c1: number; readonly c2: number }) => c.c1 * B + c.c2 * A;
  return X * V * (side(law.rebound) + side(law.compression));
}

/** x − sin x without cancellation: its Taylor series for |x| < 0.5 (7 terms, below 1e-17 relative). */
function xMinusSin(x: number): number {
  if (Math.abs(x) >= 0.5) return x - Math.sin(x);
  const x2 = x * x;
  // x³/3! − x⁵/5! + x⁷/7! − …, nested
  return (x * x2 / 6) * (1 - (x2 / 20) * (1 - (x2 / 42) * (1 - (x2 / 72) * (1 - (x2 / 110) * (1 - (x2 / 156) * (1 - x2 / 210))))));
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
