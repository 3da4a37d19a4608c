import { ComputationError, NON_NEGATIVE, requireInRange } from '../errors.ts';
import { BODY_T_RANGE, bodyCooling, bodyHeatLoss, type Body, type BodyCooling } from './bodyCooling.ts';
import { checkedRoot } from './checkedRoot.ts';
import { ZERO_CELSIUS } from '../constants.ts';

/**
 * Body temperature at which a mean power P leaves the body in steady state: the root of
 * Q(T_s) − P = 0, with Q from `bodyCooling` (h depends on T_s through the film properties,
 * the Rayleigh number and radiation, so the equation is nonlinear). Q rises monotonically with
 * T_s, so the root is unique; it is bracketed between min(T_∞, T_sur) and 700 K, found by
 * Brent's method to 1e-9 K and checked: the remaining imbalance must be below 1e-7 of P (or of
 * the larger of the convective and radiative flows), else a typed error (a jump, not a root).
 *
 * $$Q(T_s) = h_{conv}(T_s)\,A\,(T_s-T_\infty) + h_r(T_s)\,A\,(T_s-T_{sur}) + G_m(T_s-T_\infty) - Q_{sun} = P$$
 *
 * @param body the body and its air (see `Body`)
 * @param P mean power to shed, W, [0, ∞)
 * @returns the steady surface temperature (K) with the cooling figures at that temperature
 * @throws InputRangeError for bad inputs; ComputationError when the body cannot shed P below 700 K,
 *   or when the bracket holds a jump of Q rather than a root
 * @example steadyTemperature({ D: 0.05, L: 0.35, orientation: 'horizontal', ends: false, eps: 0.9, Tamb: 298.15, V: 0 }, 41.01).Ts // 353.15 K (Ø50 × 350 mm body, still air at 25 °C)
 * @source incropera2007 eq. 1.12 energy balance (from memory); brent1973 ch. 4
 */
export function steadyTemperature(body: Body, P: number): BodyCooling & { readonly Ts: number } {
  requireInRange('P', P, NON_NEGATIVE, 'W');
  const lo = Math.min(body.Tamb, body.Tsur ?? body.Tamb);
  const hi = BODY_T_RANGE.max;
  const Q = bodyHeatLoss(body);
  const f = (T: number) => Q(T) - P;
  const fHi = f(hi);
  if (fHi < 0) {
    throw new ComputationError(`the body cannot shed ${P.toPrecision(4)} W below ${hi} K (${(hi - ZERO_CELSIUS).toFixed(0)} °C): at that temperature it sheds only ${(fHi + P).toPrecision(4)} W`);
  }
  if (f(lo) >= 0) return { ...bodyCooling(body, lo), Ts: lo };
  const Ts = checkedRoot(f, lo, hi, 'steady body temperature', 'W', { scale: balanceScale(body, P, lo, hi) }).x;
  return { ...bodyCooling(body, Ts), Ts };
}

/** Scale of the heat balance: P, or the largest heat flow at the ends of the bracket. */
function balanceScale(body: Body, P: number, lo: number, hi: number): number {
  const a = bodyCooling(body, lo);
  const b = bodyCooling(body, hi);
  return Math.max(P, Math.abs(a.Qconv), Math.abs(a.Qrad), Math.abs(b.Qconv), Math.abs(b.Qrad), Math.abs(b.Qmount), a.Qsun, 1e-12);
}
