/**
 * The stop body's energy-per-hour rating at another ambient, and whether the stop has reset
 * before the next impact.
 */
import { InputRangeError, NON_NEGATIVE, POSITIVE, requireInRange } from '../errors.ts';

/**
 * Energy per hour the stop body can take at ambient T_amb, from its own rating E_h,r at the rating
 * ambient T_r and its body temperature limit T_max. The body sheds its heat by a constant
 * conductance UA (Newton's law of cooling), so its capacity is proportional to the temperature
 * margin it has over the air:
 *
 * $$E_{h,allow} = E_{h,r}\,\frac{T_{max} - T_{amb}}{T_{max} - T_r}$$
 *
 * A stop radiating a large part of its heat gains a little less than this at low ambients and loses
 * a little more at high ones (radiation grows faster than linearly): a first derating, not a rating.
 *
 * @param EhRated rating (0, ∞) J/h; Tamb, Trated, Tmax in K with Tamb < Tmax and Trated < Tmax
 * @throws InputRangeError naming Tamb (at or above the limit) or Trated
 * @example deratedEnergyPerHour(100e3, 333.15, 293.15, 353.15) // 33333.3 J/h (60 °C ambient, 80 °C limit, rated at 20 °C)
 * @source incropera2007 §1.2.2 Newton's law of cooling (section from memory); derating by the temperature margin is common practice, no source
 */
export function deratedEnergyPerHour(EhRated: number, Tamb: number, Trated: number, Tmax: number): number {
  requireInRange('EhRated', EhRated, POSITIVE, 'J/h');
  requireInRange('Tmax', Tmax, POSITIVE, 'K');
  requireInRange('Trated', Trated, { min: 0, max: Tmax, minExclusive: true, maxExclusive: true }, 'K');
  if (!(Tamb < Tmax)) throw new InputRangeError('Tamb', Tamb, { min: 0, max: Tmax, minExclusive: true, maxExclusive: true }, 'K', 'the body cannot shed heat at or above its temperature limit');
  requireInRange('Tamb', Tamb, POSITIVE, 'K');
  return (EhRated * (Tmax - Tamb)) / (Tmax - Trated);
}

/**
 * Time between impacts on one stop, and the share of it the stop needs to reset (its return time
 * from the data sheet: the rod pushed back out by its spring).
 *
 * $$T_{cycle} = \frac{3600}{n_h},\qquad r = \frac{t_{return}}{T_{cycle}}$$
 *
 * @param cph impacts per hour (0, ∞); tReturn return time [0, ∞) s
 * @throws InputRangeError naming cph or tReturn
 * @example resetShare(1200, 1.5) // { tCycle: 3, share: 0.5 }
 * @source common practice, no source (the stop must be fully out before the next impact, or it takes the next one on a short stroke)
 */
export function resetShare(cph: number, tReturn: number): { tCycle: number; share: number } {
  requireInRange('cph', cph, POSITIVE, '1/h');
  requireInRange('tReturn', tReturn, NON_NEGATIVE, 's');
  const tCycle = 3600 / cph;
  return { tCycle, share: tReturn / tCycle };
}
