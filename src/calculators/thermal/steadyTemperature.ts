import { BODY_T_RANGE, bodyCooling, steadyTemperature as solve } from '../../core/thermal/index.ts';
import { defineCalculator, num, type ChartSpec } from '../types.ts';
import { BODY_DETAIL_OUTPUTS, bodyFrom, bodyInputs } from './bodyInputs.ts';
import { q } from '../quantityText.ts';

const TW210 = { D: 0.05, L: 0.35, orientation: 'horizontal', Tamb: 298.15, eps: 0.9 } as const;

/** Body temperature at which a mean power leaves the body. */
export const steadyTemperatureCalc = defineCalculator({
  id: 'steady-temperature',
  title: 'Steady body temperature at a mean power',
  summary: 'The damper body temperature at which the mean power the damper dissipates leaves the body by convection and radiation.',
  inputs: [
    { key: 'P', label: 'Mean damper power P', kind: 'power', default: 40, min: 0, max: 20000, required: true, help: 'Mean power dissipated in the damper over the duty (from a duty page).' },
    ...bodyInputs(),
  ],
  outputs: [
    { key: 'Ts', label: 'Steady body temperature T_s', kind: 'temperature' },
    { key: 'rise', label: 'Rise above air T_s − T∞', kind: 'temperatureDifference' },
    { key: 'hConv', label: 'Convection coefficient h_conv', kind: 'heatTransferCoefficient' },
    { key: 'hRad', label: 'Radiation coefficient h_r', kind: 'heatTransferCoefficient' },
    { key: 'UA', label: 'Conductance UA at T_s', kind: 'thermalConductance', feeds: [{ page: 'warm-up', input: 'UA', label: 'Warm-up with this UA' }] },
    ...BODY_DETAIL_OUTPUTS,
  ],
  compute(values) {
    const body = bodyFrom(values);
    const r = solve(body, num(values, 'P'));
    return {
      outputs: { Ts: r.Ts, rise: r.Ts - body.Tamb, hConv: r.hConv, hRad: r.hRad, UA: r.UA, hNatural: r.hNatural, hForced: r.hForced, area: r.area, Ra: r.Ra, Re: r.Re },
      warnings: r.warnings,
    };
  },
  charts(values, result): ChartSpec[] {
    const body = bodyFrom(values);
    const P = num(values, 'P');
    const Ts = result.outputs.Ts as number;
    const lo = body.Tamb;
    const hi = Math.min(BODY_T_RANGE.max, Math.max(Ts + 0.4 * (Ts - lo), lo + 80));
    const T = Array.from({ length: 61 }, (_, i) => lo + ((hi - lo) * i) / 60);
    const Q = T.map((t) => bodyCooling(body, t).Q);
    return [{
      id: 'balance',
      title: 'Heat rejected and damper power against body temperature',
      x: { label: 'Body temperature', kind: 'temperature' },
      y: { label: 'Power', kind: 'power', min: 0 },
      series: [
        { label: 'heat rejected Q(T_s)', x: T, y: Q, tone: 0 },
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
  ],
  sources: [
    { key: 'incropera2007', locator: 'eqs. 9.34, 9.26, 7.54, 9.64, 1.9; Table A.4 (from memory)' },
    { key: 'brent1973', locator: 'ch. 4 (root finder)' },
  ],
  study: {
    inputs: { P: 'meanPower', D: 'bodyDiameter', L: 'bodyLength', orientation: 'bodyOrientation', eps: 'bodyEmissivity', flowFactor: 'localFlowFactor', Tamb: 'airTemperature', dTsur: 'surroundingsAboveAir', V: 'vehicleSpeed' },
    publishes: { Ts: 'steadyTemperature', UA: 'conductance' },
  },
});
