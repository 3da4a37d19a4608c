/**
 * A handbook folder's own calculators in a site build (`<DAMPBOOK_CONTENT>/calculators/*.ts`).
 *
 * Pages (Vite, server side): src/calculators/teamSlot.ts is replaced by imports of the team's
 * files, so the registry holds them before any page renders; `dampbook/calculator` and
 * `dampbook/core` resolve to this checkout's entry points (one module instance with the tool).
 * Browser (esbuild, src/build/client-scripts.ts): the slot's `loadTeamDefinitions` becomes one
 * lazy chunk holding the team's calculators; the built-ins stay one chunk each (loaders.ts).
 */
import { relative, resolve } from 'node:path';
import type { Plugin as EsbuildPlugin } from 'esbuild';
import type { Plugin as VitePlugin } from 'vite';
import { ENTRY_POINTS, TOOL_ROOT, teamCalculatorFiles } from '../team/entryPoints.ts';

const SLOT = resolve(TOOL_ROOT, 'src', 'calculators', 'teamSlot.ts');
const contentDir = () => resolve(TOOL_ROOT, process.env.DAMPBOOK_CONTENT ?? 'content');

/** The slot's text with the team's files imported eagerly (server side; also the server-pass bundle, server-prebundle.ts). */
export function serverSlot(): string {
  const dir = contentDir();
  const files = teamCalculatorFiles(dir);
  return [
    ...files.map((f, i) => `import d${i} from ${JSON.stringify(f)};`),
    `export const teamDefinitions = [${files.map((f, i) => `{ file: ${JSON.stringify(relative(dir, f))}, definition: d${i} }`).join(', ')}];`,
    'export const loadTeamDefinitions = async () => [];',
  ].join('\n');
}

export function teamCalculatorsVite(): VitePlugin {
  return {
    name: 'dampbook:team-calculators',
    enforce: 'pre',
    resolveId: (id) => ENTRY_POINTS[id],
    load: (id) => (resolve(id.split('?')[0]!) === SLOT ? serverSlot() : undefined),
  };
}

const ALL = 'dampbook-team:all';

export function teamCalculatorsEsbuild(): EsbuildPlugin {
  return {
    name: 'dampbook-team-calculators',
    setup(b) {
      b.onResolve({ filter: /^dampbook\/(calculator|core)$/ }, (a) => ({ path: ENTRY_POINTS[a.path]! }));
      b.onResolve({ filter: /^dampbook-team:all$/ }, () => ({ path: 'all', namespace: 'dampbook-team' }));
      b.onLoad({ filter: /teamSlot\.ts$/ }, (a) => (resolve(a.path) !== SLOT ? undefined : {
        loader: 'ts',
        resolveDir: resolve(TOOL_ROOT, 'src', 'calculators'),
        contents: teamCalculatorFiles(contentDir()).length === 0
          ? 'export const teamDefinitions = [];\nexport const loadTeamDefinitions = async () => [];'
          : `export const teamDefinitions = [];\nexport const loadTeamDefinitions = () => import(${JSON.stringify(ALL)}).then((m) => m.default);`,
      }));
      b.onLoad({ filter: /.*/, namespace: 'dampbook-team' }, () => {
        const files = teamCalculatorFiles(contentDir());
        return { loader: 'js', resolveDir: contentDir(), contents: `${files.map((f, i) => `import d${i} from ${JSON.stringify(f)};`).join('\n')}\nexport default [${files.map((_, i) => `d${i}`).join(', ')}];` };
      });
    },
  };
}
