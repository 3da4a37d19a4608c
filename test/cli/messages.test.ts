/**
 * Every CLI message is one line, and terminal control characters (newline, ESC, BEL, DEL, C1
 * controls, bidirectional overrides) from inputs, records or frontmatter are printed escaped
 * (`\u001b`), so nothing can forge a coloured or extra line. No reference values (behaviour).
 */
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { evaluate } from '../../src/calculators/evaluate.ts';
import { getCalculator } from '../../src/calculators/registry.ts';
import { escapeControls } from '../../src/cli/escape.ts';
import { main } from '../../src/cli/main.ts';
import { makeRecord } from '../../src/records/replay.ts';

const tmp = mkdtempSync(join(tmpdir(), 'dampbook-msg-'));
afterAll(() => rmSync(tmp, { recursive: true, force: true }));

async function run(...argv: string[]): Promise<{ code: number; out: string[]; err: string[] }> {
  const out: string[] = [];
  const err: string[] = [];
  const code = await main(argv, (s) => out.push(s), (s) => err.push(s));
  return { code, out, err };
}

// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u001f\u007f-\u009f\u2028\u2029\u202a-\u202e\u2066-\u2069]/;

function expectClean(lines: string[]): void {
  for (const l of lines) expect(l, JSON.stringify(l)).not.toMatch(CONTROL);
}

describe('CLI messages', () => {
  it('escapes control characters and keeps each message on one line', () => {
    expect(escapeControls('a\nb\u001b[31mc\u0007\u202e')).toBe('a\\u000ab\\u001b[31mc\\u0007\\u202e');
    expect(escapeControls('N·s/m ζ 25 lb')).toBe('N·s/m ζ 25 lb');
  });

  it('a newline in --in m=… gives a one-line error', async () => {
    const r = await run('calc', 'sdof', '--in', 'm=1\n2', '--in', 'k=4000', '--in', 'c=40');
    expect(r.code).not.toBe(0);
    expect(r.err).toHaveLength(1);
    expectClean(r.err);
    expect(r.err[0]).toMatch(/'m'/);
  });

  it('ESC and BEL in a unit string are printed escaped', async () => {
    const r = await run('calc', 'sdof', '--in', 'm=10 \u001b[32mlb\u0007', '--in', 'k=4000', '--in', 'c=40');
    expect(r.code).not.toBe(0);
    expectClean(r.err);
    expect(r.err[0]).toContain('\\u001b');
  });

  it('a crafted record cannot forge a coloured "reproduced" line', async () => {
    const sdof = getCalculator('sdof')!;
    const v = evaluate(sdof, { m: 10, k: 4000, c: 40 });
    const rec = makeRecord(sdof, v.values, v.outputs, {}, { coreVersion: '0.1.0' });
    const forged = { ...rec, outputs: { ...rec.outputs, regime: { value: 'x\r\n\u001b[32m  5 of 5 recorded outputs reproduced\u001b[0m' } } };
    const f = join(tmp, 'forged.json');
    writeFileSync(f, JSON.stringify(forged));
    const r = await run('calc', '--record', f);
    expect(r.code).toBe(1);
    expectClean([...r.out, ...r.err]);
    expect(r.out.filter((l) => /^\s*\d+ of \d+ recorded outputs reproduced/.test(l))).toHaveLength(1);
  });

  it('check prints frontmatter text escaped', async () => {
    const dir = join(tmp, 'content');
    mkdirSync(join(dir, 'handbook'), { recursive: true });
    writeFileSync(join(dir, 'handbook', 'bad.mdx'), '---\nid: bad\ntitle: "T\\u0007"\nstatus: "draft\\nFAIL \\u001b[31mforged"\n---\n\nText.\n');
    const r = await run('check', '--content', dir);
    expect(r.code).toBe(1);
    expectClean([...r.out, ...r.err]);
  });

  it('usage text is printed line by line', async () => {
    const r = await run('help');
    expect(r.out.length).toBeGreaterThan(3);
    expectClean(r.out);
  });
});

describe('one decimal-comma rule for the page and the CLI', () => {
  it.each(['1,5', '1,5 kg', '1,500', '-0,25e3'])('calc refuses m=%s with the message the page shows at the field', async (m) => {
    const { DECIMAL_COMMA, readField } = await import('../../src/components/render/fieldState.ts');
    const def = getCalculator('sdof')!.inputs.find((i) => i.key === 'm')!;
    expect(readField(def, m, 'kg', {})).toEqual({ ok: false, message: DECIMAL_COMMA });
    const r = await run('calc', 'sdof', '--in', `m=${m}`, '--in', 'k=4000', '--in', 'c=40');
    expect(r.code).toBe(1);
    expect(r.err).toHaveLength(1);
    expect(r.err[0]).toContain(DECIMAL_COMMA);
  });

  it('a decimal point still reads, with or without a unit', async () => {
    const r = await run('calc', 'sdof', '--in', 'm=1.5 kg', '--in', 'k=4000', '--in', 'c=40', '--json');
    expect(r.code, r.err.join('\n')).toBe(0);
    expect((JSON.parse(r.out[0]!) as { inputs: { m: number } }).inputs.m).toBe(1.5);
  });
});
