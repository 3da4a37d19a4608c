import { add, complex, div, mul, sub, type Complex } from '../complex/index.ts';

/** Dimensionless two-degree-of-freedom system: primary (m_1, k_1, ζ_1) carrying an absorber. */
export interface TmdSystem {
  /** mass ratio m_a/m_1 */ readonly mu: number;
  /** frequency ratio ω_a/ω_1 */ readonly f: number;
  /** absorber damping ratio c_a/(2 m_a ω_a) */ readonly zeta: number;
  /** primary damping ratio c_1/(2 m_1 ω_1), 0 for Den Hartog's undamped primary */ readonly zeta1: number;
}

export interface TmdPhasors {
  /** primary displacement (relative to the base for 'base'), per static unit */ readonly x1: Complex;
  /** absorber stroke x_a − x_1, per static unit */ readonly z: Complex;
}

/**
 * Exact steady response of a primary with an absorber at frequency ratio β = ω/ω_1, by solving
 * the 2×2 complex system (Cramer's rule). With $D = f^2 + 2i\zeta f\beta$:
 * $$\begin{bmatrix}1-\beta^2+2i\zeta_1\beta+\mu D & -\mu D\\ -\mu D & \mu(D-\beta^2)\end{bmatrix}
 *   \begin{bmatrix}X_1\\X_a\end{bmatrix} = \mathbf b,$$
 * b = (1, 0) for a force (unit F_0/k_1) and b = (−1, −μ) for a base acceleration (relative
 * coordinates, unit m_1 a/k_1 = a/ω_1²).
 *
 * @param s the system (μ > 0, f > 0, ζ ≥ 0, ζ_1 ≥ 0; not validated here: callers validate)
 * @param beta frequency ratio ω/ω_1, > 0
 * @param load 'force' or 'base'
 * @example abs(tmdResponse({ mu: 0.1, f: 1 / 1.1, zeta: 0.1679, zeta1: 0 }, 1, 'force').x1) // 3.985796 (|X_1| in units of F_0/k_1 at β = 1)
 * @source denHartog1956 ch. 3, the damped vibration absorber (same system written as a matrix; from memory)
 */
export function tmdResponse(s: TmdSystem, beta: number, load: 'force' | 'base'): TmdPhasors {
  const D = complex(s.f * s.f, 2 * s.zeta * s.f * beta);
  const muD = mul(complex(s.mu), D);
  const a11 = add(complex(1 - beta * beta, 2 * s.zeta1 * beta), muD);
  const a12 = complex(-muD.re, -muD.im);
  const a22 = mul(complex(s.mu), sub(D, complex(beta * beta)));
  const b1 = complex(load === 'force' ? 1 : -1);
  const b2 = complex(load === 'force' ? 0 : -s.mu);
  const det = sub(mul(a11, a22), mul(a12, a12));
  const x1 = div(sub(mul(b1, a22), mul(a12, b2)), det);
  const xa = div(sub(mul(a11, b2), mul(a12, b1)), det);
  return { x1, z: sub(xa, x1) };
}
