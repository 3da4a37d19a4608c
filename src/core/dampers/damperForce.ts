import { ComputationError } from '../errors.ts';
import type { DamperLaw } from './laws.ts';

/**
 * Damper force at relative velocity v (m/s), N, with the sign of v.
 *
 * $$F = c v,\quad F = C|v|^\alpha\,\mathrm{sgn}\,v,\quad F = F_f\,\mathrm{sgn}\,v,\quad
 *   F = \begin{cases} c_1 v & |v|\le v_k\\ \mathrm{sgn}(v)\,[c_1 v_k + c_2(|v|-v_k)] & |v|>v_k\end{cases},\quad
 *   F = \frac{\eta k}{\omega} v$$
 *
 * @param law a validated law (see validateLaw)
 * @param v relative velocity, m/s
 * @param omega circular frequency, rad/s — needed only by the hysteretic law
 * @source chopra2017 §3.8 (viscous), §3.10 (Coulomb, hysteretic; from memory); fema274 §9.3 (power law, from memory); dixon2007 ch. 5 (bilinear tuning, from memory)
 */
export function damperForce(law: DamperLaw, v: number, omega = NaN): number {
  const s = Math.sign(v);
  const a = Math.abs(v);
  switch (law.kind) {
    case 'linear':
      return law.c * v;
    case 'power':
      return s * law.C * Math.pow(a, law.alpha);
    case 'coulomb':
      return s * law.Ff;
    case 'bilinear': {
      const side = v >= 0 ? law.rebound : law.compression;
      const mag = a <= law.vknee ? side.c1 * a : side.c1 * law.vknee + side.c2 * (a - law.vknee);
      return s * mag;
    }
    case 'hysteretic':
      if (!(omega > 0)) throw new ComputationError('hysteretic damper force needs the circular frequency ω > 0');
      return ((law.eta * law.k) / omega) * v;
  }
}

/** Velocities where the law has a kink or jump (quadrature splits there). */
export function lawBreakpoints(law: DamperLaw): number[] {
  if (law.kind === 'bilinear') return [-law.vknee, 0, law.vknee];
  if (law.kind === 'coulomb' || law.kind === 'power') return [0];
  return [];
}
