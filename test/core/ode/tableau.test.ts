/**
 * The Dormand–Prince coefficients are data typed from memory, so they are checked against the
 * Runge–Kutta order conditions (Butcher trees up to order 5; Hairer, Nørsett & Wanner, Solving
 * ODEs I, 2nd ed., Table II.2.2 (from memory)). One wrong digit breaks at least one condition.
 */
import { describe, expect, it } from 'vitest';
import { DORMAND_PRINCE_54 } from '../../../src/core/ode/index.ts';

const tab = DORMAND_PRINCE_54;
const s = tab.c.length;
const c = tab.c;
const A = (i: number, j: number): number => (j < i ? tab.a[i]![j]! : 0);
const vec = (f: (i: number) => number): number[] => Array.from({ length: s }, (_, i) => f(i));
const Amul = (v: number[]): number[] => vec((i) => v.reduce((acc, vj, j) => acc + A(i, j) * vj, 0));
const dot = (b: readonly number[], v: number[]): number => b.reduce((acc, bi, i) => acc + bi * v[i]!, 0);
const cp = (p: number): number[] => vec((i) => c[i]! ** p);
const times = (u: number[], v: number[]): number[] => u.map((x, i) => x * v[i]!);

/** [tree label, Φ(t) as a stage vector, 1/γ(t)] for every rooted tree of order ≤ 5. */
const TREES: [string, number, () => number[], number][] = [
  ['τ', 1, () => vec(() => 1), 1],
  ['[τ]', 2, () => cp(1), 1 / 2],
  ['[τ,τ]', 3, () => cp(2), 1 / 3],
  ['[[τ]]', 3, () => Amul(cp(1)), 1 / 6],
  ['[τ,τ,τ]', 4, () => cp(3), 1 / 4],
  ['[τ,[τ]]', 4, () => times(cp(1), Amul(cp(1))), 1 / 8],
  ['[[τ,τ]]', 4, () => Amul(cp(2)), 1 / 12],
  ['[[[τ]]]', 4, () => Amul(Amul(cp(1))), 1 / 24],
  ['[τ⁴]', 5, () => cp(4), 1 / 5],
  ['[τ,τ,[τ]]', 5, () => times(cp(2), Amul(cp(1))), 1 / 10],
  ['[τ,[τ,τ]]', 5, () => times(cp(1), Amul(cp(2))), 1 / 15],
  ['[τ,[[τ]]]', 5, () => times(cp(1), Amul(Amul(cp(1)))), 1 / 30],
  ['[[τ],[τ]]', 5, () => times(Amul(cp(1)), Amul(cp(1))), 1 / 20],
  ['[[τ,τ,τ]]', 5, () => Amul(cp(3)), 1 / 20],
  ['[[τ,[τ]]]', 5, () => Amul(times(cp(1), Amul(cp(1)))), 1 / 40],
  ['[[[τ,τ]]]', 5, () => Amul(Amul(cp(2))), 1 / 60],
  ['[[[[τ]]]]', 5, () => Amul(Amul(Amul(cp(1)))), 1 / 120],
];

describe('Dormand–Prince 5(4) tableau', () => {
  it('has rows summing to the nodes (c_i = Σ_j a_ij)', () => {
    for (let i = 0; i < s; i++) expect(Math.abs(tab.a[i]!.reduce((x, y) => x + y, 0) - c[i]!)).toBeLessThan(1e-15);
  });

  it('is first same as last: the last row of a equals b', () => {
    expect(tab.fsal).toBe(true);
    tab.a[s - 1]!.forEach((a, j) => expect(a).toBe(tab.b[j]));
  });

  for (const [label, order, phi, gamma] of TREES) {
    it(`propagated weights satisfy the order-${order} condition of tree ${label}`, () => {
      expect(Math.abs(dot(tab.b, phi()) - gamma)).toBeLessThan(1e-14);
    });
    if (order <= 4) {
      it(`embedded weights satisfy the order-${order} condition of tree ${label}`, () => {
        expect(Math.abs(dot(tab.bHat, phi()) - gamma)).toBeLessThan(1e-14);
      });
    }
  }

  it('embedded weights are of order 4 exactly (some order-5 condition fails)', () => {
    const worst = Math.max(...TREES.filter((t) => t[1] === 5).map(([, , phi, g]) => Math.abs(dot(tab.bHat, phi()) - g)));
    expect(worst).toBeGreaterThan(1e-5);
  });
});
