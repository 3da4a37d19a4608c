/**
 * Forced-response reference rows. Source of the formulas: Rao, Mechanical Vibrations 6th ed.,
 * §3.4 (magnification, phase) and §9.10 (transmissibility); sections from memory. Values: evaluated independently of this project with scipy (closed form; scipy
 * signal.freqresp of 1/(s² + 2ζs + 1) agrees) — provenance 'closed form'. Columns: ζ, r, M,
 * phase (degrees), T_R; tolerance 5e-6 relative (values rounded to 6 decimals; phase to 4 decimals of a degree, 1e-5).
 */
export const FORCED_ROWS = [
  { zeta: 0.1, r: 0.5, M: 1.321637, phaseDeg: 7.5946, TR: 1.328229 },
  { zeta: 0.1, r: 1, M: 5, phaseDeg: 90, TR: 5.09902 },
  { zeta: 0.1, r: Math.SQRT2, M: 0.96225, phaseDeg: 164.2068, TR: 1 },
  { zeta: 0.1, r: 2, M: 0.330409, phaseDeg: 172.4054, TR: 0.355862 },
  { zeta: 0.1, r: 3, M: 0.12465, phaseDeg: 175.7108, TR: 0.145366 },
  { zeta: 0.2, r: 0.5, M: 1.288313, TR: 1.313827 },
  { zeta: 0.2, r: 1, M: 2.5, TR: 2.692582 },
  { zeta: 0.2, r: Math.SQRT2, M: 0.870388, TR: 1 },
  { zeta: 0.2, r: 2, M: 0.322078, TR: 0.412461 },
  { zeta: 0.2, r: 3, M: 0.123617, TR: 0.193096 },
] as const;
