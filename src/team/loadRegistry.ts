/**
 * A handbook folder's calculators for the CLI (and any command that takes `--content <dir>`):
 * `loadRegistry({ content })` loads `<content>/calculators/*.ts`, registers them beside the
 * built-ins (an id clash is refused with a message naming the file) and returns the registry.
 * A second call with another folder replaces the first folder's calculators.
 *
 * How a file outside the project is loaded: esbuild bundles it (with its own relative helpers and
 * any packages of the team's folder) and leaves `dampbook/calculator` and `dampbook/core` as
 * imports of this checkout's files, so the team code shares the CLI's module instances; the
 * bundle is imported from a temporary file (TypeScript of the tool is read by the tsx loader the
 * `dampbook` command runs under) and removed again.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { basename, join, relative } from 'node:path';
import { pathToFileURL } from 'node:url';
import { build, type Plugin } from 'esbuild';
import { calculators, getCalculator, setTeamCalculators } from '../calculators/registry.ts';
import { TeamCalculatorError } from '../calculators/teamDefinition.ts';
import type { CalculatorDefinition } from '../calculators/types.ts';
import { ENTRY_POINTS, teamCalculatorFiles } from './entryPoints.ts';

export interface Registry {
  /** Built-ins, then the handbook's own calculators. */
  readonly calculators: readonly CalculatorDefinition[];
  /** The handbook's own calculators only, in file-name order. */
  readonly team: readonly CalculatorDefinition[];
  get(id: string): CalculatorDefinition | undefined;
}

/** Resolves the stable entry points to this checkout's files, kept as imports (not bundled). */
const entryPoints: Plugin = {
  name: 'dampbook-entry-points',
  setup(b) {
    b.onResolve({ filter: /^dampbook\/(calculator|core)$/ }, (a) => ({ path: pathToFileURL(ENTRY_POINTS[a.path]!).href, external: true }));
    b.onResolve({ filter: /^dampbook(\/|$)/ }, (a) => ({ errors: [{ text: `'${a.path}' is not an entry point of the tool; import from 'dampbook/calculator' or 'dampbook/core'` }] }));
  },
};

async function loadFile(file: string, shown: string, tmp: string): Promise<unknown> {
  let code: string;
  try {
    const r = await build({ entryPoints: [file], bundle: true, format: 'esm', platform: 'node', target: 'node20', write: false, logLevel: 'silent', plugins: [entryPoints] });
    code = r.outputFiles[0]!.text;
  } catch (e) {
    const first = (e as { errors?: { text: string; location?: { line: number } | null }[] }).errors?.[0];
    throw new TeamCalculatorError(`${shown}: ${first ? `${first.location ? `line ${first.location.line}: ` : ''}${first.text}` : String(e)}`);
  }
  const out = join(tmp, `${basename(file, '.ts')}.mjs`);
  writeFileSync(out, code);
  try {
    return ((await import(pathToFileURL(out).href)) as { default?: unknown }).default;
  } catch (e) {
    throw new TeamCalculatorError(`${shown}: loading failed: ${e instanceof Error ? e.message.split('\n')[0] : String(e)}`);
  }
}

/**
 * Loads and registers the handbook's calculators (none when the folder has no calculators/).
 * @throws TeamCalculatorError naming the file: it does not compile, its default export is not a
 *   definition, or its id is a built-in's or another team file's
 */
export async function loadRegistry(options: { content: string }): Promise<Registry> {
  const files = teamCalculatorFiles(options.content);
  const entries: { file: string; definition: unknown }[] = [];
  if (files.length) {
    const tmp = mkdtempSync(join(tmpdir(), 'dampbook-team-'));
    try {
      for (const f of files) {
        const shown = relative(process.cwd(), f) || f;
        entries.push({ file: shown.startsWith('..') ? f : shown, definition: await loadFile(f, shown.startsWith('..') ? f : shown, tmp) });
      }
    } finally {
      rmSync(tmp, { recursive: true, force: true });
    }
  }
  const team = setTeamCalculators(entries);
  return { calculators, team, get: getCalculator };
}
