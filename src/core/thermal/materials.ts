/**
 * Density and specific heat of the parts of a damper, at 300 K, for the lumped heat capacity
 * C = Σ m_i c_i. Damper oils are light mineral oils; the engine-oil row is the nearest tabulated
 * fluid (its c_p rises about 22 % from 300 to 400 K: 1909 → 2337 J/(kg·K), Table A.5).
 * Nitrile (NBR) seals and bump stops are not tabulated; soft vulcanised rubber stands in.
 */
export interface Material {
  readonly id: string;
  readonly label: string;
  readonly rho: number; // kg/m³
  readonly cp: number; // J/(kg·K)
  readonly k: number; // W/(m·K)
  readonly source: string;
}

export const MATERIALS: readonly Material[] = [
  { id: 'steel', label: 'Carbon steel (AISI 1010)', rho: 7832, cp: 434, k: 63.9, source: 'incropera2007 Table A.1 (from memory)' },
  { id: 'stainless', label: 'Stainless steel (AISI 304)', rho: 7900, cp: 477, k: 14.9, source: 'incropera2007 Table A.1 (from memory)' },
  { id: 'aluminium', label: 'Aluminium alloy 2024-T6', rho: 2770, cp: 875, k: 177, source: 'incropera2007 Table A.1 (from memory)' },
  { id: 'copper', label: 'Copper, pure', rho: 8933, cp: 385, k: 401, source: 'incropera2007 Table A.1 (from memory)' },
  { id: 'oil', label: 'Mineral oil (engine oil, unused, 300 K)', rho: 884.1, cp: 1909, k: 0.145, source: 'incropera2007 Table A.5 (from memory)' },
  { id: 'rubber', label: 'Rubber, vulcanised, soft (for nitrile seals)', rho: 1100, cp: 2010, k: 0.13, source: 'incropera2007 Table A.3 (from memory)' },
];

/** Looks a material up by id (throws on an unknown id: a programming error, not user input). */
export function material(id: string): Material {
  const m = MATERIALS.find((x) => x.id === id);
  if (!m) throw new Error(`unknown material '${id}'`);
  return m;
}
