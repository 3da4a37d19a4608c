/**
 * ISO 8608 road roughness classes: the displacement PSD G_d(n0) at n0 = 0.1 cycle/m.
 */
import { InputRangeError } from '../errors.ts';

export const ISO_8608_CLASSES = ['A', 'B', 'C', 'D', 'E', 'F', 'G', 'H'] as const;
export type RoadClass = (typeof ISO_8608_CLASSES)[number];
/** Which value of a class: its geometric mean, or its lower or upper limit. */
export type ClassValue = 'mean' | 'lower' | 'upper';

/**
 * Degree of roughness G_d(n0) of an ISO 8608 class.
 *
 * $$G_d(n_0)\big|_{\text{mean}} = 16\times10^{-6}\cdot 4^{k}\ \mathrm{m^3},\quad k = 0 (A) \ldots 7 (H);\qquad
 *   \text{limits} = \text{mean}\cdot 2^{\mp 1}$$
 *
 * The geometric means step by a factor 4 from class A (16·10⁻⁶ m³) to class H (262 144·10⁻⁶ m³),
 * and each class runs from half to twice its mean. The standard leaves the lower limit of A and
 * the upper limit of H open; `openLimit` is true there and the factor-2 value is returned so a
 * caller can still compute, with a warning.
 *
 * @param roadClass 'A'…'H'
 * @param which 'mean' (default), 'lower' or 'upper'
 * @returns G_d(n0) in m³ and whether the standard leaves that limit open
 * @throws InputRangeError for an unknown class
 * @example roadRoughness('C').Gd0 // 256e-6 m³
 * @source iso8608 Table 1, classes A–H (table number from memory; the class values are the
 *   standard's geometric means and limits)
 */
export function roadRoughness(roadClass: string, which: ClassValue = 'mean'): { Gd0: number; openLimit: boolean } {
  const k = ISO_8608_CLASSES.indexOf(roadClass as RoadClass);
  if (k < 0) throw new InputRangeError('roadClass', roadClass, undefined, '', `choose one of ${ISO_8608_CLASSES.join(', ')}`);
  const mean = 16e-6 * 4 ** k;
  if (which === 'mean') return { Gd0: mean, openLimit: false };
  if (which === 'lower') return { Gd0: mean / 2, openLimit: k === 0 };
  return { Gd0: mean * 2, openLimit: k === ISO_8608_CLASSES.length - 1 };
}
