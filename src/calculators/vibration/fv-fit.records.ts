/**
 * Data for the fv-fit calculator: the demo dyno sheet (invented, Tarnwick Works demo scenario)
 * and exact synthetic sheets for the verification cases (closed form: each row is the law itself).
 */
import { damperForce, type DamperLaw } from '../../core/dampers/index.ts';

/**
 * TW-077 test bay, TW-210 Fellrunner rear damper, supplier's dyno sheet at about 20 °C (invented
 * numbers: a twin-tube damper with a knee near 0.1 m/s and compression about 0.4 of rebound,
 * gas force already removed by the rig, ±1.5 % scatter).
 */
export const DEMO_SHEET = `# TW-210 Fellrunner rear damper, supplier dyno sheet (peak velocity per stroke), gas force removed
v_m_s, F_N, T_K
0.026, 84, 293.4
-0.026, -34, 293.7
0.052, 165, 293.6
-0.052, -66, 293.9
0.078, 251, 293.9
-0.078, -100, 294.2
0.104, 329, 294.1
-0.104, -130, 294.4
0.131, 358, 294.4
-0.131, -146, 294.7
0.262, 535, 294.9
-0.262, -211, 295.2
0.393, 691, 295.6
-0.393, -283, 295.9
0.524, 873, 296.3
-0.524, -345, 296.6
0.655, 1038, 297.1
-0.655, -418, 297.4
0.786, 1224, 298.0
-0.786, -491, 298.3
1.048, 1542, 299.2
-1.048, -617, 299.5`;

/** Rows `v, F` of a law at the given velocities, with full precision. */
export function sheetOf(law: DamperLaw, v: readonly number[]): string {
  return v.map((x) => `${x}, ${damperForce(law, x)}`).join('\n');
}

/** n evenly spaced speeds from lo to hi, rounded to 0.1 mm/s. */
export function speeds(lo: number, hi: number, n: number): number[] {
  return Array.from({ length: n }, (_, i) => Math.round((lo + ((hi - lo) * i) / (n - 1)) * 1e4) / 1e4);
}

/** Both directions of a set of speeds: −v (fastest first) then +v. */
export function bothWays(v: readonly number[]): number[] {
  return [...v.map((x) => -x).reverse(), ...v];
}
