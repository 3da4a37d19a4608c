/**
 * The damper fluid, written once for every page with a temperature law (damping-fade, fade-fit):
 * a mineral oil from its 40 °C and 100 °C viscosities (ASTM D341), a mineral oil by ISO 3448 grade
 * and viscosity index (ν100 from ASTM D2270), a silicone fluid (two-point Andrade line) or a
 * measured table. Also the fade law choice: the share law or the physical (density) law.
 */
import {
  andradeCurve, mineralOilCurve, nu100ForViscosityIndex, parseViscosityTable, type ViscosityCurve,
} from '../../core/thermal/index.ts';
import { choice, num, text, type InputDef, type Values } from '../types.ts';
import { ZERO_CELSIUS } from '../../core/constants.ts';

export const VG_PRESETS = [10, 15, 22, 32, 46, 68, 100] as const;

/** Demo table: an ISO VG 22, VI 100 oil by ASTM D341, rounded to 3 significant digits. */
export const DEFAULT_TABLE = 'T [°C], nu [mm²/s]\n-30, 3410\n-20, 1080\n0, 187\n25, 42.2\n40, 22.0\n70, 8.40\n100, 4.29\n120, 3.04';

export type Fluid = 'mineral' | 'vg' | 'silicone' | 'table';

export function fluidInputs(): InputDef[] {
  return [
    { key: 'fluid', label: 'Damper fluid', kind: 'choice', default: 'mineral', options: [
      { value: 'mineral', label: 'mineral oil, ν40 and ν100 (ASTM D341)' },
      { value: 'vg', label: 'mineral oil by ISO VG grade and viscosity index' },
      { value: 'silicone', label: 'silicone fluid, ν40 and ν100 (ln ν linear in 1/T)' },
      { value: 'table', label: 'measured table T, ν' },
    ], help: 'How the viscosity follows temperature. Silicone fluids thin far less with heat than mineral oils; the D341 line is for petroleum oils only.' },
    { key: 'nu40', label: 'Viscosity at 40 °C ν40', kind: 'kinematicViscosity', default: 20e-6, min: 2e-6, max: 5e-3, help: 'From the fluid data sheet.', when: { key: 'fluid', is: ['mineral', 'silicone'] } },
    { key: 'nu100', label: 'Viscosity at 100 °C ν100', kind: 'kinematicViscosity', default: 4.5e-6, min: 1e-6, max: 1e-3, help: 'From the fluid data sheet; below ν40.', when: { key: 'fluid', is: ['mineral', 'silicone'] } },
    { key: 'grade', label: 'ISO 3448 grade', kind: 'choice', default: 'VG22', options: VG_PRESETS.map((g) => ({ value: `VG${g}`, label: `ISO VG ${g} (ν40 = ${g} mm²/s)` })), help: 'Mid-point viscosity at 40 °C of the grade (ISO 3448); a real oil lies within ±10 %.', when: { key: 'fluid', is: ['vg'] } },
    { key: 'VI', label: 'Viscosity index VI', kind: 'dimensionless', default: 100, min: 0, max: 200, help: 'From the oil data sheet; ν100 follows from ASTM D2270. Plain mineral oils 90–105, damper oils with VI improvers 130–200.', when: { key: 'fluid', is: ['vg'] } },
    { key: 'nuTable', label: 'Viscosity table (T, ν)', kind: 'text', default: DEFAULT_TABLE, maxLength: 4000, rows: 6, fromUrl: true, help: 'One row per temperature: T, ν. Units in a header line, e.g. "T [°C], nu [mm²/s]"; without a header T is in K and ν in m²/s. At least two rows; ν must fall as T rises. Between rows ln ν is linear in 1/T.', when: { key: 'fluid', is: ['table'] } },
  ];
}

export interface FluidChoice {
  readonly curve: ViscosityCurve;
  /** 40 °C and 100 °C viscosities of the fluid (read off the curve for a table). */
  readonly nu40: number;
  readonly nu100: number;
  /** The span of a measured table (extrapolated outside it). */
  readonly span?: { readonly Tmin: number; readonly Tmax: number };
  readonly label: string;
}

export function fluidFrom(values: Values): FluidChoice {
  const f = choice<Fluid>(values, 'fluid');
  if (f === 'vg') {
    const g = Number(choice<string>(values, 'grade').slice(2));
    const nu40 = g * 1e-6;
    const nu100 = nu100ForViscosityIndex(nu40, num(values, 'VI'));
    return { curve: mineralOilCurve(nu40, nu100), nu40, nu100, label: `ISO VG ${g}, VI ${num(values, 'VI')}` };
  }
  if (f === 'table') {
    const t = parseViscosityTable(text(values, 'nuTable'));
    return { curve: t.curve, nu40: t.curve.nu(313.15), nu100: t.curve.nu(373.15), span: { Tmin: t.Tmin, Tmax: t.Tmax }, label: 'measured table' };
  }
  const nu40 = num(values, 'nu40');
  const nu100 = num(values, 'nu100');
  if (f === 'silicone') return { curve: andradeCurve(313.15, nu40, 373.15, nu100), nu40, nu100, label: 'silicone fluid' };
  return { curve: mineralOilCurve(nu40, nu100), nu40, nu100, label: 'mineral oil' };
}

/** Warns when a temperature the page uses lies outside a measured table. */
export function spanWarning(fluid: FluidChoice, T: number, what: string): string | undefined {
  if (!fluid.span || (T >= fluid.span.Tmin - 1e-9 && T <= fluid.span.Tmax + 1e-9)) return undefined;
  return `The ${what} (${(T - ZERO_CELSIUS).toFixed(1)} °C) is outside the viscosity table (${(fluid.span.Tmin - ZERO_CELSIUS).toFixed(1)} to ${(fluid.span.Tmax - ZERO_CELSIUS).toFixed(1)} °C): the end piece is extended.`;
}

/** The fade fadeLaw: share law (orifice part constant) or physical law (laminar ∝ μ, orifice ∝ ρ). */
export function lawInputs(): InputDef[] {
  return [
    { key: 'fadeLaw', label: 'Temperature law', kind: 'choice', default: 'share', options: [
      { value: 'share', label: 'share law: viscous part ∝ ν, the rest constant' },
      { value: 'physical', label: 'physical law: laminar part ∝ μ = ρν, orifice part ∝ ρ' },
    ], help: 'The share law is the classic engineering split; the physical law adds the density change of the oil to both parts (a few percent over 100 K).' },
    { key: 'beta', label: 'Volumetric expansion coefficient β', kind: 'perTemperature', default: 7e-4, min: 0, max: 0.005, help: 'Of the fluid: mineral oils 6.5–7.5·10⁻⁴ 1/K, silicone fluids about 9.5·10⁻⁴ 1/K (from memory; the fluid data sheet or the petroleum measurement tables).', when: { key: 'fadeLaw', is: ['physical'] } },
  ];
}

/** β of the chosen law (0 for the share law). */
export function betaFrom(values: Values): number {
  return choice(values, 'fadeLaw') === 'physical' ? num(values, 'beta') : 0;
}

/** The sources of the fluid and temperature-law inputs, cited by every calculator that spreads them. */
export const FLUID_SOURCES = [
  { key: 'astmD341', locator: 'viscosity–temperature equation (from memory)' },
  { key: 'astmD2270', locator: 'Table 1, §5.1.3, §6.1.3' },
  { key: 'iso3448', locator: 'Table 1 (from memory)' },
  { key: 'andrade1930', locator: 'ln ν linear in 1/T (from memory)' },
  { key: 'apiMpms11_1', locator: 'thermal expansion of oils (from memory)' },
  { key: 'hryciow2022', locator: 'cold-temperature force ratios of twin-tube dampers (about 2.5 at −30 °C)' },
  { key: 'dixon2007thermal', locator: 'fade rates 0.2–2 %/K (from memory)' },
] as const;
