/**
 * Reads pasted rows of numbers whose columns are physical quantities, with the unit of each column
 * taken from a header line ("T [°C], v [m/s], F [kN]", "(…)" or "/…" as in the recorded-motion
 * reader). A column without a stated unit is SI (K for temperature). Every value is converted to
 * SI here, at the edge, so the fits see SI numbers only.
 */
import { InputRangeError } from '../errors.ts';
import { parseNumericCsv } from '../records/parseNumericCsv.ts';
import { splitNameUnit } from '../duty/recordedMotionHeader.ts';
import { findUnit, toSI, UnitError, type QuantityKind } from '../units/index.ts';

export interface UnitColumn {
  /** What the column holds, for messages ("temperature"). */
  readonly name: string;
  readonly kind: QuantityKind;
}

export interface UnitRows {
  /** Rows in SI, one number per column. */
  readonly rows: readonly (readonly number[])[];
  /** 1-based text line of each row. */
  readonly lines: readonly number[];
  /** The unit read for each column ('' when SI was assumed). */
  readonly units: readonly string[];
}

/**
 * @param text the rows; lines starting with #, % or // are comments
 * @param input the input key, for messages
 * @param columns the columns expected, in order (extra columns are refused)
 * @throws InputRangeError naming the input and the line or column when a row is not numbers, a
 *   header unit is not a unit of its column's kind, or a row has the wrong number of columns
 * @example readUnitRows('T [°C], nu [mm²/s]\n40, 32', 'table', [{ name: 'temperature', kind: 'temperature' }, { name: 'viscosity', kind: 'kinematicViscosity' }]).rows // [[313.15, 3.2e-5]]
 * @source common practice, no source
 */
export function readUnitRows(text: string, input: string, columns: readonly UnitColumn[], maxRows = 5000): UnitRows {
  const table = parseNumericCsv(text, { input, minColumns: columns.length, maxRows });
  if (table.columnCount !== columns.length) {
    throw new InputRangeError(input, `${table.columnCount} columns`, undefined, '', `line ${table.lines[0]}: rows need ${columns.length} columns (${columns.map((c) => c.name).join(', ')})`);
  }
  const header = table.header;
  if (header && header.length !== columns.length) {
    throw new InputRangeError(input, header.join(' ').slice(0, 40), undefined, '', `the header has ${header.length} cells for ${columns.length} columns: separate its cells as the rows are separated`);
  }
  const units = columns.map((_c, i) => (header ? splitNameUnit(header[i]!).unit : ''));
  const defs = columns.map((c, i) => {
    if (!units[i]) return undefined;
    try {
      return findUnit(c.kind, units[i]!);
    } catch (e) {
      if (e instanceof UnitError) throw new InputRangeError(input, units[i], undefined, '', `header column ${i + 1}: '${units[i]}' is not a unit of ${c.name}`);
      throw e;
    }
  });
  const rows = table.rows.map((r) => r.map((v, i) => (defs[i] ? toSI(v, defs[i]!) : v)));
  return { rows, lines: table.lines, units };
}
