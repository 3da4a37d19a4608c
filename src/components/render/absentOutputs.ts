/**
 * The line under a results table that names the outputs these inputs do not give (a mode not
 * chosen, log decrement above critical damping …). Their rows are folded away so the table shows
 * what was computed; the line keeps them discoverable. Shared by the server-rendered table
 * (Calculator.astro) and the live element, so both say the same.
 */
import type { CalculatorDefinition, Outputs } from '../../calculators/types.ts';

export function absentOutputsLine(calc: CalculatorDefinition, outputs: Outputs): string {
  const absent = calc.outputs.filter((o) => outputs[o.key] === undefined).map((o) => o.label);
  return absent.length ? `Not given for these inputs: ${absent.join('; ')}.` : '';
}
