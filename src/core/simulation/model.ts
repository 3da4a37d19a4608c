import type { DamperLaw } from '../dampers/index.ts';
import { NON_NEGATIVE, POSITIVE, requireInRange } from '../errors.ts';
import { validateLaw } from '../dampers/index.ts';

/** What drives the oscillator besides its initial conditions. */
export type Excitation =
  | { readonly kind: 'none' }
  /** Harmonic force on the mass, F(t) = F₀ sin ωt. */
  | { readonly kind: 'force'; readonly F0: number; readonly omega: number }
  /** Harmonic base motion y(t) = Y sin ωt; the damper and spring act on z = x − y. */
  | { readonly kind: 'base'; readonly Y: number; readonly omega: number };

/**
 * A single-degree-of-freedom oscillator with a nonlinear damper, in SI. For base excitation the
 * state is the relative motion z = x − y (what the damper strokes), with z(0) = x0, ż(0) = v0.
 */
export interface SdofModel {
  readonly m: number; // kg
  readonly k: number; // N/m
  readonly law: DamperLaw;
  readonly excitation: Excitation;
  readonly x0: number; // m
  readonly v0: number; // m/s
  /** Series stiffness between the damper and the mass (Maxwell element), N/m; undefined = rigid. */
  readonly ks?: number | undefined;
}

/**
 * Effective load on the relative coordinate, N:
 *
 * $$p(t) = F_0\sin\omega t\ \text{(force)},\qquad p(t) = -m\ddot y = m Y\omega^2\sin\omega t\ \text{(base)}$$
 *
 * @example effectiveLoad({ m: 2, k: 1, law: { kind: 'linear', c: 1 }, excitation: { kind: 'base', Y: 0.01, omega: 10 }, x0: 0, v0: 0 })(Math.PI / 20) // 2 N
 * @source chopra2017 §3.6 (base excitation in relative coordinates; from memory)
 */
export function effectiveLoad(model: SdofModel): (t: number) => number {
  const e = model.excitation;
  if (e.kind === 'none') return () => 0;
  const amp = e.kind === 'force' ? e.F0 : model.m * e.Y * e.omega * e.omega;
  const w = e.omega;
  return (t) => amp * Math.sin(w * t);
}

/** Validates every parameter; throws InputRangeError naming the input. */
export function validateModel(model: SdofModel): void {
  requireInRange('m', model.m, POSITIVE, 'kg');
  requireInRange('k', model.k, POSITIVE, 'N/m');
  requireInRange('x0', model.x0, { min: -1e3, max: 1e3 }, 'm');
  requireInRange('v0', model.v0, { min: -1e4, max: 1e4 }, 'm/s');
  validateLaw(model.law);
  if (model.ks !== undefined) requireInRange('ks', model.ks, POSITIVE, 'N/m');
  const e = model.excitation;
  if (e.kind === 'force') { requireInRange('F0', e.F0, NON_NEGATIVE, 'N'); requireInRange('fExc', e.omega, POSITIVE, 'rad/s'); }
  if (e.kind === 'base') { requireInRange('Y', e.Y, NON_NEGATIVE, 'm'); requireInRange('fExc', e.omega, POSITIVE, 'rad/s'); }
}
