/**
 * Every module specifier a source file imports or re-exports: static (`import … from`, `export …
 * from`), dynamic (`import('…')`) and bare (`import '…'`). Read by text, without a parser: the
 * import-direction test (test/architecture/layers.test.ts) and the server-pass bundle
 * (server-prebundle.ts, which modules reach Astro or Vite) use this one reader, so both see the
 * same imports.
 * @example importSpecifiers("import { a } from './a.ts';\nconst b = () => import('./b.ts');") // ['./a.ts', './b.ts']
 */
export function importSpecifiers(source: string): string[] {
  const out: string[] = [];
  const re = /(?:^|[\s;])(?:import|export)\s[^'"`;]*?from\s*['"]([^'"]+)['"]|(?:^|[\s;(])import\s*\(\s*['"]([^'"]+)['"]\s*\)|(?:^|[\s;])import\s*['"]([^'"]+)['"]/gm;
  for (const m of source.matchAll(re)) out.push((m[1] ?? m[2] ?? m[3])!);
  return out;
}
