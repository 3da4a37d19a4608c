/**
 * Supplemental damping of dampers spread over the storeys of a frame, by the energy method in the
 * fundamental mode: every storey drifts as the mode shape says, every damper runs one harmonic
 * cycle per period, and the energy they dissipate is set against the strain energy of the mode.
 */
import { damperForce, energyPerCycle, type DamperLaw, validateLaw } from '../dampers/index.ts';
import { ComputationError, InputRangeError, POSITIVE, requireInRange } from '../errors.ts';

export interface DamperStorey {
  /** Identical dampers acting in this storey and direction (a whole number, 0 allowed). */
  readonly n: number;
  /** Brace angle to the horizontal, rad, [0, π/2): stroke = storey drift × cos θ. */
  readonly theta: number;
}

export interface StoreyDampingInput {
  readonly law: DamperLaw;
  /** Period of the mode, s. */
  readonly T: number;
  /** Floor masses, kg, and the mode shape at the floors (bottom first; scaled to 1 at the roof here). */
  readonly m: readonly number[];
  readonly phi: readonly number[];
  readonly storeys: readonly DamperStorey[];
  /** Roof displacement amplitude, m. */
  readonly roof: number;
}

export interface StoreyDuty {
  /** Storey drift amplitude Δ_j = A·|φ_j − φ_{j−1}|, m. */
  readonly drift: number;
  /** Stroke δ_j = Δ_j cos θ_j, peak velocity ωδ_j and peak axial force of one damper. */
  readonly stroke: number;
  readonly vPeak: number;
  readonly Fpeak: number;
  /** Energy per cycle of one damper, J. */
  readonly W: number;
}

export interface StoreyDamping {
  readonly storeys: readonly StoreyDuty[];
  /** Σ_j n_j W_j, J, and the modal strain energy W_k = ½ω²A²Σm φ², J. */
  readonly Wtotal: number;
  readonly Wk: number;
  /** Supplemental damping ratio ξ_d = ΣW/(4πW_k). */
  readonly xiD: number;
}

/**
 * $$\Delta_j = A|\phi_j - \phi_{j-1}|,\quad \delta_j = \Delta_j\cos\theta_j,\quad
 *   W_k = \tfrac12\omega^2A^2\sum_i m_i\phi_i^2,\quad \xi_d = \frac{\sum_j n_jW_j(\delta_j,\omega)}{4\pi W_k}$$
 *
 * with φ scaled to 1 at the roof and W_j the energy per cycle of the law. For linear dampers this
 * is ξ_d = T Σ_j c_j cos²θ_j φ_rj² / (4π Σ m_i φ_i²), for F = C|v|^α
 * ξ_d = Σ_j λ(α) C_j cos^{1+α}θ_j φ_rj^{1+α} / (2π A^{1−α} ω^{2−α} Σ m_i φ_i²) (φ_rj = φ_j − φ_{j−1}).
 *
 * @throws InputRangeError naming the input (`n[j]`, `theta[j]`, `roof`, `T`, …); ComputationError when no storey has a damper
 * @example storeyDamping({ law: { kind: 'linear', c: 1e5 }, T: 1, m: [1e7 / (4 * Math.PI ** 2)], phi: [1], storeys: [{ n: 1, theta: 0 }], roof: 0.02 }).xiD // 0.0314159 (π/100: one storey, ζ = cω/(2k))
 * @source fema356 §9.3.4, eqs. 9-36 (linear) and 9-39 (nonlinear) (equation numbers from memory); asce41_17 §14.3 (from memory); fema274 §9.3 λ(α) (from memory)
 */
export function storeyDamping(d: StoreyDampingInput): StoreyDamping {
  validateLaw(d.law);
  requireInRange('T', d.T, POSITIVE, 's');
  requireInRange('roof', d.roof, POSITIVE, 'm');
  const N = d.m.length;
  if (d.phi.length !== N || d.storeys.length !== N) throw new InputRangeError('storeys', `${d.storeys.length} storeys`, undefined, '', `one damper row and one mode value per floor mass (${N})`);
  const top = d.phi[N - 1]!;
  if (!(Math.abs(top) > 0)) throw new InputRangeError('phi', 0, undefined, '', 'the mode shape must not be zero at the roof');
  const phi = d.phi.map((p) => p / top);
  const omega = (2 * Math.PI) / d.T;
  let Mg = 0;
  let Wtotal = 0;
  let dampers = 0;
  const storeys = d.storeys.map((s, j) => {
    requireInRange(`m[${j + 1}]`, d.m[j]!, POSITIVE, 'kg');
    requireInRange(`n[${j + 1}]`, s.n, { min: 0, max: 1000 }, '');
    if (!Number.isInteger(s.n)) throw new InputRangeError(`n[${j + 1}]`, s.n, { min: 0, max: 1000 }, '', 'a whole number of dampers');
    requireInRange(`theta[${j + 1}]`, s.theta, { min: 0, max: Math.PI / 2, maxExclusive: true }, 'rad');
    Mg += d.m[j]! * phi[j]! * phi[j]!;
    const drift = d.roof * Math.abs(phi[j]! - (j > 0 ? phi[j - 1]! : 0));
    const stroke = drift * Math.cos(s.theta);
    const vPeak = omega * stroke;
    const moving = stroke > 0;
    const W = moving ? energyPerCycle(d.law, stroke, omega) : 0;
    const Fpeak = moving ? Math.max(Math.abs(damperForce(d.law, vPeak, omega)), Math.abs(damperForce(d.law, -vPeak, omega))) : 0;
    Wtotal += s.n * W;
    dampers += s.n;
    return { drift, stroke, vPeak, Fpeak, W };
  });
  if (dampers === 0) throw new ComputationError('no storey has a damper: give at least one storey a damper count above 0');
  const Wk = 0.5 * omega * omega * d.roof * d.roof * Mg;
  return { storeys, Wtotal, Wk, xiD: Wtotal / (4 * Math.PI * Wk) };
}
