import { requireInRange, POSITIVE } from '../errors.ts';
import { waltherFit, waltherViscosity, type WaltherFit } from './walther.ts';

/**
 * A fluid's kinematic viscosity against temperature, whatever law gives it (ASTM D341 for a
 * mineral oil, a two-point Andrade line for a silicone fluid, a measured table). The fade laws
 * need ν(T) and its logarithmic slope (for the fractional change per kelvin).
 */
export interface ViscosityCurve {
  /** ν in m²/s at T (K). */
  nu(T: number): number;
  /** d ln ν / dT in 1/K at T (K); negative for a liquid. */
  dlnNu(T: number): number;
}

/**
 * Logarithmic slope of the ASTM D341 line, differentiated in closed form: with
 * $L = \log_{10}(\nu + 0.7)$ (ν in mm²/s),
 *
 * $$\frac{d\ln\nu}{dT} = -\frac{(\nu + 0.7)\,\ln 10\;L\,B}{\nu\,T}$$
 *
 * @param fit A, B from `waltherFit`; @param T K, (0, ∞)
 * @returns d ln ν/dT, 1/K
 * @example waltherLogSlope({ A: 9.530815, B: 3.746578 }, 313.15) // -0.042636 1/K (ν40 = 32, ν100 = 5.4 mm²/s, at 40 °C)
 * @source astmD341 viscosity–temperature equation (from memory), differentiated (closed form)
 */
export function waltherLogSlope(fit: WaltherFit, T: number): number {
  requireInRange('T', T, POSITIVE, 'K');
  const nu = waltherViscosity(fit, T) * 1e6;
  const L = Math.log10(nu + 0.7);
  return (-(nu + 0.7) * Math.LN10 * L * fit.B) / (nu * T);
}

/** The ASTM D341 curve of a mineral oil through its 40 °C and 100 °C viscosities (m²/s). */
export function mineralOilCurve(nu40: number, nu100: number): ViscosityCurve {
  const fit = waltherFit(nu40, nu100);
  return { nu: (T) => waltherViscosity(fit, T), dlnNu: (T) => waltherLogSlope(fit, T) };
}

/** Accepts either a D341 fit (the original fade model's `oil`) or any viscosity curve. */
export function asViscosityCurve(oil: WaltherFit | ViscosityCurve): ViscosityCurve {
  if ('nu' in oil) return oil;
  return { nu: (T) => waltherViscosity(oil, T), dlnNu: (T) => waltherLogSlope(oil, T) };
}
