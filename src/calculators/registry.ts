/**
 * Every calculator, by id. Each domain keeps its own list so parallel work does not collide;
 * this file only joins them. Add a calculator to its domain's list, not here.
 *
 * A team handbook adds its own calculators (`<content>/calculators/*.ts`) with
 * `addTeamCalculators`: the CLI after loading them (src/team/loadRegistry.ts), the site build
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
 * Registers a team's calculators. Each entry is a file and its default export; a value that is
 * not a calculator definition, or an id already taken, throws a TeamCalculatorError naming the file.
 * Adding the same file's definition twice (a CLI command run twice in one process) is a no-op.
 */
export function addTeamCalculators(entries: readonly { readonly file: string; readonly definition: unknown }[]): CalculatorDefinition[] {
  const added: CalculatorDefinition[] = [];
  for (const { file, definition } of entries) {
    const def = checkTeamDefinition(file, definition, (id) => (builtIn.has(id) ? 'a built-in calculator' : teamFiles.has(id) && teamFiles.get(id) !== file ? `the team calculator in ${teamFiles.get(id)}` : undefined));
    if (byId.get(def.id) === def) continue;
    byId.set(def.id, def);
    teamFiles.set(def.id, file);
    if (!all.some((c) => c.id === def.id)) all.push(def); else all[all.findIndex((c) => c.id === def.id)] = def;
    added.push(def);
  }
  return added;
}

/** The file a team calculator came from, or undefined for a built-in. */
export function teamFileOf(id: string): string | undefined {
  return teamFiles.get(id);
}

addTeamCalculators(teamDefinitions);

export function getCalculator(id: string): CalculatorDefinition | undefined {
  return byId.get(id);
}

export function calculatorIds(): string[] {
  return calculators.map((c) => c.id);
}
