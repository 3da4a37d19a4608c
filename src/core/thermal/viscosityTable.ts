import { ComputationError, InputRangeError, POSITIVE, requireInRange } from '../errors.ts';
import { readUnitRows } from './unitRows.ts';
import type { ViscosityCurve } from './viscosityCurve.ts';
import { ZERO_CELSIUS } from '../constants.ts';

/** Most rows a viscosity table may hold. */
export const MAX_VISCOSITY_ROWS = 200;

/**
 * A measured viscosity table as a curve: between neighbouring rows ln ν is linear in 1/T (the
 * Andrade form piece by piece), so the curve passes through every row and stays monotone when
 * the rows are; beyond the ends the end pieces are extended (an extrapolation; callers warn).
 *
 * $$\ln\nu(T) = \ln\nu_i + \frac{1/T - 1/T_i}{1/T_{i+1} - 1/T_i}\,\ln\frac{\nu_{i+1}}{\nu_i},\quad T_i \le T \le T_{i+1}$$
 *
 * The slope d ln ν/dT is the piece's; at a row, the mean of the two pieces meeting there.
 *
 * @param rows [T (K), ν (m²/s)] pairs, at least two, any order
 * @returns the curve and its temperature span
 * @throws InputRangeError for fewer than two rows, repeated temperatures or a viscosity that does
 *   not fall as the temperature rises (naming the row)
 * @example viscosityTableCurve([[313.15, 32e-6], [373.15, 5.4e-6]]).curve.nu(313.15) // 3.2e-5
 * @source andrade1930 (1/T law between points, from memory); interpolation: common practice, no source
 */
export function viscosityTableCurve(rows: readonly (readonly number[])[], input = 'nuTable'): { curve: ViscosityCurve; Tmin: number; Tmax: number } {
  if (rows.length < 2) throw new InputRangeError(input, `${rows.length} rows`, undefined, '', 'give at least two rows T, ν');
  const pts = rows.map((r, i) => ({ T: requireInRange(`${input} row ${i + 1} T`, r[0]!, POSITIVE, 'K'), nu: requireInRange(`${input} row ${i + 1} ν`, r[1]!, POSITIVE, 'm²/s') }))
    .sort((p, q) => p.T - q.T);
  for (let i = 1; i < pts.length; i++) {
    if (!(pts[i]!.T > pts[i - 1]!.T)) throw new InputRangeError(input, pts[i]!.T, undefined, 'K', `temperature ${(pts[i]!.T - ZERO_CELSIUS).toFixed(2)} °C appears twice`);
    if (!(pts[i]!.nu < pts[i - 1]!.nu)) throw new InputRangeError(input, pts[i]!.nu, undefined, 'm²/s', `the viscosity at ${(pts[i]!.T - ZERO_CELSIUS).toFixed(2)} °C is not below the one at ${(pts[i - 1]!.T - ZERO_CELSIUS).toFixed(2)} °C: a liquid thins as it warms`);
  }
  const x = pts.map((p) => 1 / p.T);
  const y = pts.map((p) => Math.log(p.nu));
  const piece = (T: number) => {
    let i = 0;
    while (i < pts.length - 2 && T > pts[i + 1]!.T) i++;
    return { i, slope: (y[i + 1]! - y[i]!) / (x[i + 1]! - x[i]!) }; // d ln ν / d(1/T)
  };
  const curve: ViscosityCurve = {
    nu(T) {
      requireInRange('T', T, POSITIVE, 'K');
      const { i, slope } = piece(T);
      const v = Math.exp(y[i]! + slope * (1 / T - x[i]!));
      if (!Number.isFinite(v)) throw new ComputationError(`the viscosity table gives no finite viscosity at ${T.toFixed(1)} K`);
      return v;
    },
    dlnNu(T) {
      // at a row the slope jumps; take the mean of the two pieces there (within 1 µK, so a
      // temperature converted from °F and back lands on the same answer)
      const k = pts.findIndex((p) => Math.abs(p.T - T) < 1e-6);
      const slope = k > 0 && k < pts.length - 1
        ? 0.5 * ((y[k]! - y[k - 1]!) / (x[k]! - x[k - 1]!) + (y[k + 1]! - y[k]!) / (x[k + 1]! - x[k]!))
        : piece(T).slope;
      return -slope / (T * T);
    },
  };
  return { curve, Tmin: pts[0]!.T, Tmax: pts.at(-1)!.T };
}

/** Reads a pasted table "T, ν" (header units such as "T [°C], nu [mm²/s]"; SI without) into a curve. */
export function parseViscosityTable(text: string, input = 'nuTable'): { curve: ViscosityCurve; Tmin: number; Tmax: number } {
  const t = readUnitRows(text, input, [{ name: 'temperature', kind: 'temperature' }, { name: 'kinematic viscosity', kind: 'kinematicViscosity' }], MAX_VISCOSITY_ROWS);
  return viscosityTableCurve(t.rows, input);
}
