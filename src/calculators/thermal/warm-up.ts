import { ComputationError } from '../../core/errors.ts';
import {
  BIOT_LUMPED_MAX, biotNumber, bodyHeatLoss, bodyWarmUp, coolDownTime, material, onOffDuty, parsePowerProfile, profileWarmUp,
  steadyTemperature, timeToLimit, type PowerProfile, type ProfileEnd,
} from '../../core/thermal/index.ts';
import { choice, defineCalculator, num, text, type ChartSpec, type Values } from '../types.ts';
import { bodyFrom, bodyInputs } from '../shared/bodyInputs.ts';
import { q } from '../quantityText.ts';
import { HISTORY_HANDOFF_MAX, warmUpHistory } from './warm-up.history.ts';
import { HEAT_PATH_STUDY, heatPathInputs, withHeatPaths } from '../shared/heatPathInputs.ts';
import { OIL_NODE_STUDY, oilBodyNote, oilNodeInputs, twoNodes } from '../shared/oilNodeInputs.ts';
import { warmUpTwoNode } from './warm-up.two-node.ts';

/** The default profile: the Tarnwick test-bay cycle (10 min at 120 W, 10 min off). */
const DEFAULT_PROFILE = '# time [s], power [W] from then on; the last line is the end time alone\n0, 120\n600, 0\n1200';

const PARTS = [
  { key: 'mSteel', id: 'steel', label: 'Steel mass' },
  { key: 'mOil', id: 'oil', label: 'Oil mass' },
  { key: 'mAlu', id: 'aluminium', label: 'Aluminium mass' },
  { key: 'mRubber', id: 'rubber', label: 'Rubber (seals, bump stop) mass' },
] as const;

function capacity(values: Values): number {
  return num(values, 'Cth') + PARTS.reduce((s, p) => s + num(values, p.key) * material(p.id).cp, 0);
}

/** The lumped model of the chosen power: on/off closed form, or the exact piecewise profile solution. */
function setup(values: Values) {
  const C = capacity(values);
  const Tamb = num(values, 'Tamb');
  if (choice(values, 'power') === 'profile') {
    const profile = parsePowerProfile(text(values, 'profile'), 'profile');
    const end = choice<ProfileEnd>(values, 'after');
    const m = profileWarmUp({ Cth: C, UA: num(values, 'UA'), Tamb }, profile, end);
    const period = profile.t[profile.t.length - 1]!;
    return { C, Tamb, duty: m, Pmean: m.Pmean, period, end, profile };
  }
  const P = num(values, 'P');
  const d = num(values, 'duty');
  const tp = num(values, 'period');
  const duty = onOffDuty({ P, Cth: C, UA: num(values, 'UA'), Tamb }, d, tp);
  const profile: PowerProfile = d >= 1 ? { t: [0, tp], P: [P] } : { t: [0, d * tp, tp], P: [P, 0] };
  return { C, Tamb, duty, Pmean: d * P, period: tp, end: 'repeat' as ProfileEnd, profile };
}

type Setup = ReturnType<typeof setup>;

/** The body of the body model: its fields, the page's air temperature, mounts and sun. */
function modelBody(values: Values) {
  return withHeatPaths({ ...bodyFrom(values), Tamb: num(values, 'Tamb') }, values);
}

/** Body-model run: C dT/dt = P(t) − Q(T) with h(T) from the correlations, piecewise between switching times. */
function bodyRun(values: Values, m: Setup, tEnd: number, stopAt?: number) {
  const body = modelBody(values);
  return bodyWarmUp(bodyHeatLoss(body), m.C, body.Tamb, m.profile, m.end, tEnd, stopAt);
}

/** Length of the two-node run: the time of interest, two periods, and five time constants to settle. */
function twoNodeEnd(values: Values, m: Setup, tau: number): number {
  return Math.min(1e7, Math.max(num(values, 't'), 2 * m.period, 5 * tau));
}

/** Lumped warm-up and cool-down of a damper at constant or on/off power. */
export const warmUpCalculator = defineCalculator({
  id: 'warm-up',
  offMainThread: true, // p99 of evaluate + charts over a frame (npm run bench)
  title: 'Warm-up and cool-down of a damper',
  summary: 'Temperature of a damper against time from its heat capacity and heat loss: time to the limit (or the temperature it settles at), on/off duty, cool-down time, Biot-number check.',
  inputs: [
    { key: 'power', label: 'Power', kind: 'choice', default: 'steady', options: [{ value: 'steady', label: 'constant or on/off' }, { value: 'profile', label: 'power profile (time, power)' }], help: 'A profile is a piecewise-constant power against time, typed or handed over by a duty page.' },
    { key: 'P', label: 'Damper power P (while on)', kind: 'power', default: 50, min: 0, max: 20000, required: true, when: { key: 'power', is: ['steady'] }, help: 'Mean power dissipated while the duty is on (from a duty page).' },
    { key: 'profile', label: 'Power profile: time [s], power [W]', kind: 'text', default: DEFAULT_PROFILE, maxLength: 6000, rows: 6, fromUrl: true, when: { key: 'power', is: ['profile'] }, help: 'One line per step: "t, P" — from t seconds on the power is P watts; start at 0; the last line is the end time alone. Entries may also be separated by ";". Lines starting with # are comments.' },
    { key: 'after', label: 'After the profile', kind: 'choice', default: 'repeat', options: [{ value: 'repeat', label: 'repeat it (period = end time)' }, { value: 'off', label: 'power off (one run, then cool-down)' }], when: { key: 'power', is: ['profile'] }, help: 'Repeat: a duty cycle that goes on. Off: one event, then the damper cools.' },
    { key: 'Cth', label: 'Heat capacity C (direct, or parts not listed)', kind: 'heatCapacity', default: 1395, min: 0, max: 1e7, required: true, help: 'Σ m·c of the damper. Or give 0 here and fill the masses below.' },
    ...PARTS.map((p) => ({ key: p.key, label: `${p.label} (c = ${material(p.id).cp} J/(kg·K))`, kind: 'mass' as const, default: 0, min: 0, max: 1000, help: `${material(p.id).label}; ${material(p.id).source}.` })),
    { key: 'UA', label: 'Conductance UA', kind: 'thermalConductance', default: 0.75, min: 0, max: 1e5, minExclusive: true, required: true, help: '(h_conv + h_r)·A, from the body-cooling or steady-temperature page at a representative temperature.' },
    { key: 'Tamb', label: 'Air temperature T∞', kind: 'temperature', default: 298.15, min: 223.15, max: 333.15, help: 'Start temperature and air temperature.' },
    { key: 'Tlimit', label: 'Temperature limit T_lim', kind: 'temperature', default: 373.15, min: 233.15, max: 673.15, help: 'Oil or seal limit allowed by the maker.' },
    { key: 't', label: 'Time of interest t', kind: 'time', default: 3600, min: 0, max: 1e7, help: 'The temperature output is given at this time.' },
    { key: 'duty', label: 'On fraction of the duty', kind: 'fraction', default: 1, min: 0, max: 1, minExclusive: true, when: { key: 'power', is: ['steady'] }, help: '1 = constant power; 0.5 = power on half of each period.' },
    { key: 'period', label: 'Duty period', kind: 'time', default: 600, min: 1, max: 1e6, when: { key: 'power', is: ['steady'] }, help: 'Length of one on + off cycle.' },
    { key: 'Ttouch', label: 'Cool-down target', kind: 'temperature', default: 323.15, min: 233.15, max: 473.15, help: 'Temperature for the cool-down time, e.g. 50 °C before handling.' },
    { key: 'area', label: 'Cooled area A (Biot check)', kind: 'area', default: 0.055, min: 0, max: 100, minExclusive: true, help: 'Surface area behind UA; h = UA/A.' },
    { key: 'Lc', label: 'Conduction length L_c = V/A (Biot check)', kind: 'length', default: 0.0125, min: 0, max: 1, minExclusive: true, help: 'Volume over surface: D/4 for a solid cylinder (12.5 mm at Ø50).' },
    { key: 'kBody', label: 'Conductivity of the body (Biot check)', kind: 'thermalConductivity', default: 50, min: 0, max: 500, minExclusive: true, help: 'Steel ≈ 50 W/(m·K). Still oil is 0.14; a working damper stirs its oil.' },
    { key: 'loss', label: 'Heat-loss model', kind: 'choice', default: 'constant', options: [{ value: 'constant', label: 'constant UA (closed form)' }, { value: 'body', label: 'also: body model, h from temperature (ODE)' }], help: 'The body model integrates C dT/dt = P − Q(T) with the convection and radiation correlations.' },
    ...bodyInputs({ key: 'loss', is: ['body'] }, ['Tamb']),
    ...heatPathInputs({ key: 'loss', is: ['body'] }),
    ...oilNodeInputs(true),
  ],
  outputs: [
    { key: 'tau', label: 'Time constant τ = C/UA', kind: 'time' },
    { key: 'Tss', label: 'Equilibrium temperature T_ss (mean power)', kind: 'temperature', help: 'T∞ + P̄/UA: P̄ = d·P, or the mean power of the profile (held for ever).' },
    { key: 'tLimit', label: 'Time to the limit', kind: 'time', optional: true, help: 'Absent when the limit is never reached.' },
    { key: 'reached', label: 'Limit reached', kind: 'text', help: '"yes" or "no".' },
    { key: 'T', label: 'Temperature at t', kind: 'temperature' },
    { key: 'Tpeak', label: 'Highest temperature (cyclic peak)', kind: 'temperature', help: 'Equals T_ss at constant power; a repeated profile: the peak of its periodic steady state; one run: the highest temperature reached.',
      feeds: [
        { page: 'thermal-life', input: 'T', label: 'Seal and oil life over this run', with: { history: 'history' }, set: { mode: 'history' } },
        { page: 'gas-charge', input: 'T', label: 'Gas pressure at this peak temperature' },
      ] },
    { key: 'CthTotal', label: 'Total heat capacity', kind: 'heatCapacity' },
    { key: 'tCool', label: 'Cool-down time to the target', kind: 'time', optional: true, help: 'From the limit (or the peak if lower) with the power off.' },
    { key: 'Bi', label: 'Biot number', kind: 'dimensionless', digits: 2 },
    { key: 'TssBody', label: 'Equilibrium, body model', kind: 'temperature', optional: true },
    { key: 'tLimitBody', label: 'Time to the limit, body model', kind: 'time', optional: true },
    { key: 'Pmean', label: 'Mean power P̄', kind: 'power', help: 'd·P, or the energy of the profile over its length.' },
    { key: 'ToilT', label: 'Oil temperature at t (two nodes)', kind: 'temperature', optional: true },
    { key: 'TbodyT', label: 'Body temperature at t (two nodes)', kind: 'temperature', optional: true },
    { key: 'ToilPeak', label: 'Highest oil temperature of the run (two nodes)', kind: 'temperature', optional: true, help: 'Over the run: the time of interest, two periods and five time constants.' },
    { key: 'tLimitOil', label: 'Time for the oil to reach the limit (two nodes)', kind: 'time', optional: true, help: 'Absent when the oil stays below the limit over the run.' },
    { key: 'ToilSs', label: 'Oil equilibrium at the mean power (two nodes)', kind: 'temperature', optional: true, help: 'T_ss + P̄/G_ob (constant UA) or the body model’s equilibrium + P̄/G_ob.' },
    { key: 'closure', label: 'Energy audit of the two-node run (put in − stored − shed)/put in', kind: 'dimensionless', digits: 2, optional: true, help: 'Integration check: should be near 1e-9 or smaller.' },
  ],
  handoffs: [{ key: 'history', help: 'The body temperature from a cold start over the time of interest, then the cool-down, as rows "t, T" (s, K) for the thermal-life page.', maxLength: HISTORY_HANDOFF_MAX }],
  compute(values) {
    const m = setup(values);
    const { C, Tamb, duty } = m;
    const Tlimit = num(values, 'Tlimit');
    const tLimit = duty.timeTo(Tlimit);
    const top = Math.min(Tlimit, duty.Tpeak);
    const Ttouch = num(values, 'Ttouch');
    const tCool = coolDownTime(top, Ttouch, Tamb, duty.tau);
    const Bi = biotNumber(num(values, 'UA') / num(values, 'area'), num(values, 'Lc'), num(values, 'kBody'));
    const warnings: string[] = [];
    if (Bi > BIOT_LUMPED_MAX) warnings.push(`Biot number ${Bi.toPrecision(2)} > 0.1: one temperature does not describe the body; the surface runs cooler than the core.`);
    if (Tlimit <= Tamb) warnings.push('The limit is at or below the air temperature.');
    if (duty.Tpeak > 700) warnings.push(`The constant-UA model settles at ${duty.Tpeak.toPrecision(3)} K, far beyond any damper: the heat loss UA is too small for this power (check UA).`);
    if (Ttouch <= Tamb) warnings.push('The cool-down target is at or below the air temperature: it is approached but never reached.');
    const outputs: Record<string, number | string | undefined> = {
      tau: duty.tau, Tss: duty.Tmean, tLimit, reached: tLimit === undefined ? 'no' : 'yes', T: duty.at(num(values, 't')),
      Tpeak: duty.Tpeak, CthTotal: C, tCool, Bi, Pmean: m.Pmean,
    };
    const profile = choice(values, 'power') === 'profile';
    if (profile && m.end === 'off') warnings.push('One run of the profile, then no power: T_ss is the equilibrium of its mean power if that were held; the peak is the highest temperature of the run.');
    let TbodyEq = duty.Tmean;
    if (choice(values, 'loss') === 'body') {
      const body = modelBody(values);
      const ss = steadyTemperature(body, m.Pmean);
      TbodyEq = ss.Ts;
      if (body.Qsun !== undefined) warnings.push(`The constant-UA results leave out the ${body.Qsun.toPrecision(3)} W absorbed from the sun; the body-model results include it.`);
      warnings.push(...ss.warnings);
      outputs.TssBody = ss.Ts;
      const UAtyped = num(values, 'UA');
      if (UAtyped < 0.5 * ss.UA || UAtyped > 2 * ss.UA) {
        warnings.push(`The typed UA = ${UAtyped.toPrecision(3)} W/K is ${UAtyped < ss.UA ? 'far below' : 'far above'} the body model's ${ss.UA.toPrecision(3)} W/K at its equilibrium: the constant-UA results (T_ss = ${duty.Tmean.toPrecision(4)} K) do not describe this body; check UA.`);
      }
      if (!profile && num(values, 'duty') >= 1) {
        const Q = bodyHeatLoss(body);
        const P = num(values, 'P');
        outputs.tLimitBody = timeToLimit((T) => P - Q(T), C, Tamb, Tlimit);
      } else {
        const tEnd = Math.max(10 * C / ss.UA, 3 * m.period);
        try {
          outputs.tLimitBody = bodyRun(values, m, tEnd, Tlimit).tCross;
        } catch (e) {
          // a long, finely divided profile: the closed form above stands; only the cross-check is dropped
          if (!profile || !(e instanceof ComputationError)) throw e;
          warnings.push(`Body model not run: ${e.message}.`);
        }
      }
    }
    if (twoNodes(values)) {
      const Gob = num(values, 'Gob');
      const tEnd = twoNodeEnd(values, m, duty.tau);
      try {
        const body = choice(values, 'loss') === 'body' ? modelBody(values) : undefined;
        const r = warmUpTwoNode(values, m, body, tEnd, num(values, 't'), Tlimit, 0);
        Object.assign(outputs, {
          ToilT: r.oilAtT, TbodyT: r.bodyAtT, ToilPeak: r.oilPeak, ToilSs: TbodyEq + m.Pmean / Gob, tLimitOil: r.tLimitOil, closure: r.closure,
        });
        const note = oilBodyNote(TbodyEq + m.Pmean / Gob, TbodyEq);
        if (note) warnings.push(note);
      } catch (e) {
        if (!(e instanceof ComputationError)) throw e;
        warnings.push(`Two-node model not run: ${e.message}.`);
      }
    }
    const history = warmUpHistory({ at: duty.at, profile: m.profile, end: m.end, tau: duty.tau, Tamb }, num(values, 't'));
    return { outputs, warnings, handoff: { history } };
  },
  charts(values, result): ChartSpec[] {
    const m = setup(values);
    const { Tamb, duty } = m;
    const Tlimit = num(values, 'Tlimit');
    const tl = result.outputs.tLimit as number | undefined;
    const tEnd = Math.min(1e7, Math.max(4 * duty.tau, 1.25 * (tl ?? 0), num(values, 't'), 2 * m.period));
    const cyclic = choice(values, 'power') === 'profile' || num(values, 'duty') < 1;
    const n = cyclic ? Math.min(4000, Math.max(400, Math.ceil((tEnd / m.period) * 20))) : 400;
    const t = Array.from({ length: n + 1 }, (_, i) => (tEnd * i) / n);
    const series: ChartSpec['series'][number][] = [
      { label: 'constant UA (closed form)', x: t, y: t.map((s) => duty.at(s)), tone: 0 },
      { label: 'limit', x: [0, tEnd], y: [Tlimit, Tlimit], style: 'dash', tone: 3 },
      { label: 'equilibrium (mean power)', x: [0, tEnd], y: [duty.Tmean, duty.Tmean], style: 'thin', tone: 1 },
    ];
    if (choice(values, 'loss') === 'body') {
      let r: ReturnType<typeof bodyRun> | undefined;
      try { r = bodyRun(values, m, tEnd); } catch (e) { if (!(e instanceof ComputationError) || choice(values, 'power') !== 'profile') throw e; }
      if (r) series.push({ label: 'body model, h(T) (ODE)', x: r.t, y: r.y, style: 'dash', tone: 2 });
    }
    if (twoNodes(values)) {
      let r: ReturnType<typeof warmUpTwoNode> | undefined;
      const body = choice(values, 'loss') === 'body' ? modelBody(values) : undefined;
      // Tlimit = ∞: the chart needs no limit crossing
      try { r = warmUpTwoNode(values, m, body, twoNodeEnd(values, m, duty.tau), 0, Infinity, tEnd); } catch (e) { if (!(e instanceof ComputationError)) throw e; }
      if (r) {
        const how = body ? 'ODE' : 'exact';
        series.push({ label: `oil, two nodes (${how})`, x: r.t, y: r.oil, tone: 4 });
        series.push({ label: `body, two nodes (${how})`, x: r.t, y: r.body, style: 'thin', tone: 4 });
      }
    }
    const reach = tl === undefined ? `never reaches ${q(Tlimit, 'temperature', 3)}; it settles at ${q(duty.Tpeak, 'temperature')}` : `reaches ${q(Tlimit, 'temperature', 3)} after ${(tl / 60).toFixed(1)} min`;
    return [{
      id: 'warmup',
      title: 'Body temperature against time',
      x: { label: 'Time', kind: 'time' },
      y: { label: 'Temperature', kind: 'temperature' },
      series,
      summary: `Starting at ${q(Tamb, 'temperature', 3)} with τ = ${(duty.tau / 60).toFixed(1)} min, the body ${reach}.`,
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
    {
      name: 'Power profile 120 W for 600 s, off for 600 s, repeated: the on/off peak θ_peak = (P/UA)(1 − e^{−d·t_p/τ})/(1 − e^{−t_p/τ})',
      inputs: { power: 'profile', profile: '0, 120\n600, 0\n1200', after: 'repeat', Cth: 1395, UA: 0.745664, Tamb: 298.15 },
      expected: { Tpeak: 391.408947, Tss: 378.615196, Pmean: 60, reached: 'yes' },
      tolerance: 1e-8,
      why: 'closed form of the on/off duty evaluated independently in float64 (Python math), 9 s.f.',
      source: { key: 'incropera2007', locator: '§5.3 lumped capacitance, phase by phase (from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'One run of 150 W for 900 s, then off: reaches 100 °C at 872.8 s and peaks at the constant-power value at 900 s',
      inputs: { power: 'profile', profile: '0,150;900', after: 'off', Cth: 1395, UA: 0.745664, Tamb: 298.15, Tlimit: 373.15 },
      expected: { tLimit: 872.812, Tpeak: 374.970233 },
      tolerance: 1e-6,
      why: 'closed form T∞ + (P/UA)(1 − e^{−t/τ}) and τ ln(ΔT_ss/(ΔT_ss − ΔT_lim)) evaluated independently (Python math)',
      source: { key: 'incropera2007', locator: '§5.3 (from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'Two nodes: C_oil = 475 J/K, C_body = 920 J/K, G_ob = 8 W/K, UA = 0.745664 W/K, 50 W from 25 °C: oil and body at 600 s, oil equilibrium',
      inputs: { P: 50, Cth: 1395, UA: 0.745664, Tamb: 298.15, Tlimit: 373.15, t: 600, nodes: 'two', Coil: 475, Gob: 8 },
      expected: { ToilT: 319.990908, TbodyT: 315.356401, ToilSs: 371.454330, tau: 1870.81581 },
      tolerance: 1e-6,
      why: 'linear two-node system x′ = Ax + b solved by the matrix exponential (scipy.linalg.expm), 9 s.f.; the adaptive integrator runs at rtol 1e-9',
      source: { key: 'incropera2007', locator: '§5.3 lumped capacitance, one energy balance per node (from memory)' },
      provenance: 'reference library scipy@1.17.1 (matrix exponential of the closed-form linear system)',
    },
    {
      name: 'Same two nodes at 3600 s',
      inputs: { P: 50, Cth: 1395, UA: 0.745664, Tamb: 298.15, Tlimit: 373.15, t: 3600, nodes: 'two', Coil: 475, Gob: 8 },
      expected: { ToilT: 360.918358, TbodyT: 354.999093 },
      tolerance: 1e-6,
      why: 'matrix-exponential closed form, 9 s.f.',
      source: { key: 'incropera2007', locator: '§5.3 (from memory)' },
      provenance: 'reference library scipy@1.17.1 (matrix exponential of the closed-form linear system)',
    },
    {
      name: 'Same two nodes at 150 W: the oil reaches 100 °C at 719.8 s (one node: 872.8 s)',
      inputs: { P: 150, Cth: 1395, UA: 0.745664, Tamb: 298.15, Tlimit: 373.15, nodes: 'two', Coil: 475, Gob: 8 },
      expected: { tLimitOil: 719.824197, tLimit: 872.811964 },
      tolerance: 1e-6,
      why: 'root of the matrix-exponential oil temperature (scipy brentq, xtol 1e-12); the event is located to round-off',
      source: { key: 'incropera2007', locator: '§5.3 (from memory)' },
      provenance: 'reference library scipy@1.17.1 (matrix exponential of the closed-form linear system)',
    },
  ],
  sources: [
    { key: 'incropera2007', locator: '§5.1–5.3 lumped capacitance, eq. 5.10 Biot number; Tables A.1, A.3, A.5 (from memory)' },
    { key: 'hairer1993', locator: '§II.4–II.6 embedded Runge–Kutta with step-size control and dense output' },
  ],
  study: {
    inputs: { P: 'meanPower', Cth: 'heatCapacity', UA: 'conductance', Tamb: 'airTemperature', Tlimit: 'allowedTemperature', t: 'dutyLength', D: 'bodyDiameter', L: 'bodyLength', orientation: 'bodyOrientation', eps: 'bodyEmissivity', flowFactor: 'localFlowFactor', dTsur: 'surroundingsAboveAir', V: 'vehicleSpeed', ...HEAT_PATH_STUDY, ...OIL_NODE_STUDY, Coil: 'oilHeatCapacity' },
    publishes: { CthTotal: 'heatCapacity' },
    refuse: (values, bound) => bound.has('P') && values.power === 'steady' && values.duty !== 1
      ? `P (the power while on) came from the study's mean power, but the power is on for only ${String(values.duty)} of each period: type P = mean power / on fraction on this step, or set the on fraction to 1`
      : undefined,
  },
});
