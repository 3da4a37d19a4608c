import { damperForce, type DamperLaw, type DamperLawFit } from '../../core/dampers/index.ts';
import { defineCalculator, num, type Outputs } from '../types.ts';
import { analyseSheet, bandHalfWidth } from './fv-fit.analysis.ts';
import { warningsFor } from './fv-fit.warnings.ts';
import { fvFitCharts } from './fv-fit.charts.ts';
import { bothWays, DEMO_SHEET, sheetOf, speeds } from './fv-fit.records.ts';

function lawOutputs(fit: DamperLawFit, vRated: number): Outputs {
  const law = fit.law;
  if (law.kind === 'linear') return { c: law.c };
  if (law.kind === 'power') return { C: law.C, alpha: law.alpha, Fref: law.C * vRated ** law.alpha, vref: vRated };
  if (law.kind !== 'bilinear') return {};
  return {
    vknee: law.vknee,
    ...(fit.rebound ? { c1: law.rebound.c1, c2: law.rebound.c2 } : {}),
    ...(fit.compression ? { c1c: law.compression.c1, c2c: law.compression.c2 } : {}),
  };
}

const LINEAR = bothWays(speeds(0.05, 1, 20));
const POWER = speeds(0.05, 0.8, 16);
const KNEE = bothWays(speeds(0.0237, 0.8037, 21));
const BILINEAR_LAW: DamperLaw = { kind: 'bilinear', vknee: 0.1, rebound: { c1: 3200, c2: 1300 }, compression: { c1: 1280, c2: 520 } };
const OUTLIER = `${sheetOf({ kind: 'linear', c: 980 }, LINEAR.slice(0, -1))}\n1, 1200`;

const PAGE_NAMES: Record<string, string> = { 'road-power': 'road duty', 'harmonic-duty': 'harmonic stroke', 'energy-per-cycle': 'energy per cycle', 'damper-simulation': 'time simulation' };
const lawFeed = (page: string, law: string, input: string, withKeys?: Record<string, string>) => ({ page, input, label: `Use this ${law} law on the ${PAGE_NAMES[page] ?? page} page`, ...(withKeys ? { with: withKeys } : {}), set: { law } });

/** Damper law from a dyno's force–velocity points: least-squares fit, quality, band check. */
export const fvFitCalculator = defineCalculator({
  id: 'fv-fit',
  title: 'Damper law from dyno force–velocity points',
  summary: 'Fits a linear, power-law or bilinear damper law to measured force–velocity points by least squares, per direction where both are measured, and reports the coefficients, R², RMS error, the forces at a rated velocity, the rebound/compression ratio and the points outside a tolerance band.',
  inputs: [
    { key: 'points', label: 'Dyno points (v, F, optional T)', kind: 'text', default: DEMO_SHEET, maxLength: 200_000, rows: 10, required: true, help: 'One point per line: velocity in m/s (positive = rebound/extension, negative = compression), force in N with the sign of the velocity, optionally the temperature in K. Header and # comment lines are skipped; comma, semicolon, tab or space delimited.' },
    { key: 'law', label: 'Law to fit', kind: 'choice', default: 'bilinear', required: true, options: [
      { value: 'linear', label: 'Linear F = c·v' }, { value: 'power', label: 'Power law F = C·|v|^α' }, { value: 'bilinear', label: 'Bilinear with a knee' },
    ], help: 'Linear and power laws are one law for both directions; the bilinear law has slopes per direction and one knee.' },
    { key: 'F0', label: 'Force offset at zero velocity (gas force)', kind: 'force', default: 0, min: -1e6, max: 1e6, help: 'Subtracted from every force before fitting: the force the sheet shows at rest, in the sheet\'s sign convention (a gas-charged damper pushing out reads as a compression force). 0 when the rig has removed it.' },
    { key: 'vRated', label: 'Rated velocity', kind: 'velocity', default: 0.52, min: 0, max: 20, minExclusive: true, help: 'Velocity at which the forces and the ratio are reported; 0.52 m/s is a common dyno reporting speed (common practice, no source).' },
    { key: 'band', label: 'Tolerance band ± (fraction of the fitted force)', kind: 'fraction', default: 0.1, min: 0, max: 1, help: 'Points farther than this from the fitted law are listed; 0: no band check.' },
    { key: 'bandFloor', label: 'Smallest band half-width', kind: 'force', default: 20, min: 0, max: 1e6, help: 'Keeps the band from closing at low speed, where the fitted force tends to zero.' },
  ],
  outputs: [
    { key: 'c', label: 'Damping coefficient c', kind: 'damping', optional: true, help: 'Linear law, one coefficient for both directions.',
      feeds: [lawFeed('harmonic-duty', 'linear', 'c'), lawFeed('road-power', 'linear', 'c'), lawFeed('energy-per-cycle', 'linear', 'c'), lawFeed('damper-simulation', 'linear', 'c')] },
    { key: 'C', label: 'Power-law coefficient C, in N·(s/m)^α (SI only)', kind: 'dimensionless', digits: 5, optional: true, help: 'Shown in SI whatever the unit system: its unit depends on α. F_ref below carries the same law as a force.' },
    { key: 'alpha', label: 'Velocity exponent α', kind: 'dimensionless', optional: true },
    { key: 'Fref', label: 'Power law: force at the rated velocity, F_ref = C·v_rated^α', kind: 'force', optional: true,
      feeds: ['harmonic-duty', 'road-power', 'energy-per-cycle', 'damper-simulation'].map((page) => lawFeed(page, 'power', 'Fref', { vref: 'vref', alpha: 'alpha' })) },
    { key: 'vref', label: 'Power law: reference velocity of F_ref', kind: 'velocity', optional: true, help: 'The rated velocity; pages taking a power law read C = F_ref / v_ref^α.' },
    { key: 'c1', label: 'Rebound low-speed slope c₁', kind: 'damping', optional: true,
      feeds: ['harmonic-duty', 'energy-per-cycle', 'damper-simulation'].map((page) => lawFeed(page, 'bilinear', 'c1', { c2: 'c2', c1c: 'c1c', c2c: 'c2c', vknee: 'vknee' })) },
    { key: 'c2', label: 'Rebound high-speed slope c₂', kind: 'damping', optional: true },
    { key: 'c1c', label: 'Compression low-speed slope', kind: 'damping', optional: true },
    { key: 'c2c', label: 'Compression high-speed slope', kind: 'damping', optional: true },
    { key: 'vknee', label: 'Knee velocity', kind: 'velocity', optional: true },
    { key: 'r2', label: 'Fit quality R²', kind: 'dimensionless', digits: 5 },
    { key: 'rmsError', label: 'RMS force error', kind: 'force', digits: 3 },
    { key: 'Frated', label: 'Rebound force at the rated velocity', kind: 'force', optional: true, help: 'From the law fitted to the rebound points alone.' },
    { key: 'FratedComp', label: 'Compression force at the rated velocity', kind: 'force', optional: true, help: 'Magnitude, from the law fitted to the compression points alone.' },
    { key: 'ratio', label: 'Rebound/compression force ratio at the rated velocity', kind: 'dimensionless', digits: 3, optional: true },
    { key: 'outside', label: 'Points outside the tolerance band', kind: 'dimensionless', digits: 3, optional: true },
    { key: 'Tmean', label: 'Mean temperature of the points', kind: 'temperature', optional: true, help: 'From the third column, when given.' },
  ],
  compute(values) {
    const a = analyseSheet(values);
    const { data, fit } = a;
    const vRated = num(values, 'vRated');
    const band = num(values, 'band');
    const floor = num(values, 'bandFloor');
    const Frated = fit.rebound ? damperForce(fit.rebound, vRated) : undefined;
    const FratedComp = fit.compression ? -damperForce(fit.compression, -vRated) : undefined;
    const ratio = Frated !== undefined && FratedComp !== undefined && FratedComp > 0 ? Frated / FratedComp : undefined;
    const outside = band > 0 ? fit.residuals.flatMap((e, i) => (Math.abs(e) > bandHalfWidth(fit.law, data.v[i]!, band, floor) ? [i] : [])) : [];
    return {
      outputs: {
        ...lawOutputs(fit, vRated), r2: fit.r2, rmsError: fit.rmsError, Frated, FratedComp, ratio,
        outside: band > 0 ? outside.length : undefined,
        Tmean: data.T ? data.T.reduce((s, t) => s + t, 0) / data.T.length : undefined,
      },
      warnings: warningsFor(values, a, outside, ratio),
    };
  },
  charts: fvFitCharts,
  verification: [
    {
      name: 'Exact power law F = 40 000·v^0.5 at 0.05–0.8 m/s (16 rebound points)',
      inputs: { points: sheetOf({ kind: 'power', C: 40_000, alpha: 0.5 }, POWER), law: 'power', vRated: 0.5 },
      expected: { C: 40_000, alpha: 0.5, r2: 1, Fref: 40_000 * Math.sqrt(0.5) },
      tolerance: 1e-6,
      why: 'rows are the law itself to 16 digits; the exponent search stops at 1e-13',
      source: { key: 'fema274', locator: '§9.3 power-law fluid viscous damper F = C|v|^α (from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'Exact linear law c = 980 N·s/m (TW-210 rate), 20 points each way',
      inputs: { points: sheetOf({ kind: 'linear', c: 980 }, LINEAR), law: 'linear', vRated: 0.52 },
      expected: { c: 980, r2: 1, Frated: 509.6, FratedComp: 509.6, ratio: 1, outside: 0 },
      tolerance: 1e-9,
      why: 'rows are the law itself; c = Σv·F/Σv² is exact to rounding',
      source: { key: 'press2007', locator: '§15.4 general linear least squares (from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'Exact bilinear law, knee 0.1 m/s between points, rebound 3200/1300, compression 1280/520 N·s/m',
      inputs: { points: sheetOf(BILINEAR_LAW, KNEE), law: 'bilinear', vRated: 0.52 },
      expected: { vknee: 0.1, c1: 3200, c2: 1300, c1c: 1280, c2c: 520, r2: 1, Frated: 320 + 1300 * 0.42, ratio: 2.5 },
      tolerance: 1e-6,
      why: 'rows are the law itself; the summed squared residual is zero only at the true knee and slopes',
      source: { key: 'dixon2007', locator: 'ch. 5, bilinear damper characteristic with a knee (from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'Band check: one point 22 % above an exact linear law is the only one outside ±10 %',
      inputs: { points: OUTLIER, law: 'linear', band: 0.1, bandFloor: 0 },
      expected: { outside: 1 },
      tolerance: 0,
      why: 'the outlier moves c by about 1.5 %, far less than the band; the other points stay within 2 % of the fit',
      source: { key: 'press2007', locator: '§15.4 (from memory); band check common practice, no source' },
      provenance: 'closed form',
    },
  ],
  sources: [
    { key: 'press2007', locator: '§15.1–15.4 least squares; §10.2 golden section search (from memory)' },
    { key: 'golub1973', locator: 'separable nonlinear least squares (variable projection)' },
    { key: 'dixon2007', locator: 'ch. 1 and 5, damper force–velocity characteristics and dyno testing (from memory)' },
    { key: 'fema274', locator: '§9.3 power-law viscous dampers (from memory)' },
  ],
  study: {
    inputs: { law: 'damperLaw' },
    publishes: {
      c: 'dampingCoefficient', Fref: 'powerLawForce', vref: 'powerLawVelocity', alpha: 'powerLawExponent',
      c1: 'reboundLowSlope', c2: 'reboundHighSlope', c1c: 'compressionLowSlope', c2c: 'compressionHighSlope', vknee: 'kneeVelocity',
    },
  },
});
