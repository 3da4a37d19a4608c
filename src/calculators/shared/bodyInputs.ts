/**
 * Inputs shared by the thermal calculators that model a damper body in air, and the mapping from
 * validated values to the core's `Body`. Written once so every page offers the same fields.
 */
import type { Body, Orientation } from '../../core/thermal/index.ts';
import { choice, num, type InputDef, type Values } from '../types.ts';

type When = { readonly key: string; readonly is: readonly string[] };

/** The body fields; `when` (optional) shows them only for some choice of another input. */
export function bodyInputs(when?: When, omit: readonly string[] = []): InputDef[] {
  const w = when ? { when } : {};
  const all: InputDef[] = [
    { key: 'D', label: 'Body diameter D', kind: 'length', default: 0.05, min: 0.005, max: 1, required: true, help: 'Outside diameter of the damper body (reservoir tube for a twin-tube damper).', ...w },
    { key: 'L', label: 'Body length L', kind: 'length', default: 0.35, min: 0.01, max: 5, required: true, help: 'Length of the body that is wetted by oil and exposed to air.', ...w },
    { key: 'orientation', label: 'Orientation', kind: 'choice', default: 'horizontal', options: [{ value: 'horizontal', label: 'horizontal' }, { value: 'vertical', label: 'vertical' }], help: 'Axis horizontal or vertical. Inclined bodies: use the orientation closer to the real one, or both to bound the answer.', ...w },
    // option values stay '0'/'1': the CLI and records took the number before it was a choice (yesNoNumbers.ts)
    { key: 'ends', label: 'End faces', kind: 'choice', default: '0', options: [{ value: '0', label: 'Not included (ends in the mounts)' }, { value: '1', label: 'Included, at the lateral coefficients' }], help: 'Including them adds the two flat end faces to the area, at the lateral coefficients (an approximation). Usually not: the ends are in the mounts.', ...w },
    { key: 'Tamb', label: 'Air temperature T∞', kind: 'temperature', default: 298.15, min: 223.15, max: 333.15, help: 'Air temperature away from the body (−50 °C to 60 °C).', ...w },
    { key: 'dTsur', label: 'Surroundings above air T_sur − T∞', kind: 'temperatureDifference', default: 0, min: -20, max: 200, help: 'How much warmer the surroundings the body radiates to are than the air: 0 in open air; more near a hot exhaust or a dark surface in sun; negative under a clear night sky.', ...w },
    { key: 'V', label: 'Vehicle or air speed V', kind: 'velocity', default: 0, min: 0, max: 60, help: 'Vehicle speed (or wind speed for a fixed body). 0 = still air.', ...w },
    { key: 'flowFactor', label: 'Local-flow factor', kind: 'fraction', default: 1, min: 0, max: 1.5, help: 'Share of V that actually crosses the body (wheel-arch shielding). 1 = full speed; engineers often assume 0.2–0.6 inside a wheel arch (common practice, no source).', ...w },
    { key: 'eps', label: 'Emissivity ε', kind: 'fraction', default: 0.9, min: 0, max: 1, help: 'Painted or lacquered steel 0.9–0.95; oxidised steel about 0.8; bright zinc or chrome below 0.3.', ...w },
  ];
  return all.filter((d) => !omit.includes(d.key));
}

/** The core body from validated values (V is the air speed across the body: V × local-flow factor). */
export function bodyFrom(values: Values): Body {
  return {
    D: num(values, 'D'),
    L: num(values, 'L'),
    orientation: choice<Orientation>(values, 'orientation'),
    ends: choice(values, 'ends') === '1',
    eps: num(values, 'eps'),
    Tamb: num(values, 'Tamb'),
    Tsur: num(values, 'Tamb') + num(values, 'dTsur'),
    V: num(values, 'V') * num(values, 'flowFactor'),
  };
}

/** Extra body outputs shown on every body page. */
export const BODY_DETAIL_OUTPUTS = [
  { key: 'hNatural', label: 'Free-convection coefficient h_N', kind: 'heatTransferCoefficient', help: 'Churchill–Chu (horizontal cylinder) or vertical plate.' },
  { key: 'hForced', label: 'Forced-convection coefficient h_F', kind: 'heatTransferCoefficient', help: 'Churchill–Bernstein across the cylinder; 0 in still air.' },
  { key: 'area', label: 'Cooled area A', kind: 'area' },
  { key: 'Ra', label: 'Rayleigh number Ra', kind: 'dimensionless', digits: 3, help: 'On D (horizontal) or on L (vertical).' },
  { key: 'Re', label: 'Reynolds number Re_D', kind: 'dimensionless', digits: 3 },
] as const;
