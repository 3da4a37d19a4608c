import { ageingLife, halvingInterval, historyAgeing, readTemperatureHistory, temperatureForLife, type AgeingLaw, type TemperatureHistory } from '../../core/ageing/index.ts';
import { choice, defineCalculator, num, optNum, text, type ChartSpec, type Values } from '../types.ts';
import { q } from '../quantityText.ts';
import { THERMAL_LIFE_CASES } from './thermal-life.cases.ts';
import { maxOf, minOf } from '../../core/numeric/index.ts';

const HOUR = 3600;
const DAY = 24 * HOUR;
const YEAR = 365.25 * DAY;

/** The default history: a Fellrunner shift, warm from the yard to a hot road and back (invented demo). */
const DEFAULT_HISTORY = [
  '# one working day of the TW-210 rear damper (demo): rows "t, T", straight lines between them',
  't [h], T [°C]', '0, 15', '0.5, 62', '2, 78', '4, 84', '4.5, 96', '6, 98', '6.5, 70', '8, 64', '9, 25', '24, 12',
].join('\n');

function lawFrom(values: Values): AgeingLaw {
  const base = { Lref: num(values, 'Lref'), Tref: num(values, 'Tref') };
  return choice(values, 'model') === 'halving' ? { kind: 'halving', ...base, dTh: num(values, 'dTh') } : { kind: 'arrhenius', ...base, Ea: num(values, 'Ea') };
}

function historyFrom(values: Values): TemperatureHistory {
  if (choice(values, 'mode') === 'constant') return { t: [0, num(values, 'tConst')], T: [num(values, 'T'), num(values, 'T')] };
  return readTemperatureHistory(text(values, 'history'), 'history');
}

/** A life in words a planner reads: hours, and days or years. */
function lifeWords(s: number): string {
  const n = (x: number) => String(Number(x.toPrecision(3)));
  if (s < 2 * DAY) return `${n(s / HOUR)} h`;
  if (s < YEAR) return `${n(s / HOUR)} h (${n(s / DAY)} days)`;
  return `${n(s / HOUR)} h (${n(s / YEAR)} years)`;
}

/** Seal and oil ageing over a temperature history (Arrhenius or halving interval, Miner sum). */
export const thermalLifeCalculator = defineCalculator({
  id: 'thermal-life',
  title: 'Seal and oil life over a temperature history',
  summary: 'Life of a seal or oil at the temperatures a damper actually sees: an Arrhenius (or halving-interval) life law from one ageing test, summed over a temperature history by the Miner rule, with the equivalent constant temperature and the life left.',
  inputs: [
    { key: 'model', label: 'Life law', kind: 'choice', default: 'arrhenius', options: [{ value: 'arrhenius', label: 'Arrhenius (activation energy E_a)' }, { value: 'halving', label: 'halving interval (life halves every ΔT_h)' }], help: 'ISO 11346 fits the Arrhenius line to ageing tests at three or more temperatures; a halving interval (the "10 K rule") is the maker\'s shorthand.' },
    { key: 'Lref', label: 'Life at the reference temperature L_ref', kind: 'time', default: 1000 * HOUR, min: 0, max: 1e12, minExclusive: true, required: true, help: 'Time to the end-of-life threshold (e.g. 50 % loss of elongation, a compression set limit) in the ageing test at T_ref.' },
    { key: 'Tref', label: 'Reference temperature T_ref', kind: 'temperature', default: 373.15, min: 273.15, max: 573.15, required: true, help: 'Temperature of that ageing test.' },
    { key: 'Ea', label: 'Activation energy E_a', kind: 'molarEnergy', default: 82.4e3, min: 10e3, max: 300e3, when: { key: 'model', is: ['arrhenius'] }, help: 'Slope of the Arrhenius line times R. Seal elastomers are often 70–120 kJ/mol; use the value fitted to the material\'s own tests.' },
    { key: 'dTh', label: 'Halving interval ΔT_h', kind: 'temperatureDifference', default: 10, min: 2, max: 50, when: { key: 'model', is: ['halving'] }, help: 'Rise in temperature that halves the life.' },
    { key: 'mode', label: 'Temperatures', kind: 'choice', default: 'history', options: [{ value: 'history', label: 'a history (rows t, T)' }, { value: 'constant', label: 'one constant temperature' }], help: 'A history is repeated: one day or one duty cycle, then the next.' },
    { key: 'history', label: 'Temperature history: time, temperature', kind: 'text', default: DEFAULT_HISTORY, maxLength: 10000, rows: 8, fromUrl: true, when: { key: 'mode', is: ['history'] }, help: 'One "t, T" row per line, straight lines between rows; a step is two rows at the same time. A header such as "t [h], T [°C]" gives the units (without one: seconds and kelvin). Lines starting with # are comments. The warm-up page hands its run over here.' },
    { key: 'T', label: 'Constant temperature T', kind: 'temperature', default: 353.15, min: 173.15, max: 673.15, when: { key: 'mode', is: ['constant'] }, help: 'E.g. the steady body temperature of the steady-temperature page.' },
    { key: 'tConst', label: 'Length of one duty at T', kind: 'time', default: 8 * HOUR, min: 0, max: 1e10, minExclusive: true, when: { key: 'mode', is: ['constant'] }, help: 'The damage output is for this time.' },
    { key: 'service', label: 'Time already in service', kind: 'time', default: 0, min: 0, max: 1e12, help: 'Under the same history; the remaining life is the life less this.' },
    { key: 'tReq', label: 'Required life (for the highest temperature of use)', kind: 'time', default: 20000 * HOUR, min: 0, max: 1e12, minExclusive: true, optional: true, help: 'Leave empty to skip. The constant temperature at which the life is just this long (ISO 11346\'s maximum temperature of use).' },
  ],
  outputs: [
    { key: 'life', label: 'Life under this history', kind: 'time', help: 'Length of the history over its damage: how long the part lasts if the history repeats.' },
    { key: 'lifeText', label: 'Life in hours', kind: 'text' },
    { key: 'damage', label: 'Damage over one history (Miner sum)', kind: 'dimensionless', help: 'Σ Δt/L(T): the share of the life one pass of the history uses.' },
    { key: 'Teq', label: 'Equivalent constant temperature T_eq', kind: 'temperature', help: 'The constant temperature that ages the part as much in the same time.' },
    { key: 'remaining', label: 'Remaining life', kind: 'time', help: 'Life less the time already in service (0 once past it).' },
    { key: 'duration', label: 'Length of the history', kind: 'time' },
    { key: 'Tpeak', label: 'Highest temperature in the history', kind: 'temperature' },
    { key: 'hotShare', label: 'Share of the damage in the hottest tenth of the span', kind: 'dimensionless', digits: 3, help: 'Near 1: the peaks use up the life; cooling them pays most.' },
    { key: 'halving', label: 'Halving interval at T_eq', kind: 'temperatureDifference', help: 'R·T²·ln2/E_a (the typed ΔT_h for the halving law).' },
    { key: 'Tmax', label: 'Highest constant temperature for the required life', kind: 'temperature', optional: true, help: 'Absent when no required life is given.' },
  ],
  compute(values) {
    const law = lawFrom(values);
    const h = historyFrom(values);
    const r = historyAgeing(law, h);
    const service = num(values, 'service');
    const tReq = optNum(values, 'tReq');
    const warnings: string[] = [];
    const span = Math.abs(r.Teq - law.Tref);
    if (span > 40) warnings.push(`The equivalent temperature is ${span.toFixed(0)} K from the reference: the law is extrapolated that far. ISO 11346 asks for ageing tests at three or more temperatures around the range of use; a second mechanism may take over outside them.`);
    if (r.Tpeak > law.Tref + 30) warnings.push(`The history peaks ${(r.Tpeak - law.Tref).toFixed(0)} K above the reference test: check the material's short-term limit with its maker (the ageing law does not cover melting, extrusion or hardening at the peak).`);
    if (r.hotShare > 0.5 && choice(values, 'mode') === 'history') warnings.push(`${(100 * r.hotShare).toFixed(0)} % of the ageing happens in the hottest tenth of the temperature span: the peaks set the life.`);
    if (service > r.life) warnings.push('The time in service is past the estimated life: inspect or replace the seals.');
    return {
      outputs: {
        life: r.life, lifeText: lifeWords(r.life), damage: r.damage, Teq: r.Teq, remaining: Math.max(0, r.life - service),
        duration: r.duration, Tpeak: r.Tpeak, hotShare: r.hotShare,
        halving: law.kind === 'halving' ? law.dTh : halvingInterval(law.Ea, r.Teq),
        Tmax: tReq === undefined ? undefined : temperatureForLife(law, tReq),
      },
      warnings,
    };
  },
  charts(values, result): ChartSpec[] {
    const law = lawFrom(values);
    const h = historyFrom(values);
    const Teq = result.outputs.Teq as number;
    const lo = Math.min(minOf(h.T), law.Tref) - 10;
    const hi = Math.max(maxOf(h.T), law.Tref) + 10;
    const Ts = Array.from({ length: 61 }, (_, i) => lo + ((hi - lo) * i) / 60);
    return [
      {
        id: 'history',
        title: 'Temperature history and its equivalent constant temperature',
        x: { label: 'Time', kind: 'time' },
        y: { label: 'Temperature', kind: 'temperature' },
        series: [
          { label: 'history', x: h.t, y: h.T, tone: 0 },
          { label: 'equivalent constant temperature', x: [h.t[0]!, h.t[h.t.length - 1]!], y: [Teq, Teq], style: 'dash', tone: 3 },
        ],
        summary: `Over ${(result.outputs.duration as number / HOUR).toPrecision(3)} h the part ages as much as at a constant ${q(Teq, 'temperature', 4)}; the peak is ${q(result.outputs.Tpeak as number, 'temperature', 3)}.`,
      },
      {
        id: 'life-law',
        title: 'Life against constant temperature',
        x: { label: 'Temperature', kind: 'temperature', input: 'T' },
        y: { label: 'Life', kind: 'time', scale: 'log' },
        series: [
          { label: law.kind === 'arrhenius' ? 'Arrhenius law' : 'halving law', x: Ts, y: Ts.map((T) => ageingLife(law, T)), tone: 1 },
          { label: 'reference test', x: [law.Tref], y: [law.Lref], style: 'points', tone: 2 },
          { label: 'this history', x: [Teq], y: [result.outputs.life as number], style: 'points', tone: 3 },
        ],
        summary: `The life falls from ${lifeWords(ageingLife(law, lo))} at ${q(lo, 'temperature', 3)} to ${lifeWords(ageingLife(law, hi))} at ${q(hi, 'temperature', 3)}; this history gives ${lifeWords(result.outputs.life as number)}.`,
      },
    ];
  },
  verification: THERMAL_LIFE_CASES,
  sources: [
    { key: 'iso11346', locator: 'Arrhenius approach: time to threshold against 1/T, life-time and maximum temperature of use (clause numbers from memory)' },
    { key: 'miner1945', locator: 'linear cumulative damage Σ n/N = 1 (applied to time over life at each temperature: common practice)' },
    { key: 'abramowitz1964', locator: 'Table 25.4 Gauss–Legendre abscissae and weights' },
  ],
  study: {
    inputs: { Lref: 'sealReferenceLife', Tref: 'sealReferenceTemperature', Ea: 'sealActivationEnergy', T: 'steadyTemperature', service: 'timeInService' },
    publishes: { life: 'sealLife', Teq: 'equivalentAgeingTemperature' },
    refuse: (values, bound) => bound.has('T') && values.mode !== 'constant'
      ? 'T (a constant temperature) came from the study, but this step ages over a temperature history: set mode = constant on this step, or give the step its own history'
      : undefined,
  },
});
