/**
 * Feeds between pages: every link names a page whose calculator has the inputs it fills, every
 * source it draws on exists, and a link built from a result opens a page that computes. The
 * cross-page checks compare closed forms: ½cω²Z² (Chopra, Dynamics of Structures, 5th ed., 2017,
 * eq. 3.8.1, mean power = E_D·f; published), the record's energy kept by the hand-off (closed form),
 * and the adiabatic rise E/C as the limit of the lumped warm-up for UA → 0 (Incropera et al.,
 * Fundamentals of Heat and Mass Transfer, 6th ed., 2007, §5.3; from memory).
 */
import { describe, expect, it } from 'vitest';
import { readPages } from '../../src/cli/pages.ts';
import { evaluate, defaults, validateInputs } from '../../src/calculators/evaluate.ts';
import { ComputationError } from '../../src/core/errors.ts';
import { feedQuery, feedSource, MAX_URL_PARAM, urlValue } from '../../src/calculators/feeds.ts';
import { calculators, getCalculator } from '../../src/calculators/registry.ts';
import type { CalculatorDefinition, FeedDef, InputDef } from '../../src/calculators/types.ts';
import { expectClose } from '../helpers/expectClose.ts';

const pages = readPages('content');
const feeds = calculators.flatMap((c) => c.outputs.flatMap((o) => (o.feeds ?? []).map((f) => ({ calc: c, out: o.key, feed: f }))));

/** The calculators on a page (frontmatter `calculators`). */
function pageCalcs(id: string): CalculatorDefinition[] {
  const page = pages.find((p) => p.meta?.id === id);
  return (page?.meta?.calculators ?? []).map((c) => getCalculator(c)!).filter(Boolean);
}

function targetInput(feed: FeedDef, key: string): InputDef | undefined {
  return pageCalcs(feed.page).flatMap((c) => c.inputs).find((d) => d.key === key);
}

/** The link built from a result, read back as the target page reads its address. */
function link(calc: CalculatorDefinition, out: string, feed: FeedDef, raw: Record<string, unknown> = {}) {
  let src = evaluate(calc, { ...defaults(calc), ...raw });
  let q = feedQuery(feed, out, src);
  // an output of one choice only (fv-fit's power-law F_ref): try the source's choice options in turn
  for (const d of calc.inputs) {
    if (q !== undefined || d.kind !== 'choice' || d.key in raw) continue;
    for (const o of d.options) {
      if (q !== undefined) break;
      src = evaluate(calc, { ...defaults(calc), ...raw, [d.key]: o.value });
      q = feedQuery(feed, out, src);
    }
  }
  expect(q, `${calc.id}.${out} → ${feed.page}`).toBeDefined();
  const target = pageCalcs(feed.page)[0]!;
  const params = Object.fromEntries(new URLSearchParams(q));
  for (const [k, v] of Object.entries(params)) expect(urlValue(target.inputs.find((d) => d.key === k)!, v), `${k} accepted from the address`).toBe(v);
  return { src, target, params };
}

/** Opens the link as the target page would: query → raw inputs → evaluate (defaults fill the rest). */
function follow(calc: CalculatorDefinition, out: string, feed: FeedDef, raw: Record<string, unknown> = {}) {
  const { src, target, params } = link(calc, out, feed, raw);
  return { src, dst: evaluate(target, { ...defaults(target), ...params }), params };
}

describe('feeds between pages', () => {
  it('exist, and the forced-response, recorded-motion and structural pages feed the thermal and duty pages', () => {
    const has = (id: string, out: string, page: string) => feeds.some((f) => f.calc.id === id && f.out === out && f.feed.page === page);
    expect(has('forced-response', 'Z', 'harmonic-duty')).toBe(true);
    expect(has('forced-response', 'P', 'warm-up')).toBe(true);
    expect(has('recorded-motion', 'P', 'warm-up')).toBe(true);
    expect(has('structural-dampers', 'P', 'warm-up')).toBe(true);
  });

  describe.each(feeds.map((f) => [`${f.calc.id}.${f.out} → ${f.feed.page} (${f.feed.label})`, f] as const))('%s', (_name, { calc, out, feed }) => {
    it('targets a page whose calculator has every input it fills, with valid choice values', () => {
      expect(pages.some((p) => p.meta?.id === feed.page), `page '${feed.page}'`).toBe(true);
      for (const key of [feed.input, ...Object.keys(feed.with ?? {}), ...Object.keys(feed.set ?? {})]) {
        expect(targetInput(feed, key), `${feed.page} has input '${key}'`).toBeDefined();
      }
      for (const [key, v] of Object.entries(feed.set ?? {})) {
        const def = targetInput(feed, key)!;
        if (def.kind === 'choice') expect(def.options.map((o) => o.value)).toContain(v);
      }
      for (const key of Object.keys(feed.with ?? {})) {
        const def = targetInput(feed, key)!;
        if (def.kind === 'text') expect(def.fromUrl, `${feed.page}.${key} accepts text from the address`).toBe(true);
      }
    });

    it('draws on sources that exist once among its outputs, inputs and hand-offs', () => {
      for (const source of [out, ...Object.values(feed.with ?? {})]) {
        const n = [calc.outputs.some((o) => o.key === source), calc.inputs.some((d) => d.key === source), (calc.handoffs ?? []).some((h) => h.key === source)].filter(Boolean).length;
        expect(n, `${calc.id}: source '${source}'`).toBe(1);
      }
    });

    it('opens a page that accepts every value it carries from the default result', () => {
      const { target, params } = link(calc, out, feed);
      // each value passes the target's own input checks; the target may still find no answer
      // (e.g. a steady temperature above its table for a small body), which it reports as such
      expect(() => validateInputs(target, { ...defaults(target), ...params })).not.toThrow();
      try { evaluate(target, { ...defaults(target), ...params }); } catch (e) { expect(e).toBeInstanceOf(ComputationError); }
    });
  });
});

describe('feeds carry the right numbers', () => {
  it('forced-response → harmonic-duty: a linear damper at the stroke Z and frequency f gives the same ½cω²Z²', () => {
    const calc = getCalculator('forced-response')!;
    const feed = calc.outputs.find((o) => o.key === 'Z')!.feeds!.find((f) => f.page === 'harmonic-duty')!;
    for (const raw of [{}, { excitation: 'base', Y: 0.004, f: 9 }, { c: 4000, f: 31 }]) {
      const { src, dst, params } = follow(calc, 'Z', feed, raw);
      expect(params.law).toBe('linear');
      expectClose({ label: 'P', computed: dst.outputs.P as number, expected: src.outputs.P as number, tol: 1e-8, why: 'same closed form; the link carries 10 significant digits' });
    }
  });

  it('recorded-motion → warm-up: the profile handed over keeps the record’s mean power (energy kept)', () => {
    const calc = getCalculator('recorded-motion')!;
    const feed = calc.outputs.find((o) => o.key === 'P')!.feeds!.find((f) => f.page === 'warm-up')!;
    const { src, dst, params } = follow(calc, 'P', feed);
    expect(params.power).toBe('profile');
    expect(params.profile!.split(';').length).toBeLessThanOrEqual(101);
    expectClose({ label: 'P̄', computed: dst.outputs.Pmean as number, expected: src.outputs.P as number, tol: 1e-7, why: 'energy-kept blocks, times and powers to 8 significant figures' });
  });

  it('structural-dampers → warm-up: one event then off; with UA → 0 the rise is the adiabatic E/C', () => {
    const calc = getCalculator('structural-dampers')!;
    const feed = calc.outputs.find((o) => o.key === 'P')!.feeds!.find((f) => f.page === 'warm-up')!;
    const src = evaluate(calc, defaults(calc));
    const params = Object.fromEntries(new URLSearchParams(feedQuery(feed, 'P', src)!));
    expect(params.after).toBe('off');
    const warm = getCalculator('warm-up')!;
    const dst = evaluate(warm, { ...defaults(warm), ...params, UA: 1e-9 });
    expectClose({ label: 'rise', computed: (dst.outputs.Tpeak as number) - 298.15, expected: src.outputs.dT as number, tol: 1e-6, why: 'lumped rise P·t/C·(1 − t/2τ + …) with t/τ ≈ 1e-8; 8 s.f. in the link' });
  });
});

describe('feedQuery and urlValue', () => {
  it('puts the output first, then `with` sources, then `set` constants, and is absent while a source is missing', () => {
    const feed: FeedDef = { page: 'x', input: 'P', label: 'l', with: { f: 'f', profile: 'profile' }, set: { power: 'profile' } };
    expect(feedQuery(feed, 'P', { values: { f: 2 }, outputs: { P: 41.6370000001 }, handoff: { profile: '0,1;5' } })).toBe('P=41.637&f=2&profile=0%2C1%3B5&power=profile');
    expect(feedQuery(feed, 'P', { values: { f: 2 }, outputs: { P: 41.6 } })).toBeUndefined();
    expect(feedQuery(feed, 'P', { values: { f: 2 }, outputs: { P: NaN }, handoff: { profile: '' } })).toBeUndefined();
    expect(feedSource('toString', { values: {}, outputs: {} })).toBeUndefined();
    expect(feedSource('__proto__', { values: {}, outputs: {} })).toBeUndefined();
  });

  it('accepts text from the address only where the definition allows it, and never beyond its length', () => {
    const warm = getCalculator('warm-up')!;
    const profile = warm.inputs.find((d) => d.key === 'profile')!;
    const csv = getCalculator('recorded-motion')!.inputs.find((d) => d.key === 'csv')!;
    const P = warm.inputs.find((d) => d.key === 'P')!;
    expect(urlValue(profile, '0,1;5')).toBe('0,1;5');
    expect(urlValue(profile, '<img src=x onerror=alert(1)>')).toBe('<img src=x onerror=alert(1)>'); // shown as text, refused by the parser
    expect(urlValue(profile, 'x'.repeat(10_000_000))).toBeUndefined();
    expect(urlValue(csv, 't,x\n0,0')).toBeUndefined();
    expect(urlValue(P, '9'.repeat(MAX_URL_PARAM + 1))).toBeUndefined();
    expect(urlValue(P, null)).toBeUndefined();
  });
});
