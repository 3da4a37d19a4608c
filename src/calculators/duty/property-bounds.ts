import { propertyBounds } from '../../core/duty/index.ts';
import { fadeRatio } from '../../core/thermal/index.ts';
import { InputRangeError } from '../../core/errors.ts';
import { defineCalculator, num, type ChartSpec, type Values } from '../types.ts';
import { FLUID_SOURCES, spanWarning } from '../shared/fluidInputs.ts';
import { q } from '../quantityText.ts';
import { TEMP_LAW_STUDY, tempLawFrom, tempLawInputs } from '../shared/tempLawInputs.ts';

const TEMP = { key: 'fade', is: ['law'] } as const;

function factors(values: Values) {
  return {
    lamAeMax: num(values, 'lamAeMax'), lamTestMax: num(values, 'lamTestMax'), lamSpecMax: num(values, 'lamSpecMax'),
    lamAeMin: num(values, 'lamAeMin'), lamTestMin: num(values, 'lamTestMin'), lamSpecMin: num(values, 'lamSpecMin'),
    adjust: num(values, 'adjust'),
  };
}

/** Temperature factors λ_T,max = c(T_min)/c(T_ref), λ_T,min = c(T_max + rise)/c(T_ref), or undefined without a law. */
function temperatureFactors(values: Values) {
  const law = tempLawFrom(values);
  if (!law) return undefined;
  const Tmin = num(values, 'Tmin');
  const Thot = num(values, 'Tmax') + num(values, 'dTevent');
  if (Tmin > num(values, 'Tmax')) throw new InputRangeError('Tmin', Tmin, { min: 0, max: num(values, 'Tmax') }, 'K', 'the lowest temperature must not exceed the highest');
  return { ...law, Tmin, Thot, lamTmax: fadeRatio(law.model, Tmin), lamTmin: fadeRatio(law.model, Thot) };
}

const factor = (key: string, label: string, def: number, upper: boolean, help: string) => ({
  key, label, kind: 'dimensionless' as const, default: def,
  min: upper ? 1 : 0.2, max: upper ? 5 : 1, help,
});

/** Upper- and lower-bound damper properties from property modification factors (and optionally temperature). */
export const propertyBoundsCalculator = defineCalculator({
  id: 'property-bounds',
  title: 'Upper- and lower-bound damper properties',
  summary: 'Property modification factors λ_max and λ_min of a damper from its aging and environmental, test and specification factors with the system adjustment factor, optionally with the temperature range of the fade law, and the upper- and lower-bound damper force.',
  inputs: [
    { key: 'C', label: 'Nominal damper force at the reference velocity', kind: 'force', default: 200e3, min: 0, max: 1e9, minExclusive: true, required: true, help: 'The nominal property the factors multiply: for F = C·|v|^α quoted at v_ref = 1 m/s this is C in N·(s/m)^α. Any force-like property (the force at the design velocity) scales the same way.' },
    factor('lamAeMax', 'Aging and environment, maximum λ_ae,max', 1.1, true, 'Ageing, contamination, corrosion and the environment (ASCE/SEI 7-16 §17.2.8.4, from memory); from the damper maker.'),
    factor('lamTestMax', 'Test factor, maximum λ_test,max', 1.05, true, 'Heating, rate and scatter seen in the prototype tests.'),
    factor('lamSpecMax', 'Specification tolerance, maximum λ_spec,max', 1.15, true, 'Manufacturing tolerance on the production dampers; +15 % is usual for fluid viscous dampers.'),
    factor('lamAeMin', 'Aging and environment, minimum λ_ae,min', 1, false, 'Usually 1.0 for fluid viscous dampers: ageing raises, rather than lowers, the force.'),
    factor('lamTestMin', 'Test factor, minimum λ_test,min', 0.95, false, 'Heating, rate and scatter seen in the prototype tests.'),
    factor('lamSpecMin', 'Specification tolerance, minimum λ_spec,min', 0.85, false, 'Manufacturing tolerance on the production dampers; −15 % is usual for fluid viscous dampers.'),
    { key: 'adjust', label: 'System property adjustment factor a', kind: 'dimensionless', default: 0.75, min: 0.5, max: 1, help: '0.75 for most buildings, 1.0 for essential facilities (ASCE/SEI 7-16 §17.2.8.4, from memory). It reduces only the aging and environmental part.' },
    ...tempLawInputs('Adds the force change between the coldest service temperature and the hottest (service plus the rise during the design event) as λ_T factors.'),
    { key: 'Tmin', label: 'Lowest service temperature T_min', kind: 'temperature', default: 263.15, min: 213.15, max: 373.15, help: 'Coldest damper temperature in service (unheated space, winter).', when: TEMP },
    { key: 'Tmax', label: 'Highest service temperature T_max', kind: 'temperature', default: 308.15, min: 233.15, max: 423.15, help: 'Warmest damper temperature in service before the event.', when: TEMP },
    { key: 'dTevent', label: 'Temperature rise during the design event', kind: 'temperatureDifference', default: 10, min: 0, max: 200, help: 'From the structural-dampers or test-protocol page (adiabatic rise per event).', when: TEMP },
  ],
  outputs: [
    { key: 'lamMax', label: 'Maximum property modification factor λ_max', kind: 'dimensionless',
      feeds: [{ page: 'structural-dampers', input: 'lamMax', label: 'Bound the storey dampers with these factors', with: { lamMin: 'lamMin' } }] },
    { key: 'lamMin', label: 'Minimum property modification factor λ_min', kind: 'dimensionless' },
    { key: 'Cupper', label: 'Upper-bound damper force C·λ_max', kind: 'force', help: 'Sets damper, brace and connection design forces.' },
    { key: 'Clower', label: 'Lower-bound damper force C·λ_min', kind: 'force', help: 'Sets the drift and the damping credited.' },
    { key: 'lamTmax', label: 'Cold factor λ_T,max = c(T_min)/c(T_ref)', kind: 'dimensionless', optional: true },
    { key: 'lamTmin', label: 'Hot factor λ_T,min = c(T_max + rise)/c(T_ref)', kind: 'dimensionless', optional: true },
  ],
  compute(values) {
    const b = propertyBounds(factors(values));
    const temp = temperatureFactors(values);
    const warnings: string[] = [];
    const lamMax = b.lamMax * (temp?.lamTmax ?? 1);
    const lamMin = b.lamMin * (temp?.lamTmin ?? 1);
    if (temp) {
      for (const w of [spanWarning(temp.fluid, temp.Tmin, 'lowest temperature'), spanWarning(temp.fluid, temp.Thot, 'hottest temperature')]) if (w) warnings.push(w);
      if (temp.lamTmax < 1 || temp.lamTmin > 1) warnings.push('T_ref lies outside the service range: a temperature factor crosses 1. Check that the nominal properties hold at T_ref.');
    }
    if (lamMax / lamMin > 2) warnings.push(`Upper bound ${(lamMax / lamMin).toPrecision(3)} times the lower: check the factors with the damper maker before designing to so wide a band.`);
    const C = num(values, 'C');
    return { outputs: { lamMax, lamMin, Cupper: C * lamMax, Clower: C * lamMin, lamTmax: temp?.lamTmax, lamTmin: temp?.lamTmin }, warnings };
  },
  charts(values, result): ChartSpec[] {
    const temp = temperatureFactors(values);
    if (!temp) return [];
    const lo = temp.Tmin - 10;
    const hi = temp.Thot + 10;
    const T = Array.from({ length: 61 }, (_, i) => lo + ((hi - lo) * i) / 60);
    const r = T.map((t) => fadeRatio(temp.model, t));
    return [{
      id: 'temperature-factor', title: 'Damper force ratio c(T)/c(T_ref) over the service range',
      x: { label: 'Damper temperature', kind: 'temperature' }, y: { label: 'c(T)/c(T_ref)', kind: 'dimensionless' },
      series: [{ label: 'fade law', x: T, y: r, tone: 0 }],
      markers: [{ x: temp.Tmin, label: 'T_min' }, { x: temp.Thot, label: 'T_max + rise' }],
      summary: `The force is ${(result.outputs.lamTmax as number).toFixed(3)} times nominal at ${q(temp.Tmin, 'temperature', 3)} and ${(result.outputs.lamTmin as number).toFixed(3)} times at ${q(temp.Thot, 'temperature', 3)}.`,
    }];
  },
  verification: [
    {
      name: 'λ_max = (1 + 0.75·(1.10 − 1))·1.05·1.15 = 1.2981',
      inputs: { C: 200e3, lamAeMax: 1.1, lamTestMax: 1.05, lamSpecMax: 1.15, lamAeMin: 1, lamTestMin: 0.95, lamSpecMin: 0.85, adjust: 0.75 },
      expected: { lamMax: 1.2980625, Cupper: 259612.5 },
      tolerance: 1e-9, why: 'the equation worked by hand (exact decimals)',
      source: { key: 'asce7_16', locator: '§17.2.8.4, eq. 17.2-1 (equation number from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'λ_min = (1 − 0.75·(1 − 1.00))·0.95·0.85 = 0.8075',
      inputs: { C: 200e3, lamAeMax: 1.1, lamTestMax: 1.05, lamSpecMax: 1.15, lamAeMin: 1, lamTestMin: 0.95, lamSpecMin: 0.85, adjust: 0.75 },
      expected: { lamMin: 0.8075, Clower: 161500 },
      tolerance: 1e-9, why: 'the equation worked by hand (exact decimals)',
      source: { key: 'asce7_16', locator: '§17.2.8.4, eq. 17.2-2 (equation number from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'Essential facility, a = 1: λ_max = 1.10·1.05·1.15 = 1.32825, λ_min = 0.90·0.95·0.85 = 0.72675',
      inputs: { C: 1, lamAeMax: 1.1, lamTestMax: 1.05, lamSpecMax: 1.15, lamAeMin: 0.9, lamTestMin: 0.95, lamSpecMin: 0.85, adjust: 1 },
      expected: { lamMax: 1.32825, lamMin: 0.72675 },
      tolerance: 1e-9, why: 'closed form: with a = 1 the factors multiply unreduced',
      source: { key: 'asce7_16', locator: '§17.2.8.4, a = 1.0 for essential facilities (from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'All-orifice damper (s = 0, share law): temperature factors 1, bounds unchanged',
      inputs: { C: 200e3, lamAeMax: 1.1, lamTestMax: 1.05, lamSpecMax: 1.15, lamAeMin: 1, lamTestMin: 0.95, lamSpecMin: 0.85, adjust: 0.75, fade: 'law', share: 0, fadeLaw: 'share' },
      expected: { lamTmax: 1, lamTmin: 1, lamMax: 1.2980625, lamMin: 0.8075 },
      tolerance: 1e-12, why: 'closed form: with s = 0 and β = 0 the fade law is c(T) = c_ref',
      source: { key: 'dixon2007thermal', locator: 'orifice flow independent of viscosity (from memory)' },
      provenance: 'closed form',
    },
  ],
  sources: [
    { key: 'asce7_16', locator: '§17.2.8.4 and §18.2.4.5, property modification factors (from memory)' },
    { key: 'asce41_17', locator: '§14.3 energy dissipation systems (from memory)' },
    ...FLUID_SOURCES,
  ],
  study: {
    inputs: { ...TEMP_LAW_STUDY },
    publishes: { lamMax: 'propertyFactorMax', lamMin: 'propertyFactorMin' },
  },
});
