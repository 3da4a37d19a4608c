/**
 * Every `@example` in a doc comment under src/core runs, and returns what it says at the precision
 * it states. A worked number in a doc comment is a claim a reader trusts (one claimed 23.3 where the
 * function returned 23.09); this test makes every such claim fail `npm test` when it is wrong.
 *
 * Form (DEVELOPERS.md, "Add a formula"): `@example <expression> // <expected> <free text>` on one
 * line, where <expected> is a number (optionally after "≈"), an object or array literal of numbers
 * (fields not listed, or "...", are not checked) or a quoted string. The expression sees the module's
 * own exports, its folder's index exports and the complex-number helpers. A number is checked to half
 * a unit of its last written digit (so "20" means 19.5–20.5 and "41.637" means ±0.0005).
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { describe, expect, it } from 'vitest';

const CORE = resolve('src/core');

export interface Example { readonly file: string; readonly line: number; readonly expr: string; readonly expected: string }

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((n) => {
    const p = join(dir, n);
    return statSync(p).isDirectory() ? files(p) : n.endsWith('.ts') ? [p] : [];
  });
}

export function examplesIn(file: string, source: string): Example[] {
  const out: Example[] = [];
  source.split('\n').forEach((text, i) => {
    const m = /^\s*\*\s*@example\s+(.*)$/.exec(text);
    if (!m) return;
    const body = m[1]!;
    const cut = body.lastIndexOf(' // ');
    out.push({ file, line: i + 1, expr: cut < 0 ? body.trim() : body.slice(0, cut).trim(), expected: cut < 0 ? '' : body.slice(cut + 4).trim() });
  });
  return out;
}

const NUM = /^[-−]?(?:\d+\.?\d*|\.\d+)(?:e[-−+]?\d+)?/i;

/** Half a unit of the last written digit of a number as text ("41.637" → 5e-4, "2.7e-11" → 5e-13). */
export function halfUnit(text: string): number {
  const t = text.replace('−', '-').toLowerCase();
  const [mant, exp] = t.split('e');
  const dot = mant!.indexOf('.');
  const decimals = dot < 0 ? 0 : mant!.length - dot - 1;
  return 0.5 * 10 ** (-decimals + Number(exp ?? 0));
}

const toNumber = (s: string) => Number(s.replace(/−/g, '-'));

/** Compares a computed value with the expected text; returns a message, or undefined when it holds. */
export function check(value: unknown, expected: string): string | undefined {
  let e = expected.replace(/^≈\s*/, '');
  if (/^'[^']*'/.test(e)) {
    const want = /^'([^']*)'/.exec(e)![1];
    return value === want ? undefined : `expected '${want}', got ${JSON.stringify(value)}`;
  }
  if (e.startsWith('{') || e.startsWith('[')) {
    const close = e.startsWith('{') ? '}' : ']';
    let depth = 0; let end = -1;
    for (let i = 0; i < e.length; i++) { if (e[i] === e[0]) depth++; else if (e[i] === close && --depth === 0) { end = i; break; } }
    if (end < 0) return `unbalanced literal in '${expected}'`;
    const literal = e.slice(0, end + 1).replace(/,?\s*\.\.\.\s*/g, ' ').replace(/−/g, '-');
    let want: unknown;
    try { want = new Function(`return (${literal});`)(); } catch { return `cannot read the literal '${literal}'`; }
    // the written digits of each number, in the order the literal's leaves are walked
    const texts = literal.match(/-?(?:\d+\.?\d*|\.\d+)(?:e[-+]?\d+)?/gi) ?? [];
    let k = 0;
    const walk = (w: unknown, got: unknown, at: string): string | undefined => {
      if (typeof w === 'number') { const msg = check(got, texts[k++] ?? String(w)); return msg && `${at}: ${msg}`; }
      if (typeof w === 'string') return got === w ? undefined : `${at}: expected '${w}', got ${JSON.stringify(got)}`;
      if (!got || typeof got !== 'object') return `${at}: expected ${Array.isArray(w) ? 'an array' : 'an object'}, got ${JSON.stringify(got)}`;
      if (Array.isArray(w) && (!Array.isArray(got) || got.length !== w.length)) return `${at}: expected ${w.length} items, got ${JSON.stringify(got)}`;
      for (const [key, sub] of Object.entries(w as object)) { const msg = walk(sub, (got as Record<string, unknown>)[key], `${at}.${key}`); if (msg) return msg; }
      return undefined;
    };
    return walk(want, value, '');
  }
  const m = NUM.exec(e);
  if (!m) return `the expected value '${expected}' is not a number, literal or quoted string`;
  if (typeof value !== 'number') return `expected ${m[0]}, got ${JSON.stringify(value)}`;
  const want = toNumber(m[0]);
  const tol = halfUnit(m[0]);
  return Math.abs(value - want) <= tol * (1 + 1e-9) ? undefined : `expected ${m[0]} (±${tol}), got ${value}`;
}

async function scopeFor(file: string): Promise<Record<string, unknown>> {
  const load = async (p: string) => { try { return (await import(pathToFileURL(p).href)) as Record<string, unknown>; } catch { return {}; } };
  return { ...(await load(join(CORE, 'complex', 'index.ts'))), ...(await load(join(dirname(file), 'index.ts'))), ...(await load(file)) };
}

export async function run(ex: Example): Promise<string | undefined> {
  if (!ex.expected) return 'no expected value after " // "';
  const scope = await scopeFor(ex.file);
  const names = Object.keys(scope).filter((k) => /^[A-Za-z_$][\w$]*$/.test(k) && k !== 'default');
  let value: unknown;
  try {
    // eslint-disable-next-line @typescript-eslint/no-implied-eval -- doc examples are project source, run as written
    value = new Function(...names, `return (${ex.expr});`)(...names.map((n) => scope[n]));
  } catch (e) {
    return `does not run: ${(e as Error).message}`;
  }
  return check(value, ex.expected);
}

describe('doc comment examples', () => {
  it('the checker can fail: a wrong number, a wrong field and prose are refused', () => {
    expect(check(23.09, '23.3 (a handbook example)')).toMatch(/expected 23\.3/);
    expect(check(23.09, '23.09')).toBeUndefined();
    expect(check({ f: 0.952381, zeta: 0.2 }, '{ f: 0.952381, zeta: 0.133631 }')).toMatch(/zeta: expected 0.133631/);
    expect(check([1, 0.5], '[1, 0.5]')).toBeUndefined();
    expect(check(1, 'one per half cycle')).toMatch(/not a number/);
    expect(halfUnit('2.7e-11')).toBeCloseTo(5e-13, 25);
  });

  const all = files(CORE).flatMap((f) => examplesIn(f, readFileSync(f, 'utf8')));
  it('finds the examples', () => expect(all.length).toBeGreaterThan(50));
  it.each(all.map((e) => [`${relative(resolve('.'), e.file)}:${e.line}`, e] as const))('%s', async (_, ex) => {
    expect(await run(ex)).toBeUndefined();
  });
});
