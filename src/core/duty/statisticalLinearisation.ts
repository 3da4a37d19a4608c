/**
 * Equivalent linear damping of a power-law damper under Gaussian random motion, iterated to
 * consistency with the response it produces.
 */
import { ComputationError } from '../errors.ts';
import { gaussianMomentFactor } from '../dampers/index.ts';

export interface Linearised {
  /** Equivalent viscous coefficient, N·s/m. */
  readonly ceq: number;
  /** RMS velocity consistent with ceq, m/s. */
  readonly sigmaV: number;
  readonly iterations: number;
}

/**
 * Fixed point of $c_{eq} = C\,\kappa(\alpha)\,\sigma_v(c_{eq})^{\alpha-1}$.
 *
 * Minimising the mean-square error between C|v|^α sgn v and c_eq·v for Gaussian v gives
 * $$c_{eq} = \frac{E[F(v)\,v]}{E[v^2]} = C\,\kappa(\alpha)\,\sigma_v^{\alpha-1},$$
 * so c_eq·σ_v² = C κ σ_v^{1+α}: the linearised damper dissipates the same mean power.
 * Solved in logarithms by a secant iteration (the plain fixed-point map contracts only by |1 − α|/2 per step).
 *
 * @param C power-law coefficient, N·(s/m)^α; alpha (0, 2]
 * @param sigmaVOf RMS damper velocity of the linear system with damping c, m/s
 * @param c0 starting guess, N·s/m
 * @param tol relative change of c_eq that ends the iteration, default 1e-10
 * @throws ComputationError when 200 steps do not reach tol
 * @example statisticalLinearisation(800, 0.5, (c) => Math.sqrt(40 / c), 1000).ceq // 1776.06 N·s/m (σ_v = 0.150072 m/s)
 * @source roberts2003 ch. 5 (statistical linearisation, Gaussian closure; chapter from memory)
 */
export function statisticalLinearisation(C: number, alpha: number, sigmaVOf: (c: number) => number, c0: number, tol = 1e-10): Linearised {
  const k = C * gaussianMomentFactor(alpha);
  // Secant on h(x) = ln c_eq(σ(eˣ)) − x in x = ln c, started from one fixed-point step; the plain
  // fixed-point map contracts only by |1 − α|/2, the secant converges in a handful of steps.
  const h = (x: number): number => {
    const next = k * sigmaVOf(Math.exp(x)) ** (alpha - 1);
    if (!(next > 0) || !Number.isFinite(next)) throw new ComputationError('statistical linearisation: equivalent damping not finite');
    return Math.log(next) - x;
  };
  let x0 = Math.log(c0);
  let h0 = h(x0);
  let x1 = x0 + h0;
  for (let i = 1; i <= 200; i++) {
    const h1 = h(x1);
    if (Math.abs(h1) < tol) { const c = Math.exp(x1 + h1); return { ceq: c, sigmaV: sigmaVOf(c), iterations: i }; }
    const slope = (h1 - h0) / (x1 - x0);
    // h' = (α−1)·d ln σ/d ln c − 1 lies in about [−1.5, −0.5]; fall back to a fixed-point step otherwise
    const step = slope < -0.1 && slope > -10 ? -h1 / slope : h1;
    x0 = x1; h0 = h1; x1 += step;
  }
  throw new ComputationError(`statistical linearisation did not converge to ${tol} in 200 steps`);
}

/**
 * Where the iteration starts: the equivalent damping c = C·K(α)·σ_v^(α−1) at σ_v = 0.3 m/s, a
 * typical RMS damper velocity of a vehicle suspension on a rough road (common practice, no source).
 * @example linearisationStart(800, 1) // 800 to rounding (a linear law is its own equivalent)
 * @example linearisationStart(800, 0.5) // 1256.17 = 800 · κ(0.5) / √0.3, κ(0.5) = 0.86004
 */
export function linearisationStart(C: number, alpha: number): number {
  return C * gaussianMomentFactor(alpha) * 0.3 ** (alpha - 1);
}
