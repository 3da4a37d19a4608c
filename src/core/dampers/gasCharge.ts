/**
 * The gas charge of a monotube (or accumulator) damper at a working temperature and rod position:
 * pressure, rod extension force, gas spring rate and the compression force at which the rebound
 * side cavitates. Pressures are absolute; the rod's outer end sees the standard atmosphere.
 */
import { STANDARD_ATMOSPHERE } from '../constants.ts';
import { ComputationError, InputRangeError, POSITIVE, requireInRange } from '../errors.ts';

export interface GasChargeInput {
  /** Charge pressure, absolute, Pa, set at T0 with the rod out (x = 0). */
  readonly p0: number;
  /** Temperature of gas and oil when the charge was set, K. */
  readonly T0: number;
  /** Gas volume at charging, m³. */
  readonly Vg0: number;
  /** Oil volume, m³ (all the oil that expands into the gas space). */
  readonly Voil: number;
  /** Net volumetric expansion coefficient of the oil against its tube, 1/K. */
  readonly beta: number;
  readonly dRod: number;
  readonly dPiston: number;
  /** Working temperature of gas and oil, K. */
  readonly T: number;
  /** Rod insertion from the charging position, m (≥ 0). */
  readonly x: number;
  /** Polytropic index of the rod stroke: 1 slow (isothermal), 1.4 fast (adiabatic nitrogen). */
  readonly n: number;
}

export interface GasCharge {
  /** Gas pressure, absolute, Pa. */
  readonly p: number;
  /** Rod extension force (p − p_atm)·A_rod, N. */
  readonly Fext: number;
  /** Gas spring rate at the rod, n·p·A_rod²/V_g, N/m. */
  readonly kg: number;
  /** Compression rod force at which the rebound chamber reaches zero absolute pressure, N. */
  readonly FcMax: number;
  /** Oil volume change from T0 to T, m³ (negative when colder). */
  readonly dVoil: number;
  /** Gas volume left at T and x, m³. */
  readonly Vg: number;
}

/**
 * Ideal gas heated with the oil, then compressed by the rod along a polytrope:
 *
 * $$\Delta V_{oil} = V_{oil}\,\beta\,(T-T_0),\quad V_1 = V_{g0}-\Delta V_{oil},\quad p_1 = p_0\,\frac{T}{T_0}\,\frac{V_{g0}}{V_1},$$
 * $$V_g = V_1 - A_r x,\quad p = p_1\left(\frac{V_1}{V_g}\right)^{n},\quad F_{ext} = (p-p_{atm})A_r,\quad k_g = \frac{n\,p\,A_r^2}{V_g},$$
 * $$F_{c,max} = p\,A_p - p_{atm}A_r = F_{ext} + p\,(A_p - A_r).$$
 *
 * F_c,max: in compression the piston valve drops the rebound chamber to p − Δp; it reaches zero
 * absolute (vapour pressure and released air neglected, so real cavitation starts earlier) when the
 * valve force Δp·(A_p − A_r) equals p·(A_p − A_r); the gas force on the rod adds F_ext.
 *
 * @param g inputs in SI (see GasChargeInput); p0 in (0, 1e8] Pa, T0 and T in (0, 1000] K, volumes
 *   > 0, beta in [0, 0.01] 1/K, 0 < dRod < dPiston, x ≥ 0, n in [1, 1.67]
 * @throws InputRangeError naming the input out of range (dRod when not below dPiston)
 * @throws ComputationError when the oil expansion and the rod fill the gas space (hydraulic lock)
 * @example gasCharge({ p0: 2.5e6, T0: 293.15, Vg0: 50e-6, Voil: 300e-6, beta: 0.7e-3, dRod: 0.014, dPiston: 0.046, T: 353.15, x: 0, n: 1 }) // { p: 4026315, Fext: 604.205 }
 * @source cengel2015 §3-8 ideal-gas equation of state, §4-1 polytropic process p·Vⁿ = const (from memory);
 *   dixon2007 ch. 1 and the cavitation section of the fluid-dynamics chapter, gas pressure and rod force (from memory)
 */
export function gasCharge(g: GasChargeInput): GasCharge {
  requireInRange('p0', g.p0, { min: 0, max: 1e8, minExclusive: true }, 'Pa');
  requireInRange('T0', g.T0, { min: 0, max: 1000, minExclusive: true }, 'K');
  requireInRange('T', g.T, { min: 0, max: 1000, minExclusive: true }, 'K');
  requireInRange('Vg0', g.Vg0, POSITIVE, 'm³');
  requireInRange('Voil', g.Voil, { min: 0, max: Infinity, maxExclusive: true }, 'm³');
  requireInRange('beta', g.beta, { min: 0, max: 0.01 }, '1/K');
  requireInRange('dPiston', g.dPiston, POSITIVE, 'm');
  requireInRange('dRod', g.dRod, { min: 0, max: g.dPiston, minExclusive: true, maxExclusive: true }, 'm');
  requireInRange('x', g.x, { min: 0, max: Infinity, maxExclusive: true }, 'm');
  requireInRange('n', g.n, { min: 1, max: 1.67 });
  if (g.p0 <= STANDARD_ATMOSPHERE) throw new InputRangeError('p0', g.p0, { min: STANDARD_ATMOSPHERE, max: 1e8, minExclusive: true }, 'Pa', 'a charge is above the atmosphere (pressures are absolute)');
  const Ar = (Math.PI * g.dRod ** 2) / 4;
  const Ap = (Math.PI * g.dPiston ** 2) / 4;
  const dVoil = g.Voil * g.beta * (g.T - g.T0);
  const V1 = g.Vg0 - dVoil;
  const Vg = V1 - Ar * g.x;
  if (!(V1 > 0) || !(Vg > 0)) {
    throw new ComputationError(`the oil expansion (${fmt(dVoil * 1e6)} cm³) and the rod (${fmt(Ar * g.x * 1e6)} cm³) fill the ${fmt(g.Vg0 * 1e6)} cm³ gas space: hydraulic lock, no gas left to compress`);
  }
  const p1 = g.p0 * (g.T / g.T0) * (g.Vg0 / V1);
  const p = p1 * (V1 / Vg) ** g.n;
  return {
    p,
    Fext: (p - STANDARD_ATMOSPHERE) * Ar,
    kg: (g.n * p * Ar * Ar) / Vg,
    FcMax: p * Ap - STANDARD_ATMOSPHERE * Ar,
    dVoil,
    Vg,
  };
}

const fmt = (v: number) => String(Number(v.toPrecision(3)));
