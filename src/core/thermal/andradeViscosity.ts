import { ComputationError, POSITIVE, requireInRange } from '../errors.ts';
import type { ViscosityCurve } from './viscosityCurve.ts';

/**
 * Two-point Andrade line for a silicone (polydimethylsiloxane) damper fluid: the logarithm of the
 * viscosity is linear in 1/T, fixed by two measured points (the data sheet's 25 °C value and one
 * more, or the 40 °C and 100 °C values).
 *
 * $$\ln\nu = a + \frac{b}{T},\qquad b = \frac{\ln(\nu_1/\nu_2)}{1/T_1 - 1/T_2},\qquad \frac{d\ln\nu}{dT} = -\frac{b}{T^2}$$
 *
 * Silicone fluids thin far less with heat than mineral oils (viscosity–temperature coefficient
 * 1 − ν(99 °C)/ν(38 °C) about 0.6 against 0.8 or more for mineral oils, from memory), and the D341
 * chart, made for petroleum products, does not fit them; the Andrade form holds well over a
 * moderate range. Outside the two points it is an extrapolation.
 *
 * @param T1 K; @param nu1 m²/s at T1; @param T2 K, ≠ T1; @param nu2 m²/s at T2
 * @returns the curve ν(T), d ln ν/dT
 * @throws InputRangeError for non-positive values; ComputationError unless the fluid thins as it warms
 * @example andradeCurve(313.15, 70e-6, 373.15, 28e-6).nu(343.15) // 4.2534e-5 m²/s (70 and 28 mm²/s at 40 and 100 °C)
 * @source andrade1930 (the 1/T law, from memory)
 */
export function andradeCurve(T1: number, nu1: number, T2: number, nu2: number): ViscosityCurve {
  requireInRange('T1', T1, POSITIVE, 'K');
  requireInRange('T2', T2, POSITIVE, 'K');
  requireInRange('nu1', nu1, POSITIVE, 'm²/s');
  requireInRange('nu2', nu2, POSITIVE, 'm²/s');
  const [lo, hi] = T1 < T2 ? [{ T: T1, nu: nu1 }, { T: T2, nu: nu2 }] : [{ T: T2, nu: nu2 }, { T: T1, nu: nu1 }];
  if (!(hi.T > lo.T) || !(hi.nu < lo.nu)) throw new ComputationError('the two viscosity points must be at different temperatures, the warmer one thinner');
  const b = Math.log(lo.nu / hi.nu) / (1 / lo.T - 1 / hi.T);
  const a = Math.log(lo.nu) - b / lo.T;
  return {
    nu: (T) => Math.exp(a + b / requireInRange('T', T, POSITIVE, 'K')),
    dlnNu: (T) => -b / (T * T),
  };
}
