import { POSITIVE, requireInRange } from '../errors.ts';

/** Above this difference (K) between oil and body a page says the one-node model misstates the oil. */
export const OIL_BODY_NOTE_K = 5;

/**
 * Steady oil temperature of a two-node damper: in steady state all the power P crosses the
 * oil-to-body conductance, so the oil runs P/G_ob above the body.
 *
 * $$T_{oil} = T_b + \frac{P}{G_{ob}}$$
 *
 * G_ob is the internal film coefficient times the wetted wall area (plus conduction through the
 * piston and rod); it is best taken from a test where both the oil (a thermocouple through the
 * filler) and the tube were measured at a steady power: G_ob = P/(T_oil − T_b).
 *
 * @param Tb body temperature, K, (0, ∞)
 * @param P power crossing from oil to body, W (the damper power in steady state), any sign
 * @param Gob oil-to-body conductance, W/K, (0, ∞)
 * @returns oil temperature, K
 * @throws InputRangeError for Tb ≤ 0 or G_ob ≤ 0
 * @example oilTemperature(353.15, 40, 8) // 358.15 K (40 W across 8 W/K: the oil 5 K above the body)
 * @source incropera2007 eq. 3.19 thermal resistance, q = ΔT/R (from memory)
 */
export function oilTemperature(Tb: number, P: number, Gob: number): number {
  requireInRange('Tb', Tb, POSITIVE, 'K');
  requireInRange('Gob', Gob, POSITIVE, 'W/K');
  return Tb + P / Gob;
}
