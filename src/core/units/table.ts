/**
 * The unit table, as data. Each row: id (ASCII, used in URLs, records and the CLI), display
 * symbol, kind, factor and offset to SI (si = value·factor + offset), whether the factor is
 * exact by definition, and the system it belongs to. Conversion factors follow NIST SP 811
 * (2008), Appendix B.8/B.9; derived factors are computed here from the exact definitions
 * (inch = 0.0254 m, lb = 0.45359237 kg, g_n = 9.80665 m/s², Btu_IT = 1055.05585262 J) rather
 * than copied rounded, so they stay exact. The table is validated when it loads (validate.ts).
 */
import type { QuantityKind } from './kinds.ts';
import { STANDARD_GRAVITY as GN, ZERO_CELSIUS } from '../constants.ts';

export type UnitSystem = 'SI' | 'US';

export interface UnitDef {
  readonly id: string;
  readonly symbol: string;
  readonly kind: QuantityKind;
  readonly factor: number;
  readonly offset?: number;
  readonly exact: boolean;
  readonly system: UnitSystem | 'both';
  /** Locator in NIST SP 811 Appendix B, or 'SI' for SI units and decimal multiples. */
  readonly source: string;
}

const IN = 0.0254; // m, exact (NIST SP 811 B.8)
const FT = 0.3048; // m, exact
const LB = 0.45359237; // kg, exact
const LBF = LB * GN; // N, exact by definition
const BTU = 1055.05585262; // J, International Table Btu, exact
const DEGF = 5 / 9; // K per °F, exact
const MILE = 1609.344; // m, exact
const HOUR = 3600;

const si = (id: string, symbol: string, kind: QuantityKind, factor = 1): UnitDef => ({
  id, symbol, kind, factor, exact: true, system: 'SI', source: 'SI',
});
const us = (id: string, symbol: string, kind: QuantityKind, factor: number, exact = true): UnitDef => ({
  id, symbol, kind, factor, exact, system: 'US', source: 'NIST SP 811 B.8',
});
const any = (id: string, symbol: string, kind: QuantityKind, factor = 1): UnitDef => ({
  id, symbol, kind, factor, exact: true, system: 'both', source: 'SI',
});

export const UNITS: readonly UnitDef[] = [
  // % only for a share of a whole; a plain number (waviness, exponent, count, ratio above 1) has no %
  any('1', '', 'dimensionless'),
  any('1', '', 'fraction'), any('%', '%', 'fraction', 0.01),

  si('m', 'm', 'length'), si('mm', 'mm', 'length', 1e-3), si('cm', 'cm', 'length', 1e-2), si('um', 'µm', 'length', 1e-6),
  us('in', 'in', 'length', IN), us('ft', 'ft', 'length', FT), us('mil', 'mil', 'length', IN / 1000),

  si('kg', 'kg', 'mass'), si('g', 'g', 'mass', 1e-3), si('t', 't', 'mass', 1e3),
  us('lb', 'lb', 'mass', LB), us('slug', 'slug', 'mass', LBF / FT),

  any('s', 's', 'time'), any('ms', 'ms', 'time', 1e-3), any('min', 'min', 'time', 60), any('h', 'h', 'time', HOUR),

  si('N', 'N', 'force'), si('kN', 'kN', 'force', 1e3), us('lbf', 'lbf', 'force', LBF), us('kip', 'kip', 'force', 1000 * LBF),

  si('m/s', 'm/s', 'velocity'), si('mm/s', 'mm/s', 'velocity', 1e-3), si('km/h', 'km/h', 'velocity', 1000 / HOUR),
  us('in/s', 'in/s', 'velocity', IN), us('ft/s', 'ft/s', 'velocity', FT), us('mph', 'mph', 'velocity', MILE / HOUR),

  si('m/s2', 'm/s²', 'acceleration'), any('gn', 'g', 'acceleration', GN), us('ft/s2', 'ft/s²', 'acceleration', FT), us('in/s2', 'in/s²', 'acceleration', IN),

  si('N/m', 'N/m', 'stiffness'), si('N/mm', 'N/mm', 'stiffness', 1e3), si('kN/m', 'kN/m', 'stiffness', 1e3),
  us('lbf/in', 'lbf/in', 'stiffness', LBF / IN), us('lbf/ft', 'lbf/ft', 'stiffness', LBF / FT),

  si('N.s/m', 'N·s/m', 'damping'), si('kN.s/m', 'kN·s/m', 'damping', 1e3),
  us('lbf.s/in', 'lbf·s/in', 'damping', LBF / IN), us('lbf.s/ft', 'lbf·s/ft', 'damping', LBF / FT),

  si('J', 'J', 'energy'), si('kJ', 'kJ', 'energy', 1e3), si('Wh', 'W·h', 'energy', HOUR),
  us('ft.lbf', 'ft·lbf', 'energy', LBF * FT), us('in.lbf', 'in·lbf', 'energy', LBF * IN), us('Btu', 'Btu', 'energy', BTU),

  si('W', 'W', 'power'), si('kW', 'kW', 'power', 1e3),
  us('hp', 'hp', 'power', 550 * LBF * FT), us('Btu/h', 'Btu/h', 'power', BTU / HOUR), us('ft.lbf/s', 'ft·lbf/s', 'power', LBF * FT),

  { id: 'K', symbol: 'K', kind: 'temperature', factor: 1, exact: true, system: 'SI', source: 'SI' },
  { id: 'degC', symbol: '°C', kind: 'temperature', factor: 1, offset: ZERO_CELSIUS, exact: true, system: 'SI', source: 'SI' },
  { id: 'degF', symbol: '°F', kind: 'temperature', factor: DEGF, offset: 459.67 * DEGF, exact: true, system: 'US', source: 'NIST SP 811 B.9' },

  { id: 'dK', symbol: 'K', kind: 'temperatureDifference', factor: 1, exact: true, system: 'SI', source: 'SI' },
  { id: 'ddegC', symbol: '°C', kind: 'temperatureDifference', factor: 1, exact: true, system: 'SI', source: 'SI' },
  { id: 'ddegF', symbol: '°F', kind: 'temperatureDifference', factor: DEGF, exact: true, system: 'US', source: 'NIST SP 811 B.9' },

  any('Hz', 'Hz', 'frequency'), any('rpm', 'rpm', 'frequency', 1 / 60), any('cpm', 'cycles/min', 'frequency', 1 / 60),
  any('rad/s', 'rad/s', 'angularFrequency'),
  any('rad', 'rad', 'angle'), any('deg', '°', 'angle', Math.PI / 180),

  si('m2', 'm²', 'area'), si('cm2', 'cm²', 'area', 1e-4), si('mm2', 'mm²', 'area', 1e-6),
  us('in2', 'in²', 'area', IN * IN), us('ft2', 'ft²', 'area', FT * FT),

  si('W/m2K', 'W/(m²·K)', 'heatTransferCoefficient'),
  us('Btu/hft2F', 'Btu/(h·ft²·°F)', 'heatTransferCoefficient', BTU / HOUR / (FT * FT) / DEGF),
  si('W/m2', 'W/m²', 'heatFlux'), si('kW/m2', 'kW/m²', 'heatFlux', 1e3), us('Btu/hft2', 'Btu/(h·ft²)', 'heatFlux', BTU / HOUR / (FT * FT)),

  si('m2/s', 'm²/s', 'kinematicViscosity'), si('cSt', 'mm²/s', 'kinematicViscosity', 1e-6),
  us('ft2/s', 'ft²/s', 'kinematicViscosity', FT * FT), us('in2/s', 'in²/s', 'kinematicViscosity', IN * IN),

  si('Pa.s', 'Pa·s', 'dynamicViscosity'), si('mPa.s', 'mPa·s', 'dynamicViscosity', 1e-3),
  us('lbf.s/ft2', 'lbf·s/ft²', 'dynamicViscosity', LBF / (FT * FT)),

  si('J/K', 'J/K', 'heatCapacity'), si('kJ/K', 'kJ/K', 'heatCapacity', 1e3), us('Btu/F', 'Btu/°F', 'heatCapacity', BTU / DEGF),
  si('J/kgK', 'J/(kg·K)', 'specificHeat'), si('kJ/kgK', 'kJ/(kg·K)', 'specificHeat', 1e3),
  us('Btu/lbF', 'Btu/(lb·°F)', 'specificHeat', BTU / LB / DEGF),
  si('W/K', 'W/K', 'thermalConductance'), us('Btu/hF', 'Btu/(h·°F)', 'thermalConductance', BTU / HOUR / DEGF),
  si('W/mK', 'W/(m·K)', 'thermalConductivity'), us('Btu/hftF', 'Btu/(h·ft·°F)', 'thermalConductivity', BTU / HOUR / FT / DEGF),

  si('kg/m3', 'kg/m³', 'density'), us('lb/ft3', 'lb/ft³', 'density', LB / (FT * FT * FT)), us('lb/in3', 'lb/in³', 'density', LB / (IN * IN * IN)),

  si('Pa', 'Pa', 'pressure'), si('kPa', 'kPa', 'pressure', 1e3), si('MPa', 'MPa', 'pressure', 1e6), si('bar', 'bar', 'pressure', 1e5),
  us('psi', 'psi', 'pressure', LBF / (IN * IN)),

  any('m3', 'm³', 'roadRoughness'), any('cm3', 'cm³', 'roadRoughness', 1e-6),
  any('(m/s)2/Hz', '(m/s)²/Hz', 'velocityPsd'),
  any('(m/s2)2/Hz', '(m/s²)²/Hz', 'accelerationPsd'),
  any('m2/Hz', 'm²/Hz', 'displacementPsd'),

  // an event rate is kept per hour (the CLI key `cph` is per hour); per minute and per second convert exactly
  // a fractional change per degree: per °F is 1.8 per kelvin (NIST SP 811 B.9 applied to 1/ΔT)
  si('1/K', '1/K', 'perTemperature'), si('%/K', '%/K', 'perTemperature', 0.01), us('1/F', '1/°F', 'perTemperature', 1 / DEGF), us('%/F', '%/°F', 'perTemperature', 0.01 / DEGF),

  si('kg.m2', 'kg·m²', 'momentOfInertia'), us('lb.ft2', 'lb·ft²', 'momentOfInertia', LB * FT * FT), us('lb.in2', 'lb·in²', 'momentOfInertia', LB * IN * IN), us('slug.ft2', 'slug·ft²', 'momentOfInertia', (LBF / FT) * FT * FT),
  si('N.m', 'N·m', 'torque'), us('lbf.ft', 'lbf·ft', 'torque', LBF * FT), us('lbf.in', 'lbf·in', 'torque', LBF * IN),
  // litre: 1 L = 1 dm³ (SI Brochure Table 8, accepted for use with the SI); in³ from the exact inch
  si('m3', 'm³', 'volume'), si('cm3', 'cm³', 'volume', 1e-6), si('L', 'L', 'volume', 1e-3),
  us('in3', 'in³', 'volume', IN * IN * IN),
  // kcal_th = 4184 J exactly (NIST SP 811 B.8, calorie_th); the kcal/mol of the ageing literature
  si('J/mol', 'J/mol', 'molarEnergy'), si('kJ/mol', 'kJ/mol', 'molarEnergy', 1e3),
  { id: 'kcal/mol', symbol: 'kcal/mol', kind: 'molarEnergy', factor: 4184, exact: true, system: 'US', source: 'NIST SP 811 B.8' },

  any('1/h', 'per hour', 'eventRate'), any('1/min', 'per minute', 'eventRate', 60), any('1/s', 'per second', 'eventRate', 3600),
];

/**
 * The unit each system shows a kind in by default (the first of the system's units unless
 * listed here).
 */
export const PREFERRED: Partial<Record<QuantityKind, { SI: string; US: string }>> = {
  length: { SI: 'mm', US: 'in' },
  temperature: { SI: 'degC', US: 'degF' },
  temperatureDifference: { SI: 'dK', US: 'ddegF' },
  velocity: { SI: 'm/s', US: 'in/s' },
  stiffness: { SI: 'N/m', US: 'lbf/in' },
  damping: { SI: 'N.s/m', US: 'lbf.s/in' },
  kinematicViscosity: { SI: 'cSt', US: 'cSt' },
  area: { SI: 'm2', US: 'in2' },
  force: { SI: 'N', US: 'lbf' },
  perTemperature: { SI: '%/K', US: '%/F' },
  fraction: { SI: '1', US: '1' },
  momentOfInertia: { SI: 'kg.m2', US: 'lb.ft2' },
  torque: { SI: 'N.m', US: 'lbf.ft' },
  pressure: { SI: 'MPa', US: 'psi' },
  volume: { SI: 'cm3', US: 'in3' },
  molarEnergy: { SI: 'kJ/mol', US: 'kcal/mol' },
};
