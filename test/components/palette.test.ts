/**
 * The series palette (src/components/render/palette.ts): eight slots that differ in colour and in
 * dash pattern. Colour difference is CIE76 ΔE*ab in CIELAB from sRGB (D65): CIE 15:2004
 * "Colorimetry", 3rd ed., §8.2.1 (L*a*b*) and IEC 61966-2-1:1999 (sRGB transfer curve), both from
 * memory; the sRGB white (255,255,255) → L* = 100, a* = b* = 0 check below is a closed form of them.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { PALETTE, seriesDash, seriesStyle } from '../../src/components/render/palette.ts';

function lab(hex: string): [number, number, number] {
  const c = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255).map((u) => (u <= 0.04045 ? u / 12.92 : ((u + 0.055) / 1.055) ** 2.4));
  const [r, g, b] = c as [number, number, number];
  const X = (0.4124 * r + 0.3576 * g + 0.1805 * b) / 0.95047;
  const Y = 0.2126 * r + 0.7152 * g + 0.0722 * b;
  const Z = (0.0193 * r + 0.1192 * g + 0.9505 * b) / 1.08883;
  const f = (t: number) => (t > (6 / 29) ** 3 ? Math.cbrt(t) : t / (3 * (6 / 29) ** 2) + 4 / 29);
  return [116 * f(Y) - 16, 500 * (f(X) - f(Y)), 200 * (f(Y) - f(Z))];
}
const dE = (a: string, b: string) => Math.hypot(...lab(a).map((v, i) => v - lab(b)[i]!));

describe('series palette', () => {
  it('the Lab conversion is right at white and black (closed form)', () => {
    expect(lab('#ffffff')[0]).toBeCloseTo(100, 1);
    expect(Math.abs(lab('#ffffff')[1])).toBeLessThan(0.1);
    expect(lab('#000000')[0]).toBeCloseTo(0, 6);
  });

  it('has eight slots whose colours differ pairwise by ΔE*ab ≥ 20', () => {
    expect(PALETTE).toHaveLength(8);
    for (let i = 0; i < 8; i++) for (let j = i + 1; j < 8; j++) {
      expect(dE(PALETTE[i]!.colour, PALETTE[j]!.colour), `slots ${i} and ${j}`).toBeGreaterThanOrEqual(20);
    }
  });

  it('gives every slot its own dash pattern, so series stay apart in greyscale print', () => {
    const dashes = PALETTE.map((p) => p.dash.join(','));
    expect(new Set(dashes).size).toBe(8);
    expect(seriesDash(0, 'dash').length).toBeGreaterThan(0); // an explicitly dashed series on the solid slot is still dashed
    expect(seriesStyle(9)).toBe(PALETTE[1]);
  });

  it('the CSS variables --tone-0…7 repeat the palette colours', () => {
    const css = readFileSync('src/styles/base.css', 'utf8');
    PALETTE.forEach((p, i) => expect(css).toMatch(new RegExp(`--tone-${i}:\\s*${p.colour};`, 'i')));
  });

  it('road classes A and G, B and H no longer share a colour (8 classes, 8 slots)', () => {
    expect(seriesStyle(0)).not.toBe(seriesStyle(6));
    expect(seriesStyle(1)).not.toBe(seriesStyle(7));
  });
});
