/** Verification cases of fade-fit: rows made from the law (closed form) must give the law back. */
import type { VerificationCase } from '../types.ts';

const ROWS = (lines: string) => `T [°C], v [m/s], F [N]\n${lines}`;
const OIL = { fluid: 'mineral', nu40: 20e-6, nu100: 4.5e-6, Tref: 298.15, Tcold: 253.15 } as const;

export const FADE_FIT_CASES: readonly VerificationCase[] = [
    {
      name: 'Rows made from the share law with s = 0.3, c_ref = 980 N·s/m (ν40 = 20, ν100 = 4.5 mm²/s): the fit returns them',
      inputs: { ...OIL, fadeLaw: 'share', rows: ROWS('-20, 0.1, 536.1575967\n-20, 0.3, 1608.47279\n-20, 0.6, 3216.94558\n20, 0.1, 105.2763721\n20, 0.3, 315.8291164\n20, 0.6, 631.6582329\n80, 0.1, 74.09319163\n80, 0.3, 222.2795749\n80, 0.6, 444.5591498') },
      expected: { share: 0.3, cRef: 980, r2: 1, coldRatio: 5.470996 },
      tolerance: 1e-6,
      why: 'rows evaluated independently (Python, ASTM D341 two-point line) to 10 s.f.; least squares on exact data is exact to rounding',
      source: { key: 'astmD341', locator: 'two-point viscosity–temperature equation (from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'Force independent of temperature: no viscous share, no fade, cold ratio 1',
      inputs: { ...OIL, fadeLaw: 'share', rows: ROWS('-20, 0.1, 98\n-20, 0.3, 294\n20, 0.1, 98\n20, 0.3, 294\n80, 0.1, 98\n80, 0.6, 588') },
      expected: { share: 0, cRef: 980, dcdT: 0, coldRatio: 1 },
      tolerance: 1e-9,
      why: 'closed form: F = 980·v at every temperature',
      source: { key: 'dixon2007thermal', locator: 'orifice (valve) flow independent of viscosity (from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'Physical law, force ∝ density only (β = 7·10⁻⁴ 1/K): share 0, fade rate −β/(1 + β·10 K), cold ratio the density ratio',
      inputs: { ...OIL, fadeLaw: 'physical', beta: 7e-4, rows: ROWS('-20, 0.1, 101.164531\n-20, 0.3, 303.493593\n-20, 0.6, 606.9871861\n20, 0.1, 98.34180369\n20, 0.3, 295.0254111\n20, 0.6, 590.0508221\n80, 0.1, 94.39120038\n80, 0.3, 283.1736011\n80, 0.6, 566.3472023') },
      expected: { cRef: 980, dcdT: -6.95134062e-4, coldRatio: 1.032291133 },
      tolerance: 1e-6,
      why: 'closed form ρ(T) = ρ15/(1 + β(T − 15 °C)); rows to 10 s.f.',
      source: { key: 'apiMpms11_1', locator: 'volume correction, simple expansion form (from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'All-viscous rows (F ∝ ν(T)): share 1 and the fade rate is the oil’s own d ln ν/dT at 25 °C',
      inputs: { ...OIL, fadeLaw: 'share', rows: ROWS('-20, 0.1, 1558.525322\n-20, 0.3, 4675.575967\n-20, 0.6, 9351.151933\n20, 0.1, 122.2545738\n20, 0.3, 366.7637215\n20, 0.6, 733.527443\n80, 0.1, 18.31063877\n80, 0.3, 54.93191631\n80, 0.6, 109.8638326') },
      expected: { share: 1, cRef: 980, dcdT: -0.04266526 },
      tolerance: 1e-6,
      why: 'slope by a central difference (h = 1 mK) of ln ν from an independent evaluation of the D341 line, 7 s.f.',
      source: { key: 'astmD341', locator: 'two-point viscosity–temperature equation (from memory)' },
      provenance: 'reference library python math (independent evaluation, version not recorded)',
    },
];
