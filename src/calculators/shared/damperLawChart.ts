/**
 * The force–velocity chart of a damper law: one builder for every page that draws a law, so a
 * law looks the same wherever it travels. Kinks (knee) and the friction jump at v = 0 are drawn
 * sharp by inserting the law's breakpoints into the velocity grid.
 */
import { damperForce, lawBreakpoints, type DamperLaw } from '../../core/dampers/index.ts';
import type { ChartSpec } from '../types.ts';
import { q } from '../quantityText.ts';
import { describeLaw } from './damperLawInputs.ts';

/** Velocities and forces of the law from −vMax to +vMax (SI), with the law's breakpoints doubled. */
export function lawCurve(law: DamperLaw, vMax: number, omega = NaN, n = 201): { v: number[]; F: number[] } {
  const v = Array.from({ length: n }, (_, i) => -vMax + (2 * vMax * i) / (n - 1));
  for (const b of lawBreakpoints(law)) if (Math.abs(b) < vMax) v.push(b, b);
  v.sort((a, b) => a - b);
  // at a doubled v = 0 the friction law is drawn as a vertical jump from −F_f to +F_f
  const F = v.map((x, i) => (law.kind === 'coulomb' && x === 0 ? (v[i - 1] === 0 ? law.Ff : -law.Ff) : damperForce(law, x, omega)));
  return { v, F };
}

/**
 * Chart of the law's force against stroke velocity over ±vMax (positive = rebound). `omega` is
 * needed only by the hysteretic law (its viscous equivalent at that frequency).
 */
export function lawChart(law: DamperLaw, vMax: number, omega = NaN, id = 'fv'): ChartSpec {
  const { v, F } = lawCurve(law, vMax, omega);
  const Fmax = F.reduce((m, f) => Math.max(m, Math.abs(f)), 0);
  return {
    id, title: 'Force–velocity curve of the damper law',
    x: { label: 'Stroke velocity v (+ rebound)', kind: 'velocity' }, y: { label: 'Damper force F', kind: 'force' },
    series: [{ label: describeLaw(law), x: v, y: F, tone: 1 }],
    summary: `Force of the ${law.kind} law from −${q(vMax, 'velocity', 3)} to +${q(vMax, 'velocity', 3)} (positive = rebound); largest magnitude ${q(Fmax, 'force')}.`,
  };
}
