/**
 * Energy, effective mass and heat of each of n end stops that share one load (the load case
 * reduced to a straight-line impact by equivalentImpact).
 */
import { InputRangeError, NON_NEGATIVE, POSITIVE, requireInRange } from '../errors.ts';
import type { EquivalentImpact } from './impactLoad.ts';

export interface StopEnergy {
  /** Energy of the whole load over the stroke, J. */
  readonly Etotal: number;
  /** Energy per stop, J. */
  readonly E: number;
  /** Per stop: ½m*v², drive work, gravity work, J. */
  readonly kinetic: number;
  readonly drive: number;
  readonly gravity: number;
  /** Effective mass per stop 2E/v², kg: the mass that, arriving at v with nothing pushing, brings the same energy. */
  readonly me: number;
  /** Energy per hour and mean power per stop, J/h and W. */
  readonly Ehour: number;
  readonly P: number;
  /** Force of an ideal (constant-force) stop, per stop, N. */
  readonly Favg: number;
  /** Deceleration of the load behind ideal stops, m/s² (v²/2s, at R for a rotary load). */
  readonly decel: number;
}

/**
 * Work-energy balance over the stroke, shared equally by n stops that meet the load together.
 *
 * $$E = \frac1n\left[\tfrac12 m^* v^2 + (F + F_g)\,s\right],\qquad m_e = \frac{2E}{v^2},\qquad
 *   E_h = E\,n_h,\qquad \bar P = \frac{E\,n_h}{3600},\qquad F_{avg} = \frac{E}{s}$$
 *
 * @param eq equivalent impact (validated by equivalentImpact); s stroke (0, ∞) m; n stops ≥ 1 (whole number); cph impacts per hour on each stop [0, ∞)
 * @throws InputRangeError naming s, n or cph
 * @example stopEnergy({ m: 20, v: 1, Fdrive: 40, Fgravity: 0 }, 0.025, 1, 60) // { E: 11, me: 22, Ehour: 660 }
 * @source meriam2012 §3/6 and §6/6 work–energy (sections from memory); effective mass 2E/v² is the end-stop trade's sizing quantity (common practice, no source)
 */
export function stopEnergy(eq: EquivalentImpact, s: number, n: number, cph: number): StopEnergy {
  requireInRange('s', s, POSITIVE, 'm');
  requireInRange('n', n, { min: 1, max: 1000 }, '');
  if (!Number.isInteger(n)) throw new InputRangeError('n', n, { min: 1, max: 1000 }, '', 'a whole number of stops');
  requireInRange('cph', cph, NON_NEGATIVE, '1/h');
  const kinetic = (0.5 * eq.m * eq.v * eq.v) / n;
  const drive = (eq.Fdrive * s) / n;
  const gravity = (eq.Fgravity * s) / n;
  const E = kinetic + drive + gravity;
  const Ehour = E * cph;
  return {
    Etotal: E * n, E, kinetic, drive, gravity,
    me: (2 * E) / (eq.v * eq.v),
    Ehour, P: Ehour / 3600,
    Favg: E / s,
    decel: (eq.v * eq.v) / (2 * s),
  };
}
