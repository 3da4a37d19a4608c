/**
 * The two-node choice (oil and body) shared by the steady-temperature, warm-up and damping-fade
 * pages. One node stays the default: every page computes what it did before unless two are chosen.
 */
import { OIL_BODY_NOTE_K } from '../../core/thermal/index.ts';
import { choice, num, type Condition, type InputDef, type Values } from '../types.ts';

const TWO: Condition = { key: 'nodes', is: ['two'] };

/** `nodes`, `Gob` and (when the page runs in time) `Coil`. */
export function oilNodeInputs(withCapacity: boolean): InputDef[] {
  return [
    { key: 'nodes', label: 'Thermal model', kind: 'choice', default: 'one', options: [{ value: 'one', label: 'one node (oil at body temperature)' }, { value: 'two', label: 'two nodes (oil runs hotter than the body)' }], help: 'Two nodes: the power heats the oil, which passes it to the body through G_ob. Use it when the oil temperature matters (fade, seals) and G_ob is known.' },
    { key: 'Gob', label: 'Oil-to-body conductance G_ob', kind: 'thermalConductance', default: 15, min: 0.01, max: 1e4, when: TWO, help: 'Inner film coefficient × wetted wall area (+ conduction through piston and rod). Best from a test: P/(T_oil − T_body) at a steady power. Vehicle dampers often 5–30 W/K (common practice, no source).' },
    ...(withCapacity ? [{ key: 'Coil', label: 'Oil heat capacity C_oil', kind: 'heatCapacity' as const, default: 475, min: 1, max: 1e6, when: TWO, help: 'm·c of the oil (0.25 kg × 1909 J/(kg·K) ≈ 475 J/K); the rest of the total heat capacity is the body node.' }] : []),
  ];
}

export const twoNodes = (values: Values): boolean => values.nodes !== undefined && choice(values, 'nodes') === 'two';

/** G_ob when two nodes are chosen, else undefined. */
export function gobFrom(values: Values): number | undefined {
  return twoNodes(values) ? num(values, 'Gob') : undefined;
}

/** The note a page shows when oil and body differ by more than OIL_BODY_NOTE_K. */
export function oilBodyNote(Toil: number, Tbody: number): string | undefined {
  const d = Toil - Tbody;
  if (Math.abs(d) <= OIL_BODY_NOTE_K) return undefined;
  return `The oil runs ${d.toFixed(1)} K ${d > 0 ? 'above' : 'below'} the body (more than ${OIL_BODY_NOTE_K} K): the one-node model would misstate the oil temperature; fade and the oil and seal limits follow the oil.`;
}

export const OIL_NODE_STUDY = { nodes: 'thermalModel', Gob: 'oilBodyConductance' } as const;
