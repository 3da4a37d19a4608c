import { brentRoot } from '../numeric/brent.ts';
import { NON_NEGATIVE, POSITIVE, requireInRange } from '../errors.ts';
import { dampingCorrection, ETA_FLOOR } from './dampingModification.ts';

export interface DampedDemand {
  /** Roof displacement amplitude with the dampers, m. */
  readonly roof: number;
  /** Total damping ratio ξ₀ + ξ_d(roof) and the correction factor η at it. */
  readonly xiTotal: number;
  readonly eta: number;
}

/**
 * Roof displacement of a frame whose added damping depends on its own amplitude (dampers with
 * α ≠ 1, friction): the 5 %-damped demand u₅ reduced by the damping correction factor at the
 * damping that amplitude gives,
 *
 * $$u = \eta\big(\xi_0 + \xi_d(u)\big)\,u_5,$$
 *
 * solved by Brent's method on [0.55·u₅, η(ξ₀)·u₅], where the two sides change sign because
 * ξ_d ≥ 0 and η ≥ 0.55. For linear dampers ξ_d is constant and the root is u = η(ξ₀ + ξ_d)·u₅.
 *
 * @param u5 roof displacement amplitude of the 5 %-damped analysis or spectrum, m, > 0
 * @param xi0 inherent damping ratio of the frame, [0, 1]
 * @param xiD supplemental damping ratio at a roof amplitude (≥ 0, finite)
 * @example dampedDemand(0.1, 0.05, () => 0.05).roof // 0.08165 (η(10 %) = 0.8165)
 * @source en1998_1 eq. (3.6) (η; published); fema356 §9.3.4 (iteration on the target displacement for nonlinear dampers; from memory)
 */
export function dampedDemand(u5: number, xi0: number, xiD: (roof: number) => number): DampedDemand {
  requireInRange('u5', u5, POSITIVE, 'm');
  requireInRange('xi0', xi0, { min: 0, max: 1 }, '');
  const xiAt = (u: number) => xi0 + requireInRange('xiD', xiD(u), NON_NEGATIVE, '');
  // η is flat at 0.55 above ξ ≈ 28 %: clamp ξ so any larger damping reads as the floor
  const etaAt = (u: number) => dampingCorrection(Math.min(1, xiAt(u)));
  const lo = ETA_FLOOR * u5;
  const hi = dampingCorrection(xi0) * u5;
  const roof = hi - lo <= 1e-15 * u5 ? lo : brentRoot((u) => etaAt(u) * u5 - u, lo, hi, { xTol: 1e-13 * u5 });
  return { roof, xiTotal: xiAt(roof), eta: etaAt(roof) };
}
