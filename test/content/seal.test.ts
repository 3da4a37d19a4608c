/**
 * The sign-off seal (src/content/seal.ts): what it covers and what it leaves out, and the
 * minimal frontmatter edit that writes it (src/cli/frontmatterEdit.ts).
 */
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { getCalculator } from '../../src/calculators/registry.ts';
import { setFields, yamlScalar } from '../../src/cli/frontmatterEdit.ts';
import { parsePage } from '../../src/cli/pages.ts';
import { canonicalJson, pageBody, sealOf, sealState, shortSha256, statusView } from '../../src/content/seal.ts';
import { packageView, toHtml } from '../../src/studies/packageView.ts';
import { runStudy } from '../../src/studies/run.ts';
import { parseStudy } from '../../src/studies/schema.ts';

const sdofText = readFileSync('content/oscillators/sdof.mdx', 'utf8');
const impactText = readFileSync('content/duty/impact.mdx', 'utf8');
const meta = (text: string) => {
  const p = parsePage(text);
  expect(p.errors).toEqual([]);
  return p.meta!;
};
const seal = (text: string) => sealOf(pageBody(text), meta(text));

describe('the seal hash', () => {
  it('is SHA-256: the "abc" test vector', () => {
    // NIST FIPS 180-4 (2015), Secure Hash Standard; example "abc" of the SHA-256 examples
    // (csrc.nist.gov example values, published): ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad
    expect(shortSha256('abc')).toBe('ba7816bf8f01cfea');
  });

  it('is the recorded seal of every signed-off demo page (what approve wrote is what check computes)', () => {
    for (const text of [sdofText, impactText]) expect(sealState(meta(text), pageBody(text)).state).toBe('current');
  });

  it('does not change when the sign-off fields change (status, names, dates, the hashes themselves)', () => {
    const base = seal(sdofText);
    const edited = setFields(sdofText, [
      { key: 'status', value: 'checked' }, { key: 'approvedBy', value: 'Wen Hallberg' }, { key: 'approved', value: '2026-12-01' },
      { key: 'checkedBy', value: 'Lucia Penhale' }, { key: 'checked', value: '2026-11-30' }, { key: 'approvalHash', value: '0123456789abcdef' },
    ]);
    expect(edited).not.toBe(sdofText);
    expect(seal(edited)).toBe(base);
  });

  it('changes with one character of the method text', () => {
    const body = pageBody(sdofText);
    const i = body.indexOf('damper');
    const edited = sdofText.replace(body, `${body.slice(0, i)}Damper${body.slice(i + 6)}`);
    expect(seal(edited)).not.toBe(seal(sdofText));
  });

  it("changes with a page case's tolerance and with a definition case's tolerance", () => {
    const m = meta(impactText);
    expect(m.verification.length).toBeGreaterThan(0);
    const body = pageBody(impactText);
    const base = sealOf(body, m);
    const pageCases = m.verification.map((c, i) => (i === 0 ? { ...c, tolerance: c.tolerance * 2 } : c));
    expect(sealOf(body, { ...m, verification: pageCases })).not.toBe(base);
    const calc = getCalculator('impact')!;
    const looser = { ...calc, verification: calc.verification.map((c, i) => (i === 0 ? { ...c, tolerance: c.tolerance * 2 } : c)) };
    expect(sealOf(body, m, (id) => (id === 'impact' ? looser : getCalculator(id)))).not.toBe(base);
  });

  it('reads CRLF line ends as the same page (a Windows checkout is not a change)', () => {
    expect(seal(sdofText.replace(/\n/g, '\r\n'))).toBe(seal(sdofText));
  });

  it('canonical JSON does not depend on key order (property, fixed seed)', () => {
    fc.assert(fc.property(fc.dictionary(fc.string(), fc.oneof(fc.integer(), fc.string(), fc.double({ noNaN: true, noDefaultInfinity: true }))), (o) => {
      const reversed = Object.fromEntries(Object.entries(o).reverse());
      return canonicalJson(o) === canonicalJson(reversed);
    }), { seed: 1, numRuns: 200 });
  });
});

describe('what a reader sees', () => {
  const edited = sdofText.replace('Every damper sizing starts here', 'Every damper sizing begins here');
  it('says "changed since approval" for an approved page that no longer matches, "changed since check" for a checked one', () => {
    expect(statusView(sealState(meta(edited), pageBody(edited)))).toEqual({ label: 'changed since approval', cls: 'changed' });
    const checked = setFields(edited, [{ key: 'status', value: 'checked' }]);
    expect(statusView(sealState(meta(checked), pageBody(checked))).label).toBe('changed since check');
    expect(statusView(sealState(meta(sdofText), pageBody(sdofText)))).toEqual({ label: 'approved', cls: 'approved' });
  });

  it('reads a signed-off page with no seal as changed (nothing shows it is what was signed)', () => {
    const unsealed = sdofText.replace(/^approvalHash: .*\n/m, '');
    expect(sealState(meta(unsealed), pageBody(unsealed)).state).toBe('unsealed');
    expect(statusView(sealState(meta(unsealed), pageBody(unsealed))).label).toBe('changed since approval');
  });

  it('prints "changed since approval" in the study package, cover and step sheet', () => {
    const study = parseStudy(readFileSync('content/studies/tw-118-end-stop.json', 'utf8'));
    if (!study.ok) throw new Error(study.message);
    const cat = { pages: { impact: { url: '/duty/impact/', title: 'End-stop impacts', revision: 'B', status: 'changed since approval', verification: 'ok' } }, formulas: {} };
    const html = toHtml(packageView(runStudy(study.study, getCalculator), cat, { organisation: 'Tarnwick Works', screen: [] }, getCalculator));
    expect(html).toContain('<span class="status status-changed">changed since approval</span>');
    expect(html).toMatch(/revision <b>B<\/b>, changed since approval/);
  });
});

describe('the frontmatter edit', () => {
  it('keeps every other byte of the file', () => {
    const next = setFields(sdofText, [{ key: 'approvalHash', value: 'ffffffffffffffff' }, { key: 'approved', value: '2026-10-01' }]);
    expect(next).toBe(sdofText.replace(/^approvalHash: .*$/m, 'approvalHash: ffffffffffffffff'));
    const added = setFields(sdofText.replace(/^approvalHash: .*\n/m, ''), [{ key: 'approvalHash', value: 'ffffffffffffffff', after: ['approvedBy', 'approved'] }]);
    expect(added).toBe(sdofText.replace(/^approvalHash: .*$/m, 'approvalHash: ffffffffffffffff'));
  });

  it('writes a name that reads back as the same string (property, fixed seed)', () => {
    fc.assert(fc.property(fc.string({ minLength: 2, maxLength: 40 }).filter((s) => s.trim() === s && !/[\r\n\u0000-\u001f\u007f-\u009f\u2028\u2029\ufeff]/.test(s)), (name) => {
      const text = setFields(sdofText, [{ key: 'approvedBy', value: yamlScalar(name) }]);
      return meta(text).approvedBy === name;
    }), { seed: 1, numRuns: 300 });
  });
});
