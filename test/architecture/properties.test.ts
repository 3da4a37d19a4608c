/**
 * Every fast-check property runs a fixed number of cases from a fixed seed: `fc.assert(…, { seed,
 * numRuns })`. Without them the cases differ on every run (a failure may not come back) and a time
 * box makes the count depend on the machine. Files not converted yet are listed with the reason;
 * a listed file that complies fails too, so the list only shrinks.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const NOT_YET: Readonly<Record<string, string>> = {
};

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((n) => {
    const p = join(dir, n);
    return statSync(p).isDirectory() ? files(p) : /\.ts$/.test(n) ? [p] : [];
  });
}

/** The text of each `fc.assert(…)` call, with its line, found by matching brackets. */
export function assertCalls(source: string): { line: number; text: string }[] {
  const out: { line: number; text: string }[] = [];
  for (const m of source.matchAll(/fc\.assert\(/g)) {
    let i = m.index + m[0].length;
    for (let depth = 1; depth > 0 && i < source.length; i++) {
      const ch = source[i]!;
      if ('([{'.includes(ch)) depth++;
      else if (')]}'.includes(ch)) depth--;
    }
    out.push({ line: source.slice(0, m.index).split('\n').length, text: source.slice(m.index, i) });
  }
  return out;
}

/** A call complies when its options name both a seed and a case count, and no time limit. */
const complies = (text: string) => /\bseed\s*:/.test(text) && /\bnumRuns\s*:/.test(text) && !/interruptAfterTimeLimit|timeout\s*:/.test(text);

describe('fast-check properties are reproducible', () => {
  it('finds the calls it checks (the scanner itself)', () => {
    expect(assertCalls('fc.assert(fc.property(a, (x) => f(x)), { seed: 1, numRuns: 5 });').map((c) => complies(c.text))).toEqual([true]);
    expect(assertCalls('fc.assert(fc.property(a, (x) => f(x)));').map((c) => complies(c.text))).toEqual([false]);
    expect(assertCalls('fc.assert(p, { numRuns: 9, interruptAfterTimeLimit: 10 })').map((c) => complies(c.text))).toEqual([false]);
  });

  const all = files('test').map((f) => f.split('\\').join('/')).filter((f) => !f.startsWith('test/architecture/properties'));
  it.each(all.filter((f) => readFileSync(f, 'utf8').includes('fc.assert(')))('%s gives every fc.assert a seed and numRuns', (f) => {
    const bad = assertCalls(readFileSync(f, 'utf8')).filter((c) => !complies(c.text)).map((c) => `${f}:${c.line}`);
    if (NOT_YET[f]) expect(bad.length, `${f} complies now: remove it from NOT_YET`).toBeGreaterThan(0);
    else expect(bad).toEqual([]);
  });

  it('every not-yet entry is a file that exists', () => {
    expect(Object.keys(NOT_YET).filter((f) => !all.includes(f))).toEqual([]);
  });
});
