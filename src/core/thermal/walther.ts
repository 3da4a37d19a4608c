import { ComputationError, POSITIVE, requireInRange } from '../errors.ts';

/** Walther (ASTM D341) constants of an oil: log10 log10(ν + 0.7) = A − B log10 T, ν in mm²/s, T in K. */
export interface WaltherFit {
  readonly A: number;
  readonly B: number;
}

const T40 = 313.15;
const T100 = 373.15;
const Z = (nuMm2: number) => Math.log10(Math.log10(nuMm2 + 0.7));

/**
 * ASTM D341 viscosity–temperature line through two measured points (normally 40 °C and 100 °C).
 *
 * $$\log_{10}\log_{10}(\nu + 0.7) = A - B\log_{10}T\quad(\nu\ \text{in mm}^2/\text{s},\ T\ \text{in K})$$
 *
 * Natural logarithms or +0.8 give a different fit; this is the standard's form. The simple +0.7
 * form holds for ν ≥ 2 mm²/s; thinner oils need the standard's extra terms (not applied here).
 *
 * @param nu40 kinematic viscosity at 40 °C, m²/s, (0, ∞), above nu100
 * @param nu100 kinematic viscosity at 100 °C, m²/s, (0, ∞)
 * @returns { A, B } (dimensionless, for ν in mm²/s and T in K)
 * @throws InputRangeError for non-positive inputs; ComputationError when nu100 ≥ nu40
 * @example waltherFit(32e-6, 5.4e-6) // { A: 9.530815, B: 3.746578 }
 * @source astmD341 §"two-point equation" (from memory)
 */
export function waltherFit(nu40: number, nu100: number): WaltherFit {
  requireInRange('nu40', nu40, POSITIVE, 'm²/s');
  requireInRange('nu100', nu100, POSITIVE, 'm²/s');
  if (!(nu100 < nu40)) throw new ComputationError('the 100 °C viscosity must be below the 40 °C viscosity');
  const z1 = Z(nu40 * 1e6);
  const z2 = Z(nu100 * 1e6);
  const B = (z1 - z2) / (Math.log10(T100) - Math.log10(T40));
  return { A: z1 + B * Math.log10(T40), B };
}

/**
 * Kinematic viscosity at T from a Walther fit.
 *
 * $$\nu = 10^{10^{A - B\log_{10}T}} - 0.7\ \ [\text{mm}^2/\text{s}]$$
 *
 * @param fit A, B from `waltherFit`
 * @param T temperature, K, (0, ∞)
 * @returns ν in m²/s (> 0)
 * @throws ComputationError when the line runs below 0 (far outside the fitted range)
 * @example waltherViscosity({ A: 9.530815, B: 3.746578 }, 273.15) // 3.3600e-4 m²/s
 * @source astmD341 (from memory)
 */
export function waltherViscosity(fit: WaltherFit, T: number): number {
  requireInRange('T', T, POSITIVE, 'K');
  const nu = 10 ** (10 ** (fit.A - fit.B * Math.log10(T))) - 0.7;
  if (!(nu > 0) || !Number.isFinite(nu)) throw new ComputationError(`the viscosity line gives no positive viscosity at ${T.toFixed(1)} K`);
  return nu * 1e-6;
}
