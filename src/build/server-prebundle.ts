/**
 * The pages' own TypeScript (core, calculators, studies, sheets, render helpers …), bundled for the
 * build's server pass by esbuild in one step and handed to Vite as finished files it leaves alone.
 *
 * Why: `astro build` bundles everything the pages import with Vite and rollup before it renders a
 * single page. For Dampbook that is some 320 modules of its own on top of what a plain Astro + MDX
 * site bundles; transforming them one by one, then parsing, linking and rendering them in rollup
 * was the largest part of the build's fixed extra time (issue: build ≤ 1.15× the plain baseline).
 * esbuild does the same bundle in a fraction of a second, and the server bundle is only ever run
 * once, to prerender the pages, then thrown away.
 *
 * What is bundled: every module under src/ that does not reach Astro or Vite (no `astro:` or
 * `virtual:` import, no `.astro` or CSS import, no `import.meta.env/url/glob`, transitively). The
 * rest (page and layout components, the page index and the page modules) stays with Vite and
 * imports the bundled modules. All of them are entry points of one esbuild run with code
 * splitting, so every module has exactly one instance (the registry, caches), as under Vite. A
 * handbook folder's own calculators are bundled with the team slot, as src/build/team-calculators.ts
 * does for Vite. Only `astro build` uses this; dev and the tests keep Vite's module graph.
 */
import { mkdirSync, readFileSync, readdirSync, rmSync, statSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import type { AstroIntegration } from 'astro';
import { build, type Plugin as EsbuildPlugin } from 'esbuild';
import type { Plugin as VitePlugin } from 'vite';
import { ENTRY_POINTS, TOOL_ROOT } from '../team/entryPoints.ts';
import { importSpecifiers } from './importSpecifiers.ts';
import { serverSlot } from './team-calculators.ts';

const SLOT = resolve(TOOL_ROOT, 'src', 'calculators', 'teamSlot.ts');
let serial = 0;

/** True when a module itself needs Vite or Astro (their virtual modules, components, CSS or import.meta). */
export function needsVite(text: string, specifiers: readonly string[]): boolean {
  return /import\.meta\.(env|url|glob)/.test(text)
    || specifiers.some((s) => s.startsWith('astro:') || s.startsWith('virtual:') || s.endsWith('.astro') || s.endsWith('.css') || s.includes('?'));
}

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((f) => {
    const p = join(dir, f);
    return statSync(p).isDirectory() ? sourceFiles(p) : p.endsWith('.ts') && !p.endsWith('.d.ts') ? [p] : [];
  });
}

/** The modules under `src` that reach neither Vite nor Astro, directly or through what they import. */
export function bundlableModules(src: string): string[] {
  const imports = new Map<string, string[]>();
  const vite = new Set<string>();
  for (const file of sourceFiles(src)) {
    const text = readFileSync(file, 'utf8');
    const specs = importSpecifiers(text);
    if (needsVite(text, specs)) vite.add(file);
    imports.set(file, specs.filter((s) => s.startsWith('.')).map((s) => resolve(dirname(file), s)));
  }
  // a module importing one that needs Vite needs it too (to a fixed point)
  for (let grew = true; grew;) {
    grew = false;
    for (const [file, deps] of imports) if (!vite.has(file) && deps.some((d) => vite.has(d))) { vite.add(file); grew = true; }
  }
  return [...imports.keys()].filter((f) => !vite.has(f)).sort();
}

/** The team slot with the handbook folder's calculators imported eagerly, as on the Vite side. */
function teamSlotEsbuild(): EsbuildPlugin {
  return {
    name: 'dampbook-server-team-slot',
    setup(b) {
      b.onResolve({ filter: /^dampbook\/(calculator|core)$/ }, (a) => ({ path: ENTRY_POINTS[a.path]! }));
      b.onLoad({ filter: /teamSlot\.ts$/ }, (a) => (resolve(a.path) === SLOT ? { loader: 'ts', resolveDir: dirname(SLOT), contents: serverSlot() } : undefined));
    },
  };
}

export interface ServerBundle {
  /** Source module (absolute) → its bundled file (absolute). */
  readonly files: ReadonlyMap<string, string>;
  readonly dir: string;
}

/**
 * Bundles the modules into a fresh folder inside node_modules (so their package imports resolve
 * from this checkout).
 */
export async function bundleServerModules(root: string): Promise<ServerBundle> {
  const entries = bundlableModules(join(root, 'src'));
  const dir = join(root, 'node_modules', '.dampbook-server', `${process.pid}-${Date.now().toString(36)}-${++serial}`);
  mkdirSync(dir, { recursive: true });
  const result = await build({
    absWorkingDir: root,
    entryPoints: entries,
    outdir: dir,
    outbase: join(root, 'src'),
    bundle: true,
    splitting: true,
    format: 'esm',
    platform: 'node',
    target: 'node20',
    packages: 'external',
    outExtension: { '.js': '.mjs' },
    chunkNames: '_chunks/[name]-[hash]',
    sourcemap: false,
    metafile: true,
    logLevel: 'error',
    plugins: [teamSlotEsbuild()],
  });
  const files = new Map<string, string>();
  for (const [out, info] of Object.entries(result.metafile.outputs)) if (info.entryPoint) files.set(resolve(root, info.entryPoint), resolve(root, out));
  return { files, dir };
}

/**
 * Points the server build's imports of bundled modules at their bundled files. Only those imports
 * wait for the bundle: rollup compiles the pages (the bulk of the work) meanwhile, where waiting in
 * `buildStart` left the main thread idle for ~0.3 s while esbuild ran.
 * `apply: 'build'`: a Vite *server* Astro may start before the build (its type sync) takes the
 * modules through Vite as in dev, instead of waiting for the bundle the build needs a moment later.
 */
export function serverBundlePlugin(bundle: Promise<ServerBundle>): VitePlugin {
  return {
    name: 'dampbook:server-bundle',
    enforce: 'pre',
    apply: 'build',
    async resolveId(source, importer, options) {
      if (!options.ssr || !importer || !source.startsWith('.')) return undefined;
      const target = (await bundle).files.get(resolve(dirname(importer.split('?')[0]!), source));
      // a file: URL, never a path: rollup would rewrite a path relative to a chunk that Astro later moves
      return target ? { id: pathToFileURL(target).href, external: true } : undefined;
    },
  };
}

/**
 * The Astro integration: on `astro build` only. The bundle starts at once and runs (in esbuild's
 * own process) while Astro sets up Vite; the server build waits for it.
 * The folder is removed when the build is done, or when the process ends after a failed one.
 */
export function serverModules(): AstroIntegration {
  let pending: Promise<ServerBundle> | undefined;
  let dir: string | undefined;
  const remove = () => { if (dir) rmSync(dir, { recursive: true, force: true }); dir = undefined; };
  return {
    name: 'dampbook:server-modules',
    hooks: {
      'astro:config:setup': ({ command, config, updateConfig }) => {
        if (command !== 'build') return;
        pending = bundleServerModules(fileURLToPath(config.root)).then((b) => { dir = b.dir; return b; });
        pending.catch(() => undefined); // the failure surfaces where the build awaits it
        process.once('exit', remove);
        updateConfig({ vite: { plugins: [serverBundlePlugin(pending)] } });
      },
      'astro:build:done': async () => { await pending?.catch(() => undefined); remove(); process.off('exit', remove); },
    },
  };
}
