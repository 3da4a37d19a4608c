/**
 * A lumped body from ambient under a piecewise-constant power profile, repeated or run once:
 * temperature at any time, peak, time to a limit, in closed form segment by segment.
 */
import { NON_NEGATIVE, POSITIVE, requireInRange } from '../errors.ts';
import { lumpedStep } from './lumpedStep.ts';
import { periodicProfile } from './periodicProfile.ts';
import { checkProfile, profileMeanPower, profilePowerAt, type PowerProfile, type ProfileEnd } from './powerProfile.ts';

/** The body: heat capacity C (J/K), conductance UA (W/K), air temperature (K); it starts at T∞. */
export interface ProfileBody {
  readonly Cth: number;
  readonly UA: number;
  readonly Tamb: number;
}

/**
 * Exact piecewise solution of C dT/dt = P(t) − UA(T − T∞) from T(0) = T∞ (lumpedStep per segment).
 *
 * **Repeated** (period t_p = t_n): the difference between any two solutions decays as e^{−t/τ}, so
 * $$\theta(t) = \theta_{ps}(t) - \theta^{*} e^{-t/\tau},\qquad \theta(k\,t_p) = \theta^{*}\,\big(1 - e^{-k t_p/\tau}\big)$$
 * with θ_ps the periodic steady state (periodicProfile) and θ* its value at the period start. The
 * rise at a boundary s_j of period k grows with k towards θ_ps(s_j), so the limit is first reached
 * in the period
 * $$k_j = \Big\lceil \frac{\tau\ln\big(\theta^{*}/(\theta_{ps}(s_j) - \theta_{lim})\big) - s_j}{t_p} \Big\rceil$$
 * (earliest over j), inside the segment that ends at that boundary, where
 * $t = \tau\ln\frac{\theta_{eq} - \theta_{start}}{\theta_{eq} - \theta_{lim}}$ solves it exactly.
 * **Once**: the steps are taken once; after t_n the body cools as θ_n e^{−(t−t_n)/τ}.
 * Work is O(segments) whatever the time asked for; the segment count is capped by checkProfile.
 *
 * @param b body (C > 0, UA > 0, T∞ > 0)
 * @param p power profile (checked here)
 * @param end 'repeat' (period t_n) or 'off' (run once, then no power)
 * @returns τ, the mean-power equilibrium, the peak (the periodic-steady peak when repeated; the
 *   highest temperature of the run when once), the temperature at t, and the first time a temperature is reached
 * @throws InputRangeError / ComputationError for a bad body or profile
 * @example profileWarmUp({Cth:1395,UA:0.745664,Tamb:298.15}, {t:[0,600],P:[50]}, 'repeat').at(600) // ≈ 316.548 K
 * @source incropera2007 §5.3 lumped capacitance, eq. 5.6 applied segment by segment (from memory)
 */
export function profileWarmUp(b: ProfileBody, p: PowerProfile, end: ProfileEnd) {
  const C = requireInRange('Cth', b.Cth, POSITIVE, 'J/K');
  const UA = requireInRange('UA', b.UA, POSITIVE, 'W/K');
  const Tamb = requireInRange('Tamb', b.Tamb, POSITIVE, 'K');
  checkProfile(p);
  const tau = C / UA;
  const n = p.P.length;
  const tp = p.t[n]!;
  const Pmean = profileMeanPower(p);
  /** Rise at the boundaries of the first run from ambient. */
  const first = [0];
  for (let i = 0; i < n; i++) first.push(lumpedStep(first[i]!, p.P[i]!, p.t[i + 1]! - p.t[i]!, tau, UA));
  const ps = end === 'repeat' ? periodicProfile(p, tau, UA) : undefined;
  const thStar = ps ? ps.theta[0]! : 0;
  /** Segment holding s (0 ≤ s ≤ t_p): the last boundary index i < n with t_i ≤ s. */
  const segmentOf = (s: number) => {
    let lo = 0;
    let hi = n - 1;
    while (lo < hi) { const mid = (lo + hi + 1) >> 1; if (p.t[mid]! <= s) lo = mid; else hi = mid - 1; }
    return lo;
  };
  /** Rise at boundary j of period k (repeated) or of the single run. */
  const boundary = (k: number, j: number): number => {
    if (!ps) return first[j]!;
    return ps.theta[j]! - thStar * Math.exp(-(k * tp + p.t[j]!) / tau);
  };
  /** Rise at time t ≥ 0, K. */
  const rise = (t: number): number => {
    requireInRange('t', t, NON_NEGATIVE, 's');
    if (!ps && t >= tp) return first[n]! * Math.exp(-(t - tp) / tau);
    const k = ps ? Math.floor(t / tp) : 0;
    const s = Math.min(tp, Math.max(0, t - k * tp));
    const i = segmentOf(s);
    return lumpedStep(boundary(k, i), p.P[i]!, s - p.t[i]!, tau, UA);
  };
  const peakRise = ps ? ps.peak : first.reduce((a, b) => Math.max(a, b), -Infinity);
  /** First time the body reaches T (K); 0 at or below T∞; undefined when never reached. */
  const timeTo = (T: number): number | undefined => {
    const th = T - Tamb;
    if (th <= 0) return 0;
    // repeated: every boundary stays below its periodic-steady value, which it only approaches
    if (th > peakRise || (ps && th >= peakRise)) return undefined;
    let best: { k: number; j: number } | undefined;
    for (let j = 1; j <= n; j++) {
      let k = 0;
      if (ps) {
        const gap = ps.theta[j]! - th;
        if (!(gap > 0)) continue;
        const need = thStar > gap ? tau * Math.log(thStar / gap) : 0;
        k = Math.max(0, Math.ceil((need - p.t[j]!) / tp));
        // ceil of a rounded quotient may be one off: settle it on the boundary values (bounded)
        for (let m = 0; m < 3 && k > 0 && boundary(k - 1, j) >= th; m++) k--;
        for (let m = 0; m < 3 && boundary(k, j) < th; m++) k++;
        if (boundary(k, j) < th) continue;
      } else if (first[j]! < th) continue;
      if (!best || k * tp + p.t[j]! < best.k * tp + p.t[best.j]!) best = { k, j };
      if (!ps) break; // the single run: the first boundary reached is the earliest
    }
    if (!best) return undefined;
    const i = best.j - 1;
    const start = boundary(best.k, i);
    const t0 = best.k * tp + p.t[i]!;
    const dt = p.t[best.j]! - p.t[i]!;
    if (start >= th) return t0;
    const eq = p.P[i]! / UA;
    if (!(eq > th)) return t0 + dt; // reached only at the boundary (rounding)
    return t0 + Math.min(dt, tau * Math.log((eq - start) / (eq - th)));
  };
  return {
    tau,
    /** Mean power of the profile, W, and the equilibrium it would hold if kept up, K. */
    Pmean,
    Tmean: Tamb + Pmean / UA,
    /** Highest temperature: the periodic-steady peak (repeated) or the run's highest (once), K. */
    Tpeak: Tamb + peakRise,
    /** Lowest temperature of the periodic steady state (repeated), K. */
    Tlow: ps ? Tamb + ps.low : undefined,
    /** Temperature at the end of the single run (once), K. */
    Tend: ps ? undefined : Tamb + first[n]!,
    at: (t: number): number => Tamb + rise(t),
    timeTo,
    /** Power at time t ≥ 0, W. */
    powerAt: (t: number): number => (ps ? profilePowerAt(p, t - Math.floor(t / tp) * tp) : t < tp ? profilePowerAt(p, t) : 0),
  };
}
