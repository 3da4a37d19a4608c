import { STANDARD_ATMOSPHERE, ZERO_CELSIUS } from '../../core/constants.ts';
import { gasCharge, gasStoredEnergy, type GasChargeInput } from '../../core/dampers/index.ts';
import { ComputationError } from '../../core/errors.ts';
import { defineCalculator, num, type ChartSpec, type Values } from '../types.ts';
import { q } from '../quantityText.ts';

const CHART_T = { min: ZERO_CELSIUS - 40, max: ZERO_CELSIUS + 140 } as const;

function charge(values: Values, over: Partial<GasChargeInput> = {}) {
  return gasCharge({
    p0: num(values, 'p0'), T0: num(values, 'T0'), Vg0: num(values, 'Vg0'), Voil: num(values, 'Voil'), beta: num(values, 'beta'),
    dRod: num(values, 'dRod'), dPiston: num(values, 'dPiston'), T: num(values, 'T'), x: num(values, 'x'), n: num(values, 'n'), ...over,
  });
}

/** Points of a curve that exist (a point past hydraulic lock is left out, not drawn as a spike). */
function curve(xs: readonly number[], f: (x: number) => number): { x: number[]; y: number[] } {
  const out = { x: [] as number[], y: [] as number[] };
  for (const x of xs) {
    try { out.y.push(f(x)); out.x.push(x); } catch (e) { if (!(e instanceof ComputationError)) throw e; }
  }
  return out;
}

/** Gas charge of a monotube damper: pressure and rod forces at a working temperature and rod position. */
export const gasChargeCalculator = defineCalculator({
  id: 'gas-charge',
  title: 'Gas charge of a damper at temperature',
  summary: 'Gas pressure, rod extension force, gas spring rate and the compression force at which the rebound side cavitates, for a gas-charged damper whose oil heats and expands into the gas space.',
  inputs: [
    { key: 'p0', label: 'Charge pressure p₀ (absolute)', kind: 'pressure', default: 2.5e6, min: STANDARD_ATMOSPHERE, max: 5e7, minExclusive: true, required: true, help: 'Absolute pressure set at charging with the rod fully out. A gauge reading is this less about 1.013 bar.' },
    { key: 'T0', label: 'Charge temperature T₀', kind: 'temperature', default: 293.15, min: 223.15, max: 333.15, help: 'Temperature of gas and oil when the charge was set (the workshop temperature).' },
    { key: 'Vg0', label: 'Gas volume at charging V_g0', kind: 'volume', default: 50e-6, min: 0, max: 0.1, minExclusive: true, required: true, help: 'Gas space behind the floating piston (or in the accumulator) with the rod fully out.' },
    { key: 'Voil', label: 'Oil volume V_oil', kind: 'volume', default: 300e-6, min: 0, max: 1, required: true, help: 'All the oil in the damper: its thermal expansion goes into the gas space.' },
    { key: 'beta', label: 'Oil volumetric expansion β', kind: 'perTemperature', default: 0.7e-3, min: 0, max: 2e-3, help: 'Mineral damper oils 0.65–0.8 × 10⁻³ 1/K; silicone fluids about 0.95 × 10⁻³. Subtract the tube\'s volumetric expansion (3α, steel ≈ 0.036 × 10⁻³ 1/K) for the net value.' },
    { key: 'dRod', label: 'Rod diameter d_rod', kind: 'length', default: 0.014, min: 0, max: 0.2, minExclusive: true, required: true, help: 'The rod displaces its own volume into the gas space as it goes in; the gas pushes on its area.' },
    { key: 'dPiston', label: 'Piston (bore) diameter d_p', kind: 'length', default: 0.046, min: 0, max: 0.5, minExclusive: true, required: true, help: 'Working bore of the pressure tube.' },
    { key: 'T', label: 'Working temperature T (gas and oil)', kind: 'temperature', default: 353.15, min: 203.15, max: 473.15, help: 'From the warm-up or damping-fade page, or a study\'s steady temperature: the gas and oil are taken at the body temperature.' },
    { key: 'x', label: 'Rod insertion x', kind: 'length', default: 0, min: 0, max: 2, help: 'How far the rod has gone in from the fully-out (charging) position; 0 = fully out.' },
    { key: 'n', label: 'Polytropic index n of the stroke', kind: 'dimensionless', default: 1, min: 1, max: 1.67, help: '1 for a slow stroke (the gas keeps the oil temperature); 1.4 for a fast stroke of nitrogen (no time to exchange heat). Between them for real strokes.' },
  ],
  outputs: [
    { key: 'p', label: 'Gas pressure p (absolute)', kind: 'pressure' },
    { key: 'Fext', label: 'Rod extension force F_ext', kind: 'force', help: '(p − p_atm)·A_rod: pushes the rod out; the damper carries it as a spring preload.' },
    { key: 'kg', label: 'Gas spring rate k_g', kind: 'stiffness', help: 'n·p·A_rod²/V_g at this position: adds to the suspension spring.' },
    { key: 'FcMax', label: 'Compression force before the rebound side cavitates', kind: 'force', help: 'p·A_p − p_atm·A_rod: the rod force at which the piston valve has dropped the rebound chamber to zero absolute pressure (vapour pressure and released air neglected, so cavitation starts somewhat below it).' },
    { key: 'FvMax', label: 'Of which the valve (damping) force', kind: 'force', help: 'p·(A_p − A_rod): the most compression damping the piston can make before the rebound side cavitates.' },
    { key: 'dVoil', label: 'Oil expansion ΔV_oil from T₀', kind: 'volume', help: 'V_oil·β·(T − T₀); negative when colder than at charging.' },
    { key: 'Vg', label: 'Gas volume left V_g', kind: 'volume' },
    { key: 'Egas', label: 'Energy stored in the gas', kind: 'energy', help: 'Work of an isentropic expansion to the atmosphere (γ = 1.4): what a rupture or an opened damper releases at once.' },
  ],
  compute(values) {
    const r = charge(values);
    const Ar = (Math.PI * num(values, 'dRod') ** 2) / 4;
    const Ap = (Math.PI * num(values, 'dPiston') ** 2) / 4;
    const Vg0 = num(values, 'Vg0');
    const warnings: string[] = [];
    if (r.Vg < 0.25 * Vg0) warnings.push(`Only ${(100 * r.Vg / Vg0).toFixed(0)} % of the gas space is left: the pressure rises steeply from here, and a little more heat or stroke locks the damper hydraulically. Ask the maker for the gas volume at full bump and the hottest oil.`);
    if (r.p > 2 * num(values, 'p0')) warnings.push(`The gas pressure is ${(r.p / num(values, 'p0')).toFixed(1)} times the charge pressure: check the seals' and tube's pressure rating with the maker.`);
    if (r.p < 5e5) warnings.push('The gas pressure is below 5 bar absolute: a monotube damper may cavitate behind the piston in compression; check FcMax against the compression force.');
    if (num(values, 'T') > ZERO_CELSIUS + 120) warnings.push('Above 120 °C: most damper seals are past their rating; see the thermal-life page.');
    return {
      outputs: {
        p: r.p, Fext: r.Fext, kg: r.kg, FcMax: r.FcMax, FvMax: r.p * (Ap - Ar), dVoil: r.dVoil, Vg: r.Vg,
        Egas: gasStoredEnergy(r.p, r.Vg),
      },
      warnings,
    };
  },
  charts(values): ChartSpec[] {
    const Ts = Array.from({ length: 91 }, (_, i) => CHART_T.min + ((CHART_T.max - CHART_T.min) * i) / 90);
    const byT = curve(Ts, (T) => charge(values, { T }).p);
    const Ar = (Math.PI * num(values, 'dRod') ** 2) / 4;
    const here = charge(values);
    const x0 = num(values, 'x');
    // rod travel from fully out to where 20 % of the gas space at this temperature is left
    const xMax = Math.max(x0, (0.8 * (here.Vg + Ar * x0)) / Ar);
    const xs = Array.from({ length: 81 }, (_, i) => (xMax * i) / 80);
    const byX = curve(xs, (x) => charge(values, { x }).Fext);
    return [
      {
        id: 'pressure-temperature',
        title: 'Gas pressure against temperature (rod at x)',
        x: { label: 'Temperature of gas and oil', kind: 'temperature' },
        y: { label: 'Gas pressure (absolute)', kind: 'pressure', min: 0 },
        series: [
          { label: 'gas pressure', ...byT, tone: 0 },
          { label: 'working point', x: [num(values, 'T')], y: [here.p], style: 'points', tone: 3 },
        ],
        summary: `The gas pressure rises from ${q(byT.y[0] ?? here.p, 'pressure', 3)} at ${q(CHART_T.min, 'temperature', 3)} to ${q(here.p, 'pressure', 3)} at the working ${q(num(values, 'T'), 'temperature', 3)}; the oil's expansion makes it rise faster than the absolute temperature.`,
      },
      {
        id: 'force-stroke',
        title: 'Rod extension force against rod insertion (at T)',
        x: { label: 'Rod insertion', kind: 'length' },
        y: { label: 'Extension force', kind: 'force', min: 0 },
        series: [{ label: `gas force, n = ${num(values, 'n')}`, ...byX, tone: 1 }],
        summary: `At ${q(num(values, 'T'), 'temperature', 3)} the gas pushes the rod out with ${q(byX.y[0] ?? here.Fext, 'force', 3)} fully out and ${q(byX.y[byX.y.length - 1] ?? here.Fext, 'force', 3)} at ${q(byX.x[byX.x.length - 1] ?? x0, 'length', 3)} in.`,
      },
    ];
  },
  verification: [
    {
      name: 'Ø14 mm rod, 2.5 MPa abs at 20 °C, 50 cm³ gas, 300 cm³ oil, β = 0.7e-3 1/K, at 80 °C',
      inputs: { p0: 2.5e6, T0: 293.15, Vg0: 50e-6, Voil: 300e-6, beta: 0.7e-3, dRod: 0.014, dPiston: 0.046, T: 353.15 },
      expected: { p: 4026314.757, Fext: 604.2052, dVoil: 12.6e-6, Vg: 37.4e-6 },
      tolerance: 1e-6,
      why: 'p = p₀(T/T₀)V_g0/(V_g0 − V_oil β ΔT) worked by hand and in float64 (4.03 MPa, 604 N); F = (p − 101325 Pa)·πd²/4',
      source: { key: 'cengel2015', locator: '§3-8 ideal-gas equation of state, P·V = m·R·T (from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'Same damper at −20 °C',
      inputs: { p0: 2.5e6, T0: 293.15, Vg0: 50e-6, Voil: 300e-6, beta: 0.7e-3, dRod: 0.014, dPiston: 0.046, T: 253.15 },
      expected: { p: 1848354.202, Fext: 268.9343, dVoil: -8.4e-6 },
      tolerance: 1e-6,
      why: 'same closed form (1.85 MPa, 269 N), float64',
      source: { key: 'cengel2015', locator: '§3-8 ideal-gas equation of state (from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'Slow 50 mm stroke at the charge temperature: Boyle\'s law and the spring rate',
      inputs: { p0: 2.5e6, T0: 293.15, Vg0: 50e-6, Voil: 300e-6, beta: 0.7e-3, dRod: 0.014, dPiston: 0.046, T: 293.15, x: 0.05, n: 1 },
      expected: { p: 2954866.332, kg: 1655.227, FcMax: 4895.102 },
      tolerance: 1e-6,
      why: 'p = p₀V_g0/(V_g0 − A_rod x), k = p A_rod²/V, F_c = p A_p − p_atm A_rod, float64',
      source: { key: 'cengel2015', locator: '§4-1 polytropic process P·Vⁿ = const, n = 1 (from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'Fast 50 mm stroke (adiabatic nitrogen, n = 1.4)',
      inputs: { p0: 2.5e6, T0: 293.15, Vg0: 50e-6, Voil: 300e-6, beta: 0.7e-3, dRod: 0.014, dPiston: 0.046, T: 293.15, x: 0.05, n: 1.4 },
      expected: { p: 3159198.918, kg: 2477.563 },
      tolerance: 1e-6,
      why: 'p = p₀(V_g0/V_g)^1.4, k = n p A_rod²/V_g, float64',
      source: { key: 'cengel2015', locator: '§4-1 polytropic process, n = k for an isentropic ideal gas (from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'Cavitation force at 80 °C: rebound chamber at zero absolute pressure',
      inputs: { p0: 2.5e6, T0: 293.15, Vg0: 50e-6, Voil: 300e-6, beta: 0.7e-3, dRod: 0.014, dPiston: 0.046, T: 353.15 },
      expected: { FcMax: 6675.745, FvMax: 6071.539 },
      tolerance: 1e-6,
      why: 'force balance on the piston and rod: F_c = p A_p − p_atm A_rod; the valve part p (A_p − A_rod); float64',
      source: { key: 'dixon2007', locator: 'ch. 1, gas-pressurised monotube damper, and the cavitation section of the fluid-dynamics chapter (from memory)' },
      provenance: 'closed form',
    },
  ],
  sources: [
    { key: 'cengel2015', locator: '§3-8 ideal gas, §4-1 polytropic process, §7-9 isentropic ideal gas (from memory)' },
    { key: 'dixon2007', locator: 'gas pressure, rod force and cavitation of monotube dampers (from memory)' },
  ],
  study: {
    inputs: { p0: 'gasChargePressure', T0: 'gasChargeTemperature', Vg0: 'gasVolume', Voil: 'oilVolume', beta: 'oilExpansion', dRod: 'rodDiameter', dPiston: 'pistonDiameter', T: 'steadyTemperature' },
    publishes: { p: 'gasPressure', Fext: 'gasExtensionForce' },
  },
});
