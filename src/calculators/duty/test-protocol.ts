import { parseProtocol, protocolHeating, type ProtocolRun } from '../../core/duty/index.ts';
import { oncePerValues } from '../memoLast.ts';
import { ZERO_CELSIUS } from '../../core/constants.ts';
import { defineCalculator, num, text, type ChartSpec, type Values } from '../types.ts';
import { describeLaw, lawFromValues, lawInputs, lawStudy } from '../shared/damperLawInputs.ts';
import { FLUID_SOURCES, spanWarning } from '../shared/fluidInputs.ts';
import { q } from '../quantityText.ts';
import { ratioOf, TEMP_LAW_STUDY, tempLawFrom, tempLawInputs } from '../shared/tempLawInputs.ts';

/** TW-402 Hall C: the wind prototype test of a mezzanine damper (invented demo protocol). */
const DEMO_PROTOCOL = '# TW-402 Hall C damper, wind prototype test\n# N, X, f, rest: cycles, stroke amplitude, frequency, rest after the block\nN, X [mm], f [Hz], rest [s]\n5, 11.5, 2, 600\n2000, 3, 2, 600\n5, 11.5, 2, 0';

const LAW = lawInputs({ defaults: { law: 'power', Fref: 200e3, vref: 1, alpha: 0.4, c: 1e6 }, series: false });

type Run = { run: ProtocolRun; law: ReturnType<typeof lawFromValues>; temp: ReturnType<typeof tempLawFrom> };
// compute and charts(values, result) see the same values object: analysed once
const analyse = oncePerValues((values: Values): Run => {
  const blocks = parseProtocol(text(values, 'protocol'), 'protocol');
  const law = lawFromValues(values);
  const temp = tempLawFrom(values);
  const run = protocolHeating(blocks, law, { Cth: num(values, 'Cth'), UA: num(values, 'UA'), Tamb: num(values, 'Tamb') }, temp ? ratioOf(temp.model) : undefined);
  const out = { run, law, temp };
  return out;
});

/** Damper temperature and energy per cycle through a cyclic test protocol. */
export const testProtocolCalculator = defineCalculator({
  id: 'test-protocol',
  title: 'Damper heating through a cyclic test protocol',
  summary: 'Temperature of a damper through a protocol of blocks of sinusoidal cycles and rests, with the energy of each cycle recomputed as the damper heats (optional fade law), and a verdict on the change of energy per cycle against a stated limit.',
  inputs: [
    { key: 'protocol', label: 'Protocol rows (N, X, f, rest)', kind: 'text', default: DEMO_PROTOCOL, maxLength: 8000, rows: 7, help: 'One row per block: number of cycles N, stroke amplitude X (half of peak-to-peak), frequency f, rest after the block. Units in a header line ("N, X [mm], f [Hz], rest [s]"); without a header X is in m, f in Hz, rest in s. # starts a comment. At most 200 rows and 10⁶ cycles.' },
    ...LAW,
    ...tempLawInputs('Recomputes each cycle\'s energy at the damper temperature: c(T)/c(T_ref) of the fade law. The damper law above then holds at T_ref.'),
    { key: 'Cth', label: 'Heat capacity of the damper C', kind: 'heatCapacity', default: 22.9e3, min: 0, max: 1e9, minExclusive: true, required: true, help: 'Σ m·c of cylinder, rod, fittings and fluid (the structural-dampers page reports it).' },
    { key: 'UA', label: 'Heat-loss conductance UA', kind: 'thermalConductance', default: 5, min: 0, max: 1e5, help: '(h_conv + h_r)·A of the body in the test rig (body-cooling page); 0 = adiabatic, the upper bound.' },
    { key: 'Tamb', label: 'Air and start temperature T_amb', kind: 'temperature', default: 293.15, min: 223.15, max: 333.15, help: 'The damper starts at the air temperature.' },
    { key: 'limit', label: 'Allowed change of energy per cycle', kind: 'fraction', default: 0.15, min: 0, max: 1, minExclusive: true, help: 'Largest change of a cycle\'s energy from its value at the start temperature the test allows (±15 % is a common acceptance limit; take the governing one from the test specification).' },
  ],
  outputs: [
    { key: 'verdict', label: 'Change of energy per cycle against the limit', kind: 'text' },
    { key: 'Efirst', label: 'Energy of the first cycle', kind: 'energy' },
    { key: 'Elast', label: 'Energy of the last cycle', kind: 'energy' },
    { key: 'Eratio', label: 'Last to first cycle energy', kind: 'dimensionless' },
    { key: 'change', label: 'Largest change of energy per cycle from heating', kind: 'dimensionless', help: 'max |c(T)/c(T_amb) − 1| over all cycles: the same cycle run cold and hot.' },
    { key: 'dTpeak', label: 'Peak temperature rise', kind: 'temperatureDifference' },
    { key: 'Tpeak', label: 'Peak damper temperature', kind: 'temperature' },
    { key: 'Tend', label: 'Temperature at the end of the protocol', kind: 'temperature' },
    { key: 'energy', label: 'Energy dissipated in the protocol', kind: 'energy' },
    { key: 'cycles', label: 'Cycles in the protocol', kind: 'dimensionless', digits: 7 },
    { key: 'duration', label: 'Length of the protocol with rests', kind: 'time' },
  ],
  compute(values) {
    const { run, temp } = analyse(values);
    const limit = num(values, 'limit');
    const warnings: string[] = [];
    if (temp) {
      for (const w of [spanWarning(temp.fluid, run.Tpeak, 'peak temperature'), spanWarning(temp.fluid, num(values, 'Tamb'), 'start temperature')]) if (w) warnings.push(w);
    } else warnings.push('No temperature law: the energy per cycle does not change; choose the fade law to see the heating effect.');
    if (run.Tpeak > ZERO_CELSIUS + 70) warnings.push(`The damper reaches ${(run.Tpeak - ZERO_CELSIUS).toFixed(0)} °C: check the seals and fluid rating with the maker, and rests in the protocol.`);
    return {
      outputs: {
        verdict: run.maxChange <= limit ? 'within the limit' : 'exceeds the limit',
        Efirst: run.Efirst, Elast: run.Elast, Eratio: run.Elast / run.Efirst, change: run.maxChange,
        dTpeak: run.Tpeak - num(values, 'Tamb'), Tpeak: run.Tpeak, Tend: run.Tend, energy: run.energy,
        cycles: run.cycles, duration: run.duration,
      },
      warnings,
    };
  },
  charts(values, result): ChartSpec[] {
    const { run, law } = analyse(values);
    const { t, T, E } = run.trace;
    return [
      {
        id: 'temperature', title: 'Damper temperature through the protocol',
        x: { label: 'Time', kind: 'time' }, y: { label: 'Damper temperature', kind: 'temperature' },
        series: [{ label: 'lumped body', x: t, y: T, tone: 0 }],
        summary: `The damper warms from ${q(num(values, 'Tamb'), 'temperature', 3)} to a peak of ${q(run.Tpeak, 'temperature')} and ends at ${q(run.Tend, 'temperature')} after ${q(run.duration, 'time', 3)}.`,
      },
      {
        id: 'energy', title: 'Energy per cycle through the protocol',
        x: { label: 'Time', kind: 'time' }, y: { label: 'Energy per cycle', kind: 'energy', min: 0 },
        series: [{ label: describeLaw(law), x: t, y: E, style: 'points', tone: 3 }],
        summary: `First cycle ${q(run.Efirst, 'energy')}, last ${q(run.Elast, 'energy')}; heating changes a cycle's energy by at most ${(100 * (result.outputs.change as number)).toPrecision(3)} %.`,
      },
    ];
  },
  verification: [
    {
      name: 'Linear 1 MN·s/m, 2000 cycles of 10 mm at 0.25 Hz, C = 122 kJ/K, no loss, no fade: 493.5 J per cycle, 8.09 K',
      inputs: { protocol: '2000, 0.01, 0.25, 0', law: 'linear', c: 1e6, Cth: 122e3, UA: 0, Tamb: 293.15 },
      expected: { Efirst: 493.480, Elast: 493.480, dTpeak: 8.08984, energy: 986960 },
      tolerance: 1e-5, why: 'E = πcωX² and ΔT = N·E/C worked to 6 s.f.',
      source: { key: 'chopra2017', locator: 'eq. 3.8.1, energy dissipated per cycle by viscous damping' },
      provenance: 'published',
    },
    {
      name: 'Same test with UA = 5 W/K: ΔT(8000 s) = (P/UA)(1 − e^(−t/τ)) = 6.898 K, τ = C/UA = 24 400 s',
      inputs: { protocol: '2000, 0.01, 0.25, 0', law: 'linear', c: 1e6, Cth: 122e3, UA: 5, Tamb: 293.15 },
      expected: { dTpeak: 24.6740 * -Math.expm1(-8000 / 24400), Tend: 293.15 + 24.6740 * -Math.expm1(-8000 / 24400) },
      tolerance: 1e-5, why: 'closed-form lumped warm-up at constant power P = E·f = 123.37 W',
      source: { key: 'incropera2007', locator: '§5.3, eq. 5.6 lumped capacitance with a heat source (from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'Rest of one time constant after the adiabatic case: the rise falls to 1/e, 8.0898·e^(−1) = 2.9761 K',
      inputs: { protocol: '2000, 0.01, 0.25, 0\n1, 1e-9, 1000, 24400', law: 'linear', c: 1e6, Cth: 122e3, UA: 5, Tamb: 293.15 },
      expected: { Tend: 293.15 + 24.6740 * -Math.expm1(-8000 / 24400) * Math.exp(-24400 / 24400 - 0.001 / 24400) },
      tolerance: 1e-5, why: 'closed form: exponential cooling of a lumped body (the 1 ms cycle adds nothing measurable)',
      source: { key: 'incropera2007', locator: '§5.3, eq. 5.6 (from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'Power law α = 0.4, C = 200 kN·(s/m)^0.4, 3 mm at 2 Hz: E = λ(α)·C·ω^α·X^(1+α) per cycle with λ(0.4) = 4·2^α·Γ²(1+α/2)/Γ(2+α) = 3.58209',
      inputs: { protocol: '1, 0.003, 2, 0', law: 'power', Fref: 200e3, vref: 1, alpha: 0.4, Cth: 22.9e3, UA: 0, Tamb: 293.15 },
      expected: { Efirst: 579.188, dTpeak: 579.188 / 22.9e3 },
      tolerance: 1e-5, why: 'λ(0.4) from Γ(1.2) = 0.918169 and Γ(2.4) = 1.242169, worked to 6 s.f.',
      source: { key: 'fema274', locator: '§9.3 fluid viscous devices, λ(α) (from memory)' },
      provenance: 'from memory',
    },
  ],
  sources: [
    { key: 'chopra2017', locator: 'eq. 3.8.1 (energy per cycle)' },
    { key: 'incropera2007', locator: '§5.3 lumped capacitance (from memory)' },
    { key: 'asce7_16', locator: '§18.6.2 prototype tests, wind cycles (from memory)' },
    { key: 'fema274', locator: '§9.3 λ(α) (from memory)' },
    ...FLUID_SOURCES,
  ],
  study: {
    inputs: { Cth: 'heatCapacity', UA: 'conductance', Tamb: 'airTemperature', ...TEMP_LAW_STUDY, ...lawStudy(LAW) },
  },
});
