import { POSITIVE, requireInRange } from '../errors.ts';

/** ISO 3448 viscosity grades: mid-point kinematic viscosity at 40 °C, mm²/s. */
export const ISO_VG = [2, 3, 5, 7, 10, 15, 22, 32, 46, 68, 100, 150, 220, 320, 460, 680, 1000, 1500, 2200, 3200] as const;

/**
 * ISO 3448 viscosity grade of an oil from its viscosity at 40 °C: grade VG n holds oils within
 * ±10 % of the mid-point n mm²/s.
 *
 * $$0.9\,n \le \nu_{40} \le 1.1\,n$$
 *
 * @param nu40 kinematic viscosity at 40 °C, m²/s, (0, ∞)
 * @returns the grade ("ISO VG 32"), or the two grades it falls between, or 'outside the grades'
 * @example isoViscosityGrade(32e-6) // 'ISO VG 32'
 * @source iso3448 Table 1 (grade list and ±10 % band from memory)
 */
export function isoViscosityGrade(nu40: number): string {
  const v = requireInRange('nu40', nu40, POSITIVE, 'm²/s') * 1e6;
  // 1e-9 relative slack: 28.8e-6 m²/s converted to mm²/s lands a rounding step below 0.9 × 32
  const hit = ISO_VG.find((g) => v >= 0.9 * g * (1 - 1e-9) && v <= 1.1 * g * (1 + 1e-9));
  if (hit !== undefined) return `ISO VG ${hit}`;
  const above = ISO_VG.find((g) => g > v);
  const below = [...ISO_VG].reverse().find((g) => g < v);
  if (above === undefined || below === undefined) return 'outside the ISO VG grades';
  return `between ISO VG ${below} and VG ${above}`;
}
