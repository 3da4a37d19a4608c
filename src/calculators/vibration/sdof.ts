import {
  criticalDamping, dampedFrequency, dampingRatio, dampingRegime, energyAudit, energyHistory, logDecrementFromZeta,
  naturalFrequency, qualityFactor, responseWindow,
} from '../../core/vibration/index.ts';
import { defineCalculator, num, type ChartSpec, type Values } from '../types.ts';
import { q } from '../quantityText.ts';

function oscillator(values: Values) {
  return { m: num(values, 'm'), k: num(values, 'k'), c: num(values, 'c'), x0: num(values, 'x0'), v0: num(values, 'v0') };
}


/** Samples of the energy audit, shared by the results and the chart (one closure value on the page). */
const AUDIT_SAMPLES = 401;
/** The smallest closure the page states: 401 steps of a recurrence round at about 1e-14 each. */
const CLOSURE_FLOOR = 1e-13;
/** Free vibration of a mass–spring–viscous-damper system: frequencies, damping, regime, energy. */
export const sdofCalculator = defineCalculator({
  id: 'sdof',
  title: 'Damped single-degree-of-freedom oscillator',
  summary: 'Natural and damped frequency, damping ratio, regime and free response of a mass on a spring with a viscous damper.',
  inputs: [
    { key: 'm', label: 'Moving mass', kind: 'mass', default: 10, min: 1e-6, max: 1e7, required: true, help: 'Mass carried by the spring and damper.' },
    { key: 'k', label: 'Spring rate', kind: 'stiffness', default: 4000, min: 1e-6, max: 1e10, required: true, help: 'Linear stiffness at the damper, N/m.' },
    { key: 'c', label: 'Damping coefficient', kind: 'damping', default: 40, min: 1e-9, max: 1e9, required: true, help: 'Linear viscous coefficient at the damper.' },
    { key: 'x0', label: 'Initial displacement', kind: 'length', default: 0.01, min: -10, max: 10, help: 'Release position measured from static equilibrium.' },
    { key: 'v0', label: 'Initial velocity', kind: 'velocity', default: 0, min: -100, max: 100, help: 'Velocity at release.' },
  ],
  outputs: [
    { key: 'wn', label: 'Natural frequency ωₙ', kind: 'angularFrequency' },
    { key: 'fn', label: 'Natural frequency fₙ', kind: 'frequency' },
    { key: 'zeta', label: 'Damping ratio ζ', kind: 'fraction' },
    { key: 'ccr', label: 'Critical damping coefficient', kind: 'damping' },
    { key: 'wd', label: 'Damped natural frequency', kind: 'angularFrequency', help: '0 unless underdamped.' },
    { key: 'logdec', label: 'Logarithmic decrement δ', kind: 'dimensionless', optional: true, help: 'Underdamped only.' },
    { key: 'Q', label: 'Quality factor Q', kind: 'dimensionless', optional: true, help: 'Underdamped only: 1/(2ζ), the sharpness of the resonance.' },
    { key: 'regime', label: 'Regime', kind: 'text' },
    { key: 'E0', label: 'Initial energy', kind: 'energy' },
    { key: 'closure', label: 'Energy audit closure', kind: 'dimensionless', digits: 2, help: 'max |E_k + E_s + E_D − E_0| / E_0 over the plotted window. Read 1e-13 when smaller: below that it is rounding of double precision, and the last bits of an input (a mass typed in lb) move it.' },
  ],
  compute(values) {
    const p = oscillator(values);
    const wn = naturalFrequency(p.m, p.k);
    const zeta = dampingRatio(p.m, p.k, p.c);
    const regime = dampingRegime(zeta);
    const window = responseWindow(wn, zeta);
    const audit = energyAudit(p, window, AUDIT_SAMPLES); // on the chart's samples: one closure for the page
    // the window is capped at 30 periods where the decay to 1 % would take longer (ζ < ln 100/(60π) ≈ 2.44 %)
    const capped = zeta < 1 && Math.log(100) / (zeta * wn) > window * (1 + 1e-12);
    return {
      outputs: {
        wn,
        fn: wn / (2 * Math.PI),
        zeta,
        ccr: criticalDamping(p.m, p.k),
        wd: regime === 'underdamped' ? dampedFrequency(wn, zeta) : 0,
        logdec: regime === 'underdamped' ? logDecrementFromZeta(zeta) : undefined,
        Q: regime === 'underdamped' ? qualityFactor(zeta) : undefined,
        regime,
        E0: audit.initial,
        // below 1e-13 the figure is double-precision rounding that moves with the last bits of an input
        closure: Math.max(audit.closure, CLOSURE_FLOOR),
      },
      warnings: capped ? ['ζ below about 2.4 %: the plotted window is capped at 30 cycles, before the motion has decayed to 1 %.'] : [],
    };
  },
  charts(values, result): ChartSpec[] {
    const p = oscillator(values);
    const wn = result.outputs.wn as number;
    const zeta = result.outputs.zeta as number;
    const h = energyHistory(p, responseWindow(wn, zeta), AUDIT_SAMPLES);
    const series: ChartSpec['series'][number][] = [{ label: 'x(t)', x: h.t, y: h.x, tone: 0 }];
    if (zeta < 1) {
      const wd = result.outputs.wd as number;
      const b = p.v0 + zeta * wn * p.x0;
      const amp = Math.hypot(p.x0, b / wd);
      const env = h.t.map((t) => amp * Math.exp(-zeta * wn * t));
      series.push({ label: 'decay envelope', x: h.t, y: env, style: 'dash', tone: 1 });
      series.push({ label: 'envelope (lower)', legend: false, x: h.t, y: env.map((e) => -e), style: 'dash', tone: 1 });
    }
    const tEnd = h.t[h.t.length - 1] ?? 0;
    const peak = h.x.reduce((a, x) => Math.max(a, Math.abs(x)), 0);
    return [
      {
        id: 'response',
        title: 'Free response',
        x: { label: 'Time', kind: 'time' },
        y: { label: 'Displacement', kind: 'length' },
        series,
        summary: `Free response over ${q(tEnd, 'time', 3)}: largest displacement ${q(peak, 'length', 3)}, ${String(result.outputs.regime)} (ζ = ${zeta.toPrecision(3)}).`,
      },
      {
        id: 'energy',
        title: 'Energy balance',
        x: { label: 'Time', kind: 'time' },
        y: { label: 'Energy', kind: 'energy' },
        series: [
          { label: 'kinetic', x: h.t, y: h.kinetic, tone: 0 },
          { label: 'spring', x: h.t, y: h.spring, tone: 2 },
          { label: 'dissipated', x: h.t, y: h.dissipated, tone: 3 },
          { label: 'sum', x: h.t, y: h.total, style: 'dash', tone: 4 },
        ],
        summary: `Initial energy ${q(h.initial, 'energy')}; kinetic + spring + dissipated stays equal to it within ${(result.outputs.closure as number).toExponential(1)} (relative) over the window.`,
      },
    ];
  },
  verification: [
    {
      name: 'Issue contract case: 10 kg on 4 kN/m with 40 N·s/m',
      inputs: { m: 10, k: 4000, c: 40 },
      expected: { wn: 20, zeta: 0.1, ccr: 400, regime: 'underdamped', Q: 5 },
      tolerance: 1e-12,
      why: 'closed form, same arithmetic',
      source: { key: 'rao2017', locator: '§2.6 (section from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'Motorcycle shock absorber: ¼ amplitude in half a cycle, 2 s damped period, 200 kg',
      inputs: { m: 200, k: 2358.3, c: 554.5 },
      expected: { wn: 3.4339, zeta: 0.4037, logdec: 2.7726 },
      tolerance: 5e-4,
      why: 'published statement; values carried to 4–5 s.f.',
      source: { key: 'rao2017', locator: 'ch. 2, motorcycle shock-absorber design example (example number from memory)' },
      provenance: 'published',
    },
    {
      name: 'Small damped spring-mass: 49.2 g, 857.8 N/m, 0.11 kg/s',
      inputs: { m: 0.0492, k: 857.8, c: 0.11 },
      expected: { wn: 132.0, fn: 21.0, ccr: 12.99, zeta: 0.00847 },
      tolerance: 3e-3,
      why: 'book values to 3 significant figures',
      source: { key: 'inman2014', locator: 'ch. 1 worked example (example number from memory)' },
      provenance: 'from memory',
    },
  ],
  sources: [
    { key: 'rao2017', locator: '§2.6 Free vibration with viscous damping (from memory)' },
    { key: 'inman2014', locator: '§1.3 (from memory)' },
  ],
});
