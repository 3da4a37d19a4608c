/**
 * The calculator definitions an open study needs in the browser: its steps' calculators and the
 * page's own, each loaded once through `loadCalculator` (never the whole registry — see
 * src/studies/lookup.ts). An id no loader knows stays unknown, and the study planner says so.
 */
import { loadCalculator } from '../../calculators/loaders.ts';
import type { CalculatorDefinition } from '../../calculators/types.ts';
import type { CalculatorLookup } from '../../studies/lookup.ts';
import type { Study } from '../../studies/schema.ts';
import { announceChunks } from './chunk-hints.ts';

export class LoadedCalculators {
  private readonly defs = new Map<string, CalculatorDefinition>();
  readonly lookup: CalculatorLookup = (id) => this.defs.get(id);

  add(def: CalculatorDefinition): void {
    this.defs.set(def.id, def);
  }

  /** Loads every step calculator of the study not loaded yet (in parallel). */
  async forStudy(study: Study | undefined): Promise<void> {
    const ids = new Set((study?.steps ?? []).map((s) => s.calculator));
    const missing = [...ids].filter((id) => !this.defs.has(id));
    announceChunks(missing);
    // built-ins one chunk each; a handbook's own calculators come from its one team chunk
    for (const def of await Promise.all(missing.map((id) => loadCalculator(id)))) if (def) this.add(def);
  }
}
