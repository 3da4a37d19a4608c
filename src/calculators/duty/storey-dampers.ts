import { adiabaticRise } from '../../core/duty/index.ts';
import { formatPowerProfile } from '../../core/thermal/index.ts';
import { lawInputs, lawStudy } from '../shared/damperLawInputs.ts';
import { defineCalculator, num, type InputDef } from '../types.ts';
import { analyseStoreys } from './storey-dampers.analysis.ts';
import { storeyCharts } from './storey-dampers.charts.ts';
import { STOREY_CASES } from './storey-dampers.cases.ts';
import { maxOf } from '../../core/numeric/index.ts';

/** TW-402 Hall C office wing (invented demo data): three storeys, bottom first. */
const FRAME_ROWS = 'm [t], k [kN/m], h [m], n, theta [deg]\n140, 120000, 4.5, 4, 35\n140, 100000, 3.8, 4, 40\n100, 70000, 3.8, 2, 40';
const MODE_ROWS = 'm [t], phi, h [m], n, theta [deg]\n140, 0.38, 4.5, 4, 35\n140, 0.75, 3.8, 4, 40\n100, 1, 3.8, 2, 40';
const ROWS_HELP = 'One row per storey, the ground storey first, the roof last. Units in a header line such as "m [t], k [kN/m], h [m], n, theta [deg]"; a column without a unit is SI (kg, N/m, m, rad). Comma, semicolon or tab between columns; # starts a comment.';

// building-scale defaults for every law (the handbook's defaults are vehicle-sized)
const LAW = lawInputs({ defaults: { law: 'power', Fref: 200e3, vref: 1, alpha: 0.4, c: 1.2e6, Ff: 50e3, c1: 2e6, c2: 4e5, c1c: 2e6, c2c: 4e5, vknee: 0.05, eta: 0.3, kh: 5e7 }, series: false });

const INPUTS: InputDef[] = [
  { key: 'frame', label: 'Frame described by', kind: 'choice', default: 'frame', options: [{ value: 'frame', label: 'storey masses and stiffnesses (mode solved)' }, { value: 'mode', label: 'a known mode shape and period' }], help: 'Shear building: floors rigid, storeys carry shear only. Or paste the fundamental mode of your own frame model.' },
  { key: 'storeys', label: 'Storeys: floor mass, storey stiffness, height, dampers, brace angle', kind: 'text', default: FRAME_ROWS, maxLength: 20000, rows: 6, required: true, when: { key: 'frame', is: ['frame'] }, help: `${ROWS_HELP} m is the floor mass above the storey, k the storey's lateral stiffness without dampers, n the dampers acting in this direction.` },
  { key: 'modeRows', label: 'Storeys: floor mass, mode-shape value, height, dampers, brace angle', kind: 'text', default: MODE_ROWS, maxLength: 20000, rows: 6, required: true, when: { key: 'frame', is: ['mode'] }, help: `${ROWS_HELP} phi is the fundamental mode at the floor above the storey (any scale; scaled to 1 at the roof).` },
  { key: 'T', label: 'Period of the mode T₁', kind: 'time', default: 0.47, min: 0, max: 20, minExclusive: true, required: true, when: { key: 'frame', is: ['mode'] }, help: 'Fundamental period of the frame without dampers, from your frame model.' },
  ...LAW,
  { key: 'demand', label: 'Design demand given as', kind: 'choice', default: 'spectral', options: [{ value: 'spectral', label: 'spectral displacement S_d (5 % damped)' }, { value: 'roof5', label: 'roof displacement of a 5 %-damped analysis' }, { value: 'amplitude', label: 'roof displacement amplitude with the dampers (no reduction)' }], help: 'A 5 %-damped demand is reduced by the damping correction factor η of EN 1998-1 at the damping the dampers add, iterated when that damping depends on the drift (α ≠ 1).' },
  { key: 'Sd', label: 'Spectral displacement S_d(T₁), 5 % damped', kind: 'length', default: 0.03, min: 0, max: 5, minExclusive: true, required: true, when: { key: 'demand', is: ['spectral'] }, help: 'From the design displacement spectrum at the fundamental period; the roof moves Γ₁·S_d.' },
  { key: 'roof5', label: 'Roof displacement, 5 % damped', kind: 'length', default: 0.04, min: 0, max: 10, minExclusive: true, required: true, when: { key: 'demand', is: ['roof5'] }, help: 'Peak roof displacement of the frame without dampers at 5 % damping (response spectrum or time-history analysis).' },
  { key: 'roofAmp', label: 'Roof displacement amplitude', kind: 'length', default: 0.03, min: 0, max: 10, minExclusive: true, required: true, when: { key: 'demand', is: ['amplitude'] }, help: 'The amplitude the dampers work at (e.g. from a nonlinear analysis, or a steady wind-induced sway); used as it is.' },
  { key: 'xi0', label: 'Inherent damping ratio of the frame ξ₀', kind: 'dimensionless', default: 0.05, min: 0, max: 0.3, help: 'Typically 0.02–0.05 for steel frames.' },
  { key: 'cycles', label: 'Cycles per event at that amplitude', kind: 'dimensionless', default: 15, min: 0, max: 1e7, minExclusive: true, help: 'Equivalent full cycles at the design amplitude: about 10–20 for strong shaking; many thousands for a wind storm.' },
  { key: 'Cth', label: 'Heat capacity of one damper', kind: 'heatCapacity', default: 22.9e3, min: 0, max: 1e8, minExclusive: true, help: 'Σ m·c of cylinder, rod, end fittings and fluid (40 kg steel at 460 J/(kg·K) and 3 kg silicone at 1500 J/(kg·K): 22.9 kJ/K).' },
];

/** Fluid viscous (or other) dampers over the storeys of a frame: added damping, demand and duty per damper. */
export const storeyDampersCalculator = defineCalculator({
  id: 'storey-dampers',
  title: 'Dampers over several storeys: added damping, drift and the hottest damper',
  summary: 'Fundamental mode of a shear building (or a given mode), supplemental damping of braced dampers on every storey by the energy method, the roof drift reduced by the EN 1998-1 damping correction factor (iterated for nonlinear dampers), and per damper the stroke, peak force, energy per cycle and heat per event.',
  inputs: INPUTS,
  outputs: [
    { key: 'T1', label: 'Fundamental period T₁', kind: 'time' },
    { key: 'f1', label: 'Fundamental frequency f₁', kind: 'frequency' },
    { key: 'gamma', label: 'Participation factor Γ₁ (roof = 1)', kind: 'dimensionless' },
    { key: 'massFraction', label: 'Effective modal mass / total mass', kind: 'dimensionless', digits: 3 },
    { key: 'u5', label: 'Roof displacement, 5 % damped', kind: 'length', optional: true },
    { key: 'xiD', label: 'Supplemental damping ratio ξ_d', kind: 'dimensionless', digits: 3 },
    { key: 'xiTotal', label: 'Total damping ratio ξ₀ + ξ_d', kind: 'dimensionless', digits: 3 },
    { key: 'eta', label: 'Damping correction factor η (EN 1998-1 eq. 3.6)', kind: 'dimensionless', digits: 3, optional: true },
    { key: 'roof', label: 'Roof displacement amplitude with dampers', kind: 'length' },
    { key: 'driftRatio', label: 'Largest storey drift ratio Δ/h', kind: 'dimensionless', digits: 3 },
    { key: 'Wtotal', label: 'Energy per cycle, all dampers', kind: 'energy' },
    { key: 'hotStorey', label: 'Hottest damper in storey', kind: 'text', help: 'The storey whose dampers dissipate most per cycle (1 = ground storey).' },
    { key: 'hotStroke', label: 'Hottest damper: stroke amplitude', kind: 'length' },
    { key: 'hotVelocity', label: 'Hottest damper: peak velocity', kind: 'velocity' },
    { key: 'hotForce', label: 'Hottest damper: peak force', kind: 'force' },
    { key: 'hotW', label: 'Hottest damper: energy per cycle', kind: 'energy' },
    { key: 'hotP', label: 'Hottest damper: mean power while oscillating', kind: 'power',
      feeds: [
        { page: 'warm-up', input: 'P', label: 'Hottest damper’s temperature over the event', with: { profile: 'profile', Cth: 'Cth' }, set: { power: 'profile', after: 'off' } },
        { page: 'steady-temperature', input: 'P', label: 'Steady temperature (long wind event)' },
      ] },
    { key: 'hotE', label: 'Hottest damper: heat per event', kind: 'energy' },
    { key: 'hotDT', label: 'Hottest damper: adiabatic temperature rise per event', kind: 'temperatureDifference' },
    { key: 'duration', label: 'Duration of the event at T₁', kind: 'time' },
  ],
  handoffs: [{ key: 'profile', help: 'The event as a power profile for the warm-up page: the hottest damper’s mean power for cycles × T₁, then off.', maxLength: 200 }],
  compute(values) {
    const a = analyseStoreys(values);
    const hot = a.duty.storeys[a.hot]!;
    const duration = num(values, 'cycles') * a.T;
    const hotE = hot.W * num(values, 'cycles');
    const hotDT = adiabaticRise(hotE, num(values, 'Cth'));
    const driftRatio = maxOf(a.duty.storeys.map((s, j) => s.drift / a.rows[j]!.h));
    const warnings: string[] = [];
    if (a.eta !== undefined && a.eta <= 0.55 + 1e-12) warnings.push('η is at its floor of 0.55 (total damping above about 28 %): EN 1998-1 credits no more reduction; use a nonlinear analysis.');
    if (a.duty.xiD > 0.3) warnings.push('Supplemental damping above 30 %: the codes limit how much of it the linear procedures may credit; use a nonlinear analysis.');
    if (a.phi.some((p) => p <= 0)) warnings.push('The mode shape is zero or changes sign below the roof: a fundamental mode does not; check that the pasted shape is the first mode.');
    if (a.modal.massFraction < 0.7) warnings.push(`The fundamental mode carries only ${(100 * a.modal.massFraction).toFixed(0)} % of the mass: higher modes matter and the single-mode energy method understates the damper duty.`);
    if (driftRatio > 0.02) warnings.push(`Storey drift ratio ${(100 * driftRatio).toFixed(1)} %: beyond about 2 % a steel frame may yield and its elastic mode no longer holds.`);
    if (hotDT > 50) warnings.push(`Adiabatic rise ${hotDT.toFixed(0)} K per event in the hottest damper: check the fluid, seals and the damper's rated temperature with its maker.`);
    return {
      outputs: {
        T1: a.T, f1: 1 / a.T, gamma: a.modal.gamma, massFraction: a.modal.massFraction, u5: a.u5,
        xiD: a.duty.xiD, xiTotal: a.xiTotal, eta: a.eta, roof: a.roof, driftRatio, Wtotal: a.duty.Wtotal,
        hotStorey: `${a.hot + 1} of ${a.rows.length}`, hotStroke: hot.stroke, hotVelocity: hot.vPeak, hotForce: hot.Fpeak,
        hotW: hot.W, hotP: hot.W / a.T, hotE, hotDT, duration,
      },
      warnings,
      handoff: { profile: formatPowerProfile({ t: [0, duration], P: [hot.W / a.T] }) },
    };
  },
  charts: (values) => storeyCharts(analyseStoreys(values), num(values, 'cycles')),
  verification: STOREY_CASES,
  sources: [
    { key: 'chopra2017', locator: '§10.2–10.4 and Example 10.4 (shear building modes; from memory)' },
    { key: 'fema356', locator: '§9.3.4 energy method, eqs. 9-36/9-39 (equation numbers from memory)' },
    { key: 'asce41_17', locator: '§14.3 energy dissipation systems (from memory)' },
    { key: 'fema274', locator: '§9.3 λ(α) (from memory)' },
    { key: 'en1998_1', locator: '§3.2.2.2, eq. (3.6) damping correction factor (published)' },
  ],
  study: {
    inputs: { Cth: 'heatCapacity', ...lawStudy(LAW) },
    publishes: { hotP: 'meanPower', hotW: 'cycleEnergy', hotStroke: 'strokeAmplitude', f1: 'strokeFrequency' },
  },
});
