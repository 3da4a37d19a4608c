/** Load-time checks of the unit table: a typo in the data fails at import, not in a result. */
import type { UnitDef } from './table.ts';

export function validateUnitTable(units: readonly UnitDef[], kinds: readonly string[]): void {
  const seen = new Set<string>();
  for (const u of units) {
    const key = `${u.kind}:${u.id}`;
    if (seen.has(key)) throw new Error(`unit table: duplicate ${key}`);
    seen.add(key);
    if (!kinds.includes(u.kind)) throw new Error(`unit table: ${u.id} has unknown kind ${u.kind}`);
    if (!(Number.isFinite(u.factor) && u.factor > 0)) throw new Error(`unit table: ${u.id} factor must be > 0`);
    if (u.offset !== undefined && !Number.isFinite(u.offset)) throw new Error(`unit table: ${u.id} offset not finite`);
    if (u.offset && u.kind !== 'temperature') throw new Error(`unit table: only absolute temperature may carry an offset (${u.id})`);
  }
  for (const k of kinds) {
    if (!units.some((u) => u.kind === k && u.factor === 1 && !u.offset)) throw new Error(`unit table: kind ${k} has no SI unit`);
  }
}
