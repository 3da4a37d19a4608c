/**
 * The one place the CLI turns a calculator id into a definition (`calc`, `batch` and the batch
 * worker threads all come here), so a second source of calculators — a team's own folder — is
 * added in this file only and every command sees it the same way.
 */
import { calculatorIds, getCalculator } from '../calculators/registry.ts';
import type { CalculatorDefinition } from '../calculators/types.ts';
import { UsageError } from './args.ts';

/** The definition for `id`; a missing or unknown id is a UsageError listing the known ids. */
export function requireCalculator(command: string, id: string | undefined): CalculatorDefinition {
  if (!id) throw new UsageError(`${command} needs a calculator id: ${calculatorIds().join(', ')}`);
  const def = getCalculator(id);
  if (!def) throw new UsageError(`unknown calculator '${id}'; known: ${calculatorIds().join(', ')}`);
  return def;
}
