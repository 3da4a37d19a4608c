/**
 * Damper duty of a quarter car on an ISO 8608 road: RMS responses and mean damper power from the
 * spectral variances (closed form by residues, quadrature as the fallback), with the white-velocity
 * closed forms beside them when w = 2.
 */
import { STANDARD_GRAVITY } from '../constants.ts';
import { ALPHA_RANGE, gaussianMomentFactor } from '../dampers/index.ts';
import { POSITIVE, requireInRange } from '../errors.ts';
import { maxAbsOf } from '../numeric/extent.ts';
import { checkQuarterCar, type QuarterCar } from './quarterCar.ts';
import { damperVelocityVariance, quarterCarRandom } from './quarterCarRandom.ts';
import { quarterCarWhiteVariances, whiteRoadDamperPower } from './quarterCarWhite.ts';
import { checkRoad, roadVelocityWhiteLevel, type RoadInput } from './roadPsd.ts';
import { linearisationStart, statisticalLinearisation } from './statisticalLinearisation.ts';

/** The quarter car's damper: linear, or power law F = C|v|^α sgn v. */
export type RoadDamper = { readonly kind: 'linear'; readonly c: number } | { readonly kind: 'power'; readonly C: number; readonly alpha: number };

export interface RoadDuty {
  /** RMS damper velocity, m/s. */
  readonly vRms: number;
  /** Mean damper power, W. */
  readonly P: number;
  readonly accRms: number;
  /** ISO 2631-1 W_k-weighted RMS body acceleration, m/s². */
  readonly awWk: number;
  readonly travelRms: number;
  readonly tyreLoadRms: number;
  /** RMS dynamic tyre load / static load (m_s + m_u)·g. */
  readonly tyreLoadRatio: number;
  /** Linear coefficient used (the equivalent one for a power law), N·s/m. */
  readonly c: number;
  readonly band: readonly [number, number];
  /** Largest relative error bound of the five integrals. */
  readonly relError: number;
  /** How many of the five variances fell back to quadrature (0: all by residues). */
  readonly fallbacks: number;
  /** Closed forms (w = 2 only), same c. */
  readonly closed?: { readonly vRms: number; readonly P: number; readonly accRms: number; readonly travelRms: number; readonly tyreLoadRms: number } | undefined;
  readonly iterations: number;
  /**
   * Largest relative difference between the computed variances (residues, or quadrature where they fell
   * back) and the Lyapunov closed forms for this car and linear damping c on a w = 2 road (the
   * integration check; when w = 2 it compares the reported values themselves).
   */
  readonly closedFormDiff: number;
}

const KEYS = ['damperVelocity', 'travel', 'bodyAcceleration', 'tyreLoad'] as const;

/**
 * Road duty of one corner.
 *
 * $$\bar P = c\,\sigma_v^2\ \text{(linear)},\qquad \bar P = C\kappa(\alpha)\sigma_v^{1+\alpha}\ \text{with } c_{eq} = C\kappa(\alpha)\sigma_v^{\alpha-1}\ \text{(power law)}$$
 * and for w = 2, $\bar P = \pi^2 k_t G_d(n_0) n_0^2 V$ whatever the damper.
 *
 * @param car masses (kg) and rates (N/m); its `c` is ignored for a power-law damper
 * @param road G_d(n0) m³, w, V m/s
 * @param damper law at the wheel
 * @throws InputRangeError naming the input out of range
 * @example roadDuty({ ms: 240, mu: 36, ks: 16000, kt: 160000, c: 980 }, { Gd0: 256e-6, w: 2, V: 20 }, { kind: 'linear', c: 980 }).P // 80.85 W
 * @source zuo2013; gobbi2001; roberts2003 ch. 5 (from memory); iso8608
 */
export function roadDuty(car: Omit<QuarterCar, 'c'>, road: RoadInput, damper: RoadDamper): RoadDuty {
  checkRoad(road);
  let c: number;
  let iterations = 0;
  if (damper.kind === 'linear') c = damper.c;
  else {
    requireInRange('C', damper.C, POSITIVE, 'N·(s/m)^α');
    requireInRange('alpha', damper.alpha, ALPHA_RANGE, '');
    checkQuarterCar({ ...car, c: 1 });
    const sig = (cc: number) => Math.sqrt(damperVelocityVariance({ ...car, c: cc }, road));
    const lin = statisticalLinearisation(damper.C, damper.alpha, sig, linearisationStart(damper.C, damper.alpha));
    c = lin.ceq;
    iterations = lin.iterations;
  }
  const q = checkQuarterCar({ ...car, c });
  const r = quarterCarRandom(q, road);
  const vRms = Math.sqrt(r.damperVelocity.value);
  const P = damper.kind === 'linear' ? c * vRms * vRms : damper.C * gaussianMomentFactor(damper.alpha) * vRms ** (1 + damper.alpha);
  const tyreLoadRms = Math.sqrt(r.tyreLoad.value);
  let closed: RoadDuty['closed'];
  const v = quarterCarWhiteVariances(q, roadVelocityWhiteLevel(road.Gd0, road.V));
  const check = road.w === 2 ? r : quarterCarRandom(q, { ...road, w: 2 }, 1e-6);
  const closedFormDiff = maxAbsOf(KEYS.map((k) => Math.sqrt(check[k].value / v[k]) - 1));
  if (road.w === 2) {
    closed = {
      vRms: Math.sqrt(v.damperVelocity), P: whiteRoadDamperPower(q.kt, road.Gd0, road.V),
      accRms: Math.sqrt(v.bodyAcceleration), travelRms: Math.sqrt(v.travel), tyreLoadRms: Math.sqrt(v.tyreLoad),
    };
  }
  return {
    vRms, P, c, iterations, closed, closedFormDiff,
    accRms: Math.sqrt(r.bodyAcceleration.value),
    awWk: Math.sqrt(r.weightedAcceleration.value),
    travelRms: Math.sqrt(r.travel.value),
    tyreLoadRms,
    tyreLoadRatio: tyreLoadRms / ((car.ms + car.mu) * STANDARD_GRAVITY),
    band: r.damperVelocity.band,
    fallbacks: r.fallbacks,
    relError: Math.max(r.damperVelocity.relError, r.travel.relError, r.bodyAcceleration.relError, r.tyreLoad.relError, r.weightedAcceleration.relError),
  };
}
