import { NON_NEGATIVE, POSITIVE, requireInRange } from '../errors.ts';
import { bracketRoots } from '../numeric/bracketRoots.ts';
import { BODY_T_RANGE, bodyCooling, type Body } from './bodyCooling.ts';
import { requireBalanced } from './checkedRoot.ts';
import { fadeCoefficient, type FadeModel } from './fadeCoefficient.ts';
import { timeToLimit } from './warmUpWithLoss.ts';

/** What sets the damper power: a harmonic stroke (P depends on c) or a random road (it does not). */
export type FadeDuty =
  | { readonly kind: 'harmonic'; readonly X: number; readonly omega: number } // m, rad/s
  | { readonly kind: 'random'; readonly P: number }; // W

/** Mean damper power at coefficient c: ½cω²X² for a harmonic stroke, the given P on a random road. */
export function dutyPower(duty: FadeDuty, c: number): number {
  return duty.kind === 'harmonic' ? 0.5 * c * duty.omega ** 2 * duty.X ** 2 : duty.P;
}

export interface FadeEquilibrium {
  /** Every temperature in [Tamb, Tlimit] where heat out equals damper power, ascending. */
  readonly crossings: readonly { readonly T: number; readonly c: number; readonly P: number; readonly stable: boolean }[];
  /** The equilibrium reached when warming from ambient (the lowest crossing), if any below the limit. */
  readonly reached?: { readonly T: number; readonly c: number; readonly P: number };
  /** Time to reach the limit from ambient when no equilibrium stops the rise (needs Cth). */
  readonly tLimit?: number;
  readonly warnings: readonly string[];
}

/**
 * Coupled thermal equilibrium of a damper: the duty sets the power, the power sets the body
 * temperature, the temperature sets the coefficient. Solves f(T) = Q(T) − P(c(T)) = 0 by scanning
 * [T_∞, T_lim] on 400 panels and refining each sign change with Brent's method; stable where f
 * rises through zero; each crossing's remaining imbalance is checked (below 1e-7 of the flows, else
 * a typed error: a jump of the balance, not a root). Bracketing cannot diverge: the answer is every crossing, or none below the
 * limit, in which case the time to the limit comes from t = ∫ C dT/(P − Q).
 *
 * $$f(T) = Q_{out}(T) - P\big(c(T)\big),\quad P = \tfrac12 c\,\omega^2X^2\ \text{(harmonic)}\ \text{or}\ P\ \text{fixed (random road)}$$
 *
 * On a random road the damper power does not depend on c (quarter-car white-noise result), so
 * fade changes the ride, not the temperature.
 *
 * @param body the damper body in air; @param model fade model; @param duty the duty
 * @param Tlimit oil or body limit, K, above Tamb; @param Cth heat capacity, J/K, for the time to the limit
 * @source incropera2007 §1.3 energy balance (from memory); brent1973 ch. 4; fade model: common practice, no source
 */
export function fadeEquilibrium(body: Body, model: FadeModel, duty: FadeDuty, Tlimit: number, Cth?: number): FadeEquilibrium {
  requireInRange('Tlimit', Tlimit, { min: body.Tamb, max: BODY_T_RANGE.max, minExclusive: true }, 'K');
  if (duty.kind === 'harmonic') {
    requireInRange('X', duty.X, NON_NEGATIVE, 'm');
    requireInRange('omega', duty.omega, NON_NEGATIVE, 'rad/s');
  } else requireInRange('P', duty.P, NON_NEGATIVE, 'W');
  const P = (T: number) => dutyPower(duty, fadeCoefficient(model, T));
  const Q = (T: number) => bodyCooling(body, T).Q;
  const f = (T: number) => Q(T) - P(T);
  const lo = body.Tamb;
  const found = bracketRoots(f, lo, Tlimit, 400, 1e-9);
  for (const x of found) {
    const q = bodyCooling(body, x.x);
    requireBalanced(q.Q - P(x.x), Math.max(P(x.x), Math.abs(q.Qconv), Math.abs(q.Qrad), 1e-12), x.x, 'fade equilibrium', 'W');
  }
  const crossings = found.map((x) => ({ T: x.x, c: fadeCoefficient(model, x.x), P: P(x.x), stable: x.direction > 0 }));
  const warnings: string[] = [];
  if (crossings.length > 1) warnings.push(`${crossings.length} equilibria below the limit: the body settles at the lowest when warming from ambient.`);
  const first = f(lo) >= 0 ? { T: lo, c: fadeCoefficient(model, lo), P: P(lo) } : crossings[0];
  if (first) return { crossings, reached: first, warnings };
  let tLimit: number | undefined;
  if (Cth !== undefined) {
    requireInRange('Cth', Cth, POSITIVE, 'J/K');
    tLimit = timeToLimit((T) => -f(T), Cth, lo, Tlimit);
  }
  warnings.push('No equilibrium below the limit: the damper keeps heating until it passes the limit.');
  return { crossings, tLimit, warnings };
}
