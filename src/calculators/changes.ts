/**
 * Which calculators' results can differ in each core version: the machine-readable side of
 * CHANGELOG.md (one entry per `## x.y.z` section, kept so by test/calculators/changes.test.ts).
 * The core version is the package version, printed on every page and sheet and written into every
 * record; a record or study made with an older core is told which of these changes touch its
 * calculators (record replay, `dampbook calc --record`, `dampbook study run`, the record panel).
 * Add an entry for every change that can alter a result, with the ids of the calculators it touches.
 */

export interface ResultChange {
  /** Calculator ids whose results (outputs, warnings, accepted inputs) can differ. */
  readonly calculators: readonly string[];
  /** One line: what changed, as a reader of an old sheet needs to know it. */
  readonly what: string;
}

export interface VersionChanges {
  readonly version: string;
  readonly changes: readonly ResultChange[];
}

const BODY_PAGES = ['body-cooling', 'steady-temperature', 'power-rating', 'damping-fade', 'warm-up'];

/** Oldest first. */
export const RESULT_CHANGES: readonly VersionChanges[] = [
  { version: '0.1.0', changes: [] },
  {
    version: '0.2.0',
    changes: [
      { calculators: ['road-power', 'forced-response', 'damper-simulation', 'energy-per-cycle', 'harmonic-duty', 'recorded-motion', 'tmd-tuning', 'warm-up', 'damping-fade'], what: 'the page converts hidden fields when the unit system changes (US results of 0.1.0 could be wrong)' },
      { calculators: BODY_PAGES, what: 'vertical bodies: free convection by the all-range Churchill–Chu correlation (h up to about a third higher below Ra = 1e9)' },
      { calculators: ['power-rating'], what: 'new outputs rated and Qmax; a warning when Q(T_max) ≤ 0' },
      { calculators: ['warm-up'], what: 'body model integrated piecewise by Dormand–Prince between switching times (tLimitBody and mean power change); UA and 700 K warnings' },
      { calculators: ['sdof'], what: 'cycle-cap warning threshold, no Q for critical or overdamped systems, one energy-audit closure value' },
      { calculators: ['recorded-motion'], what: 'long records no longer overflow; a sampling-rate warning with the expected bias' },
      { calculators: ['steady-temperature', 'damping-fade'], what: 'every equilibrium is a checked root (a bracketed jump is refused)' },
      { calculators: ['harmonic-duty', 'damper-simulation'], what: 'warning texts corrected (hysteretic and power-law α < 1)' },
    ],
  },
  {
    version: '0.3.0',
    changes: [
      { calculators: ['energy-per-cycle', 'damper-simulation', 'harmonic-duty', 'recorded-motion', 'road-power'], what: 'one set of damper-law inputs: power law as Fref at vref, α in [0.05, 2], new bilinear and hysteretic defaults' },
      { calculators: ['energy-per-cycle', 'damper-simulation', 'harmonic-duty'], what: 'optional series stiffness ks (Maxwell model) in the results' },
      { calculators: ['recorded-motion'], what: 'loop metrics of a measured force; the default layout is now autoF (force measured)' },
      { calculators: ['damper-simulation'], what: 'peaks found on the dense output (up to 0.48 % higher) and tolerances scaled by the driven amplitude' },
      { calculators: ['ring-down'], what: 'the heavy-damping refusal quotes where its guard trips' },
      { calculators: ['damping-fade'], what: 'fade law choice, fluids and new outputs; old keys keep their results' },
    ],
  },
  {
    version: '0.4.0',
    changes: [
      { calculators: ['road-power'], what: 'integrals on shared frequency points (below 1e-8 relative); motion ratio MR, ISO 2631-1 comfort and damping optima' },
      { calculators: ['impact'], what: 'load cases and stops sharing a load: E, P and forces are per stop (unchanged for n = 1); ends is a choice' },
      { calculators: BODY_PAGES, what: 'ends is a yes/no choice (an old 0/1 number is read with a note); optional mounts, sun and two nodes (defaults unchanged)' },
      { calculators: ['structural-dampers'], what: 'optional property factors lamMax, lamMin (default 1: unchanged) and their bound outputs' },
      { calculators: ['road-power', 'random-duty'], what: 'Gaussian mean power of the bilinear law with a relative tolerance (below 1e-9 relative)' },
    ],
  },
  {
    version: '0.5.0',
    changes: [
      { calculators: ['sdof'], what: 'energy audit by an exact step map and one Gauss–Legendre step integral: closure about 1e-14 (was about 1e-12); chart samples move below 1e-13 relative' },
      { calculators: ['road-power'], what: 'power-against-speed chart log–log, 60 speeds, power-law points interpolated within 1 % (chart only; outputs unchanged)' },
      { calculators: ['sdof'], what: 'energy audit of heavily overdamped steps on graded panels: closure 3e-14 where it read up to 0.88 (ζ ≈ 1.6e4); closure stated as 1e-13 when smaller (rounding level); other outputs unchanged' },
      { calculators: ['energy-per-cycle', 'harmonic-duty', 'storey-dampers', 'structural-dampers', 'test-protocol'], what: 'bilinear-law energy per cycle integrated in units of the peak force (below 1e-13 relative for normal inputs); a vanishing amplitude answers instead of hanging' },
      { calculators: ['road-power'], what: 'variances in closed form by residues (Mellin transform of the rational gains), quadrature only as the fallback: values move in about the 1e-8 relative place, quadError states the closed form\'s bound (about 1e-13), band names the method; chart points move up to the 1e-4 of its table' },
    ],
  },
  {
    version: '0.5.1',
    changes: [
      { calculators: ['energy-per-cycle', 'harmonic-duty', 'storey-dampers', 'structural-dampers', 'test-protocol'], what: 'bilinear-law energy per cycle in closed form instead of quadrature: values move below 1e-15 relative (the quadrature agreed to about 4e-16); series-stiffness results with a bilinear law and their charts now take milliseconds' },
    ],
  },
  {
    version: '0.5.2',
    changes: [
      { calculators: ['warm-up', 'damping-fade'], what: 'body-model and two-node runs: each power segment starts at the step the last one ended with, and a one-node segment ends once the temperature has settled within the integrator tolerance of its equilibrium (held there, within 5e-8 K); results move at the integrator tolerance (below 2e-7 relative on 800 random inputs, closures at round-off level); stiff bodies of small heat capacity that were refused now answer' },
      { calculators: ['damper-simulation', 'warm-up', 'damping-fade'], what: 'the integrator stretches a step by up to 1 % to land on the end of a run instead of leaving a sliver (which could stop a run with a step-size underflow); results move by 1e-12 relative or less on 84 random runs (more only for motions far below the 1 nm tolerance floor)' },
    ],
  },
];

/** -1, 0 or 1 as a is older than, the same as or newer than b (x.y.z, numerically; a suffix is ignored). */
export function compareVersions(a: string, b: string): number {
  const pa = a.split(/[-+]/)[0]!.split('.').map(Number);
  const pb = b.split(/[-+]/)[0]!.split('.').map(Number);
  for (let i = 0; i < 3; i++) {
    const d = (pa[i] ?? 0) - (pb[i] ?? 0);
    if (d !== 0) return d < 0 ? -1 : 1;
  }
  return 0;
}

export interface ChangeNote { readonly version: string; readonly calculators: readonly string[]; readonly what: string }

/**
 * The changes after core `from` up to and including core `to` that touch any of `calculators`,
 * oldest first, each with the touched ids among them.
 * @example changesSince('0.3.0', '0.4.0', ['impact']).length // 1
 */
export function changesSince(from: string, to: string, calculators: readonly string[]): ChangeNote[] {
  return RESULT_CHANGES.filter((v) => compareVersions(v.version, from) > 0 && compareVersions(v.version, to) <= 0).flatMap((v) =>
    v.changes.map((c) => ({ version: v.version, calculators: c.calculators.filter((id) => calculators.includes(id)), what: c.what })).filter((c) => c.calculators.length > 0));
}

/**
 * Lines for a reader of a record or study made with core `from`, run now with core `to`: each
 * change since then that touches its calculators, or why none can be listed.
 */
export function changeLines(from: string, to: string, calculators: readonly string[]): string[] {
  const order = compareVersions(from, to);
  if (order === 0) return [];
  if (order > 0) return [`Made with core ${from}, newer than this handbook's ${to}: changes after ${to} are not known here.`];
  const notes = changesSince(from, to, calculators);
  if (notes.length === 0) return [`No change between core ${from} and ${to} touches ${calculators.join(', ')}.`];
  return notes.map((n) => `Core ${n.version} changed ${n.calculators.join(', ')}: ${n.what}.`);
}
