import { bodyCooling } from '../../core/thermal/index.ts';
import { defineCalculator, num, type ChartSpec } from '../types.ts';
import { BODY_DETAIL_OUTPUTS, bodyFrom, bodyInputs } from '../shared/bodyInputs.ts';
import { HEAT_PATH_STUDY, heatPathInputs, withHeatPaths } from '../shared/heatPathInputs.ts';
import { q } from '../quantityText.ts';
import { ZERO_CELSIUS } from '../../core/constants.ts';

const TW210 = { D: 0.05, L: 0.35, orientation: 'horizontal', Tamb: 298.15, eps: 0.9 } as const;

/**
 * Warning when the body cannot be rated: at T_max it gains heat from its surroundings (or sheds
 * none), so it passes T_max with no damper power at all. A verdict reads the `rated` output.
 */
export const HOT_SURROUNDINGS_WARNING = 'The body sheds no heat at the allowed temperature: its surroundings (air or radiating surfaces) keep it at or above T_max with no damper power at all, so it has no continuous rating here (P_max shown as 0 W).';

/** Largest mean power the body sheds at the allowed temperature. */
export const powerRatingCalculator = defineCalculator({
  id: 'power-rating',
  title: 'Continuous power rating of a damper body',
  summary: 'The largest mean power a damper body can shed continuously without passing the allowed body (oil) temperature, and how it grows with air speed.',
  inputs: [
    { key: 'Tmax', label: 'Allowed body temperature T_max', kind: 'temperature', default: 373.15, min: 233.15, max: 673.15, required: true, help: 'The oil or seal limit the maker allows at the body surface, e.g. 100 °C.' },
    ...bodyInputs(),
    ...heatPathInputs(),
  ],
  outputs: [
    { key: 'Pmax', label: 'Continuous power rating P_max', kind: 'power' },
    { key: 'rated', label: 'Body can be rated at T_max', kind: 'text', help: '"yes" when the body sheds heat at T_max; "no" when its surroundings already hold it at or above T_max (Q(T_max) ≤ 0).' },
    { key: 'Qmax', label: 'Heat shed at T_max Q(T_max)', kind: 'power', help: 'Negative when the surroundings heat the body at T_max.' },
    { key: 'hConv', label: 'Convection coefficient h_conv', kind: 'heatTransferCoefficient' },
    { key: 'hRad', label: 'Radiation coefficient h_r', kind: 'heatTransferCoefficient' },
    { key: 'UA', label: 'Conductance UA at T_max', kind: 'thermalConductance' },
    ...BODY_DETAIL_OUTPUTS,
  ],
  compute(values) {
    const body = withHeatPaths(bodyFrom(values), values);
    const Tmax = num(values, 'Tmax');
    const r = bodyCooling(body, Tmax);
    const warnings = [...r.warnings];
    if (Tmax <= body.Tamb) warnings.push('The allowed temperature is not above the air temperature: the body can shed no power.');
    const rated = r.Q > 0;
    if (!rated) warnings.push(HOT_SURROUNDINGS_WARNING);
    return {
      outputs: { Pmax: Math.max(0, r.Q), rated: rated ? 'yes' : 'no', Qmax: r.Q, hConv: r.hConv, hRad: r.hRad, UA: r.UA, hNatural: r.hNatural, hForced: r.hForced, area: r.area, Ra: r.Ra, Re: r.Re },
      warnings,
    };
  },
  charts(values): ChartSpec[] {
    const body = withHeatPaths(bodyFrom(values), values);
    const Tmax = num(values, 'Tmax');
    const Vtop = Math.max(30, 1.5 * body.V);
    const V = Array.from({ length: 41 }, (_, i) => (Vtop * i) / 40);
    const P = V.map((v) => Math.max(0, bodyCooling({ ...body, V: v }, Tmax).Q));
    return [{
      id: 'rating',
      title: 'Power rating against air speed across the body',
      x: { label: 'Air speed across the body', kind: 'velocity', input: 'V' },
      y: { label: 'Continuous rating', kind: 'power', min: 0 },
      series: [{ label: `P_max at ${(Tmax - ZERO_CELSIUS).toFixed(0)} °C`, x: V, y: P, tone: 0 }],
      summary: `At ${q(Tmax, 'temperature', 3)} the body sheds ${q(P[0]!, 'power', 3)} in still air and ${q(P.at(-1)!, 'power', 3)} with ${q(Vtop, 'velocity', 2)} across it.`,
    }];
  },
  verification: [
    {
      name: 'Ø50 × 350 mm body, still air, 25 °C, ε = 0.9, rated at 80 °C',
      inputs: { ...TW210, V: 0, Tmax: 353.15 },
      expected: { Pmax: 41.01 },
      tolerance: 1e-3,
      why: 'independent evaluation of eqs. 9.34 and 1.9, 4 s.f.',
      source: { key: 'incropera2007', locator: 'eq. 9.34, eq. 1.9, Table A.4' },
      provenance: 'reference library numpy (independent evaluation, version not recorded)',
    },
    {
      name: 'Same body across 10 m/s air, rated at 80 °C',
      inputs: { ...TW210, V: 10, Tmax: 353.15 },
      expected: { Pmax: 182.3 },
      tolerance: 1e-3,
      why: 'reference used forced convection alone (182.31 W); the mixed rule adds 0.05 %',
      source: { key: 'incropera2007', locator: 'eq. 7.54, eq. 1.9, Table A.4' },
      provenance: 'reference library numpy (independent evaluation, version not recorded)',
    },
    {
      name: 'Horizontal steam pipe D = 0.1 m, 1 m long, 165 °C in 23 °C, ε = 0.85',
      inputs: { D: 0.1, L: 1, orientation: 'horizontal', Tamb: 296.15, V: 0, eps: 0.85, Tmax: 438.15 },
      expected: { Pmax: 764 },
      tolerance: 5e-3,
      why: 'book q′ ≈ 763–766 W/m',
      source: { key: 'incropera2007', locator: 'ch. 9 steam-pipe example (Example 9.3 in the 6th ed., number from memory)' },
      provenance: 'from memory',
    },
  ],
  sources: [{ key: 'incropera2007', locator: 'eqs. 9.34, 9.26, 7.54, 9.64, 1.9; Table A.4 (from memory)' }],
  study: {
    inputs: { Tmax: 'allowedTemperature', D: 'bodyDiameter', L: 'bodyLength', orientation: 'bodyOrientation', eps: 'bodyEmissivity', flowFactor: 'localFlowFactor', Tamb: 'airTemperature', dTsur: 'surroundingsAboveAir', V: 'vehicleSpeed', ...HEAT_PATH_STUDY },
  },
});
