import { requireInRange } from '../errors.ts';
import { AIR_TABLE, AIR_T_MAX, AIR_T_MIN, type AirRow } from './airTable.ts';

/**
 * Properties of dry air at atmospheric pressure (densities of 1 bar; see airTable.ts) at temperature T, by linear interpolation in the published table
 * (50 K spacing). Linear interpolation of ν, k, α between 50 K rows errs by under 0.3 % (their
 * curvature is small); the film-temperature method itself is far coarser than that.
 *
 * $$\phi(T) = \phi_i + (\phi_{i+1}-\phi_i)\,\frac{T-T_i}{T_{i+1}-T_i}$$
 *
 * @param T temperature, K, [200, 700]
 * @returns ρ, c_p, μ, ν, k, α, Pr in SI (the row shape of AIR_TABLE)
 * @throws InputRangeError when T is outside the table
 * @example airProperties(300).nu // 1.589e-5 m²/s
 * @source incropera2007 Table A.4 (values from memory)
 */
export function airProperties(T: number): AirRow {
  requireInRange('T (air film temperature)', T, { min: AIR_T_MIN, max: AIR_T_MAX }, 'K');
  let i = 0;
  while (i < AIR_TABLE.length - 2 && T > (AIR_TABLE[i + 1] as AirRow).T) i++;
  const lo = AIR_TABLE[i] as AirRow;
  const hi = AIR_TABLE[i + 1] as AirRow;
  const w = (T - lo.T) / (hi.T - lo.T);
  // written out, not through a closure: the body-model ODEs call this millions of times
  return {
    T,
    rho: lo.rho + (hi.rho - lo.rho) * w,
    cp: lo.cp + (hi.cp - lo.cp) * w,
    mu: lo.mu + (hi.mu - lo.mu) * w,
    nu: lo.nu + (hi.nu - lo.nu) * w,
    k: lo.k + (hi.k - lo.k) * w,
    alpha: lo.alpha + (hi.alpha - lo.alpha) * w,
    Pr: lo.Pr + (hi.Pr - lo.Pr) * w,
  };
}
