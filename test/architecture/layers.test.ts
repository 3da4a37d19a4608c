/**
 * The import direction written in DEVELOPERS.md, checked: the core imports nothing above it (and no
 * Node, DOM or package code), calculators never import page, CLI, sheet or server code, and the CLI
 * never imports browser components. A rule nobody checks drifts; this one fails `npm test`.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve, sep } from 'node:path';
import { describe, expect, it } from 'vitest';
import { importSpecifiers as specifiers } from '../../src/build/importSpecifiers.ts';

const SRC = resolve('src');

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    return statSync(p).isDirectory() ? files(p) : /\.(ts|mjs|astro)$/.test(name) ? [p] : [];
  });
}

/** The top folder under src/ a specifier resolves to ('core', 'calculators', …), 'package' or 'node'. */
function layerOf(fromFile: string, spec: string): string {
  if (spec.startsWith('node:')) return 'node';
  if (!spec.startsWith('.')) return 'package';
  const target = relative(SRC, resolve(dirname(fromFile), spec));
  return target.startsWith('..') ? 'outside' : target.split(sep)[0]!;
}

/** Layers each layer must never import (the direction is one-way: pages → components → calculators → core). */
const FORBIDDEN: Readonly<Record<string, readonly string[]>> = {
  core: ['calculators', 'components', 'cli', 'content', 'layouts', 'pages', 'records', 'server', 'sheets', 'build', 'studies', 'node', 'package', 'outside'],
  calculators: ['components', 'cli', 'layouts', 'pages', 'server', 'sheets', 'build', 'node', 'outside'],
  records: ['components', 'cli', 'layouts', 'pages', 'server', 'build'],
  cli: ['components', 'layouts', 'pages'],
  studies: ['components', 'cli', 'layouts', 'pages', 'server', 'sheets', 'build'],
  team: ['components', 'cli', 'layouts', 'pages', 'server', 'sheets', 'build'],
};

export function violations(file: string, source: string): string[] {
  const layer = relative(SRC, file).split(sep)[0]!;
  const banned = FORBIDDEN[layer] ?? [];
  return specifiers(source)
    .filter((s) => banned.includes(layerOf(file, s)))
    .map((s) => `${relative(SRC, file)} imports '${s}' (${layerOf(file, s)}), which ${layer} must not import`);
}

describe('import direction', () => {
  it('finds static, re-exported and dynamic imports (the checker itself can fail)', () => {
    const bad = "import { x } from '../../components/render/format.ts';\nexport * from '../../cli/args.ts';\nconst m = await import('node:fs');\nimport 'chart.js';";
    const found = violations(join(SRC, 'core', 'thermal', 'fake.ts'), bad);
    expect(found).toHaveLength(4);
    expect(found[0]).toContain("imports '../../components/render/format.ts' (components)");
    expect(violations(join(SRC, 'core', 'thermal', 'fake.ts'), "import { air } from './air.ts';\nimport type { Q } from '../units/index.ts';")).toEqual([]);
    expect(violations(join(SRC, 'calculators', 'x.ts'), "import { h } from '../components/render/format.ts';")).toHaveLength(1);
    expect(violations(join(SRC, 'cli', 'x.ts'), "import { h } from '../components/render/format.ts';")).toHaveLength(1);
  });

  it('holds for every file under src/', () => {
    const all = files(SRC).flatMap((f) => violations(f, readFileSync(f, 'utf8')));
    expect(all).toEqual([]);
  });

  it('components/render/ is pure: no DOM globals and no client/ import (the server render uses it)', () => {
    expect(domUse('render/fake.ts', "const d = document.createElement('div');\nimport { a } from '../client/finder.ts';\nwindow.x = 1;")).toEqual([
      'render/fake.ts uses document', 'render/fake.ts uses window', "render/fake.ts imports '../client/finder.ts'",
    ]);
    expect(domUse('render/fake.ts', '// the document title\nconst s = `window`;\nconst documentLength = 2;')).toEqual([]);
    const dir = join(SRC, 'components', 'render');
    const all = files(dir).flatMap((f) => domUse(relative(SRC, f), readFileSync(f, 'utf8')));
    expect(all).toEqual([]);
  });
});

/**
 * The registry imports every calculator. Study code takes a lookup instead (src/studies/lookup.ts)
 * and browser code loads definitions one by one (calculators/loaders.ts), so a page with a study
 * downloads only its steps' calculators — an import of the registry here would quietly undo that.
 */
describe('the calculator registry stays out of study and browser code', () => {
  const importsRegistry = (file: string, source: string) =>
    specifiers(source).some((s) => s.startsWith('.') && resolve(dirname(file), s) === join(SRC, 'calculators', 'registry.ts'));

  it('is detected (the check can fail)', () => {
    expect(importsRegistry(join(SRC, 'studies', 'x.ts'), "import { getCalculator } from '../calculators/registry.ts';")).toBe(true);
    expect(importsRegistry(join(SRC, 'studies', 'x.ts'), "import type { CalculatorLookup } from './lookup.ts';")).toBe(false);
  });

  it('holds for src/studies and src/components', () => {
    const found = ['studies', 'components'].flatMap((d) => files(join(SRC, d)))
      .filter((f) => f.endsWith('.ts') && importsRegistry(f, readFileSync(f, 'utf8')))
      .map((f) => relative(SRC, f));
    expect(found).toEqual([]);
  });
});
const DOM_GLOBALS = ['document', 'window', 'customElements', 'localStorage', 'sessionStorage', 'navigator', 'location', 'HTMLElement', 'requestAnimationFrame'];

/** DOM globals a render helper touches (comments and string literals ignored) and client/ imports. */
export function domUse(name: string, source: string): string[] {
  const code = source.replace(/\/\*[\s\S]*?\*\/|\/\/[^\n]*/g, '').replace(/(['"`])(?:\\.|(?!\1)[^\\\n])*\1/g, "''");
  const used = DOM_GLOBALS.filter((g) => new RegExp(`(?<![\\w.$])${g}(?![\\w$])`).test(code)).map((g) => `${name} uses ${g}`);
  const client = specifiers(source).filter((s) => s.includes('/client/')).map((s) => `${name} imports '${s}'`);
  return [...used, ...client];
}

