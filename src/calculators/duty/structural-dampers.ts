import { adiabaticRise, storeyDampers } from '../../core/duty/index.ts';
import { ALPHA_RANGE } from '../../core/dampers/index.ts';
import { InputRangeError } from '../../core/errors.ts';
import { formatPowerProfile } from '../../core/thermal/index.ts';
import { defineCalculator, num, type ChartSpec, type Values } from '../types.ts';
import { q } from '../quantityText.ts';

function setup(values: Values) {
  const n = num(values, 'n');
  if (!Number.isInteger(n)) throw new InputRangeError('n', n, { min: 1, max: 1000 }, '', 'a whole number of dampers');
  const alpha = num(values, 'alpha');
  return {
    n, alpha, C: num(values, 'Fref') / num(values, 'vref') ** alpha, theta: num(values, 'theta'),
    drift: num(values, 'drift'), T: num(values, 'T'), k: num(values, 'k'),
  };
}

/** Fluid viscous dampers in a storey: energy per cycle, supplemental damping, mean power and adiabatic temperature rise. */
export const structuralDampersCalculator = defineCalculator({
  id: 'structural-dampers',
  title: 'Fluid viscous dampers in a frame: damping added and heat per event',
  summary: 'Energy per cycle of nonlinear viscous dampers F = C|v|^α in diagonal braces at a design drift amplitude and period, the supplemental damping ratio of the storey by the energy method, and the mean power and adiabatic temperature rise per event.',
  inputs: [
    { key: 'Fref', label: 'Damper force at reference velocity', kind: 'force', default: 200e3, min: 0, max: 1e9, minExclusive: true, required: true, help: 'F_ref = C·v_ref^α. With v_ref = 1 m/s this is C in N·(s/m)^α.' },
    { key: 'vref', label: 'Reference velocity', kind: 'velocity', default: 1, min: 0, max: 100, minExclusive: true, help: 'Velocity at which F_ref is quoted.' },
    { key: 'alpha', label: 'Velocity exponent α', kind: 'dimensionless', default: 0.4, min: ALPHA_RANGE.min, max: ALPHA_RANGE.max, required: true, help: 'Fluid viscous dampers: 0.3–1; 1 is linear.' },
    { key: 'n', label: 'Dampers in the storey (this direction)', kind: 'dimensionless', default: 4, min: 1, max: 1000, required: true, help: 'Identical dampers acting in the direction of the drift.' },
    { key: 'theta', label: 'Brace angle to the horizontal', kind: 'angle', default: (40 * Math.PI) / 180, min: 0, max: Math.PI / 2, maxExclusive: true, help: 'Diagonal brace: damper stroke = storey drift × cos θ.' },
    { key: 'drift', label: 'Storey drift amplitude', kind: 'length', default: 0.015, min: 0, max: 2, minExclusive: true, required: true, help: 'Design displacement amplitude of the storey (earthquake) or steady wind-induced amplitude.' },
    { key: 'T', label: 'Period of the oscillation', kind: 'time', default: 0.5, min: 0, max: 100, minExclusive: true, required: true, help: 'Effective period at the design amplitude (or the wind-excited mode).' },
    { key: 'k', label: 'Storey lateral stiffness (frame alone)', kind: 'stiffness', default: 6e7, min: 0, max: 1e12, minExclusive: true, required: true, help: 'Storey shear per unit drift; W_k = ½·k·Δ².' },
    { key: 'beta0', label: 'Inherent damping ratio of the frame', kind: 'fraction', default: 0.05, min: 0, max: 0.5, help: 'Typically 0.02–0.05 for steel frames.' },
    { key: 'duration', label: 'Duration of oscillation at that amplitude', kind: 'time', default: 20, min: 0, max: 1e6, minExclusive: true, help: 'Strong shaking: seconds to tens of seconds. Wind: can be hours.' },
    { key: 'mSteel', label: 'Steel mass of one damper', kind: 'mass', default: 40, min: 0, max: 1e5, minExclusive: true, help: 'Cylinder, rod and end fittings that warm with the fluid.' },
    { key: 'cSteel', label: 'Specific heat of steel', kind: 'specificHeat', default: 460, min: 100, max: 2000, help: 'Carbon steels 430–480 J/(kg·K) near room temperature.' },
    { key: 'mFluid', label: 'Fluid mass of one damper', kind: 'mass', default: 3, min: 0, max: 1e4, help: 'Silicone or other working fluid.' },
    { key: 'cFluid', label: 'Specific heat of fluid', kind: 'specificHeat', default: 1500, min: 100, max: 5000, help: 'Silicone fluids about 1500 J/(kg·K).' },
    { key: 'lamMax', label: 'Maximum property modification factor λ_max', kind: 'dimensionless', default: 1, min: 1, max: 5, help: 'From the property-bounds page; 1 = nominal. The upper-bound force is λ_max times the nominal.' },
    { key: 'lamMin', label: 'Minimum property modification factor λ_min', kind: 'dimensionless', default: 1, min: 0, max: 1, minExclusive: true, help: 'From the property-bounds page; 1 = nominal. The lower-bound damping is λ_min times the nominal.' },
  ],
  outputs: [
    { key: 'stroke', label: 'Damper stroke amplitude δ', kind: 'length' },
    { key: 'vPeak', label: 'Peak damper velocity', kind: 'velocity' },
    { key: 'Fpeak', label: 'Peak damper force', kind: 'force' },
    { key: 'Wj', label: 'Energy per cycle, one damper', kind: 'energy' },
    { key: 'Wtotal', label: 'Energy per cycle, all dampers', kind: 'energy' },
    { key: 'Wk', label: 'Storey strain energy W_k', kind: 'energy' },
    { key: 'betaSup', label: 'Supplemental damping ratio', kind: 'fraction', digits: 3 },
    { key: 'betaEff', label: 'Effective damping ratio', kind: 'fraction', digits: 3 },
    { key: 'P', label: 'Mean power per damper while oscillating', kind: 'power',
      feeds: [
        { page: 'warm-up', input: 'P', label: 'Damper temperature over the event', with: { profile: 'profile', Cth: 'Cdamper' }, set: { power: 'profile', after: 'off' } },
        { page: 'steady-temperature', input: 'P', label: 'Steady temperature (long wind event)' },
      ] },
    { key: 'cycles', label: 'Cycles in the event', kind: 'dimensionless', digits: 3 },
    { key: 'Eevent', label: 'Energy per damper per event', kind: 'energy' },
    { key: 'dT', label: 'Adiabatic temperature rise per event', kind: 'temperatureDifference' },
    { key: 'shear', label: 'Storey shear from the dampers at peak velocity', kind: 'force' },
    { key: 'Cdamper', label: 'Heat capacity of one damper', kind: 'heatCapacity', help: 'm_steel·c_steel + m_fluid·c_fluid (handed to the warm-up page).' },
    { key: 'FpeakUpper', label: 'Peak damper force, upper-bound properties', kind: 'force', help: 'λ_max·F_peak at the same drift: for damper, brace and connection design.' },
    { key: 'shearUpper', label: 'Storey shear from the dampers, upper bound', kind: 'force' },
    { key: 'betaSupLower', label: 'Supplemental damping ratio, lower-bound properties', kind: 'dimensionless', digits: 3, help: 'λ_min·β_sup at the same drift: the damping that may be credited.' },
    { key: 'betaEffLower', label: 'Effective damping ratio, lower bound', kind: 'dimensionless', digits: 3 },
  ],
  handoffs: [{ key: 'profile', help: 'The event as a power profile for the warm-up page: P for the duration, then off.', maxLength: 200 }],
  compute(values) {
    const s = setup(values);
    const r = storeyDampers(s);
    const cycles = num(values, 'duration') / s.T;
    const Eevent = r.Wj * cycles;
    const heat = num(values, 'mSteel') * num(values, 'cSteel') + num(values, 'mFluid') * num(values, 'cFluid');
    const dT = adiabaticRise(Eevent, heat);
    const lamMax = num(values, 'lamMax');
    const lamMin = num(values, 'lamMin');
    const warnings: string[] = [];
    if (r.betaSup > 0.3) warnings.push('Supplemental damping above 30 %: the codes limit how much of it the linear procedures may credit; use a nonlinear analysis.');
    if (dT > 50) warnings.push(`Adiabatic rise ${dT.toFixed(0)} K per event: check the fluid, seals and the damper's rated temperature with its maker.`);
    return {
      outputs: {
        stroke: r.stroke, vPeak: r.vPeak, Fpeak: r.Fpeak, Wj: r.Wj, Wtotal: s.n * r.Wj, Wk: r.Wk,
        betaSup: r.betaSup, betaEff: num(values, 'beta0') + r.betaSup, P: r.Pdamper, cycles, Eevent, dT,
        shear: s.n * r.Fpeak * Math.cos(s.theta), Cdamper: heat,
        // C enters F and W_j linearly: the bounds scale the nominal results (same drift and period)
        FpeakUpper: lamMax * r.Fpeak, shearUpper: lamMax * s.n * r.Fpeak * Math.cos(s.theta),
        betaSupLower: lamMin * r.betaSup, betaEffLower: num(values, 'beta0') + lamMin * r.betaSup,
      },
      warnings,
      handoff: { profile: formatPowerProfile({ t: [0, num(values, 'duration')], P: [r.Pdamper] }) },
    };
  },
  charts(values, result): ChartSpec[] {
    const s = setup(values);
    const drifts = Array.from({ length: 41 }, (_, i) => (s.drift * (i + 1)) / 20);
    const beta = drifts.map((d) => storeyDampers({ ...s, drift: d }).betaSup);
    return [{
      id: 'beta-drift', title: 'Supplemental damping against drift amplitude',
      x: { label: 'Storey drift amplitude', kind: 'length', input: 'drift' }, y: { label: 'Supplemental damping ratio', kind: 'dimensionless' },
      series: [{ label: `α = ${s.alpha}`, x: drifts, y: beta, tone: 0 }],
      summary: `With α = ${s.alpha} the damping added falls as drift^(α−1): ${(result.outputs.betaSup as number).toPrecision(3)} at the design drift of ${q(s.drift, 'length', 3)}.`,
    }];
  },
  verification: [
    {
      name: 'Linear damper, horizontal: W_j = (2π²/T)·C·δ² with T = 1 s, C = 10⁵ N·s/m, δ = 20 mm',
      inputs: { Fref: 1e5, vref: 1, alpha: 1, n: 1, theta: 0, drift: 0.02, T: 1, k: 1e7 },
      expected: { Wj: 789.568, betaSup: Math.PI / 100 },
      tolerance: 1e-6, why: 'closed form to 6 s.f.; β = πC/(kT) for α = 1',
      source: { key: 'fema356', locator: '§9.3, energy per cycle and effective damping of linear viscous devices, eqs. 9-36/9-37 (equation numbers from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'Brace at 60°: a 40 mm drift strokes the damper 20 mm (same energy as above)',
      inputs: { Fref: 1e5, vref: 1, alpha: 1, n: 1, theta: Math.PI / 3, drift: 0.04, T: 1, k: 1e7 },
      expected: { stroke: 0.02, Wj: 789.568 },
      tolerance: 1e-6, why: 'closed form (cos 60° = ½)',
      source: { key: 'soong1997', locator: 'diagonal-brace damper kinematics (chapter from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'Linear dampers reproduce the viscous damping ratio ζ = cω/(2k) of a storey',
      inputs: { Fref: 2e5, vref: 1, alpha: 1, n: 2, theta: 0, drift: 0.01, T: 0.5, k: 5e7 },
      expected: { betaSup: (4e5 * (2 * Math.PI / 0.5)) / (2 * 5e7) },
      tolerance: 1e-9, why: 'closed form, same arithmetic',
      source: { key: 'chopra2017', locator: '§3.9 equivalent viscous damping, ζ_eq = E_D/(4πE_So) (from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'Nonlinear α = 0.5: W_j = λ(0.5)·C·ω^0.5·δ^1.5 with λ(0.5) = 3.49608',
      inputs: { Fref: 1e5, vref: 1, alpha: 0.5, n: 1, theta: 0, drift: 0.02, T: 1, k: 1e7 },
      expected: { Wj: 3.49608 * 1e5 * Math.sqrt(2 * Math.PI) * 0.02 ** 1.5 },
      tolerance: 2e-6, why: 'λ(0.5) quoted to 6 s.f.',
      source: { key: 'fema274', locator: '§9.3 fluid viscous devices, λ(α) (from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'Bounds λ_max = 1.2981, λ_min = 0.8075 on the linear case: F = 1.2981·C·ωδ, β = 0.8075·π/100',
      inputs: { Fref: 1e5, vref: 1, alpha: 1, n: 1, theta: 0, drift: 0.02, T: 1, k: 1e7, lamMax: 1.2980625, lamMin: 0.8075 },
      expected: { FpeakUpper: 1.2980625 * 1e5 * 2 * Math.PI * 0.02, betaSupLower: (0.8075 * Math.PI) / 100, Fpeak: 1e5 * 2 * Math.PI * 0.02 },
      tolerance: 1e-9, why: 'closed form: the force and W_j are linear in C, so the bounds scale them',
      source: { key: 'asce7_16', locator: '§18.2.4.5 upper- and lower-bound properties; §17.2.8.4 factors (from memory)' },
      provenance: 'from memory',
    },
  ],
  sources: [
    { key: 'fema356', locator: '§9.3 energy method, eqs. 9-36/9-37 (from memory)' },
    { key: 'asce41_17', locator: '§14.3 energy dissipation systems (from memory)' },
    { key: 'fema274', locator: '§9.3 (from memory)' },
    { key: 'soong1997', locator: 'fluid viscous dampers in braces (from memory)' },
    { key: 'asce7_16', locator: '§18.2.4.5 upper- and lower-bound damper properties (from memory)' },
  ],
  study: {
    inputs: { lamMax: 'propertyFactorMax', lamMin: 'propertyFactorMin' },
  },
});
