/**
 * The handbook's pages as one virtual module, `virtual:dampbook/pages`: every `.mdx` file of the
 * content folder, imported as the MDX module Astro compiles, with the id and path the page index
 * (src/content/pageIndex.ts) files it under.
 *
 * Why not a content collection: the content layer starts a Vite server of its own and writes a
 * data store before the build proper begins — about 0.6 s of every build, whatever the page count
 * (measured: 0.74 s against 0.10 s for a plain Astro + MDX site; 0.4 s even with a one-line
 * collection). The pages are MDX files either way and Astro's MDX integration compiles them the
 * same; their frontmatter is checked by the same zod schema, in pageIndex.ts.
 *
 * Which files are pages, and their ids: src/content/pageFiles.ts, the rule `dampbook check` uses.
 * Unlike the collection's glob, a page file that cannot be read or two files with one id stop
 * the build with a message instead of being skipped or overwritten.
 */
import { relative, resolve, sep } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { AstroIntegration } from 'astro';
import type { Plugin as VitePlugin, ViteDevServer } from 'vite';
import { findPageFiles, pageIdOf } from '../content/pageFiles.ts';

const ID = 'virtual:dampbook/pages';
const RESOLVED = `\0${ID}`;

export interface PageFile {
  /** The page's id: its address under the site base (without the trailing slash). */
  readonly id: string;
  /** Absolute path of the MDX file. */
  readonly file: string;
  /** The path as pages and error messages show it: relative to the project root, `/`-separated. */
  readonly filePath: string;
}

/**
 * Every page file of a content folder, sorted by id.
 * @throws Error naming a page file that cannot be read, or two files with one id
 */
export function pageFiles(contentDir: string, root: string): PageFile[] {
  const found = findPageFiles(contentDir).map((f) => {
    if (f.reason !== undefined) throw new Error(`${relative(root, f.file)}: ${f.reason} (dampbook check lists every such entry)`);
    return { id: pageIdOf(f.file, contentDir), file: f.file, filePath: relative(root, f.file).split(sep).join('/') };
  });
  found.sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
  for (let i = 1; i < found.length; i++) {
    if (found[i]!.id === found[i - 1]!.id) throw new Error(`${found[i - 1]!.filePath} and ${found[i]!.filePath} are both page '${found[i]!.id}'; rename one`);
  }
  return found;
}

/** The module's text: each page imported whole (frontmatter, headings, content). */
export function pagesModule(files: readonly PageFile[]): string {
  const lines = files.map((f, i) => `import * as p${i} from ${JSON.stringify(f.file)};`);
  const rows = files.map((f, i) => `  { id: ${JSON.stringify(f.id)}, filePath: ${JSON.stringify(f.filePath)}, module: p${i} },`);
  return `${lines.join('\n')}\nexport default [\n${rows.join('\n')}\n];\n`;
}

function pagesPlugin(contentDir: string, root: string): VitePlugin {
  const base = resolve(contentDir);
  return {
    name: 'dampbook:handbook-pages',
    resolveId: (id) => (id === ID ? RESOLVED : undefined),
    load: (id) => (id === RESOLVED ? pagesModule(pageFiles(base, root)) : undefined),
    // dev: a page added or removed changes the list (an edited page reloads as the module it is)
    configureServer(server: ViteDevServer) {
      server.watcher.add(base);
      const changed = (file: string) => {
        if (!file.startsWith(base) || !file.endsWith('.mdx')) return;
        for (const env of Object.values(server.environments)) {
          const mod = env.moduleGraph.getModuleById(RESOLVED);
          if (mod) env.moduleGraph.invalidateModule(mod);
        }
        server.ws.send({ type: 'full-reload' });
      };
      server.watcher.on('add', changed);
      server.watcher.on('unlink', changed);
    },
  };
}

/** The integration: the content folder is DAMPBOOK_CONTENT, else ./content (as site.config.ts reads it). */
export function handbookPages(): AstroIntegration {
  return {
    name: 'dampbook:handbook-pages',
    hooks: {
      'astro:config:setup': ({ config, updateConfig }) => {
        const root = fileURLToPath(config.root);
        const dir = resolve(root, process.env.DAMPBOOK_CONTENT ?? './content');
        updateConfig({ vite: { plugins: [pagesPlugin(dir, root)] } });
      },
    },
  };
}
