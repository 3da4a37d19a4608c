/**
 * Ageing over a temperature history: the Miner sum of time over life, the life when the history
 * repeats, and the constant temperature that ages the part as much in the same time.
 */
import { ComputationError } from '../errors.ts';
import { lnAgeingRate, temperatureForLife, validateAgeingLaw, type AgeingLaw } from './ageingLaw.ts';
import type { TemperatureHistory } from './temperatureHistory.ts';
import { maxOf, minOf } from '../numeric/index.ts';

export interface HistoryAgeing {
  /** Σ ∫ dt / L(T(t)) over the history: the share of the life it uses. */
  readonly damage: number;
  /** Length of the history, s. */
  readonly duration: number;
  /** Life when the history repeats: duration / damage, s. */
  readonly life: number;
  /** Equivalent constant temperature: L(T_eq) = life, K. */
  readonly Teq: number;
  /** Highest temperature in the history, K. */
  readonly Tpeak: number;
  /** Share of the damage done in the hottest tenth of the temperature span (where the margin is). */
  readonly hotShare: number;
}

// 4-point Gauss–Legendre nodes and weights on [−1, 1] (Abramowitz & Stegun Table 25.4)
const GL_X = [-0.8611363115940526, -0.3399810435848563, 0.3399810435848563, 0.8611363115940526];
const GL_W = [0.3478548451374538, 0.6521451548625461, 0.6521451548625461, 0.3478548451374538];

/** Largest change of ln(rate) across one Gauss panel: the rate then varies by < 30 % in a panel. */
const PANEL_LN = 0.25;
const MAX_PANELS = 4000;

/**
 * Miner sum over a piecewise-linear history, each ramp integrated by Gauss–Legendre panels small
 * enough that the ageing rate changes by at most e^0.25 across one (a level segment is exact):
 *
 * $$D = \sum_i \int_{t_i}^{t_{i+1}} \frac{dt}{L(T(t))},\qquad L_{hist} = \frac{t_{end}-t_0}{D},\qquad L(T_{eq}) = L_{hist}$$
 *
 * @throws InputRangeError naming a law input
 * @throws ComputationError when the history ages the part too little to resolve (damage underflows)
 * @example historyAgeing({ kind: 'arrhenius', Lref: 3.6e6, Tref: 373.15, Ea: 82400 }, { t: [0, 1.62e6, 1.62e6, 3.24e6], T: [353.15, 353.15, 383.15, 383.15] }).life // 3239940
 * @source miner1945 (linear damage sum Σ n/N = 1, used here with time over life, common practice for thermal ageing);
 *   iso11346 Arrhenius life (from memory); abramowitz1964 Table 25.4 (Gauss–Legendre)
 */
export function historyAgeing(law: AgeingLaw, h: TemperatureHistory): HistoryAgeing {
  validateAgeingLaw(law);
  const n = h.t.length;
  const Tmin = minOf(h.T);
  const Tpeak = maxOf(h.T);
  const hotFrom = Tpeak - 0.1 * (Tpeak - Tmin);
  let damage = 0;
  let hot = 0;
  for (let i = 0; i + 1 < n; i++) {
    const t0 = h.t[i]!, t1 = h.t[i + 1]!, T0 = h.T[i]!, T1 = h.T[i + 1]!;
    const dt = t1 - t0;
    if (dt <= 0) continue; // a step: no time passes
    const g0 = lnAgeingRate(law, T0), g1 = lnAgeingRate(law, T1);
    const panels = T0 === T1 ? 1 : Math.min(MAX_PANELS, Math.max(1, Math.ceil(Math.abs(g1 - g0) / PANEL_LN)));
    const w = dt / panels;
    for (let p = 0; p < panels; p++) {
      for (let k = 0; k < 4; k++) {
        const s = (p + 0.5 + 0.5 * GL_X[k]!) / panels; // share of the segment
        const T = T0 + (T1 - T0) * s;
        const d = 0.5 * w * GL_W[k]! * Math.exp(lnAgeingRate(law, T));
        damage += d;
        if (T >= hotFrom) hot += d;
      }
    }
  }
  const duration = h.t[n - 1]! - h.t[0]!;
  const life = duration / damage;
  if (!(damage > 0) || !Number.isFinite(life)) {
    throw new ComputationError('the history ages the part too little to resolve (life beyond 1e300 s): check the reference life and temperature');
  }
  const Teq = temperatureForLife(law, life);
  if (Teq === undefined) throw new ComputationError('no equivalent temperature: the Arrhenius life of this history is beyond the law');
  return { damage, duration, life, Teq, Tpeak, hotShare: hot / damage };
}
