import { POSITIVE, requireInRange } from '../errors.ts';

/** Temperature at which oil densities are quoted, K (15 °C). */
export const DENSITY_T_REF = 288.15;

/**
 * Density of an oil at T from its 15 °C density and a constant volumetric expansion coefficient β.
 *
 * $$\rho(T) = \frac{\rho_{15}}{1 + \beta\,(T - 288.15\ \text{K})}$$
 *
 * Mineral oils have β ≈ 6.5–7.5·10⁻⁴ 1/K (silicone fluids ≈ 9.5·10⁻⁴ 1/K). The petroleum
 * measurement tables use ρ_T = ρ₁₅·exp[−α₁₅ΔT(1 + 0.8α₁₅ΔT)]; with α₁₅ = 7·10⁻⁴ 1/K the two
 * agree within 0.1 % at −40 K and 0.6 % at +100 K (from memory), a small part of a few-percent
 * density effect on the force.
 *
 * @param rho15 kg/m³ at 15 °C, (0, ∞); @param beta 1/K, [0, 0.01); @param T K, (0, ∞)
 * @returns ρ in kg/m³
 * @example oilDensity(870, 7e-4, 353.15) // 832.14 kg/m³ (oil at 80 °C)
 * @source apiMpms11_1 §11.1.6 volume correction (from memory) for the β values and the exponential form
 */
export function oilDensity(rho15: number, beta: number, T: number): number {
  requireInRange('rho15', rho15, POSITIVE, 'kg/m³');
  requireInRange('beta', beta, { min: 0, max: 0.01, maxExclusive: true }, '1/K');
  requireInRange('T', T, POSITIVE, 'K');
  const d = 1 + beta * (T - DENSITY_T_REF);
  requireInRange('1 + β(T − 15 °C)', d, POSITIVE, '');
  return rho15 / d;
}
