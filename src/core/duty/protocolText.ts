/**
 * A test protocol as text: one row per block of cycles, `N, X, f, rest` (count, stroke amplitude,
 * frequency, rest after the block). Units may be given in a header line such as
 * "N, X [mm], f [Hz], rest [s]"; without one X is in m, f in Hz and rest in s. # starts a comment.
 */
import { readUnitRows } from '../thermal/unitRows.ts';
import type { ProtocolBlock } from './protocolHeating.ts';

/** Most rows (blocks) a protocol may hold. */
export const MAX_PROTOCOL_ROWS = 200;

/**
 * @param text the protocol rows
 * @param input the input key, for messages
 * @throws InputRangeError naming the input and the line for a row that is not four numbers
 * @example parseProtocol('# wind test\nN, X [mm], f [Hz], rest [s]\n2000, 10, 0.25, 0', 'protocol')[0] // { N: 2000, X: 0.01, f: 0.25, rest: 0 }
 * @source common practice, no source
 */
export function parseProtocol(text: string, input: string): ProtocolBlock[] {
  const rows = readUnitRows(text, input, [
    { name: 'cycles N', kind: 'dimensionless' }, { name: 'amplitude X', kind: 'length' },
    { name: 'frequency f', kind: 'frequency' }, { name: 'rest', kind: 'time' },
  ], MAX_PROTOCOL_ROWS).rows;
  return rows.map((r) => ({ N: r[0]!, X: r[1]!, f: r[2]!, rest: r[3]! }));
}
