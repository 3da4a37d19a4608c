/**
 * Verification cases of road-power: white-road closed forms, statistical linearisation, the
 * W_k-weighted comfort value, the motion ratio and the damping optima. Kept apart for length.
 */
import type { VerificationCase } from '../types.ts';

export const ROAD_POWER_CASES: VerificationCase[] = [
  {
    name: 'Road velocity level for class C at 20 m/s; TW-210 corner, mean damper power π²·k_t·G_d(n0)·n0²·V',
    inputs: { roadClass: 'C', V: 20, ms: 240, mu: 36, ks: 16000, kt: 160000, c: 980 },
    expected: { Gd0Used: 256e-6, P: 80.8518, vRms: 0.287231, travelRms: 0.01193, accRms: 1.41708 },
    tolerance: 3e-4, why: 'class value exact; closed-form values given to 5–6 s.f. (travel to 4 s.f.)',
    source: { key: 'iso8608', locator: 'Table 1 class C geometric mean 256·10⁻⁶ m³ (table number from memory); closed forms per gobbi2001 / zuo2013, computed with scipy' },
    provenance: 'closed form',
  },
  {
    name: 'Class A, same car: power scales with G_d(n0) (factor 1/16 of class C)',
    inputs: { roadClass: 'A', V: 20, ms: 240, mu: 36, ks: 16000, kt: 160000, c: 980 },
    expected: { vRms: 0.071808, P: 5.0532 },
    tolerance: 1e-4, why: 'closed form to 5 s.f.',
    source: { key: 'zuo2013', locator: 'white-velocity quarter car; damper power independent of suspension parameters (published abstract); values computed' },
    provenance: 'closed form',
  },
  {
    name: 'Power-law damper by statistical linearisation dissipates the white-road power (C = 800 N·(s/m)^0.5, α = 0.5)',
    inputs: { roadClass: 'C', V: 20, ms: 240, mu: 36, ks: 16000, kt: 160000, law: 'power', Fref: 800, vref: 1, alpha: 0.5 },
    expected: { P: 80.8518 },
    tolerance: 1e-4, why: 'closed form to 6 s.f.; the iteration stops at 1e-10',
    source: { key: 'roberts2003', locator: 'ch. 5, equivalent linear damping for Gaussian response (chapter from memory)' },
    provenance: 'closed form',
  },
  {
    name: 'Measured G_d(n0) overrides the class; power proportional to k_t·G_d(n0)·V',
    inputs: { roadClass: 'H', Gd0: 1e-4, V: 10, ms: 300, mu: 40, ks: 20000, kt: 200000, c: 1500 },
    expected: { P: Math.PI ** 2 * 200000 * 1e-4 * 0.01 * 10 },
    tolerance: 1e-6, why: 'closed form, quadrature tolerance 1e-9 plus tails',
    source: { key: 'zuo2013', locator: 'mean power independent of damper and masses (published abstract)' },
    provenance: 'closed form',
  },
  {
    name: 'TW-210 corner, class C at 20 m/s: W_k-weighted RMS body acceleration a_w = 1.1825 m/s² ("uncomfortable")',
    inputs: { roadClass: 'C', V: 20, ms: 240, mu: 36, ks: 16000, kt: 160000, c: 980 },
    expected: { awWk: 1.182549, comfort: 'uncomfortable' },
    tolerance: 1e-5, why: 'reference by a 400 000-step trapezoid of |W_k|²·|H_a|²·G_z over 10⁻³–10⁴ Hz (test/core/duty/comfort.test.ts), given to 7 s.f.',
    source: { key: 'iso2631_1', locator: 'Annex A weighting W_k, Table A.2 parameters; Annex C comfort bands (from memory)' },
    provenance: 'from memory',
  },
  {
    name: 'Motion ratio 0.7: a 2000 N·s/m damper rides like 980 N·s/m at the wheel; damper velocity ×0.7, same power',
    inputs: { roadClass: 'C', V: 20, ms: 240, mu: 36, ks: 16000, kt: 160000, c: 2000, MR: 0.7 },
    expected: { accRms: 1.41708, vRms: 0.7 * 0.287231, FRms: 2000 * 0.7 * 0.287231, P: 80.8518, ceq: 2000 },
    tolerance: 3e-4, why: 'closed forms of the wheel-rate case (first case) to 5–6 s.f.; c_w = MR²·c by virtual work',
    source: { key: 'dixon2007', locator: 'installation motion ratio, wheel rate = MR² × damper rate (chapter from memory)' },
    provenance: 'closed form',
  },
  {
    name: 'TW-210 comfort and road-holding optima: k_s·√((m_s + m_u)/k_t) = 664.53 N·s/m and 1948.14 N·s/m',
    inputs: { roadClass: 'C', V: 20, ms: 240, mu: 36, ks: 16000, kt: 160000, c: 980 },
    expected: { cComfort: 664.5299, cRoadHolding: 1948.140 },
    tolerance: 1e-6, why: 'closed form to 7 s.f.',
    source: { key: 'gobbi2001', locator: 'optimal damping for discomfort and road holding, white road velocity (equation numbers from memory)' },
    provenance: 'closed form',
  },
];
