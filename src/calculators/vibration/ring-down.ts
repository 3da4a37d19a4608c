import { ComputationError, InputRangeError } from '../../core/errors.ts';
import { readTimeSeries } from '../../core/records/index.ts';
import { ringDown } from '../../core/vibration/index.ts';
import { choice, defineCalculator, num, optNum, text, type ChartSpec, type Values } from '../types.ts';
import { DEMO_RECORD, syntheticRingDown } from './ring-down.records.ts';
import { q } from '../quantityText.ts';
import { memoLast } from '../memoLast.ts';

function analyse(values: Values) {
  return analyseRecord(text(values, 'record'), num(values, 'column'), choice<'s' | 'ms'>(values, 'timeUnit'));
}

// the record is read and fitted once per change of the record, column or time unit, not on every
// keystroke in m or k (a 2 MB record took about 0.3 s to read)
const analyseRecord = memoLast((record: string, column: number, timeUnit: 's' | 'ms') => {
  const series = readTimeSeries(record, { input: 'record', column, timeScale: timeUnit === 'ms' ? 1e-3 : 1 });
  try {
    return { series, fit: ringDown(series.t, series.y) };
  } catch (e) {
    // the record itself is what cannot be analysed: say so at the record field
    if (e instanceof ComputationError) throw new InputRangeError('record', `${series.t.length} samples`, undefined, '', e.message);
    throw e;
  }
});

/** Every k-th point so a chart carries at most about 1500 points. */
function thin<T>(v: readonly T[]): T[] {
  const k = Math.max(1, Math.ceil(v.length / 1500));
  return v.filter((_, i) => i % k === 0);
}

const SDOF_D = syntheticRingDown({ wn: 10, zeta: 0.2, amplitude: 0.01, offset: 0, phase: 0, cycles: 4, samplesPerCycle: 40, noise: 0, jitter: 0, seed: 1, header: 't,x', delimiter: ',', digits: 9 });
const MOUNT = syntheticRingDown({ wn: 20, zeta: 0.05, amplitude: 2.5, offset: -0.8, phase: 1.1, cycles: 8, samplesPerCycle: 30, noise: 0, jitter: 0.5, seed: 5, header: 'time\taccel', delimiter: '\t', digits: 9 });
const NOISY = syntheticRingDown({ wn: 20, zeta: 0.02, amplitude: 1, offset: 0.3, phase: 0.2, cycles: 14, samplesPerCycle: 30, noise: 0.005, jitter: 0.5, seed: 2026, header: 't;x', delimiter: ';', digits: 5 });

/** Damping, frequencies and (with m or k) the damper coefficient from a pasted free-decay record. */
export const ringDownCalculator = defineCalculator({
  id: 'ring-down',
  title: 'Damping from a ring-down record',
  summary: 'Finds the peaks of a pasted free-decay record, fits the exponential decay and reports the damping ratio, damped and natural frequency, fit quality and, with the mass or stiffness, the damping coefficient.',
  inputs: [
    { key: 'record', label: 'Record (time, signal)', kind: 'text', default: DEMO_RECORD, maxLength: 2_000_000, rows: 8, required: true, help: 'Paste CSV: time in the first column, displacement, velocity or acceleration in another. Header lines, comma/semicolon/tab delimiters, decimal commas with ; or tab, and uneven sampling are accepted.' },
    { key: 'column', label: 'Signal column', kind: 'dimensionless', default: 2, min: 2, max: 50, help: 'Column number of the signal (time is column 1).' },
    { key: 'timeUnit', label: 'Time column unit', kind: 'choice', default: 's', options: [{ value: 's', label: 'seconds' }, { value: 'ms', label: 'milliseconds' }], help: 'Unit of the time column.' },
    { key: 'm', label: 'Moving mass (optional)', kind: 'mass', default: 10, min: 0, max: 1e7, minExclusive: true, optional: true, help: 'Gives the stiffness and damping coefficient.' },
    { key: 'k', label: 'Spring rate (optional)', kind: 'stiffness', default: 4000, min: 0, max: 1e10, minExclusive: true, optional: true, help: 'Without a mass: gives the mass and damping coefficient. With both: a check on the measured frequency.' },
  ],
  outputs: [
    { key: 'zeta', label: 'Damping ratio ζ', kind: 'fraction' },
    { key: 'delta', label: 'Logarithmic decrement δ', kind: 'dimensionless' },
    { key: 'fd', label: 'Damped frequency f_d', kind: 'frequency' },
    { key: 'fn', label: 'Natural frequency f_n', kind: 'frequency' },
    { key: 'peaks', label: 'Peaks used', kind: 'dimensionless', digits: 3 },
    { key: 'r2', label: 'Fit quality R² (ln amplitude against time)', kind: 'dimensionless', digits: 5 },
    { key: 'c', label: 'Damping coefficient c', kind: 'damping', optional: true, help: 'Needs m or k.' },
    { key: 'kEst', label: 'Stiffness k = mω_n²', kind: 'stiffness', optional: true, help: 'Needs m.' },
    { key: 'mEst', label: 'Mass m = k/ω_n²', kind: 'mass', optional: true, help: 'Needs k (and no m).' },
    { key: 'offset', label: 'Equilibrium offset of the record', kind: 'dimensionless', help: 'In the unit of the signal column.' },
  ],
  compute(values) {
    const { fit } = analyse(values);
    const m = optNum(values, 'm');
    const k = optNum(values, 'k');
    const mass = m ?? (k !== undefined ? k / (fit.wn * fit.wn) : undefined);
    const warnings: string[] = [];
    if (fit.r2 < 0.99) warnings.push(`R² = ${fit.r2.toFixed(4)}: the decay is not a clean exponential. Friction (straight-line decay), amplitude-dependent damping, beating between two modes or a drifting offset are likely; report the damping with its amplitude range.`);
    if (fit.peaks.length < 6) warnings.push(`Only ${fit.peaks.length} peaks: the estimate rests on few cycles; a longer or less damped record is better.`);
    if (m !== undefined && k !== undefined && Math.abs((m * fit.wn * fit.wn) / k - 1) > 0.1) {
      warnings.push(`The measured frequency with m = ${m.toPrecision(4)} kg implies k = ${(m * fit.wn * fit.wn).toPrecision(4)} N/m, more than 10 % from the k entered: check the mass (include attached parts) or the spring rate. c uses the mass.`);
    }
    return {
      outputs: {
        zeta: fit.zeta, delta: fit.delta, fd: fit.wd / (2 * Math.PI), fn: fit.wn / (2 * Math.PI), peaks: fit.peaks.length, r2: fit.r2,
        c: mass === undefined ? undefined : 2 * fit.zeta * mass * fit.wn,
        kEst: m === undefined ? undefined : m * fit.wn * fit.wn,
        mEst: m === undefined && k !== undefined ? mass : undefined,
        offset: fit.offset,
      },
      warnings,
    };
  },
  charts(values, result): ChartSpec[] {
    const { series, fit } = analyse(values);
    const t = thin(series.t);
    const y = thin(series.y);
    const env = t.map((tt) => fit.envelope(tt));
    return [{
      id: 'record',
      title: 'Record with the fitted decay envelope',
      x: { label: 'Time', kind: 'time' },
      y: { label: series.name ? `Signal (${series.name})` : 'Signal (as recorded)', kind: 'dimensionless' },
      series: [
        { label: 'record', x: t, y, style: 'thin', tone: 0 },
        { label: 'fitted envelope', x: t, y: env.map((e) => fit.offset + e), style: 'dash', tone: 1 },
        { label: 'envelope (lower)', legend: false, x: t, y: env.map((e) => fit.offset - e), style: 'dash', tone: 1 },
        { label: 'peaks used', x: fit.peaks.map((p) => p.t), y: fit.peaks.map((p) => p.y), style: 'points', tone: 3 },
      ],
      summary: `${series.t.length} samples over ${q(series.t[series.t.length - 1]! - series.t[0]!, 'time', 3)}; ${fit.peaks.length} peaks fitted with ζ = ${(result.outputs.zeta as number).toPrecision(3)}, f_d = ${(result.outputs.fd as number).toPrecision(4)} Hz, R² = ${fit.r2.toFixed(5)}.`,
    }];
  },
  verification: [
    {
      name: 'Free response m = 1 kg, k = 100 N/m, c = 4 N·s/m (ζ = 0.2), released from 10 mm',
      inputs: { record: SDOF_D, m: 1 },
      expected: { zeta: 0.2, fn: 10 / (2 * Math.PI), fd: (10 * Math.sqrt(0.96)) / (2 * Math.PI), c: 4, kEst: 100 },
      tolerance: 3e-3,
      why: 'noise-free closed-form record, 40 samples per cycle, time to 10 µs; parabola peak refinement errs by up to about 2e-3 at ζ = 0.2 depending on sample placement',
      source: { key: 'rao2017', locator: '§2.6 underdamped free response (section from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'TW-077 mount 10 kg on 4 kN/m, ζ = 0.05: tab-separated, offset −0.8, jittered sampling, k given',
      inputs: { record: MOUNT, k: 4000 },
      expected: { zeta: 0.05, fn: 20 / (2 * Math.PI), mEst: 10, c: 20 },
      tolerance: 2e-3,
      why: 'noise-free closed-form record with ±25 % timing jitter; parabola refinement error varies with sample placement',
      source: { key: 'rao2017', locator: '§2.6.3 logarithmic decrement (section from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'Seeded noisy record: ζ = 0.02, noise 0.5 % of the first peak, offset 0.3',
      inputs: { record: NOISY },
      expected: { zeta: 0.02, fn: 20 / (2 * Math.PI) },
      tolerance: 0.02,
      why: 'noise of 0.5 % of the first peak; the acceptance of this method is ζ within 2 %',
      source: { key: 'rao2017', locator: '§2.6.3 (from memory)' },
      provenance: 'closed form',
    },
  ],
  sources: [
    { key: 'rao2017', locator: '§2.6.3 logarithmic decrement (from memory)' },
    { key: 'press2007', locator: '§15.2 weighted straight-line fit; §15.4 parabola fit at each peak' },
    { key: 'inman2014', locator: '§1.6 measurement of damping (from memory)' },
  ],
});
