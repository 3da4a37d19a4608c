/**
 * No `Math.max(...xs)` / `Math.min(...xs)` in src: a spread passes every element as a call
 * argument, and V8 overflows the stack at roughly 10⁵ of them (recorded-motion failed on a
 * 420 000-row record inside its size limit with "Maximum call stack size exceeded"). Use
 * `maxOf`, `minOf`, `maxAbsOf` from src/core/numeric/extent.ts. The scanner follows the call's
 * parentheses, so a spread after another argument (`Math.min(a, ...xs)`) is found too.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((n) => {
    const p = join(dir, n);
    return statSync(p).isDirectory() ? files(p) : /\.(ts|mjs|astro)$/.test(n) ? [p] : [];
  });
}

/** Line numbers of every Math.max/Math.min call with a spread among its own arguments. */
export function spreadCalls(source: string): number[] {
  const lines: number[] = [];
  for (const m of source.matchAll(/Math\s*\.\s*(?:max|min)\s*\(/g)) {
    let depth = 1;
    let i = m.index + m[0].length;
    for (; i < source.length && depth > 0; i++) {
      const c = source[i];
      if (c === '(' || c === '[' || c === '{') depth++;
      else if (c === ')' || c === ']' || c === '}') depth--;
      else if (depth === 1 && source.startsWith('...', i)) { lines.push(source.slice(0, m.index).split('\n').length); break; }
    }
  }
  return lines;
}

describe('no spread of an array into Math.max or Math.min', () => {
  it('the scanner finds a spread in any argument position and ignores one inside a nested array', () => {
    expect(spreadCalls('const a = Math.max(...xs);\nconst b = Math.min(0,\n ...ys);')).toEqual([1, 2]);
    expect(spreadCalls('Math.max(0, maxOf([...t.values()]))')).toEqual([]);
    expect(spreadCalls('Math.max(f(a, ...b), 1)')).toEqual([]);
  });

  it('holds for every file under src/', () => {
    const found = files(resolve('src')).flatMap((f) => {
      const src = readFileSync(f, 'utf8').replace(/\/\*[\s\S]*?\*\//g, (c) => c.replace(/[^\n]/g, ' ')).replace(/\/\/.*$/gm, '');
      return spreadCalls(src).map((l) => `${relative(resolve('.'), f)}:${l}`);
    });
    expect(found, 'use maxOf / minOf / maxAbsOf (src/core/numeric/extent.ts)').toEqual([]);
  });
});
