/**
 * Participation factor and effective modal mass of one mode of a lumped-mass structure under
 * uniform base acceleration.
 */
import { InputRangeError, POSITIVE, requireInRange } from '../errors.ts';

export interface ModalFactors {
  /** Σ m_i φ_i², kg (generalized mass with the given scaling of φ). */
  readonly generalizedMass: number;
  /** Γ = Σ m_i φ_i / Σ m_i φ_i² (for φ scaled to 1 at the roof: roof displacement per unit spectral displacement). */
  readonly gamma: number;
  /** Effective modal mass as a fraction of the total mass, (Σ m φ)² / (Σ m φ² · Σ m). */
  readonly massFraction: number;
}

/**
 * $$\tilde M = \sum_i m_i\phi_i^2,\qquad \Gamma = \frac{\sum_i m_i\phi_i}{\tilde M},\qquad
 *   \frac{M^*}{\sum m} = \frac{(\sum_i m_i\phi_i)^2}{\tilde M\sum_i m_i}$$
 *
 * @param m floor masses, kg, each > 0
 * @param phi mode shape at the same floors (any scale; not all zero)
 * @throws InputRangeError naming `phi` when the shape is all zero or a length differs
 * @example modalFactors([2, 1], [0.5, 1]).gamma // 1.333333 (Γ = (1 + 1)/(0.5 + 1))
 * @source chopra2017 §13.2, modal participation factor Γ_n = L_n/M_n and effective modal mass (from memory)
 */
export function modalFactors(m: readonly number[], phi: readonly number[]): ModalFactors {
  if (phi.length !== m.length) throw new InputRangeError('phi', `${phi.length} values`, undefined, '', `one mode-shape value per floor mass (${m.length})`);
  m.forEach((v, i) => requireInRange(`m[${i + 1}]`, v, POSITIVE, 'kg'));
  let L = 0;
  let Mg = 0;
  let total = 0;
  for (let i = 0; i < m.length; i++) {
    requireInRange(`phi[${i + 1}]`, phi[i]!, { min: -1e6, max: 1e6 }, '');
    L += m[i]! * phi[i]!;
    Mg += m[i]! * phi[i]! * phi[i]!;
    total += m[i]!;
  }
  if (!(Mg > 0)) throw new InputRangeError('phi', 0, undefined, '', 'the mode shape is zero at every floor');
  return { generalizedMass: Mg, gamma: L / Mg, massFraction: (L * L) / (Mg * total) };
}
