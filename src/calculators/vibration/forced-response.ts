import { displacementPeak, forcedResponse, magnificationFactor, relativeMotionRatio, transmissibility, type Excitation } from '../../core/vibration/index.ts';
import { choice, defineCalculator, num, type ChartSpec, type Values } from '../types.ts';

const TAU = 2 * Math.PI;
const K1 = 4 * Math.PI ** 2; // 1 kg on this spring has f_n = 1 Hz, so f in Hz equals r

function params(values: Values) {
  const excitation = choice<Excitation>(values, 'excitation');
  return {
    m: num(values, 'm'), k: num(values, 'k'), c: num(values, 'c'), f: num(values, 'f'), excitation,
    amplitude: num(values, excitation === 'force' ? 'F0' : 'Y'),
  };
}

/** Log-spaced frequency ratios covering the operating point and two decades around resonance. */
function ratios(rOp: number): number[] {
  const lo = Math.log10(rOp > 0 ? Math.min(0.1, rOp / 2) : 0.1);
  const hi = Math.log10(Math.max(10, rOp * 2));
  return Array.from({ length: 241 }, (_, i) => 10 ** (lo + ((hi - lo) * i) / 240)).filter((r) => Math.abs(r - 1) > 1e-9);
}

/** Steady response to a harmonic force or base motion: amplitudes, phase, transmissibility, damper duty. */
export const forcedResponseCalculator = defineCalculator({
  id: 'forced-response',
  title: 'Forced harmonic response and isolation',
  summary: 'Steady amplitude, phase, transmissibility, damper stroke, damper velocity and mean damper power of a mass on a spring and viscous damper driven by a harmonic force or base motion.',
  inputs: [
    { key: 'm', label: 'Moving mass', kind: 'mass', default: 120, min: 0, max: 1e7, minExclusive: true, required: true, help: 'Mass carried by the spring and damper.' },
    { key: 'k', label: 'Spring rate', kind: 'stiffness', default: 2.4e5, min: 0, max: 1e10, minExclusive: true, required: true, help: 'Total stiffness of the mount or suspension.' },
    { key: 'c', label: 'Damping coefficient', kind: 'damping', default: 1200, min: 0, max: 1e9, required: true, help: 'Linear viscous coefficient; 0 for an undamped mount (then r = 1 is refused).' },
    { key: 'f', label: 'Excitation frequency', kind: 'frequency', default: 24.75, min: 0, max: 1e5, required: true, help: 'Frequency of the force or base motion (for a rotor: speed in rev/s).' },
    { key: 'excitation', label: 'Excitation', kind: 'choice', default: 'force', options: [{ value: 'force', label: 'Harmonic force on the mass' }, { value: 'base', label: 'Harmonic motion of the base' }], help: 'Force on the mass (machine on mounts) or displacement of the base (seat, instrument on a vibrating floor).' },
    { key: 'F0', label: 'Force amplitude F₀', kind: 'force', default: 180, min: 0, max: 1e9, required: true, when: { key: 'excitation', is: ['force'] }, help: 'Amplitude of the harmonic force (e.g. out-of-balance m·e·ω²).' },
    { key: 'Y', label: 'Base amplitude Y', kind: 'length', default: 0.002, min: 0, max: 10, required: true, when: { key: 'excitation', is: ['base'] }, help: 'Displacement amplitude of the base motion.' },
  ],
  outputs: [
    { key: 'r', label: 'Frequency ratio r = ω/ω_n', kind: 'dimensionless' },
    { key: 'zeta', label: 'Damping ratio ζ', kind: 'fraction' },
    { key: 'fn', label: 'Natural frequency f_n', kind: 'frequency' },
    { key: 'M', label: 'Magnification factor M', kind: 'dimensionless', help: '1/√((1−r²)² + (2ζr)²).' },
    { key: 'X', label: 'Mass amplitude X (absolute)', kind: 'length' },
    { key: 'phase', label: 'Phase lag of X behind the excitation', kind: 'angle' },
    { key: 'TR', label: 'Transmissibility T_R', kind: 'dimensionless', help: 'Force case: force to the base / F₀. Base case: X / Y.' },
    { key: 'Z', label: 'Damper stroke amplitude Z (relative)', kind: 'length',
      feeds: [{ page: 'harmonic-duty', input: 'X', label: 'Damper power under this stroke (other damper laws)', with: { f: 'f', c: 'c' }, set: { law: 'linear' } }] },
    { key: 'vrel', label: 'Damper velocity amplitude ωZ', kind: 'velocity' },
    { key: 'P', label: 'Mean damper power ½cω²Z²', kind: 'power',
      feeds: [{ page: 'steady-temperature', input: 'P', label: 'Check damper body temperature' }, { page: 'warm-up', input: 'P', label: 'Warm-up at this power', set: { power: 'steady' } }] },
    { key: 'Ft', label: 'Force through spring and damper', kind: 'force', help: 'Force case: T_R·F₀ (to the base). Base case: Z·√(k² + (cω)²) (to the mass).' },
  ],
  compute(values) {
    const p = params(values);
    const o = forcedResponse(p);
    const warnings: string[] = [];
    if (o.zeta < Math.SQRT1_2 && Math.abs(o.r - 1) < 0.25) warnings.push(`Operating within 25 % of resonance (r = ${o.r.toPrecision(3)}): the amplitude is set by damping and is sensitive to small changes in k, m and c.`);
    if (o.r > 1 && o.r < Math.SQRT2) warnings.push('Above resonance but below r = √2: the mount amplifies (T_R > 1); isolation needs r > √2.');
    if (o.r > Math.SQRT2 && o.zeta > 0.2) warnings.push('Isolation region: damping above ζ ≈ 0.2 raises transmissibility here; use the damping only to pass through resonance.');
    if (o.r > 0 && o.zeta < 0.01) warnings.push('Very light damping: a run-up through resonance will reach about 1/(2ζ) times the static deflection.');
    return {
      outputs: { r: o.r, zeta: o.zeta, fn: o.wn / TAU, M: o.M, X: o.X, phase: o.phase, TR: o.TR, Z: o.Z, vrel: o.vrel, P: o.P, Ft: o.Ft },
      warnings,
    };
  },
  charts(values, result): ChartSpec[] {
    const p = params(values);
    const zeta = result.outputs.zeta as number;
    const rOp = result.outputs.r as number;
    const rs = ratios(rOp);
    const safe = zeta > 0 ? rs : rs.filter((r) => Math.abs(r - 1) > 0.02);
    const mag = safe.map((r) => magnificationFactor(r, zeta));
    const tr = safe.map((r) => transmissibility(r, zeta));
    const series: ChartSpec['series'][number][] = [
      { label: 'magnification M = X/(F₀/k)', x: safe, y: mag, tone: 0 },
      { label: 'transmissibility T_R', x: safe, y: tr, tone: 1 },
    ];
    if (p.excitation === 'base') series.push({ label: 'relative motion Z/Y = r²M', x: safe, y: safe.map((r) => relativeMotionRatio(r, zeta)), style: 'dash', tone: 2 });
    series.push({ label: 'T_R = 1 (isolation below, r > √2)', x: [safe[0]!, safe[safe.length - 1]!], y: [1, 1], style: 'thin', tone: 4 });
    if (rOp > 0 && !(zeta === 0 && Math.abs(rOp - 1) < 1e-9)) {
      series.push({ label: 'operating point', x: [rOp, rOp], y: [result.outputs.M as number, result.outputs.TR as number], style: 'points', tone: 3 });
    }
    const peak = zeta > 0 && zeta < Math.SQRT1_2 ? displacementPeak(zeta) : undefined;
    const where = rOp > Math.SQRT2 ? 'inside the isolation region' : rOp > 1 ? 'between resonance and the isolation region' : 'below resonance';
    return [
      {
        id: 'transmissibility',
        title: 'Magnification and transmissibility against frequency ratio',
        x: { label: 'Frequency ratio r = ω/ω_n', kind: 'dimensionless', scale: 'log' },
        y: { label: 'Amplitude ratio', kind: 'dimensionless', scale: 'log' },
        series,
        markers: [{ x: 1, label: 'r = 1' }, { x: Math.SQRT2, label: 'r = √2: isolation above' }],
        summary: `At ζ = ${zeta.toPrecision(3)}${peak ? ` the displacement peak is M = ${peak.M.toPrecision(4)} at r = ${peak.r.toPrecision(4)}` : ' there is no displacement peak'}; all T_R curves pass through 1 at r = √2. The operating point r = ${rOp.toPrecision(3)} lies ${where}, with T_R = ${(result.outputs.TR as number).toPrecision(3)}.`,
      },
    ];
  },
  verification: [
    {
      name: 'ζ = 0.1 at r = 0.5 (f_n = 1 Hz, F₀ = k so X = M)',
      inputs: { m: 1, k: K1, c: 0.4 * Math.PI, f: 0.5, excitation: 'force', F0: K1 },
      expected: { r: 0.5, X: 1.321637, phase: (7.5946 * Math.PI) / 180, TR: 1.328229 },
      tolerance: 2e-5,
      why: 'independent evaluation of the closed forms (scipy.signal.freqresp agrees) to 7 s.f.; phase given to 5 s.f. in degrees',
      source: { key: 'rao2017', locator: '§3.4 magnification and phase, §9.10 transmissibility (sections from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'ζ = 0.1 at r = 2: M = 0.330409, T_R = 0.355862',
      inputs: { m: 1, k: K1, c: 0.4 * Math.PI, f: 2, excitation: 'force', F0: K1 },
      expected: { M: 0.330409, TR: 0.355862, phase: (172.4054 * Math.PI) / 180 },
      tolerance: 2e-6,
      why: 'closed form evaluated independently to 6 s.f.',
      source: { key: 'rao2017', locator: '§9.10 transmissibility (section from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'Any damping at r = √2: T_R = 1 exactly (ζ = 0.35)',
      inputs: { m: 1, k: K1, c: 1.4 * Math.PI, f: Math.SQRT2, excitation: 'force', F0: 1 },
      expected: { TR: 1 },
      tolerance: 1e-12,
      why: '(1 + 8ζ²)/(1 + 8ζ²) at r = √2; closed form, same arithmetic',
      source: { key: 'rao2017', locator: '§9.10 transmissibility (section from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'Exhaust fan, 40 kg at 1000 rpm on undamped mounts sized for T_R = 0.1 (k = 4 × 9969 N/m)',
      inputs: { m: 40, k: 4 * 9969, c: 0, f: 1000 / 60, excitation: 'force', F0: 100 },
      expected: { TR: 0.1, fn: 31.574 / TAU },
      tolerance: 1e-3,
      why: 'worked example values to 4–5 s.f.',
      source: { key: 'rao2017', locator: 'ch. 9, exhaust-fan isolation example (example number from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'Base excitation at resonance, ζ = 0.2: X/Y = √(1+0.16)/0.4, Z/Y = 2.5, P = ½cω²Z²',
      inputs: { m: 1, k: K1, c: 0.8 * Math.PI, f: 1, excitation: 'base', Y: 0.01 },
      expected: { TR: 2.692582, X: 0.02692582, Z: 0.025, vrel: TAU * 0.025, P: 0.5 * 0.8 * Math.PI * (TAU * 0.025) ** 2 },
      tolerance: 2e-6,
      why: 'closed form (table value 2.692582 to 7 s.f.)',
      source: { key: 'rao2017', locator: '§3.6 base excitation (section from memory)' },
      provenance: 'closed form',
    },
  ],
  sources: [
    { key: 'rao2017', locator: '§3.4 response to harmonic force, §3.6 base excitation, §9.10 vibration isolation (from memory)' },
    { key: 'chopra2017', locator: 'Eq. (3.8.1) energy dissipated per cycle (mean power = E_D·f)' },
  ],
  study: {
    inputs: { c: 'dampingCoefficient', f: 'strokeFrequency' },
    publishes: { P: 'meanPower', Z: 'strokeAmplitude' },
  },
});
