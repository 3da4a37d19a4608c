import { requireInRange } from '../errors.ts';

/**
 * Average Nusselt number of free convection from a long isothermal horizontal cylinder
 * (Churchill–Chu), for Ra_D ≤ 10¹².
 *
 * $$\overline{Nu}_D = \left\{0.60 + \frac{0.387\,Ra_D^{1/6}}{\left[1+(0.559/Pr)^{9/16}\right]^{8/27}}\right\}^2$$
 *
 * @param Ra Rayleigh number on the diameter, [0, ∞) (the correlation is fitted up to 10¹²)
 * @param Pr Prandtl number, (0, ∞)
 * @returns Nu_D, ≥ 0.36
 * @throws InputRangeError for negative Ra or non-positive Pr
 * @example churchillChuCylinder(5.073e6, 0.697) // 23.09 (closed form; the book's Example 9.3 steam pipe gives 23.3 from rounded properties, from memory)
 * @source incropera2007 eq. 9.34 (from memory); churchillChu1975 eq. (the horizontal-cylinder correlation)
 */
export function churchillChuCylinder(Ra: number, Pr: number): number {
  requireInRange('Ra', Ra, { min: 0, max: Infinity, maxExclusive: true }, '');
  requireInRange('Pr', Pr, { min: 0, max: Infinity, minExclusive: true, maxExclusive: true }, '');
  const f = (1 + (0.559 / Pr) ** (9 / 16)) ** (8 / 27);
  return (0.6 + (0.387 * Ra ** (1 / 6)) / f) ** 2;
}

/** Largest Rayleigh number of the fitted data, for the validity warning. */
export const CHURCHILL_CHU_CYLINDER_RA_MAX = 1e12;
