import { NON_NEGATIVE, POSITIVE, requireInRange } from '../errors.ts';
import { adaptiveSimpson } from '../numeric/adaptiveSimpson.ts';
import { rk4 } from './rk4.ts';

/**
 * Lumped warm-up when the heat loss depends on temperature (h from the body correlations):
 * C dT/dt = P − Q(T), integrated by RK4. The time to a limit is also given by quadrature of
 * dt/dT, an independent route used to check the integration:
 *
 * $$C\frac{dT}{dt} = P - Q(T),\qquad t_{lim} = \int_{T_0}^{T_{lim}} \frac{C\,dT}{P - Q(T)}\quad(P > Q \text{ on the way})$$
 *
 * @param Q heat loss at body temperature T, W (continuous, rising)
 * @param P constant power, W, [0, ∞)
 * @param Cth heat capacity, J/K, (0, ∞)
 * @param T0 start temperature, K
 * @param tEnd end of the time window, s, (0, ∞)
 * @param steps RK4 steps (default 400)
 * @returns samples t[], T[]
 * @example warmUpWithLoss((T) => 0.75 * (T - 298.15), 50, 1395, 298.15, 3600).T.at(-1) // 355.19 K (closed form 298.15 + (50/0.75)(1 − e^{−0.75·3600/1395}) = 355.193 K)
 * @source incropera2007 §5.3 general lumped analysis (from memory); hairer1993 §II.1
 */
export function warmUpWithLoss(Q: (T: number) => number, P: number, Cth: number, T0: number, tEnd: number, steps = 400) {
  requireInRange('P', P, NON_NEGATIVE, 'W');
  const C = requireInRange('Cth', Cth, POSITIVE, 'J/K');
  const r = rk4((_t, T) => (P - Q(T)) / C, T0, tEnd, steps);
  return { t: r.t, T: r.y };
}

/**
 * Time to heat from T0 to Tlim by quadrature of C/net(T), with net(T) = heating − loss, W; the
 * heating may itself depend on temperature (damping fade). Undefined when net(T) ≤ 0 somewhere on
 * the way (the body settles below Tlim).
 *
 * $$t_{lim} = \int_{T_0}^{T_{lim}} \frac{C\,dT}{P(T) - Q(T)}$$
 *
 * @param net net heating at T, W, continuous
 * @param Cth heat capacity, J/K, (0, ∞)
 * @param T0 start, K; @param Tlim limit, K (0 returned when Tlim ≤ T0)
 * @param relTol relative accuracy of the quadrature (default 1e-9)
 * @example timeToLimit((T) => 150 - 0.745664 * (T - 298.15), 1395, 298.15, 373.15) // 872.8 s
 * @source incropera2007 §5.3 (from memory); lyness1969
 */
export function timeToLimit(net: (T: number) => number, Cth: number, T0: number, Tlim: number, relTol = 1e-9): number | undefined {
  requireInRange('Cth', Cth, POSITIVE, 'J/K');
  if (Tlim <= T0) return 0;
  // refuse when the net heating vanishes anywhere on the way (checked on a fine grid + ends)
  const n = 200;
  let minNet = Infinity;
  for (let i = 0; i <= n; i++) minNet = Math.min(minNet, net(T0 + ((Tlim - T0) * i) / n));
  if (!(minNet > 0)) return undefined;
  const rough = (Cth * (Tlim - T0)) / minNet;
  return adaptiveSimpson((T) => Cth / net(T), T0, Tlim, relTol * rough);
}
