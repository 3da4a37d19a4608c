/**
 * Browser scripts, bundled by esbuild in one pass instead of Astro's per-module Vite client build.
 *
 * Why: the client bundle (calculator element, chart.js, one lazy chunk per calculator, the record
 * panel) is the same for every page; esbuild bundles, splits and minifies it in about 0.2 s where
 * the Vite client build took about 2 s — a fixed cost that dominated the build-time overhead over
 * a plain Astro + MDX site (see README, Performance). Pages reference the entries through
 * `virtual:dampbook/client` (URLs under the site base, content-hashed in a build); the files land
 * in `<outDir>/_db/`. Dynamic imports (calculators, chart view, record panel) stay lazy
 * chunks, exactly as before.
 */
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { AstroIntegration } from 'astro';
import { build, context, type BuildContext, type BuildOptions, type OutputFile } from 'esbuild';
import type { Plugin } from 'vite';
import { teamCalculatorsEsbuild, teamCalculatorsVite } from './team-calculators.ts';

/** Entry name → source module. The names are the keys of `virtual:dampbook/client`. */
export const CLIENT_ENTRIES = {
  calculator: 'src/components/client/calculator-element.ts',
  finder: 'src/components/client/finder.ts',
  sheetDetails: 'src/components/client/sheet-details.ts',
  studyPackage: 'src/components/client/study-package.ts',
  studyEarly: 'src/components/client/study-early.ts',
} as const;

/**
 * Classic scripts: run the moment the parser reaches them, before any module script (which waits
 * for the parser to yield). Each is one self-contained file; keep them tiny, they hold up parsing.
 */
export const CLASSIC_ENTRIES = {
  studyHint: 'src/components/client/study-hint.ts',
} as const;

export type ClientEntry = keyof typeof CLIENT_ENTRIES | keyof typeof CLASSIC_ENTRIES;

const ALL_ENTRIES: Record<ClientEntry, string> = { ...CLIENT_ENTRIES, ...CLASSIC_ENTRIES };

/**
 * Lazy modules whose whole chunk graph a page announces with `<link rel="modulepreload">` before
 * importing them: the browser otherwise discovers a chunk's static imports one level at a time
 * (the study code is five levels deep, ~0.4 s on a loaded machine; fetched at once it is one).
 */
export const LAZY_PRELOADS = {
  study: 'src/components/client/study-link.ts',
} as const;

export type LazyPreload = keyof typeof LAZY_PRELOADS;

/** URL folder of the bundles under the site base. */
const FOLDER = '_db';
const VIRTUAL = 'virtual:dampbook/client';
const RESOLVED = `\0${VIRTUAL}`;

function options(root: string, hashed: boolean, classic = false): BuildOptions {
  return {
    absWorkingDir: root,
    entryPoints: Object.values(classic ? CLASSIC_ENTRIES : CLIENT_ENTRIES),
    outdir: join(root, FOLDER), // never written: write is false; names the output paths
    bundle: true,
    splitting: !classic,
    format: classic ? 'iife' : 'esm',
    target: 'es2022',
    platform: 'browser',
    minify: hashed,
    sourcemap: false,
    legalComments: 'none',
    entryNames: hashed ? '[name].[hash]' : '[name]',
    chunkNames: 'chunk.[hash]',
    metafile: true,
    write: false,
    logLevel: 'error',
    // a handbook folder's own calculators: one lazy chunk (src/build/team-calculators.ts)
    plugins: [teamCalculatorsEsbuild()],
  };
}

/** Maps each entry to its output file name (e.g. calculator → "calculator-element.AB12CD.js"). */
function entryFiles(root: string, ...metas: { outputs: Record<string, { entryPoint?: string }> }[]): Record<ClientEntry, string> {
  const byEntry = new Map<string, string>();
  for (const meta of metas) for (const [out, info] of Object.entries(meta.outputs)) if (info.entryPoint) byEntry.set(resolve(root, info.entryPoint), out);
  const files = {} as Record<ClientEntry, string>;
  for (const [name, src] of Object.entries(ALL_ENTRIES) as [ClientEntry, string][]) {
    const out = byEntry.get(resolve(root, src));
    if (!out) throw new Error(`client scripts: esbuild produced no output for ${src}`);
    files[name] = out.split('/').pop()!;
  }
  return files;
}

type Meta = { outputs: Record<string, { entryPoint?: string; inputs: Record<string, unknown>; imports: { path: string; kind: string }[] }> };

/** The output file holding a source module and every file it statically imports, transitively. */
function chunkGraph(root: string, meta: Meta, src: string): string[] {
  const start = Object.keys(meta.outputs).find((o) => Object.keys(meta.outputs[o]!.inputs).some((i) => resolve(root, i) === resolve(root, src)));
  if (!start) throw new Error(`client scripts: no output holds ${src}`);
  const seen = new Set<string>();
  const visit = (o: string) => {
    if (seen.has(o)) return;
    seen.add(o);
    for (const imp of meta.outputs[o]?.imports ?? []) if (imp.kind === 'import-statement') visit(imp.path);
  };
  visit(start);
  return [...seen].map((f) => f.split('/').pop()!);
}

function preloadFiles(root: string, meta: Meta): Record<LazyPreload, string[]> {
  const out = {} as Record<LazyPreload, string[]>;
  for (const [name, src] of Object.entries(LAZY_PRELOADS) as [LazyPreload, string][]) out[name] = chunkGraph(root, meta, src);
  return out;
}

const LOADERS = 'src/calculators/loaders.ts';

/** Calculator id → source module, read from the loaders' `id: () => import('./path')` lines. */
export function loaderSources(text: string): Record<string, string> {
  const out: Record<string, string> = {};
  for (const m of text.matchAll(/^\s*'?([a-z0-9-]+)'?: \(\) => import\('\.\/([^']+)'\)/gm)) out[m[1]!] = `src/calculators/${m[2]!}`;
  return out;
}

/**
 * Calculator id → every chunk its definition needs. A study page learns its steps' calculators
 * only when the study is read; announcing all their chunks at once saves the browser discovering
 * each calculator's imports one level at a time (src/components/client/study-calculators.ts).
 */
function calculatorFiles(root: string, meta: Meta): Record<string, string[]> {
  const sources = loaderSources(readFileSync(join(root, LOADERS), 'utf8'));
  // the calculator element's own chunks are loaded on every calculator page already
  const loaded = new Set(chunkGraph(root, meta, CLIENT_ENTRIES.calculator));
  return Object.fromEntries(Object.entries(sources).map(([id, src]) => [id, chunkGraph(root, meta, src).filter((f) => !loaded.has(f))]));
}

function moduleSource(base: string, files: Record<ClientEntry, string>, preloads: Record<LazyPreload, string[]>, calcs: Record<string, string[]>): string {
  const prefix = `${base.endsWith('/') ? base : `${base}/`}${FOLDER}/`;
  const urls = Object.fromEntries(Object.entries(files).map(([k, f]) => [k, prefix + f]));
  const pre = Object.fromEntries(Object.entries(preloads).map(([k, fs]) => [k, fs.map((f) => prefix + f)]));
  const calcUrls = Object.fromEntries(Object.entries(calcs).map(([k, fs]) => [k, fs.map((f) => prefix + f)]));
  return `export default ${JSON.stringify(urls)};\nexport const preloads = ${JSON.stringify(pre)};\nexport const calculatorPreloads = ${JSON.stringify(calcUrls)};\n`;
}

/** The Astro integration: build → bundle once, write at the end; dev → rebuild on request. */
export function clientScripts(): AstroIntegration {
  let root = '';
  let base = '/';
  type Built = { files: Record<ClientEntry, string>; preloads: Record<LazyPreload, string[]>; calculators: Record<string, string[]>; outputs: OutputFile[] };
  /** The bundle, started at setup and awaited where it is needed: it runs while Astro syncs the content. */
  let built: Promise<Built> | undefined;
  let dev: BuildContext[] | undefined;
  const devFiles = Object.fromEntries(Object.entries(ALL_ENTRIES).map(([k, src]) => [k, `${src.split('/').pop()!.replace(/\.ts$/, '')}.js`])) as Record<ClientEntry, string>;

  return {
    name: 'dampbook:client-scripts',
    hooks: {
      'astro:config:setup': ({ command, config, updateConfig }) => {
        root = fileURLToPath(config.root);
        base = config.base;
        if (command === 'build') {
          built = Promise.all([build(options(root, true)), build(options(root, true, true))]).then(([result, classic]) => ({
            files: entryFiles(root, result.metafile!, classic.metafile!),
            preloads: preloadFiles(root, result.metafile as Meta),
            calculators: calculatorFiles(root, result.metafile as Meta),
            outputs: [...result.outputFiles!, ...classic.outputFiles!],
          }));
          built.catch(() => undefined); // the failure surfaces where the build awaits it
        }
        const plugin: Plugin = {
          name: 'dampbook:client-urls',
          resolveId: (id) => (id === VIRTUAL ? RESOLVED : undefined),
          // dev serves unsplit-by-hash files on request: nothing to preload there
          load: async (id) => {
            if (id !== RESOLVED) return undefined;
            const b = await built;
            return moduleSource(base, b?.files ?? devFiles, b?.preloads ?? { study: [] }, b?.calculators ?? {});
          },
          configureServer(server) {
            const prefix = `${base.endsWith('/') ? base : `${base}/`}${FOLDER}/`;
            server.middlewares.use(async (req, res, next) => {
              const path = (req.url ?? '').split('?')[0]!;
              if (!path.startsWith(prefix)) { next(); return; }
              dev ??= await Promise.all([context(options(root, false)), context(options(root, false, true))]);
              const out = (await Promise.all(dev.map((c) => c.rebuild()))).flatMap((r) => r.outputFiles ?? []);
              const file = out.find((f) => f.path.endsWith(`/${path.slice(prefix.length)}`));
              if (!file) { res.statusCode = 404; res.end('not found'); return; }
              res.setHeader('Content-Type', 'text/javascript; charset=utf-8');
              res.end(file.contents);
            });
          },
        };
        updateConfig({ vite: { plugins: [plugin, teamCalculatorsVite()] } });
      },
      'astro:build:done': async ({ dir }) => {
        if (!built) return;
        const out = join(fileURLToPath(dir), FOLDER);
        for (const f of (await built).outputs) {
          const target = join(out, relative(join(root, FOLDER), f.path));
          mkdirSync(dirname(target), { recursive: true });
          writeFileSync(target, f.contents);
        }
      },
      'astro:server:done': async () => { await Promise.all((dev ?? []).map((c) => c.dispose())); dev = undefined; },
    },
  };
}
