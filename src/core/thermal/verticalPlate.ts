import { requireInRange } from '../errors.ts';

/**
 * Average Nusselt number of free convection from an isothermal vertical plate of height L: the
 * Churchill–Chu all-range correlation, one formula continuous over every Rayleigh number offered.
 * The laminar form (eq. 9.27) is slightly more accurate below 10⁹ but switching to it there makes
 * Nu jump by about a third at Ra_L = 10⁹ (92 → 123 at Pr = 0.7), and every equilibrium solved on a
 * jump is wrong; so the all-range form is used throughout.
 *
 * $$\overline{Nu}_L = \left\{0.825 + \frac{0.387\,Ra_L^{1/6}}{\left[1+(0.492/Pr)^{9/16}\right]^{8/27}}\right\}^2$$
 *
 * @param Ra Rayleigh number on the height, [0, ∞)
 * @param Pr Prandtl number, (0, ∞)
 * @returns Nu_L
 * @throws InputRangeError for negative Ra or non-positive Pr
 * @example verticalPlateNusselt(1.813e9, 0.69) // ≈ 147 (incropera2007 Example 9.2 glass door, from memory)
 * @example verticalPlateNusselt(1e9, 0.7) // 122.615 (closed form)
 * @source incropera2007 eq. 9.26 (from memory); churchillChu1975plate
 */
export function verticalPlateNusselt(Ra: number, Pr: number): number {
  requireInRange('Ra', Ra, { min: 0, max: Infinity, maxExclusive: true }, '');
  requireInRange('Pr', Pr, { min: 0, max: Infinity, minExclusive: true, maxExclusive: true }, '');
  const g = 1 + (0.492 / Pr) ** (9 / 16);
  return (0.825 + (0.387 * Ra ** (1 / 6)) / g ** (8 / 27)) ** 2;
}

/**
 * Whether a vertical cylinder may be treated as a vertical plate: its boundary layer must be thin
 * against the diameter.
 *
 * $$D \ge \frac{35\,L}{Gr_L^{1/4}}$$
 *
 * @param D diameter, m; @param L height, m; @param GrL Grashof number on the height
 * @returns { ok, Dmin } with Dmin = 35 L / Gr_L^{1/4} (∞ when Gr_L = 0)
 * @source incropera2007 eq. 9.33 (from memory)
 */
export function verticalCylinderSlenderness(D: number, L: number, GrL: number): { ok: boolean; Dmin: number } {
  const Dmin = GrL > 0 ? (35 * L) / GrL ** 0.25 : Infinity;
  return { ok: D >= Dmin, Dmin };
}
