/**
 * A record or study made with an older core says which result changes since then touch its
 * calculators (src/calculators/changes.ts): `dampbook calc --record` and `dampbook study run`.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { main } from '../../src/cli/main.ts';

async function run(...argv: string[]): Promise<{ code: number; out: string }> {
  const out: string[] = [];
  const code = await main(argv, (s) => out.push(s), () => undefined);
  return { code, out: out.join('\n') };
}
const tmp = mkdtempSync(join(tmpdir(), 'dampbook-versions-'));
afterAll(() => rmSync(tmp, { recursive: true, force: true }));

describe('notes for results made with an older core', () => {
  it('calc --record lists the changes since the record that touch its calculator', async () => {
    // closed forms (Rao, Mechanical Vibrations, 6th ed., §2.6): ωn = 20 rad/s, ζ = 0.1, Q = 5
    const record = {
      format: 'dampbook-record', formatVersion: 1, calculator: 'sdof', coreVersion: '0.1.0', time: '2026-11-30T10:00:00.000Z',
      inputs: { m: { value: 10, unit: 'kg' }, k: { value: 4000, unit: 'N/m' }, c: { value: 40, unit: 'N.s/m' } },
      outputs: { wn: { value: 20, unit: 'rad/s' }, zeta: { value: 0.1 } },
    };
    const f = join(tmp, 'old.json');
    writeFileSync(f, JSON.stringify(record));
    const r = await run('calc', '--record', f, '--json');
    const j = JSON.parse(r.out) as { warnings: string[] };
    expect(j.warnings).toContainEqual(expect.stringMatching(/^Core 0\.2\.0 changed sdof: /));
  });

  it('study run lists the changes since the study that touch its steps', async () => {
    const study = JSON.parse(readFileSync('content/studies/tw-118-end-stop.json', 'utf8')) as Record<string, unknown>;
    const f = join(tmp, 'study.json');
    writeFileSync(f, JSON.stringify({ ...study, coreVersion: '0.3.0' }));
    const r = await run('study', 'run', f);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/^note: Core 0\.4\.0 changed impact: .*per stop/m);
    const j = JSON.parse((await run('study', 'run', f, '--json')).out) as { coreVersion: string; changes: string[] };
    expect(j.coreVersion).toBe('0.3.0');
    expect(j.changes.length).toBeGreaterThan(0);
  });
});
