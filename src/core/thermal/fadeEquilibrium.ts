import { ComputationError, NON_NEGATIVE, POSITIVE, requireInRange } from '../errors.ts';
import { bracketRoots } from '../numeric/bracketRoots.ts';
import { BODY_T_RANGE, bodyCooling, bodyHeatLoss, type Body } from './bodyCooling.ts';
import { requireBalanced } from './checkedRoot.ts';
import { fadeCoefficient, type FadeModel } from './fadeCoefficient.ts';
import { timeToLimit } from './warmUpWithLoss.ts';
import { twoNodeWarmUp } from './twoNodeWarmUp.ts';

/** The oil node of a two-node damper: conductance to the body, W/K, and (for the time to the limit) its heat capacity, J/K. */
export interface OilNode {
  readonly Gob: number;
  readonly Coil?: number;
}

/**
 * Oil temperature of a two-node damper in equilibrium at body temperature T_b: all the heat the
 * body sheds, Q(T_b), has crossed from the oil (a net gain, Q < 0, is taken as no flow: the oil then
 * sits at the body temperature).
 */
export function oilAtBody(Q: number, Tb: number, oil: OilNode | undefined): number {
  return oil ? Tb + Math.max(0, Q) / oil.Gob : Tb;
}

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
  readonly crossings: readonly { readonly T: number; readonly Toil: number; readonly c: number; readonly P: number; readonly stable: boolean }[];
  /** The equilibrium reached when warming from ambient (the lowest crossing), if any below the limit. */
  readonly reached?: { readonly T: number; readonly Toil: number; readonly c: number; readonly P: number };
  /** Time to reach the limit from ambient when no equilibrium stops the rise (needs Cth). */
  readonly tLimit?: number | undefined;
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
 * **Two nodes** (`oil` given): the coefficient follows the oil, which in equilibrium runs
 * Q(T_b)/G_ob above the body, so the scan stays on the body temperature and the balance reads
 * f(T_b) = Q(T_b) − P(c(T_b + Q(T_b)/G_ob)); crossings whose oil is above the limit are dropped. The
 * time to the limit is then the two-node run (`twoNodeWarmUp`) to the oil reaching the limit, with
 * the body node holding C − C_oil.
 *
 * @param body the damper body in air; @param model fade model; @param duty the duty
 * @param Tlimit oil or body limit, K, above Tamb; @param Cth heat capacity, J/K, for the time to the limit
 * @param oil optional oil node (two-node model): G_ob (0, ∞) W/K; C_oil (0, Cth) J/K for the time to the limit
 * @source incropera2007 §1.3 energy balance (from memory); brent1973 ch. 4; fade model: common practice, no source
 */
export function fadeEquilibrium(body: Body, model: FadeModel, duty: FadeDuty, Tlimit: number, Cth?: number, oil?: OilNode): FadeEquilibrium {
  requireInRange('Tlimit', Tlimit, { min: body.Tamb, max: BODY_T_RANGE.max, minExclusive: true }, 'K');
  if (duty.kind === 'harmonic') {
    requireInRange('X', duty.X, NON_NEGATIVE, 'm');
    requireInRange('omega', duty.omega, NON_NEGATIVE, 'rad/s');
  } else requireInRange('P', duty.P, NON_NEGATIVE, 'W');
  if (oil) requireInRange('Gob', oil.Gob, POSITIVE, 'W/K');
  const Q = bodyHeatLoss(body);
  const To = (T: number) => oilAtBody(Q(T), T, oil);
  // one node: To(T) = T, so P(T) and f(T) are the one-node expressions
  const P = (T: number) => dutyPower(duty, fadeCoefficient(model, To(T)));
  const f = (T: number) => Q(T) - P(T);
  const lo = body.Tamb;
  const found = bracketRoots(f, lo, Tlimit, 400, 1e-9).filter((x) => To(x.x) <= Tlimit);
  for (const x of found) {
    const q = bodyCooling(body, x.x);
    requireBalanced(q.Q - P(x.x), Math.max(P(x.x), Math.abs(q.Qconv), Math.abs(q.Qrad), Math.abs(q.Qmount), q.Qsun, 1e-12), x.x, 'fade equilibrium', 'W');
  }
  const crossings = found.map((x) => ({ T: x.x, Toil: To(x.x), c: fadeCoefficient(model, To(x.x)), P: P(x.x), stable: x.direction > 0 }));
  const warnings: string[] = [];
  if (crossings.length > 1) warnings.push(`${crossings.length} equilibria below the limit: the body settles at the lowest when warming from ambient.`);
  const first = f(lo) >= 0 ? { T: lo, Toil: To(lo), c: fadeCoefficient(model, To(lo)), P: P(lo) } : crossings[0];
  if (first) return { crossings, reached: first, warnings };
  let tLimit: number | undefined;
  if (Cth !== undefined) {
    requireInRange('Cth', Cth, POSITIVE, 'J/K');
    if (!oil) tLimit = timeToLimit((T) => -f(T), Cth, lo, Tlimit);
    else if (oil.Coil !== undefined) {
      const Coil = requireInRange('Coil', oil.Coil, { min: 0, max: Cth, minExclusive: true, maxExclusive: true }, 'J/K');
      // twenty time constants at the limit: if the oil has not reached it by then it never will
      const tEnd = (20 * Cth) / Math.max(bodyCooling(body, Tlimit).UA, 1e-9);
      try {
        tLimit = twoNodeTimeToLimit(Q, model, duty, oil.Gob, Coil, Cth, lo, Tlimit, tEnd);
      } catch (e) {
        if (!(e instanceof ComputationError)) throw e;
        warnings.push(`Time to the limit not computed: ${e.message}.`);
      }
    }
  }
  warnings.push('No equilibrium below the limit: the damper keeps heating until it passes the limit.');
  return { crossings, tLimit, warnings };
}

/** The two-node warm-up from ambient with the power at c(T_oil), to the oil reaching the limit. */
function twoNodeTimeToLimit(Q: (T: number) => number, model: FadeModel, duty: FadeDuty, Gob: number, Coil: number, Cth: number, T0: number, Tlimit: number, tEnd: number): number | undefined {
  const heating = (_P: number, Toil: number) => dutyPower(duty, fadeCoefficient(model, Math.min(Toil, Tlimit)));
  return twoNodeWarmUp(Q, { Coil, Cbody: Cth - Coil, Gob, T0 }, { t: [0, tEnd], P: [0] }, 'off', tEnd, { stopAt: Tlimit, heating }).tCross;
}
