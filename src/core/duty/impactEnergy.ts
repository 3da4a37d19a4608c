/**
 * Energy an end stop absorbs when a moving mass arrives at speed v, driven on by a propelling
 * force and (vertical, downward travel) by gravity over the stop's stroke.
 */
import { STANDARD_GRAVITY } from '../constants.ts';
import { NON_NEGATIVE, POSITIVE, requireInRange } from '../errors.ts';
import type { DutySummary } from './dutySummary.ts';

export interface ImpactInput {
  /** Moving mass, kg. */
  readonly m: number;
  /** Impact speed, m/s. */
  readonly v: number;
  /** Propelling force acting on through the stroke (cylinder, drive), N. */
  readonly Fp: number;
  /** Stroke of the stop, m. */
  readonly s: number;
  /** Impacts per hour on this stop. */
  readonly cph: number;
  /** True for vertical travel downward onto the stop (gravity works through the stroke). */
  readonly vertical: boolean;
}

export interface ImpactEnergy {
  /** ½·m·v², J. */
  readonly kinetic: number;
  /** F_p·s, J. */
  readonly propelling: number;
  /** m·g·s (vertical) or 0, J. */
  readonly gravity: number;
  /** Energy per stroke, J. */
  readonly E: number;
  readonly Ehour: number;
  /** Mean power, W. */
  readonly P: number;
  /** Force of an ideal stop (constant force over the stroke), N. */
  readonly Favg: number;
  /** Deceleration of the mass behind an ideal stop, m/s². */
  readonly decel: number;
  readonly summary: DutySummary;
}

/**
 * Work-energy balance over the stroke of the stop.
 *
 * $$E = \tfrac12 m v^2 + F_p s + m g s\,[\text{vertical}],\qquad \bar P = \frac{E\,n_h}{3600},\qquad
 *   F_{avg} = \frac{E}{s},\qquad a = \frac{F_{avg} - F_p - m g[\text{vertical}]}{m} = \frac{v^2}{2s}$$
 *
 * @param i mass (0, ∞) kg, speed (0, ∞) m/s, propelling force [0, ∞) N, stroke (0, ∞) m, impacts per hour [0, ∞)
 * @throws InputRangeError naming the input
 * @example impactEnergy({ m: 12, v: 1.5, Fp: 60, s: 0.025, cph: 1200, vertical: false }).E // 15.0 J
 * @source meriam2012 §3/6 work–energy principle (section from memory); end-stop sizing by this balance is common practice
 */
export function impactEnergy(i: ImpactInput): ImpactEnergy {
  requireInRange('m', i.m, POSITIVE, 'kg');
  requireInRange('v', i.v, POSITIVE, 'm/s');
  requireInRange('Fp', i.Fp, NON_NEGATIVE, 'N');
  requireInRange('s', i.s, POSITIVE, 'm');
  requireInRange('cph', i.cph, NON_NEGATIVE, '1/h');
  const kinetic = 0.5 * i.m * i.v * i.v;
  const propelling = i.Fp * i.s;
  const gravity = i.vertical ? i.m * STANDARD_GRAVITY * i.s : 0;
  const E = kinetic + propelling + gravity;
  const Ehour = E * i.cph;
  const P = Ehour / 3600;
  return {
    kinetic, propelling, gravity, E, Ehour, P,
    Favg: E / i.s,
    decel: (i.v * i.v) / (2 * i.s),
    summary: { meanPower: P },
  };
}
