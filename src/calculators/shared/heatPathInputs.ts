/**
 * Optional heat paths of a damper body beyond convection and radiation: conduction into round
 * mount stubs (fins, insulated tip) and the gain from sunlight. Both default to "none", so a page
 * that spreads these inputs computes exactly what it did without them.
 */
import { mountConductance, solarGain, type Body } from '../../core/thermal/index.ts';
import { choice, num, onlyWhen, type Condition, type InputDef, type Values } from '../types.ts';

const MOUNTS: Condition = { key: 'mounts', is: ['stubs'] };
const SUN: Condition = { key: 'sun', is: ['sun'] };

/** The mount and sun fields; `when` (optional) shows the whole group only for some choice of another input. */
export function heatPathInputs(when?: Condition): InputDef[] {
  const all: InputDef[] = [
    { key: 'mounts', label: 'Heat into the mounts', kind: 'choice', default: 'none', options: [{ value: 'none', label: 'none (mounts insulated)' }, { value: 'stubs', label: 'round stubs conduct (fins)' }], help: 'Eyes, pins or bolts carry heat from the body into the structure. Modelled as fins with an insulated tip (the far end clamped in a bracket or bush).' },
    { key: 'nMount', label: 'Number of mount stubs n', kind: 'dimensionless', default: 2, min: 1, max: 50, when: MOUNTS, help: 'Identical stubs in parallel (two eyes: 2).' },
    { key: 'dMount', label: 'Stub diameter d_m', kind: 'length', default: 0.02, min: 0.002, max: 0.2, when: MOUNTS, help: 'Diameter of the pin, bolt or eye shank.' },
    { key: 'LMount', label: 'Stub length L_m', kind: 'length', default: 0.1, min: 0.005, max: 2, when: MOUNTS, help: 'From the body to where the stub is clamped. A bare end: add d/4 to the length (corrected length).' },
    { key: 'kMount', label: 'Stub conductivity k_m', kind: 'thermalConductivity', default: 50, min: 0.1, max: 500, when: MOUNTS, help: 'Carbon steel ≈ 50, stainless ≈ 15, aluminium ≈ 200 W/(m·K).' },
    { key: 'hMount', label: 'Coefficient on the stub h_m', kind: 'heatTransferCoefficient', default: 10, min: 0, max: 1000, when: MOUNTS, help: 'Convection plus radiation on the stub surface; about the body’s h_conv + h_r (5–15 W/(m²·K) in still air).' },
    { key: 'sun', label: 'Sun or a hot beam on the body', kind: 'choice', default: 'none', options: [{ value: 'none', label: 'none (shaded or indoors)' }, { value: 'sun', label: 'in sunlight (absorbed gain)' }], help: 'Sunlight absorbed on the projected area D·L adds heat the body must also shed.' },
    { key: 'alphaSun', label: 'Solar absorptivity α_s', kind: 'fraction', default: 0.6, min: 0, max: 1, when: SUN, help: 'Share of sunlight absorbed: white paint ≈ 0.2–0.3, grey ≈ 0.6–0.75, black ≈ 0.95, bright zinc ≈ 0.6 (values vary with the finish; from memory).' },
    { key: 'irradiance', label: 'Irradiance G_s square to the axis', kind: 'heatFlux', default: 1000, min: 0, max: 1400, when: SUN, help: 'Sunlight on a plane square to the beam: about 1000 W/m² at noon on a clear day, less through haze or at a low sun. The projected area is D·L (beam square to the axis).' },
  ];
  return when ? onlyWhen(when, all) : all;
}

/** The body with its mount conductance and solar gain from validated values (absent inputs: none). */
export function withHeatPaths(body: Body, values: Values): Body {
  const stubs = values.mounts !== undefined && choice(values, 'mounts') === 'stubs';
  const sunny = values.sun !== undefined && choice(values, 'sun') === 'sun';
  if (!stubs && !sunny) return body;
  return {
    ...body,
    ...(stubs ? { Gmount: mountConductance({ D: num(values, 'dMount'), L: num(values, 'LMount'), k: num(values, 'kMount'), h: num(values, 'hMount') }, num(values, 'nMount')).G } : {}),
    ...(sunny ? { Qsun: solarGain(num(values, 'alphaSun'), num(values, 'irradiance'), body.D * body.L) } : {}),
  };
}

/** Study bindings of the heat-path inputs (spread into a calculator's `study.inputs`). */
export const HEAT_PATH_STUDY = { alphaSun: 'solarAbsorptivity', irradiance: 'solarIrradiance' } as const;
