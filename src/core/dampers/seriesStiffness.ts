import { ComputationError, POSITIVE, requireInRange } from '../errors.ts';
import { damperForce } from './damperForce.ts';
import { energyPerCycle } from './energyPerCycle.ts';
import type { DamperLaw } from './laws.ts';
import { validateLaw } from './validateLaw.ts';

/** A linear damper c in series with a spring k_s (Maxwell element) under harmonic stroke at ω, SI. */
export interface MaxwellStiffness {
  /** Relaxation time τ = c/k_s, s. */
  readonly tau: number;
  /** Storage stiffness K′, N/m: the part of the force in phase with the stroke. */
  readonly Kstorage: number;
  /** Loss stiffness K″, N/m: the part of the force in phase with the stroke velocity. */
  readonly Kloss: number;
  /** Equivalent viscous coefficient of the whole element, c_eq = K″/ω, N·s/m. */
  readonly ceq: number;
  /** Share of the stroke the damper itself takes, |x_d|/|x| = 1/√(1+(ωτ)²). */
  readonly strokeShare: number;
}

/**
 * Storage and loss stiffness of a linear damper c in series with a spring k_s (Maxwell model):
 *
 * $$\tau = \frac{c}{k_s},\quad K' = k_s\frac{(\omega\tau)^2}{1+(\omega\tau)^2},\quad
 *   K'' = k_s\frac{\omega\tau}{1+(\omega\tau)^2},\quad c_{eq} = \frac{K''}{\omega},\quad
 *   \frac{|x_d|}{|x|} = \frac{1}{\sqrt{1+(\omega\tau)^2}},\quad E_D = \pi K'' X^2$$
 *
 * k_s → ∞ recovers the rigid damper (K′ → 0, c_eq → c); a stiff damper on a soft spring (ωτ ≫ 1)
 * acts as the spring (K′ → k_s) and dissipates little.
 *
 * @param ks series stiffness (brace, mount, oil column), N/m, (0, ∞)
 * @param c damping coefficient, N·s/m, (0, ∞)
 * @param omega circular frequency, rad/s, (0, ∞)
 * @example maxwellStiffness(1e7, 1e6, 2 * Math.PI).Kstorage // 2.830e6 N/m (ωτ = 0.6283)
 * @source christopoulos2006 ch. on fluid viscous dampers, Maxwell model (from memory); lakes2009 ch. 2, Maxwell solid (from memory); the expressions themselves are a closed form
 */
export function maxwellStiffness(ks: number, c: number, omega: number): MaxwellStiffness {
  requireInRange('ks', ks, POSITIVE, 'N/m');
  requireInRange('c', c, POSITIVE, 'N·s/m');
  requireInRange('f', omega, POSITIVE, 'rad/s');
  const tau = c / ks;
  const wt = omega * tau;
  const d = 1 + wt * wt;
  const Kloss = (ks * wt) / d;
  return { tau, Kstorage: (ks * wt * wt) / d, Kloss, ceq: Kloss / omega, strokeShare: 1 / Math.sqrt(d) };
}

/** A damper law in series with a spring under harmonic stroke X sin ωt of the whole element, SI. */
export interface SeriesHarmonic extends MaxwellStiffness {
  /** Stroke amplitude of the damper itself, m. */
  readonly Xd: number;
  /** Energy per cycle, J (π·K″·X²). */
  readonly E: number;
  /** Mean power, W. */
  readonly P: number;
  /** Peak damper force at the damper's own peak velocity ωX_d (both directions), N. */
  readonly Fmax: number;
  /** Peak velocity of the damper itself, ωX_d, m/s. */
  readonly vmax: number;
  /** True when a friction damper never slips: the spring takes the whole stroke (first harmonic). */
  readonly stuck: boolean;
}

/**
 * Any damper law in series with a spring k_s, by equivalent linearisation (first harmonic): the
 * damper strokes x_d = X_d sin(ωt − φ) and is replaced by the linear c(X_d) that dissipates its
 * energy per cycle at that stroke, c(X_d) = E_D(X_d)/(πωX_d²). The force through the spring then
 * equals the damper force, which fixes X_d:
 *
 * $$X^2 = X_d^2 + \left(\frac{F_1(X_d)}{k_s}\right)^2,\qquad F_1 = c(X_d)\,\omega X_d = \frac{E_D(X_d)}{\pi X_d}$$
 *
 * F₁ never falls as X_d grows for these laws, so the right side rises monotonically and X_d is
 * found by bisection; K′, K″ and c_eq then follow from maxwellStiffness with c(X_d). For the linear
 * law this is exact. A friction damper whose slip force 4F_f/π exceeds k_s·X never slips. For a
 * bilinear law with unequal rebound and compression the damper would also drift; the first harmonic
 * ignores that offset.
 *
 * @param law damper law (hysteretic: η acts on its own k, c = ηk/ω)
 * @param ks series stiffness, N/m, (0, ∞)
 * @param X stroke amplitude of the whole element (spring + damper), m, (0, ∞)
 * @param omega circular frequency, rad/s, (0, ∞)
 * @example seriesHarmonic({ kind: 'linear', c: 1e6 }, 1e7, 0.01, 2 * Math.PI).E // 1415.2 J (π·K″·X²)
 * @source christopoulos2006 (Maxwell model, from memory); chopra2017 §3.9 (equivalent viscous damping, from memory); linearisation: common practice, no source
 */
export function seriesHarmonic(law: DamperLaw, ks: number, X: number, omega: number): SeriesHarmonic {
  validateLaw(law);
  requireInRange('ks', ks, POSITIVE, 'N/m');
  requireInRange('X', X, POSITIVE, 'm');
  requireInRange('f', omega, POSITIVE, 'rad/s');
  const F1 = (xd: number) => energyPerCycle(law, xd, omega) / (Math.PI * xd);
  const g = (xd: number) => Math.hypot(xd, F1(xd) / ks) - X;
  let lo = 0;
  let hi = X;
  if (g(X * 1e-12) >= 0) return stuckResult(ks, X);
  for (let i = 0; i < 200 && hi - lo > 1e-15 * X; i++) {
    const mid = 0.5 * (lo + hi);
    if (g(mid) < 0) lo = mid; else hi = mid;
  }
  const Xd = 0.5 * (lo + hi);
  const c = F1(Xd) / (omega * Xd);
  if (!(c > 0)) return stuckResult(ks, X);
  const m = maxwellStiffness(ks, c, omega);
  const E = Math.PI * m.Kloss * X * X;
  if (!Number.isFinite(E)) throw new ComputationError('series stiffness: energy per cycle is not finite');
  const vmax = omega * Xd;
  const Fmax = Math.max(Math.abs(damperForce(law, vmax, omega)), Math.abs(damperForce(law, -vmax, omega)));
  return { ...m, strokeShare: Xd / X, Xd, E, P: (E * omega) / (2 * Math.PI), Fmax, vmax, stuck: false };
}

// a friction damper that never slips: the spring carries k_s·X and nothing is dissipated
function stuckResult(ks: number, X: number): SeriesHarmonic {
  return { tau: Infinity, Kstorage: ks, Kloss: 0, ceq: 0, strokeShare: 0, Xd: 0, E: 0, P: 0, Fmax: ks * X, vmax: 0, stuck: true };
}
