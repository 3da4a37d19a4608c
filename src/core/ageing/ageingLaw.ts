/**
 * How fast a seal or oil ages with temperature: its life L(T) at a constant temperature, from one
 * reference life and either an activation energy (Arrhenius) or a halving interval in kelvin.
 */
import { MOLAR_GAS_CONSTANT } from '../constants.ts';
import { InputRangeError, requireInRange } from '../errors.ts';

export type AgeingLaw =
  /** L = L_ref·exp[(E_a/R)(1/T − 1/T_ref)]. */
  | { readonly kind: 'arrhenius'; readonly Lref: number; readonly Tref: number; readonly Ea: number }
  /** L = L_ref·2^{−(T − T_ref)/ΔT_h}: the life halves every ΔT_h kelvin. */
  | { readonly kind: 'halving'; readonly Lref: number; readonly Tref: number; readonly dTh: number };

/** Checks a law's numbers; throws InputRangeError naming Lref, Tref, Ea or dTh. */
export function validateAgeingLaw(law: AgeingLaw): AgeingLaw {
  requireInRange('Lref', law.Lref, { min: 0, max: 1e13, minExclusive: true }, 's');
  requireInRange('Tref', law.Tref, { min: 0, max: 1000, minExclusive: true }, 'K');
  if (law.kind === 'arrhenius') requireInRange('Ea', law.Ea, { min: 0, max: 1e6, minExclusive: true }, 'J/mol');
  else if (law.kind === 'halving') requireInRange('dTh', law.dTh, { min: 0, max: 1000, minExclusive: true }, 'K');
  else throw new InputRangeError('model', (law as { kind: unknown }).kind, undefined, '', 'arrhenius or halving');
  return law;
}

/**
 * Natural log of the ageing rate 1/L(T), ln(1/s): the one place the law is written, so the life,
 * the damage integral and the inverse below cannot drift apart.
 */
export function lnAgeingRate(law: AgeingLaw, T: number): number {
  const shift = law.kind === 'arrhenius'
    ? (law.Ea / MOLAR_GAS_CONSTANT) * (1 / law.Tref - 1 / T)
    : ((T - law.Tref) / law.dTh) * Math.LN2;
  return shift - Math.log(law.Lref);
}

/**
 * Life at a constant temperature.
 *
 * $$L(T) = L_{ref}\exp\!\left[\frac{E_a}{R}\left(\frac1T - \frac1{T_{ref}}\right)\right]\quad\text{or}\quad L(T) = L_{ref}\,2^{-(T-T_{ref})/\Delta T_h}$$
 *
 * @param T temperature, K, > 0
 * @throws InputRangeError naming T or a law input
 * @example ageingLife({ kind: 'arrhenius', Lref: 1000, Tref: 373.15, Ea: 82400 }, 353.15) // 4500.2 (hours in, hours out)
 * @source iso11346 Arrhenius approach: time to the end-of-life threshold against 1/T (clause numbers from memory)
 */
export function ageingLife(law: AgeingLaw, T: number): number {
  validateAgeingLaw(law);
  requireInRange('T', T, { min: 0, max: 1000, minExclusive: true }, 'K');
  return Math.exp(-lnAgeingRate(law, T));
}

/**
 * The constant temperature at which the life is L (the inverse of ageingLife): ISO 11346's
 * "maximum temperature of use" for a required life, and the equivalent temperature of a history.
 *
 * $$\frac1T = \frac1{T_{ref}} + \frac{R}{E_a}\ln\frac{L}{L_{ref}}\quad\text{or}\quad T = T_{ref} - \Delta T_h\log_2\frac{L}{L_{ref}}$$
 *
 * @param L life, same unit as L_ref, > 0
 * @returns K; undefined when no positive temperature gives that life (Arrhenius, L far above L_ref)
 * @example temperatureForLife({ kind: 'halving', Lref: 1000, Tref: 373.15, dTh: 10 }, 250) // 393.15
 * @source iso11346 estimation of the maximum temperature of use from the Arrhenius line (from memory); closed form
 */
export function temperatureForLife(law: AgeingLaw, L: number): number | undefined {
  validateAgeingLaw(law);
  requireInRange('L', L, { min: 0, max: Infinity, minExclusive: true, maxExclusive: true });
  if (law.kind === 'halving') return law.Tref - law.dTh * Math.log2(L / law.Lref);
  const inv = 1 / law.Tref + (MOLAR_GAS_CONSTANT / law.Ea) * Math.log(L / law.Lref);
  return inv > 0 ? 1 / inv : undefined;
}

/**
 * The halving interval an Arrhenius law has at T: the rise that halves the life there.
 *
 * $$\Delta T_h = \frac{R\,T^2\ln 2}{E_a}\quad(\text{first order in }\Delta T/T)$$
 *
 * @example halvingInterval(82400, 373.15) // 9.739
 * @source closed form (derivative of ln L with respect to T)
 */
export function halvingInterval(Ea: number, T: number): number {
  requireInRange('Ea', Ea, { min: 0, max: 1e6, minExclusive: true }, 'J/mol');
  requireInRange('T', T, { min: 0, max: 1000, minExclusive: true }, 'K');
  return (MOLAR_GAS_CONSTANT * T * T * Math.LN2) / Ea;
}
