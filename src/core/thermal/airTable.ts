/**
 * Thermophysical properties of air at atmospheric pressure, as data. The densities are those of
 * 1 bar (100 kPa): the ideal-gas check ρ = p/(R·T) with R = 287.05 J/(kg·K) gives 1.1612 kg/m³ at
 * 300 K and 1 bar against the table's 1.1614 (at 1 atm it would be 1.1766), so ν and α are
 * those of 1 bar too; at 1 atm (101.325 kPa) both are 1.3 % lower and the convection coefficient
 * about 0.4–0.8 % higher. μ, k, c_p and Pr do not depend on pressure at these conditions.
 *
 * Columns: T (K), ρ (kg/m³), c_p (J/(kg·K)), μ (N·s/m²), ν (m²/s), k (W/(m·K)), α (m²/s), Pr.
 * Source: incropera2007 Table A.4 (Air at atmospheric pressure), rows 200–700 K. The values were
 * entered from memory and are checked for internal consistency when the module loads in the
 * tests (ν = μ/ρ to 0.2 %, Pr = μ·c_p/k to 0.5 %), which a mistyped digit would break.
 */
import { AIR_TABLE_RANGE } from '../constants.ts';

export interface AirRow {
  readonly T: number;
  readonly rho: number;
  readonly cp: number;
  readonly mu: number;
  readonly nu: number;
  readonly k: number;
  readonly alpha: number;
  readonly Pr: number;
}

// T, ρ, cp (kJ/kg·K), μ·1e7, ν·1e6, k·1e3, α·1e6, Pr — as printed in the table's headings
const RAW: readonly (readonly [number, number, number, number, number, number, number, number])[] = [
  [200, 1.7458, 1.007, 132.5, 7.590, 18.1, 10.3, 0.737],
  [250, 1.3947, 1.006, 159.6, 11.44, 22.3, 15.9, 0.720],
  [300, 1.1614, 1.007, 184.6, 15.89, 26.3, 22.5, 0.707],
  [350, 0.9950, 1.009, 208.2, 20.92, 30.0, 29.9, 0.700],
  [400, 0.8711, 1.014, 230.1, 26.41, 33.8, 38.3, 0.690],
  [450, 0.7740, 1.021, 250.7, 32.39, 37.3, 47.2, 0.686],
  [500, 0.6964, 1.030, 270.1, 38.79, 40.7, 56.7, 0.684],
  [550, 0.6329, 1.040, 288.4, 45.57, 43.9, 66.7, 0.683],
  [600, 0.5804, 1.051, 305.8, 52.69, 46.9, 76.9, 0.685],
  [650, 0.5356, 1.063, 322.5, 60.21, 49.7, 87.3, 0.690],
  [700, 0.4975, 1.075, 338.8, 68.10, 52.4, 98.0, 0.695],
];

/** The table rows in SI units, ascending in T. */
export const AIR_TABLE: readonly AirRow[] = RAW.map(([T, rho, cp, mu, nu, k, alpha, Pr]) => ({
  T, rho, cp: cp * 1e3, mu: mu * 1e-7, nu: nu * 1e-6, k: k * 1e-3, alpha: alpha * 1e-6, Pr,
}));

/** Temperature range covered by the table, K (the rows must span it exactly: checked below). */
export const AIR_T_MIN = AIR_TABLE_RANGE.min;
export const AIR_T_MAX = AIR_TABLE_RANGE.max;

if (AIR_TABLE[0]!.T !== AIR_T_MIN || AIR_TABLE[AIR_TABLE.length - 1]!.T !== AIR_T_MAX) {
  throw new Error(`air table rows span ${AIR_TABLE[0]!.T}–${AIR_TABLE[AIR_TABLE.length - 1]!.T} K, not the stated ${AIR_T_MIN}–${AIR_T_MAX} K`);
}
