/**
 * The stable entry points of the tool (package.json "exports") as files of this checkout: a team
 * calculator's `import … from 'dampbook/core'` resolves here whether its folder sits inside the
 * project, beside it or in /tmp. Used by the CLI loader (loadRegistry.ts) and the site build
 * (src/build/team-calculators.ts), so both resolve the same file and share one module instance
 * (an InputRangeError thrown by a team calculator is the CLI's InputRangeError).
 */
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

/** The project root (this file is src/team/entryPoints.ts). */
export const TOOL_ROOT = resolve(fileURLToPath(new URL('../..', import.meta.url)));

export const ENTRY_POINTS: Readonly<Record<string, string>> = {
  'dampbook/calculator': join(TOOL_ROOT, 'src', 'calculators', 'api.ts'),
  'dampbook/core': join(TOOL_ROOT, 'src', 'core', 'index.ts'),
};

/** The folder of a handbook's own calculators. */
export const CALCULATOR_FOLDER = 'calculators';

/**
 * `<content>/calculators/*.ts` in name order (files starting with _ are helpers, not
 * calculators, as with pages); none when the folder is absent.
 */
export function teamCalculatorFiles(content: string): string[] {
  const dir = resolve(content, CALCULATOR_FOLDER);
  if (!existsSync(dir) || !statSync(dir).isDirectory()) return [];
  return readdirSync(dir).filter((n) => n.endsWith('.ts') && !n.endsWith('.d.ts') && !n.startsWith('_')).sort().map((n) => join(dir, n));
}
