/**
 * Every calculator, by id. Each domain keeps its own list so parallel work does not collide;
 * this file only joins them. Add a calculator to its domain's list, not here.
 *
 * A team handbook adds its own calculators (`<content>/calculators/*.ts`) with
 * `setTeamCalculators`: the CLI after loading them (src/team/loadRegistry.ts), the site build
 * through teamSlot.ts. An id that a built-in (or another team file) already has is refused.
 */
import { vibrationCalculators } from './vibration/index.ts';
import { dutyCalculators } from './duty/index.ts';
import { thermalCalculators } from './thermal/index.ts';
import { teamDefinitions } from './teamSlot.ts';
import { checkTeamDefinition } from './teamDefinition.ts';
import type { CalculatorDefinition } from './types.ts';

/** Domains group the calculators (pages, CLI listing); the browser loads single calculators (loaders.ts). */
export const domains = { vibration: vibrationCalculators, duty: dutyCalculators, thermal: thermalCalculators } as const;
export type Domain = keyof typeof domains;

const all: CalculatorDefinition[] = Object.values(domains).flat();
/** Built-ins first, then a team's own calculators once added (the same array, so importers see them). */
export const calculators: readonly CalculatorDefinition[] = all;

const builtIn = new Set(all.map((c) => c.id));
const byId = new Map(all.map((c) => [c.id, c]));
if (byId.size !== all.length) throw new Error('registry: duplicate calculator id');
/** Team calculator id → the file it came from (for clash messages and `list`). */
const teamFiles = new Map<string, string>();

/**
 * Makes `entries` the team's calculators, replacing any earlier handbook's (one handbook folder
 * at a time: a process that loads two folders in turn sees only the second's). Each entry is a
 * file and its default export; a value that is not a calculator definition, or an id already
 * taken (a built-in, another file of the same handbook), throws a TeamCalculatorError naming the
 * file, and the registry is left as it was.
 */
export function setTeamCalculators(entries: readonly { readonly file: string; readonly definition: unknown }[]): CalculatorDefinition[] {
  const mine = new Map<string, string>();
  const defs = entries.map(({ file, definition }) => {
    const def = checkTeamDefinition(file, definition, (id) => (builtIn.has(id) ? 'a built-in calculator' : mine.has(id) ? `the team calculator in ${mine.get(id)}` : undefined));
    mine.set(def.id, file);
    return def;
  });
  for (const id of teamFiles.keys()) byId.delete(id);
  all.splice(builtIn.size);
  teamFiles.clear();
  for (const def of defs) { byId.set(def.id, def); teamFiles.set(def.id, mine.get(def.id)!); all.push(def); }
  return defs;
}

/** The file a team calculator came from, or undefined for a built-in. */
export function teamFileOf(id: string): string | undefined {
  return teamFiles.get(id);
}

setTeamCalculators(teamDefinitions);

export function getCalculator(id: string): CalculatorDefinition | undefined {
  return byId.get(id);
}

export function calculatorIds(): string[] {
  return calculators.map((c) => c.id);
}
