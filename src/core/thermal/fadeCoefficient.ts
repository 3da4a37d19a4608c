import { POSITIVE, requireInRange } from '../errors.ts';
import { waltherViscosity, type WaltherFit } from './walther.ts';

/** Damping coefficient against oil temperature: a viscous share that follows ν and a share that does not. */
export interface FadeModel {
  readonly cRef: number; // N·s/m, coefficient at Tref
  readonly Tref: number; // K
  /** Share of cRef that scales with viscosity (laminar/bleed flow), [0, 1]; the rest is orifice flow. */
  readonly viscousShare: number;
  readonly oil: WaltherFit;
}

/**
 * Damping coefficient at oil temperature T. An engineering approximation (common practice, no
 * source): the laminar, bleed and leakage part of the damper force scales with kinematic viscosity,
 * while turbulent orifice and valve flow depends on density and geometry only, so it does not.
 *
 * $$c(T) = c_{ref}\left[s\,\frac{\nu(T)}{\nu(T_{ref})} + (1 - s)\right]$$
 *
 * Real dampers lie between about 0.2 %/K (valve-dominated) and 2 %/K (viscous) fade near room
 * temperature (dixon2007thermal, from memory); s sets where in that band a design sits.
 *
 * @param m model: c_ref (0, ∞) N·s/m, T_ref K, s [0, 1], oil Walther fit
 * @param T oil temperature, K, (0, ∞)
 * @returns c in N·s/m (> 0 whenever s < 1)
 * @example fadeCoefficient({ cRef: 980, Tref: 298.15, viscousShare: 0.3, oil: waltherFit(22e-6, 4.4e-6) }, 353.15) // 733.14 N·s/m (ν40 = 22, ν100 = 4.4 mm²/s; oil at 80 °C)
 * @source dixon2007thermal (fade rates, from memory); the split itself is common practice, no source
 */
export function fadeCoefficient(m: FadeModel, T: number): number {
  requireInRange('cRef', m.cRef, POSITIVE, 'N·s/m');
  requireInRange('viscousShare', m.viscousShare, { min: 0, max: 1 }, '');
  const ratio = waltherViscosity(m.oil, T) / waltherViscosity(m.oil, m.Tref);
  return m.cRef * (m.viscousShare * ratio + (1 - m.viscousShare));
}
