/**
 * File names say where a calculator lives and what a file belongs to (DEVELOPERS.md "Add a
 * calculator", Names): the file of calculator `road-power` is `<domain>/road-power.ts` and exports
 * `roadPowerCalculator`; a helper of one calculator is `<id>.<role>.ts` beside it and is imported
 * only by that calculator's files; modules several calculators use live in `shared/`, camelCase.
 * Provenance: common practice, no source (a project rule, checked against the registry).
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { domains } from '../../src/calculators/registry.ts';

const CALC = 'src/calculators';
/** Same-folder module specifiers (static or dynamic imports; helpers are only ever imported so). */
const specifiers = (text: string) => [...text.matchAll(/(?:from\s*|import\s*\(\s*)['"](\.\/[^'"]+)['"]/g)].map((m) => m[1]!);
const camel = (id: string) => id.replace(/-(\w)/g, (_, c: string) => c.toUpperCase());

/** Problems with one domain folder's file names, given the ids registered in that domain. */
export function nameProblems(files: Readonly<Record<string, string>>, ids: readonly string[]): string[] {
  const out: string[] = [];
  for (const id of ids) {
    const text = files[`${id}.ts`];
    if (text === undefined) { out.push(`${id}: no file ${id}.ts`); continue; }
    if (!text.includes(`export const ${camel(id)}Calculator = defineCalculator(`)) out.push(`${id}.ts: export it as ${camel(id)}Calculator`);
    if (!text.includes(`id: '${id}'`)) out.push(`${id}.ts: defines another id`);
  }
  for (const [name, text] of Object.entries(files)) {
    if (name === 'index.ts' || ids.some((id) => name === `${id}.ts`)) continue;
    const owner = ids.find((id) => name.startsWith(`${id}.`) && /^[a-z][a-z0-9-]*\.ts$/.test(name.slice(id.length + 1)));
    if (!owner) { out.push(`${name}: not <id>.ts or <id>.<role>.ts of a calculator in this folder (shared modules go in shared/)`); continue; }
    if (/defineCalculator\(/.test(text)) out.push(`${name}: a helper file defines a calculator`);
  }
  // a helper belongs to its calculator: imported only from that calculator's own files
  for (const [name, text] of Object.entries(files)) {
    for (const s of specifiers(text)) {
      const m = /^\.\/([a-z0-9-]+)\.[a-z0-9-]+\.ts$/.exec(s);
      if (m && !(name === `${m[1]}.ts` || name.startsWith(`${m[1]}.`))) out.push(`${name} imports ${s}, a helper of ${m[1]}; move what both use to shared/`);
    }
  }
  return out;
}

const read = (dir: string) => Object.fromEntries(readdirSync(dir).filter((n) => n.endsWith('.ts')).map((n) => [n, readFileSync(join(dir, n), 'utf8')]));

describe('calculator file names', () => {
  it('the checker can fail (fixture folder)', () => {
    const files = {
      'index.ts': '',
      'road-power.ts': "export const roadPowerCalc = defineCalculator({\n  id: 'road-power',",
      'roadPowerCases.ts': '',
      'fv-fit.charts.ts': '',
      'sdof.ts': "import { x } from './fv-fit.charts.ts';\nexport const sdofCalculator = defineCalculator({\n  id: 'sdof',",
    };
    expect(nameProblems(files, ['road-power', 'sdof', 'fv-fit'])).toEqual([
      'road-power.ts: export it as roadPowerCalculator',
      'fv-fit: no file fv-fit.ts',
      'roadPowerCases.ts: not <id>.ts or <id>.<role>.ts of a calculator in this folder (shared modules go in shared/)',
      "sdof.ts imports ./fv-fit.charts.ts, a helper of fv-fit; move what both use to shared/",
    ]);
  });

  it.each(Object.entries(domains))('%s/ holds <id>.ts and <id>.<role>.ts files only', (domain, list) => {
    expect(nameProblems(read(join(CALC, domain)), list.map((c) => c.id))).toEqual([]);
  });

  it('shared/ holds camelCase modules and no calculator definition', () => {
    const files = read(join(CALC, 'shared'));
    const bad = Object.entries(files).filter(([n, t]) => !/^[a-z][a-zA-Z0-9]*\.ts$/.test(n) || /defineCalculator\(/.test(t)).map(([n]) => n);
    expect(bad).toEqual([]);
  });

  it('calculator folders are the domains plus shared/, envelope/ and badInput/ (the bad-input rules)', () => {
    const dirs = readdirSync(CALC, { withFileTypes: true }).filter((d) => d.isDirectory()).map((d) => d.name).sort();
    expect(dirs).toEqual([...Object.keys(domains), 'badInput', 'envelope', 'shared'].sort());
  });
});
