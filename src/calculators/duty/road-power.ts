import {
  comfortReaction, damperAtWheel, damperForceRms, ISO_8608_CLASSES, quarterCarGains, quarterCarOptimalDamping, roadDamperPower,
  roadDisplacementPsd, roadDuty, roadRoughness, WEIGHTING_WK, weightingSquared, type ClassValue, type RoadDamper, type RoadInput,
} from '../../core/duty/index.ts';
import { choice, defineCalculator, num, optNum, type ChartSpec, type Values } from '../types.ts';
import { lawInputs, lawStudy } from '../shared/damperLawInputs.ts';

// road-power's `ks` is the suspension spring (its CLI key since 0.1): the law here takes no series stiffness
const LAW = lawInputs({ kinds: ['linear', 'power'], defaults: { c: 980, Fref: 800, vref: 1, alpha: 0.5 }, limits: { cMin: 10, cMax: 1e6, FrefMin: 1 }, series: false });
import { q as qty } from '../quantityText.ts';
import { ROAD_POWER_CASES } from './road-power.cases.ts';
import { powerAgainstSpeed } from './road-power.speed.ts';

function setup(values: Values) {
  const cls = choice<string>(values, 'roadClass');
  const which = choice<ClassValue>(values, 'classValue');
  const measured = optNum(values, 'Gd0');
  const fromClass = roadRoughness(cls, which);
  const road: RoadInput = { Gd0: measured ?? fromClass.Gd0, w: num(values, 'w'), V: num(values, 'V') };
  const car = { ms: num(values, 'ms'), mu: num(values, 'mu'), ks: num(values, 'ks'), kt: num(values, 'kt') };
  // the law is the damper's own; the quarter car sees it at the wheel through the motion ratio
  const atDamper: RoadDamper = choice(values, 'law') === 'power'
    ? { kind: 'power', C: num(values, 'Fref') / num(values, 'vref') ** num(values, 'alpha'), alpha: num(values, 'alpha') }
    : { kind: 'linear', c: num(values, 'c') };
  const MR = num(values, 'MR');
  const damper = damperAtWheel(atDamper, MR);
  const basis = measured !== undefined ? `measured G_d(n0) = ${measured.toPrecision(4)} m³` : `ISO 8608 class ${cls}, ${which === 'mean' ? 'geometric mean' : `${which} limit`}`;
  return { road, car, damper, atDamper, MR, basis, openLimit: measured === undefined && fromClass.openLimit };
}

const logGrid = (a: number, b: number, n: number) => Array.from({ length: n }, (_, i) => a * (b / a) ** (i / (n - 1)));

/** Random-road duty of one quarter-car corner: RMS damper velocity, mean damper power, ride and road holding. */
export const roadPowerCalculator = defineCalculator({
  id: 'road-power',
  offMainThread: true, // p99 of evaluate + charts over a frame (npm run bench)
  title: 'Damper power on a random road (ISO 8608 quarter car)',
  summary: 'Mean power a suspension damper turns into heat on an ISO 8608 road, with ride (body acceleration, ISO 2631-1 weighted comfort value), suspension travel, dynamic tyre load, the comfort and road-holding optima of the damping and a motion ratio between wheel and damper, in closed form by residues (frequency-domain quadrature where that cancels), checked against the white-road closed forms.',
  inputs: [
    { key: 'roadClass', label: 'ISO 8608 road class', kind: 'choice', options: ISO_8608_CLASSES.map((c) => ({ value: c, label: `Class ${c}` })), default: 'C', help: 'A (very good) to H (very poor). Ignored when a measured G_d(n0) is given.' },
    { key: 'classValue', label: 'Value within the class', kind: 'choice', options: [{ value: 'mean', label: 'geometric mean' }, { value: 'lower', label: 'lower class limit' }, { value: 'upper', label: 'upper class limit' }], default: 'mean', help: 'Each class spans half to twice its geometric mean.' },
    { key: 'Gd0', label: 'Measured G_d(n0) (optional)', kind: 'roadRoughness', default: 256e-6, optional: true, min: 0, max: 1, minExclusive: true, help: 'Displacement PSD at n0 = 0.1 cycle/m from a profile measurement; leave empty to use the class.' },
    { key: 'w', label: 'Waviness w', kind: 'dimensionless', default: 2, min: 1.5, max: 3.5, help: 'Slope of the road PSD; ISO 8608 classes use 2. Closed-form checks apply only at w = 2.' },
    { key: 'V', label: 'Vehicle speed', kind: 'velocity', default: 20, min: 0.1, max: 100, required: true, help: 'Forward speed.' },
    { key: 'ms', label: 'Sprung mass per corner', kind: 'mass', default: 240, min: 1, max: 2e4, required: true, help: 'Body mass carried by this corner.' },
    { key: 'mu', label: 'Unsprung mass', kind: 'mass', default: 36, min: 0.5, max: 5e3, required: true, help: 'Wheel, tyre, hub, brake and part of the links.' },
    { key: 'ks', label: 'Suspension spring rate (at wheel)', kind: 'stiffness', default: 16000, min: 100, max: 5e6, required: true, help: 'Wheel rate of the spring.' },
    { key: 'kt', label: 'Tyre vertical rate', kind: 'stiffness', default: 160000, min: 1000, max: 1e7, required: true, help: 'Radial stiffness of the tyre.' },
    ...LAW,
    { key: 'MR', label: 'Motion ratio MR (damper travel / wheel travel)', kind: 'dimensionless', default: 1, min: 0.2, max: 3, help: 'The damper law above is the damper\'s own; at the wheel it acts as c·MR² (C·MR^(1+α)). 1: damper on the wheel axis. Damper velocity, force and stroke are reported at the damper, ride and road holding at the wheel.' },
  ],
  outputs: [
    { key: 'vRms', label: 'RMS damper velocity', kind: 'velocity', help: 'At the damper: MR × the RMS suspension velocity at the wheel.' },
    { key: 'FRms', label: 'RMS damper force', kind: 'force', help: 'At the damper, for a Gaussian damper velocity.' },
    { key: 'P', label: 'Mean damper power', kind: 'power', help: 'Heat the damper must shed, per corner.',
      feeds: [{ page: 'steady-temperature', input: 'P', label: 'Check damper body temperature' }, { page: 'warm-up', input: 'P', label: 'Warm-up time on this road' }] },
    { key: 'accRms', label: 'RMS body acceleration (ride)', kind: 'acceleration' },
    { key: 'awWk', label: 'Weighted RMS body acceleration a_w (ISO 2631-1, W_k)', kind: 'acceleration', help: 'Vertical body acceleration weighted by W_k, from 0 to ∞ Hz (the standard\'s band 0.5–80 Hz holds nearly all of it). At the body above the wheel, not at a seat.' },
    { key: 'comfort', label: 'Likely reaction (ISO 2631-1 Annex C)', kind: 'text', help: 'Public-transport comfort bands, from memory: below 0.315 m/s² not uncomfortable; 0.315–0.63 a little; 0.5–1 fairly; 0.8–1.6 uncomfortable; 1.25–2.5 very; above 2 extremely uncomfortable.' },
    { key: 'cComfort', label: 'Comfort-optimal damping (at the damper)', kind: 'damping', help: 'Least unweighted body acceleration on a w = 2 road: k_s·√((m_s + m_u)/k_t) at the wheel, ÷ MR² at the damper.' },
    { key: 'cRoadHolding', label: 'Road-holding-optimal damping (at the damper)', kind: 'damping', help: 'Least dynamic tyre load on a w = 2 road, ÷ MR² at the damper. Between the two lies the usual compromise.' },
    { key: 'travelRms', label: 'RMS suspension travel (at the wheel)', kind: 'length' },
    { key: 'strokeRms', label: 'RMS damper stroke', kind: 'length', help: 'MR × the suspension travel.' },
    { key: 'tyreLoadRms', label: 'RMS dynamic tyre load', kind: 'force' },
    { key: 'tyreLoadRatio', label: 'Dynamic / static tyre load', kind: 'fraction', help: 'Road holding: at 1/3 a Gaussian dynamic load exceeds the static load, and the tyre leaves the road, about 0.13 % of the time.' },
    { key: 'Gd0Used', label: 'G_d(n0) used', kind: 'roadRoughness' },
    { key: 'ceq', label: 'Linear (or equivalent) damping, at the damper', kind: 'damping' },
    { key: 'PClosed', label: 'Mean power, closed form (w = 2)', kind: 'power', optional: true, help: 'π²·k_t·G_d(n0)·n0²·V: no damper or mass term.' },
    { key: 'vRmsClosed', label: 'RMS damper velocity, closed form (w = 2)', kind: 'velocity', optional: true },
    { key: 'closedFormDiff', label: 'Integration check: largest difference from the white-road closed forms', kind: 'fraction', digits: 2, help: 'The variances computed as for the results (residues, or quadrature where they fall back), for the same car and damping on a w = 2 road, against the Lyapunov closed forms (for w = 2 these are the results shown).' },
    { key: 'quadError', label: 'Error bound of the variances (relative)', kind: 'fraction', digits: 2, help: 'Largest of the five: rounding and root errors of the closed form by residues, or the quadrature tolerance plus 10 % of its tails where it fell back.' },
    { key: 'band', label: 'Integration method (quadrature band where it falls back)', kind: 'text', help: 'The gains are rational in ω² and the road PSD a power law, so each variance is a Mellin transform summed by residues. Where the partial fractions cancel (damping close to critical in a mode) that variance is integrated by adaptive Simpson on a log grid over the band shown, tails added.' },
    { key: 'roadBasis', label: 'Road input', kind: 'text' },
  ],
  compute(values) {
    const s = setup(values);
    const r = roadDuty(s.car, s.road, s.damper);
    const c = r.closed;
    const diff = r.closedFormDiff;
    const MR = s.MR;
    const vRms = MR * r.vRms;
    const opt = quarterCarOptimalDamping(s.car);
    const warnings: string[] = [];
    if (optNum(values, 'Gd0') !== undefined) warnings.push('A measured G_d(n0) is given, so the road class is not used; leave that field empty to use the class.');
    if (s.openLimit) warnings.push('ISO 8608 leaves this class limit open; the value shown is the factor-2 step from the class mean.');
    if (r.tyreLoadRatio > 1 / 3) warnings.push(`RMS dynamic tyre load is ${(100 * r.tyreLoadRatio).toFixed(0)} % of the static load: the wheel lifts off at times, and the linear model no longer holds.`);
    if (diff > 5e-3) warnings.push(`On this car the integration misses the white-road closed form by ${(100 * diff).toPrecision(2)} %: the inputs are outside what the integration resolves${s.road.w === 2 ? '; use the closed-form values' : ''}.`);
    if (s.road.w !== 2) warnings.push('w ≠ 2: road velocity is not white, so there is no white-road closed form to check against.');
    return {
      outputs: {
        vRms, FRms: damperForceRms(s.atDamper, vRms), P: r.P, accRms: r.accRms, awWk: r.awWk, comfort: comfortReaction(r.awWk),
        cComfort: opt.comfort / (MR * MR), cRoadHolding: opt.roadHolding / (MR * MR),
        travelRms: r.travelRms, strokeRms: MR * r.travelRms, tyreLoadRms: r.tyreLoadRms, tyreLoadRatio: r.tyreLoadRatio,
        Gd0Used: s.road.Gd0, ceq: r.c / (MR * MR), PClosed: c?.P, vRmsClosed: c ? MR * c.vRms : undefined, closedFormDiff: diff, quadError: r.relError,
        band: r.fallbacks === 0 ? 'none: closed form by residues (Mellin transform of the rational gains)' : `${r.band[0].toPrecision(3)}–${r.band[1].toPrecision(3)} Hz for ${r.fallbacks} of 5 variances (residues cancel; quadrature)`,
        roadBasis: s.basis,
      },
      warnings,
    };
  },
  charts(values, result): ChartSpec[] {
    const s = setup(values);
    const q = { ...s.car, c: (result.outputs.ceq as number) * s.MR * s.MR };
    const f = logGrid(0.1, 100, 241);
    const g = f.map((fi) => ({ fi, h: quarterCarGains(q, fi), gz: roadDisplacementPsd(s.road, fi) }));
    // log-spaced speeds around this case's speed, so the marked operating point lies on the chart
    const ps = powerAgainstSpeed(s.car, s.road.w, s.damper, Math.min(2.5, s.road.V), Math.max(40, s.road.V));
    const classes = ps.classes.map((c, i) => ({ label: `class ${c.cls}`, x: ps.speeds, y: c.power, tone: i }));
    const pC = roadDamperPower(s.car, { Gd0: roadRoughness('C', 'mean').Gd0, w: s.road.w, V: 20 }, s.damper, 1e-4, 24);
    return [
      {
        id: 'velocity-psd', title: 'Damper velocity PSD',
        x: { label: 'Frequency', kind: 'frequency', scale: 'log' }, y: { label: 'PSD', kind: 'velocityPsd', scale: 'log' },
        series: [{ label: 'damper velocity', x: f, y: g.map((e) => s.MR * s.MR * e.h.damperVelocity * e.gz), tone: 0 }],
        summary: `Damper velocity PSD from 0.1 to 100 Hz; RMS ${qty(result.outputs.vRms as number, 'velocity', 3)}. Peaks sit at the body and wheel-hop modes.`,
      },
      {
        id: 'acceleration-psd', title: 'Body acceleration PSD',
        x: { label: 'Frequency', kind: 'frequency', scale: 'log' }, y: { label: 'PSD', kind: 'accelerationPsd', scale: 'log' },
        series: [
          { label: 'body acceleration', x: f, y: g.map((e) => e.h.bodyAcceleration * e.gz), tone: 1 },
          { label: 'weighted by W_k (ISO 2631-1)', x: f, y: g.map((e) => weightingSquared(WEIGHTING_WK, e.fi) * e.h.bodyAcceleration * e.gz), tone: 2, style: 'dash' },
        ],
        summary: `Sprung-mass acceleration PSD; RMS ${qty(result.outputs.accRms as number, 'acceleration', 3)}, W_k-weighted ${qty(result.outputs.awWk as number, 'acceleration', 3)} (${String(result.outputs.comfort)}).`,
      },
      {
        id: 'power-speed', title: 'Mean damper power against speed, ISO 8608 classes (geometric means)',
        x: { label: 'Speed', kind: 'velocity', scale: 'log', input: 'V' }, y: { label: 'Mean power', kind: 'power', scale: 'log' },
        series: classes,
        summary: `Mean damper power rises ${s.road.w === 2 ? 'in proportion to speed (exactly, for w = 2)' : s.damper.kind === 'linear' ? `as speed^${(s.road.w - 1).toPrecision(3)} (linear damper, w = ${s.road.w})` : 'with speed'} and by a factor 4 per class; class C at ${qty(20, 'velocity', 3)}: ${qty(pC, 'power', 3)}.`,
      },
    ];
  },
  verification: ROAD_POWER_CASES,
  sources: [
    { key: 'iso2631_1', locator: 'Annex A (W_k, W_d), Table 3, Annex C (from memory)' },
    { key: 'dixon2007', locator: 'motion ratio (from memory)' },
    { key: 'iso8608', locator: '§5 and Table 1 (from memory)' },
    { key: 'zuo2013', locator: 'abstract and quarter-car analysis' },
    { key: 'gobbi2001', locator: 'closed-form variances (from memory)' },
    { key: 'roberts2003', locator: 'ch. 5 (from memory)' },
    { key: 'newland1993', locator: 'ch. 7 (from memory)' },
  ],
  study: {
    inputs: { V: 'vehicleSpeed', ms: 'sprungMass', mu: 'unsprungMass', ks: 'springRate', kt: 'tyreRate', ...lawStudy(LAW), MR: 'motionRatio' },
    publishes: { P: 'meanPower' },
  },
});
