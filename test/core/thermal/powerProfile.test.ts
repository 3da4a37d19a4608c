/**
 * The text form of a power profile: entries "t, P", end time alone, comments, ';' separators;
 * every malformed entry refused with an InputRangeError naming the line. Format rules are ours
 * (common practice, no source): a duty as a table of times and powers.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ComputationError, InputRangeError } from '../../../src/core/errors.ts';
import {
  checkProfile, formatPowerProfile, MAX_PROFILE_SEGMENTS, parsePowerProfile, profileMeanPower, profilePowerAt,
} from '../../../src/core/thermal/index.ts';

describe('parsePowerProfile', () => {
  it('reads lines or ;-separated entries, commas, tabs or spaces, comments and blank lines', () => {
    const want = { t: [0, 600, 1200], P: [120, 0] };
    expect(parsePowerProfile('0,120;600,0;1200')).toEqual(want);
    expect(parsePowerProfile('# duty\n0, 120\n\n600\t0\r\n1200\n')).toEqual(want);
    expect(parsePowerProfile('  0 120 ; 6e2 0 ;  1.2e3 ')).toEqual(want);
  });

  it('names the line of each malformed entry', () => {
    const cases: [string, RegExp][] = [
      ['0,120\n600,abc\n1200', /line 2: not a number/],
      ['5,120\n1200', /line 1: the first entry must start at time 0/],
      ['0,120\n600,0\n600,5\n1200', /line 3: times must increase/],
      ['0,120\n600,-1\n1200', /line 2: not a number|line 2: power must be/],
      ['0,120\n1200\n1300,4', /line 3: an entry after the end time/],
      ['0,1,2\n5', /line 1: expected "time, power"/],
      ['0\n5', /line 1: the first entry needs a power/],
      ['0,120\n600,0', /line 2: the last line must be the end time alone/],
      ['0,1e999\n5', /line 1: power must be between/],
      ['0,0x10\n5', /line 1: not a number/],
      ['# nothing\n\n', /no entries/],
      ['<img src=x onerror=alert(1)>', /line 1: not a number/],
      ['__proto__,constructor\n1', /line 1: not a number/],
    ];
    for (const [text, msg] of cases) {
      let err: unknown;
      try { parsePowerProfile(text); } catch (e) { err = e; }
      expect(err, text).toBeInstanceOf(InputRangeError);
      expect((err as InputRangeError).input).toBe('profile');
      expect((err as Error).message, text).toMatch(msg);
    }
  });

  it('refuses oversized text and more than the allowed segments without reading them all', () => {
    expect(() => parsePowerProfile('x'.repeat(10_000_000))).toThrow(/longer than/);
    const many = `${Array.from({ length: MAX_PROFILE_SEGMENTS + 1 }, (_, i) => `${i},1`).join(';')};${MAX_PROFILE_SEGMENTS + 1}`;
    expect(() => parsePowerProfile(many)).toThrow(/more than 2000 segments/);
    expect(() => checkProfile({ t: [0], P: [] })).toThrow(ComputationError);
  });

  it('reads back what it writes (to 8 significant figures)', () => {
    const seg = fc.tuple(fc.double({ min: 1e-3, max: 1e4, noNaN: true }), fc.double({ min: 0, max: 1e5, noNaN: true }));
    fc.assert(fc.property(fc.array(seg, { minLength: 1, maxLength: 50 }), (segs) => {
      const t = [0];
      for (const [dt] of segs) t.push(t[t.length - 1]! + dt);
      const p = { t, P: segs.map(([, P]) => P) };
      const back = parsePowerProfile(formatPowerProfile(p));
      back.t.forEach((x, i) => expect(Math.abs(x - t[i]!)).toBeLessThanOrEqual(1e-7 * Math.max(1, t[i]!)));
      back.P.forEach((x, i) => expect(Math.abs(x - p.P[i]!)).toBeLessThanOrEqual(1e-7 * Math.max(1, p.P[i]!)));
    }), { seed: 1, numRuns: 100 });
  });

  it('gives the mean power and the power at a time', () => {
    const p = parsePowerProfile('0,120;600,0;900,40;1200');
    expect(profileMeanPower(p)).toBeCloseTo((120 * 600 + 40 * 300) / 1200, 12);
    expect([0, 599, 600, 899, 900, 1199].map((s) => profilePowerAt(p, s))).toEqual([120, 120, 0, 0, 40, 40]);
  });
});
