import { NON_NEGATIVE, requireInRange } from '../errors.ts';

/**
 * Heat a body absorbs from the sun (or from any beam of irradiance): the absorbed share of the
 * irradiance on the area the beam sees. For a cylinder square to the beam that area is D·L.
 * The body's own emission is already in the radiation loss (emissivity ε, surroundings T_sur);
 * α is the absorptivity for sunlight, which for paints can differ much from ε (white paint: α ≈ 0.2
 * with ε ≈ 0.9; black paint α ≈ 0.95).
 *
 * $$Q_{sun} = \alpha_s\,G_s\,A_p,\qquad A_p = D\,L\ \text{(cylinder, beam square to the axis)}$$
 *
 * @param alpha solar absorptivity, [0, 1]
 * @param G irradiance on a plane square to the beam, W/m², [0, 5000]
 * @param Ap projected area, m², [0, ∞)
 * @returns absorbed power, W
 * @throws InputRangeError for inputs outside those ranges
 * @example solarGain(0.6, 1000, 0.3 * 2) // 360 W (0.3 × 2 m body in full sun)
 * @source incropera2007 §12.8 absorptivity and solar irradiation, eq. 12.60 (from memory)
 */
export function solarGain(alpha: number, G: number, Ap: number): number {
  requireInRange('alphaSun', alpha, { min: 0, max: 1 }, '');
  requireInRange('irradiance', G, { min: 0, max: 5000 }, 'W/m²');
  requireInRange('Ap', Ap, NON_NEGATIVE, 'm²');
  return alpha * G * Ap;
}
