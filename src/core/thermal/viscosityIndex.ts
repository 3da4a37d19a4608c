import { ComputationError, InputRangeError, POSITIVE, requireInRange } from '../errors.ts';
import { brentRoot } from '../numeric/brent.ts';
import { D2270_H, D2270_L, D2270_Y_MAX, D2270_Y_MIN, D2270_Y_STEP } from './viscosityIndexTable.ts';

/** L and H (mm²/s) of ASTM D2270 Table 1 at Y = ν100 in mm²/s, interpolated linearly between rows (§5.1.1). */
export function d2270Reference(Y: number): { readonly L: number; readonly H: number } {
  if (!(Y >= D2270_Y_MIN && Y <= D2270_Y_MAX)) {
    throw new InputRangeError('nu100', Y * 1e-6, { min: D2270_Y_MIN * 1e-6, max: D2270_Y_MAX * 1e-6 }, 'm²/s', 'outside the ASTM D2270 table range kept here');
  }
  const x = (Y - D2270_Y_MIN) / D2270_Y_STEP;
  // round-off guard: Y = 2.3 lands a hair below row 3
  const i = Math.min(Math.floor(x + 1e-9), D2270_L.length - 2);
  const f = x - i;
  const lerp = (t: readonly number[]) => t[i]! + f * (t[i + 1]! - t[i]!);
  return { L: lerp(D2270_L), H: lerp(D2270_H) };
}

/**
 * Viscosity index of a petroleum oil from its 40 °C and 100 °C viscosities (ASTM D2270):
 * procedure A up to VI 100, procedure B above.
 *
 * $$VI = 100\,\frac{L - U}{L - H}\ (U \ge H),\qquad VI = 100 + \frac{10^N - 1}{0.00715},\ N = \frac{\log H - \log U}{\log Y}\ (U < H)$$
 *
 * U = ν40, Y = ν100 (mm²/s); L, H from Table 1 at Y.
 *
 * @param nu40 m²/s, (0, ∞); @param nu100 m²/s, [2, 12] mm²/s (the table range kept here)
 * @returns VI (unrounded; the standard reports it to the nearest whole number)
 * @throws InputRangeError outside the table range
 * @example viscosityIndex(73.3e-6, 8.86e-6) // 92.43 (the standard's procedure A example)
 * @source astmD2270 §5.1.3, §6.1.3, Table 1
 */
export function viscosityIndex(nu40: number, nu100: number): number {
  const U = requireInRange('nu40', nu40, POSITIVE, 'm²/s') * 1e6;
  const Y = requireInRange('nu100', nu100, POSITIVE, 'm²/s') * 1e6;
  const { L, H } = d2270Reference(Y);
  if (U >= H) return (100 * (L - U)) / (L - H);
  const N = (Math.log10(H) - Math.log10(U)) / Math.log10(Y);
  return 100 + (10 ** N - 1) / 0.00715;
}

/**
 * The 100 °C viscosity an oil of given ν40 and viscosity index has: ASTM D2270 inverted. VI
 * rises with ν100 at fixed ν40 (a flatter viscosity line), so the root in the table range is
 * unique; found by Brent's method to 1e-9 mm²/s.
 *
 * @param nu40 m²/s; @param VI viscosity index, [0, 200]
 * @returns ν100 in m²/s
 * @throws ComputationError when no ν100 in 2–12 mm²/s gives that VI
 * @example nu100ForViscosityIndex(32e-6, 100) // 5.3619e-6 m²/s (ISO VG 32 at VI 100: H(Y) = 32)
 * @source astmD2270 §5.1.3, §6.1.3, Table 1 (inverted); brent1973 ch. 4
 */
export function nu100ForViscosityIndex(nu40: number, VI: number): number {
  requireInRange('nu40', nu40, POSITIVE, 'm²/s');
  requireInRange('VI', VI, { min: 0, max: 200 }, '');
  const f = (Y: number) => viscosityIndex(nu40, Y * 1e-6) - VI;
  if (f(D2270_Y_MIN) > 0 || f(D2270_Y_MAX) < 0) {
    throw new ComputationError(`no 100 °C viscosity in ${D2270_Y_MIN}–${D2270_Y_MAX} mm²/s gives VI ${VI} with ν40 = ${(nu40 * 1e6).toPrecision(4)} mm²/s`);
  }
  return brentRoot(f, D2270_Y_MIN, D2270_Y_MAX, { xTol: 1e-9 }) * 1e-6;
}
