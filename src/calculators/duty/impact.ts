import { InputRangeError } from '../../core/errors.ts';
import { impactEnergy, linearStop, STANDARD_GRAVITY } from '../../core/duty/index.ts';
import { choice, defineCalculator, num, type ChartSpec, type Values } from '../types.ts';
import { q } from '../quantityText.ts';

function setup(values: Values) {
  const i = { m: num(values, 'm'), v: num(values, 'v'), Fp: num(values, 'Fp'), s: num(values, 's'), cph: num(values, 'cph'), vertical: choice(values, 'vertical') === '1' };
  const F0 = i.Fp + (i.vertical ? i.m * STANDARD_GRAVITY : 0);
  const ratio = num(values, 'vEndRatio');
  if (ratio === 0 && F0 > 0) throw new InputRangeError('vEndRatio', 0, { min: 0, max: 0.9, minExclusive: true }, '', 'a mass that is pushed on (drive force or gravity) is never stopped by a dashpot alone');
  return { i, F0, vEnd: ratio * i.v };
}

/** End-stop impacts: energy per stroke and per hour, mean power, ideal and linear-dashpot stop forces. */
export const impact = defineCalculator({
  id: 'impact',
  title: 'End-stop impacts: energy, mean power and stop force',
  summary: 'Energy an end-stop damper absorbs per stroke (kinetic + propelling work + gravity work), its mean power at a given rate, and the force and deceleration of an ideal stop and of a linear dashpot.',
  inputs: [
    { key: 'm', label: 'Moving mass', kind: 'mass', default: 12, min: 0, max: 1e6, minExclusive: true, required: true, help: 'Everything that moves with the carriage, including the payload.' },
    { key: 'v', label: 'Impact speed', kind: 'velocity', default: 1.5, min: 0, max: 20, minExclusive: true, required: true, help: 'Speed when the mass meets the stop.' },
    { key: 'Fp', label: 'Propelling force', kind: 'force', default: 60, min: 0, max: 1e7, required: true, help: 'Cylinder or drive force that keeps pushing through the stroke (0 if the drive is off).' },
    { key: 's', label: 'Stop stroke', kind: 'length', default: 0.025, min: 0, max: 2, minExclusive: true, required: true, help: 'Working stroke of the end-stop damper.' },
    { key: 'cph', label: 'Impact rate', kind: 'eventRate', default: 1200, min: 0, max: 1e6, required: true, help: 'Strokes of this stop per hour (cycles per hour).' },
    // option values stay '0'/'1' so the CLI contract `--in vertical=1` is unchanged
    { key: 'vertical', label: 'Direction of travel', kind: 'choice', options: [{ value: '0', label: 'Horizontal' }, { value: '1', label: 'Vertical, moving down onto the stop' }], default: '0', help: 'Vertical travel downward lets gravity work through the stroke.' },
    { key: 'vEndRatio', label: 'Residual speed at end of stroke / impact speed (dashpot)', kind: 'dimensionless', default: 0.05, min: 0, max: 0.9, help: 'A dashpot cannot stop a mass that is pushed on; the linear stop is sized to leave this fraction of the impact speed for the hard stop (0 only without drive force or gravity).' },
  ],
  outputs: [
    { key: 'E', label: 'Energy per stroke', kind: 'energy' },
    { key: 'Ehour', label: 'Energy per hour', kind: 'energy' },
    { key: 'P', label: 'Mean power', kind: 'power', help: 'Heat the stop must shed at this impact rate.',
      feeds: [{ page: 'steady-temperature', input: 'P', label: 'Check damper body temperature' }, { page: 'warm-up', input: 'P', label: 'Warm-up at this impact rate' }] },
    { key: 'Favg', label: 'Ideal stop force (constant over stroke)', kind: 'force' },
    { key: 'decel', label: 'Deceleration, ideal stop', kind: 'acceleration', help: 'v²/(2s): the mass decelerates uniformly.' },
    { key: 'decelG', label: 'Deceleration, ideal stop (in g)', kind: 'dimensionless', digits: 3 },
    { key: 'Ekinetic', label: 'Kinetic energy ½mv²', kind: 'energy' },
    { key: 'Epropel', label: 'Propelling work F_p·s', kind: 'energy' },
    { key: 'Egravity', label: 'Gravity work m·g·s', kind: 'energy' },
    { key: 'cLinear', label: 'Dashpot coefficient for this stroke', kind: 'damping' },
    { key: 'FpeakLinear', label: 'Dashpot peak force', kind: 'force' },
    { key: 'decelPeakLinear', label: 'Dashpot peak deceleration', kind: 'acceleration' },
    { key: 'EresidualLinear', label: 'Energy left for the hard stop (dashpot)', kind: 'energy' },
    { key: 'efficiencyLinear', label: 'Dashpot efficiency E/(F_peak·s)', kind: 'dimensionless', digits: 3, help: '1 for an ideal stop; about 0.5 for a pure dashpot.' },
  ],
  compute(values) {
    const { i, F0, vEnd } = setup(values);
    const r = impactEnergy(i);
    const lin = linearStop(i.m, i.v, F0, i.s, vEnd);
    const warnings: string[] = [];
    if (lin.Eresidual > 0.05 * r.E) warnings.push(`The dashpot leaves ${(100 * lin.Eresidual / r.E).toFixed(0)} % of the energy for the hard stop: lower the residual speed or lengthen the stroke.`);
    if (r.decel > 30 * STANDARD_GRAVITY) warnings.push('Deceleration above 30 g: check the payload and the mounting.');
    return {
      outputs: {
        E: r.E, Ehour: r.Ehour, P: r.P, Favg: r.Favg, decel: r.decel, decelG: r.decel / STANDARD_GRAVITY,
        Ekinetic: r.kinetic, Epropel: r.propelling, Egravity: r.gravity,
        cLinear: lin.c, FpeakLinear: lin.Fpeak, decelPeakLinear: lin.decelPeak, EresidualLinear: lin.Eresidual,
        efficiencyLinear: lin.Edamper / (lin.Fpeak * i.s),
      },
      warnings,
    };
  },
  charts(values, result): ChartSpec[] {
    const { i, F0, vEnd } = setup(values);
    const lin = linearStop(i.m, i.v, F0, i.s, vEnd);
    const t = Array.from({ length: 121 }, (_, k) => (lin.duration * k) / 120);
    const v = t.map(lin.velocity);
    const Favg = result.outputs.Favg as number;
    return [{
      id: 'stop-force', title: 'Stop force during one impact',
      x: { label: 'Time', kind: 'time' }, y: { label: 'Force', kind: 'force' },
      series: [
        { label: 'linear dashpot c·v', x: t, y: v.map((vi) => lin.c * vi), tone: 0 },
        { label: 'ideal constant-force stop', x: [0, (2 * i.s) / i.v], y: [Favg, Favg], style: 'dash', tone: 1 },
      ],
      summary: `The dashpot peaks at ${q(lin.Fpeak, 'force', 3)} on contact and falls as the mass slows; an ideal stop holds ${q(Favg, 'force', 3)} for ${((2 * i.s) / i.v * 1000).toPrecision(3)} ms.`,
    }];
  },
  verification: [
    {
      name: 'Horizontal carriage, no drive force: E = ½mv², F = E/s, a = v²/2s (TW-118 carriage, 12 kg at 1.5 m/s, 25 mm)',
      inputs: { m: 12, v: 1.5, Fp: 0, s: 0.025, cph: 1200, vertical: 0, vEndRatio: 0 },
      expected: { E: 13.5, Ehour: 16200, P: 4.5, Favg: 540, decel: 45, FpeakLinear: 1080, efficiencyLinear: 0.5 },
      tolerance: 1e-9, why: 'closed form, same arithmetic',
      source: { key: 'meriam2012', locator: '§3/6 work–energy; §3/5 velocity-proportional resistance (sections from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'Vertical drop onto the stop: gravity adds m·g·s (100 kg at 1 m/s over 50 mm)',
      inputs: { m: 100, v: 1, Fp: 0, s: 0.05, cph: 60, vertical: 1, vEndRatio: 0.05 },
      expected: { E: 50 + 100 * 9.80665 * 0.05, Egravity: 49.033250, decel: 10 },
      tolerance: 1e-9, why: 'closed form with standard gravity 9.80665 m/s² (exact by definition)',
      source: { key: 'meriam2012', locator: '§3/6 work–energy principle (section from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'Cylinder pushing through the stroke: 60 N over 25 mm adds 1.5 J (TW-118 Packline 4)',
      inputs: { m: 12, v: 1.5, Fp: 60, s: 0.025, cph: 1200, vertical: 0, vEndRatio: 0.05 },
      expected: { E: 15, Ehour: 18000, P: 5, Favg: 600 },
      tolerance: 1e-9, why: 'closed form, same arithmetic',
      source: { key: 'meriam2012', locator: '§3/6 work–energy principle (section from memory)' },
      provenance: 'closed form',
    },
  ],
  sources: [
    { key: 'meriam2012', locator: '§3/5–3/6 (from memory)' },
  ],
  study: {
    inputs: { m: 'movingMass', v: 'impactSpeed', s: 'stopStroke' },
    publishes: { P: 'meanPower' },
  },
});
