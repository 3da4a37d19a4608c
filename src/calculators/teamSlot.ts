/**
 * Where a team's own calculators (`<content>/calculators/*.ts`) enter a site build. This file is
 * the stand-in the CLI and the tests see (no team calculators); the site build replaces its text
 * with imports of the team's files (src/build/team-calculators.ts: Vite for the pages, esbuild
 * for the browser bundle), so the registry holds them before any page asks for one.
 */
import type { CalculatorDefinition } from './types.ts';

/** Each team file's default export, in file-name order (checked by the registry, not here). */
export const teamDefinitions: readonly { readonly file: string; readonly definition: unknown }[] = [];

/** The browser's one lazy chunk of team calculators (loaded only for an id the built-ins lack). */
export const loadTeamDefinitions: () => Promise<readonly CalculatorDefinition[]> = async () => [];
