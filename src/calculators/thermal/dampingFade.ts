import { bodyCooling, dutyPower, fadeCoefficient, fadeEquilibrium, waltherFit, type FadeDuty, type FadeModel } from '../../core/thermal/index.ts';
import { choice, defineCalculator, num, type ChartSpec, type Values } from '../types.ts';
import { bodyFrom, bodyInputs } from './bodyInputs.ts';
import { q } from '../quantityText.ts';

function setup(values: Values) {
  const body = bodyFrom(values);
  const model: FadeModel = {
    cRef: num(values, 'cRef'), Tref: num(values, 'Tref'), viscousShare: num(values, 'share'),
    oil: waltherFit(num(values, 'nu40'), num(values, 'nu100')),
  };
  const duty: FadeDuty = choice(values, 'duty') === 'harmonic'
    ? { kind: 'harmonic', X: num(values, 'X'), omega: 2 * Math.PI * num(values, 'f') }
    : { kind: 'random', P: num(values, 'P') };
  return { body, model, duty, Tlimit: num(values, 'Tlimit') };
}

const TW210 = { D: 0.05, L: 0.35, orientation: 'horizontal', Tamb: 298.15, eps: 0.9, V: 0, nu40: 20e-6, nu100: 4.5e-6, Tlimit: 373.15, Cth: 1395 } as const;

/** Damping fade and the coupled thermal equilibrium of a damper. */
export const dampingFadeCalc = defineCalculator({
  id: 'damping-fade',
  title: 'Damping fade and thermal equilibrium',
  summary: 'How the damping coefficient falls as the oil heats, and the body temperature and coefficient at which the heat the damper makes equals the heat it sheds — or the time until it passes its limit.',
  inputs: [
    { key: 'cRef', label: 'Damping coefficient at T_ref', kind: 'damping', default: 980, min: 0, max: 1e7, minExclusive: true, required: true, help: 'Linear coefficient measured or specified at the reference temperature.' },
    { key: 'Tref', label: 'Reference temperature T_ref', kind: 'temperature', default: 298.15, min: 233.15, max: 423.15, help: 'Temperature at which c_ref holds (dyno tests are often at 20–25 °C).' },
    { key: 'share', label: 'Viscous share s', kind: 'dimensionless', default: 0.3, min: 0, max: 1, help: 'Part of c_ref that follows oil viscosity (bleed, laminar, leakage flow); the rest (valves, orifices) does not. Engineering approximation.' },
    { key: 'nu40', label: 'Oil viscosity at 40 °C', kind: 'kinematicViscosity', default: 20e-6, min: 2e-6, max: 5e-3, help: 'From the oil data sheet.' },
    { key: 'nu100', label: 'Oil viscosity at 100 °C', kind: 'kinematicViscosity', default: 4.5e-6, min: 1e-6, max: 1e-3, help: 'From the oil data sheet; below ν40.' },
    { key: 'duty', label: 'Duty', kind: 'choice', default: 'harmonic', options: [{ value: 'harmonic', label: 'harmonic stroke (P = ½cω²X²)' }, { value: 'random', label: 'random road (P fixed, independent of c)' }], help: 'What sets the power.' },
    { key: 'X', label: 'Stroke amplitude X', kind: 'length', default: 0.02, min: 0, max: 0.5, help: 'Half the peak-to-peak damper stroke.', when: { key: 'duty', is: ['harmonic'] } },
    { key: 'f', label: 'Stroke frequency f', kind: 'frequency', default: 1.5, min: 0, max: 100, help: 'Cycles per second.', when: { key: 'duty', is: ['harmonic'] } },
    { key: 'P', label: 'Mean damper power P', kind: 'power', default: 40, min: 0, max: 20000, help: 'From the random-road duty page.', when: { key: 'duty', is: ['random'] } },
    { key: 'Tlimit', label: 'Temperature limit', kind: 'temperature', default: 373.15, min: 243.15, max: 673.15, help: 'Oil or seal limit; the search for an equilibrium stops here.' },
    { key: 'Cth', label: 'Heat capacity C', kind: 'heatCapacity', default: 1395, min: 0, max: 1e7, minExclusive: true, help: 'Σ m·c, for the time to the limit when no equilibrium exists.' },
    ...bodyInputs(),
  ],
  outputs: [
    { key: 'status', label: 'Result', kind: 'text' },
    { key: 'Teq', label: 'Equilibrium body temperature', kind: 'temperature', optional: true },
    { key: 'cEq', label: 'Damping coefficient at equilibrium', kind: 'damping', optional: true },
    { key: 'Peq', label: 'Damper power at equilibrium', kind: 'power', optional: true },
    { key: 'fade', label: 'Coefficient lost to fade', kind: 'dimensionless', optional: true, help: '1 − c_eq/c_ref (or at the limit when no equilibrium).' },
    { key: 'crossings', label: 'Equilibria below the limit', kind: 'dimensionless', digits: 1 },
    { key: 'tLimit', label: 'Time to the limit from ambient', kind: 'time', optional: true, help: 'Only when no equilibrium exists below the limit.' },
    { key: 'cLimit', label: 'Damping coefficient at the limit', kind: 'damping' },
  ],
  compute(values) {
    const { body, model, duty, Tlimit } = setup(values);
    const warnings: string[] = [];
    if (Tlimit <= body.Tamb + 1) {
      return { outputs: { status: 'limit not above the air temperature', crossings: 0, cLimit: fadeCoefficient(model, Tlimit) }, warnings: ['The limit must be above the air temperature.'] };
    }
    const eq = fadeEquilibrium(body, model, duty, Tlimit, num(values, 'Cth'));
    warnings.push(...eq.warnings, ...bodyCooling(body, Tlimit).warnings);
    if (duty.kind === 'random') warnings.push('Random road: the damper power does not depend on c, so fade changes the ride, not the temperature.');
    const cLimit = fadeCoefficient(model, Tlimit);
    if (eq.reached) {
      return {
        outputs: { status: 'equilibrium below the limit', Teq: eq.reached.T, cEq: eq.reached.c, Peq: eq.reached.P, fade: 1 - eq.reached.c / model.cRef, crossings: eq.crossings.length, cLimit },
        warnings,
      };
    }
    return { outputs: { status: 'no equilibrium below the limit', crossings: 0, tLimit: eq.tLimit, fade: 1 - cLimit / model.cRef, cLimit }, warnings };
  },
  charts(values, result): ChartSpec[] {
    const { body, model, duty, Tlimit } = setup(values);
    const lo = body.Tamb;
    const hi = Math.min(673.15, Math.max(Tlimit, lo + 10) + 20);
    const T = Array.from({ length: 61 }, (_, i) => lo + ((hi - lo) * i) / 60);
    const Q = T.map((t) => bodyCooling(body, t).Q);
    const P = T.map((t) => dutyPower(duty, fadeCoefficient(model, t)));
    const c = T.map((t) => fadeCoefficient(model, t));
    const Teq = result.outputs.Teq as number | undefined;
    const markers = [{ x: Tlimit, label: 'limit' }, ...(Teq !== undefined ? [{ x: Teq, label: 'equilibrium' }] : [])];
    const what = Teq !== undefined ? `They cross at ${(Teq - 273.15).toFixed(1)} °C, where c = ${(result.outputs.cEq as number).toFixed(0)} N·s/m.` : `They do not cross below the ${(Tlimit - 273.15).toFixed(0)} °C limit.`;
    return [
      {
        id: 'equilibrium',
        title: 'Heat rejected and damper power against body temperature',
        x: { label: 'Body temperature', kind: 'temperature' },
        y: { label: 'Power', kind: 'power', min: 0 },
        series: [
          { label: 'heat rejected Q(T)', x: T, y: Q, tone: 0 },
          { label: 'damper power P(c(T))', x: T, y: P, style: 'dash', tone: 3 },
        ],
        markers,
        summary: `Heat rejected rises from 0 to ${q(Q.at(-1)!, 'power', 3)} over the range; damper power goes from ${q(P[0]!, 'power', 3)} to ${q(P.at(-1)!, 'power', 3)}. ${what}`,
      },
      {
        id: 'fade',
        title: 'Damping coefficient against oil temperature',
        x: { label: 'Oil temperature', kind: 'temperature' },
        y: { label: 'Damping coefficient', kind: 'damping', min: 0 },
        series: [{ label: 'c(T)', x: T, y: c, tone: 1 }],
        markers,
        summary: `The coefficient falls from ${q(c[0]!, 'damping')} at ${q(lo, 'temperature', 3)} to ${q(c.at(-1)!, 'damping')} at ${q(hi, 'temperature', 3)} (viscous share ${num(values, 'share')}).`,
      },
    ];
  },
  verification: [
    {
      name: 'No viscous share: c stays at c_ref and the power is ½cω²X² (980 N·s/m, 20 mm, 1.5 Hz)',
      inputs: { ...TW210, cRef: 980, share: 0, duty: 'harmonic', X: 0.02, f: 1.5 },
      expected: { cEq: 980, Peq: 17.409982, status: 'equilibrium below the limit' },
      tolerance: 1e-6,
      why: 'closed form ½·980·(3π)²·0.02², same arithmetic',
      source: { key: 'incropera2007', locator: '§1.3 energy balance (from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'Random road, 41.01 W into the Ø50 × 350 mm body in still air settles at 80 °C whatever the fade',
      inputs: { ...TW210, cRef: 980, share: 0.6, duty: 'random', P: 41.01 },
      expected: { Teq: 353.15 },
      tolerance: 1e-4,
      why: 'P independent of c; same figures as the body-cooling check, 4 s.f. in Q',
      source: { key: 'incropera2007', locator: 'eq. 9.34, eq. 1.9, Table A.4' },
      provenance: 'reference library numpy (independent evaluation, version not recorded)',
    },
    {
      name: 'Random road, 80.85 W (class C road at 20 m/s for the quarter car) exceeds what still air removes below 100 °C',
      inputs: { ...TW210, cRef: 980, share: 0.3, duty: 'random', P: 80.85 },
      expected: { status: 'no equilibrium below the limit' },
      tolerance: 1e-6,
      why: 'the body sheds about 60 W at 100 °C in still air (body-cooling), below 80.85 W',
      source: { key: 'incropera2007', locator: 'eq. 9.34, eq. 1.9, Table A.4' },
      provenance: 'reference library numpy (independent evaluation, version not recorded)',
    },
  ],
  sources: [
    { key: 'incropera2007', locator: 'eqs. 9.34, 7.54, 9.64, 1.9 (from memory)' },
    { key: 'astmD341', locator: 'viscosity–temperature equation (from memory)' },
    { key: 'dixon2007thermal', locator: 'fade rates 0.2–2 %/K (from memory)' },
    { key: 'brent1973', locator: 'ch. 4 (root refinement)' },
  ],
  study: {
    inputs: { cRef: 'dampingCoefficient', nu40: 'oilViscosity40', nu100: 'oilViscosity100', X: 'strokeAmplitude', f: 'strokeFrequency', P: 'meanPower', Tlimit: 'allowedTemperature', Cth: 'heatCapacity', D: 'bodyDiameter', L: 'bodyLength', orientation: 'bodyOrientation', eps: 'bodyEmissivity', flowFactor: 'localFlowFactor', Tamb: 'airTemperature', dTsur: 'surroundingsAboveAir', V: 'vehicleSpeed' },
  },
});
