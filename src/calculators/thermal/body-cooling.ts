import { bodyCooling as cool } from '../../core/thermal/index.ts';
import { defineCalculator, num, type ChartSpec } from '../types.ts';
import { BODY_DETAIL_OUTPUTS, bodyFrom, bodyInputs } from '../shared/bodyInputs.ts';
import { q } from '../quantityText.ts';

const STEAM_PIPE = { D: 0.1, L: 1, orientation: 'horizontal', Tamb: 296.15, Ts: 438.15, V: 0, eps: 0.85 } as const;
const TW210 = { D: 0.05, L: 0.35, orientation: 'horizontal', Tamb: 298.15, Ts: 353.15, eps: 0.9 } as const;

/** Heat a cylindrical damper body sheds at a given surface temperature. */
export const bodyCoolingCalculator = defineCalculator({
  id: 'body-cooling',
  title: 'Heat rejection of a damper body',
  summary: 'Convection (free, forced across the body, or both) and radiation from a cylindrical damper body at a given surface temperature: h, heat flow and conductance UA.',
  inputs: [
    { key: 'Ts', label: 'Body surface temperature T_s', kind: 'temperature', default: 353.15, min: 223.15, max: 673.15, required: true, help: 'Outer surface temperature of the body (−50 °C to 400 °C).' },
    ...bodyInputs(),
  ],
  outputs: [
    { key: 'hConv', label: 'Convection coefficient h_conv', kind: 'heatTransferCoefficient', help: 'Free and forced combined: h³ = h_F³ + h_N³.' },
    { key: 'hRad', label: 'Radiation coefficient h_r', kind: 'heatTransferCoefficient' },
    { key: 'Q', label: 'Heat flow Q', kind: 'power', help: 'Convection to the air plus radiation to the surroundings.' },
    { key: 'UA', label: 'Conductance UA', kind: 'thermalConductance', help: '(h_conv + h_r)·A: the constant-UA input of the warm-up page at this temperature.', feeds: [{ page: 'warm-up', input: 'UA', label: 'Warm-up with this UA' }] },
    ...BODY_DETAIL_OUTPUTS,
    { key: 'Tfilm', label: 'Film temperature T_f', kind: 'temperature', help: 'Air properties are taken here (Incropera Table A.4).' },
  ],
  compute(values) {
    const r = cool(bodyFrom(values), num(values, 'Ts'));
    return {
      outputs: { hConv: r.hConv, hRad: r.hRad, Q: r.Q, UA: r.UA, hNatural: r.hNatural, hForced: r.hForced, area: r.area, Ra: r.Ra, Re: r.Re, Tfilm: r.Tfilm },
      warnings: r.warnings,
    };
  },
  charts(values): ChartSpec[] {
    const body = bodyFrom(values);
    const lo = body.Tamb;
    const hi = Math.min(673.15, Math.max(num(values, 'Ts'), lo) + 60);
    const T = Array.from({ length: 41 }, (_, i) => lo + ((hi - lo) * i) / 40);
    const rows = T.map((t) => cool(body, t));
    return [{
      id: 'coefficients',
      title: 'Coefficients against body temperature',
      x: { label: 'Body temperature', kind: 'temperature' },
      y: { label: 'Coefficient', kind: 'heatTransferCoefficient', min: 0 },
      series: [
        { label: 'convection h_conv', x: T, y: rows.map((r) => r.hConv), tone: 0 },
        { label: 'radiation h_r', x: T, y: rows.map((r) => r.hRad), tone: 2 },
        { label: 'total', x: T, y: rows.map((r) => r.hConv + r.hRad), style: 'dash', tone: 4 },
      ],
      summary: `From ${q(lo, 'temperature', 3)} to ${q(hi, 'temperature', 3)} the convection coefficient goes from ${q(rows[0]!.hConv, 'heatTransferCoefficient', 3)} to ${q(rows.at(-1)!.hConv, 'heatTransferCoefficient', 3)} and radiation from ${q(rows[0]!.hRad, 'heatTransferCoefficient', 3)} to ${q(rows.at(-1)!.hRad, 'heatTransferCoefficient', 3)}.`,
    }];
  },
  verification: [
    {
      name: 'Ø50 × 350 mm body, horizontal, still air, 80 °C in 25 °C, ε = 0.9',
      inputs: { ...TW210, V: 0 },
      expected: { hConv: 6.4631, hRad: 7.0999, Q: 41.01 },
      tolerance: 1e-3,
      why: 'independent evaluation of eq. 9.34 with Table A.4 properties at 325.65 K, to 4–5 s.f.; interpolation details move h by < 0.02 %',
      source: { key: 'incropera2007', locator: 'eq. 9.34, eq. 1.9, Table A.4' },
      provenance: 'reference library numpy (independent evaluation, version not recorded)',
    },
    {
      name: 'Same body across a 10 m/s air stream (forced part)',
      inputs: { ...TW210, V: 10 },
      expected: { hForced: 53.19 },
      tolerance: 1e-3,
      why: 'independent evaluation of eq. 7.54 at 4 s.f.',
      source: { key: 'incropera2007', locator: 'eq. 7.54, Table A.4' },
      provenance: 'reference library numpy (independent evaluation, version not recorded)',
    },
    {
      name: 'Horizontal steam pipe, D = 0.1 m, 165 °C in 23 °C air, ε = 0.85: heat loss per metre',
      inputs: STEAM_PIPE,
      expected: { Q: 764 },
      tolerance: 5e-3,
      why: 'book gives q′ ≈ 763–766 W/m (Nu ≈ 23.1–23.3 by rounding of the properties); 0.5 % covers it',
      source: { key: 'incropera2007', locator: 'ch. 9 steam-pipe example (Example 9.3 in the 6th ed., number from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'Cylinder 12.7 mm × 94 mm across 10 m/s air, 26.2 °C air, 128.4 °C surface: Churchill–Bernstein h',
      inputs: { D: 0.0127, L: 0.094, orientation: 'horizontal', Tamb: 299.35, Ts: 401.55, V: 10, eps: 0 },
      expected: { hForced: 96.0 },
      tolerance: 5e-3,
      why: 'book: Re = 6071, Nu = 40.6, h = 96.0 W/(m²·K) at 3 s.f.',
      source: { key: 'incropera2007', locator: 'ch. 7 heated-cylinder experiment (Example 7.4 in the 6th ed., number from memory)' },
      provenance: 'from memory',
    },
  ],
  sources: [
    { key: 'incropera2007', locator: 'eqs. 9.34, 9.26, 9.33, 7.54, 9.64, 1.9; Table A.4 (from memory)' },
    { key: 'churchillChu1975', locator: 'horizontal cylinder' },
    { key: 'churchillBernstein1977', locator: 'cross flow' },
    { key: 'codata2018', locator: 'Stefan–Boltzmann constant' },
  ],
  study: {
    inputs: { Ts: 'steadyTemperature', D: 'bodyDiameter', L: 'bodyLength', orientation: 'bodyOrientation', eps: 'bodyEmissivity', flowFactor: 'localFlowFactor', Tamb: 'airTemperature', dTsur: 'surroundingsAboveAir', V: 'vehicleSpeed' },
    publishes: { UA: 'conductance' },
  },
});
