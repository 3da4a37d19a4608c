/**
 * Free response x(t) of m = 1 kg, k = 100 N/m, x0 = 0.01 m, v0 = 0 for three dampers.
 * Source: closed forms of Rao, Mechanical Vibrations, 6th ed., §2.6 (section from memory);
 * values computed with scipy.integrate.solve_ivp (rtol 1e-11) as collected in the project's
 * shared reference notes (table SDOF-D). Provenance: reference library scipy.
 */
export interface FreeResponseRow {
  readonly c: number; // N·s/m
  readonly t: number; // s
  readonly x: number; // m
}

export const FREE_RESPONSE_ROWS: readonly FreeResponseRow[] = [
  { c: 4, t: 0.1, x: 5.949662e-3 }, { c: 4, t: 0.25, x: -3.879627e-3 }, { c: 4, t: 0.5, x: -5.54445e-5 }, { c: 4, t: 1, x: -1.36092e-3 },
  { c: 20, t: 0.1, x: 7.357589e-3 }, { c: 20, t: 0.25, x: 2.872975e-3 }, { c: 20, t: 0.5, x: 4.042768e-4 }, { c: 20, t: 1, x: 4.993992e-6 },
  { c: 40, t: 0.1, x: 8.222634e-3 }, { c: 40, t: 0.25, x: 5.513525e-3 }, { c: 40, t: 0.5, x: 2.821712e-3 }, { c: 40, t: 1, x: 7.390407e-4 },
];
