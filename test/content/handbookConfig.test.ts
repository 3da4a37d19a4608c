/**
 * A handbook folder's handbook.config.json: contrast ratios against white by the WCAG 2.1
 * formula, one-line refusals naming the field, and the demo's config holding the demo's topics.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { contrastOnWhite, HandbookConfigError, parseHandbookConfig, topicTitles } from '../../src/content/handbookConfig.ts';
import { readHandbookConfig } from '../../src/content/readHandbookConfig.ts';
import { TOPICS } from '../../src/content/schema.ts';
import { expectClose } from '../helpers/expectClose.ts';

const base = { organisation: 'Tarnwick Works — Machine shop', shortName: 'TW Machines', topics: [{ id: 'machines', title: 'Machines', order: 1 }] };
const parse = (o: unknown) => parseHandbookConfig(JSON.stringify(o), 'h.json');

describe('contrast against white (WCAG 2.1, definitions of relative luminance and contrast ratio)', () => {
  it.each([
    // [colour, ratio, source and provenance]
    ['#000000', 21, 'WCAG 2.1, contrast ratio: black on white is (1 + 0.05)/(0 + 0.05) = 21 (closed form)'],
    ['#ffffff', 1, 'WCAG 2.1, contrast ratio of a colour with itself (closed form)'],
    ['#767676', 4.54, 'WebAIM contrast checker: #767676 on white 4.54:1, the lightest grey meeting 4.5:1 (from memory)'],
  ])('%s on white is %s:1 (%s)', (hex, ratio) => {
    // 4.54 is quoted to two decimals: half a unit of the last digit
    expectClose({ label: hex, computed: contrastOnWhite(hex), expected: ratio, tol: ratio === 4.54 ? 0.005 / 4.54 : 1e-12 });
  });
});

describe('handbook.config.json', () => {
  it('fills the handbook name, tagline and colours of the handbook\'s own look', () => {
    const c = parse(base);
    expect(c.handbook).toBe('Dampbook');
    expect(c.colours).toEqual({ accent: '#a4512a', accentInk: '#7c3a1b' });
  });

  it.each([
    [{ ...base, organisation: undefined }, /^h\.json: organisation: Required$/],
    [{ ...base, colours: { accentInk: '#777777' } }, /^h\.json: colours\.accentInk: #777777 has contrast 4\.48:1 against white; text needs at least 4\.5:1 \(WCAG 2\.1 SC 1\.4\.3\)$/],
    [{ ...base, colours: { accent: '#dddddd' } }, /^h\.json: colours\.accent: #dddddd has contrast .*at least 3:1 \(WCAG 2\.1 SC 1\.4\.11\)$/],
    [{ ...base, colours: { accent: 'red' } }, /^h\.json: colours\.accent: a hex colour such as #7c3a1b$/],
    [{ ...base, logo: '../secret.svg' }, /^h\.json: logo: /],
    [{ ...base, logo: 'mark.gif' }, /^h\.json: logo: a \.svg or \.png file/],
    [{ ...base, topics: [] }, /^h\.json: topics: at least one topic$/],
    [{ ...base, topics: [{ id: 'a', title: 'Machines', order: 1 }, { id: 'b', title: 'Machines', order: 2 }] }, /^h\.json: topics\.1: topic title 'Machines' is given twice/],
    [{ ...base, colour: '#000000' }, /^h\.json: \(file\): Unrecognized key/],
  ])('refuses %j with one line naming the field', (config, message) => {
    let e: unknown;
    try { parse(config); } catch (x) { e = x; }
    expect(e).toBeInstanceOf(HandbookConfigError);
    expect((e as Error).message).toMatch(message);
    expect((e as Error).message.split('\n')).toHaveLength(1);
  });

  it('refuses text that is not JSON with one line', () => {
    expect(() => parseHandbookConfig('{ organisation: ', 'h.json')).toThrow(/^h\.json: not valid JSON/);
  });

  it('the demo\'s config holds the demo\'s topics, in their order', () => {
    expect(topicTitles(readHandbookConfig('content'))).toEqual([...TOPICS]);
    expect(JSON.parse(readFileSync('content/handbook.config.json', 'utf8')).organisation).toBe('Tarnwick Works — Dynamics & Thermal group');
  });
});
