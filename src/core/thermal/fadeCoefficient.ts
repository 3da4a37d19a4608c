import { POSITIVE, requireInRange } from '../errors.ts';
import { DENSITY_T_REF } from './oilDensity.ts';
import { asViscosityCurve, type ViscosityCurve } from './viscosityCurve.ts';
import type { WaltherFit } from './walther.ts';

/** Damping coefficient against oil temperature: a viscous share that follows the oil viscosity and a share that does not (or follows density). */
export interface FadeModel {
  readonly cRef: number; // N·s/m, coefficient at Tref
  readonly Tref: number; // K
  /** Share of cRef that scales with viscosity (laminar/bleed flow), [0, 1]; the rest is orifice flow. */
  readonly viscousShare: number;
  /** The fluid's ν(T): a D341 fit of a mineral oil or any viscosity curve. */
  readonly oil: WaltherFit | ViscosityCurve;
  /**
   * Volumetric expansion coefficient β, 1/K. Absent or 0: the share law (the orifice part is
   * constant). Above 0: the physical law, laminar part ∝ μ = ρν and orifice part ∝ ρ.
   */
  readonly beta?: number;
}

function densityRatio(beta: number, T: number, Tref: number): number {
  return (1 + beta * (Tref - DENSITY_T_REF)) / (1 + beta * (T - DENSITY_T_REF));
}

/**
 * c(T)/c_ref. Laminar (bleed, leakage) flow through a passage gives a force ∝ μ·v (Hagen–Poiseuille);
 * turbulent orifice and valve flow gives a pressure ∝ ρ·v² (Bernoulli), linearised about the
 * working point as a coefficient ∝ ρ. With s the laminar share at T_ref and r = ρ(T)/ρ(T_ref):
 *
 * $$\frac{c(T)}{c_{ref}} = r(T)\left[s\,\frac{\nu(T)}{\nu(T_{ref})} + (1 - s)\right],\qquad r = \frac{1 + \beta(T_{ref} - T_{15})}{1 + \beta(T - T_{15})}$$
 *
 * β = 0 gives the share law (r = 1): an engineering approximation (common practice, no source).
 * Real dampers lie between about 0.2 %/K (valve-dominated) and 2 %/K (viscous) fade near room
 * temperature (dixon2007thermal, from memory); s sets where in that band a design sits.
 *
 * @param m model: c_ref (0, ∞) N·s/m, T_ref K, s [0, 1], oil, β [0, 0.01) 1/K
 * @param T oil temperature, K, (0, ∞)
 * @returns c(T)/c_ref (> 0 whenever s < 1)
 * @example fadeRatio({ cRef: 980, Tref: 298.15, viscousShare: 0, oil: waltherFit(22e-6, 4.4e-6), beta: 7e-4 }, 353.15) // 0.96318 (all orifice: the density ratio)
 * @source dixon2007thermal (laminar and orifice flow in dampers; fade rates, from memory); apiMpms11_1 (β, from memory)
 */
export function fadeRatio(m: FadeModel, T: number): number {
  requireInRange('cRef', m.cRef, POSITIVE, 'N·s/m');
  requireInRange('viscousShare', m.viscousShare, { min: 0, max: 1 }, '');
  const beta = requireInRange('beta', m.beta ?? 0, { min: 0, max: 0.01, maxExclusive: true }, '1/K');
  const oil = asViscosityCurve(m.oil);
  const nuRatio = oil.nu(T) / oil.nu(m.Tref);
  return densityRatio(beta, T, m.Tref) * (m.viscousShare * nuRatio + (1 - m.viscousShare));
}

/**
 * Damping coefficient at oil temperature T: c_ref·`fadeRatio`.
 *
 * $$c(T) = c_{ref}\,r(T)\left[s\,\frac{\nu(T)}{\nu(T_{ref})} + (1 - s)\right]$$
 *
 * @param m model (see `fadeRatio`); @param T oil temperature, K, (0, ∞)
 * @returns c in N·s/m
 * @example fadeCoefficient({ cRef: 980, Tref: 298.15, viscousShare: 0.3, oil: waltherFit(22e-6, 4.4e-6) }, 353.15) // 733.14 N·s/m (ν40 = 22, ν100 = 4.4 mm²/s; oil at 80 °C)
 * @source dixon2007thermal (fade rates, from memory); the split itself is common practice, no source
 */
export function fadeCoefficient(m: FadeModel, T: number): number {
  return m.cRef * fadeRatio(m, T);
}

/**
 * Fractional change of the coefficient per kelvin, d ln c/dT, from the closed-form slopes:
 *
 * $$\frac{1}{c}\frac{dc}{dT} = -\frac{\beta}{1 + \beta(T - T_{15})} + \frac{s\,n\,\frac{d\ln\nu}{dT}}{s\,n + 1 - s},\quad n = \frac{\nu(T)}{\nu(T_{ref})}$$
 *
 * @param m model; @param T K
 * @returns 1/K (negative: the coefficient falls as the oil warms)
 * @example fadeLogSlope({ cRef: 980, Tref: 298.15, viscousShare: 1, oil: waltherFit(32e-6, 5.4e-6) }, 313.15) // -0.042636 1/K (all viscous: the oil's own slope)
 * @source closed form of `fadeRatio`; astmD341 (from memory)
 */
export function fadeLogSlope(m: FadeModel, T: number): number {
  const beta = m.beta ?? 0;
  const oil = asViscosityCurve(m.oil);
  const n = oil.nu(T) / oil.nu(m.Tref);
  const s = m.viscousShare;
  return -beta / (1 + beta * (T - DENSITY_T_REF)) + (s * n * oil.dlnNu(T)) / (s * n + 1 - s);
}
