/**
 * Road profile PSD as the vehicle sees it in time, from the ISO 8608 spatial form.
 */
import { POSITIVE, requireInRange } from '../errors.ts';
import { ISO_8608_N0 } from '../constants.ts';

/** A road described by its degree of roughness and waviness, driven at speed V. */
export interface RoadInput {
  /** G_d(n0), m³ (one-sided, n0 = 0.1 cycle/m). */
  readonly Gd0: number;
  /** Waviness w (ISO 8608 uses 2). */
  readonly w: number;
  /** Vehicle speed, m/s. */
  readonly V: number;
}

/** Checks a road input; names the offending input. */
export function checkRoad(road: RoadInput): RoadInput {
  requireInRange('Gd0', road.Gd0, { min: 0, max: 1, minExclusive: true }, 'm³');
  requireInRange('w', road.w, { min: 1.5, max: 3.5 }, '');
  requireInRange('V', road.V, POSITIVE, 'm/s');
  return road;
}

/**
 * One-sided temporal PSD of road displacement at frequency f.
 *
 * $$G_d(n) = G_d(n_0)\left(\frac{n}{n_0}\right)^{-w},\qquad f = nV,\qquad G_z(f) = \frac{G_d(f/V)}{V}$$
 *
 * @param road G_d(n0) in m³, w, V in m/s (not re-validated: call checkRoad first)
 * @param f temporal frequency, Hz, > 0
 * @returns G_z(f), m²/Hz
 * @example roadDisplacementPsd({ Gd0: 256e-6, w: 2, V: 20 }, 1) // 5.12e-5 m²/Hz
 * @source iso8608 §5 (spatial PSD fit and its conversion to time frequency; section from memory)
 */
export function roadDisplacementPsd(road: RoadInput, f: number): number {
  const n = f / road.V;
  return (road.Gd0 * (n / ISO_8608_N0) ** -road.w) / road.V;
}

/**
 * White level of the road velocity PSD when w = 2.
 *
 * $$G_{\dot z}(f) = (2\pi f)^2 G_z(f) = 4\pi^2 G_d(n_0)\, n_0^2\, V\quad\text{(independent of } f\text{)}$$
 *
 * @returns G0, (m/s)²/Hz, one-sided
 * @example roadVelocityWhiteLevel(256e-6, 20) // 2.021295e-3 (m/s)²/Hz
 * @source iso8608 §5 with w = 2 (from memory); zuo2013 (same white-velocity form)
 */
export function roadVelocityWhiteLevel(Gd0: number, V: number): number {
  return 4 * Math.PI ** 2 * Gd0 * ISO_8608_N0 ** 2 * V;
}
