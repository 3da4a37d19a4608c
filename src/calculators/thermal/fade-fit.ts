import { ComputationError } from '../../core/errors.ts';
import { oncePerValues } from '../memoLast.ts';
import { maxAbsOf, maxOf, minOf } from '../../core/numeric/extent.ts';
import { fadeFit, fadeRatio, readUnitRows } from '../../core/thermal/index.ts';
import { choice, defineCalculator, num, text, type ChartSpec, type Values } from '../types.ts';
import { q } from '../quantityText.ts';
import { FADE_FIT_CASES } from './fade-fit.cases.ts';
import { betaFrom, DEFAULT_TABLE, FLUID_SOURCES, fluidFrom, fluidInputs, lawInputs, spanWarning, type Fluid } from '../shared/fluidInputs.ts';
import { ZERO_CELSIUS } from '../../core/constants.ts';

/** TW-077 test bay: the supplier's dyno sheet for the TW-210 Fellrunner rear damper (invented demo data). */
const DEMO_ROWS = 'T [°C], v [m/s], F [N]\n-20, 0.05, 94\n-20, 0.1, 183\n-20, 0.2, 373\n-20, 0.3, 563\n-20, 0.5, 923\n20, 0.05, 49\n20, 0.1, 101\n20, 0.2, 198\n20, 0.3, 300\n20, 0.5, 492\n80, 0.05, 47\n80, 0.1, 94\n80, 0.2, 184\n80, 0.3, 282\n80, 0.5, 464';
export const MAX_FADE_ROWS = 2000;

type Fit = { fit: ReturnType<typeof fadeFit>; rows: readonly (readonly number[])[]; fluid: ReturnType<typeof fluidFrom> };
// compute and charts(values, result) see the same values object: analysed once
const analyse = oncePerValues((values: Values): Fit => {
  const rows = readUnitRows(text(values, 'rows'), 'rows', [
    { name: 'temperature', kind: 'temperature' }, { name: 'velocity', kind: 'velocity' }, { name: 'force', kind: 'force' },
  ], MAX_FADE_ROWS).rows;
  const fluid = fluidFrom(values);
  const fit = fadeFit(rows, { oil: fluid.curve, Tref: num(values, 'Tref'), beta: betaFrom(values) });
  const out = { fit, rows, fluid };
  return out;
});

/** Calibrates the fade law (viscous share and c at T_ref) from dyno rows at two or more temperatures. */
export const fadeFitCalculator = defineCalculator({
  id: 'fade-fit',
  title: 'Fade law fitted to dyno tests at several temperatures',
  summary: 'Least-squares fit of the temperature law of a linear damper to dyno rows (T, v, F) at two or more oil temperatures: the viscous share, the coefficient at the reference temperature, the fade rate per kelvin and the cold-start force ratio.',
  inputs: [
    { key: 'rows', label: 'Dyno rows (T, v, F)', kind: 'text', default: DEMO_ROWS, maxLength: 60000, rows: 10, help: 'One row per test point: oil temperature, velocity, force. Units in a header line such as "T [°C], v [m/s], F [N]" (or "(…)"); without a header T is in K, v in m/s, F in N. Comma, semicolon or tab between columns; # starts a comment. Rows within 1 K count as one test temperature; at least two are needed.' },
    { key: 'Tref', label: 'Reference temperature T_ref', kind: 'temperature', default: 298.15, min: 233.15, max: 423.15, help: 'Temperature at which c_ref is reported (often 20 or 25 °C).' },
    { key: 'Tcold', label: 'Cold-start temperature', kind: 'temperature', default: 253.15, min: 213.15, max: 313.15, help: 'Temperature of the cold-force ratio c(T_cold)/c_ref (mount and structure loads at a cold start).' },
    ...lawInputs(),
    ...fluidInputs(),
  ],
  outputs: [
    { key: 'share', label: 'Viscous share s at T_ref', kind: 'fraction', help: 'Part of c_ref that follows viscosity (laminar and bleed flow).',
      feeds: [{ page: 'damping-fade', input: 'share', label: 'use this law on the fade page', with: { cRef: 'cRef', Tref: 'Tref', Tcold: 'Tcold', fadeLaw: 'fadeLaw', beta: 'fitBeta', fluid: 'fitFluid', nu40: 'fitNu40', nu100: 'fitNu100', nuTable: 'fitTable' } }] },
    { key: 'cRef', label: 'Damping coefficient at T_ref', kind: 'damping' },
    { key: 'dcdT', label: 'Fade rate at T_ref, (1/c)·dc/dT', kind: 'perTemperature', help: 'Fractional change of c per kelvin at T_ref; negative: c falls as the oil warms.' },
    { key: 'coldRatio', label: 'Cold-force ratio c(T_cold)/c_ref', kind: 'dimensionless' },
    { key: 'r2', label: 'r² of the forces', kind: 'dimensionless', digits: 6, help: '1 − Σ(F − F_fit)²/Σ(F − F̄)² over all rows.' },
    { key: 'rmsError', label: 'rms force error', kind: 'force' },
    { key: 'temperatures', label: 'Test temperatures found', kind: 'dimensionless', digits: 1 },
  ],
  handoffs: [
    { key: 'fitBeta', help: 'β of the law (the default when the share law hides it), SI.', maxLength: 32 },
    { key: 'fitFluid', help: 'The fluid choice for the fade page (an ISO VG grade goes as the mineral oil it defines).', maxLength: 16 },
    { key: 'fitNu40', help: 'ν40 of the fluid, m²/s.', maxLength: 32 },
    { key: 'fitNu100', help: 'ν100 of the fluid (from ASTM D2270 for a grade), m²/s.', maxLength: 32 },
    { key: 'fitTable', help: 'The viscosity table (only used when the fluid is a table).', maxLength: 4000 },
  ],
  compute(values) {
    const { fit, rows, fluid } = analyse(values);
    const warnings: string[] = [];
    if (fit.share < 0 || fit.share > 1) warnings.push(`The fitted share ${fit.share.toFixed(3)} lies outside 0–1: the rows do not follow this law (check the oil data and the temperatures, or the damper is not linear).`);
    if (fit.temperatures.length === 2) warnings.push('Two test temperatures fix the two unknowns exactly: r² then shows only the scatter within each temperature. A third temperature checks the law.');
    const Ts = rows.map((r) => r[0]!);
    const Tcold = num(values, 'Tcold');
    if (Tcold < minOf(Ts) - 1) warnings.push(`The cold-start temperature is below the coldest test (${(minOf(Ts) - ZERO_CELSIUS).toFixed(1)} °C): the ratio is an extrapolation of the law.`);
    for (const w of [spanWarning(fluid, Tcold, 'cold-start temperature'), spanWarning(fluid, minOf(Ts), 'coldest test'), spanWarning(fluid, maxOf(Ts), 'warmest test')]) if (w) warnings.push(w);
    const coldRatio = unclippedRatio(fit, Tcold);
    if (!(coldRatio > 0)) throw new ComputationError(`the fitted law gives no positive coefficient at ${(Tcold - ZERO_CELSIUS).toFixed(1)} °C (share ${fit.share.toFixed(3)})`);
    return {
      outputs: { share: fit.share, cRef: fit.cRef, dcdT: fit.dcdT, coldRatio, r2: fit.r2, rmsError: fit.rmsError, temperatures: fit.temperatures.length },
      warnings,
      handoff: handoffOf(values, fluid),
    };
  },
  charts(values, result): ChartSpec[] {
    const { fit, rows } = analyse(values);
    const Ts = rows.map((r) => r[0]!);
    const lo = Math.min(num(values, 'Tcold'), minOf(Ts)) - 5;
    const hi = maxOf(Ts) + 20;
    const T = Array.from({ length: 61 }, (_, i) => lo + ((hi - lo) * i) / 60);
    const c = T.map((t) => fit.cRef * unclippedRatio(fit, t));
    const byT = fit.temperatures;
    const vmax = maxAbsOf(rows.map((r) => r[1]!));
    return [
      {
        id: 'fade-law',
        title: 'Damping coefficient against oil temperature: tests and fitted law',
        x: { label: 'Oil temperature', kind: 'temperature' },
        y: { label: 'Damping coefficient', kind: 'damping', min: 0 },
        series: [
          { label: 'fitted law c(T)', x: T, y: c, tone: 0 },
          { label: 'c at each test temperature (Σv·F/Σv²)', x: byT.map((g) => g.T), y: byT.map((g) => g.c), style: 'points', tone: 3 },
        ],
        markers: [{ x: num(values, 'Tref'), label: 'T_ref' }, { x: num(values, 'Tcold'), label: 'cold start' }],
        summary: `The law passes ${q(fit.cRef, 'damping')} at the reference temperature with a viscous share of ${fit.share.toFixed(3)}; the tests give ${byT.map((g) => `${q(g.c, 'damping')} at ${q(g.T, 'temperature', 3)}`).join(', ')}. Cold-force ratio ${(result.outputs.coldRatio as number).toFixed(2)}.`,
      },
      {
        id: 'force-velocity',
        title: 'Force against velocity at each test temperature',
        x: { label: 'Velocity', kind: 'velocity' },
        y: { label: 'Force', kind: 'force' },
        series: byT.flatMap((g, i) => {
          const mine = rows.filter((r) => Math.abs(r[0]! - g.T) <= 1);
          const cFit = fit.cRef * unclippedRatio(fit, g.T);
          return [
            { label: `tests at ${(g.T - ZERO_CELSIUS).toFixed(0)} °C`, x: mine.map((r) => r[1]!), y: mine.map((r) => r[2]!), style: 'points' as const, tone: i % 8 },
            { label: `law at ${(g.T - ZERO_CELSIUS).toFixed(0)} °C`, x: [0, vmax], y: [0, cFit * vmax], style: 'dash' as const, tone: i % 8, legend: false as const },
          ];
        }),
        summary: `${rows.length} test points at ${byT.length} temperatures; the fitted law leaves an rms force error of ${q(fit.rmsError, 'force', 3)} (r² = ${fit.r2.toFixed(5)}).`,
      },
    ];
  },
  verification: FADE_FIT_CASES,
  sources: [
    { key: 'lawson1974', locator: 'ch. 19, modified Gram–Schmidt least squares (from memory)' },
    ...FLUID_SOURCES,
  ],
  study: {
    inputs: { Tref: 'referenceTemperature', fadeLaw: 'fadeLaw', beta: 'oilExpansion', fluid: 'damperFluid', nu40: 'oilViscosity40', nu100: 'oilViscosity100' },
    publishes: { share: 'fadeShare', cRef: 'dampingCoefficient' },
  },
});

/** c(T)/c_ref of the fitted law without clipping the share to [0, 1] (so a bad fit shows as it is). */
function unclippedRatio(fit: ReturnType<typeof fadeFit>, T: number): number {
  const m = fit.model;
  const s = m.viscousShare;
  const base = fadeRatio({ ...m, viscousShare: 0 }, T); // density ratio
  const visc = fadeRatio({ ...m, viscousShare: 1 }, T); // density × viscosity ratio
  return s * visc + (1 - s) * base;
}

const sig10 = (x: number) => String(Number(x.toPrecision(10)));

/** What the fade page needs to use the same fluid and law, whichever fields this page shows. */
function handoffOf(values: Values, fluid: ReturnType<typeof fluidFrom>): Record<string, string> {
  const f = choice<Fluid>(values, 'fluid');
  const table = values.nuTable;
  return {
    fitBeta: sig10(typeof values.beta === 'number' ? values.beta : 7e-4),
    fitFluid: f === 'vg' ? 'mineral' : f,
    fitNu40: sig10(fluid.nu40),
    fitNu100: sig10(fluid.nu100),
    fitTable: f === 'table' && typeof table === 'string' ? table : DEFAULT_TABLE,
  };
}
