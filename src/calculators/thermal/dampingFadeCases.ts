/** Verification cases of damping-fade (closed forms, independent evaluations and the D2270 table). */
import type { VerificationCase } from '../types.ts';

const TW210 = { D: 0.05, L: 0.35, orientation: 'horizontal', Tamb: 298.15, eps: 0.9, V: 0, nu40: 20e-6, nu100: 4.5e-6, Tlimit: 373.15, Cth: 1395 } as const;

export const DAMPING_FADE_CASES: readonly VerificationCase[] = [
    {
      name: 'No viscous share: c stays at c_ref and the power is ½cω²X² (980 N·s/m, 20 mm, 1.5 Hz)',
      inputs: { ...TW210, cRef: 980, share: 0, duty: 'harmonic', X: 0.02, f: 1.5 },
      expected: { cEq: 980, Peq: 17.409982, status: 'equilibrium below the limit' },
      tolerance: 1e-6,
      why: 'closed form ½·980·(3π)²·0.02², same arithmetic',
      source: { key: 'incropera2007', locator: '§1.3 energy balance (from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'Random road, 41.01 W into the Ø50 × 350 mm body in still air settles at 80 °C whatever the fade',
      inputs: { ...TW210, cRef: 980, share: 0.6, duty: 'random', P: 41.01 },
      expected: { Teq: 353.15 },
      tolerance: 1e-4,
      why: 'P independent of c; same figures as the body-cooling check, 4 s.f. in Q',
      source: { key: 'incropera2007', locator: 'eq. 9.34, eq. 1.9, Table A.4' },
      provenance: 'reference library numpy (independent evaluation, version not recorded)',
    },
    {
      name: 'Random road, 80.85 W (class C road at 20 m/s for the quarter car) exceeds what still air removes below 100 °C',
      inputs: { ...TW210, cRef: 980, share: 0.3, duty: 'random', P: 80.85 },
      expected: { status: 'no equilibrium below the limit' },
      tolerance: 1e-6,
      why: 'the body sheds about 60 W at 100 °C in still air (body-cooling), below 80.85 W',
      source: { key: 'incropera2007', locator: 'eq. 9.34, eq. 1.9, Table A.4' },
      provenance: 'reference library numpy (independent evaluation, version not recorded)',
    },
    {
      name: 'Physical law, all orifice flow (s = 0, β = 7·10⁻⁴ 1/K): the cold ratio is the density ratio ρ(−20 °C)/ρ(25 °C)',
      inputs: { ...TW210, cRef: 980, share: 0, fadeLaw: 'physical', beta: 7e-4, rho15: 870, duty: 'harmonic', X: 0.02, f: 1.5, Tcold: 253.15 },
      expected: { coldRatio: 1.032291133, dcdT: -6.95134062e-4 },
      tolerance: 1e-8,
      why: 'closed form (1 + β·10 K)/(1 − β·35 K) and −β/(1 + β·10 K)',
      source: { key: 'apiMpms11_1', locator: 'volume correction, simple expansion form (from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'Physical law, all laminar flow (s = 1): the cold ratio is the ratio of dynamic viscosities μ = ρν (ν40 = 20, ν100 = 4.5 mm²/s)',
      inputs: { ...TW210, cRef: 980, share: 1, fadeLaw: 'physical', beta: 7e-4, rho15: 870, duty: 'harmonic', X: 0.02, f: 1.5, Tcold: 253.15 },
      expected: { coldRatio: 16.41685582, muRef: 0.0307991132 },
      tolerance: 1e-7,
      why: 'ν from an independent evaluation of the D341 line times the density ratio; μ_ref = ρ(25 °C)·ν(25 °C)',
      source: { key: 'astmD341', locator: 'two-point viscosity–temperature equation (from memory)' },
      provenance: 'reference library python math (independent evaluation, version not recorded)',
    },
    {
      name: 'ISO VG 32 at VI 100: ν100 = 5.3619 mm²/s, where the D2270 Table 1 H column reaches 32 mm²/s',
      inputs: { ...TW210, cRef: 980, share: 0.3, fluid: 'vg', grade: 'VG32', VI: 100, duty: 'harmonic', X: 0.02, f: 1.5 },
      expected: { nu100Used: 5.361856e-6 },
      tolerance: 1e-6,
      why: 'Table 1: H = 31.40 at 5.3 and 32.37 at 5.4 mm²/s, linear interpolation (the standard\'s rule) gives 5.3 + 0.1·0.60/0.97',
      source: { key: 'astmD2270', locator: 'Table 1, §6.1.1' },
      provenance: 'published',
    },
    {
      name: 'Silicone fluid, 70 and 28 mm²/s at 40 and 100 °C, all viscous: cold ratio from the Andrade line ln ν = a + b/T',
      inputs: { ...TW210, cRef: 980, share: 1, fluid: 'silicone', nu40: 70e-6, nu100: 28e-6, duty: 'harmonic', X: 0.02, f: 1.5, Tcold: 253.15 },
      expected: { coldRatio: 2.897769534, dcdT: -0.02007466368 },
      tolerance: 1e-8,
      why: 'closed form exp(b(1/T − 1/T_ref)) with b = ln(70/28)/(1/313.15 − 1/373.15); slope −b/T_ref²',
      source: { key: 'andrade1930', locator: 'ln ν linear in 1/T (from memory)' },
      provenance: 'closed form',
    },
];
