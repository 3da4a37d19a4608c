import { InputRangeError } from '../../core/errors.ts';
import { deratedEnergyPerHour, equivalentImpact, linearStop, resetShare, stopEnergy, STANDARD_GRAVITY, type ImpactLoad } from '../../core/duty/index.ts';
import { choice, defineCalculator, num, optNum, type ChartSpec, type Values } from '../types.ts';
import { q } from '../quantityText.ts';
import { IMPACT_CASES } from './impact.cases.ts';

const CASES = ['linear', 'rotary', 'freefall', 'incline', 'conveyor'] as const;
type LoadCase = (typeof CASES)[number];
const MASS_CASES: LoadCase[] = ['linear', 'freefall', 'incline', 'conveyor'];

/** The load case as the core's ImpactLoad (inactive inputs are not read). */
function loadOf(values: Values): ImpactLoad {
  const kind = choice<LoadCase>(values, 'loadCase');
  switch (kind) {
    case 'rotary': return { kind, I: num(values, 'I'), omega: num(values, 'omega'), R: num(values, 'R'), M: num(values, 'M') };
    case 'freefall': return { kind, m: num(values, 'm'), h: num(values, 'h') };
    case 'incline': return { kind, m: num(values, 'm'), v: num(values, 'v'), theta: num(values, 'theta'), Fp: num(values, 'Fp') };
    case 'conveyor': return { kind, m: num(values, 'm'), v: num(values, 'v'), mu: num(values, 'friction') };
    default: return { kind: 'linear', m: num(values, 'm'), v: num(values, 'v'), Fp: num(values, 'Fp'), vertical: choice(values, 'vertical') === '1' };
  }
}

/** One stop's share of the load as a straight-line impact: mass, speed, force pushing on. */
function setup(values: Values) {
  const eq = equivalentImpact(loadOf(values));
  const n = num(values, 'n');
  const s = num(values, 's');
  const F0 = (eq.Fdrive + eq.Fgravity) / n;
  const ratio = num(values, 'vEndRatio');
  if (ratio === 0 && F0 > 0) throw new InputRangeError('vEndRatio', 0, { min: 0, max: 0.9, minExclusive: true }, '', 'a mass that is pushed on (drive force or gravity) is never stopped by a dashpot alone');
  return { eq, n, s, m: eq.m / n, F0, vEnd: ratio * eq.v };
}

const onCase = (...is: LoadCase[]) => ({ when: { key: 'loadCase', is } });

/** End-stop impacts: energy per stroke and per hour, mean power, ideal and linear-dashpot stop forces. */
export const impactCalculator = defineCalculator({
  id: 'impact',
  title: 'End-stop impacts: energy, mean power and stop force',
  summary: 'Energy an end-stop damper absorbs per stroke for a carriage, a swinging arm or turntable, a free fall, a slope or a conveyor, shared by one or more stops: effective mass, mean power, energy per hour against the body rating derated for the ambient, reset time, and the force of an ideal stop and of a linear dashpot.',
  inputs: [
    { key: 'loadCase', label: 'How the load meets the stop', kind: 'choice', default: 'linear', help: 'Each case is reduced to a straight-line impact at the stop: the inertia mass there, the contact speed and the force that keeps pushing through the stroke.',
      options: [
        { value: 'linear', label: 'Carriage on a straight track (drive force)' },
        { value: 'rotary', label: 'Swinging arm or turntable (inertia, drive torque)' },
        { value: 'freefall', label: 'Free fall onto the stop' },
        { value: 'incline', label: 'Moving down a slope (drive force)' },
        { value: 'conveyor', label: 'Carried on a moving conveyor (belt friction)' },
      ] },
    { key: 'm', label: 'Moving mass', kind: 'mass', default: 12, min: 0, max: 1e6, minExclusive: true, required: true, ...onCase(...MASS_CASES), help: 'Everything that moves with the load, including the payload.' },
    { key: 'v', label: 'Impact speed', kind: 'velocity', default: 1.5, min: 0, max: 20, minExclusive: true, required: true, ...onCase('linear', 'incline', 'conveyor'), help: 'Speed when the mass meets the stop (on a conveyor: the belt speed).' },
    { key: 'Fp', label: 'Propelling force', kind: 'force', default: 60, min: 0, max: 1e7, required: true, ...onCase('linear', 'incline'), help: 'Cylinder or drive force that keeps pushing through the stroke (0 if the drive is off).' },
    // option values stay '0'/'1' so the CLI contract `--in vertical=1` is unchanged
    { key: 'vertical', label: 'Direction of travel', kind: 'choice', options: [{ value: '0', label: 'Horizontal' }, { value: '1', label: 'Vertical, moving down onto the stop' }], default: '0', ...onCase('linear'), help: 'Vertical travel downward lets gravity work through the stroke.' },
    { key: 'I', label: 'Moment of inertia about the pivot', kind: 'momentOfInertia', default: 5, min: 0, max: 1e7, minExclusive: true, required: true, ...onCase('rotary'), help: 'Arm, table and payload about the axis of rotation (a payload of mass m at radius r adds m·r²).' },
    { key: 'omega', label: 'Angular speed at impact', kind: 'angularFrequency', default: 2, min: 0, max: 500, minExclusive: true, required: true, ...onCase('rotary'), help: 'Rotation speed when the arm meets the stop.' },
    { key: 'R', label: 'Radius of the stop from the pivot', kind: 'length', default: 0.5, min: 0, max: 50, minExclusive: true, required: true, ...onCase('rotary'), help: 'Where the arm meets the stop: the impact speed there is ω·R.' },
    { key: 'M', label: 'Drive torque', kind: 'torque', default: 20, min: 0, max: 1e8, ...onCase('rotary'), help: 'Torque that keeps driving the arm through the stroke (0 if the drive is off).' },
    { key: 'h', label: 'Drop height', kind: 'length', default: 0.2, min: 0, max: 100, minExclusive: true, required: true, ...onCase('freefall'), help: 'Free fall before contact (air drag neglected): v = √(2gh).' },
    { key: 'theta', label: 'Slope angle', kind: 'angle', default: Math.PI / 6, min: 0, max: Math.PI / 2, ...onCase('incline'), help: 'Angle of the track from horizontal; the weight component m·g·sin θ pushes on through the stroke.' },
    { key: 'friction', label: 'Friction coefficient, load on belt', kind: 'dimensionless', default: 0.3, min: 0, max: 2, ...onCase('conveyor'), help: 'The belt slips under the stopped load and drags it on with μ·m·g through the stroke.' },
    { key: 'n', label: 'Stops sharing the load', kind: 'dimensionless', default: 1, min: 1, max: 1000, help: 'Stops that meet the load together and share it equally (whole number).' },
    { key: 's', label: 'Stop stroke', kind: 'length', default: 0.025, min: 0, max: 2, minExclusive: true, required: true, help: 'Working stroke of the end-stop damper.' },
    { key: 'cph', label: 'Impact rate', kind: 'eventRate', default: 1200, min: 0, max: 1e6, required: true, help: 'Strokes of this stop per hour (cycles per hour).' },
    { key: 'vEndRatio', label: 'Residual speed at end of stroke / impact speed (dashpot)', kind: 'fraction', default: 0.05, min: 0, max: 0.9, help: 'A dashpot cannot stop a mass that is pushed on; the linear stop is sized to leave this fraction of the impact speed for the hard stop (0 only without drive force or gravity).' },
    { key: 'EhRated', label: 'Rated energy per hour of the stop body (optional)', kind: 'energy', default: 100e3, optional: true, min: 0, max: 1e10, minExclusive: true, help: 'The stop maker\'s energy-per-hour rating at its rating ambient; leave empty to skip the heat check.' },
    { key: 'Trated', label: 'Ambient of that rating', kind: 'temperature', default: 293.15, min: 223.15, max: 373.15, help: 'Air temperature at which the energy-per-hour rating holds (often room temperature).' },
    { key: 'Tamb', label: 'Ambient at the machine', kind: 'temperature', default: 293.15, min: 223.15, max: 423.15, help: 'Air temperature around the stop in service (inside a hot machine, near an oven).' },
    { key: 'Tmax', label: 'Body temperature limit of the stop', kind: 'temperature', default: 353.15, min: 273.15, max: 473.15, help: 'Highest body temperature the stop is rated for (seals and oil).' },
    { key: 'tReturn', label: 'Return (reset) time of the stop (optional)', kind: 'time', default: 0.3, optional: true, min: 0, max: 3600, help: 'Time the rod needs to come fully out again after an impact (data sheet); leave empty to skip the check.' },
  ],
  outputs: [
    { key: 'E', label: 'Energy per stroke (per stop)', kind: 'energy' },
    { key: 'Ehour', label: 'Energy per hour (per stop)', kind: 'energy' },
    { key: 'P', label: 'Mean power (per stop)', kind: 'power', help: 'Heat the stop must shed at this impact rate.',
      feeds: [{ page: 'steady-temperature', input: 'P', label: 'Check damper body temperature' }, { page: 'warm-up', input: 'P', label: 'Warm-up at this impact rate' }] },
    { key: 'vImpact', label: 'Impact speed at the stop', kind: 'velocity', help: 'v as given; ω·R for a rotary load; √(2gh) after a free fall.' },
    { key: 'me', label: 'Effective mass per stop 2E/v²', kind: 'mass', help: 'The mass that, arriving at the same speed with nothing pushing, brings the same energy: the figure stop ratings are read against.' },
    { key: 'Etotal', label: 'Energy of the whole load per stroke', kind: 'energy' },
    { key: 'Favg', label: 'Ideal stop force (constant over stroke)', kind: 'force' },
    { key: 'decel', label: 'Deceleration, ideal stop', kind: 'acceleration', help: 'v²/(2s): the load decelerates uniformly (at the stop radius for a rotary load).' },
    { key: 'decelG', label: 'Deceleration, ideal stop (in g)', kind: 'dimensionless', digits: 3 },
    { key: 'Ekinetic', label: 'Kinetic energy ½mv² (½Iω² rotary)', kind: 'energy' },
    { key: 'Epropel', label: 'Drive work F_p·s (M·s/R rotary, μ·m·g·s conveyor)', kind: 'energy' },
    { key: 'Egravity', label: 'Gravity work m·g·s (m·g·s·sin θ on a slope)', kind: 'energy' },
    { key: 'cLinear', label: 'Dashpot coefficient for this stroke', kind: 'damping' },
    { key: 'FpeakLinear', label: 'Dashpot peak force', kind: 'force' },
    { key: 'decelPeakLinear', label: 'Dashpot peak deceleration', kind: 'acceleration' },
    { key: 'EresidualLinear', label: 'Energy left for the hard stop (dashpot)', kind: 'energy' },
    { key: 'efficiencyLinear', label: 'Dashpot efficiency E/(F_peak·s)', kind: 'fraction', digits: 3, help: '1 for an ideal stop; about 0.5 for a pure dashpot.' },
    { key: 'EhAllow', label: 'Energy per hour the body takes at this ambient', kind: 'energy', optional: true, help: 'Rating × (T_max − T_amb)/(T_max − T_rating): a body that sheds heat in proportion to its margin over the air.' },
    { key: 'EhUse', label: 'Share of that energy per hour used', kind: 'fraction', optional: true, digits: 3 },
    { key: 'tCycle', label: 'Time between impacts', kind: 'time', optional: true, help: '3600 s / impacts per hour.' },
    { key: 'resetShare', label: 'Return time / time between impacts', kind: 'fraction', optional: true, digits: 3, help: 'At 1 or more the stop is still coming out when the next impact arrives.' },
  ],
  compute(values) {
    const st = setup(values);
    const r = stopEnergy(st.eq, st.s, st.n, num(values, 'cph'));
    const lin = linearStop(st.m, st.eq.v, st.F0, st.s, st.vEnd);
    const warnings: string[] = [];
    if (lin.Eresidual > 0.05 * r.E) warnings.push(`The dashpot leaves ${(100 * lin.Eresidual / r.E).toFixed(0)} % of the energy for the hard stop: lower the residual speed or lengthen the stroke.`);
    if (r.decel > 30 * STANDARD_GRAVITY) warnings.push('Deceleration above 30 g: check the payload and the mounting.');
    const EhRated = optNum(values, 'EhRated');
    let EhAllow: number | undefined;
    if (EhRated !== undefined) {
      EhAllow = deratedEnergyPerHour(EhRated, num(values, 'Tamb'), num(values, 'Trated'), num(values, 'Tmax'));
      if (r.Ehour > EhAllow) warnings.push(`The stop takes ${(100 * r.Ehour / EhAllow).toFixed(0)} % of the energy per hour its body can shed at this ambient: it will run above its temperature limit. Use a larger stop, more stops, or a lower rate.`);
    }
    const tReturn = optNum(values, 'tReturn');
    const cph = num(values, 'cph');
    const reset = cph > 0 ? resetShare(cph, tReturn ?? 0) : undefined;
    if (reset && tReturn !== undefined && reset.share >= 1) warnings.push(`The stop needs ${tReturn.toPrecision(3)} s to reset but the next impact comes after ${reset.tCycle.toPrecision(3)} s: it takes that impact on a short stroke.`);
    if (st.n > 1) warnings.push(`${st.n} stops share the load equally only if they meet it together: align them, or size each for more than its share.`);
    return {
      outputs: {
        E: r.E, Ehour: r.Ehour, P: r.P, vImpact: st.eq.v, me: r.me, Etotal: r.Etotal, Favg: r.Favg, decel: r.decel, decelG: r.decel / STANDARD_GRAVITY,
        Ekinetic: r.kinetic, Epropel: r.drive, Egravity: r.gravity,
        cLinear: lin.c, FpeakLinear: lin.Fpeak, decelPeakLinear: lin.decelPeak, EresidualLinear: lin.Eresidual,
        efficiencyLinear: lin.Edamper / (lin.Fpeak * st.s),
        EhAllow, EhUse: EhAllow !== undefined ? r.Ehour / EhAllow : undefined,
        tCycle: reset?.tCycle, resetShare: tReturn !== undefined ? reset?.share : undefined,
      },
      warnings,
    };
  },
  charts(values, result): ChartSpec[] {
    const st = setup(values);
    const lin = linearStop(st.m, st.eq.v, st.F0, st.s, st.vEnd);
    const t = Array.from({ length: 121 }, (_, k) => (lin.duration * k) / 120);
    const v = t.map(lin.velocity);
    const Favg = result.outputs.Favg as number;
    return [{
      id: 'stop-force', title: 'Stop force during one impact',
      x: { label: 'Time', kind: 'time' }, y: { label: 'Force', kind: 'force' },
      series: [
        { label: 'linear dashpot c·v', x: t, y: v.map((vi) => lin.c * vi), tone: 0 },
        { label: 'ideal constant-force stop', x: [0, (2 * st.s) / st.eq.v], y: [Favg, Favg], style: 'dash', tone: 1 },
      ],
      summary: `The dashpot peaks at ${q(lin.Fpeak, 'force', 3)} on contact and falls as the mass slows; an ideal stop holds ${q(Favg, 'force', 3)} for ${((2 * st.s) / st.eq.v * 1000).toPrecision(3)} ms.`,
    }];
  },
  verification: IMPACT_CASES,
  sources: [
    { key: 'meriam2012', locator: '§3/5–3/7, §6/6 (from memory)' },
    { key: 'incropera2007', locator: '§1.2.2 (from memory)' },
  ],
  study: {
    inputs: { m: 'movingMass', v: 'impactSpeed', s: 'stopStroke' },
    publishes: { P: 'meanPower' },
  },
});
