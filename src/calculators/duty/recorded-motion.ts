import { MAX_POWER_BLOCKS, parseRecordedMotion, recordedMotion, type ColumnLayout } from '../../core/duty/index.ts';
import { formatPowerProfile } from '../../core/thermal/index.ts';
import { InputRangeError } from '../../core/errors.ts';
import type { DamperLaw } from '../../core/dampers/index.ts';
import { choice, defineCalculator, num, onlyWhen, optNum, text, type ChartSpec, type Values, type VerificationCase } from '../types.ts';
import { demoDynoRecord, kelvinVoigtRecord, sineRecord } from './recorded-motion.demo.ts';
import { LAW_LAYOUTS, loopCharts, loopInputs, loopOf, loopOutputs, loopResults } from './recorded-motion.loop.ts';
import { lawFromValues, lawInputs } from '../shared/damperLawInputs.ts';
import { q } from '../quantityText.ts';
import { memoLast, oncePerValues } from '../memoLast.ts';

type Analysis = { rec: ReturnType<typeof parseRecordedMotion>; r: ReturnType<typeof recordedMotion>; law?: DamperLaw | undefined; loop: ReturnType<typeof loopOf> };

// the record is parsed once per change of its text or layout, not on every keystroke in another
// field (a 2 MB record took about 0.3–0.5 s to parse); recordedMotion and loopOf only read it
const parseRecord = memoLast(parseRecordedMotion);

// compute and charts(values, result) see the same values object: analysed once
const analyse = oncePerValues((values: Values): Analysis => {
  const layout = choice<ColumnLayout | 'autoF'>(values, 'layout');
  const rec = parseRecord(text(values, 'csv'), layout === 'autoF' ? 'auto' : layout);
  if (layout === 'autoF' && !rec.F) throw new InputRangeError('layout', layout, undefined, '', 'the header names no force column: choose "from the header, force from the damper law" (auto), or tx / tv, and a damper law');
  // the law's inputs apply only under the layouts that may lack a force column (their `alsoWhen`)
  const law = (LAW_LAYOUTS as readonly string[]).includes(layout) ? lawFromValues(values) : undefined;
  const r = recordedMotion(rec, rec.F ? undefined : law, num(values, 'gapFactor'));
  const a = { rec, r, law, loop: loopOf(rec, r) };
  return a;
});

/** Keeps at most `max` points by striding (for charts only; energies use every sample). */
function stride(t: Float64Array, y: Float64Array, max = 1200): { x: number[]; y: number[] } {
  const step = Math.max(1, Math.ceil(t.length / max));
  const x: number[] = [];
  const out: number[] = [];
  for (let i = 0; i < t.length; i += step) { x.push(t[i]!); out.push(y[i]!); }
  return { x, y: out };
}

/** A recorded damper motion → instantaneous and mean power, energy per cycle, peaks. */
/** Below this many samples per cycle a differentiated velocity is warned about (power bias (2π/N)²/3 ≈ 0.13 % at 100). */
const MIN_SAMPLES_PER_CYCLE = 100;

export const recordedMotionCalculator = defineCalculator({
  id: 'recorded-motion',
  title: 'Damper power from a recorded motion',
  summary: 'Paste or upload a CSV of time with damper displacement or velocity (and force, if measured): instantaneous power, mean power, energy of the record and per cycle, peak force and velocity.',
  inputs: [
    { key: 'csv', label: 'Record (CSV)', kind: 'text', default: demoDynoRecord(), maxLength: 5_000_000, rows: 10, help: 'Header names such as "time [s]", "stroke [mm]" or "x (mm)", "v [m/s]", "force [kN]"; or a units row under the header. Delimiter , ; tab or spaces; lines starting with # are comments.' },
    { key: 'layout', label: 'Columns', kind: 'choice', options: [
      { value: 'autoF', label: 'from the header, force measured' }, { value: 'auto', label: 'from the header, force from the damper law' },
      { value: 'tx', label: 'time, displacement (law)' }, { value: 'tv', label: 'time, velocity (law)' },
      { value: 'txF', label: 'time, displacement, force' }, { value: 'tvF', label: 'time, velocity, force' },
    ], default: 'autoF', help: 'How to read the columns, and where the force comes from: a measured force column (the damper law is not asked for) or the damper law. Under "from the header, force from the damper law" a force column the header names is still used, with a warning.' },
    { key: 'gapFactor', label: 'Gap threshold (× median interval)', kind: 'dimensionless', default: 5, min: 1.5, max: 1000, help: 'A sampling interval longer than this starts a new segment; nothing is differentiated or integrated across a gap.' },
    // law inputs only where the force may come from the law (measured force: hidden, not printed)
    ...onlyWhen({ key: 'layout', is: LAW_LAYOUTS },
      lawInputs({ kinds: ['linear', 'power', 'coulomb', 'bilinear'], defaults: { law: 'linear', c: 1500, Fref: 800, vref: 1, alpha: 0.5 }, series: false }),
    ),
    ...loopInputs,
  ],
  outputs: [
    { key: 'P', label: 'Mean power', kind: 'power', help: 'Energy of the record divided by the time it covers (gaps excluded).',
      feeds: [
        { page: 'steady-temperature', input: 'P', label: 'Check damper body temperature' },
        { page: 'warm-up', input: 'P', label: 'Warm-up under this duty (its power profile, repeated)', with: { profile: 'profile' }, set: { power: 'profile', after: 'repeat' } },
      ] },
    { key: 'E', label: 'Energy of the record', kind: 'energy' },
    { key: 'duration', label: 'Time covered', kind: 'time' },
    { key: 'cycles', label: 'Cycles detected', kind: 'dimensionless', digits: 3 },
    { key: 'EperCycle', label: 'Mean energy per cycle', kind: 'energy', optional: true },
    { key: 'EperCycleMax', label: 'Largest energy in one cycle', kind: 'energy', optional: true },
    { key: 'Fpeak', label: 'Peak force', kind: 'force' },
    { key: 'vPeak', label: 'Peak velocity', kind: 'velocity' },
    { key: 'vRms', label: 'RMS velocity', kind: 'velocity' },
    { key: 'rowsUsed', label: 'Data rows used', kind: 'dimensionless', digits: 6 },
    { key: 'rowsRejected', label: 'Rows rejected', kind: 'dimensionless', digits: 6, help: 'Listed with their reasons in the warnings.' },
    { key: 'rowsSkipped', label: 'Blank and comment lines', kind: 'dimensionless', digits: 6 },
    { key: 'gaps', label: 'Gaps in the sampling', kind: 'dimensionless', digits: 6 },
    { key: 'forceSource', label: 'Force', kind: 'text' },
    { key: 'sampling', label: 'Sampling', kind: 'text' },
    ...loopOutputs,
  ],
  handoffs: [{ key: 'profile', help: `Power of the record averaged over at most ${MAX_POWER_BLOCKS} equal blocks of covered time (energy kept), for the warm-up page.`, maxLength: 6000 }],
  compute(values) {
    const { rec, r, law, loop } = analyse(values);
    const warnings: string[] = [];
    if (rec.F && law) warnings.push('The record has a measured force column: the chosen damper law is not used for the power (it is drawn over the measured loop). Choose "from the header, force measured" to hide it.');
    if (rec.rejected.length > 0) {
      const list = rec.rejected.slice(0, 8).map((b) => `row ${b.row}: ${b.reason}`).join('; ');
      warnings.push(`${rec.rejected.length} row${rec.rejected.length > 1 ? 's' : ''} rejected — ${list}${rec.rejected.length > 8 ? '; …' : ''}.`);
    }
    if (rec.columns.assumedSI.length) warnings.push(`No unit given for ${rec.columns.assumedSI.join(', ')}: SI assumed (s, m, m/s, N).`);
    if (rec.columns.ignored.length) warnings.push(`Columns not used: ${rec.columns.ignored.join(', ')}.`);
    if (r.segments.gaps) warnings.push(`${r.segments.gaps} gap${r.segments.gaps > 1 ? 's' : ''} in the sampling: the record is treated as ${r.segments.ranges.length} separate pieces.`);
    if (r.flipped) warnings.push('The recorded force had the opposite sign to the velocity (negative mean power), so its sign was reversed.');
    if (!rec.v) warnings.push('Velocity is differentiated from displacement: noise in the displacement raises the peaks; the energy is less sensitive.');
    // hand-off: block-averaged power (energy kept on any sampling); a block where stored energy was
    // returned (negative mean F·v) hands over 0 W, since the damper cannot take heat back
    const blocks = r.summary.profile!;
    const negative = blocks.P.filter((p) => p < 0).length;
    if (negative > 0) warnings.push(`${negative} of ${blocks.P.length} time blocks have a negative mean power (energy returned by a spring or gas force); the profile handed to the warm-up page takes them as 0 W.`);
    const profile = formatPowerProfile({ t: blocks.t, P: blocks.P.map((p) => Math.max(0, p)) });
    const ce = r.cycleEnergies;
    const s = r.segments;
    // the 3-point derivative of x = X sin ωt is low by about (ωh)²/6, the power (∝ v²) by (ωh)²/3
    const perCycle = ce.length > 0 ? rec.t.length / ce.length : Infinity;
    if (!rec.v && perCycle < MIN_SAMPLES_PER_CYCLE) {
      const bias = (2 * Math.PI / perCycle) ** 2 / 3;
      warnings.push(`Only ${perCycle.toPrecision(3)} samples per cycle: velocity differentiated from displacement reads low, the mean power by about ${(100 * bias).toPrecision(2)} % ((ωh)²/3 for a sine); sample at ${MIN_SAMPLES_PER_CYCLE} or more per cycle to keep it below about 0.13 %.`);
    }
    const even = s.dtMax - s.dtMin <= 1e-6 * s.dtMedian;
    const lr = loopResults(loop, rec.F !== undefined, optNum(values, 'loopTol'));
    warnings.push(...lr.warnings);
    return {
      outputs: {
        P: r.meanPower, E: r.E, duration: r.duration, cycles: ce.length,
        EperCycle: ce.length ? ce.reduce((a, b) => a + b, 0) / ce.length : undefined,
        EperCycleMax: ce.length ? ce.reduce((a, b) => Math.max(a, b), -Infinity) : undefined,
        Fpeak: r.Fpeak, vPeak: r.vPeak, vRms: r.vRms,
        rowsUsed: rec.t.length, rowsRejected: rec.rejected.length, rowsSkipped: rec.skipped, gaps: s.gaps,
        forceSource: rec.F ? 'measured' : 'from the chosen damper law',
        sampling: even ? `even, ${s.dtMedian.toPrecision(4)} s` : `uneven, ${s.dtMin.toPrecision(3)}–${s.dtMax.toPrecision(3)} s (median ${s.dtMedian.toPrecision(3)} s)`,
        ...lr.outputs,
      },
      warnings,
      handoff: { profile },
    };
  },
  charts(values, result): ChartSpec[] {
    const { rec, r, law, loop } = analyse(values);
    const vs = stride(r.t, r.v);
    const fs = stride(r.t, r.F);
    const ps = stride(r.t, r.p);
    return [
      { id: 'velocity', title: 'Damper velocity', x: { label: 'Time', kind: 'time' }, y: { label: 'Velocity', kind: 'velocity' },
        series: [{ label: 'velocity', x: vs.x, y: vs.y, style: 'thin', tone: 0 }],
        summary: `Velocity over ${q(r.duration, 'time', 3)}; peak ${q(r.vPeak, 'velocity', 3)}, RMS ${q(r.vRms, 'velocity', 3)}.` },
      { id: 'force', title: 'Damper force', x: { label: 'Time', kind: 'time' }, y: { label: 'Force', kind: 'force' },
        series: [{ label: 'force', x: fs.x, y: fs.y, style: 'thin', tone: 1 }],
        summary: `Force ${String(result.outputs.forceSource)}; peak ${q(r.Fpeak, 'force')}.` },
      { id: 'power', title: 'Instantaneous power', x: { label: 'Time', kind: 'time' }, y: { label: 'Power', kind: 'power' },
        series: [{ label: 'F·v', x: ps.x, y: ps.y, style: 'thin', tone: 2 }, { label: 'mean', x: [ps.x[0]!, ps.x[ps.x.length - 1]!], y: [r.meanPower, r.meanPower], style: 'dash', tone: 3 }],
        summary: `Instantaneous power F·v; mean ${q(r.meanPower, 'power')} over the record, ${q(r.E, 'energy')} in all.` },
      ...loopCharts(rec, r, loop, law),
    ];
  },
  // built on first use: the cases' synthetic records (~9,000 rows) cost tens of milliseconds
  // to write, and every page with a study open loads this definition without checking it
  get verification() { return (cases ??= verificationCases()); },
  sources: [
    { key: 'chopra2017', locator: 'eq. 3.8.1' },
    { key: 'fornberg1988', locator: 'three-point weights on uneven grids (from memory)' },
    { key: 'asce7_16', locator: '§17.8.5 eqs. 17.8-1, 17.8-2 effective stiffness and damping of prototype tests; §18.6 damping devices (from memory)' },
  ],
});

let cases: readonly VerificationCase[] | undefined;

function verificationCases(): VerificationCase[] {
  return [
    {
      name: 'Sinusoidal stroke ±25 mm at 1 Hz through a linear damper c = 1500 N·s/m: P = ½·c·ω²·X² (two cycles, 1 kHz)',
      inputs: { csv: sineRecord({ X: 0.025, f: 1, cycles: 2, rate: 1000, columns: 'tx' }), layout: 'auto', law: 'linear', c: 1500 },
      expected: { P: 0.5 * 1500 * (2 * Math.PI) ** 2 * 0.025 ** 2, EperCycle: Math.PI * 1500 * 2 * Math.PI * 0.025 ** 2, cycles: 1 },
      tolerance: 1e-4, why: 'second-order differentiation at 1000 samples per cycle: error ≈ (ωh)²/6 ≈ 7e-6',
      source: { key: 'chopra2017', locator: 'eq. 3.8.1, E_D = πcωX²' },
      provenance: 'published',
    },
    {
      name: 'Velocity record through a friction damper F_f = 200 N: 4·F_f·X per cycle (X = 10 mm, 2 Hz)',
      inputs: { csv: sineRecord({ X: 0.01, f: 2, cycles: 3, rate: 2000, columns: 'tv' }), layout: 'auto', law: 'coulomb', Ff: 200 },
      expected: { EperCycle: 8, P: 16 },
      tolerance: 1e-4, why: 'trapezoid on |v| with 1000 samples per cycle; kink at v = 0 costs ~1e-6',
      source: { key: 'chopra2017', locator: '§3.10 Coulomb friction, E_D = 4F_fX (from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'Measured force on an uneven time grid (±30 % jitter): mean power of a linear damper still ½·c·ω²·X²',
      inputs: { csv: sineRecord({ X: 0.02, f: 1.5, cycles: 3, rate: 1500, columns: 'txF', c: 2000, jitter: 0.3 }) },
      expected: { P: 0.5 * 2000 * (3 * Math.PI) ** 2 * 0.02 ** 2 },
      tolerance: 2e-3, why: 'trapezoid on an uneven grid over a non-integer number of samples: partial-cycle error ≈ 1e-3',
      source: { key: 'chopra2017', locator: 'eq. 3.8.1, E_D = πcωX² (mean power E_D·f)' },
      provenance: 'published',
    },
    {
      name: 'Power-law damper C = 800 N·(s/m)^0.5, α = 0.5, ±25 mm at 1.5 Hz: 50.911 W',
      inputs: { csv: sineRecord({ X: 0.025, f: 1.5, cycles: 3, rate: 3000, columns: 'tx' }), layout: 'auto', law: 'power', Fref: 800, vref: 1, alpha: 0.5 },
      expected: { P: 50.911 },
      tolerance: 2e-4, why: 'λ(0.5) closed form to 5 s.f.; |v|^0.5 kink at reversal limits the trapezoid to ~1e-5',
      source: { key: 'fema274', locator: '§9.3 fluid viscous devices, λ(α) (from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'Kelvin–Voigt loop k = 2e5 N/m, c = 5000 N·s/m, ±20 mm at 1.5 Hz: k_eff = k, E = πcωX², β_eff = cω/2k, F₀ = cωX',
      inputs: { csv: kelvinVoigtRecord({ k: 2e5, c: 5000, X: 0.02, f: 1.5, cycles: 4, perCycle: 400 }) },
      expected: { keff: 2e5, Eloop: Math.PI * 5000 * 3 * Math.PI * 0.02 ** 2, betaEff: (5000 * 3 * Math.PI) / (2 * 2e5), F0: 5000 * 3 * Math.PI * 0.02 },
      tolerance: 1e-4, why: '400 samples per cycle: trapezoid ∮F dx exact for kx and spectral for cẋ; extremes at the parabola vertex; F₀ interpolated to (ωh)²/8 ≈ 3e-5',
      source: { key: 'chopra2017', locator: '§3.8, eq. 3.8.1 E_D = πcωX² and the elliptical loop of a Kelvin–Voigt element (from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'Dry-friction loop (rectangle) F_f = 200 N, ±10 mm: E = 4·F_f·X, fullness 1, F₀ = F_f',
      inputs: { csv: kelvinVoigtRecord({ k: 0, c: 0, Ff: 200, X: 0.01, f: 2, cycles: 3, perCycle: 2000 }), layout: 'txF' },
      expected: { Eloop: 8, loopFullness: 1, F0: 200 },
      tolerance: 2e-3, why: 'the force jumps at the reversal between two samples: the trapezoid loses about one step of 2·F_f·Δx at each end, ≈ 1e-3',
      source: { key: 'chopra2017', locator: '§3.10 Coulomb friction, E_D = 4F_fX (from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'Pure spring loop k = 1 MN/m, ±50 mm at 0.5 Hz: k_eff = k (prototype-test definition) and no loop area',
      inputs: { csv: kelvinVoigtRecord({ k: 1e6, c: 1e-6, X: 0.05, f: 0.5, cycles: 3, perCycle: 400 }) },
      expected: { keff: 1e6, loopFullness: 0 },
      tolerance: 1e-6, why: 'the trapezoid closes kx exactly over a cycle; the vertex interpolation is exact for a sine sampled this finely to ~1e-8',
      source: { key: 'asce7_16', locator: '§17.8.5.1 eq. 17.8-1 effective stiffness (from memory)' },
      provenance: 'from memory',
    },
  ];
}
