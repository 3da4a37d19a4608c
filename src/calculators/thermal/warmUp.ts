import {
  BIOT_LUMPED_MAX, biotNumber, bodyCooling, material, onOffDuty, rk4, steadyTemperature, timeToLimit,
} from '../../core/thermal/index.ts';
import { choice, defineCalculator, num, type ChartSpec, type Values } from '../types.ts';
import { bodyFrom, bodyInputs } from './bodyInputs.ts';

const PARTS = [
  { key: 'mSteel', id: 'steel', label: 'Steel mass' },
  { key: 'mOil', id: 'oil', label: 'Oil mass' },
  { key: 'mAlu', id: 'aluminium', label: 'Aluminium mass' },
  { key: 'mRubber', id: 'rubber', label: 'Rubber (seals, bump stop) mass' },
] as const;

function capacity(values: Values): number {
  return num(values, 'Cth') + PARTS.reduce((s, p) => s + num(values, p.key) * material(p.id).cp, 0);
}

function setup(values: Values) {
  const C = capacity(values);
  const Tamb = num(values, 'Tamb');
  const duty = onOffDuty({ P: num(values, 'P'), Cth: C, UA: num(values, 'UA'), Tamb }, num(values, 'duty'), num(values, 'period'));
  return { C, Tamb, duty };
}

/** Body-model run: C dT/dt = P(t) − Q(T) with h(T) from the correlations (RK4). */
function bodyRun(values: Values, C: number, tEnd: number, stopAt?: number) {
  const body = { ...bodyFrom(values), Tamb: num(values, 'Tamb') };
  const P = num(values, 'P');
  const d = num(values, 'duty');
  const tp = num(values, 'period');
  const power = (t: number) => (d >= 1 || t % tp < d * tp ? P : 0);
  // RK4 is stable for h·(dQ/dT)/C below about 2.8; keep h below a fifth of the shortest time
  // constant (largest UA, at the top of the air table) and resolve each duty phase with 40 steps.
  const tauMin = C / Math.max(1e-12, bodyCooling(body, 690).UA);
  const steps = Math.min(200000, Math.max(400, Math.ceil((tEnd / tp) * 40), Math.ceil(tEnd / (0.2 * tauMin))));
  return rk4((t, T) => (power(t) - bodyCooling(body, T).Q) / C, body.Tamb, tEnd, steps, stopAt);
}

/** Lumped warm-up and cool-down of a damper at constant or on/off power. */
export const warmUpCalc = defineCalculator({
  id: 'warm-up',
  title: 'Warm-up and cool-down of a damper',
  summary: 'Temperature of a damper against time from its heat capacity and heat loss: time to the limit (or the temperature it settles at), on/off duty, cool-down time, Biot-number check.',
  inputs: [
    { key: 'P', label: 'Damper power P (while on)', kind: 'power', default: 50, min: 0, max: 20000, required: true, help: 'Mean power dissipated while the duty is on (from a duty page).' },
    { key: 'Cth', label: 'Heat capacity C (direct, or parts not listed)', kind: 'heatCapacity', default: 1395, min: 0, max: 1e7, required: true, help: 'Σ m·c of the damper. Or give 0 here and fill the masses below.' },
    ...PARTS.map((p) => ({ key: p.key, label: `${p.label} (c = ${material(p.id).cp} J/(kg·K))`, kind: 'mass' as const, default: 0, min: 0, max: 1000, help: `${material(p.id).label}; ${material(p.id).source}.` })),
    { key: 'UA', label: 'Conductance UA', kind: 'thermalConductance', default: 0.75, min: 0, max: 1e5, minExclusive: true, required: true, help: '(h_conv + h_r)·A, from the body-cooling or steady-temperature page at a representative temperature.' },
    { key: 'Tamb', label: 'Air temperature T∞', kind: 'temperature', default: 298.15, min: 223.15, max: 333.15, help: 'Start temperature and air temperature.' },
    { key: 'Tlimit', label: 'Temperature limit T_lim', kind: 'temperature', default: 373.15, min: 233.15, max: 673.15, help: 'Oil or seal limit allowed by the maker.' },
    { key: 't', label: 'Time of interest t', kind: 'time', default: 3600, min: 0, max: 1e7, help: 'The temperature output is given at this time.' },
    { key: 'duty', label: 'On fraction of the duty', kind: 'dimensionless', default: 1, min: 0, max: 1, minExclusive: true, help: '1 = constant power; 0.5 = power on half of each period.' },
    { key: 'period', label: 'Duty period', kind: 'time', default: 600, min: 1, max: 1e6, help: 'Length of one on + off cycle.' },
    { key: 'Ttouch', label: 'Cool-down target', kind: 'temperature', default: 323.15, min: 233.15, max: 473.15, help: 'Temperature for the cool-down time, e.g. 50 °C before handling.' },
    { key: 'area', label: 'Cooled area A (Biot check)', kind: 'area', default: 0.055, min: 0, max: 100, minExclusive: true, help: 'Surface area behind UA; h = UA/A.' },
    { key: 'Lc', label: 'Conduction length L_c = V/A (Biot check)', kind: 'length', default: 0.0125, min: 0, max: 1, minExclusive: true, help: 'Volume over surface: D/4 for a solid cylinder (12.5 mm at Ø50).' },
    { key: 'kBody', label: 'Conductivity of the body (Biot check)', kind: 'thermalConductivity', default: 50, min: 0, max: 500, minExclusive: true, help: 'Steel ≈ 50 W/(m·K). Still oil is 0.14; a working damper stirs its oil.' },
    { key: 'loss', label: 'Heat-loss model', kind: 'choice', default: 'constant', options: [{ value: 'constant', label: 'constant UA (closed form)' }, { value: 'body', label: 'also: body model, h from temperature (ODE)' }], help: 'The body model integrates C dT/dt = P − Q(T) with the convection and radiation correlations.' },
    ...bodyInputs({ key: 'loss', is: ['body'] }, ['Tamb']),
  ],
  outputs: [
    { key: 'tau', label: 'Time constant τ = C/UA', kind: 'time' },
    { key: 'Tss', label: 'Equilibrium temperature T_ss (mean power)', kind: 'temperature', help: 'T∞ + d·P/UA.' },
    { key: 'tLimit', label: 'Time to the limit', kind: 'time', optional: true, help: 'Absent when the limit is never reached.' },
    { key: 'reached', label: 'Limit reached', kind: 'text', help: '"yes" or "no".' },
    { key: 'T', label: 'Temperature at t', kind: 'temperature' },
    { key: 'Tpeak', label: 'Highest temperature (cyclic peak)', kind: 'temperature', help: 'Equals T_ss at constant power.' },
    { key: 'CthTotal', label: 'Total heat capacity', kind: 'heatCapacity' },
    { key: 'tCool', label: 'Cool-down time to the target', kind: 'time', optional: true, help: 'From the limit (or the peak if lower) with the power off.' },
    { key: 'Bi', label: 'Biot number', kind: 'dimensionless', digits: 2 },
    { key: 'TssBody', label: 'Equilibrium, body model', kind: 'temperature', optional: true },
    { key: 'tLimitBody', label: 'Time to the limit, body model', kind: 'time', optional: true },
  ],
  compute(values) {
    const { C, Tamb, duty } = setup(values);
    const Tlimit = num(values, 'Tlimit');
    const tLimit = duty.timeTo(Tlimit);
    const top = Math.min(Tlimit, duty.Tpeak);
    const Ttouch = num(values, 'Ttouch');
    const tCool = Ttouch <= Tamb ? undefined : top <= Ttouch ? 0 : duty.tau * Math.log((top - Tamb) / (Ttouch - Tamb));
    const Bi = biotNumber(num(values, 'UA') / num(values, 'area'), num(values, 'Lc'), num(values, 'kBody'));
    const warnings: string[] = [];
    if (Bi > BIOT_LUMPED_MAX) warnings.push(`Biot number ${Bi.toPrecision(2)} > 0.1: one temperature does not describe the body; the surface runs cooler than the core.`);
    if (Tlimit <= Tamb) warnings.push('The limit is at or below the air temperature.');
    if (Ttouch <= Tamb) warnings.push('The cool-down target is at or below the air temperature: it is approached but never reached.');
    const outputs: Record<string, number | string | undefined> = {
      tau: duty.tau, Tss: duty.Tmean, tLimit, reached: tLimit === undefined ? 'no' : 'yes', T: duty.at(num(values, 't')),
      Tpeak: duty.Tpeak, CthTotal: C, tCool, Bi,
    };
    if (choice(values, 'loss') === 'body') {
      const body = { ...bodyFrom(values), Tamb };
      const P = num(values, 'P');
      const d = num(values, 'duty');
      const ss = steadyTemperature(body, d * P);
      warnings.push(...ss.warnings);
      outputs.TssBody = ss.Ts;
      if (d >= 1) outputs.tLimitBody = timeToLimit((T) => P - bodyCooling(body, T).Q, C, Tamb, Tlimit);
      else {
        const tEnd = Math.max(10 * C / ss.UA, 3 * num(values, 'period'));
        outputs.tLimitBody = bodyRun(values, C, tEnd, Tlimit).tCross;
      }
    }
    return { outputs, warnings };
  },
  charts(values, result): ChartSpec[] {
    const { C, Tamb, duty } = setup(values);
    const Tlimit = num(values, 'Tlimit');
    const tl = result.outputs.tLimit as number | undefined;
    const tEnd = Math.min(1e7, Math.max(4 * duty.tau, 1.25 * (tl ?? 0), num(values, 't'), 2 * num(values, 'period')));
    const n = num(values, 'duty') < 1 ? Math.min(4000, Math.max(400, Math.ceil((tEnd / num(values, 'period')) * 20))) : 400;
    const t = Array.from({ length: n + 1 }, (_, i) => (tEnd * i) / n);
    const series: ChartSpec['series'][number][] = [
      { label: 'constant UA (closed form)', x: t, y: t.map((s) => duty.at(s)), tone: 0 },
      { label: 'limit', x: [0, tEnd], y: [Tlimit, Tlimit], style: 'dash', tone: 3 },
      { label: 'equilibrium (mean power)', x: [0, tEnd], y: [duty.Tmean, duty.Tmean], style: 'thin', tone: 1 },
    ];
    if (choice(values, 'loss') === 'body') {
      const r = bodyRun(values, C, tEnd);
      series.push({ label: 'body model, h(T) (RK4)', x: r.t, y: r.y, style: 'dash', tone: 2 });
    }
    const reach = tl === undefined ? `never reaches ${(Tlimit - 273.15).toFixed(0)} °C; it settles at ${(duty.Tpeak - 273.15).toFixed(1)} °C` : `reaches ${(Tlimit - 273.15).toFixed(0)} °C after ${(tl / 60).toFixed(1)} min`;
    return [{
      id: 'warmup',
      title: 'Body temperature against time',
      x: { label: 'Time', kind: 'time' },
      y: { label: 'Temperature', kind: 'temperature' },
      series,
      summary: `Starting at ${(Tamb - 273.15).toFixed(0)} °C with τ = ${(duty.tau / 60).toFixed(1)} min, the body ${reach}.`,
    }];
  },
  verification: [
    {
      name: 'C = 1395 J/K, UA = 0.745664 W/K, 50 W from 25 °C: τ, equilibrium, T at 600 s',
      inputs: { P: 50, Cth: 1395, UA: 0.745664, Tamb: 298.15, Tlimit: 373.15, t: 600 },
      expected: { tau: 1870.8, Tss: 365.204, T: 316.548, reached: 'no' },
      tolerance: 1e-4,
      why: 'closed form T = T∞ + (P/UA)(1 − e^{−t/τ}) evaluated independently, 5 s.f.',
      source: { key: 'incropera2007', locator: '§5.3 lumped capacitance with a heat source (from memory)' },
      provenance: 'reference library numpy (independent evaluation, version not recorded)',
    },
    {
      name: 'Same body at 3600 s',
      inputs: { P: 50, Cth: 1395, UA: 0.745664, Tamb: 298.15, Tlimit: 373.15, t: 3600 },
      expected: { T: 355.416 },
      tolerance: 1e-5,
      why: 'closed form, 6 s.f.',
      source: { key: 'incropera2007', locator: '§5.3 (from memory)' },
      provenance: 'reference library numpy (independent evaluation, version not recorded)',
    },
    {
      name: 'Same body at 150 W: time to 100 °C',
      inputs: { P: 150, Cth: 1395, UA: 0.745664, Tamb: 298.15, Tlimit: 373.15 },
      expected: { tLimit: 872.8, reached: 'yes' },
      tolerance: 1e-4,
      why: 'closed form t = τ ln(ΔT_ss/(ΔT_ss − ΔT_lim)), 4 s.f.',
      source: { key: 'incropera2007', locator: '§5.3 (from memory)' },
      provenance: 'reference library numpy (independent evaluation, version not recorded)',
    },
  ],
  sources: [
    { key: 'incropera2007', locator: '§5.1–5.3 lumped capacitance, eq. 5.10 Biot number; Tables A.1, A.3, A.5 (from memory)' },
    { key: 'hairer1993', locator: '§II.1 classical Runge–Kutta' },
  ],
});
