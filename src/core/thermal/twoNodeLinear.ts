import { ComputationError, POSITIVE, requireInRange } from '../errors.ts';
import { MAX_BODY_SEGMENTS } from './bodyWarmUp.ts';
import { checkProfile, type PowerProfile, type ProfileEnd } from './powerProfile.ts';
import type { TwoNodeBody } from './twoNodeWarmUp.ts';

/**
 * Exact piecewise solution of the two-node body with a constant conductance UA from the body to the
 * air (the linear case of `twoNodeWarmUp`), segment by segment like `profileWarmUp`: with the rises
 * θ = (T_o − T∞, T_b − T∞), θ′ = Aθ + b, and over a segment of constant power
 *
 * $$\theta(s) = \theta_{eq} + e^{As}(\theta_0 - \theta_{eq}),\quad A = \begin{pmatrix}-g/C_o & g/C_o\\ g/C_b & -(g+UA)/C_b\end{pmatrix},\quad \theta_{eq} = \Big(\tfrac{P}{UA} + \tfrac{P}{g},\ \tfrac{P}{UA}\Big)$$
 *
 * e^{As} by Sylvester's formula on the two real, distinct, negative eigenvalues of A (A is similar to
 * a symmetric negative-definite matrix); the heat shed, UA∫θ_b ds, from ∫e^{As}ds = A⁻¹(e^{As} − I),
 * so the energy audit (stored + shed = put in) is a check, not an identity. The oil's highest
 * temperature and the first time it reaches a level are found exactly inside each segment: θ_o is
 * θ_eq + a₁e^{λ₁s} + a₂e^{λ₂s}, with at most one turning point.
 *
 * @param b nodes: C_o, C_b (0, ∞) J/K, G_ob (0, ∞) W/K, T0 = T∞ K; @param UA (0, ∞) W/K
 * @param p power profile; @param end 'repeat' | 'off'; @param tEnd end of the run, s, (0, ∞)
 * @example twoNodeLinear({ Coil: 475, Cbody: 920, Gob: 8, T0: 298.15 }, 0.745664, { t: [0, 1e6], P: [50] }, 'off', 600).at(600).oil // 319.9909078 K (scipy expm)
 * @source incropera2007 §5.3 lumped capacitance, one energy balance per node (from memory); e^{As} of a 2×2 matrix by Sylvester's formula (closed form)
 */
export function twoNodeLinear(b: TwoNodeBody, UA: number, p: PowerProfile, end: ProfileEnd, tEnd: number) {
  const Co = requireInRange('Coil', b.Coil, POSITIVE, 'J/K');
  const Cb = requireInRange('Cbody', b.Cbody, POSITIVE, 'J/K');
  const g = requireInRange('Gob', b.Gob, POSITIVE, 'W/K');
  const U = requireInRange('UA', UA, POSITIVE, 'W/K');
  requireInRange('tEnd', tEnd, POSITIVE, 's');
  checkProfile(p);
  const a11 = -g / Co, a12 = g / Co, a21 = g / Cb, a22 = -(g + U) / Cb;
  const tr = a11 + a22, det = a11 * a22 - a12 * a21;
  const disc = Math.sqrt(Math.max(0, 0.25 * tr * tr - det));
  const l2 = 0.5 * tr - disc; // the fast eigenvalue, l2 < l1 < 0
  const l1 = det / l2; // the slow one from the product λ₁λ₂ = det A, free of the cancellation in ½tr + disc
  /** e^{As}(x) for the 2-vector x, Sylvester: e^{As} = αA + βI. */
  const prop = (s: number, x0: number, x1: number): [number, number] => {
    const e1 = Math.expm1(l1 * s), e2 = Math.expm1(l2 * s);
    const al = (e1 - e2) / (l1 - l2);
    const be = 1 + (l1 * e2 - l2 * e1) / (l1 - l2);
    return [al * (a11 * x0 + a12 * x1) + be * x0, al * (a21 * x0 + a22 * x1) + be * x1];
  };
  /** Oil rise inside a segment: θ_eq,o + c₁e^{λ₁s} + c₂e^{λ₂s} from the start deviation (d0, d1). */
  const oilModes = (d0: number, d1: number) => {
    // e^{As} = Σ e^{λ_i s} (A − λ_j I)/(λ_i − λ_j); row 0 applied to d
    const c1 = ((a11 - l2) * d0 + a12 * d1) / (l1 - l2);
    const c2 = ((a11 - l1) * d0 + a12 * d1) / (l2 - l1);
    return { c1, c2 };
  };
  // a repeated single power is one constant segment, however short its period
  const prof = p.P.length === 1 && end === 'repeat' ? { t: [0, Math.max(p.t[1]!, tEnd)], P: p.P } : p;
  const n = prof.P.length;
  const tp = prof.t[n]!;
  const Tamb = b.T0;
  const periods = end === 'repeat' ? Math.ceil(tEnd / tp) : 1;
  if (periods * n > MAX_BODY_SEGMENTS) {
    throw new ComputationError(`the two-node model would need ${(periods * n).toExponential(1)} power segments (at most ${MAX_BODY_SEGMENTS}): lengthen the duty period or shorten the time`);
  }
  let th0 = 0, th1 = 0, tc = 0, Ein = 0, Elost = 0, oilPeak = 0, bodyPeak = 0;
  const segs: { t0: number; dt: number; eq: number; eqb: number; c1: number; c2: number }[] = [];
  const segment = (dt: number, P: number) => {
    const eq1 = P / U, eq0 = eq1 + P / g;
    const d0 = th0 - eq0, d1 = th1 - eq1;
    const [e0, e1] = prop(dt, d0, d1);
    // ∫₀^dt e^{As} d ds = A⁻¹(e^{A dt} − I) d; body row of the inverse of A
    const x0 = e0 - d0, x1 = e1 - d1;
    const intB = (-a21 * x0 + a11 * x1) / det;
    Elost += U * (eq1 * dt + intB);
    Ein += P * dt;
    const { c1, c2 } = oilModes(d0, d1);
    segs.push({ t0: tc, dt, eq: eq0, eqb: eq1, c1, c2 });
    oilPeak = Math.max(oilPeak, eq0 + e0, turningPeak(eq0, c1, c2, dt));
    th0 = eq0 + e0; th1 = eq1 + e1; tc += dt;
    bodyPeak = Math.max(bodyPeak, th1);
  };
  for (let k = 0; k < periods && tc < tEnd; k++) {
    for (let i = 0; i < n && tc < tEnd; i++) segment(Math.min(tEnd, k * tp + prof.t[i + 1]!) - tc, prof.P[i]!);
  }
  if (tc < tEnd) segment(tEnd - tc, 0);
  const oilAt = (c: (typeof segs)[number], s: number) => c.eq + c.c1 * Math.exp(l1 * s) + c.c2 * Math.exp(l2 * s);
  /** First time the oil reaches T (K); 0 at or below T∞; undefined when not reached in the run. */
  const tCross = (T: number): number | undefined => {
    const th = T - Tamb;
    if (th <= 0) return 0;
    for (const c of segs) {
      if (Math.max(oilAt(c, c.dt), turningPeak(c.eq, c.c1, c.c2, c.dt)) < th) continue;
      // first crossing: bisection on [0, s*] when the turning point is above the level, else on [0, dt]
      const ts = turningTime(c.c1, c.c2, c.dt);
      let lo = 0, hi = ts !== undefined && oilAt(c, ts) >= th ? ts : c.dt;
      for (let it = 0; it < 100 && hi - lo > 1e-12 * Math.max(1, c.t0); it++) { const m = 0.5 * (lo + hi); if (oilAt(c, m) >= th) hi = m; else lo = m; }
      return c.t0 + hi;
    }
    return undefined;
  };
  /** Oil and body at time t in [0, tEnd]. */
  const at = (t: number) => {
    requireInRange('t', t, { min: 0, max: tEnd }, 's');
    let lo = 0;
    let hi = segs.length - 1;
    while (lo < hi) { const mid = (lo + hi) >> 1; if (t <= segs[mid]!.t0 + segs[mid]!.dt) hi = mid; else lo = mid + 1; }
    const c = segs[lo]!;
    return { oil: Tamb + oilAt(c, t - c.t0), body: Tamb + bodyAt(c, t - c.t0) };
  };
  /** Body rise from the oil modes: the oil equation θ_o′ = a₁₁θ_o + a₁₂θ_b + P/C_o on deviations from θ_eq. */
  const bodyAt = (c: (typeof segs)[number], s: number) => {
    const dev = c.c1 * Math.exp(l1 * s) + c.c2 * Math.exp(l2 * s);
    const der = c.c1 * l1 * Math.exp(l1 * s) + c.c2 * l2 * Math.exp(l2 * s);
    return c.eqb + (der - a11 * dev) / a12;
  };
  return {
    tCross, at, oilPeak: Tamb + oilPeak, bodyPeak: Tamb + bodyPeak,
    energyIn: Ein, energyLost: Elost, energyStored: Co * th0 + Cb * th1,
    lambda: [l1, l2] as const,
  };

  function turningTime(c1: number, c2: number, dt: number): number | undefined {
    const r = -(c2 * l2) / (c1 * l1);
    if (!(r > 0)) return undefined;
    const s = Math.log(r) / (l1 - l2);
    return s > 0 && s < dt ? s : undefined;
  }
  function turningPeak(eq: number, c1: number, c2: number, dt: number): number {
    const s = turningTime(c1, c2, dt);
    return s === undefined ? -Infinity : eq + c1 * Math.exp(l1 * s) + c2 * Math.exp(l2 * s);
  }
}
