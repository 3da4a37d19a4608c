/**
 * The shape check a team's calculator file passes before it joins the registry. A team file is
 * TypeScript the type checker may never have seen (the folder sits outside this project), so the
 * registry checks at run time what the type of `defineCalculator` promises: an id of our form,
 * a title, inputs, outputs and a compute function. The rest (verification cases, bad input) is
 * checked by `dampbook check --content` (src/team/checkTeam.ts).
 */
import { DampbookError } from '../core/errors.ts';
import type { CalculatorDefinition } from './types.ts';

/** A team calculator file cannot be registered; the message names the file and the field. */
export class TeamCalculatorError extends DampbookError {
  override name = 'TeamCalculatorError';
}

const ID = /^[a-z0-9][a-z0-9-]*$/;

/**
 * @param taken returns what already holds an id ("a built-in calculator"), or undefined
 * @throws TeamCalculatorError naming the file and what is wrong
 */
export function checkTeamDefinition(file: string, value: unknown, taken: (id: string) => string | undefined): CalculatorDefinition {
  const fail = (what: string) => new TeamCalculatorError(`${file}: ${what}`);
  if (typeof value !== 'object' || value === null) throw fail('the default export is not a calculator definition (write export default defineCalculator({ … }))');
  const d = value as Partial<Record<keyof CalculatorDefinition, unknown>>;
  if (typeof d.id !== 'string' || !ID.test(d.id)) throw fail(`id: ${JSON.stringify(d.id)} is not an id (lower-case letters, digits and hyphens)`);
  const holder = taken(d.id);
  if (holder) throw fail(`id: '${d.id}' is already the id of ${holder}; give the team calculator its own id`);
  if (typeof d.title !== 'string' || d.title.trim() === '') throw fail('title: a calculator needs a title');
  if (!Array.isArray(d.inputs)) throw fail('inputs: a list of inputs is needed');
  if (!Array.isArray(d.outputs) || d.outputs.length === 0) throw fail('outputs: at least one output is needed');
  if (typeof d.compute !== 'function') throw fail('compute: a function is needed');
  if (!Array.isArray(d.verification)) throw fail('verification: a list of verification cases is needed');
  if (!Array.isArray(d.sources)) throw fail('sources: a list of sources is needed');
  return value as CalculatorDefinition;
}
