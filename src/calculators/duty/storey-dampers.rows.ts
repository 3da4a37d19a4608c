/**
 * Reads the per-storey rows of the storey-dampers page: one row per storey, bottom first, with the
 * unit of each column in a header line. Two layouts: a shear building (floor mass, storey
 * stiffness) whose mode is solved, or a known mode (floor mass, mode-shape value) with its period.
 */
import { InputRangeError, POSITIVE, requireInRange } from '../../core/errors.ts';
import { readUnitRows, type UnitColumn } from '../../core/thermal/index.ts';
import { MAX_STOREYS } from '../../core/vibration/index.ts';

export interface StoreyRow {
  /** Floor mass above the storey, kg; storey stiffness, N/m, or mode-shape value at that floor. */
  readonly m: number;
  readonly second: number;
  /** Storey height, m; dampers in the storey; brace angle, rad. */
  readonly h: number;
  readonly n: number;
  readonly theta: number;
}

const MASS: UnitColumn = { name: 'floor mass', kind: 'mass' };
const TAIL: readonly UnitColumn[] = [
  { name: 'storey height', kind: 'length' },
  { name: 'dampers in the storey', kind: 'dimensionless' },
  { name: 'brace angle', kind: 'angle' },
];
export const FRAME_COLUMNS: readonly UnitColumn[] = [MASS, { name: 'storey stiffness', kind: 'stiffness' }, ...TAIL];
export const MODE_COLUMNS: readonly UnitColumn[] = [MASS, { name: 'mode-shape value', kind: 'dimensionless' }, ...TAIL];

/**
 * @param layout 'frame' (second column a stiffness, > 0) or 'mode' (a mode-shape value)
 * @throws InputRangeError naming the input and the line of a bad row
 */
export function readStoreyRows(text: string, input: string, layout: 'frame' | 'mode'): StoreyRow[] {
  const t = readUnitRows(text, input, layout === 'frame' ? FRAME_COLUMNS : MODE_COLUMNS, MAX_STOREYS);
  if (t.rows.length < 1) throw new InputRangeError(input, 'no rows', undefined, '', 'give one row per storey, the ground storey first');
  return t.rows.map((r, i) => {
    const at = (what: string, fn: () => void) => {
      try { fn(); } catch (e) {
        if (e instanceof InputRangeError) throw new InputRangeError(input, r.join(', ').slice(0, 60), undefined, '', `line ${t.lines[i]}: ${what} — ${e.message}`);
        throw e;
      }
    };
    const [m, second, h, n, theta] = r as [number, number, number, number, number];
    at('floor mass', () => requireInRange('m', m, { min: 0, max: 1e10, minExclusive: true }, 'kg'));
    if (layout === 'frame') at('storey stiffness', () => requireInRange('k', second, { min: 0, max: 1e13, minExclusive: true }, 'N/m'));
    else at('mode-shape value', () => requireInRange('phi', second, { min: -1e6, max: 1e6 }, ''));
    at('storey height', () => requireInRange('h', h, { ...POSITIVE, max: 1000, maxExclusive: false }, 'm'));
    at('dampers', () => requireInRange('n', n, { min: 0, max: 1000 }, ''));
    if (!Number.isInteger(n)) throw new InputRangeError(input, n, undefined, '', `line ${t.lines[i]}: the damper count must be a whole number`);
    at('brace angle', () => requireInRange('theta', theta, { min: 0, max: Math.PI / 2, maxExclusive: true }, 'rad'));
    return { m, second, h, n, theta };
  });
}
