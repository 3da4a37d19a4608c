/**
 * A study's calculation package printed by `dampbook study sheet` (headless Chromium) and read
 * back with poppler's pdftotext and pdfinfo: cover with every verdict, one sheet per step, "page x
 * of y" continuous with y the page count, the calculation number on every page, no worked
 * example, no input of a law the study does not use.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { main } from '../../src/cli/main.ts';
import { runStudy } from '../../src/studies/run.ts';
import { readStudies } from '../../src/studies/files.ts';
import { ROOT_BUILD } from '../helpers/site.ts';
import { getCalculator } from '../../src/calculators/registry.ts';

const tmp = mkdtempSync(join(tmpdir(), 'dampbook-study-'));
afterAll(() => rmSync(tmp, { recursive: true, force: true }));

async function print(id: string, paper: 'a4' | 'letter', file = `content/studies/${id}.json`) {
  const pdf = join(tmp, `${id}-${paper}.pdf`);
  const err: string[] = [];
  const code = await main(['study', 'sheet', file, '--pdf', pdf, '--paper', paper, '--site', ROOT_BUILD], () => {}, (s) => err.push(s));
  expect(err).toEqual([]);
  expect(code).toBe(0);
  const info = execFileSync('pdfinfo', [pdf], { encoding: 'utf8' });
  const pages = execFileSync('pdftotext', ['-layout', pdf, '-'], { encoding: 'utf8' }).split('\f').filter((p) => p.trim() !== '');
  return { info, pages, count: Number(/Pages:\s+(\d+)/.exec(info)![1]) };
}

describe('study calculation package', () => {
  it('TW-210 class D on A4: cover with every verdict, one sheet per step, page x of y over the package', async () => {
    const file = readStudies().find((f) => f.id === 'tw-210-rear-damper-class-d')!;
    const run = runStudy(file.study, getCalculator);
    const { info, pages, count } = await print(file.id, 'a4');
    expect(info).toMatch(/\(A4\)/);
    expect(pages).toHaveLength(count);
    pages.forEach((p, i) => {
      expect(p, `page ${i + 1}`).toContain(`page ${i + 1} of ${count}`);
      expect(p, `page ${i + 1}`).toContain('TW-210-C-031');
    });
    const all = pages.join('\n').replace(/\s+/g, ' ');
    const cover = pages.slice(0, pages.findIndex((p) => /step 1 of 5/.test(p))).join('\n').replace(/\s+/g, ' ');
    expect(cover).toContain('Calculation package');
    expect(cover).toContain('Fellrunner site utility vehicle');
    expect(cover).toContain('5 of 7 verdicts fail.');
    for (const v of run.verdicts) expect(cover).toContain(`(${v.step}): ${v.pass ? 'PASS' : 'FAIL'}`);
    expect(cover).toMatch(/Prepared Rana Oduya/);
    // one sheet per step: each starts a new page with its own heading, once
    for (const [i, s] of run.steps.entries()) {
      const starts = pages.filter((p) => p.includes(`step ${i + 1} of 5`));
      expect(starts, s.id).toHaveLength(1);
      expect(starts[0]!.replace(/\s+/g, ' ')).toContain(`Step ${i + 1}: ${s.title}`);
      expect(all.split(`Step ${i + 1}: ${s.title}`)).toHaveLength(2);
    }
    // origins: the road's mean power reaches the steady step; the limit comes from the study
    expect(all).toMatch(/Mean damper power P [\d.]+ W from step 1 \(road\.P\)/);
    expect(all).toMatch(/Temperature limit T_lim 120\.0 °C \(393\.15 K\) limit: allowedTemperature/);
    // no worked example, no input of an unused law or mode
    expect(all).not.toMatch(/worked example|Worked example/);
    for (const label of ['Force at reference velocity', 'Velocity exponent', 'Stroke amplitude X', 'Power profile']) expect(all).not.toContain(label);
  });

  it('TW-118 on US Letter', async () => {
    const { info, pages, count } = await print('tw-118-end-stop', 'letter');
    expect(info).toMatch(/\(letter\)/i);
    expect(pages.at(-1)).toContain(`page ${count} of ${count}`);
    expect(pages.join('\n')).toContain('All 5 verdicts pass.');
  });

  it('a study file that is not part of the built handbook prints too (the class D study at 22 m/s)', async () => {
    const study = JSON.parse(JSON.stringify(readStudies().find((f) => f.id === 'tw-210-rear-damper-class-d')!.study));
    study.quantities.vehicleSpeed = 22;
    study.project.calculationNo = 'TW-210-C-099';
    const file = join(tmp, 'faster.json');
    writeFileSync(file, JSON.stringify(study));
    const run = runStudy(study, getCalculator);
    const { pages, count } = await print('faster', 'a4', file);
    pages.forEach((p, i) => { expect(p).toContain(`page ${i + 1} of ${count}`); expect(p).toContain('TW-210-C-099'); });
    const all = pages.join('\n').replace(/\s+/g, ' ');
    for (const v of run.verdicts) expect(all).toContain(`(${v.step}): ${v.pass ? 'PASS' : 'FAIL'}`);
    expect(all).toMatch(/Vehicle speed 22 m\/s study: vehicleSpeed/);
  });
});
