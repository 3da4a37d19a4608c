import { requireInRange } from '../errors.ts';

/**
 * Average Nusselt number of a circular cylinder in cross flow (Churchill–Bernstein), for all
 * Re_D·Pr ≥ 0.2; properties at the film temperature.
 *
 * $$\overline{Nu}_D = 0.3 + \frac{0.62\,Re_D^{1/2}Pr^{1/3}}{\left[1+(0.4/Pr)^{2/3}\right]^{1/4}}\left[1+\left(\frac{Re_D}{282\,000}\right)^{5/8}\right]^{4/5}$$
 *
 * @param Re Reynolds number on the diameter, [0, ∞)
 * @param Pr Prandtl number, (0, ∞)
 * @returns Nu_D (0.3 at Re = 0, where the correlation is outside its range)
 * @throws InputRangeError for negative Re or non-positive Pr
 * @example churchillBernstein(6071, 0.700) // 40.6 (incropera2007 Example 7.4, from memory)
 * @source incropera2007 eq. 7.54 (from memory); churchillBernstein1977
 */
export function churchillBernstein(Re: number, Pr: number): number {
  requireInRange('Re', Re, { min: 0, max: Infinity, maxExclusive: true }, '');
  requireInRange('Pr', Pr, { min: 0, max: Infinity, minExclusive: true, maxExclusive: true }, '');
  const a = (0.62 * Math.sqrt(Re) * Pr ** (1 / 3)) / (1 + (0.4 / Pr) ** (2 / 3)) ** 0.25;
  return 0.3 + a * (1 + (Re / 282000) ** (5 / 8)) ** 0.8;
}

/** Smallest Re·Pr of the correlation's range. */
export const CHURCHILL_BERNSTEIN_REPR_MIN = 0.2;
