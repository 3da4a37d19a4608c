/**
 * Mean damper power alone, for sweeps over speed and roughness (charts): the damper-velocity
 * integral only, at a looser tolerance than roadDuty.
 */
import type { QuarterCar } from './quarterCar.ts';
import { damperVelocityVariance } from './quarterCarRandom.ts';
import { whiteRoadDamperPower } from './quarterCarWhite.ts';
import type { RoadDamper } from './roadDuty.ts';
import type { RoadInput } from './roadPsd.ts';
import { linearisationStart, statisticalLinearisation } from './statisticalLinearisation.ts';

/**
 * For w = 2 the closed form $\pi^2 k_t G_d(n_0) n_0^2 V$ holds for every law and is returned directly.
 *
 * $$\bar P = c\,\sigma_v^2\ \text{(linear)},\qquad \bar P = c_{eq}\,\sigma_v^2,\ c_{eq} = C\kappa(\alpha)\sigma_v^{\alpha-1}\ \text{(power law)}$$
 *
 * @param car masses and rates (validated by the caller); road validated with checkRoad
 * @param relTol quadrature tolerance, default 1e-6 (a chart needs no more); panels: equal log panels, default 60
 * @example roadDamperPower({ ms: 240, mu: 36, ks: 16000, kt: 160000 }, { Gd0: 256e-6, w: 2, V: 20 }, { kind: 'linear', c: 980 }) // 80.85 W
 * @source roberts2003 ch. 5 (from memory); newland1993 ch. 7 (from memory)
 */
export function roadDamperPower(car: Omit<QuarterCar, 'c'>, road: RoadInput, damper: RoadDamper, relTol = 1e-6, panels = 60): number {
  if (road.w === 2) return whiteRoadDamperPower(car.kt, road.Gd0, road.V); // exact for every law (closed form)
  if (damper.kind === 'linear') return damper.c * damperVelocityVariance({ ...car, c: damper.c }, road, relTol, panels);
  const lin = statisticalLinearisation(damper.C, damper.alpha, (c) => Math.sqrt(damperVelocityVariance({ ...car, c }, road, relTol, panels)), linearisationStart(damper.C, damper.alpha), relTol);
  return lin.ceq * lin.sigmaV ** 2;
}
