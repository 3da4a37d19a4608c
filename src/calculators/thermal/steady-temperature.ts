import { BODY_T_RANGE, bodyCooling, oilTemperature, steadyTemperature as solve } from '../../core/thermal/index.ts';
import { defineCalculator, num, type ChartSpec } from '../types.ts';
import { BODY_DETAIL_OUTPUTS, bodyFrom, bodyInputs } from '../shared/bodyInputs.ts';
import { q } from '../quantityText.ts';
import { HEAT_PATH_STUDY, heatPathInputs, withHeatPaths } from '../shared/heatPathInputs.ts';
import { gobFrom, OIL_NODE_STUDY, oilBodyNote, oilNodeInputs } from '../shared/oilNodeInputs.ts';

const TW210 = { D: 0.05, L: 0.35, orientation: 'horizontal', Tamb: 298.15, eps: 0.9 } as const;

/** Body temperature at which a mean power leaves the body. */
export const steadyTemperatureCalculator = defineCalculator({
  id: 'steady-temperature',
  title: 'Steady body temperature at a mean power',
  summary: 'The damper body temperature at which the mean power the damper dissipates leaves the body by convection and radiation.',
  inputs: [
    { key: 'P', label: 'Mean damper power P', kind: 'power', default: 40, min: 0, max: 20000, required: true, help: 'Mean power dissipated in the damper over the duty (from a duty page).' },
    ...bodyInputs(),
    ...heatPathInputs(),
    ...oilNodeInputs(false),
  ],
  outputs: [
    { key: 'Ts', label: 'Steady body temperature T_s', kind: 'temperature' },
    { key: 'rise', label: 'Rise above air T_s − T∞', kind: 'temperatureDifference' },
    { key: 'hConv', label: 'Convection coefficient h_conv', kind: 'heatTransferCoefficient' },
    { key: 'hRad', label: 'Radiation coefficient h_r', kind: 'heatTransferCoefficient' },
    { key: 'UA', label: 'Conductance UA at T_s', kind: 'thermalConductance', feeds: [{ page: 'warm-up', input: 'UA', label: 'Warm-up with this UA' }] },
    { key: 'Toil', label: 'Steady oil temperature T_oil', kind: 'temperature', help: 'T_s + P/G_ob with two nodes; the body temperature with one.' },
    { key: 'Qconv', label: 'Heat shed by convection', kind: 'power' },
    { key: 'Qrad', label: 'Heat shed by radiation', kind: 'power', help: 'Negative when the surroundings are warmer than the body.' },
    { key: 'Qmount', label: 'Heat conducted into the mounts', kind: 'power', optional: true },
    { key: 'Qsun', label: 'Heat absorbed from the sun', kind: 'power', optional: true, help: 'A gain: the body sheds P + Q_sun by the other paths.' },
    { key: 'shareConv', label: 'Share of P: convection', kind: 'dimensionless', optional: true, help: 'Each path over the damper power P; convection + radiation + mounts − sun = 100 %. Absent when P = 0.' },
    { key: 'shareRad', label: 'Share of P: radiation', kind: 'dimensionless', optional: true },
    { key: 'shareMount', label: 'Share of P: mounts', kind: 'dimensionless', optional: true },
    { key: 'shareSun', label: 'Share of P: solar gain (counts against the loss)', kind: 'dimensionless', optional: true },
    { key: 'Gmount', label: 'Mount conductance G_m', kind: 'thermalConductance', optional: true, help: 'n·√(hPkA_c)·tanh(mL), insulated tip.' },
    ...BODY_DETAIL_OUTPUTS,
  ],
  compute(values) {
    const body = withHeatPaths(bodyFrom(values), values);
    const P = num(values, 'P');
    const r = solve(body, P);
    const Gob = gobFrom(values);
    const Toil = Gob === undefined ? r.Ts : oilTemperature(r.Ts, P, Gob);
    const warnings = [...r.warnings];
    const note = oilBodyNote(Toil, r.Ts);
    if (note) warnings.push(note);
    const mounts = body.Gmount !== undefined;
    const sun = body.Qsun !== undefined;
    if (sun && r.Qsun > P) warnings.push(`The sun puts more heat into the body (${r.Qsun.toPrecision(3)} W) than the damper does (${P.toPrecision(3)} W).`);
    const share = (x: number) => (P > 0 ? x / P : undefined);
    return {
      outputs: {
        Ts: r.Ts, rise: r.Ts - body.Tamb, hConv: r.hConv, hRad: r.hRad, UA: r.UA, Toil,
        Qconv: r.Qconv, Qrad: r.Qrad, Qmount: mounts ? r.Qmount : undefined, Qsun: sun ? r.Qsun : undefined,
        shareConv: share(r.Qconv), shareRad: share(r.Qrad), shareMount: mounts ? share(r.Qmount) : undefined, shareSun: sun ? share(-r.Qsun) : undefined,
        Gmount: body.Gmount,
        hNatural: r.hNatural, hForced: r.hForced, area: r.area, Ra: r.Ra, Re: r.Re,
      },
      warnings,
    };
  },
  charts(values, result): ChartSpec[] {
    const body = withHeatPaths(bodyFrom(values), values);
    const P = num(values, 'P');
    const Ts = result.outputs.Ts as number;
    const lo = body.Tamb;
    const hi = Math.min(BODY_T_RANGE.max, Math.max(Ts + 0.4 * (Ts - lo), lo + 80));
    const T = Array.from({ length: 61 }, (_, i) => lo + ((hi - lo) * i) / 60);
    const Q = T.map((t) => bodyCooling(body, t).Q);
    const net = body.Gmount !== undefined || body.Qsun !== undefined ? ' (net: convection + radiation + mounts − sun)' : '';
    return [{
      id: 'balance',
      title: 'Heat rejected and damper power against body temperature',
      x: { label: 'Body temperature', kind: 'temperature' },
      y: { label: 'Power', kind: 'power', ...(body.Qsun === undefined ? { min: 0 } : {}) },
      series: [
        { label: `heat rejected Q(T_s)${net}`, x: T, y: Q, tone: 0 },
        { label: 'damper power P', x: [lo, hi], y: [P, P], style: 'dash', tone: 3 },
      ],
      markers: [{ x: Ts, label: 'steady T_s' }],
      summary: `The body sheds ${q(P, 'power', 3)} at ${q(Ts, 'temperature')}, ${q(Ts - lo, 'temperatureDifference', 3)} above the air; heat rejected rises from 0 at ${q(lo, 'temperature', 3)} to ${q(Q.at(-1)!, 'power', 3)} at ${q(hi, 'temperature', 3)}.`,
    }];
  },
  verification: [
    {
      name: 'Ø50 × 350 mm body, still air, 25 °C, ε = 0.9, 41.01 W → 80 °C',
      inputs: { ...TW210, V: 0, P: 41.01 },
      expected: { Ts: 353.15 },
      tolerance: 1e-4,
      why: 'inverse of the body-cooling check; Q given to 4 s.f. moves T_s by < 0.01 K',
      source: { key: 'incropera2007', locator: 'eq. 9.34, eq. 1.9, Table A.4' },
      provenance: 'reference library numpy (independent evaluation, version not recorded)',
    },
    {
      name: 'Same body across 20 m/s air, 267.0 W → 80 °C',
      inputs: { ...TW210, V: 20, P: 267.0 },
      expected: { Ts: 353.15 },
      tolerance: 2e-4,
      why: 'reference used forced convection alone; the mixed rule adds 0.02 % to Q here',
      source: { key: 'incropera2007', locator: 'eq. 7.54, eq. 1.9, Table A.4' },
      provenance: 'reference library numpy (independent evaluation, version not recorded)',
    },
    {
      name: 'Horizontal steam pipe D = 0.1 m, ε = 0.85, 23 °C: 764 W per metre → 165 °C',
      inputs: { D: 0.1, L: 1, orientation: 'horizontal', Tamb: 296.15, V: 0, eps: 0.85, P: 764 },
      expected: { Ts: 438.15 },
      tolerance: 1e-3,
      why: 'book q′ ≈ 763–766 W/m at 165 °C; ±0.5 % in q′ is about ±0.4 K',
      source: { key: 'incropera2007', locator: 'ch. 9 steam-pipe example (Example 9.3 in the 6th ed., number from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'Steel mount stub Ø20 × 100 mm, k = 50 W/(m·K), h = 10 W/(m²·K), insulated tip: G = 0.0556 W/K',
      inputs: { ...TW210, V: 0, P: 41.01, mounts: 'stubs', nMount: 1, dMount: 0.02, LMount: 0.1, kMount: 50, hMount: 10 },
      expected: { Gmount: 0.0556079 },
      tolerance: 1e-5,
      why: 'closed form √(hPkA_c)·tanh(mL) with m = √40 1/m, evaluated by hand to 6 s.f.',
      source: { key: 'incropera2007', locator: 'Table 3.4 case B (adiabatic tip)' },
      provenance: 'closed form',
    },
    {
      name: 'Two such stubs on the Ø50 × 350 mm body: 41.01 W + 2·0.0556079·55 W = 47.127 W still settles at 80 °C',
      inputs: { ...TW210, V: 0, P: 47.12687, mounts: 'stubs', nMount: 2, dMount: 0.02, LMount: 0.1, kMount: 50, hMount: 10 },
      expected: { Ts: 353.15, Qmount: 6.11687 },
      tolerance: 1e-4,
      why: 'the mounts take G_m(T_s − T∞) on top of the air paths, so the air paths carry the 41.01 W of the first case; 4 s.f. in Q moves T_s by < 0.01 K',
      source: { key: 'incropera2007', locator: 'Table 3.4 case B; eq. 9.34, eq. 1.9, Table A.4' },
      provenance: 'reference library numpy (independent evaluation, version not recorded)',
    },
    {
      name: 'Sun as a negative loss: 31.01 W + 10 W absorbed (α = 0.5, 1142.857 W/m² on D·L) settles where 41.01 W alone does, 80 °C',
      inputs: { ...TW210, V: 0, P: 31.01, sun: 'sun', alphaSun: 0.5, irradiance: 1142.857142857 },
      expected: { Ts: 353.15, Qsun: 10 },
      tolerance: 1e-4,
      why: 'absorbed sunlight is heat in, like the damper power: the body sheds 41.01 W by convection and radiation as in the first case',
      source: { key: 'incropera2007', locator: '§12.8 solar absorptivity, eq. 12.60 (from memory); eq. 9.34, eq. 1.9, Table A.4' },
      provenance: 'reference library numpy (independent evaluation, version not recorded)',
    },
    {
      name: 'Two nodes: 41.01 W across G_ob = 8.202 W/K puts the oil 5 K above the 80 °C body',
      inputs: { ...TW210, V: 0, P: 41.01, nodes: 'two', Gob: 8.202 },
      expected: { Ts: 353.15, Toil: 358.15 },
      tolerance: 1e-4,
      why: 'T_oil = T_s + P/G_ob, the series resistance; T_s as in the first case',
      source: { key: 'incropera2007', locator: 'eq. 3.19 thermal resistance (from memory); eq. 9.34, eq. 1.9, Table A.4' },
      provenance: 'reference library numpy (independent evaluation, version not recorded)',
    },
  ],
  sources: [
    { key: 'incropera2007', locator: 'eqs. 9.34, 9.26, 7.54, 9.64, 1.9; Table A.4 (from memory)' },
    { key: 'incropera2007', locator: 'Table 3.4 case B, fin with an adiabatic tip (mounts); §12.8 solar absorptivity (from memory)' },
    { key: 'brent1973', locator: 'ch. 4 (root finder)' },
  ],
  study: {
    inputs: { P: 'meanPower', D: 'bodyDiameter', L: 'bodyLength', orientation: 'bodyOrientation', eps: 'bodyEmissivity', flowFactor: 'localFlowFactor', Tamb: 'airTemperature', dTsur: 'surroundingsAboveAir', V: 'vehicleSpeed', ...HEAT_PATH_STUDY, ...OIL_NODE_STUDY },
    publishes: { Ts: 'steadyTemperature', UA: 'conductance', Toil: 'oilTemperature' },
  },
});
