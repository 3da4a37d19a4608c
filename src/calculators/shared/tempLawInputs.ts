/**
 * The optional temperature law of a duty page (property-bounds, test-protocol): a yes/no choice
 * `fade` and, under it, the handbook's one fade law (share or physical law on the fluid's
 * viscosity curve), the same inputs and study names as damping-fade and fade-fit.
 */
import { fadeRatio, type FadeModel } from '../../core/thermal/index.ts';
import { choice, num, onlyWhen, type InputDef, type Values } from '../types.ts';
import { betaFrom, fluidFrom, fluidInputs, lawInputs as fadeLawInputs, type FluidChoice } from './fluidInputs.ts';

const ON = { key: 'fade', is: ['law'] } as const;

export function tempLawInputs(help: string): InputDef[] {
  return [
    { key: 'fade', label: 'Temperature law of the damper', kind: 'choice', default: 'none', options: [
      { value: 'none', label: 'none (properties independent of temperature)' },
      { value: 'law', label: 'fade law on the fluid viscosity' },
    ], help },
    ...onlyWhen(ON, [
      { key: 'Tref', label: 'Reference temperature T_ref', kind: 'temperature', default: 293.15, min: 233.15, max: 423.15, help: 'Temperature at which the nominal damper properties hold (prototype tests are often at 20 °C).' },
      { key: 'share', label: 'Viscous share s at T_ref', kind: 'fraction', default: 0.3, min: 0, max: 1, help: 'Part of the damper force that follows the fluid viscosity; the rest (orifices) does not. Fit it on the fade-fit page; 0.3 is a guess.' },
      ...fadeLawInputs(),
      ...fluidInputs(),
    ]),
  ];
}

/** The fade model when the law is chosen (c_ref = 1: only ratios are used), else undefined. */
export function tempLawFrom(values: Values): { model: FadeModel; fluid: FluidChoice } | undefined {
  if (choice(values, 'fade') !== 'law') return undefined;
  const fluid = fluidFrom(values);
  return { model: { cRef: 1, Tref: num(values, 'Tref'), viscousShare: num(values, 'share'), oil: fluid.curve, beta: betaFrom(values) }, fluid };
}

/** r(T) = c(T)/c(T_ref) of the chosen law. */
export function ratioOf(model: FadeModel): (T: number) => number {
  return (T) => fadeRatio(model, T);
}

/** Study names of the temperature-law inputs (the same as on damping-fade). */
export const TEMP_LAW_STUDY = {
  Tref: 'referenceTemperature', share: 'fadeShare', fadeLaw: 'fadeLaw', beta: 'oilExpansion',
  fluid: 'damperFluid', nu40: 'oilViscosity40', nu100: 'oilViscosity100',
} as const;
