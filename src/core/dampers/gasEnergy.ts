/**
 * Energy a compressed gas gives up when it expands to the atmosphere in one reversible adiabatic
 * stroke: the figure behind "never open a charged damper" (a rupture releases it in milliseconds).
 */
import { STANDARD_ATMOSPHERE } from '../constants.ts';
import { requireInRange } from '../errors.ts';

/** Ratio of specific heats of nitrogen (a diatomic ideal gas near room temperature). */
export const NITROGEN_GAMMA = 1.4;

/**
 * Work of an isentropic expansion of an ideal gas from p, V to the standard atmosphere:
 *
 * $$E = \frac{p V}{\gamma - 1}\left[1 - \left(\frac{p_{atm}}{p}\right)^{(\gamma-1)/\gamma}\right]$$
 *
 * (the drop of internal energy m·c_v·(T₁ − T₂) with T₂/T₁ = (p_atm/p)^{(γ−1)/γ}). Zero at and below
 * the atmosphere.
 *
 * @param p gas pressure, absolute, Pa, in (0, 1e9]
 * @param V gas volume, m³, in (0, 1]
 * @param gamma ratio of specific heats, in (1, 1.67]
 * @throws InputRangeError naming p, V or gamma out of range
 * @example gasStoredEnergy(2.5e6, 50e-6) // 187.45 (50 cm³ at 25 bar abs)
 * @source cengel2015 §7-9 isentropic process of an ideal gas, eq. for T₂/T₁ with constant specific heats (from memory); closed form
 */
export function gasStoredEnergy(p: number, V: number, gamma = NITROGEN_GAMMA): number {
  requireInRange('p', p, { min: 0, max: 1e9, minExclusive: true }, 'Pa');
  requireInRange('V', V, { min: 0, max: 1, minExclusive: true }, 'm³');
  requireInRange('gamma', gamma, { min: 1, max: 1.67, minExclusive: true });
  if (p <= STANDARD_ATMOSPHERE) return 0;
  return ((p * V) / (gamma - 1)) * (1 - (STANDARD_ATMOSPHERE / p) ** ((gamma - 1) / gamma));
}
