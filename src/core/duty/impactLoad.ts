/**
 * End-stop load cases reduced to one equivalent straight-line impact at the stop: the mass the
 * stop feels from the load's inertia, the speed at contact and the force that keeps pushing on
 * through the stroke. Every case then has the same energy balance E = ½·m*·v² + F₀·s.
 */
import { STANDARD_GRAVITY } from '../constants.ts';
import { NON_NEGATIVE, POSITIVE, requireInRange } from '../errors.ts';

/** How the load reaches the stop. */
export type ImpactLoad =
  /** Carriage on a straight track, driven on by F_p; `vertical`: moving down onto the stop. */
  | { readonly kind: 'linear'; readonly m: number; readonly v: number; readonly Fp: number; readonly vertical: boolean }
  /** Arm or turntable of inertia I (about its pivot) at ω, hitting the stop at radius R, drive torque M. */
  | { readonly kind: 'rotary'; readonly I: number; readonly omega: number; readonly R: number; readonly M: number }
  /** Mass falling freely from height h onto the stop. */
  | { readonly kind: 'freefall'; readonly m: number; readonly h: number }
  /** Mass moving down a slope of angle θ at speed v, driven on by F_p. */
  | { readonly kind: 'incline'; readonly m: number; readonly v: number; readonly theta: number; readonly Fp: number }
  /** Load carried on a moving conveyor at belt speed v: the belt drags it on with μ·m·g. */
  | { readonly kind: 'conveyor'; readonly m: number; readonly v: number; readonly mu: number };

export interface EquivalentImpact {
  /** Inertia mass at the stop, kg (I/R² for a rotary load). */
  readonly m: number;
  /** Speed at contact, m/s. */
  readonly v: number;
  /** Drive force pushing on through the stroke (drive, torque/R, belt friction), N. */
  readonly Fdrive: number;
  /** Gravity component along the stroke, N (m·g vertical or free fall, m·g·sin θ incline). */
  readonly Fgravity: number;
}

/**
 * The load case as a straight-line impact at the stop.
 *
 * $$\text{rotary: } m^* = \frac{I}{R^2},\ v = \omega R,\ F = \frac{M}{R};\qquad
 *   \text{free fall: } v = \sqrt{2 g h},\ F_g = m g;\qquad \text{incline: } F_g = m g \sin\theta;\qquad
 *   \text{conveyor: } F = \mu m g$$
 * so that $E = \tfrac12 m^* v^2 + (F + F_g)s$ gives ½Iω² + M·s/R for the rotary case and m·g·(h + s)
 * for free fall (the stroke at radius R is taken as an arc, angle s/R).
 *
 * @param load the load case; masses, inertia, speeds, R and h > 0; forces, torque and μ ≥ 0; θ in [0, π/2]
 * @throws InputRangeError naming the input out of range
 * @example equivalentImpact({ kind: 'rotary', I: 5, omega: 2, R: 0.5, M: 20 }) // { m: 20, v: 1, Fdrive: 40, Fgravity: 0 }
 * @source meriam2012 §6/6 work–energy of rigid bodies in rotation, §3/6 particles (sections from memory); closed form
 */
export function equivalentImpact(load: ImpactLoad): EquivalentImpact {
  switch (load.kind) {
    case 'rotary': {
      requireInRange('I', load.I, POSITIVE, 'kg·m²');
      requireInRange('omega', load.omega, POSITIVE, 'rad/s');
      requireInRange('R', load.R, POSITIVE, 'm');
      requireInRange('M', load.M, NON_NEGATIVE, 'N·m');
      return { m: load.I / (load.R * load.R), v: load.omega * load.R, Fdrive: load.M / load.R, Fgravity: 0 };
    }
    case 'freefall': {
      requireInRange('m', load.m, POSITIVE, 'kg');
      requireInRange('h', load.h, POSITIVE, 'm');
      return { m: load.m, v: Math.sqrt(2 * STANDARD_GRAVITY * load.h), Fdrive: 0, Fgravity: load.m * STANDARD_GRAVITY };
    }
    case 'incline': {
      requireInRange('m', load.m, POSITIVE, 'kg');
      requireInRange('v', load.v, POSITIVE, 'm/s');
      requireInRange('theta', load.theta, { min: 0, max: Math.PI / 2 }, 'rad');
      requireInRange('Fp', load.Fp, NON_NEGATIVE, 'N');
      return { m: load.m, v: load.v, Fdrive: load.Fp, Fgravity: load.m * STANDARD_GRAVITY * Math.sin(load.theta) };
    }
    case 'conveyor': {
      requireInRange('m', load.m, POSITIVE, 'kg');
      requireInRange('v', load.v, POSITIVE, 'm/s');
      requireInRange('mu', load.mu, NON_NEGATIVE, '');
      return { m: load.m, v: load.v, Fdrive: load.mu * load.m * STANDARD_GRAVITY, Fgravity: 0 };
    }
    default: {
      requireInRange('m', load.m, POSITIVE, 'kg');
      requireInRange('v', load.v, POSITIVE, 'm/s');
      requireInRange('Fp', load.Fp, NON_NEGATIVE, 'N');
      return { m: load.m, v: load.v, Fdrive: load.Fp, Fgravity: load.vertical ? load.m * STANDARD_GRAVITY : 0 };
    }
  }
}
