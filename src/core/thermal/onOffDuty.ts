import { POSITIVE, requireInRange } from '../errors.ts';
import { lumpedWarmUp, type LumpedBody } from './lumpedWarmUp.ts';

/**
 * Lumped body under an on/off duty from ambient: power P for d·t_p, nothing for (1−d)·t_p,
 * repeated. Exact piecewise exponentials; the rise at the end of the n-th on phase is a geometric sum.
 *
 * $$\theta_n = \theta_\infty\,(1 - e^{-t_{on}/\tau})\,\frac{1-r^n}{1-r},\quad r = e^{-t_p/\tau},\quad \theta_\infty = P/UA$$
 * $$\theta_{peak} = \lim_{n\to\infty}\theta_n = \theta_\infty\,\frac{1-e^{-t_{on}/\tau}}{1-e^{-t_p/\tau}}$$
 *
 * @param b the lumped body (T0 must equal Tamb: the sum starts from ambient)
 * @param d on fraction, (0, 1]
 * @param tp period, s, (0, ∞)
 * @returns the cyclic peak temperature, the temperature at t, and the first time a limit is reached
 * @throws InputRangeError for bad inputs
 * @example onOffDuty({ P: 150, Cth: 1395, UA: 0.745664, Tamb: 298.15 }, 0.5, 600).Tpeak - 298.15 // 108.63 K above the air
 * @source closed form of incropera2007 eq. 5.6 applied phase by phase (from memory)
 */
export function onOffDuty(b: LumpedBody, d: number, tp: number) {
  requireInRange('duty', d, { min: 0, max: 1, minExclusive: true }, '');
  requireInRange('period', tp, POSITIVE, 's');
  const base = lumpedWarmUp({ ...b, T0: b.Tamb });
  const { tau } = base;
  const thInf = base.Tss - b.Tamb;
  const ton = d * tp;
  const r = Math.exp(-tp / tau);
  const a = -Math.expm1(-ton / tau); // 1 − e^{−ton/τ}
  const peak = d === 1 ? thInf : (thInf * a) / -Math.expm1(-tp / tau);
  /** Rise at the start of cycle n (n = 0 is the start), K. */
  const startRise = (n: number) => (d === 1 ? (n === 0 ? 0 : thInf) : peak * (1 - r ** n) * Math.exp(-(1 - d) * tp / tau));
  const at = (t: number): number => {
    if (d === 1) return base.at(t);
    const n = Math.floor(t / tp);
    const s = t - n * tp;
    const th0 = startRise(n);
    if (s <= ton) return b.Tamb + thInf + (th0 - thInf) * Math.exp(-s / tau);
    const thEnd = thInf + (th0 - thInf) * Math.exp(-ton / tau);
    return b.Tamb + thEnd * Math.exp(-(s - ton) / tau);
  };
  const timeTo = (T: number): number | undefined => {
    const th = T - b.Tamb;
    if (th <= 0) return 0;
    if (d === 1) return base.timeTo(T);
    if (th >= peak) return undefined;
    // first n with θ_n = peak(1 − r^n) ≥ θ (n ≥ 1), then the crossing inside that on phase
    const n = Math.max(1, Math.ceil(Math.log1p(-th / peak) / Math.log(r) - 1e-12));
    const th0 = startRise(n - 1);
    return (n - 1) * tp + tau * Math.log((thInf - th0) / (thInf - th));
  };
  return { tau, Tpeak: b.Tamb + peak, Tmean: b.Tamb + d * thInf, at, timeTo };
}
