/**
 * Pure helpers of the page's fields and sentences: numbers with a decimal point only (the CLI's
 * rule), numbers typed with their unit, the checksum that marks data a link cannot carry, and
 * chart summaries whose quantities follow the unit system.
 * Conversion factors: NIST SP 811 (2008), Appendix B.8 — 1 in = 0.0254 m (exact), 1 lbf =
 * 4.448222 N; published.
 */
import { describe, expect, it } from 'vitest';
import { calculators } from '../../src/calculators/registry.ts';
import { evaluate } from '../../src/calculators/evaluate.ts';
import { hasQuantityToken, q } from '../../src/calculators/quantityText.ts';
import { DECIMAL_COMMA, parseTyped, readField, splitTyped, textSum } from '../../src/components/render/fieldState.ts';
import { quantityText, scriptJson } from '../../src/components/render/format.ts';

describe('typed numbers', () => {
  it('takes a decimal point and refuses a decimal comma with the rule', () => {
    expect(parseTyped('1.5')).toBe(1.5);
    expect(parseTyped('1,5')).toBeNaN();
    const def = calculators.find((c) => c.id === 'sdof')!.inputs.find((i) => i.key === 'm')!;
    expect(readField(def, '1,5', 'kg', {})).toEqual({ ok: false, message: DECIMAL_COMMA });
  });

  it('reads a number typed with a unit of the field in that unit', () => {
    expect(splitTyped('22 kN/m', 'stiffness')).toEqual({ number: '22', unit: 'kN/m' });
    expect(splitTyped('250 N/mm', 'stiffness')).toEqual({ number: '250', unit: 'N/mm' });
    expect(splitTyped('22 kg', 'stiffness')).toBeUndefined();
    const def = calculators.find((c) => c.id === 'sdof')!.inputs.find((i) => i.key === 'k')!;
    expect(readField(def, '22 kN/m', 'N/m', {})).toEqual({ ok: true, value: 22000 });
  });

  it('marks text with a stable 8-hex-digit checksum that changes with the text', () => {
    expect(textSum('t,x\n0,1')).toMatch(/^[0-9a-f]{8}$/);
    expect(textSum('t,x\n0,1')).toBe(textSum('t,x\n0,1'));
    expect(textSum('t,x\n0,1')).not.toBe(textSum('t,x\n0,2'));
    expect(textSum('')).toBe('811c9dc5'); // the FNV-1a 32-bit offset basis (Fowler–Noll–Vo, IETF draft-eastlake-fnv), published
  });
});

describe('quantities in sentences', () => {
  it('renders a token in the reader\'s units', () => {
    const text = `stroke ${q(0.0254, 'length')} and force ${q(4.448222, 'force')}`;
    expect(quantityText(text, 'SI')).toBe('stroke 25.4 mm and force 4.448 N');
    expect(quantityText(text, 'US')).toBe('stroke 1 in and force 1 lbf');
  });

  it('every chart summary of every calculator renders with no token left, in both systems', () => {
    for (const c of calculators) {
      if (!c.charts) continue;
      const r = evaluate(c, {});
      for (const spec of c.charts(r.values, r)) for (const sys of ['SI', 'US'] as const) {
        expect(hasQuantityToken(quantityText(spec.summary, sys)), `${c.id}/${spec.id}`).toBe(false);
      }
    }
  });
});

describe('JSON data blocks', () => {
  // HTML Living Standard, "Restrictions for contents of script elements": the text may not contain
  // "</script"; JSON (RFC 8259 §7) reads the escape \u003c back as "<"
  it('never closes its script block early and reads back to the same value', () => {
    const v = { title: 'a </script><script>alert(1)</script> b', list: ['<!--', 1.5] };
    const text = scriptJson(v);
    expect(text).not.toMatch(/</);
    expect(JSON.parse(text)).toEqual(v);
  });
});
