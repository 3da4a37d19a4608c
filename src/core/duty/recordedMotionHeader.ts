/**
 * Header of a recorded-motion CSV: which column is time, displacement, velocity or force, and
 * in which unit, from names such as "stroke [mm]" or "F (kN)" or from a separate units row.
 */
import { InputRangeError } from '../errors.ts';
import { findUnit, UnitError, type QuantityKind } from '../units/index.ts';

export type Role = 't' | 'x' | 'v' | 'F';
export const ROLE_KIND: Record<Role, QuantityKind> = { t: 'time', x: 'length', v: 'velocity', F: 'force' };
const ROLE_NAME: Record<Role, string> = { t: 'time', x: 'displacement', v: 'velocity', F: 'force' };

/** Column layouts a user can choose; 'auto' reads the header names. */
export type ColumnLayout = 'auto' | 'tx' | 'tv' | 'txF' | 'tvF';

export interface ColumnMap {
  /** Column index of each role present. */
  readonly index: Partial<Record<Role, number>>;
  /** Factor to SI of each role (unit from the header or units row; SI when none). */
  readonly factor: Partial<Record<Role, number>>;
  /** Roles whose unit was not stated (SI assumed). */
  readonly assumedSI: Role[];
  /** Header names of columns not used. */
  readonly ignored: string[];
}

const NAME_PATTERNS: [Role, RegExp][] = [
  ['t', /^(t|time|zeit|tid|temps|sec|seconds?)$/i],
  ['x', /^(x|z|disp|displacement|position|pos|stroke|travel|deflection)$/i],
  ['v', /^(v|vel|velocity|speed|xdot|dx\/dt)$/i],
  ['F', /^(f|force|load|fd|damper force)$/i],
];

/** Splits "stroke [mm]", "stroke (mm)" or "stroke/mm" into name and unit. */
export function splitNameUnit(cell: string): { name: string; unit: string } {
  const m = /^(.*?)\s*(?:\[([^\]]*)\]|\(([^)]*)\)|\/\s*([A-Za-z°µ%.·/²0-9]+))\s*$/.exec(cell.trim());
  if (!m) return { name: cell.trim(), unit: '' };
  return { name: (m[1] ?? '').trim(), unit: (m[2] ?? m[3] ?? m[4] ?? '').trim() };
}

function roleOf(name: string): Role | undefined {
  return NAME_PATTERNS.find(([, re]) => re.test(name.trim()))?.[0];
}

/**
 * Maps columns to roles and units.
 *
 * @param header header cells, or undefined when the file has none
 * @param units units-row cells, or undefined
 * @param layout user's choice; 'auto' needs header names (or three unnamed columns t, x, F)
 * @param ncols number of columns in the first data row
 * @param headerRow 1-based row number of the header, for messages
 * @throws InputRangeError naming the row and column when a unit is unknown or a role is missing
 */
export function mapColumns(header: string[] | undefined, units: string[] | undefined, layout: ColumnLayout, ncols: number, headerRow: number): ColumnMap {
  const index: Partial<Record<Role, number>> = {};
  const unitText: Partial<Record<Role, string>> = {};
  const ignored: string[] = [];
  if (layout !== 'auto') {
    const roles = layout.split('') as Role[];
    roles.forEach((r, i) => { index[r] = i; });
    if (ncols < roles.length) throw new InputRangeError('csv', `${ncols} columns`, undefined, '', `row ${headerRow + 1}: layout '${layout}' needs ${roles.length} columns`);
  } else if (header) {
    header.forEach((cell, i) => {
      const { name } = splitNameUnit(cell);
      const r = roleOf(name);
      if (r && index[r] === undefined) index[r] = i;
      else ignored.push(cell.trim() || `column ${i + 1}`);
    });
  } else if (ncols === 3) {
    index.t = 0; index.x = 1; index.F = 2;
  } else {
    throw new InputRangeError('csv', `${ncols} unnamed columns`, undefined, '', 'no header: choose the column layout (time, displacement or velocity, force)');
  }
  if (index.t === undefined) throw new InputRangeError('csv', header?.join(', ') ?? '', undefined, '', `row ${headerRow}: no time column (name it "time" or "t")`);
  if (index.x === undefined && index.v === undefined) throw new InputRangeError('csv', header?.join(', ') ?? '', undefined, '', `row ${headerRow}: no displacement or velocity column (name it e.g. "x [mm]" or "v [m/s]")`);
  const factor: Partial<Record<Role, number>> = {};
  const assumedSI: Role[] = [];
  for (const r of Object.keys(index) as Role[]) {
    const i = index[r]!;
    const fromHeader = header ? splitNameUnit(header[i] ?? '').unit : '';
    const text = (units?.[i] ?? '').trim().replace(/^[[(]|[\])]$/g, '') || fromHeader;
    unitText[r] = text;
    if (!text) { factor[r] = 1; assumedSI.push(r); continue; }
    try {
      const u = findUnit(ROLE_KIND[r], text);
      factor[r] = u.factor;
    } catch (e) {
      if (e instanceof UnitError) throw new InputRangeError('csv', text, undefined, '', `row ${units ? headerRow + 1 : headerRow}, column ${i + 1}: '${text}' is not a unit of ${ROLE_NAME[r]}`);
      throw e;
    }
  }
  return { index, factor, assumedSI, ignored };
}
