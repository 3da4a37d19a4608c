import { NON_NEGATIVE, POSITIVE, requireInRange } from '../errors.ts';

/** A round mount stub (pin, bolt, eye) that conducts heat from the body into air at T∞. SI. */
export interface MountStub {
  readonly D: number; // m, stub diameter
  readonly L: number; // m, stub length from the body to where it is clamped or ends
  readonly k: number; // W/(m·K), stub conductivity
  readonly h: number; // W/(m²·K), coefficient on the stub surface (convection + radiation)
}

/**
 * Conductance of n round mount stubs treated as fins with an **insulated (adiabatic) tip**: base at
 * the body temperature, surface losing heat to air at T∞ with a uniform h. The stub's heat flow is
 * q = G (T_b − T∞) with
 *
 * $$G = n\sqrt{hPkA_c}\,\tanh(mL),\qquad m = \sqrt{\frac{hP}{kA_c}},\quad P = \pi D,\ A_c = \tfrac{\pi}{4}D^2$$
 *
 * Why the insulated tip: a mount's far end is clamped in a bracket or a rubber bush, not bare; the
 * form also ignores the small area of the tip face (use L + D/4 for a bare tip, the corrected length).
 * A stub bolted into a large cold frame conducts more than this (the frame is a heat sink, not an
 * insulated tip): treat that with a longer L or a larger h as a bound.
 *
 * @param stub D (0, 1] m, L (0, 10] m, k (0, 1000] W/(m·K), h [0, 1e4] W/(m²·K)
 * @param n number of identical stubs, [0, 1000]
 * @returns total conductance G (W/K), the fin parameter m (1/m) and the fin efficiency tanh(mL)/(mL)
 * @throws InputRangeError for inputs outside those ranges
 * @example mountConductance({ D: 0.02, L: 0.1, k: 50, h: 10 }, 1).G // 0.0556 W/K (steel stub Ø20 × 100 mm in air)
 * @source incropera2007 Table 3.4 case B (adiabatic tip), eqs. 3.70 and 3.76 (from memory)
 */
export function mountConductance(stub: MountStub, n: number) {
  const D = requireInRange('dMount', stub.D, { ...POSITIVE, max: 1 }, 'm');
  const L = requireInRange('LMount', stub.L, { ...POSITIVE, max: 10 }, 'm');
  const k = requireInRange('kMount', stub.k, { ...POSITIVE, max: 1000 }, 'W/(m·K)');
  const h = requireInRange('hMount', stub.h, { ...NON_NEGATIVE, max: 1e4 }, 'W/(m²·K)');
  requireInRange('nMount', n, { min: 0, max: 1000 }, '');
  const P = Math.PI * D;
  const Ac = (Math.PI / 4) * D * D;
  const m = Math.sqrt((h * P) / (k * Ac));
  const mL = m * L;
  // h = 0: no loss from the surface, so no heat leaves an insulated-tip stub (limit of tanh(mL)/m → 0·L)
  const perStub = mL === 0 ? 0 : Math.sqrt(h * P * k * Ac) * Math.tanh(mL);
  return { G: n * perStub, m, efficiency: mL === 0 ? 1 : Math.tanh(mL) / mL };
}
