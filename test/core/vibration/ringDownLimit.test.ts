/**
 * ring-down: the refusal message states the damping at which the guard really trips.
 * Records are the closed-form free response of a linear SDOF (Rao, Mechanical Vibrations, 6th ed.,
 * §2.6, eq. 2.72, from memory): released from rest x = e^{−σt}(cos ω_d t + (σ/ω_d) sin ω_d t),
 * started by a tap x = e^{−σt} sin ω_d t (closed form, noise-free).
 */
import { describe, expect, it } from 'vitest';
import { ringDown } from '../../../src/core/vibration/index.ts';
import { RING_DOWN_ZETA_LIMIT } from '../../../src/core/vibration/decayPeaks.ts';

function record(kind: 'release' | 'tap', zeta: number, perCycle: number, periods: number): { t: number[]; y: number[] } {
  const wn = 20, wd = wn * Math.sqrt(1 - zeta * zeta), s = zeta * wn, T = (2 * Math.PI) / wd;
  const t: number[] = [], y: number[] = [];
  for (let i = 0; i <= Math.round(periods * perCycle); i++) {
    const tt = (i * T) / perCycle;
    t.push(tt);
    y.push(Math.exp(-s * tt) * (kind === 'release' ? Math.cos(wd * tt) + (s / wd) * Math.sin(wd * tt) : Math.sin(wd * tt)));
  }
  return { t, y };
}

/** Largest ζ (step 0.005) below which every record of the kind is analysed, over sampling and length. */
function trip(kind: 'release' | 'tap'): number {
  let lo = 0.1;
  for (let z = 0.1; z < 0.6; z += 0.005) {
    const ok = [20, 200].every((n) => [3, 12].every((p) => { try { ringDown(record(kind, z, n, p).t, record(kind, z, n, p).y); return true; } catch { return false; } }));
    if (!ok) break;
    lo = z;
  }
  return lo;
}

describe('ring-down heavy-damping limit', () => {
  it('the limits the message quotes are where clean records stop being analysed (within 0.015)', () => {
    const release = trip('release'), tap = trip('tap');
    expect(Math.abs(release - RING_DOWN_ZETA_LIMIT.release)).toBeLessThan(0.015);
    expect(Math.abs(tap - RING_DOWN_ZETA_LIMIT.tap)).toBeLessThan(0.015);
  });
  it('a record just below each limit is analysed, one above is refused with the message that quotes it', () => {
    const below = record('release', RING_DOWN_ZETA_LIMIT.release, 100, 6);
    expect(ringDown(below.t, below.y).zeta).toBeCloseTo(RING_DOWN_ZETA_LIMIT.release, 3);
    const above = record('release', 0.25, 100, 6);
    expect(() => ringDown(above.t, above.y)).toThrow(/ζ ≈ 0\.21 when released from rest/);
    const tap = record('tap', 0.33, 100, 6);
    expect(() => ringDown(tap.t, tap.y)).toThrow(/ζ ≈ 0\.3 when started by a tap/);
    expect(() => ringDown(above.t, above.y)).not.toThrow(/0\.35/);
  });
});
