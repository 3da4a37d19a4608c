/** Verification cases of storey-dampers, each against a closed form or a published value. */
import type { VerificationCase } from '../types.ts';

const TWO_PI = 2 * Math.PI;
/** λ(0.5) = 4·√2·Γ²(1.25)/Γ(2.5), 6 s.f. (FEMA 274 §9.3 form; the structural-dampers case uses the same value). */
const LAMBDA_HALF = 3.49608;

// A: one storey, k = 10⁷ N/m, m = k/(2π)² so T = 1 s — the structural-dampers case with α = 0.5
const M1 = 1e7 / (TWO_PI * TWO_PI);
const W_A = LAMBDA_HALF * 1e5 * Math.sqrt(TWO_PI) * 0.02 ** 1.5;

// B, C: Chopra Example 10.4, m₁ = 2m, m₂ = m, k₁ = 2k, k₂ = k with m = 10⁵ kg, k = 5·10⁷ N/m: ω₁² = k/(2m), φ₁ = [½, 1]
const CHOPRA = '200000, 100000000, 3, 2, 0\n100000, 50000000, 3, 2, 0';
const T_B = TWO_PI / Math.sqrt(5e7 / 2e5);
// FEMA 356 linear form: ξ_d = T Σ c cos²θ φ_r² / (4π Σ m φ²), four dampers c = 2·10⁵ N·s/m, φ_r = ½ in both storeys
const XI_B = (T_B * (4 * 2e5 * 0.25)) / (4 * Math.PI * (2e5 * 0.25 + 1e5));

// D: uniform three storeys (m = 10⁵ kg, k = 5·10⁷ N/m): ω₁ = 2√(k/m)·sin(π/14), φ_j = sin(jπ/7)
const W1_D = 2 * Math.sqrt(500) * Math.sin(Math.PI / 14);
const PHI_D = [1, 2, 3].map((j) => Math.sin((j * Math.PI) / 7) / Math.sin((3 * Math.PI) / 7));
const UNIFORM = 'm [kg], k [N/m], h [m], n, theta [deg]\n100000, 50000000, 3, 1, 30\n100000, 50000000, 3, 1, 30\n100000, 50000000, 3, 1, 30';
// FEMA 356 nonlinear form: ξ_d = Σ λ C cos^{1+α}θ φ_r^{1+α} / (2π A^{1−α} ω^{2−α} Σ m φ²), C = 10⁵, α = ½, A = 30 mm
const XI_D = PHI_D.reduce((s, p, j) => s + LAMBDA_HALF * 1e5 * Math.cos(Math.PI / 6) ** 1.5 * Math.abs(p - (j ? PHI_D[j - 1]! : 0)) ** 1.5, 0)
  / (TWO_PI * 0.03 ** 0.5 * W1_D ** 1.5 * PHI_D.reduce((s, p) => s + 1e5 * p * p, 0));

export const STOREY_CASES: readonly VerificationCase[] = [
  {
    name: 'One storey (k = 10⁷ N/m, T = 1 s), one damper C = 10⁵ N·(s/m)^0.5, 20 mm drift: the structural-dampers result',
    inputs: { frame: 'frame', storeys: `${M1}, 10000000, 3, 1, 0`, law: 'power', Fref: 1e5, vref: 1, alpha: 0.5, demand: 'amplitude', roofAmp: 0.02, xi0: 0.05 },
    expected: { T1: 1, hotW: W_A, xiD: W_A / (4 * Math.PI * 0.5 * 1e7 * 0.02 ** 2), xiTotal: 0.05 + W_A / (4 * Math.PI * 2000), hotStroke: 0.02 },
    tolerance: 2e-6, why: 'λ(0.5) quoted to 6 s.f.; W_k = ½kΔ² = ½ω²mΔ² for one storey',
    source: { key: 'fema356', locator: '§9.3.4, energy method for nonlinear viscous devices, eq. 9-39 (equation number from memory)' },
    provenance: 'from memory',
  },
  {
    name: 'Two storeys m₁ = 2m, k₁ = 2k (Chopra Example 10.4): T₁ = 2π/√(k/2m), φ₁ = [½, 1]; four linear dampers, FEMA 356 linear form',
    inputs: { frame: 'frame', storeys: CHOPRA, law: 'linear', c: 2e5, demand: 'amplitude', roofAmp: 0.05, xi0: 0.05 },
    expected: { T1: T_B, gamma: 4 / 3, massFraction: 8 / 9, xiD: XI_B, hotStroke: 0.025 },
    tolerance: 1e-9, why: 'closed forms; the eigenvalue by bisection converges to round-off',
    source: { key: 'chopra2017', locator: 'Example 10.4, two-storey shear frame (example number from memory; ω₁, φ₁ checked by hand from det(K − ω²M) = 0)' },
    provenance: 'from memory',
  },
  {
    name: 'The same frame under a 5 %-damped roof demand of 50 mm: reduced by η = √(10/(5 + ξ)) at ξ = 5 % + ξ_d',
    inputs: { frame: 'frame', storeys: CHOPRA, law: 'linear', c: 2e5, demand: 'roof5', roof5: 0.05, xi0: 0.05 },
    expected: { eta: Math.sqrt(10 / (5 + 100 * (0.05 + XI_B))), roof: 0.05 * Math.sqrt(10 / (5 + 100 * (0.05 + XI_B))), u5: 0.05 },
    tolerance: 1e-9, why: 'closed form: linear dampers add damping independent of the amplitude, so no iteration is needed',
    source: { key: 'en1998_1', locator: '§3.2.2.2, eq. (3.6)' },
    provenance: 'published',
  },
  {
    name: 'Uniform three storeys, dampers α = 0.5 at 30°: ω₁ = 2√(k/m)·sin(π/14) and the FEMA 356 nonlinear form at a 30 mm roof amplitude',
    inputs: { frame: 'frame', storeys: UNIFORM, law: 'power', Fref: 1e5, vref: 1, alpha: 0.5, demand: 'amplitude', roofAmp: 0.03, xi0: 0.05 },
    expected: { T1: TWO_PI / W1_D, xiD: XI_D, hotStroke: 0.03 * PHI_D[0]! * Math.cos(Math.PI / 6) },
    tolerance: 2e-6, why: 'uniform shear building eigenvalues in closed form (to round-off); λ(0.5) to 6 s.f.',
    source: { key: 'chopra2017', locator: 'uniform shear building frequencies, ω_n = 2√(k/m)·sin((2n−1)π/(2(2N+1))) (closed form, derived; section from memory)' },
    provenance: 'closed form',
  },
];
